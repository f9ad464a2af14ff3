import {
  useCallback,
  useEffect,
  useLayoutEffect,
  useMemo,
  useRef,
  useState,
  type PointerEvent as ReactPointerEvent,
} from 'react';
// Konva's core entry and react-konva's core build: the plan draws with 2-D calls inside its own
// shapes, so none of Konva's ready-made shapes, filters or animations are loaded (docs/performance.md).
import { Layer, Shape, Stage } from 'react-konva/lib/ReactKonvaCore.js';
import type { Context } from 'konva/lib/Context';
import type { Shape as KonvaShape } from 'konva/lib/Shape';
import { analyse, FOOT } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp, useAppStore } from '../state/StoreContext.js';
import { toPlan, type ScreenPoint } from '../state/viewport.js';
import { planScene } from './planScene.js';
import { drawArrows, drawFittings, drawPipes, drawRestraints, placeTags } from './drawRoute.js';
import { LabelSpace } from './labelSpace.js';
import { drawRestrainedZones } from './drawZones.js';
import { drawGrid } from './drawGrid.js';
import { PlanOverlays } from './PlanOverlays.js';
import type { LiveChange } from './liveChange.js';
import { caseNames } from '../state/caseNames.js';
import { EMPTY_SELECTION } from '../state/slices.js';
import { useInteractiveLayer } from './useInteractiveLayer.js';
import { drawUnderlayImage, useUnderlayImage } from '../state/useUnderlayImage.js';
import { PlanHints } from './PlanHints.js';
import { capturesPress, sendPlanEvent } from '../tools/planBridge.js';
import type { PlanEvent, PointerKind } from '../tools/planInput.js';
import { runCommand } from '../chrome/appCommands.js';
import { focusDetails } from '../chrome/shortcuts.js';
import { reuseEqualParts } from './sceneReuse.js';
import type { Scene } from './planScene.js';

/**
 * The 2-D context a shape draws into, through Konva's public API: its layer's canvas element. Konva has
 * already applied the pixel ratio and the shape's transform to that same context.
 */
const native = (shape: KonvaShape): CanvasRenderingContext2D =>
  shape.getLayer()!.getNativeCanvasElement().getContext('2d')!;

/** A scene builder that keeps the parts equal to the last scene's (see `reuseEqualParts`). */
function sceneKeeper() {
  let last: Scene | null = null;
  return (next: Scene) => (last = reuseEqualParts(last, next));
}

/** One empty list, the same object while no slider gesture is on, so the live layer's memo is not made again. */
const NO_CHANGES: readonly LiveChange[] = [];

const kindOf = (t: string): PointerKind => (t === 'touch' ? 'touch' : t === 'pen' ? 'pen' : 'mouse');

/**
 * The plan: the route to scale on a grid, thrusts and restraints. It only turns DOM events into plan
 * events for the dispatcher (app/src/tools/dispatch.ts) and draws what the store holds.
 */
