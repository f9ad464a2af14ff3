// Browser benchmarks of the built app in Debian's chromium; prints figures, asserts nothing.
// Run by `pnpm bench` (e2e/bench/run.mjs builds the app and serves it first).
import { chromium, type Page } from '@playwright/test';
import { gzipSync } from 'node:zlib';
import { readdirSync, readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { generateRoute } from '../../packages/solver/bench/generateRoute.js';

const BASE = process.env.BENCH_URL ?? 'http://127.0.0.1:4174/';
const DIST = join(import.meta.dirname, '../../app/dist');

const pct = (xs: number[], p: number) =>
  [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(p * xs.length))]!;

async function startup(page: Page): Promise<number> {
  const t: number[] = [];
  for (let i = 0; i < 5; i++) {
    await page.goto(BASE);
    await page.evaluate(
      () =>
        new Promise((r) => {
          const q = indexedDB.deleteDatabase('keyval-store');
          q.onsuccess = q.onerror = q.onblocked = () => r(null);
        }),
    );
    await page.goto(BASE);
    await page.waitForFunction(() => performance.getEntriesByName('mainbrace-plan-drawn').length > 0, null, {
      timeout: 20_000,
    });
    t.push(await page.evaluate(() => performance.getEntriesByName('mainbrace-plan-drawn')[0]!.startTime));
  }
  return pct(t, 0.5);
}

async function openBigRoute(page: Page, pipes: number) {
  const dir = mkdtempSync(join(tmpdir(), 'mainbrace-bench-'));
  const file = join(dir, 'big.json');
  let fittings = pipes;
  let route = generateRoute(fittings);
  while (route.pipes!.length < pipes) route = generateRoute(++fittings + 50);
  writeFileSync(
    file,
    JSON.stringify({ ...route, loadCases: route.loadCases.map((c) => (c.id === 'test' ? { ...c, kind: 'test' } : c)) }),
  );
  await page.setInputFiles('[data-testid=open-file]', file);
  await page.waitForFunction(
    (n) =>
      (window as unknown as { __mainbrace: { project(): { pipes: unknown[] } } }).__mainbrace.project().pipes.length >=
      n,
    pipes,
  );
  await page.click('[data-testid=tool-fit]');
  return route;
}

async function dragFrames(page: Page): Promise<number[]> {
  const plan = (await page.locator('[data-testid=plan]').boundingBox())!;
  const target = await page.evaluate(() => {
    const hook = (
      window as unknown as {
        __mainbrace: {
          project(): { nodes: { x: number; y: number }[] };
          viewport(): { scale: number; left: number; top: number };
        };
      }
    ).__mainbrace;
    const v = hook.viewport();
    const n = hook.project().nodes[Math.floor(hook.project().nodes.length / 2)]!;
    return { sx: (n.x - v.left) * v.scale, sy: (v.top - n.y) * v.scale };
  });
  await page.click('[data-testid=tool-select]');
  await page.evaluate(() => {
    const w = window as unknown as { __frames: number[]; __stop: boolean };
    w.__frames = [];
    w.__stop = false;
    let last = performance.now();
    const tick = (t: number) => {
      w.__frames.push(t - last);
      last = t;
      if (!w.__stop) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
  });
  await page.mouse.move(plan.x + target.sx, plan.y + target.sy);
  await page.mouse.down();
  for (let i = 1; i <= 120; i++)
    await page.mouse.move(plan.x + target.sx + i * 1.5, plan.y + target.sy + Math.sin(i / 9) * 30);
  await page.mouse.up();
  return (await page.evaluate(() => {
    const w = window as unknown as { __frames: number[]; __stop: boolean };
    w.__stop = true;
    return w.__frames.slice(2);
  })) as number[];
}

async function recompute(page: Page): Promise<number> {
  await page.click('[data-testid=tab-cases]');
  const field = page.locator('[data-testid=test-pressure]');
  const times: number[] = [];
  for (const kpa of [1100, 1200, 1300, 1400, 1500]) {
    await field.fill(String(kpa));
    times.push(
      await page.evaluate(
        () =>
          new Promise<number>((resolve) => {
            const input = document.querySelector<HTMLInputElement>('[data-testid=test-pressure]')!;
            const start = performance.now();
            input.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
            requestAnimationFrame(() => requestAnimationFrame(() => resolve(performance.now() - start)));
          }),
      ),
    );
  }
  return pct(times, 0.5);
}

function bundleSize(): { initial: number; lazy: number } {
  const html = readFileSync(join(DIST, 'index.html'), 'utf8');
  const assets = readdirSync(join(DIST, 'assets'));
  let initial = 0;
  let lazy = 0;
  for (const a of assets) {
    const gz = gzipSync(readFileSync(join(DIST, 'assets', a))).length;
    if (html.includes(a)) initial += gz;
    else lazy += gz;
  }
  return { initial, lazy };
}

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: [
    '--headless',
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
});
const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
const start = await startup(page);
console.log(`app     demo drawn ${start.toFixed(0)} ms after navigation (median of 5, goal ≤ 1000)`);
await openBigRoute(page, 1000);
const frames = await dragFrames(page);
console.log(
  `app     drag on a 1,000-pipe route: frame p50 ${pct(frames, 0.5).toFixed(1)} ms, p95 ${pct(frames, 0.95).toFixed(1)} ms over ${frames.length} frames (goal p95 ≤ 16.7)`,
);
const fittings = await page.evaluate(
  () =>
    (window as unknown as { __mainbrace: { schedule(): { fittings: unknown[] } } }).__mainbrace.schedule().fittings
      .length,
);
console.log(
  `app     recompute and repaint after a test-pressure change, ${fittings} fittings: ${(await recompute(page)).toFixed(0)} ms (median of 5)`,
);
const size = bundleSize();
console.log(
  `app     JavaScript + CSS gzipped: first load ${(size.initial / 1024).toFixed(1)} kB (goal ≤ 250), loaded later ${(size.lazy / 1024).toFixed(1)} kB`,
);
await browser.close();
