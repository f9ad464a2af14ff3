import type { ProvenanceEntry } from './entry.js';
import { PSI } from '../units/conversions.js';

const DIPRA = 'DIPRA, Thrust Restraint Design for Ductile Iron Pipe, 7th ed. (2016)';

/**
 * The one register of every coefficient, table, formula and default the solver relies on. Code reads
 * its values from here (through registerValues.ts, generated from it without the words), so that what a
 * result depends on is also what the calculation record and the print list. docs/provenance.md is
 * generated from it.
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
  'quantities.concrete-waste': {
    quantity: 'Default waste allowance added to the concrete take-off (over-break, spillage, formwork)',
    value: 0.1,
    unit: '—',
    kind: 'common practice',
    source: 'Usual allowance of 5–10 % on ordered concrete; the project states its own',
    note: 'from memory',
    verified: false,
  },
  'pad.thickness': {
    quantity: 'Thickness of a concrete pad poured on the trench bottom under a sag fitting',
    value: 0.15,
    unit: 'm',
    kind: 'common practice',
    source: 'Usual least thickness of a plain concrete pad, 150 mm ≈ 6 in',
    note: 'from memory',
    verified: false,
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
    quantity:
      'A bearing face stands across a pipe’s trench when the pipe leaves within this plan angle of the bearing direction, or every pipe lies within it of the bearing line',
    value: 30,
    unit: '°',
    kind: 'own rule',
    source: 'Mainbrace rule for the face-width check',
    verified: true,
  },
  'block.pipe-through-face': {
    quantity: 'A pipe through the bearing face adds π·OD²/4 to the face needed',
    value: null,
    unit: '—',
    kind: 'own rule',
    source: 'Mainbrace rule',
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
  'block.thickest': {
    quantity:
      'A bearing block may be thickened to hold an uplift by its weight up to this multiple of the design thickness (on its bare bearing area); beyond it a separate anchor is built',
    value: 2,
    unit: '—',
    kind: 'own rule',
    source: 'Mainbrace rule: a block much thicker than its face is an anchor in all but name',
    verified: true,
  },
  'block.face-limits': {
    quantity:
      'Bearing-face proportions: height at most `tall` × the width (taller only where the trench holds the face narrower); width at most `wide` × the height; at the tallest height the cover allows, at most `widest` × the height and `widestMetres` m',
    value: { tall: 2, wide: 2, widest: 8, widestMetres: 10 },
    unit: '—',
    kind: 'own rule',
    source: 'Mainbrace rule: beyond these a face is not a practical block',
    verified: true,
  },
  'passive.ovesen': {
    quantity:
      'Ovesen 3-D factor on the passive resistance of a single short block, M = 1 + (Kp − Ka)^⅔·[1.1E⁴ + 1.6B/(1 + 5b/h) + 0.4(Kp − Ka)E³B²/(1 + 0.05b/h)]',
    value: null,
    unit: '—',
    kind: 'published',
    source:
      'Ovesen (1964), Anchor slabs, calculation methods and model tests, Danish Geotechnical Institute Bulletin No. 16; as restated in Duncan & Mokwa (2001), Passive earth pressures: theories and tests, J. Geotech. Geoenviron. Eng. 127(3):248–257',
    clause: '3-D correction factor',
    note: 'equation recalled, not read',
    verified: false,
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
    quantity: 'Pipe–soil friction ratio f_φ in δ = f_φ·φ (default for ductile iron)',
    value: 0.5,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'soil-parameter table, f_φ',
    verified: false,
  },
  'joints.adhesion-ratio': {
    quantity: 'Pipe–soil adhesion ratio f_c in C_p = f_c·c (default for ductile iron)',
    value: 0.5,
    unit: '—',
    kind: 'published',
    source: DIPRA,
    clause: 'soil-parameter table, f_c',
    verified: false,
  },
  'joints.material-basis': {
    quantity:
      'Restrained joints on PVC, PE, steel or other pipe: sized only with the project’s own f_φ (and f_c in cohesive soil), refused without them',
    value: null,
    unit: '—',
    kind: 'own rule',
    source:
      'Mainbrace rule: no published pipe–soil friction table for these materials was read (restrained-joint makers publish them for PVC)',
    verified: true,
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
  'rating.di-awwa': {
    quantity:
      'Ductile iron AWWA C151 pressure classes 150–350 psi: working ≤ the class; working + surge and the field test ≤ the class + the 100 psi surge allowance of the thickness design',
    value: { surgeAllowance: 100 * PSI },
    unit: 'Pa',
    kind: 'published',
    // read second-hand: the C150 design basis in a consulting engineer's restatement, the C600 test criterion in a
    // manufacturer's field-testing guideline
    source: 'AWWA C150/A21.50 and AWWA C600',
    clause: 'thickness design basis (working pressure plus 100 psi surge allowance); hydrostatic test pressure',
    verified: false,
  },
  'rating.pvc-c900': {
    quantity:
      'PVC AWWA C900-16 pressure class by DR (DR 14: 305, DR 18: 235, DR 25: 165 psi); working + occasional surge ≤ 1.6 × the class; field test ≤ the same limit',
    value: { dr14: 305 * PSI, dr18: 235 * PSI, dr25: 165 * PSI, occasionalSurgeFactor: 1.6 },
    unit: 'Pa',
    kind: 'published',
    // DR 14 and DR 18 classes read in a producer's C900 specification; DR 25, the 1.6 factor and the C605 test
    // limit recalled, not read
    source: 'AWWA C900-16; AWWA C605-13',
    clause: 'pressure class and short-term rating; hydrostatic test pressure',
    verified: false,
  },
  'rating.pe-c906': {
    quantity:
      'PE 4710 AWWA C906 pressure class by DR (DR 11: 200, DR 17: 125 psi); working + occasional surge ≤ 2 × the class; field test ≤ 1.5 × the class',
    value: { dr11: 200 * PSI, dr17: 125 * PSI, occasionalSurgeFactor: 2, testFactor: 1.5 },
    unit: 'Pa',
    kind: 'published',
    // recalled, not read
    source: 'AWWA C906-21; ASTM F2164',
    clause: 'Sec. 4.6 and Table 9, pressure class and surge; field test pressure',
    verified: false,
  },
  'rating.en545': {
    quantity: 'Ductile iron EN 545 pressure class Cxx: PFA = xx bar, PMA = 1.2 × PFA, PEA = 1.2 × PFA + 5 bar',
    value: { pmaFactor: 1.2, peaMargin: 5e5 },
    unit: 'Pa',
    kind: 'published',
    // recalled, not read (the class walls were read in a producer's reproduction of the table)
    source: 'EN 545:2010',
    clause: 'definitions of PFA, PMA, PEA',
    verified: false,
  },
  'rating.plastic-metric': {
    quantity:
      'Metric PVC-U and PE: PFA = PN (20 °C), PMA = 1.25 × PFA, PEA = 1.5 × PFA; PN = 20·σs/(SDR − 1) bar, σs = MRS/C',
    value: { pmaFactor: 1.25, peaFactor: 1.5 },
    unit: '—',
    kind: 'published',
    // recalled, not read
    source: 'ISO 1452-2:2009 (PVC-U), ISO 4427-2:2019 / EN 12201-2:2011 (PE), EN 805:2000',
    clause: 'PN, PFA, PMA, PEA',
    verified: false,
  },
  'rating.pvc-iso1452-stress': {
    quantity: 'PVC-U design stress σs = MRS/C: MRS 25 MPa, C 2.5 to 90 mm OD and 2.0 above (10 and 12.5 MPa)',
    value: { upTo90mm: 10e6, above90mm: 12.5e6 },
    unit: 'Pa',
    kind: 'published',
    // recalled, not read
    source: 'ISO 1452-1:2009 / ISO 1452-2:2009',
    clause: 'overall service (design) coefficient',
    verified: false,
  },
  'rating.pe100-stress': {
    quantity: 'PE 100 design stress σs = MRS/C: MRS 10 MPa, C 1.25 (8 MPa)',
    value: 8e6,
    unit: 'Pa',
    kind: 'published',
    // recalled, not read
    source: 'ISO 4427-1:2019 / EN 12201-1:2011',
    clause: 'MRS and design coefficient',
    verified: false,
  },
  'rating.metric-wall-rounding': {
    quantity: 'Minimum wall of a metric plastic pipe: OD/SDR rounded up to 0.1 mm',
    value: 1e-4,
    unit: 'm',
    kind: 'common practice',
    // recalled, not read; the standards' tables may differ by 0.1 mm, which changes only the inside area
    source: 'ISO 4065',
    clause: 'wall-thickness rounding',
    verified: false,
  },
  'surge.joukowsky': {
    quantity: 'Joukowsky pressure rise for an instantaneous velocity change ΔP = ρ·a·Δv',
    value: null,
    unit: '—',
    kind: 'published',
    source: 'Joukowsky (1900); Hicks, Civil Engineering Formulas (McGraw-Hill), ch. 12 Water hammer',
    clause: 'water-hammer pressure rise',
    verified: false,
  },
  'surge.korteweg': {
    quantity: 'Korteweg wave speed a = √(K/ρ) / √(1 + c₁·K·D/(E·e)), D the inside diameter, e the wall',
    value: null,
    unit: '—',
    kind: 'published',
    source: 'Hicks, Civil Engineering Formulas (McGraw-Hill), ch. 12 (read in a copy of the book)',
    clause: 'Eq. 12.63, velocity of a pressure wave along a pipe',
    verified: true,
  },
  'surge.support-factor': {
    quantity:
      'Pipe support factor c₁: 1 for pipe free to move at its joints (gasketed ductile iron and PVC); 1 − ν² for pipe anchored throughout (fused PE, welded steel)',
    value: null,
    unit: '—',
    kind: 'published',
    // read as restated in two engineering references, not in the book itself
    source: 'Wylie & Streeter, Fluid Transients in Systems (1993)',
    clause: 'wave speed in thin-walled pipe, support cases',
    verified: false,
  },
  'surge.water-bulk-modulus': {
    quantity: 'Bulk modulus of water at about 20 °C',
    value: 2.19e9,
    unit: 'Pa',
    kind: 'published',
    // recalled, not read
    source: 'Wylie & Streeter, Fluid Transients in Systems (1993)',
    clause: 'bulk modulus of water',
    verified: false,
  },
  'surge.pipe-elasticity': {
    quantity:
      'Short-term modulus of elasticity E and Poisson’s ratio ν of pipe materials for the wave speed (ductile iron, PVC, PE, steel)',
    value: {
      'ductile-iron.E': 165e9,
      'ductile-iron.nu': 0.28,
      'pvc.E': 2.76e9,
      'pvc.nu': 0.38,
      'hdpe.E': 0.79e9,
      'hdpe.nu': 0.45,
      'steel.E': 207e9,
      'steel.nu': 0.3,
    },
    unit: 'Pa',
    kind: 'published',
    // E of PVC (400,000 psi) and HDPE (115,000 psi) read in a web copy of a thermoplastic surge note; ductile iron
    // 24 × 10⁶ psi reproduces Moser's Table 4.1 wave speeds (read); steel 30 × 10⁶ psi usual; ν recalled, not read
    source: 'Moser, Buried Pipe Design (McGraw-Hill); Uni-Bell, Handbook of PVC Pipe Design and Construction',
    clause: 'material properties for water-hammer wave speed',
    verified: false,
  },
  'check.thermoplastic-surge-table': {
    quantity:
      'Check value: surge per 1 ft/s of sudden velocity change, PVC DR 18 / DR 25 17.4 / 14.7 psi (E 400,000 psi), HDPE DR 11 / DR 17 12.7 / 9.9 psi (E 115,000 psi), from a = 4660/√(1 + K·(DR − 2)/E), K 300,000 psi',
    value: { 'pvc.dr18': 17.4, 'pvc.dr25': 14.7, 'hdpe.dr11': 12.7, 'hdpe.dr17': 9.9 },
    unit: 'psi',
    kind: 'published',
    // formula recalled; table values read in a web copy of a thermoplastic pipe design note
    source: 'Uni-Bell, Handbook of PVC Pipe Design and Construction',
    clause: 'surge pressure for a 1 ft/s velocity change',
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
