import { formatDimension, formatSi } from '../units/format.js';
import { quantityText } from '../schedule/columnUnits.js';
import type { UnitSystem } from '../units/conversions.js';
import { DIAGNOSTIC_CODES, type DiagnosticCode } from './codes.js';
import type { Diagnostic, Subject } from './diagnostic.js';
import type { CodeMeanings } from './codeMeanings.js';

/** How the reader knows the things a diagnostic names; ids never reach the words. */
export interface WordingContext {
  units: UnitSystem;
  caseName: (id: string) => string;
  soilName: (id: string) => string;
  /** the pipe as seen from a fitting: "the leg toward A6" */
  legName: (node: string | undefined, pipe: string) => string;
  material: (pipe: string) => string;
  /** a node as the reader knows it: its mark, else "the node at 120.0 m E, 35.0 m N" */
  nodeName: (id: string) => string;
  /** a pipe as the reader knows it: "the pipe from A3 to A4" */
  pipeName: (id: string) => string;
}

type Shown = Record<string, string>;

const capital = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);
type Words = (v: Shown, s: Subject, c: WordingContext) => string;

const soil = (s: Subject, c: WordingContext) => (s.soil ? c.soilName(s.soil) : 'the soil');
const pipe = (s: Subject, c: WordingContext) => (s.pipe ? c.pipeName(s.pipe) : 'the pipe');
const leg = (s: Subject, c: WordingContext) => (s.pipe ? c.legName(s.node, s.pipe) : 'the pipe');
/** Where an input value sits, in the reader's words. */
function place(s: Subject, c: WordingContext): string {
  if (s.case) return `Case “${c.caseName(s.case)}”`;
  if (s.soil) return `Soil “${c.soilName(s.soil)}”`;
  if (s.node) return capital(c.nodeName(s.node));
  if (s.pipe) return capital(c.pipeName(s.pipe));
  return s.field?.startsWith('water') ? 'The water' : 'The design settings';
}
const outside = (what: string) => (v: Shown, s: Subject, c: WordingContext) =>
  `${place(s, c)}: ${what} ${v.value} is outside the usual ${v.low} to ${v.high}; check the value and its unit (a unit slip?).`;

const inCase = (s: Subject, c: WordingContext) => (s.case ? ` in case “${c.caseName(s.case)}”` : '');

