/**
 * The service worker's source: precache every built file, then serve from the cache first (offline
 * use). Files of an older version stay cached while a tab that started with them is open, so its
 * lazily loaded parts still load after a new version took over.
 */
export function serviceWorker(version: string, files: string[]): string {
  return `// Generated at build time: precaches the app so it works with no network.
const CACHE = 'mainbrace-${version}';
const FILES = ${JSON.stringify(files)};
// One record naming older caches still kept, and the tabs that were open when they were retired.
const RETIRING = 'mainbrace-retiring';
const RETIRING_URL = './__retiring__';

const windows = () => self.clients.matchAll({ type: 'window', includeUncontrolled: true });
const readRetiring = () =>
  caches.open(RETIRING).then((c) => c.match(RETIRING_URL)).then((r) => (r ? r.json() : null));

// Deletes retired caches once no tab that was open at the switch is open any more.
async function prune() {
  const retiring = await readRetiring();
  if (!retiring) return;
  const open = new Set((await windows()).map((w) => w.id));
  if (retiring.clients.some((id) => open.has(id))) return;
  await Promise.all(retiring.caches.map((k) => caches.delete(k)));
  await caches.delete(RETIRING);
}

self.addEventListener('install', (e) => {
  // Bypass the HTTP cache: a file changed under the same name must be fetched anew.
  const fresh = FILES.map((f) => new Request(f, { cache: 'reload' }));
  e.waitUntil(caches.open(CACHE).then((c) => c.addAll(fresh)).then(() => self.skipWaiting()));
});

self.addEventListener('activate', (e) => {
  e.waitUntil(
    (async () => {
      const older = (await caches.keys()).filter((k) => k.startsWith('mainbrace-') && k !== CACHE && k !== RETIRING);
      const tabs = (await windows()).map((w) => w.id);
      const before = (await readRetiring()) || { caches: [], clients: [] };
      const record = { caches: older, clients: [...new Set([...before.clients, ...tabs])] };
      await caches.open(RETIRING).then((c) => c.put(RETIRING_URL, new Response(JSON.stringify(record))));
      await self.clients.claim();
      await prune();
    })(),
  );
});

// This version's files first (a file kept under the same name in an older cache is stale), then an
// older version's, for a tab still running it; the network for anything else.
const cached = (request) =>
  caches
    .open(CACHE)
    .then((c) => c.match(request, { ignoreVary: true }))
    .then((hit) => hit || caches.match(request, { ignoreVary: true }));

self.addEventListener('fetch', (e) => {
  const url = new URL(e.request.url);
  if (e.request.method !== 'GET' || url.origin !== self.location.origin) return;
  if (e.request.mode === 'navigate') {
    e.waitUntil(prune());
    e.respondWith(fetch(e.request).catch(() => caches.open(CACHE).then((c) => c.match('./'))));
    return;
  }
  // Module scripts and styles ask with an Origin header; the cached copies were fetched without one.
  e.respondWith(cached(e.request).then((hit) => hit || fetch(e.request)));
});
`;
}
