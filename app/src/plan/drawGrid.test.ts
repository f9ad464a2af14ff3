import { describe, it, expect } from 'vitest';
import { drawGrid } from './drawGrid.js';
import type { Viewport } from '../state/viewport.js';

/** The grid's coordinate labels, drawn into a recording context. */
function labels(units: 'si' | 'us'): string[] {
  const texts: string[] = [];
  const ctx = document.createElement('canvas').getContext('2d')!;
  ctx.fillText = (t: string) => void texts.push(t);
  const v: Viewport = { scale: 0.5, left: -100, top: 300 };
  drawGrid(ctx, v, 1000, 600, units);
  return texts;
}

describe('the plan grid', () => {
  it('labels every coordinate with its unit (m, or ft in US units)', () => {
    for (const [units, unit] of [
      ['si', 'm'],
      ['us', 'ft'],
    ] as const) {
      const texts = labels(units);
      expect(texts.length).toBeGreaterThan(1);
      for (const t of texts) expect(t).toMatch(new RegExp(`^[EN] -?[\\d.]+ ${unit}$`));
    }
  });
});
