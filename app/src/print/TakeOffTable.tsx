import type { TakeOffRow } from '@mainbrace/solver';

/**
 * The quantities take-off as a table: the solver's take-off lines (the same as the CSV and the
 * command line), grouped under their section. Used on the sheet and in the app's drawer.
 */
export function TakeOffTable({ rows, compact = false }: { rows: readonly TakeOffRow[]; compact?: boolean }) {
  if (rows.length === 0) return <p className="muted">Nothing to build.</p>;
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
