import { useActions, useApp } from '../state/StoreContext.js';

/** Messages the user must see: a refused file with its problems, a storage failure, another tab's edits. */
export function NoticeBar() {
  const notice = useApp((s) => s.notice);
  const actions = useActions();
  // An empty slot keeps the window's grid rows in place when there is nothing to say.
  if (!notice) return <div className="notice-slot" />;
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
