import { test, expect, type Page } from '@playwright/test';
import { MainbracePage } from '../pages/mainbrace.js';

/** The project text the app keeps in IndexedDB (idb-keyval's default store), or null. */
function kept(
  page: Page,
): Promise<{ name: string; nodes?: unknown[]; loadCases: { id: string; pressure: number }[] } | null> {
  return page.evaluate(
    () =>
      new Promise((resolve) => {
        const open = indexedDB.open('keyval-store');
        open.onerror = () => resolve(null);
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains('keyval')) return resolve(null);
          const get = db.transaction('keyval').objectStore('keyval').get('mainbrace.project.v1');
          get.onsuccess = () => {
            // The record carries its revision beside the text; earlier releases kept the bare text.
            const text = typeof get.result === 'string' ? get.result : get.result?.text;
            resolve(typeof text === 'string' ? JSON.parse(text) : null);
          };
          get.onerror = () => resolve(null);
        };
      }),
  );
}

test('a renamed project with a new test pressure comes back as it was after a reload', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await page.getByLabel('Project name').fill('Brackenfold Lane main, phase 3');
  await app.drawerTab('cases');
  const field = page.getByTestId('test-pressure');
  await field.fill('1250');
  await field.press('Enter');
  await expect.poll(async () => (await app.project()).loadCases.find((c) => c.id === 'test')!.pressure).toBe(1_250_000);

  // Autosave writes shortly after the last edit: wait until storage holds both edits, not for a fixed time.
  await expect
    .poll(async () => {
      const k = await kept(page);
      return k && [k.name, k.loadCases.find((c) => c.id === 'test')?.pressure];
    })
    .toEqual(['Brackenfold Lane main, phase 3', 1_250_000]);
  const before = await app.project();
  const scheduleBefore = await app.schedule();

  await page.reload();
  await app.ready();
  await expect.poll(async () => (await app.project()).name).toBe('Brackenfold Lane main, phase 3');
  expect(await app.project()).toEqual(before);
  expect(await app.schedule()).toEqual(scheduleBefore);
  await expect(page.getByLabel('Project name')).toHaveValue('Brackenfold Lane main, phase 3');
  await app.drawerTab('cases');
  await expect(page.getByTestId('test-pressure')).toHaveValue('1250');
  await app.shot('reload-restore');
});

test('the last edit comes back after a reload or a navigation made at once, before the autosave wrote it', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [100, 0],
    [150, 50],
  ]);
  await expect.poll(async () => (await kept(page))?.nodes?.length).toBe(3);

  // A second run, and the page reloaded at once: no waiting for the autosave.
  await app.draw([
    [150, 50],
    [150, 120],
    [50, 120],
    [0, 100],
  ]);
  const drawn = await app.project();
  expect(drawn.nodes).toHaveLength(6);
  await page.reload();
  await app.ready();
  expect(await app.project()).toEqual(drawn);

  // A field committed, then the page left for another and opened again at once.
  await app.drawerTab('cases');
  const field = page.getByTestId('test-pressure');
  await field.fill('1375');
  await field.press('Enter');
  await expect.poll(async () => (await app.project()).loadCases.find((c) => c.id === 'test')!.pressure).toBe(1_375_000);
  await page.goto('about:blank');
  await page.goto('/');
  await app.ready();
  expect((await app.project()).loadCases.find((c) => c.id === 'test')!.pressure).toBe(1_375_000);
  expect((await app.project()).nodes).toHaveLength(6);
  // No warning: the edit was the user's own and nothing newer was in storage.
  await expect(page.getByRole('alert')).toHaveCount(0);
});

test('a run being drawn when the page is reloaded comes back as drawn so far', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.tool('draw');
  for (const [x, y] of [
    [0, 0],
    [80, 0],
    [80, 60],
  ] as const)
    await app.clickPlan(x, y);
  // no Enter: the run is still being drawn
  expect((await app.project()).pipes).toHaveLength(0);
  await page.reload();
  await app.ready();
  const doc = await app.project();
  expect(doc.pipes).toHaveLength(2);
  expect(doc.nodes.map((n) => [Math.round(n.x), Math.round(n.y)])).toEqual([
    [0, 0],
    [80, 0],
    [80, 60],
  ]);
});
