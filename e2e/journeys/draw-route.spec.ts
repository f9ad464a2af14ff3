import { test, expect } from '@playwright/test';
import { MainbracePage, magnitude, pressureAt } from '../pages/mainbrace.js';

test('drawing a three-leg route by clicks gives two bends and two dead ends with the textbook thrust', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [60, 0],
    [60, 40],
    [110, 40],
  ]);
  const doc = await app.project();
  expect(doc.nodes).toHaveLength(4);
  expect(doc.pipes).toHaveLength(3);
  const fittings = (await app.schedule()).fittings;
  expect(fittings.map((f) => f.kind).sort()).toEqual(['bend', 'bend', 'dead-end', 'dead-end']);

  // Hand formula (DIPRA; AWWA M23, M41; docs/check-values.md CV-1): T = 2·p·A·sin(Δ/2), A = π/4·OD², with the drawn pipe's OD and the
  // governing case's pressure at the node; here the turns are 90°.
  for (const f of fittings.filter((x) => x.kind === 'bend')) {
    const node = doc.nodes.find((n) => n.id === f.node)!;
    const od = doc.pipes[0]!.outsideDiameter;
    const p = Math.max(...doc.loadCases.map((c) => pressureAt(c, node.elevation)));
    const expected = 2 * p * (Math.PI / 4) * od * od * Math.sin(Math.PI / 4);
    expect(Math.abs(magnitude(f.thrust) - expected)).toBeLessThan(1e-6 * expected);
  }
  // ... and a dead end pushes p·A along its pipe toward the cap (§1.3).
  for (const f of fittings.filter((x) => x.kind === 'dead-end')) {
    const node = doc.nodes.find((n) => n.id === f.node)!;
    const od = doc.pipes[0]!.outsideDiameter;
    const p = Math.max(...doc.loadCases.map((c) => pressureAt(c, node.elevation)));
    expect(Math.abs(magnitude(f.thrust) - p * (Math.PI / 4) * od * od)).toBeLessThan(1e-6 * p * od * od);
  }
  await expect(page.getByTestId('schedule-table')).toContainText('Bend');
  await app.shot('draw-route');
});

test('starting a run on a pipe splits it into a tee that pushes p·A of the branch away from it', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.draw([
    [0, 0],
    [100, 0],
  ]);
  await app.draw([
    [40, 0],
    [40, -50],
  ]);
  const doc = await app.project();
  expect(doc.pipes).toHaveLength(3);
  const tee = (await app.schedule()).fittings.find((f) => f.kind === 'tee');
  expect(tee).toBeTruthy();
  const node = doc.nodes.find((n) => n.id === tee!.node)!;
  expect(node.x).toBeCloseTo(40, 1);
  const od = doc.pipes[0]!.outsideDiameter;
  const p = Math.max(...doc.loadCases.map((c) => pressureAt(c, node.elevation)));
  const expected = p * (Math.PI / 4) * od * od; // §1.4: T = p·A_branch
  expect(Math.abs(magnitude(tee!.thrust) - expected)).toBeLessThan(1e-6 * expected);
  expect(tee!.thrust[1]).toBeGreaterThan(0); // the branch runs south: the tee is pushed north
  await app.shot('branch-tee');
});
