import { test, expect } from '@playwright/test';
import { MainbracePage } from '../pages/mainbrace.js';

type LevelNode = { id: string; elevation: number; cover: number; groundLevel?: number };

test('a node given a ground level places its pipe from a typed cover, and the long section shows and prints it', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const project = await app.project();
  const pipe = project.pipes[0]!;
  const id = pipe.to;
  const before = project.nodes.find((n) => n.id === id) as unknown as LevelNode;
  const od = Math.max(...project.pipes.filter((p) => p.from === id || p.to === id).map((p) => p.outsideDiameter));
  await app.selectNode(id);
  await page.getByTestId('node-add-ground').click();
  // The ground the stated cover implied: centreline + OD/2 + cover (project-format.md, "Ground levels").
  const ground = before.elevation + od / 2 + before.cover;
  await expect
    .poll(async () => ((await app.project()).nodes.find((n) => n.id === id) as unknown as LevelNode).groundLevel)
    .toBeCloseTo(ground, 5);
  await expect(page.getByTestId('node-ground')).toBeVisible();

  // Typing the cover moves the pipe: ground − 2.0 − OD/2.
  await page.getByTestId('node-cover').fill('2.0');
  await page.getByTestId('node-cover').press('Enter');
  await expect
    .poll(async () => ((await app.project()).nodes.find((n) => n.id === id) as unknown as LevelNode).elevation)
    .toBeCloseTo(ground - 2.0 - od / 2, 5);
  await app.shot('ground-level-details');

  await app.drawerTab('profile');
  const section = page.getByTestId('long-section');
  await expect(section).toBeVisible();
  await expect(page.getByTestId('section-exaggeration')).toHaveText(/^Vertical scale [\d.]+ × horizontal$/);
  // The demo's branches leave the main at its tees and are drawn from there.
  await expect(page.locator('[data-testid^="section-branch-"]').first()).toBeVisible();
  await expect(section).toContainText('groundwater');
  await app.shot('long-section');

  // Printing draws the section on its own with the caution (the browser's dialog is stubbed out).
  await page.evaluate(() => {
    window.print = () => ((window as unknown as { printed: boolean }).printed = true);
  });
  await page.getByTestId('print-long-section').click();
  await expect.poll(() => page.evaluate(() => (window as unknown as { printed?: boolean }).printed)).toBe(true);
  const sheet = page.getByTestId('long-section-print');
  await expect(sheet).toContainText('Long section');
  // with the project's title block, as every printed page has it
  await expect(sheet.locator('.title-block')).toContainText('Drawing no.');
  await expect(sheet.locator('.title-block h1')).toHaveText((await app.project()).name);
  await expect(sheet).toContainText('checked by a licensed engineer');
  await page.emulateMedia({ media: 'print' });
  await app.shot('long-section-print');
});

test('a stretch of the main laid on an even grade from the levels table, and undone', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await app.drawerTab('profile');
  const table = page.getByTestId('levels-table');
  await expect(table).toBeVisible();
  // The main's first four nodes: the three grades between them become one.
  await page.getByTestId('grade-from').selectOption({ index: 1 });
  await page.getByTestId('grade-to').selectOption({ index: 4 });
  const gradeCells = table.locator('tbody tr td:last-child');
  const before = await gradeCells.allTextContents();
  await page.getByTestId('grade-lay').click();
  const said = page.getByTestId('grade-said');
  await expect(said).toContainText('laid on an even grade of');
  const grade = /grade of (-?[\d.]+) %/.exec((await said.textContent()) ?? '')![1]!;
  await expect(gradeCells.nth(0)).toHaveText(grade);
  await expect(gradeCells.nth(1)).toHaveText(grade);
  await expect(gradeCells.nth(2)).toHaveText(grade);
  await app.shot('levels-even-grade');
  await page.keyboard.press('Control+z');
  await expect.poll(() => gradeCells.allTextContents()).toEqual(before);
});
