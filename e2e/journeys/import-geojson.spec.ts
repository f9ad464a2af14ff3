import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createRequire } from 'node:module';
import { MainbracePage } from '../pages/mainbrace.js';

// GeographicLib ships as CommonJS without named exports that Node's ES loader can see.
const { Geodesic } = createRequire(import.meta.url)(
  'geographiclib-geodesic',
) as typeof import('geographiclib-geodesic');

const routeFile = fileURLToPath(new URL('../fixtures/quarry-hill-road.geojson', import.meta.url));
const route = JSON.parse(readFileSync(routeFile, 'utf8')) as {
  features: { geometry: { coordinates: number[][] } }[];
};

/** The bend at vertex k of the main, from GeographicLib geodesics (Karney 2013) between its points. */
function geodesicBend(k: number): number {
  const c = route.features[0]!.geometry.coordinates;
  const arrive = Geodesic.WGS84.Inverse(c[k - 1]![1]!, c[k - 1]![0]!, c[k]![1]!, c[k]![0]!).azi2!;
  const leave = Geodesic.WGS84.Inverse(c[k]![1]!, c[k]![0]!, c[k + 1]![1]!, c[k + 1]![0]!).azi1!;
  return Math.abs(((((leave - arrive) % 360) + 540) % 360) - 180);
}

test('a GeoJSON route opened in the app becomes a connected project whose bends follow the geometry', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  // The demo is drawn, not placed on the earth: its GeoJSON export says why it cannot be made, in the
  // app's own terms (no command-line option).
  await page.getByRole('button', { name: 'Export ▾' }).click();
  await page.getByRole('menuitem', { name: 'Design as GeoJSON (for a GIS)' }).click();
  await expect(page.getByText(/GeoJSON needs a route imported from a GeoJSON file/)).toBeVisible();
  await expect(page.getByText(/--proj4/)).toHaveCount(0);
  await app.openFile(routeFile);
  const dialog = page.getByRole('dialog', { name: /Import a GeoJSON route from quarry-hill-road.geojson/ });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText('ground surface');
  await app.shot('import-geojson-dialog');
  await page.getByTestId('import-go').click();
  await expect(page.getByTestId('notice')).toContainText('Imported quarry-hill-road.geojson: 6 nodes, 5 pipes');

  const project = await app.project();
  expect(project.nodes).toHaveLength(6);
  // Shown whole, and clear of the open legend at the plan's right.
  const legend = (await page.getByTestId('legend').boundingBox())!;
  const plan = (await page.getByTestId('plan').boundingBox())!;
  const xs: number[] = [];
  for (const n of project.nodes) {
    const at = await app.toPage(n.x, n.y);
    expect(at.x).toBeGreaterThan(plan.x);
    expect(at.y).toBeGreaterThan(plan.y);
    expect(at.y).toBeLessThan(plan.y + plan.height);
    expect(at.x).toBeLessThan(legend.x);
    xs.push(at.x);
  }
  // centred in the plan less the legend's strip (LEGEND_INSET_PX, 250 px: app/src/tools/planInput.ts)
  expect(Math.abs((Math.min(...xs) + Math.max(...xs)) / 2 - (plan.x + (plan.width - 250) / 2))).toBeLessThan(2);
  // One network: the spur shares the main's third point, so every node is reached from n1.
  const reached = new Set(['n1']);
  for (let i = 0; i < 6; i++)
    for (const p of project.pipes)
      if (reached.has(p.from) || reached.has(p.to)) {
        reached.add(p.from);
        reached.add(p.to);
      }
  expect(reached.size).toBe(6);
  // Levels in the file are ground: DN250 EN 545 (OD 0.274 m) at 1.2 m cover → centreline 1.337 m below.
  expect(project.nodes[0]!.elevation).toBeCloseTo(412.3 - 1.337, 6);

  const schedule = (await app.schedule()) as unknown as {
    fittings: { node: string; kind: string; horizontalDeflection: number | null }[];
  };
  for (const [node, k] of [
    ['n2', 1],
    ['n4', 3],
  ] as const) {
    const f = schedule.fittings.find((x) => x.node === node)!;
    expect(f.kind).toBe('bend');
    expect(Math.abs(f.horizontalDeflection! - geodesicBend(k))).toBeLessThan(0.1);
  }
  await app.shot('import-geojson-plan');

  // Back out to a GIS: the design as GeoJSON, the first point where the file had it.
  await page.getByRole('button', { name: 'Export ▾' }).click();
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('menuitem', { name: 'Design as GeoJSON (for a GIS)' }).click(),
  ]);
  const out = JSON.parse(readFileSync((await download.path())!, 'utf8')) as {
    features: { geometry: { coordinates: number[][] }; properties: { layer: string } }[];
  };
  const firstPipe = out.features.find((f) => f.properties.layer === 'pipe')!;
  expect(firstPipe.geometry.coordinates[0]![0]).toBeCloseTo(8.5, 8);
  expect(firstPipe.geometry.coordinates[0]![1]).toBeCloseTo(47.4, 8);
  // Three dead ends, two bends and the wye where the spur leaves.
  expect(out.features.filter((f) => f.properties.layer === 'fitting')).toHaveLength(6);
});
