import { useEffect, useRef, useState } from 'react';
import { useStore } from 'zustand';
import {
  hideKeptCopies,
  keptCopiesView,
  keptCopyText,
  removeKeptCopy,
  type KeptCopySummary,
} from '../state/keptCopiesView.js';
import { download } from '../files/saveFile.js';

const dateOf = (iso: string) => {
  const d = new Date(iso);
  return d.getTime() === 0
    ? 'date not recorded'
    : d.toLocaleString([], { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });
};

const sizeOf = (chars: number) => (chars < 1024 ? `${chars} B` : `${(chars / 1024).toFixed(chars < 10240 ? 1 : 0)} kB`);

/** A file name for a kept copy: its project's name and the date it was kept. */
const fileNameOf = (c: KeptCopySummary) =>
  `${
    (c.name ?? 'project')
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-|-$/g, '')
      .toLowerCase() || 'project'
  }-kept-${c.keptAt.slice(0, 10)}.json`;

/** The projects set aside in this browser (damaged, from another tab, from the error screen), each to download. */
export function KeptCopiesDialog() {
  const { copies, open, error } = useStore(keptCopiesView);
  const close = useRef<HTMLButtonElement>(null);
  const [confirming, setConfirming] = useState<string | null>(null);
  useEffect(() => {
    if (open) close.current?.focus();
  }, [open]);
  if (!open) return null;
  const save = async (c: KeptCopySummary) => {
    const text = await keptCopyText(c.id);
    if (text !== null) download(fileNameOf(c), text, 'application/json');
  };
  return (
    <div className="dialog-backdrop" onClick={hideKeptCopies}>
      <div
        className="dialog kept-copies"
        role="dialog"
        aria-modal="true"
        aria-labelledby="kept-title"
        data-testid="kept-copies-dialog"
        onClick={(e) => e.stopPropagation()}
        onKeyDown={(e) => e.key === 'Escape' && hideKeptCopies()}
      >
        <h2 id="kept-title">Kept copies</h2>
        <p className="muted">
          Projects this browser set aside rather than overwrite or throw away. They stay until you delete them; download
          one and open it to work on it.
        </p>
        {error && <p className="kept-error">The list could not be read: {error}</p>}
        {copies.length === 0 ? (
          <p>No kept copies.</p>
        ) : (
          <table className="kept-list">
            <thead>
              <tr>
                <th scope="col">Kept</th>
                <th scope="col">Project</th>
                <th scope="col">Why</th>
                <th scope="col">Size</th>
                <th scope="col">
                  <span className="visually-hidden">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {copies.map((c) => (
                <tr key={c.id} data-testid="kept-copy">
                  <td className="kept-date">{dateOf(c.keptAt)}</td>
                  <td>{c.name ?? <span className="muted">(no readable name)</span>}</td>
                  <td>{c.reason}</td>
                  <td className="num">{sizeOf(c.size)}</td>
                  <td className="kept-actions">
                    <button onClick={() => void save(c)}>Download</button>
                    {confirming === c.id ? (
                      <button
                        className="danger"
                        onClick={() => void removeKeptCopy(c.id).then(() => setConfirming(null))}
                      >
                        Delete for good
                      </button>
                    ) : (
                      <button onClick={() => setConfirming(c.id)}>Delete…</button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <button ref={close} onClick={hideKeptCopies}>
          Close
        </button>
      </div>
    </div>
  );
}
