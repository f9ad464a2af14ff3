import { del, get, keys, set, update } from 'idb-keyval';

/** The browser storage the app keeps projects in, as the few calls it needs (a test passes a Map). */
export interface KeyValueStore {
  get(key: string): Promise<unknown>;
  set(key: string, value: unknown): Promise<void>;
  del(key: string): Promise<void>;
  keys(): Promise<string[]>;
  /** reads and writes one key in one transaction, so two tabs cannot interleave between the two */
  update(key: string, change: (old: unknown) => unknown): Promise<void>;
}

/** IndexedDB through idb-keyval's default database ("keyval-store"), where projects have always been kept. */
export const browserStore: KeyValueStore = {
  get: (key) => get(key),
  set: (key, value) => set(key, value),
  del: (key) => del(key),
  keys: async () => (await keys()).filter((k): k is string => typeof k === 'string'),
  update: (key, change) => update(key, change),
};

/** An in-memory store with the same behaviour, for tests and for two tabs simulated in one process. */
export function memoryStore(initial: Record<string, unknown> = {}): KeyValueStore & { data: Map<string, unknown> } {
  const data = new Map(Object.entries(initial));
  return {
    data,
    get: async (key) => structuredClone(data.get(key)),
    set: async (key, value) => void data.set(key, structuredClone(value)),
    del: async (key) => void data.delete(key),
    keys: async () => [...data.keys()],
    update: async (key, change) => void data.set(key, structuredClone(change(structuredClone(data.get(key))))),
  };
}
