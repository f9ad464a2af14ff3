import { test, expect } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { MainbracePage } from '../pages/mainbrace.js';
import { clippedOnSheet, pdfPages } from '../pages/crewSheet.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

test.beforeAll(() => {
  execFileSync('corepack', ['pnpm', '--filter', '@mainbrace/solver', 'build'], { cwd: root, stdio: 'ignore' });
});

/**
 * Two routes of our own (invented streets), printed as a crew would get them: an SI main of nine
 * fittings and a US main of twelve, whose last sheet is full, so the job's take-off has no free row of
 * sketches to sit in. At most one page per six fittings, the take-off included.
 */
for (const [name, paper] of [
  ['probe-si', 'A4'],
  ['probe-us', 'Letter'],
  ['probe-us', 'A4'],
  ['probe-si', 'Letter'],
] as const) {
  test(`the crew sheet of ${name} on ${paper} keeps to one ${paper} page per six fittings, take-off included`, async ({
    page,
  }) => {
    const file = `${root}e2e/fixtures/${name}.json`;
    const app = new MainbracePage(page);
    await app.gotoFresh();
    await app.openFile(file);
    await expect.poll(async () => (await app.project()).name).toContain('probe');
    const marks = (await app.schedule()).fittings.map((f) => f.mark);
    const sheets = Math.ceil(marks.length / 6);
    await page.getByRole('button', { name: 'Export ▾' }).click();
    await page.getByRole('menuitem', { name: 'Print the schedule…' }).click();
    const sheet = page.getByTestId('print-sheet');
    // A US project's sheet starts on Letter, a metric one's on A4: each case picks its own.
    await expect(page.getByLabel('Paper size')).toHaveValue(file.includes('probe-us') ? 'letter' : 'a4');
    await page.getByLabel('Paper size').selectOption(paper === 'Letter' ? 'letter' : 'a4');
    await expect(sheet.locator('.crew-sheet')).toHaveAttribute('data-ready', 'yes');
    await expect(page.getByTestId('crew-page')).toHaveCount(sheets);
    await expect(page.getByTestId('job-takeoff')).toHaveCount(1);
    // A page's heading gives each run's span on its own: chainage restarts on each run.
    for (const heading of await page.locator('.sheet-page .tb-sub:not([data-testid])').allTextContents())
      for (const [, a, b] of heading.matchAll(/\b([A-Z]+)\d+–([A-Z]+)\d+\b/g)) expect(a, heading).toBe(b);
    mkdirSync('artifacts', { recursive: true });
    await page.emulateMedia({ media: 'print' });
    const clipped = await clippedOnSheet(page);
    expect(clipped).toEqual([]);
    const pdf = `artifacts/${name}-${paper}.pdf`;
    // The page size is the sheet's own (its @page rule), as the browser's print dialog takes it.
    await page.pdf({ preferCSSPageSize: true, printBackground: true, path: pdf });
    const size = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' }).match(/Page size:\s+([\d.]+) x ([\d.]+)/)!;
    // ISO 216 A4 is 297 × 210 mm (841.89 × 595.28 pt); ANSI Letter 11 × 8.5 in (792 × 612 pt), landscape
    expect([Math.round(Number(size[1])), Math.round(Number(size[2]))]).toEqual(
      paper === 'A4' ? [842, 595] : [792, 612],
    );
    const pages = pdfPages(pdf);
    expect(pages.length).toBe(sheets);
    const all = pages.join('\n');
    expect(all).toMatch(/Total to order/);
    // Chainage order: each mark's first appearance follows the one before it.
    let at = -1;
    for (const m of marks) {
      const i = all.search(new RegExp(`(^|\\s)${m}\\s`));
      expect(i, `${m} is printed`).toBeGreaterThan(at);
      at = i;
    }
    // No id of the file's nodes or pipes on the crew part.
    const project = JSON.parse(readFileSync(file, 'utf8')) as { nodes: { id: string }[]; pipes: { id: string }[] };
    for (const { id } of [...project.nodes, ...project.pipes]) expect(all).not.toMatch(new RegExp(`\\b${id}\\b`));
  });
}
