import { formatDimension, formatSi } from '../units/format.js';
import { norm } from '../geometry/vector.js';
import type { UnitSystem } from '../units/conversions.js';
import { CAUTIONS } from './cautions.js';
import type { Schedule, ScheduleFitting } from './scheduleRows.js';

/** What holds the fitting, in one short phrase of display units. */
export function restraintSummary(f: ScheduleFitting, units: UnitSystem): string {
  const r = f.restraint;
  const parts: string[] = [];
  const len = (m: number) => formatSi(m, 'length', units);
  const dim = (m: number) => formatDimension(m, units);
  const block = (b: NonNullable<typeof r.block>) =>
    `${dim(b.faceWidth)} wide × ${dim(b.faceHeight)} high, ${formatSi(b.concreteVolume, 'volume', units)}`;
  if (r.block && r.reverseBlock) parts.push(`blocks both sides: ${block(r.block)}; opposite ${block(r.reverseBlock)}`);
  else if (r.block) parts.push(`block ${block(r.block)}`);
  if (r.anchor) parts.push(`anchor ${formatSi(r.anchor.concreteVolume, 'volume', units)}`);
  if (r.trenchBottom) parts.push(`bottom pad ${dim(r.trenchBottom.width)} × ${dim(r.trenchBottom.length)}`);
  if (r.restrainedLength !== null)
    parts.push(`restrain ${r.restrainedLegs.map((l) => `${len(l.length)} along ${l.pipe}`).join(', ')}`);
  return parts.length ? parts.join('; ') : '—';
}

/** The schedule as a readable fixed-width table for a terminal, with the cautions under it. */
export function scheduleTable(s: Schedule, units: UnitSystem, caseLabel: (id: string) => string): string {
  const head = ['Tag', 'Kind', 'Chainage', 'Defl.', 'Pressure', 'Case', 'Thrust', 'Restraint', 'Warn'];
  const rows = s.fittings.map((f) => [
    f.tag,
    f.kind,
    formatSi(f.chainage, 'length', units, 4),
    f.deflection === null
      ? f.branchAngle === null
        ? ''
        : formatSi(f.branchAngle, 'angle', units)
      : formatSi(f.deflection, 'angle', units),
    formatSi(f.designPressure, 'pressure', units),
    caseLabel(f.governingCase),
    formatSi(norm(f.thrust), 'force', units),
    restraintSummary(f, units),
    f.warnings.length ? String(f.warnings.length) : '',
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    cells
      .map((c, i) => c.padEnd(widths[i]!))
      .join('  ')
      .trimEnd();
  const out = [
    `Fitting schedule — ${s.project}`,
    '',
    line(head),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
  ];
  const warned = s.fittings.filter((f) => f.warnings.length > 0);
  if (warned.length) {
    out.push('', 'Warnings');
    for (const f of warned) for (const w of f.warnings) out.push(`  ${f.tag}: ${w}`);
  }
  out.push('', ...CAUTIONS.map((c) => `! ${c}`));
  return out.join('\n') + '\n';
}
