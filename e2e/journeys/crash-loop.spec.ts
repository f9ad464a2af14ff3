import { test, expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { MainbracePage } from '../pages/mainbrace.js';

/** The name that makes the screen fail: see the fault put into the page below. */
const FAILING_NAME = 'Harrow Cut main ☠';

/**
 * No known input crashes the app any more, so the journey puts a fault in the page: setting an input
 * to a value with ☠ throws, as a formatting bug once did for every reload of a kept project.
 */
async function failOnSkull(page: Page) {
  await page.addInitScript(() => {
    const value = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!;
    Object.defineProperty(HTMLInputElement.prototype, 'value', {
      ...value,
      set(this: HTMLInputElement, v: string) {
        if (String(v).includes('☠')) throw new Error('the screen could not be drawn for this project');
        value.set!.call(this, v);
      },
    });
  });
}

/** Writes a project into the browser's storage as the app keeps it, as if saved at the last visit. */
async function keepInBrowser(page: Page, project: object) {
  await page.evaluate(
    (text) =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open('keyval-store');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const tx = open.result.transaction('keyval', 'readwrite');
          tx.objectStore('keyval').put({ revision: 99, savedAt: null, tab: 'earlier', text }, 'mainbrace.project.v1');
          tx.oncomplete = () => resolve(null);
          tx.onerror = () => reject(tx.error);
        };
      }),
    JSON.stringify(project),
  );
}

test('a kept project that fails on every reload can be downloaded and set aside, losing nothing', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await failOnSkull(page);
  await keepInBrowser(page, { ...(await app.project()), name: FAILING_NAME });

  // Every reload fails again: the kept project is what stops the screen.
  for (let i = 0; i < 2; i++) {
    await page.reload();
    await expect(page.getByTestId('recovery')).toBeVisible();
  }
  await expect(page.getByTestId('recovery')).toContainText('What went wrong: the screen could not be drawn');
  await app.shot('crash-loop-recovery');

  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Download the kept project' }).click(),
  ]);
  expect(JSON.parse(readFileSync((await download.path())!, 'utf8')).name).toBe(FAILING_NAME);

  await page.getByRole('button', { name: 'Start without the kept project' }).click();
  await app.ready();
  await expect(page.getByTestId('notice')).toContainText(
    `Started without the kept project “${FAILING_NAME}”: it is in Kept copies`,
  );
  expect((await app.project()).name).toMatch(/Larkspur Rise/);

  // The set-aside project is listed with its date and can still be downloaded.
  await page.getByTestId('kept-copies').click();
  const copy = page.getByTestId('kept-copies-dialog').getByTestId('kept-copy');
  await expect(copy).toHaveCount(1);
  await expect(copy).toContainText('set aside from the error screen');
  const [again] = await Promise.all([
    page.waitForEvent('download'),
    copy.getByRole('button', { name: 'Download' }).click(),
  ]);
  expect(JSON.parse(readFileSync((await again.path())!, 'utf8')).name).toBe(FAILING_NAME);

  await page.reload();
  await app.ready();
  await expect(page.getByTestId('recovery')).toHaveCount(0);
});

test('an empty stored project is reported, not silently replaced by the demo', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await page.evaluate(
    () =>
      new Promise((resolve) => {
        const open = indexedDB.open('keyval-store');
        open.onsuccess = () => {
          const tx = open.result.transaction('keyval', 'readwrite');
          tx.objectStore('keyval').put('', 'mainbrace.project.v1');
          tx.oncomplete = () => resolve(null);
        };
      }),
  );
  await page.reload();
  await app.ready();
  await expect(page.getByTestId('notice')).toContainText('The project kept in this browser was empty');
});
