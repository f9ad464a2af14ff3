import { describe, expect, it } from 'vitest';
import { planHarness } from './planHarness.js';
import { at, chain, expectClose, expectValid, links } from '../testFixtures.js';
import { toPlan, toScreen } from '../state/viewport.js';
import { ACTIONS, actionForKey, chordOf } from '../chrome/actionTable.js';

/**
 * The plan's dispatcher driven headless with pointer, wheel, touch and key events, asserting on the
 * document and the selection. The canvas is 800 × 500 px with the legend closed; Fit leaves a margin
 * of 0.14 × 500 = 70 px a side, so the Harrow Bank dog-leg (0,0) → (30,0) → (30,40) gets a scale of
 * min(660/30, 360/40) = 9 px/m, centred on (15, 20).
 */
const dogLeg = () => chain([0, 0], [30, 0], [30, 40]);
const SCALE = 9;

describe('opening the plan', () => {
  it('fits the route when the canvas first gets its size: 9 px/m, centred on the route', () => {
    const h = planHarness(dogLeg());
    expectClose(h.state().viewport.scale, SCALE, 1e-12);
    const mid = toScreen(h.state().viewport, { x: 15, y: 20 });
    expectClose(mid.sx, 400, 1e-9);
    expectClose(mid.sy, 250, 1e-9);
  });
  it('keeps the open legend’s 250 px strip out of the fitted area on a wide plan', () => {
    const h = planHarness(dogLeg(), { legend: true, width: 1200 });
    // 1200 − 250 = 950 px wide: the route's middle sits at 475 px, clear of the legend.
    expect(h.state().legendOpen).toBe(true);
    expectClose(toScreen(h.state().viewport, { x: 15, y: 20 }).sx, 950 / 2, 1e-9);
  });
  it('starts with the legend closed on a plan narrower than 900 px, using the whole width', () => {
    const h = planHarness(dogLeg(), { legend: true, width: 800 });
    expect(h.state().legendOpen).toBe(false);
    expectClose(toScreen(h.state().viewport, { x: 15, y: 20 }).sx, 400, 1e-9);
  });
});

describe('select tool', () => {
  it('selects a node on click, a pipe with Shift added, and clears on a click on empty ground', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 30, y: 0 });
    expect(h.selected()).toEqual({ nodes: ['n2'], pipes: [] });
    h.click({ x: 30, y: 20 }, { shift: true });
    expect(h.selected()).toEqual({ nodes: ['n2'], pipes: ['p2'] });
    h.click({ x: 10, y: 30 });
    expect(h.selected()).toEqual({ nodes: [], pipes: [] });
    expect(h.undoSteps()).toBe(0);
  });
  it('drags a node: a preview while moving, the document changed once, on release (one undo step)', () => {
    const h = planHarness(dogLeg());
    const before = h.doc();
    h.pointerDown({ x: 30, y: 0 });
    h.pointerMove({ x: 32, y: 0 });
    h.pointerMove({ x: 34, y: 2 });
    expect(h.doc()).toBe(before);
    expect(h.state().dragPreview?.get('n2')).toBeDefined();
    h.pointerUp({ x: 34, y: 2 });
    const n2 = at(h.doc(), 'n2');
    expectClose(n2.x, 34, 1e-9);
    expectClose(n2.y, 2, 1e-9);
    expect(h.state().dragPreview).toBeNull();
    expect(h.undoSteps()).toBe(1);
    expectValid(h.doc());
  });
  it('box-selects with Shift-drag from empty ground: what lies wholly inside', () => {
    const h = planHarness(dogLeg());
    h.drag({ x: 20, y: -5 }, { x: 40, y: 45 }, { shift: true });
    expect(h.selected()).toEqual({ nodes: ['n2', 'n3'], pipes: ['p2'] });
    expect(h.state().selectBox).toBeNull();
  });
  it('pans on a drag of empty ground, by exactly the pixels dragged, keeping the selection and the document', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 0, y: 0 });
    const before = h.doc();
    const v0 = h.state().viewport;
    h.drag({ px: { sx: 600, sy: 100 } }, { px: { sx: 660, sy: 70 } });
    const v = h.state().viewport;
    expectClose(v.left, v0.left - 60 / SCALE, 1e-9);
    expectClose(v.top, v0.top - 30 / SCALE, 1e-9);
    expect(h.doc()).toBe(before);
    expect(h.selected().nodes).toEqual(['n1']);
  });
  it('shows what a click would select: hovering 5 px off pipe p1 marks p1; near n3 marks n3', () => {
    const h = planHarness(dogLeg());
    const p = h.px({ x: 15, y: 0 });
    h.pointerMove({ px: { sx: p.sx, sy: p.sy + 5 } });
    expect(h.state().hover).toMatchObject({ kind: 'pipe', id: 'p1' });
    h.pointerMove({ x: 30.5, y: 40.5 });
    expect(h.state().hover).toMatchObject({ kind: 'node', id: 'n3' });
    h.send({ type: 'pointerLeave' });
    expect(h.state().hover.kind).toBe('none');
  });
});

