import { useCallback, useEffect, useMemo, useRef, type PointerEvent as ReactPointerEvent } from 'react';
import { Layer, Shape, Stage } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { FOOT, imageToPlan } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp, useAppStore } from '../state/StoreContext.js';
import { toPlan, type ScreenPoint } from '../state/viewport.js';
import { dragScene, planScene } from './planScene.js';
import { drawArrows, drawFittings, drawPipes, drawRestraints, placeTags } from './drawRoute.js';
import { LabelSpace } from './labelSpace.js';
import { drawRestrainedZones } from './drawZones.js';
import { drawGrid } from './drawGrid.js';
import { drawHover, drawOverlay } from './drawOverlay.js';
import { PlanOverlays } from './PlanOverlays.js';
import { drawPicks, drawUnderlay } from './drawUnderlay.js';
import { useUnderlayImage } from '../state/underlayImage.js';
import { UnderlayHint } from './UnderlayHint.js';
import { TypedEntryBox } from './TypedEntryBox.js';
import { sendPlanEvent } from '../tools/planBridge.js';
import type { PlanEvent, PointerKind } from '../tools/planInput.js';
import { runCommand } from '../chrome/appCommands.js';
import { focusDetails } from '../chrome/shortcuts.js';

const native = (c: Context) => (c as unknown as { _context: CanvasRenderingContext2D })._context;

const kindOf = (t: string): PointerKind => (t === 'touch' ? 'touch' : t === 'pen' ? 'pen' : 'mouse');

/**
 * The plan: the route to scale on a grid, thrusts and restraints. It only turns DOM events into plan
 * events for the dispatcher (app/src/tools/dispatch.ts) and draws what the store holds.
 */
export function PlanView() {
  const store = useAppStore();
  const actions = useActions();
  const project = useApp((s) => s.project);
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

  useEffect(() => {
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
  const scene = useMemo(
    () =>
      planScene(project, analysis, caseView, selection, null, movedKey ? new Set(movedKey.split('\u0000')) : undefined),
    [project, analysis, caseView, selection, movedKey],
  );
  const moving = useMemo(
    () => (preview ? dragScene(project, analysis, selection, preview) : null),
    [project, analysis, selection, preview],
  );

  const drawStatic = useCallback(
    (c: Context) => {
      const ctx = native(c);
      drawGrid(ctx, viewport, size.width, size.height, units);
      if (underlay && underlayImage.status === 'ready') drawUnderlay(ctx, viewport, underlay, underlayImage.image);
      drawRestraints(ctx, viewport, scene);
      drawPipes(ctx, viewport, scene);
      const space = new LabelSpace(size.width, size.height);
      const tags = placeTags(ctx, viewport, scene, space);
      drawRestrainedZones(ctx, viewport, scene, units, space);
      drawArrows(ctx, viewport, scene, units, space);
      drawFittings(ctx, viewport, scene, tags);
    },
    [viewport, size, scene, units, underlay, underlayImage],
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
    if (store.getState().gesture.kind !== 'idle' && out.handled) e.currentTarget.setPointerCapture(e.pointerId);
  };
  const onPointerMove = (e: ReactPointerEvent<HTMLDivElement>) => {
    const at = local(e);
    if (coords.current) {
      const p = toPlan(store.getState().viewport, at);
      const us = store.getState().units === 'us';
      const u = us ? FOOT : 1;
      const sym = us ? 'ft' : 'm';
      coords.current.textContent = `E ${(p.x / u).toFixed(1)} ${sym}   N ${(p.y / u).toFixed(1)} ${sym}`;
    }
    send({ type: 'pointerMove', id: e.pointerId, pointer: kindOf(e.pointerType), at, alt: e.altKey });
  };
  const onPointerUp = (e: ReactPointerEvent<HTMLDivElement>) =>
    send({ type: 'pointerUp', id: e.pointerId, pointer: kindOf(e.pointerType), at: local(e) });

  const onWheel = useCallback(
    (e: WheelEvent) => {
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
  const snappedNow = snapping && draw.phase === 'drawing';
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
      <Stage width={size.width || 50} height={size.height || 50} listening={false}>
        <Layer listening={false}>
          <Shape sceneFunc={drawStatic} />
        </Layer>
        <Layer listening={false}>
          <Shape
            sceneFunc={(c) => {
              const ctx = native(c);
              if (moving) {
                drawPipes(ctx, viewport, moving);
                drawFittings(
                  ctx,
                  viewport,
                  moving,
                  placeTags(ctx, viewport, moving, new LabelSpace(size.width, size.height)),
                );
              }
              drawHover(ctx, viewport, project, hover, tool === 'draw');
              drawOverlay(ctx, viewport, draw, selectBox, units, snappedNow);
              if (underlayPick && underlay)
                drawPicks(
                  ctx,
                  viewport,
                  underlayPick.map((q) => imageToPlan(underlay, q)),
                );
            }}
          />
        </Layer>
      </Stage>
      <PlanOverlays scene={scene} coordsRef={coords} />
      <UnderlayHint />
      <TypedEntryBox />
    </div>
  );
}
