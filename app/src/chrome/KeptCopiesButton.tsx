import { useStore } from 'zustand';
import { keptCopiesView, showKeptCopies } from '../state/keptCopiesView.js';

/** The top-bar entry to the kept copies; shown only while there are some. */
export function KeptCopiesButton() {
  const count = useStore(keptCopiesView, (s) => s.copies.length);
  if (count === 0) return null;
  return (
    <button onClick={showKeptCopies} title="Projects set aside instead of being overwritten" data-testid="kept-copies">
      Kept copies ({count})
    </button>
  );
}
