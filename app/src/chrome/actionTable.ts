/**
 * Every command the user can give, in one table: its name, label, keys and what it does to the undo
 * history. The window's shortcuts, the tool strip's tooltips and the File and Export menus are all
 * generated from it, so a key shown in a tooltip is the key that works.
 *
 * undo: 'step' — one undo step per use; 'coalesce' — repeated uses in a moment are one step (typing,
 * nudging); 'none' — leaves the design and its history alone (view, tool, selection, history itself).
 */
export type UndoBehaviour = 'step' | 'coalesce' | 'none';

/** Where a command may be given: anywhere in the window, or only while the plan has the keyboard focus. */
export type ActionScope = 'window' | 'plan';

export interface ActionSpec {
  name: ActionName;
  label: string;
  /** key chords, e.g. 'Mod+Z' (Ctrl, or ⌘ on a Mac), 'Shift+Tab', 'ArrowLeft', '+' */
  keys: readonly string[];
  undo: UndoBehaviour;
  scope: ActionScope;
  /** a menu it appears in, in table order */
  menu?: 'file' | 'export';
}

export type ActionName =
  | 'new'
  | 'open'
  | 'save'
  | 'exportCsv'
  | 'exportJson'
  | 'exportGeoJson'
  | 'exportQuantities'
  | 'print'
  | 'undo'
  | 'redo'
  | 'toolSelect'
  | 'toolDraw'
  | 'toolPan'
  | 'toggleSnapping'
  | 'fit'
  | 'delete'
  | 'cancel'
  | 'finish'
  | 'panLeft'
  | 'panRight'
  | 'panUp'
  | 'panDown'
  | 'zoomIn'
  | 'zoomOut'
  | 'nextFitting'
  | 'previousFitting';

export const ACTIONS: readonly ActionSpec[] = [
  { name: 'new', label: 'New project', keys: [], undo: 'step', scope: 'window', menu: 'file' },
  {
    name: 'open',
    label: 'Open a project file, or import a route (a CSV survey or a GeoJSON file)',
    keys: ['Mod+O'],
    undo: 'step',
    scope: 'window',
    menu: 'file',
  },
  { name: 'save', label: 'Save the project file', keys: ['Mod+S'], undo: 'none', scope: 'window', menu: 'file' },
  { name: 'exportCsv', label: 'Schedule as CSV', keys: [], undo: 'none', scope: 'window', menu: 'export' },
  { name: 'exportJson', label: 'Schedule as JSON', keys: [], undo: 'none', scope: 'window', menu: 'export' },
  {
    name: 'exportGeoJson',
    label: 'Design as GeoJSON (for a GIS)',
    keys: [],
    undo: 'none',
    scope: 'window',
    menu: 'export',
  },
  {
    name: 'exportQuantities',
    label: 'Quantities as CSV',
    keys: [],
    undo: 'none',
    scope: 'window',
    menu: 'export',
  },
  { name: 'print', label: 'Print the schedule…', keys: [], undo: 'none', scope: 'window', menu: 'export' },
  { name: 'undo', label: 'Undo', keys: ['Mod+Z'], undo: 'none', scope: 'window' },
  { name: 'redo', label: 'Redo', keys: ['Mod+Shift+Z', 'Mod+Y'], undo: 'none', scope: 'window' },
  {
    name: 'toolSelect',
    label: 'Select and move — drag empty ground to pan, Shift-drag to box-select',
    keys: ['V'],
    undo: 'none',
    scope: 'window',
  },
  { name: 'toolDraw', label: 'Draw main', keys: ['D'], undo: 'none', scope: 'window' },
  { name: 'toolPan', label: 'Pan', keys: ['H'], undo: 'none', scope: 'window' },
  {
    name: 'toggleSnapping',
    label: 'Snap to standard bends, whole lengths, nodes and pipes',
    keys: ['S'],
    undo: 'none',
    scope: 'window',
  },
  { name: 'fit', label: 'Fit the route to the view', keys: ['F'], undo: 'none', scope: 'window' },
  { name: 'delete', label: 'Delete the selection', keys: ['Delete', 'Backspace'], undo: 'step', scope: 'window' },
  {
    name: 'cancel',
    label: 'Cancel the run being drawn, or clear the selection',
    keys: ['Escape'],
    undo: 'none',
    scope: 'window',
  },
  {
    name: 'finish',
    label: 'Finish the run, or open the selected fitting’s details',
    keys: ['Enter'],
    undo: 'step',
    scope: 'plan',
  },
  { name: 'panLeft', label: 'Pan left', keys: ['ArrowLeft'], undo: 'none', scope: 'plan' },
  { name: 'panRight', label: 'Pan right', keys: ['ArrowRight'], undo: 'none', scope: 'plan' },
  { name: 'panUp', label: 'Pan up', keys: ['ArrowUp'], undo: 'none', scope: 'plan' },
  { name: 'panDown', label: 'Pan down', keys: ['ArrowDown'], undo: 'none', scope: 'plan' },
  { name: 'zoomIn', label: 'Zoom in', keys: ['+', '='], undo: 'none', scope: 'plan' },
  { name: 'zoomOut', label: 'Zoom out', keys: ['-'], undo: 'none', scope: 'plan' },
  { name: 'nextFitting', label: 'Next fitting in chainage order', keys: ['Tab'], undo: 'none', scope: 'plan' },
  { name: 'previousFitting', label: 'Previous fitting', keys: ['Shift+Tab'], undo: 'none', scope: 'plan' },
];

const BY_NAME = new Map(ACTIONS.map((a) => [a.name, a]));

export const actionSpec = (name: ActionName): ActionSpec => BY_NAME.get(name)!;

/** A pressed key as the table spells it. */
export interface KeyPress {
  key: string;
  shift?: boolean;
  ctrl?: boolean;
  meta?: boolean;
  alt?: boolean;
}

/** The chord of a key press, e.g. 'Mod+Shift+Z'; Shift counts only with named keys and with Ctrl, ⌘ or Alt. */
export function chordOf(k: KeyPress): string {
  const parts: string[] = [];
  if (k.ctrl || k.meta) parts.push('Mod');
  if (k.alt) parts.push('Alt');
  const letter = k.key.length === 1 && /[a-z]/i.test(k.key);
  const named = k.key.length > 1;
  // A letter with Shift alone is the same command (Caps Lock, a held Shift); with Ctrl it is another.
  if (k.shift && (named || (letter && (k.ctrl || k.meta || k.alt)))) parts.push('Shift');
  parts.push(letter ? k.key.toUpperCase() : k.key);
  return parts.join('+');
}

const BY_CHORD = new Map<string, ActionSpec>();
for (const a of ACTIONS) for (const k of a.keys) BY_CHORD.set(k, a);

/** The command a key press gives, if any. */
export const actionForKey = (k: KeyPress): ActionSpec | undefined => BY_CHORD.get(chordOf(k));

/** How a chord is written in a tooltip: 'Ctrl+Shift+Z'. */
export const keyLabel = (chord: string) => chord.replace('Mod', 'Ctrl').replace('Arrow', '');

/** 'Label (V)' or 'Label (Ctrl+Z or Ctrl+Y)': the tooltip of a command. */
export function titleOf(name: ActionName): string {
  const a = actionSpec(name);
  return a.keys.length ? `${a.label} (${a.keys.map(keyLabel).join(' or ')})` : a.label;
}
