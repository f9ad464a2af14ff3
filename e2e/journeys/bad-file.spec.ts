import { test, expect } from '@playwright/test';
import { fileURLToPath } from 'node:url';
import { MainbracePage } from '../pages/mainbrace.js';

const bad = fileURLToPath(new URL('../fixtures/bad-project.json', import.meta.url));

test('opening a bad file lists its problems by path and leaves the open project as it was', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const before = await app.project();
  await app.openFile(bad);
  const notice = page.getByTestId('notice');
  await expect(notice).toContainText('bad-project.json was not opened — your project is unchanged');
  await expect(notice).toContainText('pipes[0].outsideDiameter: must be at least 0.01 m');
  await expect(notice).toContainText('nodes[1].elevation: expected a number, got the text "high"');
  await expect(notice).toContainText('loadCases[0].colour: unknown field');
  expect(await app.project()).toEqual(before);
  await app.shot('bad-file');
});

test('opening a file over changes not saved to a file asks first, and undo brings them back', async ({ page }) => {
  const app = new MainbracePage(page);
  const probe = fileURLToPath(new URL('../fixtures/probe-si.json', import.meta.url));
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [40, 0],
    [40, -30],
  ]);
  const drawn = await app.project();
  const notice = page.getByTestId('notice');

  await app.openFile(probe);
  await expect(notice).toContainText('Open probe-si.json? This project has changes not saved to a file.');
  await app.shot('open-asks-first');
  await notice.getByRole('button', { name: 'Keep working' }).click();
  expect(await app.project()).toEqual(drawn);

  await app.openFile(probe);
  await notice.getByRole('button', { name: 'Discard and open' }).click();
  await expect.poll(async () => (await app.project()).name).toBe('Brackenfold Lane main (probe SI)');
  await app.undo();
  await expect.poll(async () => app.project()).toEqual(drawn);
});
