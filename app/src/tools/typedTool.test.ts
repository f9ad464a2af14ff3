import { describe, expect, it } from 'vitest';
import { imageToPlan, type Project, type Underlay } from '@mainbrace/solver';
import { planHarness } from './planHarness.js';
import { at, chain, emptyProject, expectClose } from '../testFixtures.js';
import { toScreen } from '../state/viewport.js';

const type = (h: ReturnType<typeof planHarness>, text: string) => {
  h.send({ type: 'typedText', text });
  h.send({ type: 'typedEnter' });
};

describe('typed input while drawing, through the dispatcher', () => {
  it('a digit typed over the plan with the draw tool starts an entry; the select tool leaves it alone', () => {
    const h = planHarness(emptyProject());
    h.key('1');
    expect(h.state().typed).toBe('');
    h.command('toolDraw');
    h.key('1');
    h.key('2');
    expect(h.state().typed).toBe('12');
  });

  it('keys typed over the plan before the box has the keyboard go on with the entry, in order', () => {
    // The box's code loads with the draw tool: a quick typist's spaces, letters and Enter come to the plan.
    const h = planHarness(emptyProject());
    h.command('toolDraw');
    for (const k of 'E 10 N 20') h.key(k);
    expect(h.state().typed).toBe('E 10 N 20');
    expect(h.state().spaceHeld).toBe(false); // a space inside an entry is text, not the pan key
    h.key('Enter');
    for (const k of '25 @9') h.key(k);
    h.key('Backspace');
    h.key('9');
    h.key('0');
    h.key('Enter');
    h.key('7');
    h.key('Escape'); // clears the entry and leaves the run going
    expect(h.state().typed).toBe('');
    expect(h.state().draw.phase).toBe('drawing');
    h.key('Enter'); // Enter with no entry finishes the run
    expect(h.doc().nodes.map((n) => [n.x, n.y])).toEqual([
      [10, 20],
      [35, 20], // 25 m due east
    ]);
  });

  it('coordinates start a run, lengths with a bearing and a turn place nodes exactly, Enter on empty finishes', () => {
    const h = planHarness(emptyProject());
    h.command('toolDraw');
    type(h, 'E 10 N 20');
    type(h, '25 @90'); // due east: (35, 20)
    type(h, '12.5 L90'); // turning left from east: due north, (35, 32.5)
    expect(h.state().typed).toBe('');
    type(h, '');
    const doc = h.doc();
    expect(doc.nodes.map((n) => [n.x, n.y])).toEqual([
      [10, 20],
      [35, 20],
      [35, 32.5],
    ]);
    expect(h.undoSteps()).toBe(1); // the run is one edit
  });

  it('a bare length goes toward the pointer on the plan, and straight on once the pointer has left it (docs/drawing-input.md)', () => {
    const h = planHarness(emptyProject());
    h.command('toolDraw');
    type(h, 'E 0 N 0');
    type(h, '60 @90'); // due east to (60, 0)
    h.pointerMove({ x: 60, y: 40 }); // the pointer due north of the last node
    type(h, '50'); // toward it: (60, 50)
    h.pointerMove({ x: 0, y: 80 }); // on its way to the typed-entry box, up and to the left…
    h.send({ type: 'pointerLeave' }); // …and over the box: it aims nowhere
    type(h, '30'); // straight on along the last leg (north): (60, 80)
    type(h, '');
    expect(h.doc().nodes.map((n) => [n.x, n.y])).toEqual([
      [0, 0],
      [60, 0],
      [60, 50],
      [60, 80],
    ]);
  });

  it('a bad entry stays in the box with the reason, and nothing is drawn', () => {
    const h = planHarness(emptyProject());
    h.command('toolDraw');
    type(h, '12..5');
    expect(h.state().typed).toBe('12..5');
    expect(h.state().typedError).toMatch(/is not a length/);
    type(h, '5'); // a length before any start
    expect(h.state().typedError).toBe('start the run first: click on the plan or type its coordinates (E 120 N 340)');
    expect(h.doc().nodes).toHaveLength(0);
  });

  it('a typed point on an existing node joins it: a branch typed from a click on the dog-leg', () => {
    const h = planHarness(chain([0, 0], [30, 0], [30, 40]));
    h.command('toolDraw');
    h.click({ x: 30, y: 0 }); // start on n2
    type(h, 'E 0 N 40');
    type(h, 'E 30 N 40'); // n3: the run ends there
    expect(h.state().draw.phase).toBe('idle');
    const doc = h.doc();
    expect(doc.nodes).toHaveLength(4);
    expect(doc.pipes.filter((p) => p.to === 'n3' || p.from === 'n3')).toHaveLength(2);
  });
});

