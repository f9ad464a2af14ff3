import { test, expect } from '@playwright/test';
import { sameContent } from '../pages/sameContent.js';
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { readFileSync } from 'node:fs';
import { MainbracePage } from '../pages/mainbrace.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const demo = `${root}public/demo/larkspur-rise.json`;

test.beforeAll(() => {
  // The command line runs compiled: build it from the current sources.
  execFileSync('corepack', ['pnpm', '--filter', '@mainbrace/solver', 'build'], { cwd: root, stdio: 'ignore' });
});

test('the exported schedule JSON is the command line’s schedule of the same file', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const exported = JSON.parse(await app.exportText('Schedule as JSON'));
  const cli = JSON.parse(
    execFileSync(
      process.execPath,
      [`${root}packages/solver/bin/mainbrace.mjs`, 'schedule', demo, '--format', 'json', '--full'],
      {
        encoding: 'utf8',
      },
    ),
  );
  // Same content: every field and text equal; numbers equal to 1e-12 (Chromium's and Node's Math.atan2
  // may differ in the last bit).
  expect(sameContent(exported, cli)).toEqual([]);
  const csv = await app.exportText('Schedule as CSV');
  expect(csv.split('\r\n')[0]).toContain('Thrust (kN)');
  // the header, a record per fitting, a blank record, then the cautions
  const records = csv.split('\r\n');
  expect(records.indexOf('')).toBe(cli.fittings.length + 1);
  expect(records.slice(cli.fittings.length + 2).join(' ')).toMatch(/Caution: .*licensed/);
});

test('raising the field-test pressure grows every block’s bearing area with its horizontal thrust', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const before = await app.schedule();
  await app.drawerTab('cases');
  const field = page.getByTestId('test-pressure');
  await field.fill('1500');
  await field.press('Enter');
  await expect.poll(async () => (await app.project()).loadCases.find((c) => c.id === 'test')!.pressure).toBe(1_500_000);
  const after = await app.schedule();
  // A = SF·T_h/σ (DIPRA bearing method; docs/check-values.md CV-11), plus the outside area π·OD²/4 of a
  // pipe that runs through the face (register block.pipe-through-face): with σ and SF unchanged, the
  // area less that pipe's scales exactly as the thrust, and what is left over is no pipe or one of the
  // fitting's own.
  let checked = 0;
  for (const f of after.fittings) {
    const old = before.fittings.find((x) => x.node === f.node)!;
    if (!f.restraint.block || !old.restraint.block) continue;
    const [a0, a1] = [old.restraint.block.bearingArea, f.restraint.block.bearingArea];
    const [t0, t1] = [old.horizontalThrust, f.horizontalThrust];
    const through = a0 - (t0 * (a1 - a0)) / (t1 - t0);
    const pipes = [0, ...f.pipes.map((p) => (Math.PI * p.outsideDiameter ** 2) / 4)];
    expect(Math.min(...pipes.map((a) => Math.abs(a - through)))).toBeLessThan(1e-9);
    const ratio = (a1 - through) / (a0 - through);
    if (f.governingCase === 'test') expect(ratio).toBeGreaterThan(1.3);
    checked++;
  }
  expect(checked).toBeGreaterThan(8);
  await expect(page.getByTestId('governing')).toContainText('Field test');
  await app.shot('raised-test-pressure');
});

test('the printed schedule is a multi-page landscape sheet that names every fitting', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const marks = (await app.schedule()).fittings.map((f) => f.mark);
  await page.getByRole('button', { name: 'Export ▾' }).click();
  await page.getByRole('menuitem', { name: 'Print the schedule…' }).click();
  const sheet = page.getByTestId('print-sheet');
  await expect(sheet).toBeVisible();
  // Long schedules are prepared a few sheets at a time: read the sheet once every sheet is there.
  await expect(sheet.locator('.crew-sheet')).toHaveAttribute('data-ready', 'yes');
  const text = await sheet.innerText();
  for (const mark of marks) expect(text).toContain(mark);
  expect(text).toMatch(/licensed professional engineer/);
  expect(text).toMatch(/cure before pressure testing|cured before pressure testing|Let block concrete cure/);
  await page.emulateMedia({ media: 'print' });
  const pdf = await page.pdf({ format: 'A4', landscape: true, printBackground: true, path: 'artifacts/schedule.pdf' });
  await page.emulateMedia({ media: 'screen' });
  const pages = (pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length;
  expect(pages).toBeGreaterThanOrEqual(2);
  expect(readFileSync('artifacts/schedule.pdf').length).toBeGreaterThan(10_000);
  await page.screenshot({ path: 'artifacts/print-preview.png' });
});
