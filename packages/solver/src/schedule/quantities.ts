import type { Project } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';
import type { UnitSystem } from '../units/conversions.js';
import { columnNumber, columnUnit, shownValue } from './columnUnits.js';
import { fittingTitle } from './fittingNames.js';
import { anchorBox } from './settingOut.js';
import type { ScheduleFitting } from './scheduleRows.js';
import { anchorConcrete, concretePieces, type ConcreteElement } from './concrete.js';
import { restrainedStretches, stretchJoints } from './restrainedStretches.js';

export type { ConcreteElement } from './concrete.js';

export const CONCRETE_ELEMENT_NAME: Record<ConcreteElement, string> = {
  block: 'Bearing blocks',
  reverseBlock: 'Opposite blocks',
  anchor: 'Gravity anchors',
  pad: 'Trench-bottom pads',
};

export interface ConcreteLine {
  element: ConcreteElement;
  count: number;
  /** m³, net of waste */
  volume: number;
  /** marks of the fittings, in crew order */
  marks: string[];
}

export interface JointLine {
  /** the pipe size as the project names it ("DN300"), else its outside diameter in display units */
  size: string;
  /** m, the largest outside diameter of the size, for ordering */
  outsideDiameter: number;
  /** joints to restrain */
  joints: number;
  /** m of restrained pipe */
  length: number;
}

export interface FittingLine {
  /** "Bend 45°" */
  fitting: string;
  /** "DN300", "DN300 × DN150" */
  size: string;
  count: number;
  marks: string[];
}

export interface AnchorLine {
  length: number;
  width: number;
  height: number;
  /** true while the anchor sizing gives a cube of its volume only */
  cube: boolean;
  count: number;
  /** m³ each, as built (length × width × height) */
  volume: number;
  marks: string[];
}

/** Quantities take-off: concrete by element and total with waste, joints, fittings, anchors. SI. */
export interface TakeOff {
  concrete: ConcreteLine[];
  /** m³, sum of the elements */
  concreteNet: number;
  /** fraction added for waste */
  waste: number;
  /** m³, net × (1 + waste) */
  concreteOrdered: number;
  joints: JointLine[];
  fittings: FittingLine[];
  anchors: AnchorLine[];
}

/** The project's waste allowance, or the register's default when it states none. */
export const concreteWaste = (project: Project): number =>
  project.design.concreteWaste ?? VALUES['quantities.concrete-waste'];

/**
 * The take-off of some schedule rows (a page's or the whole job's). Pipe sizes are named by the
 * project's nominal size where the pipe has one, else by the outside diameter in display units.
 * The concrete is each fitting's pieces (`concretePieces`), each as its row shows it in `units` (rounded up).
 */
