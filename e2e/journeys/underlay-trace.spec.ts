import { test, expect, type Page } from '@playwright/test';
import { imageToPlan, type Underlay } from '@mainbrace/solver';
import { MainbracePage } from '../pages/mainbrace.js';
import { sitePlanPng, type Px } from '../pages/sitePlanImage.js';

// An invented site plan, Quarry Lane: two survey marks 800 px apart on one row, said to be 40 m apart
// (so 0.05 m per pixel), and the corners A, B, C of the route to trace.
const MARK_1: Px = { u: 100, v: 620 };
const MARK_2: Px = { u: 900, v: 620 };
const KNOWN = 40; // m between the marks
const A: Px = { u: 200, v: 500 };
const B: Px = { u: 600, v: 500 }; // 400 px east of A: 20 m
const C: Px = { u: 600, v: 200 }; // 300 px north of B: 15 m
const M_PER_PX = KNOWN / (MARK_2.u - MARK_1.u);

const underlayOf = async (app: MainbracePage) => (await app.project()) as unknown as { underlay?: Underlay };

/** Clicks the plan on an image pixel, where the underlay is placed now. */
async function clickImage(app: MainbracePage, q: Px) {
  const { underlay } = await underlayOf(app);
  const p = imageToPlan(underlay!, q);
  await app.clickPlan(p.x, p.y);
}

async function loadImage(page: Page, name: string, png: Buffer) {
  await page.getByTestId('tab-underlay').click();
  await page.getByTestId('underlay-file').setInputFiles({ name, mimeType: 'image/png', buffer: png });
}

const plan = (doc: { nodes: { id: string; x: number; y: number }[] }, id: string) =>
  doc.nodes.find((n) => n.id === id)!;

test('a site plan is calibrated by two marks and a known distance; two legs traced over it measure what the calibration says', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await loadImage(page, 'invented-quarry-lane.png', sitePlanPng(1000, 700, [MARK_1, MARK_2, A, B, C]));
  await expect.poll(async () => (await underlayOf(app)).underlay?.width).toBe(1000);
  await expect(page.getByTestId('underlay-kept')).toContainText('kept inside the project file');

  // Calibrate: pick the two marks on the plan, give the distance between them.
  await page.getByTestId('calibrate-pick').click();
  await expect(page.getByTestId('pick-hint')).toContainText('point 1 of 2');
  await clickImage(app, MARK_1);
  await clickImage(app, MARK_2);
  await page.getByTestId('calibrate-distance').fill(String(KNOWN));
  await page.getByTestId('calibrate-apply').click();
  const { underlay } = await underlayOf(app);
  expect(underlay!.calibration?.method).toBe('distance');
  expect(underlay!.metresPerPixel).toBeCloseTo(M_PER_PX, 3);
  await expect(page.getByTestId('underlay-scale')).toContainText('calibrated by two points');

  // The calibrated image is 50 m across, small in the view: zoom in on it, as a user would, to trace.
  const centre = imageToPlan((await underlayOf(app)).underlay!, { u: 500, v: 350 });
  const at = await app.toPage(centre.x, centre.y);
  await page.mouse.move(at.x, at.y);
  await page.mouse.wheel(0, -600);
  await page.mouse.wheel(0, -600);

  // Trace A → B → C over the image and finish the run.
  await app.tool('draw');
  for (const q of [A, B, C]) await clickImage(app, q);
  await page.keyboard.press('Enter');
  await app.tool('select');

  const doc = await app.project();
  expect(doc.pipes).toHaveLength(2);
  const v = await page.evaluate(() =>
    (window as unknown as { __mainbrace: { viewport(): { scale: number } } }).__mainbrace.viewport(),
  );
  // A click lands within a screen pixel of where it was aimed, and so did the two calibration picks:
  // allow 2 px of plan length, plus 2 px over the 800 px between the marks as a share of the length.
  expect(v.scale).toBeGreaterThan(8); // the zoom happened: 2 px is under 0.25 m
  const tolerance = 2 / v.scale;
  const calibrationShare = 2 / 800;
  const lengths = doc.pipes.map((p) => {
    const a = plan(doc, p.from);
    const b = plan(doc, p.to);
    return Math.hypot(b.x - a.x, b.y - a.y);
  });
  // The calibration says 0.05 m per pixel: AB = 400 px = 20 m, BC = 300 px = 15 m.
  const ab = (B.u - A.u) * M_PER_PX;
  const bc = (B.v - C.v) * M_PER_PX;
  expect(Math.abs(lengths[0]! - ab)).toBeLessThan(tolerance + calibrationShare * ab);
  expect(Math.abs(lengths[1]! - bc)).toBeLessThan(tolerance + calibrationShare * bc);
  // and the turn at B is the right angle drawn on the plan (east, then north)
  const [n1, n2, n3] = [plan(doc, doc.pipes[0]!.from), plan(doc, doc.pipes[0]!.to), plan(doc, doc.pipes[1]!.to)];
  expect(Math.abs(n2.y - n1.y)).toBeLessThan(tolerance);
  expect(Math.abs(n3.x - n2.x)).toBeLessThan(tolerance);
  await app.shot('underlay-traced');

  // Opacity and lock are saved with the project, and everything survives a reload.
  await page.getByTestId('underlay-lock').check();
  await page.waitForTimeout(800); // autosave runs 400 ms after the last edit
  await page.reload();
  await app.ready();
  const after = await underlayOf(app);
  expect(after.underlay).toMatchObject({ locked: true, metresPerPixel: underlay!.metresPerPixel });
  expect(after.underlay!.dataUrl?.startsWith('data:image/png;base64,')).toBe(true);
  expect((await app.project()).pipes).toHaveLength(2);
  await page.getByTestId('tab-underlay').click();
  await expect(page.getByTestId('underlay-kept')).toContainText('kept inside the project file');
  await expect(page.getByText('The picture is not here')).toHaveCount(0);
  await app.shot('underlay-reloaded');
});

