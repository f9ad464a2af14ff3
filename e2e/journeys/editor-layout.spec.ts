import { expect, test, type Page } from '@playwright/test';
import { MainbracePage } from '../pages/mainbrace.js';

/**
 * The window at the sizes people use — a tablet held upright (touch), a small laptop, a 13-inch laptop
 * and a desktop — with the demo open and a fitting selected: nothing cut off or covered, and the whole
 * route on the plan clear of the legend. Screenshots go to artifacts/ to be looked at.
 */
const SIZES = [
  { width: 768, height: 1024, touch: true },
  { width: 1024, height: 700, touch: false },
  { width: 1280, height: 800, touch: false },
  { width: 1440, height: 900, touch: false },
];

/** Boxes of the controls that must be wholly inside the window and not covered by another element. */
async function uncovered(page: Page, selectors: string[]) {
  return page.evaluate((sels) => {
    const problems: string[] = [];
    for (const sel of sels) {
      const els = Array.from(document.querySelectorAll<HTMLElement>(sel));
      if (els.length === 0) problems.push(`${sel}: missing`);
      for (const el of els) {
        const r = el.getBoundingClientRect();
        if (r.width === 0 || r.height === 0) continue; // hidden by design (a closed menu)
        if (r.left < -0.5 || r.top < -0.5 || r.right > innerWidth + 0.5 || r.bottom > innerHeight + 0.5)
          problems.push(
            `${sel} "${el.textContent?.trim().slice(0, 20)}": outside the window (${Math.round(r.left)},${Math.round(r.top)})–(${Math.round(r.right)},${Math.round(r.bottom)})`,
          );
        const x = Math.min(innerWidth - 1, Math.max(0, r.left + r.width / 2));
        const y = Math.min(innerHeight - 1, Math.max(0, r.top + r.height / 2));
        const top = document.elementFromPoint(x, y);
        if (top && !el.contains(top) && !top.contains(el))
          problems.push(`${sel} "${el.textContent?.trim().slice(0, 20)}": covered by ${top.className || top.tagName}`);
      }
    }
    return problems;
  }, selectors);
}

for (const size of SIZES) {
  test.describe(`${size.width}×${size.height}${size.touch ? ' (touch)' : ''}`, () => {
    test.use({ viewport: { width: size.width, height: size.height }, hasTouch: size.touch });

    test('nothing is cut off or covered, and the fitted route is clear of the legend', async ({ page }) => {
      const app = new MainbracePage(page);
      await app.gotoFresh();
      const overflow = await page.evaluate(() => ({
        x: document.documentElement.scrollWidth - innerWidth,
        y: document.documentElement.scrollHeight - innerHeight,
        topbar: (() => {
          const t = document.querySelector<HTMLElement>('.topbar')!;
          return t.scrollWidth - t.clientWidth;
        })(),
      }));
      expect(overflow).toEqual({ x: 0, y: 0, topbar: 0 });

      // The whole route is on the plan, clear of the legend.
      const plan = (await page.getByTestId('plan').boundingBox())!;
      const legend = await page.getByTestId('legend').boundingBox();
      const fittings = (await app.schedule()).fittings;
      const nodes = (await app.project()).nodes;
      for (const f of fittings) {
        const n = nodes.find((x) => x.id === f.node)!;
        const p = await app.toPage(n.x, n.y);
        expect(p.x, f.mark).toBeGreaterThanOrEqual(plan.x);
        expect(p.x, f.mark).toBeLessThanOrEqual(plan.x + plan.width);
        expect(p.y, f.mark).toBeGreaterThanOrEqual(plan.y);
        expect(p.y, f.mark).toBeLessThanOrEqual(plan.y + plan.height);
        if (legend) {
          const under =
            p.x >= legend.x && p.x <= legend.x + legend.width && p.y >= legend.y && p.y <= legend.y + legend.height;
          expect(under, `${f.mark} under the legend`).toBe(false);
        }
      }

      // A fitting chosen from the keyboard: Tab on the plan.
      await page.getByTestId('plan').focus();
      await page.keyboard.press('Tab');
      await expect(page.getByTestId('fitting-results')).toBeVisible();
      expect(
        await uncovered(page, [
          '.topbar button',
          '.topbar select',
          '.project-name',
          '.toolstrip button',
          '.drawer-tabs button',
          '[data-testid="fitting-results"] h3',
          '.legend-title',
        ]),
      ).toEqual([]);
      await app.shot(`layout-${size.width}x${size.height}`);

      // The per-case table of the chosen fitting is not cut: every column fits its panel.
      const table = await page.evaluate(() => {
        const t = document.querySelector<HTMLElement>('.cases-table')!;
        const box = t.closest<HTMLElement>('.table-scroll') ?? t.parentElement!;
        const panel = document.querySelector<HTMLElement>('[data-testid="details"]')!.getBoundingClientRect();
        const b = box.getBoundingClientRect();
        return {
          inside: b.left >= panel.left - 0.5 && b.right <= panel.right + 0.5,
          fits: box.scrollWidth <= box.clientWidth + 1,
        };
      });
      expect(table).toEqual({ inside: true, fits: true });

      // Drawing: the tool's hint (wrapped on a narrow plan) and the typed-entry box do not cover each other.
      await app.tool('draw');
      const plan2 = (await page.getByTestId('plan').boundingBox())!;
      await page.mouse.click(plan2.x + plan2.width / 2, plan2.y + plan2.height - 60);
      await expect(page.getByTestId('typed-entry')).toBeVisible();
      // (the hint lets pointer events through, so it is checked by its box, not by what is under a point)
      expect(await uncovered(page, ['.plan-typed label', '[data-testid="typed-entry"]'])).toEqual([]);
      const hint = (await page.locator('.plan-hint').boundingBox())!;
      const typed = (await page.locator('.plan-typed').boundingBox())!;
      expect(typed.y, 'typed-entry box below the hint').toBeGreaterThanOrEqual(hint.y + hint.height);
      await app.shot(`layout-${size.width}x${size.height}-drawing`);
      await page.keyboard.press('Escape');
      await app.tool('select');

      // The drawer raised for the schedule: its table is readable.
      await app.drawerTab('schedule');
      await page.getByTestId('drawer-raise').click();
      await expect(page.getByTestId('schedule-table')).toBeVisible();
      await app.shot(`layout-${size.width}x${size.height}-schedule`);
    });
  });
}
