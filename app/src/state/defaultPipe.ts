import { findSize, type UnitSystem } from '@mainbrace/solver';
import type { PipeSpec } from './documentEdits.js';

/** The series and size new runs are drawn with in each system: DN 200 ductile iron, or 8-in class 350. */
const DEFAULT_SIZE: Record<UnitSystem, [series: string, nominal: string]> = {
  si: ['di-en545', 'DN200'],
  us: ['di-awwa-pc350', '8'],
};

/** The pipe new runs are drawn with in `units`, until the user picks another. */
export function defaultPipe(units: UnitSystem): PipeSpec {
  const [series, nominal] = DEFAULT_SIZE[units];
  const size = findSize(series, nominal)!;
  return {
    outsideDiameter: size.outsideDiameter,
    insideDiameter: size.insideDiameter,
    material: 'ductile-iron',
    series,
    nominal,
  };
}

/**
 * The pipe to draw with once the units are `units`: the other system's default gives way to this one's
 * (a US project drawn with DN 200 EN 545 sizes its thrusts on a pipe 3 % narrower than 8-in AWWA), a
 * pipe the user picked stays.
 */
export function pipeForUnits(current: PipeSpec, units: UnitSystem): PipeSpec {
  const other: UnitSystem = units === 'si' ? 'us' : 'si';
  const [series, nominal] = DEFAULT_SIZE[other];
  return current.series === series && current.nominal === nominal ? defaultPipe(units) : current;
}
