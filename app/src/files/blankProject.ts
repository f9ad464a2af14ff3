import { findLibrarySoil, librarySoilToProject, type Project } from '@mainbrace/solver';

/** A project with no route: the usual three cases and one soil, ready to draw on. */
export function blankProject(): Project {
  return {
    format: 'mainbrace-project',
    version: 1,
    name: 'Untitled main',
    units: 'si',
    water: { density: 998.2 },
    design: {
      thrustArea: 'outside',
      bearingSafetyFactor: 1.5,
      upliftSafetyFactor: 1.5,
      restraintSafetyFactor: 1.5,
      concreteUnitWeight: 23600,
      groundwaterElevation: null,
      blockDepth: 0.6,
      trenchWidth: null,
      dimensionStep: 0.05,
      layingLength: 6,
    },
    loadCases: [
      { id: 'working', label: 'Working', kind: 'working', pressure: 600e3, datumElevation: 100, flowFactor: 1 },
      { id: 'surge', label: 'Working + surge', kind: 'surge', pressure: 900e3, datumElevation: 100, flowFactor: 1 },
      { id: 'test', label: 'Field test', kind: 'test', pressure: 1000e3, datumElevation: 100, flowFactor: 0 },
    ],
    // The common-practice sand class, as a project soil: a modest bearing until the user gives site data.
    soils: [{ ...librarySoilToProject(findLibrarySoil('sand-cp')!, 'sand'), label: 'Sand' }],
    defaultSoil: 'sand',
    nodes: [],
    pipes: [],
  };
}
