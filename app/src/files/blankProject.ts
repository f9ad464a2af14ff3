import {
  findLibrarySoil,
  FOOT,
  INCH,
  librarySoilToProject,
  POUND_PER_CUBIC_FOOT_WEIGHT,
  PSI,
  type Project,
  type UnitSystem,
} from '@mainbrace/solver';
import { FIRST_NODE } from '../state/documentEdits.js';

/**
 * The defaults that are round figures in their own system: the same choices (pressures, datum, block
 * depth, construction step, laying length, concrete) written as an office in that system writes them,
 * so that a new US project reads 85 psi and a 2 ft block depth, not 87.02 psi and 1.969 ft. US laying
 * length 20 ft, a usual ductile-iron length (common practice); 150 lbf/ft³ concrete (common practice).
 */
const DEFAULTS: Record<
  UnitSystem,
  {
    pressures: [working: number, surge: number, test: number];
    design: Pick<Project['design'], 'concreteUnitWeight' | 'blockDepth' | 'dimensionStep' | 'layingLength'>;
  }
> = {
  si: {
    pressures: [600e3, 900e3, 1000e3],
    design: { concreteUnitWeight: 23600, blockDepth: 0.6, dimensionStep: 0.05, layingLength: 6 },
  },
  us: {
    pressures: [85 * PSI, 130 * PSI, 145 * PSI],
    design: {
      concreteUnitWeight: 150 * POUND_PER_CUBIC_FOOT_WEIGHT,
      blockDepth: 2 * FOOT,
      dimensionStep: 2 * INCH,
      layingLength: 20 * FOOT,
    },
  },
};

/** A project with no route: the usual three cases and one soil, ready to draw on, in `units`. */
export function blankProject(units: UnitSystem = 'si'): Project {
  const d = DEFAULTS[units];
  // the cases are stated at the level a first node takes, so a route drawn flat reads them as given
  const datum = FIRST_NODE[units].elevation;
  const [working, surge, test] = d.pressures;
  return {
    format: 'mainbrace-project',
    version: 1,
    name: 'Untitled main',
    units,
    water: { density: 998.2 },
    design: {
      thrustArea: 'outside',
      bearingSafetyFactor: 1.5,
      upliftSafetyFactor: 1.5,
      restraintSafetyFactor: 1.5,
      groundwaterElevation: null,
      trenchWidth: null,
      ...d.design,
    },
    loadCases: [
      { id: 'working', label: 'Working', kind: 'working', pressure: working, datumElevation: datum, flowFactor: 1 },
      { id: 'surge', label: 'Working + surge', kind: 'surge', pressure: surge, datumElevation: datum, flowFactor: 1 },
      { id: 'test', label: 'Field test', kind: 'test', pressure: test, datumElevation: datum, flowFactor: 0 },
    ],
    // The common-practice sand class, as a project soil: a modest bearing until the user gives site data.
    soils: [{ ...librarySoilToProject(findLibrarySoil('sand-cp')!, 'sand'), label: 'Sand' }],
    defaultSoil: 'sand',
    nodes: [],
    pipes: [],
  };
}
