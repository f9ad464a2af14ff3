import { test, expect, type Page } from '@playwright/test';
import { readFileSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { MainbracePage } from '../pages/mainbrace.js';

/** Waits until the page is controlled by a service worker that has cached the app. */
async function controlled(page: Page) {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

/** The built app the preview server reads from disk on every request. */
const dist = fileURLToPath(new URL('../../app/dist/', import.meta.url));

test('a tab left open across an update still opens its lazily loaded views, and is told of the new version', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await controlled(page);
  await app.ready();

  // Deploy the next version: a new worker with a new cache, and this tab's profile chunk gone from the server.
  const workerFile = join(dist, 'sw.js');
  const old = readFileSync(workerFile, 'utf8');
  const chunk = /"\.\/(assets\/ProfilePanel-[\w-]+\.js)"/.exec(old)![1]!;
  const next = old
    .replace(/const CACHE = 'mainbrace-\w+'/, "const CACHE = 'mainbrace-nextversion'")
    .replace(`"./${chunk}",`, '');
  let removed = false;
  try {
    writeFileSync(workerFile, next);
    renameSync(join(dist, chunk), join(dist, `${chunk}.removed`));
    removed = true;
    // Nor in the browser's HTTP cache: only a service worker copy can bring it back.
    await (await page.context().newCDPSession(page)).send('Network.clearBrowserCache');
    await page.evaluate(async () => {
      const registration = await navigator.serviceWorker.getRegistration();
      await registration!.update();
    });
    await expect(page.getByTestId('notice')).toContainText('A new version of Mainbrace is installed', {
      timeout: 20_000,
    });
    // The new worker has finished activating (it would have removed old files by now).
    await page.waitForFunction(async () => {
      const r = await navigator.serviceWorker.getRegistration();
      return r?.active?.state === 'activated' && !r.installing && !r.waiting;
    });
    expect(await page.evaluate(() => caches.keys())).toContain('mainbrace-nextversion');
    await page.waitForTimeout(1000); // and its clean-up after activation, if any, has run

    await page.evaluate(() => ((window as { stillTheSamePage?: boolean }).stillTheSamePage = true));
    await app.drawerTab('profile');
    await expect(page.getByRole('img', { name: 'Pressure of every case along the main line' })).toBeVisible();
    // Served from the retired version's cache: the tab did not have to reload.
    expect(await page.evaluate(() => (window as { stillTheSamePage?: boolean }).stillTheSamePage)).toBe(true);
    await expect(page.getByTestId('recovery')).toHaveCount(0);
    await app.shot('offline-update');
  } finally {
    writeFileSync(workerFile, old);
    if (removed) renameSync(join(dist, `${chunk}.removed`), join(dist, chunk));
  }
});

test('a view whose file is gone everywhere reloads into the new version with the project kept', async ({
  page,
  context,
}) => {
  const app = new MainbracePage(page);
  // No service worker copy and no server copy of the profile chunk: as after a deploy. The app loads
  // its lazy views once the first screen is drawn; that load fails quietly, and the view's first use
  // finds its file gone.
  await context.route('**/assets/ProfilePanel-*.js', (route) => route.fulfill({ status: 404, body: 'gone' }));
  await app.gotoFresh();
  await page.getByLabel('Project name').fill('Corbel Street main');
  await page.evaluate(async () => {
    for (const r of await navigator.serviceWorker.getRegistrations()) await r.unregister();
    for (const k of await caches.keys()) await caches.delete(k);
  });
  await app.drawerTab('profile');
  await expect(page.getByTestId('notice')).toContainText(
    'Mainbrace was updated while this tab was open: it reloaded into the new version with your project',
  );
  await app.ready();
  expect((await app.project()).name).toBe('Corbel Street main');
  await expect(page.getByTestId('recovery')).toHaveCount(0);
});