describe('calibration picks, through the dispatcher', () => {
  const withUnderlay = (): Project => ({
    ...chain([0, 0], [30, 0], [30, 40]),
    underlay: {
      name: 'invented.png',
      mediaType: 'image/png',
      width: 1000,
      height: 800,
      storageKey: 'k',
      x: -10,
      y: 50,
      metresPerPixel: 0.1,
      rotation: 0,
      opacity: 0.5,
      locked: false,
    } satisfies Underlay,
  });

  it('while picking, clicks keep the image pixels under them (whatever the tool) and change no design', () => {
    const h = planHarness(withUnderlay());
    h.actions.startUnderlayPick();
    h.click({ x: 0, y: 0 }); // on n1: still a pick, not a selection
    h.click({ x: 20, y: 10 });
    const picks = h.state().underlayPick!;
    expect(picks).toHaveLength(2);
    // (0, 0) is pixel ((0 + 10)/0.1, (50 − 0)/0.1) = (100, 500); (20, 10) is (300, 400)
    expectClose(picks[0]!.u, 100, 1e-6);
    expectClose(picks[0]!.v, 500, 1e-6);
    const back = imageToPlan(h.doc().underlay!, picks[1]!);
    expectClose(back.x, 20, 1e-9);
    expectClose(back.y, 10, 1e-9);
    expect(h.selected()).toEqual({ nodes: [], pipes: [] });
    expect(h.undoSteps()).toBe(0);
    // a third click is an ordinary click again: it selects n2
    h.click({ x: 30, y: 0 });
    expect(h.selected().nodes).toEqual(['n2']);
    expect(at(h.doc(), 'n2').x).toBe(30);
  });

  it('Escape stops picking', () => {
    const h = planHarness(withUnderlay());
    h.actions.startUnderlayPick();
    h.click({ x: 0, y: 0 });
    h.key('Escape');
    expect(h.state().underlayPick).toBeNull();
  });
});

describe('Fit with a site plan and no route yet', () => {
  it('shows the whole image: its four corners inside the 800 × 500 canvas less the 70 px margin (0.14 × the height)', () => {
    const doc: Project = {
      ...emptyProject(),
      underlay: {
        name: 'invented.png',
        mediaType: 'image/png',
        width: 2000,
        height: 1000,
        storageKey: 'k',
        x: 5000,
        y: 9000,
        metresPerPixel: 0.2,
        rotation: 30,
        opacity: 0.5,
        locked: false,
      },
    };
    const h = planHarness(doc);
    h.command('fit');
    for (const q of [
      { u: 0, v: 0 },
      { u: 2000, v: 0 },
      { u: 0, v: 1000 },
      { u: 2000, v: 1000 },
    ]) {
      const p = toScreen(h.state().viewport, imageToPlan(doc.underlay!, q));
      expect(p.sx).toBeGreaterThanOrEqual(70 - 1e-6);
      expect(p.sx).toBeLessThanOrEqual(730 + 1e-6);
      expect(p.sy).toBeGreaterThanOrEqual(70 - 1e-6);
      expect(p.sy).toBeLessThanOrEqual(430 + 1e-6);
    }
  });
});

describe('a typed leg off the edge of the screen', () => {
  it('is followed: the node just placed is brought into view at the same scale', () => {
    const h = planHarness(emptyProject(), { width: 800, height: 500 });
    h.store.setState({ viewport: { scale: 2, left: 0, top: 100 } }); // 400 m × 250 m on screen
    h.command('toolDraw');
    type(h, 'E 50 N 20'); // 100 px from the left: on screen
    type(h, '250 @90'); // (300, 20): 600 px, on screen
    expect(h.state().viewport).toEqual({ scale: 2, left: 0, top: 100 });
    type(h, '300 @90'); // (600, 20): 1,200 px, off screen
    const v = h.state().viewport;
    expect(v.scale).toBe(2);
    const p = toScreen(v, { x: 600, y: 20 });
    expect(p.sx).toBeGreaterThan(40);
    expect(p.sx).toBeLessThan(800 - 40);
    expect(p.sy).toBeGreaterThan(40);
    expect(p.sy).toBeLessThan(500 - 40);
  });
});
