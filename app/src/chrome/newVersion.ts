import type { Notice } from '../state/store.js';

/** Installed and offline: the service worker is built with the app (not in the dev server). */
export function registerServiceWorker() {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  void navigator.serviceWorker.register('./sw.js').catch(() => undefined);
}

/**
 * Tells the user when a newer version took over this tab's offline files. The tab goes on with the
 * files it started with (the worker keeps them while the tab is open); a reload brings the new one.
 */
export function watchForNewVersion(
  notify: (n: Notice) => void,
  saveBeforeReload: () => Promise<boolean>,
  /** the worker that controlled the page when it opened (read then: this module loads after the first draw) */
  atStart: ServiceWorker | null,
) {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  const hadWorker = atStart !== null;
  const tell = () =>
    notify({
      tone: 'info',
      title: 'A new version of Mainbrace is installed: reload when convenient to use it — your project is kept',
      lines: [],
      actions: [
        {
          label: 'Reload now',
          run: () => void saveBeforeReload().then(() => window.location.reload()),
        },
      ],
    });
  // A newer worker may have taken over before this module loaded.
  if (hadWorker && navigator.serviceWorker.controller !== atStart) return tell();
  navigator.serviceWorker.addEventListener('controllerchange', () => {
    if (!hadWorker) return; // the first install changes nothing the user sees
    tell();
  });
}
