import { useEffect } from 'react';
import { useActions, useApp } from '../state/StoreContext.js';

/** A plain confirmation ("Opened …") goes after this long; anything with lines or actions stays. */
const PASSING_MS = 10_000;

/**
 * Messages the user must see: a refused file with its problems, a storage failure, another tab's edits.
 * It lies over the top of the plan rather than above it, so that showing or dismissing it never resizes
 * (and redraws) the plan.
 */
export function NoticeBar() {
  const notice = useApp((s) => s.notice);
  const actions = useActions();
  const passing = notice?.tone === 'info' && notice.lines.length === 0 && !notice.actions?.length;
  useEffect(() => {
    if (!passing) return;
    const timer = setTimeout(() => actions.notify(null), PASSING_MS);
    return () => clearTimeout(timer);
  }, [notice, passing, actions]);
  if (!notice) return null;
  return (
    <div
      className={`notice notice-${notice.tone}`}
      role={notice.tone === 'info' ? 'status' : 'alert'}
      data-testid="notice"
    >
      <div className="notice-body">
        <strong>{notice.title}</strong>
        {notice.lines.length > 0 && (
          <ul>
            {notice.lines.slice(0, 30).map((l, i) => (
              <li key={i}>{l}</li>
            ))}
            {notice.lines.length > 30 && <li>… and {notice.lines.length - 30} more</li>}
          </ul>
        )}
        {notice.actions && notice.actions.length > 0 && (
          <div className="notice-actions">
            {notice.actions.map((a) => (
              <button key={a.label} onClick={a.run}>
                {a.label}
              </button>
            ))}
          </div>
        )}
      </div>
      <button onClick={() => actions.notify(null)} aria-label="Dismiss">
        ×
      </button>
    </div>
  );
}