describe('pan tool, Space, middle button and wheel', () => {
  it('pans with the pan tool even when the drag starts on a node, which stays put', () => {
    const h = planHarness(dogLeg());
    h.key('h');
    expect(h.state().tool).toBe('pan');
    const v0 = h.state().viewport;
    h.drag({ x: 30, y: 0 }, { px: { sx: 0, sy: 0 } });
    expect(h.state().viewport).not.toEqual(v0);
    expect(at(h.doc(), 'n2')).toEqual({ x: 30, y: 0 });
  });
  it('pans while Space is held, and drags nodes again once it is released', () => {
    const h = planHarness(dogLeg());
    h.key(' ');
    h.drag({ x: 30, y: 0 }, { x: 35, y: 0 });
    expect(at(h.doc(), 'n2')).toEqual({ x: 30, y: 0 });
    h.keyUp(' ');
    h.drag({ x: 30, y: 0 }, { x: 35, y: 0 });
    expectClose(at(h.doc(), 'n2').x, 35, 1e-9);
  });
  it('pans with the middle button in any tool', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    const v0 = h.state().viewport;
    h.drag({ px: { sx: 100, sy: 100 } }, { px: { sx: 150, sy: 100 } }, { button: 1 });
    expectClose(h.state().viewport.left, v0.left - 50 / SCALE, 1e-9);
    expect(h.doc().nodes).toHaveLength(3);
  });
  it('zooms on the wheel about the pointer: the plan point under it stays under it', () => {
    const h = planHarness(dogLeg());
    const under = toPlan(h.state().viewport, { sx: 200, sy: 120 });
    h.wheel({ px: { sx: 200, sy: 120 } }, -200);
    expect(h.state().viewport.scale).toBeGreaterThan(SCALE);
    const p = toScreen(h.state().viewport, under);
    expectClose(p.sx, 200, 1e-6);
    expectClose(p.sy, 120, 1e-6);
  });
});

describe('draw tool', () => {
  it('draws a free run on open ground and finishes it with Enter: two nodes, one pipe, one undo step', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    h.key('s'); // snapping off: points land where clicked
    h.click({ x: -20, y: 20 });
    h.click({ x: -20, y: 35 });
    h.key('Enter');
    expect(h.doc().nodes).toHaveLength(5);
    expect(h.doc().pipes).toHaveLength(3);
    expect(h.undoSteps()).toBe(1);
    expectValid(h.doc());
  });
  it('joins a pipe from a click 12 px beside it: the run starts on p1 as a tee, not as a separate run', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    const onPipe = h.px({ x: 15, y: 0 });
    h.pointerMove({ px: { sx: onPipe.sx, sy: onPipe.sy - 12 } });
    expect(h.state().hover).toMatchObject({ kind: 'pipe', id: 'p1' });
    h.click({ px: { sx: onPipe.sx, sy: onPipe.sy - 12 } });
    h.click({ x: 15, y: 20 });
    h.key('Enter');
    const tee = h.doc().nodes.find((n) => Math.abs(n.x - 15) < 1e-9 && Math.abs(n.y) < 1e-9);
    expect(tee).toBeDefined();
    // the tee node carries three pipes: both halves of p1 and the branch
    expect(h.doc().pipes.filter((p) => p.from === tee!.id || p.to === tee!.id)).toHaveLength(3);
    expectValid(h.doc());
  });
  it('ends a run on a node clicked near (14 px off n1, snapping on): the run joins n1, adding one node', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    h.click({ x: -10, y: 20 });
    const n1 = h.px({ x: 0, y: 0 });
    h.click({ px: { sx: n1.sx + 14, sy: n1.sy } });
    expect(h.state().draw.phase).toBe('idle');
    expect(h.doc().nodes).toHaveLength(4);
    expect(links(h.doc()).filter((l) => l.includes('n1'))).toHaveLength(2);
  });
  it('Backspace removes the last bend, Escape cancels without an edit, double-click finishes', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    h.key('s');
    h.click({ x: -20, y: 10 });
    h.click({ x: -20, y: 20 });
    h.click({ x: -20, y: 30 });
    h.key('Backspace');
    expect(h.state().draw.phase === 'drawing' && h.state().draw).toMatchObject({ vertices: [{ x: -20, y: 20 }] });
    h.key('Escape');
    expect(h.state().draw.phase).toBe('idle');
    expect(h.undoSteps()).toBe(0);
    h.click({ x: -20, y: 10 });
    h.click({ x: -20, y: 20 });
    h.doubleClick({ x: -20, y: 20 });
    expect(h.doc().pipes).toHaveLength(3);
  });
});

