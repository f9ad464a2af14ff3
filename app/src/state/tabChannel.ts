/** What one tab tells the others about the kept project. */
export type TabMessage =
  /** a new revision of the project is in storage */
  | { kind: 'saved'; revision: number; tab: string }
  /** the list of kept copies changed */
  | { kind: 'kept' };

export interface TabChannel {
  post(message: TabMessage): void;
  listen(handler: (message: TabMessage) => void): () => void;
}

const NAME = 'mainbrace.project';

/** A BroadcastChannel between the app's tabs, or null where the browser has none. */
export function openTabChannel(name = NAME): TabChannel | null {
  if (typeof BroadcastChannel === 'undefined') return null;
  const channel = new BroadcastChannel(name);
  return {
    post: (message) => channel.postMessage(message),
    listen: (handler) => {
      const onMessage = (e: MessageEvent) => handler(e.data as TabMessage);
      channel.addEventListener('message', onMessage);
      return () => channel.removeEventListener('message', onMessage);
    },
  };
}

/** An id for this tab, to tell its own saves from another tab's. */
export const newTabId = (): string =>
  typeof crypto !== 'undefined' && 'randomUUID' in crypto
    ? crypto.randomUUID()
    : `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
