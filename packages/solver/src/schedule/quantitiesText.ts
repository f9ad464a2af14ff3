import { cautionRecords, csvField } from './scheduleCsv.js';
import { cautionLines } from './cautions.js';
import type { TakeOffRow } from './quantities.js';

const HEAD = ['Section', 'Item', 'Size', 'Count', 'Quantity', 'Unit', 'Fittings'] as const;
const cells = (r: TakeOffRow) => [r.section, r.item, r.size, r.count, r.quantity, r.unit, r.marks];

/** The take-off as CSV: one line per item, the unit in its own column. */
export function takeOffCsv(rows: readonly TakeOffRow[]): string {
  const numeric = [false, false, false, true, true, false, false];
  const lines = [HEAD.map((h) => csvField(h, false)).join(',')];
  for (const r of rows)
    lines.push(
      cells(r)
        .map((c, i) => csvField(c, numeric[i]!))
        .join(','),
    );
  return [...lines, ...cautionRecords()].join('\r\n') + '\r\n';
}

/** The take-off as a fixed-width table for a terminal. */
export function takeOffTable(rows: readonly TakeOffRow[], project: string, waste: number): string {
  const body = rows.map(cells);
  const widths = HEAD.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const right = [false, false, false, true, true, false, false];
  const line = (c: readonly string[]) =>
    c
      .map((x, i) => (right[i] ? x.padStart(widths[i]!) : x.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  return (
    [
      `Quantities — ${project}`,
      `Concrete includes a waste allowance of ${Math.round(waste * 1000) / 10} % on the total to order.`,
      '',
      line(HEAD),
      line(widths.map((w) => '-'.repeat(w))),
      ...body.map(line),
      '',
      ...cautionLines(),
    ].join('\n') + '\n'
  );
}
