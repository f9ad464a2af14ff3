import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyseProject } from '../src/analysis/analyse.js';
import { type Schedule } from '../src/schedule/scheduleRows.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { writeScheduleJsonBytes, type ScheduleJsonBytes } from '../src/schedule/scheduleJson.js';
import { terminalActsOn, terminalSafe } from '../src/cli/terminalText.js';
import { generateRoute } from '../bench/generateRoute.js';
import { randomRoute, routeExtras as extras, routeWithExtras as project } from './randomRoutes.js';
import { scheduleJsonOracle } from './oracle/scheduleJsonOracle.js';
import { demoInput, validProject } from './projectBuilder.js';

/** The writer's bytes joined and read as UTF-8 (refusing anything that is not). */
function bytesText(s: Schedule, options: ScheduleJsonBytes): string {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let text = '';
  writeScheduleJsonBytes(s, (b) => (text += decoder.decode(b, { stream: true })), options);
  return text + decoder.decode();
}

/** Compact, with and without the echoed input, in pieces of a byte, a few and the usual 64 Ki. */
function expectOracleBytes(s: Schedule, chunks = [1, 7, 1 << 16]): void {
  for (const echo of [false, true]) {
    const expected = scheduleJsonOracle(s, { pretty: false, echo });
    for (const chunk of chunks) expect(bytesText(s, { echo, chunk })).toBe(expected);
  }
}

describe('the JSON schedule written as bytes is the old serialiser’s text in UTF-8', () => {
  it('on the demo project and generated routes', () => {
    expectOracleBytes(scheduleOf(analyseProject(validProject(demoInput()))));
    expectOracleBytes(scheduleOf(analyseProject(validProject(generateRoute(50)))), [1, 997, 1 << 16]);
    expectOracleBytes(scheduleOf(analyseProject(validProject(generateRoute(1000)))), [1 << 16]);
  }, 60_000);

  it('on random routes (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), extras, (r, x) => {
        expectOracleBytes(scheduleOf(analyseProject(project(r, x))), [5, 1 << 16]);
      }),
      { seed: 20261203, numRuns: 40 },
    );
  }, 120_000);

  it('with the terminal guard: what terminalSafe makes of the whole text', () => {
    const p = demoInput();
    // Escapes a terminal acts on, separators, bidi overrides, quotes, a backslash and a character
    // outside the BMP, in the name, a node id, a label, a soil and a case (as the writer test does).
    p.name = 'Main\u001b[8m \u2028 "quoted" \\ \u{1F6B0}\u007f';
    const n4 = p.nodes.find((n: { id: string }) => n.id === 'n4');
    n4.label = 'Hydrant\r\nB4\u202e: all clear\u0085';
    p.soils[1].label = 'Soft clay\r\u001b[1A\u009b2K';
    p.soils[1].bearing = 0;
    p.loadCases[2].label = 'Test\u009b31m\u2066';
    const s = scheduleOf(analyseProject(validProject(p)));
    for (const echo of [false, true]) {
      const expected = terminalSafe(scheduleJsonOracle(s, { echo }));
      expect(expected).not.toBe(scheduleJsonOracle(s, { echo })); // there is something to guard
      for (const chunk of [1, 3, 1 << 16]) expect(bytesText(s, { echo, chunk, escape: terminalActsOn })).toBe(expected);
    }
  });
});