/** One sentence per code, with its values in the reader's units. */
const WORDS: Record<DiagnosticCode, Words> = {
  'pressure.vapour-floor': (v, s, c) =>
    `The hydraulic grade${inCase(s, c)} lies far below this node: the water column would separate (pressure held at the vapour pressure, ${v.pressure}). Check the profile and the case.`,
  'pressure.below-zero': (v, s, c) =>
    `Pressure at this node is below zero (${v.pressure})${inCase(s, c)}: the node stands above the hydraulic grade. Check for vacuum and air entry.`,
  'flow.into-cap': (v) =>
    `A flow of ${v.flow} runs into this closed end: check the pipe’s flow or make the node a tie-in.`,
  'flow.unbalanced': (v) =>
    `The flows at this node do not balance (${v.netSize} more ${v.direction}); check the pipes’ flows.`,
  'valve.both-ways': () =>
    'Valve sized open, and closed with the pressure on either side: its restraint holds the thrust both ways along the line.',
  'valve.flag-ignored': () =>
    'The valve flag applies only where two pipes meet; this node was sized as its fitting without a closed valve.',
  'fitting.many-pipes': () =>
    'More than four pipes meet here: no standard fitting joins them (sized as one junction). Build it from standard fittings a short pipe apart, each drawn as its own node.',
  'fitting.bent-run': (v) =>
    `The run through this junction turns ${v.turn}: no standard tee or wye has a bent run (sized as one junction). Build it as a tee or wye and a bend a short pipe apart, each drawn as its own node.`,
  'fitting.odd-bend': (v) =>
    v.nearest === undefined
      ? `No bend fitting turns as little as ${v.angle}: deflect the joints here within their allowance, or set the route straight. Sized as drawn (standard bends not verified against AWWA C110/A21.10 (ductile-iron fittings), bends).`
      : `No standard bend turns ${v.angle}: the nearest is ${v.nearest}. Deflect the joints beside it within their allowance for the rest, build it from two standard bends, or set the route to a standard angle. Sized as drawn (standard bends not verified against AWWA C110/A21.10 (ductile-iron fittings), bends).`,
  'thrust.none': () => 'No thrust at this fitting in any case.',
  'anchor.submerged': () =>
    'Gravity anchor below groundwater: sized with the submerged unit weight of concrete (γc − γw); design for the highest groundwater level.',
  'anchor.no-weight': (v) =>
    `Not adequate: concrete of ${v.concreteUnitWeight} weighs no more than the groundwater (${v.waterUnitWeight}), so no gravity anchor can hold the ${v.upward} upward thrust. Restrained joints are sized instead; check the concrete unit weight and water density, or use tie-downs or heavier concrete.`,
  'soil.no-bearing': (_v, s, c) =>
    `No bearing: ${soil(s, c)} has no allowable bearing (muck, peat or unprepared fill). A thrust block cannot be used: restrained joints are sized instead; piles or soil replacement are the other choices.`,
  'soil.below-min-cover': (v, s, c) =>
    `The bearing value of ${soil(s, c)} holds for more than ${v.minCover} of cover; this fitting has ${v.cover}.`,
  'block.wider-than-trench': (v) =>
    `Bearing face ${v.faceWidth} wide is wider than the ${v.trenchWidth} trench it stands across: cut the face by hand into undisturbed soil beyond the trench, or use restrained joints.`,
  'block.thrust-reverses': (v) =>
    `The thrust reverses between load states (up to ${v.force} the other way): a second block bears on the opposite side.`,
  'block.taller-than-cover': (v) =>
    `Block taller than the cover allows: a face ${v.faceHeight} high needs its bottom ${v.bottomDepth} or more below ground, but the pipe centre is only ${v.centreDepth} down. Deepen the cover, use restrained joints, or design the block for passive pressure.`,
  'block.wide-face': (v) =>
    `Face ${v.faceWidth} wide is more than twice its ${v.faceHeight} height: the cover limits the height. Consider restrained joints or a deeper block.`,
  'block.none-holds': (v) => {
    const area = `a face of ${v.bearingArea} is needed for bearing and the largest the limits allow is ${v.largestFace}`;
    const passive = `the strongest face, ${v.faceWidth} wide × ${v.faceHeight} high, resists only ${v.ratio} × the thrust by passive pressure (${v.safetyFactor} needed)`;
    const why =
      v.areaShort && v.passiveShort
        ? `${area}, and ${passive}`
        : v.areaShort
          ? `bearing governs: ${area} (passive pressure is not the limit)`
          : v.passiveShort
            ? `passive pressure governs: ${passive}`
            : `no face has both the area bearing needs (${v.bearingArea}) and the passive resistance: the strongest, ${v.faceWidth} wide × ${v.faceHeight} high, resists ${v.ratio} × the thrust but is smaller`;
    return `No block within the cover and face limits holds ${v.thrust} with a safety factor of ${v.safetyFactor}: ${why}. Restrained joints are sized instead: build them, or deepen the main, improve the soil, or have a block designed by a geotechnical engineer.`;
  },
  'pad.no-bearing': (_v, s, c) =>
    `No bearing under the fitting: ${soil(s, c)} cannot carry a pad or an anchor; restrained joints are sized instead, or replace the soil.`,
  'joints.no-resistance': (v, s, c) =>
    `Not adequate: the soil along ${leg(s, c)} (φ = ${v.frictionAngle}, c = ${v.cohesion}) gives no friction or bearing, so restrained joints cannot hold; replace the soil around the pipe with compacted granular fill or carry the thrust on piles (a block serves only where the soil has bearing).`,
  'joints.encroach': (v, s, c) =>
    `The restrained length ${v.length} along ${leg(s, c)} runs past the next fitting (${v.legLength} away): the restrained zones of neighbouring fittings overlap and must be designed together.`,
  'joints.longer-than-route': (v, s, c) =>
    `Not adequate: the restrained length needed along ${leg(s, c)}, ${v.length}, is longer than the ${v.reach} of line there (to the next branch or end); it is cut to ${v.reach}, which cannot hold the thrust alone. Add a block or anchor, restrain the whole line and its end, or change the layout.`,
  'joints.into-existing-main': (v, s, c) =>
    `The restrained length ${v.length} along ${leg(s, c)} runs ${v.beyond} past the tie-in ${v.reach} away, into the existing main: restrain its joints that far too, or add a block or anchor.`,
  'joints.fused-pe': (_v, s, c) =>
    `${capital(leg(s, c))} is fused PE, which is end-load bearing: restrain the transitions to gasketed pipe and allow for thermal and Poisson loads.`,
  'joints.material-basis': (_v, s, c) =>
    `${capital(leg(s, c))} is ${s.pipe ? c.material(s.pipe) : 'not ductile iron'}: its restrained length uses the ductile-iron manual’s method with the friction ratios given for ${soil(s, c)}; confirm them for this material with the restrained-joint maker.`,
  'joints.no-material-basis': (v, s, c) => {
    const missing = [
      ...(v.frictionMissing === '1' ? ['pipe friction ratio f_φ'] : []),
      ...(v.adhesionMissing === '1' ? ['adhesion ratio f_c'] : []),
    ].join(' and ');
    return `Not adequate: restrained joints along ${leg(s, c)} (${s.pipe ? c.material(s.pipe) : 'not ductile iron'}) are not sized — there is no published ${missing} for this material to default to. Give ${soil(s, c)} its ${missing} for this pipe (restrained-joint maker or geotechnical engineer), or hold the fitting with concrete.`;
  },
  'pipe.over-working-rating': (v, s, c) =>
    `Not adequate: ${pipe(s, c)} carries ${v.pressure}${inCase(s, c)}, more than its rated working pressure ${v.limit}; choose a higher class of pipe or lower the working pressure.`,
  'pipe.over-surge-rating': (v, s, c) =>
    `Not adequate: ${pipe(s, c)} carries ${v.pressure}${inCase(s, c)}, more than the ${v.limit} its rating allows with surge; choose a higher class of pipe or limit the surge.`,
  'pipe.over-test-rating': (v, s, c) =>
    `The field test would overload ${pipe(s, c)}: ${v.pressure}${inCase(s, c)} against a test limit of ${v.limit}; lower the test pressure, test shorter sections, or choose a higher class.`,
  'input.pressure-unusual': outside('the pressure'),
  'input.cover-unusual': outside('the cover'),
  'input.velocity-unusual': outside('the flow velocity'),
  'input.groundwater-above-ground': (v) =>
    `The design settings: the groundwater level ${v.groundwater} is above the ground at every node (the highest ground is ${v.highestGround}); check the value, its unit and its datum (a unit slip?).`,
  'input.groundwater-above-some-ground': (v) =>
    `The design settings: the groundwater level ${v.groundwater} is above the ground at ${v.flooded === '1' ? 'one node' : `${v.flooded} nodes`} (the lowest ground is ${v.lowestGround}); fittings there are sized submerged. Check the level and its datum.`,
  'input.diameter-unusual': outside('the outside diameter'),
  'input.density-unusual': outside('the density'),
  'input.unit-weight-unusual': outside('the unit weight'),
  'input.length-unusual': outside('the length'),
  'input.stress-unusual': outside('the strength'),
  'input.angle-unusual': outside('the friction angle'),
  'input.factor-unusual': outside('the safety factor'),
  'joints.sharp-bend': (v) =>
    `Bend of ${v.deflection}, sharper than 90°: restrained lengths grow quickly and the method is uncertain; consider a block or a different layout.`,
};