export function takeOff(fittings: readonly ScheduleFitting[], project: Project, units: UnitSystem): TakeOff {
  const pipes = new Map(project.pipes.map((p) => [p.id, p]));
  // A nominal size that is a bare number is in inches (the AWWA series name their sizes so: "8", "12").
  const sizeOf = (pipe: string, od: number) => {
    const nominal = pipes.get(pipe)?.nominal;
    if (nominal !== undefined) return /^\d+(\.\d+)?$/.test(nominal.trim()) ? `${nominal.trim()} in` : nominal;
    return `${columnNumber(od, 'diameter', units)} ${columnUnit('diameter', units)}`;
  };
  const concrete = new Map<ConcreteElement, ConcreteLine>();
  // Each piece as its fitting's row prints it (rounded up in the display unit), so that every line and
  // total is the sum of what the sheet lists.
  const addConcrete = (element: ConcreteElement, volume: number, mark: string) => {
    const line = concrete.get(element) ?? { element, count: 0, volume: 0, marks: [] };
    line.count++;
    line.volume += shownValue(volume, 'volume', units);
    line.marks.push(mark);
    concrete.set(element, line);
  };
  const joints = new Map<string, JointLine>();
  const kinds = new Map<string, FittingLine>();
  const anchors = new Map<string, AnchorLine>();
  for (const f of fittings) {
    const r = f.restraint;
    for (const p of concretePieces(r, project.design.dimensionStep, units)) addConcrete(p.element, p.volume, f.mark);
    if (r.anchor) {
      const box = anchorBox(r.anchor);
      const key = `${box.length}|${box.width}|${box.height}`;
      const built = anchorConcrete(r.anchor, units);
      const line = anchors.get(key) ?? { ...box, count: 0, volume: shownValue(built, 'volume', units), marks: [] };
      line.count++;
      line.marks.push(f.mark);
      anchors.set(key, line);
    }
    const sizes = [...new Map(f.pipes.map((p) => [sizeOf(p.id, p.outsideDiameter), p.outsideDiameter])).entries()]
      .sort((a, b) => b[1] - a[1])
      .map(([s]) => s);
    const fitting = fittingTitle(f);
    const size = sizes.join(' × ');
    const key = `${fitting}|${size}`;
    const line = kinds.get(key) ?? { fitting, size, count: 0, marks: [] };
    line.count++;
    line.marks.push(f.mark);
    kinds.set(key, line);
  }
  // Restrained pipe each metre once: zones of neighbouring fittings that overlap restrain the pipe between
  // them, not twice its length. Each stretch as a crew would measure it, rounded up as a row shows it.
  const jointLine = (pipe: string) => {
    const od = pipes.get(pipe)?.outsideDiameter ?? 0;
    const size = sizeOf(pipe, od);
    const line = joints.get(size) ?? { size, outsideDiameter: od, joints: 0, length: 0 };
    line.outsideDiameter = Math.max(line.outsideDiameter, od);
    joints.set(size, line);
    return line;
  };
  const stretches = restrainedStretches(project, fittings);
  for (const s of stretches) jointLine(s.pipe).length += shownValue(s.end - s.start, 'restrained', units);
  for (const [pipe, n] of stretchJoints(project, stretches, project.design.layingLength)) jointLine(pipe).joints += n;
  const order: ConcreteElement[] = ['block', 'reverseBlock', 'anchor', 'pad'];
  const lines = order.flatMap((e) => (concrete.has(e) ? [concrete.get(e)!] : []));
  const net = lines.reduce((v, l) => v + l.volume, 0);
  const waste = concreteWaste(project);
  return {
    concrete: lines,
    concreteNet: net,
    waste,
    concreteOrdered: net * (1 + waste),
    joints: [...joints.values()].sort((a, b) => b.outsideDiameter - a.outsideDiameter),
    fittings: [...kinds.values()].sort(
      (a, b) =>
        a.fitting.localeCompare(b.fitting, undefined, { numeric: true }) ||
        a.size.localeCompare(b.size, undefined, { numeric: true }),
    ),
    anchors: [...anchors.values()].sort((a, b) => b.volume - a.volume),
  };
}

/** One line of the take-off as every output shows it (CSV, command line, app, print). */
export interface TakeOffRow {
  section: 'Concrete' | 'Restrained joints' | 'Fittings' | 'Anchors';
  item: string;
  size: string;
  count: string;
  quantity: string;
  unit: string;
  marks: string;
  /** a total line, shown strong */
  total?: boolean;
}

const dims = (units: UnitSystem, ...m: number[]) => m.map((x) => columnNumber(x, 'built', units)).join(' × ');

/** The take-off as lines of text in display units: made here only, so that every output agrees. */
export function takeOffRows(t: TakeOff, units: UnitSystem): TakeOffRow[] {
  const vol = (v: number) => columnNumber(v, 'volume', units);
  const vu = columnUnit('volume', units);
  const rows: TakeOffRow[] = t.concrete.map((l) => ({
    section: 'Concrete',
    item: CONCRETE_ELEMENT_NAME[l.element],
    size: '',
    count: String(l.count),
    quantity: vol(l.volume),
    unit: vu,
    marks: l.marks.join(', '),
  }));
  if (t.concrete.length) {
    rows.push(
      { section: 'Concrete', item: 'Net', size: '', count: '', quantity: vol(t.concreteNet), unit: vu, marks: '' },
      {
        section: 'Concrete',
        item: `Waste allowance ${Math.round(t.waste * 1000) / 10} %`,
        size: '',
        count: '',
        quantity: vol(t.concreteOrdered - t.concreteNet),
        unit: vu,
        marks: '',
      },
      {
        section: 'Concrete',
        item: 'Total to order',
        size: '',
        count: '',
        quantity: vol(t.concreteOrdered),
        unit: vu,
        marks: '',
        total: true,
      },
    );
  }
  for (const j of t.joints)
    rows.push({
      section: 'Restrained joints',
      item: 'Joints to restrain',
      size: j.size,
      count: String(j.joints),
      quantity: columnNumber(j.length, 'restrained', units),
      unit: columnUnit('restrained', units),
      marks: '',
    });
  for (const f of t.fittings)
    rows.push({
      section: 'Fittings',
      item: f.fitting,
      size: f.size,
      count: String(f.count),
      quantity: '',
      unit: '',
      marks: f.marks.join(', '),
    });
  for (const a of t.anchors)
    rows.push({
      section: 'Anchors',
      item: `${dims(units, a.length, a.width, a.height)}${a.cube ? ' cube' : ''} (${columnUnit('built', units)}, L × W × H)`,
      size: '',
      count: String(a.count),
      quantity: vol(a.volume),
      unit: `${vu} each`,
      marks: a.marks.join(', '),
    });
  return rows;
}
