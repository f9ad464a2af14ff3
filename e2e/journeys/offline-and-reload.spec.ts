import { test, expect, type Page } from '@playwright/test';

type Hook = {
  project(): { name: string; nodes: { id: string; x: number; y: number }[] };
  viewport(): { scale: number; left: number; top: number };
};
const hook = (page: Page) => page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.project());

async function fresh(page: Page) {
  await page.goto('/');
  await page.evaluate(
    () =>
      new Promise((r) => {
        const q = indexedDB.deleteDatabase('keyval-store');
        q.onsuccess = q.onerror = q.onblocked = () => r(null);
      }),
  );
  await page.reload();
  await page.waitForFunction(() => (window as unknown as { __mainbrace?: Hook }).__mainbrace?.project().nodes.length);
}

test('the built app keeps working with no network once it has been opened', async ({ page, context }) => {
  await fresh(page);
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload(); // the service worker now controls the page and has cached every file
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
  await context.setOffline(true);
  await page.reload();
  await expect(page.getByTestId('plan')).toBeVisible();
  await page.waitForFunction(() => (window as unknown as { __mainbrace?: Hook }).__mainbrace?.project().nodes.length);
  expect((await hook(page)).name).toMatch(/Larkspur Rise/);
  await expect(page.getByTestId('schedule-table')).toContainText('A4');
  await page.screenshot({ path: 'artifacts/offline.png' });
  await context.setOffline(false);
});

test('a reload in the middle of a drag keeps every edit made before it', async ({ page }) => {
  await fresh(page);
  await page.getByLabel('Project name').fill('Kestrel Way main, phase 2');
  await page.waitForTimeout(900); // autosave settles 0.4 s after an edit
  const before = await hook(page);
  const plan = (await page.getByTestId('plan').boundingBox())!;
  const at = await page.evaluate(() => {
    const h = (window as unknown as { __mainbrace: Hook }).__mainbrace;
    const v = h.viewport();
    const n = h.project().nodes.find((x) => x.id === 'n4')!;
    return { sx: (n.x - v.left) * v.scale, sy: (v.top - n.y) * v.scale };
  });
  await page.getByTestId('tool-select').click();
  await page.mouse.move(plan.x + at.sx, plan.y + at.sy);
  await page.mouse.down();
  for (let i = 1; i <= 20; i++) await page.mouse.move(plan.x + at.sx + i * 4, plan.y + at.sy + i * 2);
  await page.reload(); // the button is still down: the drag never finished
  await page.waitForFunction(() => (window as unknown as { __mainbrace?: Hook }).__mainbrace?.project().nodes.length);
  const after = await hook(page);
  expect(after.name).toBe('Kestrel Way main, phase 2');
  expect(after.nodes).toEqual(before.nodes);
});
