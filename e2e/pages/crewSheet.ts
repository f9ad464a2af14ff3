import { execFileSync } from 'node:child_process';
import type { Page } from '@playwright/test';

/** The text of a PDF's pages as pdftotext reads them (poppler-utils), one string per page. */
export function pdfPages(path: string): string[] {
  // Content order (-raw) keeps each sketch's words together; runs of white space read as one space.
  return execFileSync('pdftotext', ['-raw', path, '-'], { encoding: 'utf8' })
    .split('\f')
    .slice(0, -1)
    .map((p) => p.replace(/\s+/g, ' '));
}

/**
 * What a crew would lose on the printed sheet (print media emulated): notes, sketch words, take-off and
 * table rows that end below their page's foot or their sketch or side box. Empty when nothing is cut off.
 */
export function clippedOnSheet(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    Array.from(document.querySelectorAll('.sheet-page')).flatMap((pageBox, i) => {
      const bottom = pageBox.querySelector('.sheet-foot')!.getBoundingClientRect().top + 1;
      return Array.from(pageBox.querySelectorAll('.sheet-notes li, .sketch-lines li, .takeoff tr, .crew-table tr'))
        .filter((el) => {
          const r = el.getBoundingClientRect();
          const box = el.closest('.sketch, .sheet-side');
          const limit = box ? Math.min(bottom, box.getBoundingClientRect().bottom + 1) : bottom;
          return r.bottom > limit;
        })
        .map((el) => `sheet ${i + 1}: ${el.textContent!.slice(0, 60)}`);
    }),
  );
}
