import { test, expect } from '@playwright/test';
import { fileURLToPath } from 'node:url';
import { MainbracePage } from '../pages/mainbrace.js';
import { clippedOnSheet } from '../pages/crewSheet.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

/**
 * A shallow DN1200 line tested at 3 MPa (an invented route): no block fits under 0.3 m of cover, so every
 * fitting is not adequate and the notes run long. The one sheet's notes leave the job's take-off no room
 * below the sketches: it must move, whole, to where it fits, never print over the cautions.
 */
test('a not-adequate route’s crew sheet keeps its whole take-off clear of the cautions', async ({ page }) => {
  const app = new MainbracePage(page);
  await app.gotoFresh();
  await app.openFile(`${root}e2e/fixtures/notch-lane-shallow.json`);
  await expect.poll(async () => (await app.project()).name).toContain('Notch Lane');
  await page.getByRole('button', { name: 'Export ▾' }).click();
  await page.getByRole('menuitem', { name: 'Print the schedule…' }).click();
  await expect(page.locator('.crew-sheet')).toHaveAttribute('data-ready', 'yes');
  const takeOff = page.getByTestId('job-takeoff');
  await expect(takeOff).toHaveCount(1);
  // both dead ends and the bend, and the line's 180 m of restrained pipe once (100 m + 80 m)
  await expect(takeOff).toContainText(/Dead end[^;]*×\s*2|Dead end\s*1255 mm\s*2/);
  await expect(takeOff).toContainText('180.0');
  await expect(page.locator('.sheet-notes').first()).toContainText('NOT ADEQUATE');
  for (const media of ['screen', 'print'] as const) {
    await page.emulateMedia({ media });
    expect(await clippedOnSheet(page)).toEqual([]);
    // Wherever it went (below the sketches, or after the page), it overlaps no page's cautions.
    const feet = await page
      .locator('.sheet-page .sheet-foot')
      .evaluateAll((els) => els.map((e) => [e.getBoundingClientRect().top, e.getBoundingClientRect().bottom]));
    const box = (await takeOff.boundingBox())!;
    for (const [top, bottom] of feet) expect(box.y + box.height <= top! + 1 || box.y >= bottom! - 1).toBe(true);
  }
});
