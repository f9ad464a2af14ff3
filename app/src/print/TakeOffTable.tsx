import type { TakeOffRow } from '@mainbrace/solver';

/**
 * The quantities take-off as a table: the solver's take-off lines (the same as the CSV and the
 * command line), grouped under their section. Used on the sheet and in the app's drawer.
 */
export function TakeOffTable({ rows, compact = false }: { rows: readonly TakeOffRow[]; compact?: boolean }) {
  // Not "nothing to build": a fitting that nothing holds (not adequate) adds no line either.
  if (rows.length === 0) return <p className="muted">Nothing sized.</p>;
  return (
    <table className={`takeoff ${compact ? 'takeoff-compact' : ''}`} data-testid="takeoff">
      <thead>
        <tr>
          <th>Item</th>
          <th>Size</th>
          <th className="num">No.</th>
          <th className="num">Qty</th>
          <th>Unit</th>
          {!compact && <th>Fittings</th>}
        </tr>
      </thead>
      {(['Concrete', 'Restrained joints', 'Fittings', 'Anchors'] as const).map((section) => {
        const lines = rows.filter((r) => r.section === section);
        if (!lines.length) return null;
        return (
          <tbody key={section}>
            <tr className="takeoff-section">
              <th colSpan={compact ? 5 : 6}>{section}</th>
            </tr>
            {lines.map((r, i) => (
              <tr key={i} className={r.total ? 'takeoff-total' : ''}>
                <td>{r.item}</td>
                <td>{r.size}</td>
                <td className="num">{r.count}</td>
                <td className="num">{r.quantity}</td>
                <td>{r.unit}</td>
                {!compact && <td>{r.marks}</td>}
              </tr>
            ))}
          </tbody>
        );
      })}
    </table>
  );
}

/**
 * The same take-off in the least height, for the side column of a full last sheet: the concrete as a
 * small table, the other sections as running lines ("Bend 45° 12 ×2; Tee 12 × 8 ×1").
 */
export function TakeOffDigest({ rows }: { rows: readonly TakeOffRow[] }) {
  const concrete = rows.filter((r) => r.section === 'Concrete');
  const line = (r: TakeOffRow) =>
    [r.item, r.size, r.count ? `×${r.count}` : '', r.quantity ? `(${r.quantity} ${r.unit})` : '']
      .filter(Boolean)
      .join(' ');
  return (
    <div className="takeoff-digest" data-testid="takeoff">
      {concrete.length > 0 && (
        <table className="takeoff takeoff-compact">
          <tbody>
            {concrete.map((r, i) => (
              <tr key={i} className={r.total ? 'takeoff-total' : ''}>
                <td>{r.item}</td>
                <td className="num">{r.quantity}</td>
                <td>{r.unit}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {(['Restrained joints', 'Fittings', 'Anchors'] as const).map((section) => {
        const lines = rows.filter((r) => r.section === section);
        return lines.length ? (
          <p key={section}>
            <strong>{section}:</strong> {lines.map(line).join('; ')}
          </p>
        ) : null;
      })}
    </div>
  );
}
