import {
  quickParse,
  sheetOf,
  type Problem,
  type LoadCase,
  type Pipe,
  type Project,
  type ProjectNode,
  type Sheet,
  type Soil,
  type Underlay,
} from '@mainbrace/solver';
import type { AppState, AppStore, CaseView, DrawerTab, Notice, Selection, ToolName } from './store.js';
import { EMPTY_SELECTION } from './store.js';
import type { PipeSpec, PlanPoint, RouteEnd } from './documentEdits.js';
import type { Viewport } from './viewport.js';
import { routePieces } from './connectivity.js';
import type { DrawState } from '../tools/drawTool.js';
import { fittedView, revealFitting as planCommandReveal, showFitting } from '../tools/planView.js';
import { planInputOf } from '../tools/planBridge.js';
import { checks, checksReady, loadChecks } from './checks.js';
import { loadRouteEdits, routeEdits, type RouteEdits } from './routeEdits.js';
import { resultsOf } from './results.js';
import { pipeForUnits } from './defaultPipe.js';

const NONE: readonly string[] = [];

/** Fitting marks of the document on screen; none if its results cannot be worked out (the refusal still shows). */
function marksOf(project: Project): ReadonlyMap<string, string> {
  try {
    return resultsOf(project).marks;
  } catch {
    return new Map();
  }
}

/** Typing pauses shorter than this, ms, keep extending the same undo step. */
const TYPING_WINDOW_MS = 1500;

/**
 * Keeps a selection to ids that still exist (after undo, delete or open); the same object when every
 * id still exists, so that an edit elsewhere (a keystroke in the name) does not look like a new selection.
 */
function prune(sel: Selection, p: Project): Selection {
  if (sel.nodes.size === 0 && sel.pipes.size === 0) return sel;
  const nodes = new Set(p.nodes.map((n) => n.id));
  const pipes = new Set(p.pipes.map((x) => x.id));
  if ([...sel.nodes].every((id) => nodes.has(id)) && [...sel.pipes].every((id) => pipes.has(id))) return sel;
  return {
    nodes: new Set([...sel.nodes].filter((id) => nodes.has(id))),
    pipes: new Set([...sel.pipes].filter((id) => pipes.has(id))),
  };
}

/**
 * Every user intent as a named action. Edits of the document go through `edit` and are undoable;
 * the rest (view, tool, selection) change the app state only and leave no undo step.
 */
