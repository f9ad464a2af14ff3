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
