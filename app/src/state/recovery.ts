import type { KeyValueStore } from './keyValue.js';
import { PROJECT_KEY, readRecord } from './storedProject.js';
import { keepCopyOnce, type KeptCopy } from './keptCopies.js';

/** The stored project's text exactly as kept (even if it no longer reads), or null if there is none. */
export async function storedProjectText(kv: KeyValueStore): Promise<string | null> {
  const record = await readRecord(kv);
  return record && record.text.trim() !== '' ? record.text : null;
}

/**
 * Moves the stored project into the kept copies and removes it, so that the next start opens
 * without it: the way out of a screen that fails on every reload, losing nothing.
 */
export async function setAsideStoredProject(kv: KeyValueStore, reason: string): Promise<KeptCopy | null> {
  const text = await storedProjectText(kv);
  const copy = text === null ? null : await keepCopyOnce(kv, text, reason);
  await kv.del(PROJECT_KEY);
  return copy;
}

/** Keeps the stored project as a kept copy and leaves it in place (Open or New then save over it). */
export async function keepStoredProject(kv: KeyValueStore, reason: string): Promise<KeptCopy | null> {
  const text = await storedProjectText(kv);
  return text === null ? null : keepCopyOnce(kv, text, reason);
}
