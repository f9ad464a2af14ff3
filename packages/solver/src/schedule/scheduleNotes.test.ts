import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { scheduleView } from './scheduleView.js';
import { scheduleTable } from './scheduleTable.js';
import { noteAfterHeading } from './scheduleNotes.js';
import { route } from '../../test/projectBuilder.js';
import { PSI } from '../units/conversions.js';
import { WORDING } from '../diagnostics/codeMeanings.js';

/**
 * Notes, not repeats: a main of four 12-in C900 DR 25 pipes (pressure class 165 psi) held
 * at 200 psi in its working case, with no datum, so every pipe carries the same 200 psi. Each pipe is
 * over its rating; the sheet says so once, naming the pipes, not once per pipe.
 */
const dr25 = { series: 'pvc-c900-dr25', nominal: '12', material: 'pvc' };
const od = 13.2 * 0.0254;
const main = (datum?: number) =>
  route({
    cases: [
      { id: 'w', label: 'Working', kind: 'working', pressure: 200 * PSI, ...(datum ? { datumElevation: datum } : {}) },
    ],
    nodes: [
      { id: 'a', x: 0, y: 0, z: 100, end: 'tie-in' },
      { id: 'b', x: 100, y: 0, z: 99 },
      { id: 'c', x: 200, y: 50, z: 98 },
      { id: 'd', x: 300, y: 50, z: 97 },
      { id: 'e', x: 400, y: 100, z: 96 },
    ],
    pipes: [
      { from: 'a', to: 'b', od, id_: od * (1 - 2 / 25), ...dr25 },
      { from: 'b', to: 'c', od, id_: od * (1 - 2 / 25), ...dr25 },
      { from: 'c', to: 'd', od, id_: od * (1 - 2 / 25), ...dr25 },
      { from: 'd', to: 'e', od, id_: od * (1 - 2 / 25), ...dr25 },
    ],
  });

const ratingNotes = (p: ReturnType<typeof main>) =>
  scheduleView(analyse(p), 'us', WORDING).notes.filter((n) => n.code === 'pipe.over-working-rating');

describe('pipe rating notes', () => {
  it('the same finding on four pipes is one note naming the four', () => {
    const notes = ratingNotes(main());
    expect(notes).toHaveLength(1);
    // as the schedule's pressure column gives them in US units: psi to a tenth
    expect(notes[0]!.text).toContain('200.0 psi');
    expect(notes[0]!.text).toContain('165.0 psi');
    for (const span of ['A1 to A2', 'A2 to A3', 'A3 to A4', 'A4 to A5']) expect(notes[0]!.text).toContain(span);
  });

  it('with pressures that differ along the line (a datum), still one note per case, naming each pipe', () => {
    const notes = ratingNotes(main(100));
    expect(notes).toHaveLength(1);
    expect(notes[0]!.text).toContain('Working');
    for (const span of ['A1 to A2', 'A2 to A3', 'A3 to A4', 'A4 to A5']) expect(notes[0]!.text).toContain(span);
  });
});

describe('an error note under its heading', () => {
  it('says "not adequate" once in the terminal table', () => {
    const table = scheduleTable(scheduleView(analyse(main()), 'us', WORDING), 'Test route');
    const line = table.split('\n').find((l) => l.includes('rated working pressure'))!;
    expect(line).toContain('!! NOT ADEQUATE');
    expect(line.toLowerCase().split('not adequate').length - 1).toBe(1);
  });
});

describe('noteAfterHeading', () => {
  it('drops the sentence’s own "Not adequate:" and starts what is left with a capital', () => {
    expect(noteAfterHeading({ severity: 'error', text: 'Not adequate: the restrained length is cut.' })).toBe(
      'The restrained length is cut.',
    );
    expect(noteAfterHeading({ severity: 'warning', text: 'Not adequate: as written.' })).toBe(
      'Not adequate: as written.',
    );
  });
});
