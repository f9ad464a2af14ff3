import { test, expect } from '@playwright/test';
import { MainbracePage, magnitude, pressureAt } from '../pages/mainbrace.js';

// EN 545 / ISO 2531 external diameters, as in packages/solver/src/catalog/ductileIronEn545.ts: DN200 222 mm, DN100 118 mm.
const OD_DN200 = 0.222;
const OD_DN100 = 0.118;

test('a DN100 branch started on a straight joint of a DN200 run makes a tee pushed by p·A of the branch alone', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  // A straight run with a joint in the middle: the joint needs no restraint, only the two caps do.
  await app.draw([
    [0, 0],
    [40, 0],
    [80, 0],
  ]);
  let doc = await app.project();
  const joint = doc.nodes.find((n) => n.x === 40 && n.y === 0)!;
  expect(joint).toBeTruthy();
  expect((await app.schedule()).fittings.map((f) => f.kind).sort()).toEqual(['dead-end', 'dead-end']);

  // The branch starts on the joint itself (a click on the node) and runs 30 m north.
  await app.draw([
    [40, 0],
    [40, 30],
  ]);
  doc = await app.project();
  expect(doc.nodes).toHaveLength(4);
  expect(doc.pipes).toHaveLength(3);
  const tip = doc.nodes.find((n) => n.x === 40 && n.y === 30)!;
  const branch = doc.pipes.find(
    (p) => (p.from === joint.id && p.to === tip.id) || (p.to === joint.id && p.from === tip.id),
  )!;
  expect(branch).toBeTruthy();

  // Make the branch DN100 through the pipe's details.
  await app.tool('select');
  await app.clickPlan(40, 15);
  await expect
    .poll(() =>
      page.evaluate(
        () =>
          (window as unknown as { __mainbrace: { selection(): { pipes: string[] } } }).__mainbrace.selection().pipes,
      ),
    )
    .toEqual([branch.id]);
  await page.getByTestId('pipe-size').selectOption('DN100');
  await expect
    .poll(async () => (await app.project()).pipes.find((p) => p.id === branch.id)!.outsideDiameter)
    .toBeCloseTo(OD_DN100, 9);
  doc = await app.project();
  for (const p of doc.pipes.filter((x) => x.id !== branch.id)) expect(p.outsideDiameter).toBeCloseTo(OD_DN200, 9);

  const tee = await app.fitting(joint.id);
  expect(tee.kind).toBe('tee');
  // §1.4: T = p·A_branch, A = π/4·OD² (thrust on the outside diameter), along the branch axis and away
  // from the outlet; the equal DN200 run cancels. p from the field-test case: p = p_case + ρ·g·(datum − z).
  const test_ = doc.loadCases.find((c) => c.kind === 'test')!;
  expect(tee.governingCase).toBe(test_.id);
  const p = pressureAt(test_, joint.elevation);
  const expected = p * (Math.PI / 4) * OD_DN100 * OD_DN100;
  expect(Math.abs(magnitude(tee.thrust) - expected)).toBeLessThan(1e-6 * expected);
  expect(tee.thrust[1]).toBeLessThan(0); // the branch leaves northward: the tee is pushed south
  expect(Math.abs(tee.thrust[0])).toBeLessThan(1e-6 * expected);
  // Not the run's area: with DN200 the thrust would be 3.5 times larger.
  expect(magnitude(tee.thrust)).toBeLessThan(0.5 * p * (Math.PI / 4) * OD_DN200 * OD_DN200);

  // The details panel says the same in words.
  await app.selectNode(joint.id);
  const results = page.getByTestId('fitting-results');
  await expect(results).toContainText('Tee, branch at 90°');
  // In kN to 0.1, as the schedule's force column (columnUnits.ts).
  await expect(page.getByTestId('governing-thrust')).toContainText(`${(expected / 1000).toFixed(1)} kN`);
  await expect(page.getByTestId('governing-thrust')).toContainText('bears toward 180°');
  await expect(page.getByTestId(`row-${joint.id}`)).toContainText('Tee');
  await app.shot('branch-tee-from-node');
});