test('a large site plan is kept in browser storage beside the project, says so, and survives a reload', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  const png = sitePlanPng(1400, 1000, [MARK_1, MARK_2], true);
  expect(png.length).toBeGreaterThan(1024 * 1024);
  await loadImage(page, 'invented-quarry-lane-scan.png', png);
  await expect.poll(async () => (await underlayOf(app)).underlay?.storageKey).toMatch(/^mainbrace\.underlay\./);
  expect((await underlayOf(app)).underlay!.dataUrl).toBeUndefined();
  await expect(page.getByTestId('underlay-kept')).toContainText('kept in this browser’s storage');
  await page.waitForTimeout(800);
  await page.reload();
  await app.ready();
  await page.getByTestId('tab-underlay').click();
  await expect(page.getByTestId('underlay-kept')).toContainText(/storage.*\(\d\.\d MB\)|\(\d\.\d MB\).*storage/);
  await expect(page.getByText('The picture is not here')).toHaveCount(0);
});

test('typed input places nodes exactly, and a leg length typed in the details panel moves its far node', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await app.tool('draw');
  // Typing over the plan starts an entry: coordinates start the run, then a length at a bearing, then a turn.
  await page.keyboard.type('E 10 N 20');
  await expect(page.getByTestId('typed-entry')).toBeFocused();
  await page.keyboard.press('Enter');
  await page.keyboard.type('25 @90');
  await expect(page.locator('#typed-entry-help')).toContainText('at bearing 90°');
  await page.keyboard.press('Enter');
  await page.keyboard.type('12.5 L90');
  await expect(page.locator('#typed-entry-help')).toContainText('turning 90° left');
  await app.shot('typed-entry-box');
  await page.keyboard.press('Enter');
  await page.keyboard.press('Enter'); // Enter on an empty entry finishes the run
  const doc = await app.project();
  expect(doc.nodes.map((n) => [n.x, n.y])).toEqual([
    [10, 20],
    [35, 20], // 25 m due east
    [35, 32.5], // 12.5 m turning 90° left: due north
  ]);
  // A mistyped entry is refused with what was expected, and nothing is drawn.
  await app.tool('draw');
  await page.keyboard.type('12..5');
  await page.keyboard.press('Enter');
  await expect(page.getByRole('alert')).toContainText('is not a length');
  await page.keyboard.press('Escape');
  await page.keyboard.press('Escape');
  await app.tool('select');

  // The second leg, 12.5 m, typed as 20 m in the details panel: its far node moves north along it.
  const mid = { x: 35, y: 26 };
  await app.clickPlan(mid.x, mid.y);
  const field = page.getByTestId('pipe-plan-length');
  await expect(field).toHaveValue('12.5');
  await field.fill('20');
  await field.press('Enter');
  await expect
    .poll(async () => (await app.project()).nodes.map((n) => [n.x, n.y]))
    .toEqual([
      [10, 20],
      [35, 20],
      [35, 40],
    ]);
  await app.shot('typed-input');
});

