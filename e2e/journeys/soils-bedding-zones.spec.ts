import { test, expect } from '@playwright/test';
import { fileURLToPath } from 'node:url';
import { readFileSync } from 'node:fs';
import { MainbracePage } from '../pages/mainbrace.js';

const earlier = fileURLToPath(new URL('../fixtures/earlier-project.json', import.meta.url));
/** 1 lb/ft² in Pa (NIST SP 811, Appendix B.8). */
const PSF = 47.880259;

type Doc = {
  soils: { id: string; label?: string; bearing: number; source?: string }[];
  pipes: { id: string; trenchType?: number; encasement?: string }[];
  design: Record<string, unknown>;
};
const doc = (app: MainbracePage) => app.project() as unknown as Promise<Doc>;

/** Every value of `stored` found unchanged at the same path of `read`. */
function changed(stored: unknown, read: unknown, path = '$'): string[] {
  if (stored === null || typeof stored !== 'object') return Object.is(stored, read) ? [] : [path];
  if (read === null || typeof read !== 'object') return [path];
  return Object.entries(stored).flatMap(([k, v]) => changed(v, (read as Record<string, unknown>)[k], `${path}.${k}`));
}

test('soil classes come grouped by kind with their source, and bedding and wrap set every pipe in one step', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await app.drawerTab('soils');
  const picker = page.getByTestId('soil-library');
  const groups = await picker.locator('optgroup').evaluateAll((gs) => gs.map((g) => g.getAttribute('label')));
  expect(groups.map((g) => g!.split(' — ')[0])).toEqual(['Cohesionless', 'Cohesive', 'Organic', 'Rock']);
  // Within a kind, classes run from the weakest bearing to the strongest, the source beside each.
  const cohesive = await picker.locator('optgroup').nth(1).locator('option').allInnerTexts();
  expect(cohesive.at(-1)).toMatch(/^Clay, hard · 431 kPa · DIPRA bearing table$/);
  await picker.selectOption('shale-hard');
  await expect(page.getByTestId('soil-class-source')).toContainText('AWWA M23 does not contain it');
  await page.getByTestId('add-soil').click();
  const added = (await doc(app)).soils.at(-1)!;
  expect(added.label).toBe('Shale, hard');
  expect(Math.abs(added.bearing - 10000 * PSF)).toBeLessThan(0.01); // the list's 10,000 lb/ft²
  const source = page.getByTestId('soils-table').getByLabel('Source of Shale, hard');
  await expect(source).toHaveValue(/row "Hard shale"/);
  // Once a value the library row gave is changed, the row no longer vouches for it: the source says so.
  await page.getByTestId('soils-table').getByLabel('Bearing of Shale, hard').fill('200');
  await page.getByTestId('soils-table').getByLabel('Bearing of Shale, hard').press('Enter');
  await expect(source).toHaveValue(/^Edited by the user: state the source of these values \(was: .*row "Hard shale"/);
  await source.fill('Site report GR-7, borehole 2');
  expect((await doc(app)).soils.at(-1)!.source).toBe('Site report GR-7, borehole 2');

  const bedding = page.getByTestId('bedding-and-wrap');
  await bedding.getByLabel(/Bedding of all/).selectOption('4');
  await expect(page.getByTestId('bedding-words')).toContainText('AWWA C150/C151 laying condition 4');
  await bedding.getByLabel('Wrap').selectOption('polyethylene');
  const wrapped = await doc(app);
  expect(new Set(wrapped.pipes.map((p) => `${p.trenchType} ${p.encasement}`))).toEqual(new Set(['4 polyethylene']));
  await app.undo();
  await expect.poll(async () => (await doc(app)).pipes.every((p) => p.encasement === undefined)).toBe(true);
  expect((await doc(app)).pipes.every((p) => p.trenchType === 4)).toBe(true);
  await app.shot('soils-bedding');
});

test('a restrained bend shows its joints by mark, and each block and anchor is named by its fitting', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const marks = new Map((await app.schedule()).fittings.map((f) => [f.mark, f.node]));
  await page.getByTestId(`row-${marks.get('A13')}`).click();
  const results = page.getByTestId('fitting-results');
  // 6.2 m of restrained length at the default 6 m laying length: joints at 0 and 6 m.
  await expect(results.getByTestId('restrained').first()).toContainText('A13 joints');
  await expect(results.getByTestId('restrained').first()).toContainText('2 joints at 6.0 m laying length');
  await app.shot('restrained-zone');
  await page.getByTestId(`row-${marks.get('A10')}`).click();
  await expect(results.getByTestId('block')).toContainText('A10 block');
  await expect(results.getByTestId('reverse-block')).toContainText('A10 opposite block');
  await page.getByTestId(`row-${marks.get('A6')}`).click();
  await expect(results.getByTestId('anchor')).toContainText('A6 anchor');
});

test('a file saved by an earlier version opens with every stored value unchanged', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await app.openFile(earlier);
  await expect.poll(async () => (await app.project()).name).toMatch(/Fernhollow Lane/);
  const stored = JSON.parse(readFileSync(earlier, 'utf8'));
  const read = await doc(app);
  expect(changed(stored, read)).toEqual([]);
  expect(read.soils.map((s) => s.id)).toContain('dipra-hard-clay');
  expect(read.design.layingLength).toBe(6); // only the documented default is added
});
