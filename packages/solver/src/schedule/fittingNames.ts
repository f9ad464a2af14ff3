import { standardBendFor, type FittingKind } from '../network/fittingKind.js';

/** A fitting kind as a crew names it. */
export const KIND_NAME: Record<FittingKind, string> = {
  bend: 'Bend',
  reducer: 'Reducer',
  'reducing-bend': 'Reducing bend',
  tee: 'Tee',
  wye: 'Wye',
  cross: 'Cross',
  'dead-end': 'Dead end',
  valve: 'Valve',
  'tie-in': 'Tie-in',
  straight: 'Straight joint',
  none: 'Free node',
};

const COMPASS = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'];

/** Eight-point compass name of a plan bearing, degrees clockwise from north. */
export const compassPoint = (deg: number): string => COMPASS[Math.round((((deg % 360) + 360) % 360) / 45) % 8]!;

/** "169° S": a bearing as a whole degree and its compass point, "—" when there is none. */
export const bearingText = (deg: number | null): string =>
  deg === null || !Number.isFinite(deg) ? '—' : `${Math.round(deg) % 360}° ${compassPoint(deg)}`;

/** Deflection as an engineer writes it: 22.5°, 11.25°, 90°. */
export const angleText = (deg: number): string => `${Math.round(deg * 100) / 100}°`;

type Findings = readonly { code: string; values: Readonly<Record<string, number>> }[];

/** The degrees a junction's run turns (its fitting.bent-run finding), or undefined. */
const runTurnOf = (diagnostics: Findings | undefined): number | undefined =>
  diagnostics?.find((d) => d.code === 'fitting.bent-run')?.values.turn;

/** The fitting's kind as a crew names it: a junction whose run turns is a junction, not a wye to order. */
export const kindName = (g: { kind: FittingKind; diagnostics?: Findings }): string =>
  runTurnOf(g.diagnostics) !== undefined ? 'Junction' : KIND_NAME[g.kind];

/**
 * "Bend 45°", "Bend 16.31° crest", "Tee, branch 90°", "Dead end": the fitting as a crew names it; a bend
 * with a vertical part says whether it is a crest (thrust up) or a sag (thrust down).
 */
export function fittingTitle(g: {
  kind: FittingKind;
  deflection: number | null;
  branchAngle: number | null;
  profile?: 'crest' | 'sag' | null;
  /** the fitting's findings: a junction whose run turns (fitting.bent-run) is named as one, not a wye */
  diagnostics?: Findings;
}): string {
  const turn = runTurnOf(g.diagnostics);
  const name = turn !== undefined ? `Junction, run turns ${Math.round(turn * 10) / 10}°` : kindName(g);
  // A bend is named as the fitting a crew orders; the thrust keeps the angle drawn.
  if (g.deflection !== null && g.kind !== 'valve' && g.kind !== 'reducer')
    return `${name} ${angleText(standardBendFor(g.deflection) ?? g.deflection)}${g.profile ? ` ${g.profile}` : ''}`;
  // A branch's angle in space takes the grades of both pipes (a spur square to a main in plan reads
  // 89.99° when they fall differently): a tenth of a degree names the fitting a crew sets; the thrust
  // keeps the full angle.
  if (g.branchAngle !== null) return `${name}, branch at ${Math.round(g.branchAngle * 10) / 10}°`;
  return name;
}
