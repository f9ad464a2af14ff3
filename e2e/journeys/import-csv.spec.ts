import { test, expect } from '@playwright/test';
import { writeFileSync } from 'node:fs';
import { MainbracePage } from '../pages/mainbrace.js';

// An invented survey of Wrenfield Close: a main of four points and a spur that leaves the main between
// its first two points, ground levels (RL) in metres, one point a row, the run in its own column.
const SURVEY = [
  'Pt,E,N,RL,Line',
  '1,5000.0,2000.0,52.40,M',
  '2,5060.0,2000.0,52.10,M',
  '3,5120.0,2040.0,51.80,M',
  '4,5180.0,2040.0,51.50,M',
  '5,5030.0,2000.0,52.25,S',
  '6,5030.0,1950.0,52.00,S',
].join('\n');

test('a CSV survey opened in the app becomes a project: runs, ground levels, bends and the tee where the spur joins', async ({
  page,
}, info) => {
  const file = info.outputPath('wrenfield-close.csv');
  writeFileSync(file, SURVEY);
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await app.openFile(file);
  const dialog = page.getByRole('dialog', { name: /Import survey points from wrenfield-close.csv/ });
  await expect(dialog).toBeVisible();
  // Usual names are guessed; the run column is chosen by hand.
  await expect(page.getByTestId('import-column-easting')).toHaveValue('E');
  await expect(page.getByTestId('import-column-northing')).toHaveValue('N');
  await expect(page.getByTestId('import-column-level')).toHaveValue('RL');
  await page.getByTestId('import-column-run').selectOption('Line');
  await app.shot('import-csv-dialog');
  await page.getByTestId('import-go').click();
  await expect(page.getByTestId('notice')).toContainText('Imported wrenfield-close.csv');

  const project = (await app.project()) as unknown as {
    nodes: { id: string; x: number; y: number; elevation: number; groundLevel?: number }[];
    pipes: { from: string; to: string; outsideDiameter: number }[];
  };
  // Four main points, the spur's far end, and the point where the spur splits the main's first pipe.
  expect(project.nodes).toHaveLength(6);
  expect(project.pipes).toHaveLength(5);
  const at = (x: number, y: number) => project.nodes.find((n) => Math.hypot(n.x - x, n.y - y) < 1e-6)!;
  const split = at(5030, 2000);
  expect(split).toBeDefined();
  // Levels are ground: the pipe goes at the dialog's cover (1.2 m) below, so ground − centreline − OD/2 = 1.2 m.
  const first = at(5000, 2000);
  const od = project.pipes.find((p) => p.from === first.id || p.to === first.id)!.outsideDiameter;
  expect(first.groundLevel).toBeCloseTo(52.4, 9);
  expect(first.groundLevel! - first.elevation - od / 2).toBeCloseTo(1.2, 9);

  const schedule = (await app.schedule()) as unknown as {
    fittings: { node: string; kind: string; horizontalDeflection: number | null; branchAngle: number | null }[];
  };
  const fitting = (x: number, y: number) => schedule.fittings.find((f) => f.node === at(x, y).id)!;
  // Hand geometry: the main turns from due east to atan(40/60) = 33.69° at point 2, and back at point 3.
  const turn = (Math.atan2(40, 60) * 180) / Math.PI;
  for (const [x, y] of [
    [5060, 2000],
    [5120, 2040],
  ] as const) {
    expect(fitting(x, y).kind).toBe('bend');
    expect(fitting(x, y).horizontalDeflection!).toBeCloseTo(turn, 2);
  }
  // The spur leaves due south from a straight stretch of the main: a tee. Its branch angle is the angle in
  // space between the main, falling 0.30 m in 60 m, and the spur, falling 0.25 m in 50 m (hand calculation):
  // cos θ = (30·0 + 0·(−50) + (−0.15)·(−0.25)) / (|(30, 0, −0.15)|·|(0, −50, −0.25)|), θ = 89.9986°.
  const cos = (-0.15 * -0.25) / (Math.hypot(30, 0.15) * Math.hypot(50, 0.25));
  expect(fitting(5030, 2000).kind).toBe('tee');
  expect(fitting(5030, 2000).branchAngle!).toBeCloseTo((Math.acos(cos) * 180) / Math.PI, 6);
  await app.shot('import-csv-plan');

  // Undo brings the demo route back.
  await page.keyboard.press('Control+z');
  await expect.poll(async () => ((await app.project()) as { nodes: unknown[] }).nodes.length).not.toBe(6);
});
