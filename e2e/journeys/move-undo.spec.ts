import { test, expect } from '@playwright/test';
import { MainbracePage, magnitude } from '../pages/mainbrace.js';

test('moving a node changes its thrust, and undo and redo restore both exactly', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [60, 0],
    [60, -60],
  ]);
  const bend = (await app.schedule()).fittings.find((f) => f.kind === 'bend')!;
  const before = await app.project();
  const start = before.nodes.find((n) => n.id === bend.node)!;

  await app.dragNode(bend.node, [start.x + 20, start.y - 25]);
  await expect.poll(async () => (await app.project()).nodes.find((n) => n.id === bend.node)!.x).not.toBe(start.x);
  const moved = await app.fitting(bend.node);
  expect(Math.abs(magnitude(moved.thrust) - magnitude(bend.thrust))).toBeGreaterThan(1);
  await app.shot('moved-node');

  await app.undo();
  await expect.poll(async () => (await app.project()).nodes).toEqual(before.nodes);
  expect((await app.fitting(bend.node)).thrust).toEqual(bend.thrust);

  await app.redo();
  await expect.poll(async () => (await app.fitting(bend.node)).thrust).toEqual(moved.thrust);
});
