import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyseProject } from '../src/analysis/analyse.js';
import { type Schedule } from '../src/schedule/scheduleRows.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { scheduleJson, writeScheduleJson, type ScheduleJsonWriting } from '../src/schedule/scheduleJson.js';
import { JsonIndenter } from '../src/schedule/jsonIndent.js';
import { terminalSafe } from '../src/cli/terminalText.js';
import { generateRoute } from '../bench/generateRoute.js';
import { randomRoute, routeExtras as extras, routeWithExtras as project } from './randomRoutes.js';
import { scheduleJsonOracle } from './oracle/scheduleJsonOracle.js';
import { demoInput, validProject } from './projectBuilder.js';

/** The writer's pieces joined. */
function streamed(s: Schedule, options: ScheduleJsonWriting): string {
  let text = '';
  writeScheduleJson(s, (piece) => (text += piece), options);
  return text;
}

const VARIANTS = [
  { pretty: false, echo: false },
  { pretty: false, echo: true },
  { pretty: true, echo: false },
  { pretty: true, echo: true },
];

/** Every variant, in pieces of one character, of a few and of the usual 64 Ki, against the serialiser it replaced. */
function expectSameText(s: Schedule, chunks = [1, 7, 1 << 16]): void {
  for (const v of VARIANTS) {
    const expected = scheduleJsonOracle(s, v);
    for (const chunk of chunks) expect(streamed(s, { ...v, chunk })).toBe(expected);
    expect(scheduleJson(s, v)).toBe(expected);
  }
  expect(scheduleJson(s, true)).toBe(scheduleJsonOracle(s, true));
}

describe('the streamed JSON schedule is the text of the serialiser it replaced, byte for byte', () => {
  it('on the demo project', () => {
    const s = scheduleOf(analyseProject(validProject(demoInput())));
    expect(s.fittings.length).toBeGreaterThan(5);
    expectSameText(s);
  });

  it('on generated routes (the bench’s), with tees, dead ends and vertical bends', () => {
    expectSameText(scheduleOf(analyseProject(validProject(generateRoute(50)))), [1, 997, 1 << 16]);
    expectSameText(scheduleOf(analyseProject(validProject(generateRoute(1000)))), [1 << 16]);
  }, 60_000);

  it('on random routes (fast-check, fixed seed)', () => {
    let findings = 0;
    fc.assert(
      fc.property(randomRoute({ flows: true }), extras, (r, x) => {
        const s = scheduleOf(analyseProject(project(r, x)));
        findings += s.fittings.reduce((n, f) => n + f.diagnostics.length, s.diagnostics.length);
        expectSameText(s, [5, 1 << 16]);
      }),
      { seed: 20261203, numRuns: 80 },
    );
    // The routes must exercise the diagnostics' subjects and values, not only empty lists.
    expect(findings).toBeGreaterThan(50);
  }, 120_000);

  it('through the terminal guard piece by piece gives what terminalSafe made of the whole text', () => {
    const p = demoInput();
    // Escapes a terminal acts on, a line and a paragraph separator, a right-to-left override, quotes,
    // a backslash and a character outside the BMP, in the name, a node id, a label, a soil and a case.
    p.name = 'Main\u001b[8m \u2028 "quoted" \\ \u{1F6B0}';
    const n4 = p.nodes.find((n: { id: string }) => n.id === 'n4');
    n4.label = 'Hydrant\r\nB4\u202e: all clear\u0085';
    p.soils[1].label = 'Soft clay\r\u001b[1A\u009b2K';
    p.soils[1].bearing = 0; // so the soil's label is worded in a warning
    p.loadCases[2].label = 'Test\u009b31m\u2066';
    const s = scheduleOf(analyseProject(validProject(p)));
    expect(s.fittings.some((f) => f.warnings.some((w) => w.includes('Soft clay')))).toBe(true);
    for (const v of VARIANTS) {
      const expected = terminalSafe(scheduleJsonOracle(s, v));
      for (const chunk of [1, 3, 1 << 16]) {
        let text = '';
        writeScheduleJson(s, (piece) => (text += terminalSafe(piece)), { ...v, chunk });
        expect(text).toBe(expected);
      }
    }
  });
});

describe('JsonIndenter lays out compact JSON as JSON.stringify(value, null, 2) does', () => {
  it('for any JSON value, fed in pieces of any size (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.integer({ min: 1, max: 9 }), (value, size) => {
        const compact = JSON.stringify(value);
        const indenter = new JsonIndenter();
        let out = '';
        for (let i = 0; i < compact.length; i += size) out += indenter.feed(compact.slice(i, i + size));
        expect(out).toBe(JSON.stringify(value, null, 2));
      }),
      { seed: 20261203, numRuns: 400 },
    );
  });

  it('keeps empty lists and objects on one line and strings with brackets, commas and escaped quotes as they are', () => {
    const value = { a: [], b: {}, c: ['x,"y":[{', '\\', '\\"]'], d: [[{}], { e: null }] };
    expect(new JsonIndenter().feed(JSON.stringify(value))).toBe(JSON.stringify(value, null, 2));
  });
});