export function PlanView() {
  const store = useAppStore();
  const actions = useActions();
  const units = useApp((s) => s.units);
  const viewport = useApp((s) => s.viewport);
  const caseView = useApp((s) => s.caseView);
  const selection = useApp((s) => s.selection);
  const preview = useApp((s) => s.dragPreview);
  const draw = useApp((s) => s.draw);
  const tool = useApp((s) => s.tool);
  const snapping = useApp((s) => s.snapping);
  const size = useApp((s) => s.canvas);
  const hover = useApp((s) => s.hover);
  const selectBox = useApp((s) => s.selectBox);
  const gesture = useApp((s) => s.gesture.kind);
  const underlay = useApp((s) => s.project.underlay);
  const underlayPick = useApp((s) => s.underlayPick);
  const underlayImage = useUnderlayImage(underlay);
  const analysis = useAnalysis();
  // The drawn document: the store's in every result input (positions, pipes, restraint), and the same
  // object after an edit of the name or the units, so such an edit redraws nothing.
  const drawn = analysis.project;
  const liveBase = useApp((s) => s.liveBase);
  // While the test pressure is dragged: the scene before the drag, for its arrow scale and block ghosts.
  const before = useMemo(
    () =>
      liveBase
        ? (() => {
            const baseAnalysis = analyse(liveBase);
            return {
              scene: planScene(liveBase, baseAnalysis, caseView, EMPTY_SELECTION, null),
              analysis: baseAnalysis,
            };
          })()
        : null,
    [liveBase, caseView],
  );
  // The interactive layer's code loads with the input tools, or as soon as there is something for it to show.
  const busy =
    !!preview ||
    !!liveBase ||
    hover.kind !== 'none' ||
    draw.phase !== 'idle' ||
    !!selectBox ||
    (!!underlayPick && underlayPick.length > 0);
  const layer = useInteractiveLayer(busy);
  const changes = useMemo(
    () => (before && layer ? layer.liveChanges(before.analysis, analysis) : NO_CHANGES),
    [layer, before, analysis],
  );
  const box = useRef<HTMLDivElement>(null);
  const coords = useRef<HTMLSpanElement>(null);

  const send = useCallback(
    (e: PlanEvent) =>
      sendPlanEvent(store, actions, e, {
        command: (name) => runCommand(name, store, actions),
        openDetails: focusDetails,
      }),
    [store, actions],
  );

  // Measured before the first paint: the plan's first frame is drawn at its size, not at a stand-in size
  // and then again.
  useLayoutEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () =>
      send({ type: 'resize', width: Math.max(50, el.clientWidth), height: Math.max(50, el.clientHeight) });
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    measure();
    return () => ro.disconnect();
  }, [send]);

  // While nodes are dragged the document is unchanged: the static layer leaves the dragged nodes and
  // their pipes out (and so is not redrawn), the interactive layer draws them where they are now.
  const movedKey = preview ? [...preview.keys()].sort().join('\u0000') : '';
  const [keep] = useState(sceneKeeper);
  const current = useMemo(
    () =>
      keep(
        planScene(drawn, analysis, caseView, selection, null, movedKey ? new Set(movedKey.split('\u0000')) : undefined),
      ),
    [keep, drawn, analysis, caseView, selection, movedKey],
  );
  // One arrow scale held through the drag, so the arrows grow with the pressure instead of rescaling.
  const scene = useMemo(
    () => (before ? { ...current, largestForce: Math.max(before.scene.largestForce, 1e-9) } : current),
    [current, before],
  );
  const moving = useMemo(
    () => (preview && layer ? layer.dragScene(drawn, analysis, selection, preview) : null),
    [layer, drawn, analysis, selection, preview],
  );

  // Layers for what changes at different rates. A test-pressure change redraws the two layers of
  // results (blocks with the grid under them; thrust arrows and restrained zones); the pipes, and the
  // symbols with their marks, are the same objects (`reuseEqualParts`) and are not drawn again.
  // The marks get their room first; the thrust labels take what is left.
  const { width, height } = size;
  const [measure] = useState(() => document.createElement('canvas').getContext('2d'));
  const { fittings, plainNodes, pipes, polygons, zones, arrows, largestForce } = scene;
  const marks = useMemo(() => {
    const space = new LabelSpace(width, height);
    const tags = measure ? placeTags(measure, viewport, { fittings, plainNodes }, space) : new Map();
    return { space, tags };
  }, [measure, viewport, width, height, fittings, plainNodes]);
  const drawGround = useCallback(
    (_: Context, shape: KonvaShape) => {
      const ctx = native(shape);
      drawGrid(ctx, viewport, width, height, units);
      if (underlay && underlayImage.status === 'ready') drawUnderlayImage(ctx, viewport, underlay, underlayImage.image);
      drawRestraints(ctx, viewport, { polygons }, width, height);
    },
    [viewport, width, height, units, polygons, underlay, underlayImage],
  );
  const drawRoute = useCallback(
    (_: Context, shape: KonvaShape) => drawPipes(native(shape), viewport, { pipes }, width, height),
    [viewport, width, height, pipes],
  );
  const drawThrust = useCallback(
    (_: Context, shape: KonvaShape) => {
      const ctx = native(shape);
      const space = marks.space.clone();
      drawRestrainedZones(ctx, viewport, { zones }, units, space);
      drawArrows(ctx, viewport, { arrows, largestForce }, units, space);
      performance.mark('mainbrace-results-drawn');
    },
    [viewport, units, zones, arrows, largestForce, marks],
  );
  const drawMarks = useCallback(
    (_: Context, shape: KonvaShape) =>
      drawFittings(native(shape), viewport, { fittings, plainNodes }, marks.tags, width, height),
    [viewport, width, height, fittings, plainNodes, marks],
  );

  const snappedNow = snapping && draw.phase === 'drawing';
  // The interactive layer: dragged nodes, the slider's changes, hover, the drawing in progress. Its
  // drawing is a stable function of what it shows, so a committed pressure change (which changes none
  // of it) does not clear and redraw this layer's canvas.
  const names = useApp((s) => caseNames(s.project.loadCases));
  const hovered = hover.kind === 'none' ? null : drawn;
  const drawInteractive = useCallback(
    (_: Context, shape: KonvaShape) =>
      layer?.drawInteractive(native(shape), viewport, {
        width: size.width,
        height: size.height,
        units,
        moving,
        live: before
          ? { before: before.scene, changes, caseLabel: (id) => names.find((x) => x.id === id)?.label ?? id }
          : null,
        hover: hovered ? { project: hovered, hit: hover, attaching: tool === 'draw' } : null,
        draw,
        selectBox,
        snapped: snappedNow,
        picks: underlayPick && underlay ? { underlay, points: underlayPick } : null,
      }),
    [
      layer,
      moving,
      viewport,
      size.width,
      size.height,
      before,
      changes,
      names,
      hovered,
      hover,
      tool,
      draw,
      selectBox,
      units,
      snappedNow,
      underlayPick,
      underlay,
    ],
  );

  const markedDrawn = useRef(false);
  useEffect(() => {
    // A mark for the start-up benchmark: the first time the route is on screen.
    if (!markedDrawn.current && scene.pipes.length > 0 && size.width > 0) {
      markedDrawn.current = true;
      requestAnimationFrame(() => performance.mark('mainbrace-plan-drawn'));
    }
  }, [scene, size]);

  const local = (e: { clientX: number; clientY: number }): ScreenPoint => {
    const r = box.current!.getBoundingClientRect();
    return { sx: e.clientX - r.left, sy: e.clientY - r.top };
  };

  const onPointerDown = (e: ReactPointerEvent<HTMLDivElement>) => {
    box.current?.focus();
    const out = send({
      type: 'pointerDown',
      id: e.pointerId,
      pointer: kindOf(e.pointerType),
      button: e.button,
      at: local(e),
      shift: e.shiftKey,
      alt: e.altKey,
    });
    if (capturesPress(store, out)) e.currentTarget.setPointerCapture(e.pointerId);
  };
  const onPointerMove = (e: ReactPointerEvent<HTMLDivElement>) => {
    // Over an overlay (legend, typed-entry box) the pointer is not on the drawing.
    if (e.target !== e.currentTarget && !(e.target instanceof HTMLCanvasElement)) return send({ type: 'pointerLeave' });
    const at = local(e);
    if (coords.current) {
      const p = toPlan(store.getState().viewport, at);
      const us = store.getState().units === 'us';
      const u = us ? FOOT : 1;
      const sym = us ? 'ft' : 'm';
      // + 0 turns a −0.04 that reads "-0.0" into a plain 0.0
      const one = (v: number) => (Math.round((v / u) * 10) / 10 + 0).toFixed(1);
      coords.current.textContent = `E ${one(p.x)} ${sym}   N ${one(p.y)} ${sym}`;
    }
    send({ type: 'pointerMove', id: e.pointerId, pointer: kindOf(e.pointerType), at, alt: e.altKey });
  };
  const onPointerUp = (e: ReactPointerEvent<HTMLDivElement>) =>
    send({ type: 'pointerUp', id: e.pointerId, pointer: kindOf(e.pointerType), at: local(e) });

  const onWheel = useCallback(
    (e: WheelEvent) => {
      // The legend and a long notice scroll their own content.
      if (e.target instanceof Element && e.target.closest('.plan-legend, .notice')) return;
      e.preventDefault();
      const r = box.current!.getBoundingClientRect();
      send({ type: 'wheel', at: { sx: e.clientX - r.left, sy: e.clientY - r.top }, deltaY: e.deltaY });
    },
    [send],
  );
  useEffect(() => {
    const el = box.current;
    el?.addEventListener('wheel', onWheel, { passive: false });
    return () => el?.removeEventListener('wheel', onWheel);
  }, [onWheel]);

  const cursor =
    gesture === 'pan'
      ? 'grabbing'
      : tool === 'draw' || (underlayPick && underlayPick.length < 2)
        ? 'crosshair'
        : tool === 'pan'
          ? 'grab'
          : hover.kind !== 'none'
            ? 'pointer'
            : 'default';
  return (
    <div
      className="plan"
      ref={box}
      tabIndex={0}
      role="application"
      aria-label="Plan of the main: arrows pan, + and − zoom, Tab walks the fittings, Enter opens the details; the schedule below lists the same fittings as text"
      data-testid="plan"
      style={{ cursor }}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={(e) => send({ type: 'pointerCancel', id: e.pointerId })}
      onPointerLeave={() => send({ type: 'pointerLeave' })}
      onDoubleClick={(e) => send({ type: 'doubleClick', at: local(e) })}
      onContextMenu={(e) => e.preventDefault()}
    >
      {/* Made once the box is measured (in the layout effect, before the first paint), so that its
          canvases are made at their size: a resize sizes every layer's canvas again and draws it at once. */}
      {size.width > 0 && (
        <Stage width={size.width} height={size.height} listening={false}>
          {/* one layer each, drawn at its own rate: grid and blocks, pipes, thrust, marks, interaction */}
          {[drawGround, drawRoute, drawThrust, drawMarks, drawInteractive].map((paint, i) => (
            <Layer key={i} listening={false}>
              <Shape sceneFunc={paint} />
            </Layer>
          ))}
        </Stage>
      )}
      <PlanOverlays scene={scene} coordsRef={coords} />
      <PlanHints />
    </div>
  );
}