describe('keys', () => {
  it('Delete and Backspace remove the selection (one undo step each); Ctrl+Z brings it back', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 30, y: 40 });
    h.key('Delete');
    expect(h.doc().nodes.map((n) => n.id)).toEqual(['n1', 'n2']);
    h.click({ x: 15, y: 0 });
    h.key('Backspace');
    expect(h.doc().pipes).toHaveLength(0);
    expect(h.undoSteps()).toBe(2);
    h.key('z', { ctrl: true });
    h.key('z', { ctrl: true });
    expect(h.doc().nodes).toHaveLength(3);
    expect(h.commands).toEqual(['undo', 'undo']);
  });
  it('Escape clears the selection; V, D, H pick tools; S toggles snapping', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 0, y: 0 });
    h.key('Escape');
    expect(h.selected().nodes).toEqual([]);
    h.key('d');
    expect(h.state().tool).toBe('draw');
    h.key('H', { shift: true });
    expect(h.state().tool).toBe('pan');
    h.key('v');
    expect(h.state().tool).toBe('select');
    h.key('s');
    expect(h.state().snapping).toBe(false);
  });
  it('arrows pan by a tenth of the shorter side (50 px); + and − zoom ×1.25 about the centre; F fits again', () => {
    const h = planHarness(dogLeg());
    const v0 = h.state().viewport;
    h.key('ArrowRight');
    expectClose(h.state().viewport.left, v0.left + 50 / SCALE, 1e-9);
    h.key('ArrowUp');
    expectClose(h.state().viewport.top, v0.top + 50 / SCALE, 1e-9);
    h.key('+');
    expectClose(h.state().viewport.scale, SCALE * 1.25, 1e-9);
    h.key('-');
    h.key('-');
    expectClose(h.state().viewport.scale, SCALE / 1.25, 1e-9);
    h.key('f');
    expect(h.state().viewport).toEqual(v0);
  });
  it('arrows, + and Tab act only while the plan has the focus (left to the page otherwise)', () => {
    const h = planHarness(dogLeg());
    const v0 = h.state().viewport;
    expect(h.key('ArrowLeft', { planFocused: false }).handled).toBe(false);
    expect(h.key('Tab', { planFocused: false }).handled).toBe(false);
    expect(h.state().viewport).toBe(v0);
  });
  it('Tab and Shift+Tab walk the fittings in chainage order, wrapping; Enter opens the details', () => {
    // A dead end at n1, a bend at n2, a dead end at n3: marks A1, A2, A3 along the run.
    const h = planHarness(dogLeg());
    const seen: string[] = [];
    for (let i = 0; i < 4; i++) {
      h.key('Tab');
      seen.push(h.selected().nodes[0]!);
    }
    expect(seen).toEqual(['n1', 'n2', 'n3', 'n1']);
    h.key('Tab', { shift: true });
    expect(h.selected().nodes).toEqual(['n3']);
    h.key('Enter');
    expect(h.detailsOpened()).toBe(1);
  });
  it('Tab brings a fitting that is off screen into view', () => {
    const h = planHarness(dogLeg());
    h.drag({ px: { sx: 700, sy: 50 } }, { px: { sx: 100, sy: 50 } }); // the route slides off to the left
    h.key('Tab');
    const p = toScreen(h.state().viewport, { x: 0, y: 0 });
    expect(p.sx).toBeGreaterThan(0);
    expect(p.sx).toBeLessThan(800);
  });
});