/** Built dimensions read as a crew builds them (rounded up); other values to drawing precision. */
const BUILT = new Set(['faceWidth', 'faceHeight', 'trenchWidth', 'bottomDepth', 'centreDepth', 'cover', 'minCover']);
/**
 * Restrained lengths (the joints codes' `length`, `beyond`, and `reach`, the length a zone is cut to) read
 * as the schedule's column gives them, so that a note and its row's "Restrain …" agree.
 */
const RESTRAINED = new Set(['length', 'beyond', 'reach']);

function shownValues(d: Diagnostic, units: UnitSystem): Shown {
  const kinds = DIAGNOSTIC_CODES[d.code].values as Record<string, string>;
  const out: Shown = {};
  for (const [name, v] of Object.entries(d.values)) {
    const kind = kinds[name];
    if (kind === 'ratio' || kind === undefined) out[name] = formatRatio(v);
    else if (BUILT.has(name)) out[name] = formatDimension(v, units);
    else if (RESTRAINED.has(name)) out[name] = quantityText(v, 'restrained', units);
    // Forces and pressures as the schedule's columns give them, so that a note and its row agree.
    else if (kind === 'force' || kind === 'pressure') out[name] = quantityText(v, kind, units);
    // Levels as the schedule's level columns give them (three figures would read 100.5 m as 101 m).
    else if (kind === 'elevation') out[name] = quantityText(v, 'level', units);
    else out[name] = formatSi(v, kind as Parameters<typeof formatSi>[1], units);
  }
  if (d.code === 'block.none-holds') {
    // which limit failed, so that the sentence names it and not a figure that passes
    const { bearingArea = 0, largestFace = 0, ratio = 0, safetyFactor = 0 } = d.values;
    out.areaShort = bearingArea > largestFace ? '1' : '';
    out.passiveShort = ratio < safetyFactor ? '1' : '';
  }
  if (d.code === 'flow.unbalanced') {
    const net = d.values.net ?? 0;
    out.netSize = formatSi(Math.abs(net), 'flow', units);
    out.direction = net > 0 ? 'leaves than arrives' : 'arrives than leaves';
  }
  return out;
}

const formatRatio = (v: number) => (Number.isFinite(v) ? String(Math.round(v * 100) / 100) : '—');

/**
 * Everything a schedule needs to word its findings: what each code means (a note whose fittings'
 * sentences differ) and each finding's own sentence. The app loads it apart from its first screen
 * (`@mainbrace/solver/meanings`); a program that words findings passes it in.
 */
export interface Wording {
  meanings: CodeMeanings;
  text: (d: Diagnostic, c: WordingContext) => string;
}

/** The diagnostic as one sentence in the reader's units. */
export function diagnosticText(d: Diagnostic, c: WordingContext): string {
  return WORDS[d.code](shownValues(d, c.units), d.subject, c);
}
