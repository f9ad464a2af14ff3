import { test, expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { MainbracePage } from '../pages/mainbrace.js';

const testPressure = async (app: MainbracePage) =>
  (await app.project()).loadCases.find((c) => c.id === 'test')!.pressure;

async function setTestPressure(app: MainbracePage, kPa: string) {
  await app.drawerTab('cases');
  const field = app.page.getByTestId('test-pressure');
  await field.fill(kPa);
  await field.press('Enter');
}

/** Opens a second tab of the app in the same browser (same storage), ready to edit. */
async function secondTab(first: Page): Promise<MainbracePage> {
  const app = new MainbracePage(await first.context().newPage());
  await app.page.goto('/');
  await app.ready();
  return app;
}

test('two tabs editing one project both keep their edits (the tabs tell each other)', async ({ page }) => {
  const a = new MainbracePage(page);
  await a.gotoFresh();
  const b = await secondTab(page);

  await setTestPressure(a, '1500');
  await expect.poll(() => testPressure(a)).toBe(1_500_000);
  // B was idle: it takes A's saved change in and says so.
  await expect.poll(() => testPressure(b)).toBe(1_500_000);
  await expect(b.page.getByTestId('notice')).toContainText('Updated with the changes saved in another tab');

  await b.page.getByLabel('Project name').fill('Fenwick Row main');
  await expect.poll(async () => (await a.project()).name).toBe('Fenwick Row main');

  await a.page.reload();
  await a.ready();
  expect((await a.project()).name).toBe('Fenwick Row main');
  expect(await testPressure(a)).toBe(1_500_000);
  await b.page.close();
});

test('a tab that cannot hear the other never saves over its newer copy, and offers to keep both', async ({ page }) => {
  const a = new MainbracePage(page);
  await a.gotoFresh();
  // B's browser has no BroadcastChannel: only the stored revision can tell it about A's save.
  const bPage = await page.context().newPage();
  await bPage.addInitScript(() => {
    delete (window as { BroadcastChannel?: unknown }).BroadcastChannel;
  });
  const b = new MainbracePage(bPage);
  await bPage.goto('/');
  await b.ready();

  await setTestPressure(a, '1500');
  await expect.poll(() => testPressure(a)).toBe(1_500_000);
  await page.waitForTimeout(800); // A's autosave has written revision 1
  await bPage.getByLabel('Project name').fill('Fenwick Row main');
  const notice = bPage.getByTestId('notice');
  await expect(notice).toContainText('This project was changed in another tab: nothing was overwritten');
  await b.shot('two-tabs-conflict');

  // Nothing was lost yet: storage still has A's pressure, B's rename is a kept copy.
  await a.page.reload();
  await a.ready();
  expect(await testPressure(a)).toBe(1_500_000);
  expect((await a.project()).name).not.toBe('Fenwick Row main');

  // B goes on with its own version; A's version becomes a kept copy, downloadable from the list.
  await notice.getByRole('button', { name: 'Keep this tab’s version' }).click();
  await expect(notice).toContainText('This tab’s version is saved; the other tab’s version is in Kept copies');
  await bPage.getByTestId('kept-copies').click();
  const dialog = bPage.getByTestId('kept-copies-dialog');
  await expect(dialog.getByTestId('kept-copy')).toHaveCount(1);
  await expect(dialog).toContainText('another tab’s version, replaced by this tab’s');
  await b.shot('kept-copies');
  const [download] = await Promise.all([
    bPage.waitForEvent('download'),
    dialog.getByRole('button', { name: 'Download' }).click(),
  ]);
  const keptA = JSON.parse(readFileSync((await download.path())!, 'utf8'));
  expect(keptA.loadCases.find((c: { id: string }) => c.id === 'test').pressure).toBe(1_500_000);

  await a.page.reload();
  await a.ready();
  expect((await a.project()).name).toBe('Fenwick Row main');
  await bPage.close();
});
