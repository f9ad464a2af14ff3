import { test, expect } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { MainbracePage } from '../pages/mainbrace.js';
import { clippedOnSheet, pdfPages } from '../pages/crewSheet.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const demo = `${root}public/demo/larkspur-rise.json`;

test.beforeAll(() => {
  execFileSync('corepack', ['pnpm', '--filter', '@mainbrace/solver', 'build'], { cwd: root, stdio: 'ignore' });
});

test('the crew sheet of the demo prints in chainage order, six fittings a page, with dimensions and notes', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const schedule = await app.schedule();
  const marks = schedule.fittings.map((f) => f.mark);
  // The command line's table lists the same fittings in the same order.
  const table = execFileSync(process.execPath, [`${root}packages/solver/bin/mainbrace.mjs`, 'schedule', demo], {
    encoding: 'utf8',
  });
  const cliMarks = table
    .split('\n')
    .map((l) => /^([A-Z]+\d+)\s/.exec(l)?.[1])
    .filter(Boolean);
  expect(cliMarks).toEqual(marks);

  // Title-block fields are project fields, typed in the sheet tab.
  await app.drawerTab('sheet');
  await page.getByTestId('sheet-drawingNumber').fill('QA-W-104');
  await page.getByTestId('sheet-revision').fill('B');
  await page.getByTestId('sheet-drawnBy').fill('R. Okafor');
  await expect
    .poll(async () => ((await app.project()) as { sheet?: { drawingNumber: string } }).sheet?.drawingNumber)
    .toBe('QA-W-104');
  await expect(page.getByTestId('takeoff')).toContainText('Total to order');
  await app.shot('sheet-and-quantities');
  // The details panel shows the selected fitting's sketch.
  const a4 = schedule.fittings.find((f) => f.mark === 'A4')!;
  await app.selectNode(a4.node);
  await expect(page.getByTestId('sketch-A4')).toBeVisible();
  await page.getByTestId('sketch-A4').screenshot({ path: 'artifacts/details-sketch-A4.png' });

  await page.getByRole('button', { name: 'Export ▾' }).click();
  await page.getByRole('menuitem', { name: 'Print the schedule…' }).click();
  const sheet = page.getByTestId('print-sheet');
  await expect(sheet.locator('.crew-sheet')).toHaveAttribute('data-ready', 'yes');
  const sheets = Math.ceil(marks.length / 6);
  await expect(page.getByTestId('crew-page')).toHaveCount(sheets);
  await expect(page.getByTestId('appendix')).toHaveCount(0);

  mkdirSync('artifacts', { recursive: true });
  await page.emulateMedia({ media: 'print' });
  await page.pdf({ format: 'A4', landscape: true, printBackground: true, path: 'artifacts/crew-sheet.pdf' });
  // Nothing a crew needs is cut off: notes, sketches' words and the take-off end inside their page.
  const clipped = await clippedOnSheet(page);
  expect(clipped).toEqual([]);

  const pages = pdfPages('artifacts/crew-sheet.pdf');
  // At most one A4 landscape page per six fittings, the take-off included.
  expect(pages.length).toBe(sheets);
  writeFileSync('artifacts/crew-sheet.txt', pages.join('\n\f\n'));
  const all = pages.join('\n');
  // Order: each mark's first appearance follows the one before it.
  let at = -1;
  for (const m of marks) {
    const i = all.search(new RegExp(`(^|\\s)${m}\\s`));
    expect(i, `${m} is printed`).toBeGreaterThan(at);
    at = i;
  }
  // No internal pipe or node id on the crew part.
  expect(all).not.toMatch(/\b[pn]\d+\b/);
  // Every block has three dimensions; anchors and pads likewise.
  for (const f of schedule.fittings) {
    if (f.restraint.block) expect(all).toMatch(/\d\.\d\d m w × \d\.\d\d m h × \d\.\d\d m t/);
    if ((f.restraint as { anchor?: unknown }).anchor) expect(all).toMatch(/\d\.\d\d m L × \d\.\d\d m W × \d\.\d\d m H/);
  }
  expect(all).toMatch(/bears [NESW]{1,2} against undisturbed soil on the outside of the bend/);
  expect(all).toMatch(/toward A1[24] \(2 joints\)/);
  // Notes printed by number, and the rows refer to them.
  // The demo's anchors sit below groundwater (A6, A9) and its valve's thrust reverses (A10).
  expect(all).toMatch(/Gravity anchor below groundwater.*\(A6, A9\)/);
  expect(all).toMatch(/The thrust reverses between load states.*\(A10\)/);
  expect(all).toMatch(/A10 535\.0 Valve .* 1, 4, 6 /);
  // The creek crossing's bends (A6 to A9) turn angles no standard bend makes, and the note says so.
  expect(all).toMatch(/No standard bend turns the angle drawn.*\(A6, A7, A8, A9\)/);
  expect(all).toMatch(/Total to order/);
  for (const [i, p] of pages.entries()) {
    expect(p).toContain(`Sheet ${i + 1} of ${sheets}`);
    expect(p).toContain('QA-W-104');
    expect(p).toMatch(/licensed professional engineer/);
    expect(p).toMatch(/undisturbed soil/);
    expect(p).toMatch(/cure before pressure testing/);
  }

  // The appendix is optional: asked for, it follows the crew part.
  await page.emulateMedia({ media: 'screen' });
  await page.getByTestId('print-appendix').check();
  await expect(page.getByTestId('appendix')).toBeVisible();
  await page.emulateMedia({ media: 'print' });
  await page.pdf({ format: 'A4', landscape: true, printBackground: true, path: 'artifacts/crew-sheet-appendix.pdf' });
  expect(pdfPages('artifacts/crew-sheet-appendix.pdf').length).toBeGreaterThan(sheets);
});
