import { formatSi, type FittingAnalysis, type FittingKind, type UnitSystem } from '@mainbrace/solver';

export const KIND_NAME: Record<FittingKind, string> = {
  bend: 'Bend',
  reducer: 'Reducer',
  'reducing-bend': 'Reducing bend',
  tee: 'Tee',
  wye: 'Wye',
  cross: 'Cross',
  'dead-end': 'Dead end',
  valve: 'Closed valve',
  'tie-in': 'Tie-in',
  straight: 'Straight joint',
  none: 'Free node',
};

/** "Bend 45°", "Tee, branch 90°", "Dead end": the fitting as a crew would name it. */
export function fittingTitle(f: FittingAnalysis, units: UnitSystem): string {
  const g = f.geometry;
  const name = KIND_NAME[g.kind];
  if (g.deflection !== null && g.kind !== 'valve' && g.kind !== 'reducer')
    return `${name} ${formatSi(g.deflection, 'angle', units)}`;
  if (g.branchAngle !== null) return `${name}, branch at ${formatSi(g.branchAngle, 'angle', units)}`;
  return name;
}

const COMPASS = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'];

/**
 * Direction of a horizontal thrust as a whole-degree bearing clockwise from north with its compass
 * point — the side of the fitting the block goes on: "169° S".
 */
export const bearingText = (deg: number | null): string =>
  deg === null ? '—' : `${Math.round(deg) % 360}° ${COMPASS[Math.round(deg / 45) % 8]}`;
