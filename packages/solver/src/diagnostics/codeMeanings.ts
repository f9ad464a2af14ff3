import type { DiagnosticCode } from './codes.js';
import { diagnosticText, type Wording } from './wording.js';

/** What a finding means and what the engineer should do, in words. */
export interface CodeMeaning {
  /** what the finding means, for docs/diagnostics.md and a schedule note whose fittings differ */
  meaning: string;
  /** what the engineer should do */
  action: string;
}

export type CodeMeanings = Readonly<Record<DiagnosticCode, CodeMeaning>>;

/**
 * The words for every code of DIAGNOSTIC_CODES (codes.ts), kept apart from it so that a program can
 * load them only where it words a schedule (the app loads them beside the first document it opens).
 */
export const CODE_MEANINGS: CodeMeanings = {
  'pressure.vapour-floor': {
    meaning:
      'The case’s hydraulic grade lies so far below the node that the water column would separate; the gauge pressure is held at the vapour pressure of water.',
    action: 'Check the profile and the case’s pressure and datum.',
  },
  'pressure.below-zero': {
    meaning: 'The node stands above the case’s hydraulic grade: the gauge pressure there is below zero.',
    action: 'Check for vacuum and air entry at the high point; check the case datum.',
  },
  'flow.into-cap': {
    meaning: 'A flow runs into a closed end, which has none.',
    action: 'Check the pipe’s flow, or make the node a tie-in.',
  },
  'flow.unbalanced': {
    meaning: 'The flows at the node do not balance (positive: more leaves than arrives).',
    action: 'Check the pipes’ flows.',
  },
  'valve.both-ways': {
    meaning:
      'The valve is sized open, and closed with the pressure on either side: its restraint holds the thrust both ways along the line.',
    action: 'None.',
  },
  'valve.flag-ignored': {
    meaning:
      'The valve flag applies only where two pipes meet; the node was sized as its fitting without a closed valve.',
    action: 'Move the valve to a node between two pipes, or clear the flag.',
  },
  'fitting.many-pipes': {
    meaning: 'More than four pipes meet at the node: no standard fitting joins them. It is sized as one junction.',
    action: 'Build it from standard fittings a short pipe apart, each drawn as its own node.',
  },
  'fitting.bent-run': {
    meaning:
      'The run through a three-pipe junction turns from straight by more than a run may: no standard tee or wye has a bent run. It is sized as one junction.',
    action: 'Build it as a tee or wye and a bend a short pipe apart, each drawn as its own node.',
  },
  'fitting.odd-bend': {
    meaning:
      'No standard bend turns the angle drawn (11¼°, 22½°, 45°, 90°; not verified against AWWA C110/A21.10 (ductile-iron fittings), bends); sized as drawn.',
    action: 'Use the nearest standard bend and deflect the joints beside it, or two standard bends.',
  },
  'thrust.none': {
    meaning: 'No thrust acts at the fitting in any case.',
    action: 'None.',
  },
  'anchor.submerged': {
    meaning:
      'The gravity anchor stands in groundwater and is sized with the submerged unit weight of concrete (γc − γw).',
    action: 'Design for the highest groundwater level expected.',
  },
  'anchor.no-weight': {
    meaning:
      'The concrete weighs no more than the groundwater (γc − γw ≤ 0): no gravity anchor can hold the upward thrust. The restraint is not adequate; restrained joints are sized instead.',
    action:
      'Check the concrete unit weight and the water density; use restrained joints, tie-downs or heavier concrete.',
  },
  'soil.no-bearing': {
    meaning:
      'The soil has no allowable bearing (muck, peat, unprepared fill): a thrust block cannot be used, so restrained joints are sized instead.',
    action: 'Use the restrained joints, piles, or replace the soil.',
  },
  'soil.below-min-cover': {
    meaning: 'The soil’s bearing value holds only for more cover than the fitting has.',
    action: 'Deepen the main or take a lower bearing value.',
  },
  'block.wider-than-trench': {
    meaning: 'The bearing face is wider than the trench it stands across.',
    action: 'Cut the face by hand into undisturbed soil beyond the trench, or use restrained joints.',
  },
  'block.thrust-reverses': {
    meaning: 'The horizontal thrust reverses between load states: a second block bears on the opposite side.',
    action: 'Build both blocks.',
  },
  'block.taller-than-cover': {
    meaning:
      'The least face height (the pipe’s OD) needs the block bottom deeper than the cover allows for a face of half the depth to its bottom.',
    action: 'Deepen the cover, use restrained joints, or design the block for passive pressure.',
  },
  'block.wide-face': {
    meaning: 'The face is more than twice as wide as it is high because the cover limits its height.',
    action: 'Consider restrained joints or a deeper block.',
  },
  'block.none-holds': {
    meaning:
      'No bearing block within the cover and face limits meets both the bearing area and the passive resistance with the safety factor. No block is issued; restrained joints are sized instead, and their own findings say where they cannot hold either.',
    action:
      'Build the restrained joints sized instead, or deepen the main for a taller face, improve the soil, or have a block designed by a geotechnical engineer.',
  },
  'pad.no-bearing': {
    meaning:
      'The soil under the fitting has no allowable bearing: it cannot carry a trench-bottom pad against the downward thrust nor the weight of a gravity anchor, so restrained joints are sized instead.',
    action: 'Restrain the joints or replace the soil.',
  },
  'joints.no-resistance': {
    meaning:
      'The soil gives no friction or bearing along the pipe: restrained joints cannot hold the thrust. The restraint is not adequate.',
    action:
      'Replace the soil around the pipe with compacted granular fill, or carry the thrust on piles; a block serves only where the soil has bearing.',
  },
  'joints.encroach': {
    meaning: 'The restrained length runs past the next fitting: the restrained zones of neighbouring fittings overlap.',
    action: 'Design the neighbouring restrained zones together.',
  },
  'joints.longer-than-route': {
    meaning:
      'The restrained length computed along a leg is longer than the line it runs along (to the next branch or end): it is cut to the line, which cannot hold the thrust by itself. The restraint is not adequate.',
    action: 'Add a block or anchor at the fitting, restrain the whole line and its end, or change the layout.',
  },
  'joints.into-existing-main': {
    meaning: 'The restrained length runs past the tie-in into the existing main, whose joints it then relies on.',
    action: 'Restrain the existing main’s joints that far, or add a block or anchor at the fitting.',
  },
  'joints.fused-pe': {
    meaning:
      'Fused PE is end-load bearing: restraint is needed at transitions to gasketed pipe and for thermal and Poisson loads.',
    action: 'Restrain the transitions.',
  },
  'joints.material-basis': {
    meaning:
      'The restrained-length method is the ductile-iron manual’s; the pipe is of another material and is sized with the pipe–soil friction (and adhesion) ratios the project gives the soil.',
    action: 'Confirm those ratios for this material with the restrained-joint maker or a geotechnical engineer.',
  },
  'joints.no-material-basis': {
    meaning:
      'Restrained joints on a pipe that is not ductile iron need the pipe–soil friction ratio f_φ (and, in a soil with cohesion, the adhesion ratio f_c) for that material; the project gives none and no published default was found, so the joints are not sized. The restraint is not adequate.',
    action:
      'Give the soil the pipe friction (and adhesion) ratio for this material from the restrained-joint maker or a geotechnical engineer, or hold the fitting with concrete.',
  },
  'joints.sharp-bend': {
    meaning: 'A bend sharper than 90°: restrained lengths grow quickly and the method is uncertain.',
    action: 'Consider a block or a different layout.',
  },
  'pipe.over-working-rating': {
    meaning:
      'A working case puts more pressure on the pipe than its rated working pressure (AWWA pressure class, EN PFA, PN). The pipe is not adequate.',
    action: 'Choose a higher class of pipe, or lower the working pressure.',
  },
  'pipe.over-surge-rating': {
    meaning:
      'A surge case (or a case of no stated kind) puts more pressure on the pipe than its rating allows with surge (the class plus the standard’s surge allowance, EN PMA). The pipe is not adequate.',
    action: 'Choose a higher class of pipe, or limit the surge (slower valve closing, surge protection).',
  },
  'pipe.over-test-rating': {
    meaning:
      'The field-test case puts more pressure on the pipe than the test limit for its class (EN PEA; AWWA: the pipe’s design pressure). The test would overload the pipe.',
    action: 'Lower the test pressure, test in shorter sections, or choose a higher class of pipe.',
  },
  'input.pressure-unusual': {
    meaning:
      'A case pressure lies outside the usual range for a water main (50 kPa to 3 MPa): often a unit slip, such as kPa typed as Pa.',
    action: 'Check the case pressure and its unit.',
  },
  'input.cover-unusual': {
    meaning:
      'A depth of cover lies outside the usual range (0.3 m to 6 m): often a unit slip, such as millimetres typed as metres.',
    action: 'Check the cover and its unit.',
  },
  'input.groundwater-above-ground': {
    meaning:
      'The groundwater level stands above the ground at every node of the route: possible on a flooded or river site, but more often a unit slip or a level on another datum.',
    action: 'Check the groundwater level, its unit and its datum.',
  },
  'input.groundwater-above-some-ground': {
    meaning:
      'The groundwater level stands above the ground at some nodes: a flooded stretch or a crossing, or a level on another datum. Blocks and anchors there are sized submerged, with the water table taken at the ground.',
    action:
      'Check the groundwater level and its datum; where the stretch is flooded, check that its restraint suits work under water.',
  },
  'input.velocity-unusual': {
    meaning:
      'The flow velocity in a pipe is higher than usual for a water main (above 5 m/s): often a unit slip in the flow.',
    action: 'Check the pipe’s flow and its unit.',
  },
  'input.diameter-unusual': {
    meaning: 'A pipe’s outside diameter lies outside the usual range (50 mm to 2 m).',
    action: 'Check the diameter and its unit.',
  },
  'input.density-unusual': {
    meaning: 'The water density lies outside the usual range for fresh or sea water.',
    action: 'Check the water density (998.2 kg/m³ at 20 °C).',
  },
  'input.unit-weight-unusual': {
    meaning: 'A unit weight (concrete or soil) lies outside its usual range.',
    action: 'Check the unit weight and its unit.',
  },
  'input.length-unusual': {
    meaning: 'A design length (block thickness, trench width) lies outside its usual range.',
    action: 'Check the length and its unit.',
  },
  'input.stress-unusual': {
    meaning: 'A soil strength (bearing or cohesion) lies outside its usual range.',
    action: 'Check the soil value and its unit.',
  },
  'input.angle-unusual': {
    meaning: 'A soil friction angle lies outside the usual range (0° to 45°).',
    action: 'Check the friction angle.',
  },
  'input.factor-unusual': {
    meaning: 'A safety factor lies outside the usual range (1.25 to 3).',
    action: 'Check the safety factor.',
  },
};

/** The meanings and the sentences together, as a schedule view words its findings (wording.ts). */
export const WORDING: Wording = { meanings: CODE_MEANINGS, text: diagnosticText };
