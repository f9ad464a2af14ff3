import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseProject } from '../model/parseProject.js';
import { analyseProject } from '../analysis/analyse.js';
import { scheduleView } from '../schedule/scheduleView.js';
import { scheduleTable } from '../schedule/scheduleTable.js';
import { scheduleCsv } from '../schedule/scheduleCsv.js';
import { generateRoute } from '../../bench/generateRoute.js';
import { escapeStrings } from './terminalText.js';
import { escapedView } from './escapedView.js';
import { WORDING } from '../diagnostics/codeMeanings.js';

const demoPath = fileURLToPath(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url));

function analysed(input: unknown) {
  const r = parseProject(input);
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
  return analyseProject(r.project);
}

/** The demo with what a terminal acts on in the name, a node label, a soil label (worded in a note) and a case. */
function hostile() {
  const p = JSON.parse(readFileSync(demoPath, 'utf8'));
  p.name = 'Main\u001b[8m';
  p.nodes.find((n: { id: string }) => n.id === 'n4').label = 'Hydrant\nB4\u202e: all clear';
  p.soils[1].label = 'Soft clay\r\u001b[1A\u009b2K';
  p.soils[1].bearing = 0;
  p.loadCases[2].label = 'Test\u009b31m';
  return p;
}

describe('escapedView prints what escaping every string of the view printed', () => {
  it('the table and the CSV, in both unit systems, on the demo, a hostile demo and a generated route', () => {
    const projects = [JSON.parse(readFileSync(demoPath, 'utf8')), hostile(), generateRoute(300)];
    for (const input of projects) {
      const a = analysed(input);
      for (const units of ['si', 'us'] as const) {
        const view = scheduleView(a, units, WORDING);
        const before = escapeStrings(view);
        const after = escapedView(view);
        expect(scheduleTable(after, 'P')).toBe(scheduleTable(before, 'P'));
        expect(scheduleTable(after, 'P', ['station', 'chainage'])).toBe(
          scheduleTable(before, 'P', ['station', 'chainage']),
        );
        expect(scheduleCsv(after)).toBe(scheduleCsv(before));
        // The data behind the rows is passed on as it is.
        expect(after.rows[0]!.fitting).toBe(view.rows[0]!.fitting);
        expect(after.rows[0]!.values).toBe(view.rows[0]!.values);
      }
    }
  });

  it('leaves nothing a terminal acts on in a cell or a note of the hostile demo', () => {
    const view = escapedView(scheduleView(analysed(hostile()), 'si', WORDING));
    // eslint-disable-next-line no-control-regex -- looking for control characters is the point
    const control = /[\u0000-\u001f\u007f-\u009f\u202e]/;
    for (const r of view.rows) for (const text of Object.values(r.cells)) expect(text).not.toMatch(control);
    for (const n of view.notes) expect(n.text).not.toMatch(control);
    expect(view.rows.some((r) => Object.values(r.cells).some((t) => t.includes('\\u202e')))).toBe(true);
  });
});
