import type { Restored } from './autosave.js';
import type { Notice } from './store.js';
import { showKeptCopies } from './keptCopiesView.js';

/** What the user is told at start about the project kept from the last visit, if anything. */
export function keptNotice(kept: Restored): Notice | null {
  const copies = { label: 'Show kept copies', run: showKeptCopies };
  switch (kept.kind) {
    case 'unreadable':
      return {
        tone: 'warning',
        title: kept.copy
          ? 'The project kept from your last visit could not be read: it is in Kept copies, unchanged, and the demo opened instead'
          : 'The project kept from your last visit could not be read, and could not be copied aside: it stays in storage until you save over it; the demo opened instead',
        lines: kept.lines,
        ...(kept.copy ? { actions: [copies] } : {}),
      };
    case 'empty':
      return {
        tone: 'warning',
        title: 'The project kept in this browser was empty, so there was nothing to open: the demo opened instead',
        lines: ['The last save may have been cut short (the browser closed while saving, or its storage was cleared).'],
      };
    case 'storage-failed':
      return {
        tone: 'warning',
        title: 'The browser’s storage could not be read: the demo opened, and a project kept there is left untouched',
        lines: [kept.detail],
      };
    default:
      return null;
  }
}
