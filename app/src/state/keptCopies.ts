import type { KeyValueStore } from './keyValue.js';

/** Each kept copy has its own key, so keeping one never rewrites the others. */
const PREFIX = 'mainbrace.kept.v1.';
/** The single backup key of earlier releases; its copy is moved into the dated list. */
const LEGACY_KEY = 'mainbrace.project.v1.unreadable';

/** A project text set aside instead of being overwritten or thrown away. */
export interface KeptCopy {
  id: string;
  /** ISO date when it was kept */
  keptAt: string;
  /** why it was kept, in a few words the list shows */
  reason: string;
  /** the project's name if its text still reads as JSON with a name, else null */
  name: string | null;
  text: string;
}

/** The project name in a text that may be damaged. */
export function nameIn(text: string): string | null {
  try {
    const data: unknown = JSON.parse(text);
    const name = (data as { name?: unknown } | null)?.name;
    return typeof name === 'string' ? name : null;
  } catch {
    return null;
  }
}

function isCopy(v: unknown): v is KeptCopy {
  const c = v as KeptCopy | null;
  return !!c && typeof c.id === 'string' && typeof c.text === 'string' && typeof c.keptAt === 'string';
}

/** Every kept copy, newest first. */
export async function listKeptCopies(kv: KeyValueStore): Promise<KeptCopy[]> {
  await moveLegacyCopy(kv);
  const ids = (await kv.keys()).filter((k) => k.startsWith(PREFIX));
  const copies = (await Promise.all(ids.map((k) => kv.get(k)))).filter(isCopy);
  return copies.sort((a, b) => b.keptAt.localeCompare(a.keptAt) || b.id.localeCompare(a.id));
}

/** Keeps a copy of a project text with the date and the reason. */
export async function keepCopy(kv: KeyValueStore, text: string, reason: string, now = new Date()): Promise<KeptCopy> {
  const id = `${now.getTime().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
  const copy: KeptCopy = { id, keptAt: now.toISOString(), reason, name: nameIn(text), text };
  await kv.set(PREFIX + id, copy);
  return copy;
}

/** As keepCopy, but the same text kept twice (a damaged copy found again at the next start) is one copy. */
export async function keepCopyOnce(kv: KeyValueStore, text: string, reason: string): Promise<KeptCopy> {
  return (await listKeptCopies(kv)).find((c) => c.text === text) ?? (await keepCopy(kv, text, reason));
}

/** One kept copy, or null if it is gone. */
export async function readKeptCopy(kv: KeyValueStore, id: string): Promise<KeptCopy | null> {
  const c = await kv.get(PREFIX + id);
  return isCopy(c) ? c : null;
}

/** Replaces the text of a copy this tab keeps up to date (its edits while another tab's copy is newer). */
export async function updateKeptCopy(kv: KeyValueStore, copy: KeptCopy, text: string, now = new Date()) {
  const next: KeptCopy = { ...copy, keptAt: now.toISOString(), name: nameIn(text), text };
  await kv.set(PREFIX + copy.id, next);
  return next;
}

export async function deleteKeptCopy(kv: KeyValueStore, id: string): Promise<void> {
  await kv.del(PREFIX + id);
}

async function moveLegacyCopy(kv: KeyValueStore): Promise<void> {
  const legacy = await kv.get(LEGACY_KEY);
  if (typeof legacy !== 'string') return;
  const copy: KeptCopy = {
    id: 'earlier-release',
    keptAt: new Date(0).toISOString(),
    reason: 'could not be read (kept by an earlier version; date not recorded)',
    name: nameIn(legacy),
    text: legacy,
  };
  await kv.set(PREFIX + copy.id, copy);
  await kv.del(LEGACY_KEY);
}
