import { expect, test, type Page } from '@playwright/test';
import { MainbracePage } from '../pages/mainbrace.js';

type Hook = {
  viewport(): { scale: number; left: number; top: number };
  selection(): { nodes: string[]; pipes: string[] };
};
const viewport = (page: Page) =>
  page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.viewport());
const selection = (page: Page) =>
  page.evaluate(() => (window as unknown as { __mainbrace: Hook }).__mainbrace.selection());

test('the Export menu closes on Escape and on a click elsewhere', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const exportButton = page.getByRole('button', { name: 'Export ▾' });
  await exportButton.click();
  await expect(page.getByRole('menu')).toBeVisible();
  await page.keyboard.press('Escape');
  await expect(page.getByRole('menu')).toHaveCount(0);
  await exportButton.click();
  await expect(page.getByRole('menu')).toBeVisible();
  await page.getByTestId('details').click({ position: { x: 5, y: 5 } });
  await expect(page.getByRole('menu')).toHaveCount(0);
});

test('a file opened after panning away shows its whole route; New asks before dropping unsaved work', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const plan = (await page.getByTestId('plan').boundingBox())!;
  // pan far away with the arrow keys: the old view would show empty paper
  await page.getByTestId('plan').focus();
  for (let i = 0; i < 30; i++) await page.keyboard.press('ArrowRight');
  await app.openFile('fixtures/earlier-project.json');
  await expect(page.getByTestId('notice')).toContainText('Opened');
  for (const n of (await app.project()).nodes) {
    const p = await app.toPage(n.x, n.y);
    expect(p.x).toBeGreaterThan(plan.x);
    expect(p.x).toBeLessThan(plan.x + plan.width);
    expect(p.y).toBeGreaterThan(plan.y);
    expect(p.y).toBeLessThan(plan.y + plan.height);
  }
  // an edit not saved to a file: New asks, and Keep working keeps it
  const first = (await app.project()).nodes[0]!;
  await app.dragNode(first.id, [first.x + 5, first.y + 5]);
  const edited = await app.project();
  await page.getByRole('button', { name: 'New', exact: true }).click();
  await expect(page.getByTestId('notice')).toContainText('changes not saved to a file');
  await page.getByRole('button', { name: 'Keep working' }).click();
  expect((await app.project()).nodes).toEqual(edited.nodes);
  await page.getByRole('button', { name: 'New', exact: true }).click();
  await page.getByRole('button', { name: 'Discard and start new' }).click();
  await expect.poll(async () => (await app.project()).nodes.length).toBe(0);
  expect((await app.project()).loadCases.map((c) => c.id)).toEqual(['working', 'surge', 'test']);
});

test('the plan from the keyboard: Tab walks fittings in chainage order, Enter opens the details, + zooms', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  const order = (await app.schedule()).fittings.map((f) => f.node);
  await page.getByTestId('plan').focus();
  await page.keyboard.press('Tab');
  // The first key may come before the plan's input tools have loaded: it waits for them, then is replayed.
  await expect.poll(async () => (await selection(page)).nodes).toEqual([order[0]]);
  await page.keyboard.press('Tab');
  expect((await selection(page)).nodes).toEqual([order[1]]);
  await page.keyboard.press('Shift+Tab');
  expect((await selection(page)).nodes).toEqual([order[0]]);
  const before = await viewport(page);
  await page.keyboard.press('+');
  expect((await viewport(page)).scale).toBeCloseTo(before.scale * 1.25, 9);
  await page.keyboard.press('Enter');
  await expect
    .poll(() => page.evaluate(() => document.activeElement?.closest('[data-testid="details"]') !== null))
    .toBe(true);
});

test('dragging the test pressure holds the arrow scale and shows each block’s growth against the value before', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await app.drawerTab('cases');
  const legend = page.getByTestId('legend');
  const scaleText = async () => (await legend.textContent())!.match(/horizontal thrust ([\d.,]+ kN)/)![1];
  const held = await scaleText();
  const slider = (await page.getByTestId('test-slider').boundingBox())!;
  const y = slider.y + slider.height / 2;
  const x = slider.x + slider.width * 0.5;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(slider.x + slider.width * 0.95, y, { steps: 8 });
  expect(await scaleText()).toBe(held);
  await app.shot('test-pressure-drag');
  await page.mouse.up();
});

test.describe('on a tablet (768 × 1024, touch)', () => {
  test.use({ viewport: { width: 768, height: 1024 }, hasTouch: true });

  test('tap selects, one finger pans, two fingers zoom; drawing finishes from a button', async ({ page }) => {
    const app = new MainbracePage(page);
    await app.gotoFresh();
    const cdp = await page.context().newCDPSession(page);
    const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', points: { x: number; y: number }[]) =>
      cdp.send('Input.dispatchTouchEvent', {
        type,
        touchPoints: points.map((p, i) => ({ x: p.x, y: p.y, id: i, radiusX: 4, radiusY: 4, force: 1 })),
      });
    // tap a fitting
    const f = (await app.schedule()).fittings[3]!;
    const n = (await app.project()).nodes.find((x) => x.id === f.node)!;
    const at = await app.toPage(n.x, n.y);
    await page.touchscreen.tap(at.x, at.y);
    await expect.poll(async () => (await selection(page)).nodes).toEqual([f.node]);

    // one finger on empty paper pans by the distance moved
    const plan = (await page.getByTestId('plan').boundingBox())!;
    const start = { x: plan.x + 30, y: plan.y + plan.height - 80 };
    const v0 = await viewport(page);
    await touch('touchStart', [start]);
    for (let i = 1; i <= 6; i++) await touch('touchMove', [{ x: start.x + 10 * i, y: start.y - 5 * i }]);
    await touch('touchEnd', []);
    const v1 = await viewport(page);
    expect((v0.left - v1.left) * v1.scale).toBeCloseTo(60, 0);
    expect((v1.top - v0.top) * v1.scale).toBeCloseTo(-30, 0);
    expect((await selection(page)).nodes).toEqual([f.node]);

    // two fingers spreading from 100 to 200 px apart double the scale
    const c = { x: plan.x + plan.width / 2, y: plan.y + plan.height / 2 };
    await touch('touchStart', [
      { x: c.x - 50, y: c.y },
      { x: c.x + 50, y: c.y },
    ]);
    for (let i = 1; i <= 5; i++)
      await touch('touchMove', [
        { x: c.x - 50 - 10 * i, y: c.y },
        { x: c.x + 50 + 10 * i, y: c.y },
      ]);
    await touch('touchEnd', []);
    expect((await viewport(page)).scale / v1.scale).toBeCloseTo(2, 1);
    await app.shot('tablet-after-pinch');

    // draw by taps and finish with the on-screen button
    await page.getByTestId('tool-draw').tap();
    // two taps on empty paper, well away from the route (after the pinch it is zoomed in about the middle)
    await page.touchscreen.tap(plan.x + 200, plan.y + plan.height - 160);
    await page.touchscreen.tap(plan.x + 300, plan.y + plan.height - 100);
    await expect(page.getByTestId('finish-run')).toBeVisible();
    const pipes = (await app.project()).pipes.length;
    await page.getByTestId('finish-run').tap();
    await expect.poll(async () => (await app.project()).pipes.length).toBeGreaterThan(pipes);
  });
});
