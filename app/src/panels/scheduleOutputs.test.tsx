import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup, waitFor } from '@testing-library/react';
import {
  analyse,
  pickColumns,
  scheduleCsv,
  scheduleTable,
  TABLE_COLUMNS,
  type Project,
  type UnitSystem,
} from '@mainbrace/solver';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { ScheduleTable } from './ScheduleTable.js';
import { RouteSummary } from './RouteSummary.js';
import { PrintSheet } from '../print/PrintSheet.js';
import { csvRecords, demoProject, DN300 } from '../testFixtures.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

afterEach(cleanup);

const demo = demoProject;

/** The texts of a rendered table's body rows, cell by cell. */
const bodyCells = (table: Element) =>
  [...table.querySelectorAll('tbody tr')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? ''));

describe('the four schedule outputs agree cell for cell (app table, print, CLI table, CSV)', () => {
  for (const units of ['si', 'us'] as UnitSystem[]) {
    it(`on the demo in ${units.toUpperCase()}`, () => {
      const project = { ...demo(), units };
      const store = createAppStore(project, DN300);
      const actions = createActions(store);
      const view = scheduleViewOf(analyse(project), units);
      const { container } = render(
        <StoreProvider store={store} actions={actions}>
          <ScheduleTable />
          <PrintSheet onClose={() => {}} />
        </StoreProvider>,
      );
      // The print's first sheet is made at once, the rest a few at a time: the first sheet's rows are
      // the first six of the view (crew order).
      const tables: [Element[], number][] = [
        [[container.querySelector('[data-testid="schedule-table"]')!], view.rows.length],
        [[...container.querySelectorAll('.crew-table')], Math.min(view.rows.length, 6)],
      ];
      for (const [group, count] of tables) {
        const heads = [...group[0]!.querySelectorAll('thead th')].map((th) => th.textContent!.replace(/ [▲▼]$/, ''));
        const columns = heads.map((h) => view.columns.find((c) => c.heading === h)!);
        expect(columns.every(Boolean)).toBe(true);
        const rows = group.flatMap(bodyCells);
        expect(rows.length).toBe(count);
        rows.forEach((cells, i) => cells.forEach((text, k) => expect(text).toBe(view.rows[i]!.cells[columns[k]!.id])));
      }
      // The CLI table's compact columns and the CSV hold the very same cells.
      const cli = scheduleTable(view, project.name);
      const csv = scheduleCsv(view);
      for (const r of view.rows) {
        const line = cli.split('\n').find((l) => l.startsWith(`${r.cells.mark} `))!;
        for (const c of pickColumns(view, TABLE_COLUMNS)) expect(line).toContain(r.cells[c.id]);
        expect(csv).toContain(r.cells.restraint);
      }
    });
  }
});

describe('the route summary’s concrete is the schedule’s total', () => {
  for (const units of ['si', 'us'] as UnitSystem[]) {
    it(`on the demo in ${units.toUpperCase()}`, () => {
      // Invariant: both add the pieces as printed (each rounded up), so the two figures on one screen agree.
      const project = { ...demo(), units };
      const store = createAppStore(project, DN300);
      store.setState({ units });
      const { container } = render(
        <StoreProvider store={store} actions={createActions(store)}>
          <RouteSummary />
          <ScheduleTable />
        </StoreProvider>,
      );
      const total = container.querySelector('[data-testid="schedule-table"] tfoot td.num.strong')!.textContent!;
      const facts = [...container.querySelectorAll('dl.facts dt')];
      const summary = facts.find((dt) => dt.textContent === 'Concrete (blocks, anchors, pads)')!.nextElementSibling!;
      expect(summary.textContent).toBe(`${total} ${units === 'si' ? 'm³' : 'yd³'}`);
    });
  }
});

describe('positions along the route follow the sheet setting in the app table as on the print', () => {
  it('shows stations (100 ft a station in US units) in place of chainage, and both when asked', () => {
    for (const [style, expected] of [
      ['stations', ['Station']],
      ['both', ['Chainage (ft)', 'Station']],
    ] as const) {
      const project: Project = { ...demo(), units: 'us', sheet: { ...demo().sheet!, chainageStyle: style } };
      const store = createAppStore(project, DN300);
      const { container } = render(
        <StoreProvider store={store} actions={createActions(store)}>
          <ScheduleTable />
        </StoreProvider>,
      );
      const heads = [...container.querySelectorAll('thead th')].map((th) => th.textContent!.replace(/ [▲▼]$/, ''));
      expect(heads.slice(1, 1 + expected.length)).toEqual(expected);
      // The demo's A2 stands 120.0 m along run A: 393.7 ft, station 3+93.7 (hand conversion, 1 ft = 0.3048 m).
      const a2 = [...container.querySelectorAll('tbody tr')].find((tr) => tr.textContent!.startsWith('A2'))!;
      expect(a2.textContent).toContain('3+93.7');
      cleanup();
    }
  });
});

describe('the CSV words its warnings in the display units, as the print words its notes', () => {
  it('gives the demo’s US warnings in feet, inches and kip, each the sentence of a note the print shows', async () => {
    const project: Project = { ...demo(), units: 'us' };
    const store = createAppStore(project, DN300);
    store.setState({ units: 'us' });
    const { container } = render(
      <StoreProvider store={store} actions={createActions(store)}>
        <PrintSheet onClose={() => {}} />
      </StoreProvider>,
    );
    const view = scheduleViewOf(analyse(project), 'us');
    const records = csvRecords(scheduleCsv(view));
    const warnings = records[0]!.indexOf('Warnings');
    const a10 = records.find((r) => r[0] === 'A10')![warnings]!.split(' | ');
    // The demo's A10 block face is 0.95 m = 37.4 in, shown 3 ft 2 in (its Face width cell); its trench is
    // 0.874 m = 34.4 in, a built width rounded up to 35 in = 2 ft 11 in (columnUnits.ts, built lengths).
    expect(a10[0]).toMatch(/^Bearing face 3 ft 2 in wide is wider than the 2 ft 11 in trench/);
    expect(a10[1]).toMatch(/^The thrust reverses between load states \(up to [\d.]+ kip the other way\)/);
    // The print's notes of A10 (on a later sheet, made a few at a time) are the same sentences.
    const printed = () => [...container.querySelectorAll('.sheet-notes li')].map((li) => li.textContent!);
    await waitFor(() => {
      for (const w of a10) expect(printed().some((p) => p.startsWith(`${w} (`) && p.includes('A10'))).toBe(true);
    });
    // A row's "Notes 1, 3" refer to the numbered fitting notes only: the page's cautions are not numbered.
    expect(container.querySelectorAll('ol.sheet-notes').length).toBeGreaterThan(0);
    expect(container.querySelectorAll('ol.sheet-cautions, .sheet-foot ol').length).toBe(0);
    expect(container.querySelectorAll('ul.sheet-cautions li').length).toBeGreaterThanOrEqual(5);
    // No length, force or pressure in SI units anywhere in the US warnings.
    for (const r of records.slice(1).filter((r) => r[warnings])) expect(r[warnings]).not.toMatch(/\d (m|kN|kPa)\b/);
  });
});