test.describe('with the service worker off, so that a chunk can be held back', () => {
  test.use({ serviceWorkers: 'block' });

  test('a quick typist loses nothing while the entry box is still loading: the plan passes each key to the entry', async ({
    page,
  }) => {
    // The box's code is held back, so every key of the first entry lands on the plan, not in the box.
    let release = () => {};
    const held = new Promise<void>((r) => (release = r));
    await page.route(/\/assets\/TypedEntryBox-[^/]*\.js$/, async (route) => {
      await held;
      await route.continue();
    });
    const app = new MainbracePage(page);
    await app.blankCanvas();
    await app.tool('draw');
    await page.keyboard.type('E 10 N 20');
    await page.keyboard.press('Enter');
    await page.keyboard.type('25 @90');
    await page.keyboard.press('Enter');
    await expect(page.getByTestId('typed-entry')).toHaveCount(0); // still held back
    release();
    await expect(page.getByTestId('typed-entry')).toBeVisible();
    await page.keyboard.type('12.5 L90');
    await expect(page.getByTestId('typed-entry')).toBeFocused(); // the box, loaded, takes the entry on
    await page.keyboard.press('Enter');
    await page.keyboard.press('Enter'); // Enter on an empty entry finishes the run
    await expect
      .poll(async () => (await app.project()).nodes.map((n) => [n.x, n.y]))
      .toEqual([
        [10, 20],
        [35, 20], // 25 m due east
        [35, 32.5], // 12.5 m turning 90° left: due north
      ]);
  });
});

test('a site plan calibrated by the known coordinates of two marks lands each mark on its coordinates', async ({
  page,
}) => {
  const app = new MainbracePage(page);
  await app.blankCanvas();
  await loadImage(page, 'invented-quarry-lane.png', sitePlanPng(1000, 700, [MARK_1, MARK_2]));
  await expect.poll(async () => (await underlayOf(app)).underlay?.width).toBe(1000);
  const before = {
    scale: (
      await page.evaluate(() =>
        (window as unknown as { __mainbrace: { viewport(): { scale: number } } }).__mainbrace.viewport(),
      )
    ).scale,
    mpp: (await underlayOf(app)).underlay!.metresPerPixel,
  };
  await page.getByTestId('calibrate-by-coordinates').check();
  await page.getByTestId('calibrate-pick').click();
  await clickImage(app, MARK_1);
  await clickImage(app, MARK_2);
  // Mark 1 at E 1000 N 2000; mark 2 at 40 m north-east of it (E 1028.284, N 2028.284): the image turns 45°.
  const d = KNOWN / Math.SQRT2;
  for (const [i, v] of ['1000', '2000', String(1000 + d), String(2000 + d)].entries())
    await page.getByTestId(`calibrate-c${i}`).fill(v);
  await page.getByTestId('calibrate-apply').click();
  await expect(page.getByTestId('underlay-scale')).toContainText('calibrated by two known coordinates');
  const u = (await underlayOf(app)).underlay!;
  // Each pick was within a screen pixel of its mark: before calibration that is 1/(scale · m per px)
  // image pixels, and each image pixel is 0.05 m after it; allow three such pixels at each mark.
  const slack = (3 * M_PER_PX) / (before.scale * before.mpp);
  const m1 = imageToPlan(u, MARK_1);
  const m2 = imageToPlan(u, MARK_2);
  expect(Math.abs(m1.x - 1000)).toBeLessThan(slack);
  expect(Math.abs(m1.y - 2000)).toBeLessThan(slack);
  expect(Math.abs(m2.x - (1000 + d))).toBeLessThan(slack);
  expect(Math.abs(m2.y - (2000 + d))).toBeLessThan(slack);
  expect(u.metresPerPixel).toBeCloseTo(M_PER_PX, 3);
  expect(u.rotation).toBeCloseTo(45, 0);
});