export function createActions(store: AppStore) {
  const get = store.getState;
  const set = (patch: Partial<AppState>) => store.setState(patch);
  /** Edits waiting for code still loading, in the order they were made; null when none waits. */
  let waiting: Promise<void> | null = null;
  /** Whether a waiting edit is being made now: it is at the head of the queue and goes ahead at once. */
  let head = false;
  const later = (run: () => void, until: () => Promise<unknown> = loadChecks, what = 'the project checks') => {
    const ahead = waiting;
    const turn = () => {
      head = true;
      try {
        run();
      } finally {
        head = false;
      }
    };
    const next = (ahead ? ahead.then(until) : until()).then(turn, () =>
      set({
        notice: {
          tone: 'error',
          title: `That change was not made: ${what} could not be loaded`,
          lines: ['Reload the page (your project is kept) and make the change again.'],
        },
      }),
    );
    waiting = next;
    void next.finally(() => {
      if (waiting === next) waiting = null;
    });
  };
  /**
   * An undoable edit: a new document from the old one. A change that would leave the document
   * invalid (two nodes on one point, an ID above the OD) is refused with a message, never stored.
   * Only the parts the edit replaced are checked (`editProblemList`); a whole document that was checked
   * already (opened, restored) comes `checked` and is not checked again.
   */
  const edit = (change: (p: Project) => Project, typing?: string, checked = false): readonly string[] => {
    if (!waiting || head) return apply(change, typing, checked);
    later(() => apply(change, typing, checked));
    return NONE;
  };
  /** The last refusal shown: the next edit that goes through clears it from the screen (so does Dismiss). */
  let refusal: Notice | null = null;
  /** Makes the edit; the lines of its refusal when it was refused now (the field shows them too). */
  const apply = (change: (p: Project) => Project, typing: string | undefined, checked: boolean): readonly string[] => {
    const before = get().project;
    const after = change(before);
    if (after === before) return NONE;
    let problems: Problem[] = [];
    if (!checked && checksReady()) problems = checks().editProblemList(before, after);
    // The schema checks load after the first screen: until then an edit the check by hand passes
    // as a whole document is made at once; any other waits for them, and so do the edits after it.
    else if (!checked && !quickParse(after)) {
      later(() => apply(change, typing, checked));
      return NONE;
    }
    if (problems.length) {
      const wording = { project: after, units: get().units, marks: marksOf(before) };
      const lines = problems.map((p) => checks().refusalLine(p, wording));
      refusal = { tone: 'error', title: 'That change was not made: it would leave the project invalid', lines };
      set({ notice: refusal });
      return lines;
    }
    // Keystrokes into one text field within a moment of each other are one undo step, not one per letter.
    const now = Date.now();
    const same = typing !== undefined && lastTyping?.key === typing && now - lastTyping.at < TYPING_WINDOW_MS;
    lastTyping = typing === undefined ? null : { key: typing, at: now };
    if (same) history().pause();
    // A passing message ("Deleted 2 nodes — Ctrl+Z brings them back") is out of date after the next edit.
    // So is the refusal of an earlier edit, once an edit goes through.
    const shown = get().notice;
    const stale = shown?.tone === 'info' || (shown && shown === refusal) ? { notice: null } : {};
    set({ project: after, selection: prune(get().selection, after), ...stale });
    if (same) history().resume();
    return NONE;
  };
  /**
   * An edit of the route's shape (a run drawn, nodes moved or deleted, a leg's length): its code loads
   * after the first screen (state/routeEdits.ts); one made before it is here waits for it, in turn.
   */
  const withRouteEdits = (run: (ops: RouteEdits) => void) => {
    const ops = routeEdits();
    if (ops && (!waiting || head)) run(ops);
    // The schema checks too, so that an edit the check by hand would send to the back of the queue is
    // checked in its turn.
    else
      later(
        () => run(routeEdits()!),
        () =>
          loadRouteEdits().then(async () => {
            if (!checksReady()) await loadChecks();
          }),
        'the route editing',
      );
  };
  /** Runs `run` now, or after the edits waiting for their code when some wait. */
  const inTurn = (run: () => void) => (waiting && !head ? later(run, () => Promise.resolve()) : run());
  const history = () => store.temporal.getState();
  let liveStart: Project | null = null;
  let lastTyping: { key: string; at: number } | null = null;

  return {
    // ——— document edits (undoable)
    addRun: (start: RouteEnd, vertices: PlanPoint[], end: RouteEnd | null) =>
      withRouteEdits((ops) => {
        const before = routePieces(get().project).length;
        edit((p) => ops.addRoute(p, start, vertices, end, get().pipeSpec));
        const after = routePieces(get().project).length;
        // A run not joined to the main is sized alone, with dead-end blocks at both ends: say so at once.
        if (after > before && after > 1) set({ notice: ops.separateRunNotice(after) });
      }),
    moveNodes: (moves: ReadonlyMap<string, PlanPoint>) => {
      // The drag's preview shows the nodes where they go until the move is made; a later drag's is its own.
      const preview = get().dragPreview;
      withRouteEdits((ops) => {
        if (get().dragPreview === preview) set({ dragPreview: null });
        edit((p) => ops.moveNodes(p, moves));
      });
    },
    deleteSelection: () => {
      // What is selected when Delete is pressed, even if the route's edits are still loading.
      const { nodes, pipes } = get().selection;
      if (nodes.size + pipes.size === 0) return;
      withRouteEdits((ops) => {
        const before = get().project;
        edit((p) => ops.deleteItems(p, nodes, pipes));
        const after = get().project;
        if (after === before) return;
        set({ selection: EMPTY_SELECTION, notice: ops.deletedNotice(before, after) });
      });
    },
    updateNode: (id: string, patch: Partial<ProjectNode>) =>
      edit(
        (p) => ({ ...p, nodes: p.nodes.map((n) => (n.id === id ? { ...n, ...patch, id } : n)) }),
        'label' in patch ? `node-label-${id}` : undefined,
      ),
    /** Several nodes at once (a stretch laid on an even grade): one undo step. */
    updateNodes: (patches: ReadonlyMap<string, Partial<ProjectNode>>) =>
      edit((p) =>
        patches.size === 0
          ? p
          : { ...p, nodes: p.nodes.map((n) => (patches.has(n.id) ? { ...n, ...patches.get(n.id), id: n.id } : n)) },
      ),
    updatePipe: (id: string, patch: Partial<Pipe>) =>
      edit(
        (p) => ({ ...p, pipes: p.pipes.map((x) => (x.id === id ? { ...x, ...patch, id } : x)) }),
        'label' in patch ? `pipe-label-${id}` : undefined,
      ),
    /** A pipe's plan length, moving one of its nodes along it (the other stays). */
    setPipeLength: (id: string, length: number, moving: 'from' | 'to') =>
      withRouteEdits((ops) => edit((p) => ops.setPlanLength(p, id, length, moving))),
    /** Bedding and wrap for every pipe at once: one undo step. */
    setBeddingEverywhere: (patch: Pick<Partial<Pipe>, 'trenchType' | 'encasement'>) =>
      edit((p) =>
        p.pipes.every((x) => (Object.keys(patch) as (keyof typeof patch)[]).every((k) => x[k] === patch[k]))
          ? p
          : { ...p, pipes: p.pipes.map((x) => ({ ...x, ...patch })) },
      ),
    /** Puts a site-plan image under the route, or takes it away (undefined). */
    setUnderlay: (underlay: Underlay | undefined) => {
      set({ underlayPick: null });
      edit((p) => {
        if (underlay) return { ...p, underlay };
        const { underlay: _gone, ...rest } = p;
        return rest;
      });
    },
    /** Opacity, lock or placement of the underlay. */
    updateUnderlay: (patch: Partial<Underlay>) =>
      edit((p) => (p.underlay ? { ...p, underlay: { ...p.underlay, ...patch } } : p)),
    renameProject: (name: string) => edit((p) => ({ ...p, name }), 'project-name'),
    /** Display units are a view setting: no undo step, no change to any result. */
    setUnits: (units: Project['units']) => set({ units, pipeSpec: pipeForUnits(get().pipeSpec, units) }),
    updateDesign: (patch: Partial<Project['design']>) => edit((p) => ({ ...p, design: { ...p.design, ...patch } })),
    /** Title-block fields and the chainage style; typing in one field is one undo step. */
    updateSheet: (patch: Partial<Sheet>) =>
      edit((p) => ({ ...p, sheet: { ...sheetOf(p.sheet), ...patch } }), `sheet-${Object.keys(patch).join('-')}`),
    setWaterDensity: (density: number) => edit((p) => ({ ...p, water: { density } })),
    updateCase: (id: string, patch: Partial<LoadCase>) =>
      edit(
        (p) => ({ ...p, loadCases: p.loadCases.map((c) => (c.id === id ? { ...c, ...patch, id } : c)) }),
        'label' in patch ? `case-label-${id}` : undefined,
      ),
    addCase: (c: LoadCase) => edit((p) => ({ ...p, loadCases: [...p.loadCases, c] })),
    removeCase: (id: string) =>
      edit((p) => (p.loadCases.length <= 1 ? p : { ...p, loadCases: p.loadCases.filter((c) => c.id !== id) })),
    updateSoil: (id: string, patch: Partial<Soil>) =>
      edit(
        (p) => ({ ...p, soils: p.soils.map((s) => (s.id === id ? { ...s, ...patch, id } : s)) }),
        'label' in patch ? `soil-label-${id}` : 'source' in patch ? `soil-source-${id}` : undefined,
      ),
    addSoil: (soil: Soil) => edit((p) => ({ ...p, soils: [...p.soils, soil] })),
    removeSoil: (id: string) =>
      edit((p) => {
        if (p.soils.length <= 1) return p;
        const soils = p.soils.filter((s) => s.id !== id);
        const fallback = p.defaultSoil === id ? soils[0]!.id : p.defaultSoil;
        return {
          ...p,
          soils,
          ...(fallback !== undefined ? { defaultSoil: fallback } : {}),
          nodes: p.nodes.map((n) => (n.soil === id ? { ...n, soil: undefined } : n)),
        };
      }),
    setDefaultSoil: (id: string) => edit((p) => ({ ...p, defaultSoil: id })),
    /**
     * Replaces the whole document (open, new, another tab's copy); it is one undoable step like any
     * edit. Every caller hands a document that passed the whole-file check (`validated`, the file reader).
     */
    replaceProject: (project: Project) => {
      edit(() => project, undefined, true);
      set({
        units: project.units,
        pipeSpec: pipeForUnits(get().pipeSpec, project.units),
        selection: EMPTY_SELECTION,
        draw: { phase: 'idle' },
        dragPreview: null,
        underlayPick: null,
      });
      // A route opened into the old view may lie wholly off screen: show all of it.
      if (get().canvas.width > 0) set({ viewport: fittedView(planInputOf(get())) });
    },
    /** The document as last saved to or opened from a file: New asks before discarding anything else. */
    markSaved: (project: Project) => set({ fileBaseline: project }),

    /**
     * A live edit (a slider being dragged): changes show at once but leave no undo steps until it
     * ends, and then the whole gesture is one step.
     */
    beginLiveEdit: () => {
      if (liveStart) return; // a key held down repeats: the gesture began at the first press
      liveStart = get().project;
      set({ liveBase: liveStart });
      history().pause();
    },
    endLiveEdit: () => {
      if (!liveStart) return;
      const final = get().project;
      set({ project: liveStart });
      history().resume();
      liveStart = null;
      set({ liveBase: null });
      if (final !== get().project) set({ project: final });
    },
    /** A document change during a live edit (no undo step of its own). */
    liveEdit: (change: (p: Project) => Project) => set({ project: change(get().project) }),

    // ——— history
    // An undo waits its turn behind edits still waiting for their code, so that it undoes the last edit made.
    undo: () =>
      inTurn(() => {
        history().undo();
        set({ selection: prune(get().selection, get().project), dragPreview: null });
      }),
    redo: () =>
      inTurn(() => {
        history().redo();
        set({ selection: prune(get().selection, get().project) });
      }),

    // ——— view, tools and selection (not undoable)
    setViewport: (viewport: Viewport) => set({ viewport }),
    setCaseView: (caseView: CaseView) => set({ caseView }),
    setTool: (tool: ToolName) => set({ tool, draw: { phase: 'idle' } }),
    toggleSnapping: () => set({ snapping: !get().snapping }),
    setPipeSpec: (pipeSpec: PipeSpec) => set({ pipeSpec }),
    setDraw: (draw: DrawState) => set({ draw }),
    /** Starts picking two points on the underlay to calibrate it. */
    startUnderlayPick: () => set({ underlayPick: [] }),
    cancelUnderlayPick: () => set({ underlayPick: null }),
    setDragPreview: (dragPreview: ReadonlyMap<string, PlanPoint> | null) => set({ dragPreview }),
    select: (selection: Selection) => set({ selection }),
    selectNode: (id: string) => set({ selection: { nodes: new Set([id]), pipes: new Set() } }),
    /** Selects a fitting and brings it to the middle of the plan, close enough to read (schedule, details). */
    zoomToFitting: (id: string) => {
      const next = showFitting(planInputOf(get()), id);
      set({ selection: next.selection, viewport: next.viewport });
    },
    /** Selects a fitting and, when it is off screen, brings it to the middle at the same scale. */
    revealNode: (id: string) => {
      const next = planCommandReveal(planInputOf(get()), id);
      set({ selection: next.selection, viewport: next.viewport });
    },
    setLegendOpen: (legendOpen: boolean) => set({ legendOpen }),
    clearSelection: () => set({ selection: EMPTY_SELECTION }),
    setDrawer: (tab: DrawerTab, height?: AppState['drawer']['height']) =>
      set({ drawer: { tab, height: height ?? (get().drawer.height === 'closed' ? 'low' : get().drawer.height) } }),
    setDrawerHeight: (height: AppState['drawer']['height']) => set({ drawer: { ...get().drawer, height } }),
    notify: (notice: AppState['notice']) => set({ notice }),
  };
}

export type Actions = ReturnType<typeof createActions>;
