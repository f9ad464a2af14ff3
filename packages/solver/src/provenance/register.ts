import type { ProvenanceEntry } from './entry.js';

const DIPRA = 'DIPRA, Thrust Restraint Design for Ductile Iron Pipe, 7th ed. (2016)';

/**
 * The one register of every coefficient, table, formula and default the solver relies on. Code reads
 * its values from here, so that what a result depends on is also what the calculation record and the
 * print list. docs/provenance.md is generated from it.
 */
export const REGISTER = {
  'gravity.standard': {
    quantity: 'Standard acceleration of gravity g',
    value: 9.80665,
    unit: 'm/s²',
    kind: 'published',
    source: 'NIST SP 330 (2019), The International System of Units; 3rd CGPM (1901)',
    verified: true,
  },
  'units.conversions': {
    quantity: 'US customary to SI conversion factors (inch, foot, pound-force, psi, psf, cubic yard, gallon)',
    value: null,
    unit: '—',
    kind: 'published',
    source: 'NIST SP 811 (2008), Guide for the Use of the International System of Units',
    clause: 'Appendix B.8 and B.9',
    verified: true,
  },
  'water.density': {
    quantity: 'Default density of water (20 °C)',
    value: 998.2,
    unit: 'kg/m³',
    kind: 'published',
    source: 'Tanaka et al. (2001), Recommended table for the density of water, Metrologia 38:301',
    clause: 'Table, 20 °C',
    verified: false,
  },
  'water.vapour-floor': {
    quantity: 'Lowest gauge pressure of water in a pipe: vapour pressure at 20 °C less one standard atmosphere',
    value: 2339 - 101325,
    unit: 'Pa',
    kind: 'published',
    source: 'Steam tables, saturation pressure at 20 °C (2.339 kPa); standard atmosphere 101.325 kPa (NIST SP 811)',
    verified: false,
  },
  'concrete.unit-weight': {
    quantity: 'Default unit weight of normal-weight concrete (≈ 150 lb/ft³)',
    value: 23600,
    unit: 'N/m³',
    kind: 'common practice',
    source: 'Usual design value for normal-weight concrete',
    verified: true,
  },
  'design.safety-factor': {
    quantity: 'Default safety factor on bearing, uplift and restrained length',
    value: 1.5,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'S_f = 1.5 (as reproduced in a University of Toledo CET-2030 course handout)',
    verified: false,
  },
  'design.dimension-step': {
    quantity: 'Default construction step: built dimensions are rounded up to it',
    value: 0.05,
    unit: 'm',
    kind: 'own rule',
    source: 'A 50 mm step a crew can build to, the same whatever the display units',
    verified: true,
  },
  'design.block-depth': {
    quantity: 'Default thickness of a bearing block from the fitting to its bearing face',
    value: 0.6,
    unit: 'm',
    kind: 'common practice',
    source: 'Usual block thickness behind a fitting',
    verified: true,
  },
  'trench.clearance': {
    quantity: 'Clear width each side of the pipe when the trench width is not given',
    value: 0.3,
    unit: 'm',
    kind: 'common practice',
    source: 'Usual trench clearance each side of the pipe',
    verified: true,
  },
  'block.across-trench': {
    quantity: 'A bearing face within this plan angle of a pipe’s axis stands across that pipe’s trench',
    value: 30,
    unit: '°',
    kind: 'own rule',
    source: 'Mainbrace rule for the face-width check',
    verified: true,
  },
  'block.bearing-area': {
    quantity: 'Required bearing area A = SF·T/σ_b',
    value: null,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'bearing-block equation A_b = T·S_f/S_b (as reproduced in a University of Toledo CET-2030 course handout)',
    verified: true,
  },
  'block.face-rule': {
    quantity: 'Face height at least the pipe OD and at most half the depth to the block bottom',
    value: null,
    unit: '—',
    kind: 'own rule',
    source: 'Mainbrace face-proportion rule (no published source states it)',
    verified: true,
  },
  'passive.rankine': {
    quantity: 'Rankine passive earth pressure with cohesion, Kp = tan²(45° + φ/2)',
    value: null,
    unit: '—',
    kind: 'published',
    source: 'Rankine (1857); Craig, Soil Mechanics, chapter on lateral earth pressure',
    verified: true,
  },
  'anchor.weight-rule': {
    quantity: 'Gravity anchor: weight at least SF × the upward thrust (statics)',
    value: null,
    unit: '—',
    kind: 'derived',
    source: 'Vertical equilibrium of the anchor',
    verified: true,
  },
  'anchor.base-friction': {
    quantity: 'Sliding resistance of a cast-in-place base, tan(⅔·φ) on the normal force',
    value: 2 / 3,
    unit: '—',
    kind: 'common practice',
    source: 'Usual friction of concrete cast on soil, δ = ⅔·φ',
    verified: true,
  },
  'pad.bearing-area': {
    quantity: 'Trench-bottom bearing A = SF·T_down/σ_v',
    value: null,
    unit: '—',
    kind: 'derived',
    source: 'The bearing-block equation applied to the trench bottom',
    verified: true,
  },
  'joints.trench-coefficient': {
    quantity: 'Trench-type coefficient K_n for laying conditions 1–5',
    value: { 1: 0.2, 2: 0.4, 3: 0.6, 4: 0.85, 5: 1.0 },
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'table of trench-type coefficients K_n',
    verified: false,
  },
  'joints.default-trench-type': {
    quantity: 'Laying condition assumed when a pipe states none',
    value: 3,
    unit: '—',
    kind: 'common practice',
    source: 'Usual bedded trench (AWWA C150/C151 laying condition 3)',
    verified: true,
  },
  'joints.friction-ratio': {
    quantity: 'Pipe–soil friction ratio f_φ in δ = f_φ·φ (default)',
    value: 0.5,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'soil-parameter table, f_φ',
    verified: false,
  },
  'joints.adhesion-ratio': {
    quantity: 'Pipe–soil adhesion ratio f_c in C_p = f_c·c (default)',
    value: 0.5,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'soil-parameter table, f_c',
    verified: false,
  },
  'joints.encasement-factor': {
    quantity: 'Friction on polyethylene-encased pipe relative to bare pipe (adhesion neglected)',
    value: 0.7,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'unit frictional resistance of polyethylene-encased pipe',
    verified: false,
  },
  'joints.bend-equation': {
    quantity: 'Restrained length at a horizontal bend L = S_f·P·A·tan(θ/2)/(F_s + ½·R_s)',
    value: null,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'horizontal bend equation',
    verified: false,
  },
  'joints.axial-equation': {
    quantity: 'Restrained length at dead ends, tees, reducers and valves L = S_f·T/F_s',
    value: null,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'dead end, tee and reducer equations',
    verified: false,
  },
  'joints.uplift-equation': {
    quantity: 'Restrained length at a bend with upward thrust: the bearing term replaced by the hold-down weight',
    value: null,
    unit: '—',
    kind: 'derived',
    source: DIPRA,
    clause: 'vertical down-bend equation (this form derived by analogy with the horizontal bend)',
    verified: false,
  },
  'joints.bearing-pressure': {
    quantity: 'Bearing pressure on the pipe side P_p taken as the Rankine passive pressure at the centreline',
    value: null,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'unit bearing resistance R_s = K_n·P_p·D',
    verified: false,
  },
  'material.density': {
    quantity: 'Pipe material density for self-weight (ductile iron, PVC, HDPE, steel)',
    value: { 'ductile-iron': 7050, pvc: 1400, hdpe: 955, steel: 7850 },
    unit: 'kg/m³',
    kind: 'published',
    source: 'EN 545 (ductile iron); ASTM D1784 (PVC 12454); ASTM D3350 (PE4710); usual carbon-steel value',
    verified: false,
  },
  'fitting.straight-tolerance': {
    quantity: 'Two pipes deflecting less than this are a straight joint',
    value: 0.5,
    unit: '°',
    kind: 'own rule',
    source: 'Mainbrace project format (docs/project-format.md)',
    verified: true,
  },
  'fitting.run-tolerance': {
    quantity: 'A run through a tee or cross may deviate this much from straight',
    value: 5,
    unit: '°',
    kind: 'own rule',
    source: 'Mainbrace fitting classification',
    verified: true,
  },
  'fitting.tee-tolerance': {
    quantity: 'A branch within this of square to its run is a tee, otherwise a wye',
    value: 10,
    unit: '°',
    kind: 'own rule',
    source: 'Mainbrace fitting classification',
    verified: true,
  },
} as const satisfies Record<string, ProvenanceEntry>;

export type ProvenanceId = keyof typeof REGISTER;

export const provenance = (id: ProvenanceId): ProvenanceEntry => REGISTER[id];

/** The entries among `ids` that were not read in their source, in register order. */
export function unverified(ids: Iterable<ProvenanceId>): ProvenanceId[] {
  const list = [...ids];
  if (list.length === 0) return [];
  // A schedule asks this for every fitting, and fittings share a handful of bases: remember each.
  const key = list.join('\u0000');
  let found = unverifiedOf.get(key);
  if (!found) {
    const wanted = new Set(list);
    found = (Object.keys(REGISTER) as ProvenanceId[]).filter((id) => wanted.has(id) && !REGISTER[id].verified);
    unverifiedOf.set(key, found);
  }
  return found.slice();
}

const unverifiedOf = new Map<string, ProvenanceId[]>();