describe('touch', () => {
  it('pans with one finger on empty ground, by the pixels moved', () => {
    const h = planHarness(dogLeg());
    const v0 = h.state().viewport;
    h.touchDrag({ px: { sx: 600, sy: 400 } }, { px: { sx: 560, sy: 440 } });
    expectClose(h.state().viewport.left, v0.left + 40 / SCALE, 1e-9);
    expectClose(h.state().viewport.top, v0.top + 40 / SCALE, 1e-9);
  });
  it('selects on a tap 18 px from a node (a finger is wider than a pointer)', () => {
    const h = planHarness(dogLeg());
    const n3 = h.px({ x: 30, y: 40 });
    h.tap({ px: { sx: n3.sx + 18, sy: n3.sy } });
    expect(h.selected().nodes).toEqual(['n3']);
  });
  it('zooms with a pinch: fingers spreading from 100 to 200 px apart double the scale about their midpoint', () => {
    const h = planHarness(dogLeg());
    const mid = { sx: 300, sy: 200 };
    const under = toPlan(h.state().viewport, mid);
    h.pinch({ sx: 250, sy: 200 }, { sx: 350, sy: 200 }, { sx: 200, sy: 200 }, { sx: 400, sy: 200 });
    expectClose(h.state().viewport.scale, SCALE * 2, 1e-9);
    const p = toScreen(h.state().viewport, under);
    expectClose(p.sx, 300, 1e-6);
    expectClose(p.sy, 200, 1e-6);
    expect(h.state().gesture.kind).toBe('idle');
  });
  it('drops a node drag when a second finger lands: the pinch zooms, the node stays', () => {
    const h = planHarness(dogLeg());
    const n2 = h.px({ x: 30, y: 0 });
    h.pointerDown({ px: n2 }, { pointer: 'touch', id: 7 });
    h.pointerMove({ px: { sx: n2.sx + 20, sy: n2.sy } }, { pointer: 'touch', id: 7 });
    h.pointerDown({ px: { sx: n2.sx + 120, sy: n2.sy } }, { pointer: 'touch', id: 8 });
    h.pointerMove({ px: { sx: n2.sx + 160, sy: n2.sy } }, { pointer: 'touch', id: 8 });
    h.pointerUp({ px: { sx: n2.sx + 20, sy: n2.sy } }, { pointer: 'touch', id: 7 });
    h.pointerUp({ px: { sx: n2.sx + 160, sy: n2.sy } }, { pointer: 'touch', id: 8 });
    expect(at(h.doc(), 'n2')).toEqual({ x: 30, y: 0 });
    expect(h.state().dragPreview).toBeNull();
    expect(h.state().viewport.scale).toBeGreaterThan(SCALE);
  });
  it('draws with taps; a one-finger drag with the draw tool pans instead of placing a point', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    h.key('s');
    h.tap({ x: -20, y: 10 });
    h.touchDrag({ px: { sx: 700, sy: 400 } }, { px: { sx: 650, sy: 400 } });
    const draw = h.state().draw;
    expect(draw.phase === 'drawing' ? draw.vertices : null).toEqual([]);
    h.tap({ x: -20, y: 30 });
    h.command('finish');
    expect(h.doc().pipes).toHaveLength(3);
  });
});

describe('the action table', () => {
  it('gives every chord to one command, and each key press back to the command that lists it', () => {
    const chords = ACTIONS.flatMap((a) => a.keys);
    expect(new Set(chords).size).toBe(chords.length);
    expect(actionForKey({ key: 'Z', ctrl: true, shift: true })?.name).toBe('redo');
    expect(actionForKey({ key: 'y', meta: true })?.name).toBe('redo');
    expect(actionForKey({ key: 'Tab', shift: true })?.name).toBe('previousFitting');
    expect(actionForKey({ key: '+', shift: true })?.name).toBe('zoomIn');
    expect(chordOf({ key: 'ArrowLeft' })).toBe('ArrowLeft');
  });
  it('leaves the design and its history alone for every command marked "none" that the plan owns', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 30, y: 0 });
    const before = h.doc();
    for (const a of ACTIONS.filter((x) => x.undo === 'none' && !['undo', 'redo'].includes(x.name))) {
      h.command(a.name);
      expect(h.doc(), a.name).toBe(before);
      expect(h.undoSteps(), a.name).toBe(0);
    }
  });
  it('makes exactly one undo step for each "step" command the plan carries out (delete, finish)', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 30, y: 40 });
    h.command('delete');
    expect(h.undoSteps()).toBe(1);
    h.command('toolDraw');
    h.command('toggleSnapping');
    h.click({ x: -20, y: 0 });
    h.click({ x: -20, y: 20 });
    h.command('finish');
    expect(h.undoSteps()).toBe(2);
  });
});

describe('runs not joined to the main', () => {
  it('warns when a drawn run stands apart from the main, and not when it branches from it', () => {
    const h = planHarness(dogLeg());
    h.key('d');
    h.click({ x: 15, y: 0 }); // on p1: a tee
    h.click({ x: 15, y: 20 });
    h.key('Enter');
    expect(h.state().notice).toBeNull();
    h.click({ x: -20, y: 20 }); // open ground, 20 m from anything
    h.click({ x: -20, y: 40 });
    h.key('Enter');
    expect(h.state().notice?.title).toMatch(/not connected to the rest of the main .*2 separate pieces/);
  });
});

describe('the undo banner', () => {
  it('shows after a delete and goes at the next edit, which makes it out of date', () => {
    const h = planHarness(dogLeg());
    h.click({ x: 30, y: 40 });
    h.key('Delete');
    expect(h.state().notice?.title).toMatch(/Ctrl\+Z brings them back/);
    h.drag({ x: 30, y: 0 }, { x: 32, y: 0 });
    expect(h.state().notice).toBeNull();
  });
});
