import { test, expect } from '@playwright/test';
import { MainbracePage } from '../pages/mainbrace.js';

test('a value the project cannot take is refused at its field, as labelled, and nothing stays stale', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [100, 0],
    [150, 50],
  ]);
  await expect.poll(async () => (await app.schedule()).fittings.length).toBeGreaterThan(0);

  // The Working case's datum: 10 000 m is the hard elevation limit (packages/solver/src/model/limits.ts).
  await app.drawerTab('cases');
  const datum = page.getByLabel('Datum of Working', { exact: true });
  const datumBefore = (await app.project()).loadCases.find((c) => c.id === 'working')!.datumElevation;
  await datum.fill('20000');
  await datum.press('Enter');
  await expect(page.getByRole('alert').filter({ hasText: 'Datum of Working' })).toHaveText(
    'Datum of Working: must be at most 10,000 m',
  );
  await expect(datum).toHaveAttribute('aria-invalid', 'true');
  expect((await app.project()).loadCases.find((c) => c.id === 'working')!.datumElevation).toBe(datumBefore);
  await expect(page.getByTestId('notice')).toHaveCount(0);
  await datum.fill('95');
  await datum.press('Enter');
  await expect(datum).toHaveAttribute('aria-invalid', 'false');
  await expect
    .poll(async () => (await app.project()).loadCases.find((c) => c.id === 'working')!.datumElevation)
    .toBe(95);

  // A node moved onto another: the project refuses it, naming both nodes by their marks on the plan.
  const [n1, n2, n3] = (await app.project()).nodes.map((n) => n.id);
  const mark = async (id: string) => (await app.schedule()).fittings.find((f) => f.node === id)!.mark;
  await app.selectNode(n3!);
  const east = page.getByLabel('East', { exact: true });
  const north = page.getByLabel('North', { exact: true });
  await east.fill('0');
  await east.press('Enter');
  await north.fill('0');
  await north.press('Enter');
  const line = `Node ${await mark(n3!)}: stands at the same point as node ${await mark(n1!)}`;
  await expect(page.getByTestId('notice')).toContainText(line);
  await expect(page.getByTestId('notice')).not.toContainText('nodes[');
  await expect(north).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByRole('alert').filter({ hasText: line }).first()).toBeVisible();
  expect(n2).toBeDefined();

  // The next edit that goes through clears the refusal.
  await page.getByLabel('Project name').fill('Hartwell Common main');
  await expect(page.getByTestId('notice')).toHaveCount(0);
  await app.shot('refused-values');
});

test('a bad entry left in a node’s field stays with that node, not the next node shown', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [100, 0],
    [150, 50],
  ]);
  await expect.poll(async () => (await app.project()).nodes.length).toBe(3);
  const [n1, , n3] = (await app.project()).nodes.map((n) => n.id);
  // Both ends carry the default cover, so the field's value is the same at each.
  await app.selectNode(n1!);
  const cover = page.getByTestId('node-cover');
  const shown = await cover.inputValue();
  await cover.fill('abc');
  await cover.press('Enter');
  await expect(cover).toHaveAttribute('aria-invalid', 'true');
  await app.selectNode(n3!);
  await expect(page.getByTestId('node-cover')).toHaveValue(shown);
  await expect(page.getByTestId('node-cover')).toHaveAttribute('aria-invalid', 'false');
});
