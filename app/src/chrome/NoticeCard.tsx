import { useEffect, useState } from 'react';
import { useActions } from '../state/StoreContext.js';
import type { Notice } from '../state/store.js';

/** A plain confirmation ("Opened …") goes after this long; anything with lines or actions stays. */
const PASSING_MS = 10_000;

/** The notice shown; its held state starts afresh with each showing (a notice gone hears no leave). */
export function NoticeCard({ notice }: { notice: Notice }) {
  const actions = useActions();
  const passing = notice.tone === 'info' && notice.lines.length === 0 && !notice.actions?.length;
  // Held while the pointer is over it or the keyboard is in it: a notice being read, or whose Dismiss
  // has the focus, does not go from under the user (the focus would fall back to the page). The time
  // starts again when it is let go.
  const [pointed, setPointed] = useState(false);
  const [focused, setFocused] = useState(false);
  const held = pointed || focused;
  useEffect(() => {
    if (!passing || held) return;
    const timer = setTimeout(() => actions.notify(null), PASSING_MS);
    return () => clearTimeout(timer);
  }, [notice, passing, held, actions]);
  return (
    <div
      className={`notice notice-${notice.tone}`}
      role={notice.tone === 'info' ? 'status' : 'alert'}
      data-testid="notice"
      onPointerEnter={() => setPointed(true)}
      onPointerLeave={() => setPointed(false)}
      onFocus={() => setFocused(true)}
      onBlur={(e) => setFocused(e.currentTarget.contains(e.relatedTarget as Node | null))}
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
