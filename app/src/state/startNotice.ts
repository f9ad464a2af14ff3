import type { Notice } from './store.js';

const KEY = 'mainbrace.startNotice';

/** A message for the next start of this tab (after a reload the app makes itself). */
export function leaveNoticeForNextStart(notice: Omit<Notice, 'actions'>) {
  try {
    sessionStorage.setItem(KEY, JSON.stringify(notice));
  } catch {
    // no session storage: the reload goes on without the message
  }
}

/** The message left by the last start of this tab, once. */
export function takeStartNotice(): Omit<Notice, 'actions'> | null {
  try {
    const text = sessionStorage.getItem(KEY);
    sessionStorage.removeItem(KEY);
    const n = text ? (JSON.parse(text) as Notice) : null;
    return n && typeof n.title === 'string' && Array.isArray(n.lines) ? n : null;
  } catch {
    return null;
  }
}
