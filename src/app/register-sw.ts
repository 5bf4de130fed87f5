import { SW_UPDATE_EVENT } from '@/features/offline/update-event';

/**
 * Register the service worker that vite-plugin-pwa generates (workbox, `generateSW`), so the workbench
 * opens and works with no network after one visit: the app shell, every JavaScript chunk (the
 * structure-parsing library's lazy chunk and the Monte Carlo worker included), styles, icons and the
 * manifest are precached. Skipped in development, where no worker is generated.
 *
 * With `registerType: 'autoUpdate'` a new build's worker takes over at once (skipWaiting +
 * clientsClaim) and old precaches are removed; data lives in IndexedDB, which updates do not touch.
 * When that happens under an open page, SW_UPDATE_EVENT is fired so the page can offer a reload (the
 * old page's not-yet-loaded chunks are gone from the cache).
 */
export function registerServiceWorker(): void {
  if (import.meta.env.DEV || typeof navigator === 'undefined' || !('serviceWorker' in navigator))
    return;
  const hadController = navigator.serviceWorker.controller !== null;
  navigator.serviceWorker.addEventListener('controllerchange', () => {
    if (hadController) window.dispatchEvent(new Event(SW_UPDATE_EVENT));
  });
  const register = () => {
    navigator.serviceWorker
      .register(`${import.meta.env.BASE_URL}sw.js`, { scope: import.meta.env.BASE_URL })
      .catch((err: unknown) => {
        console.warn('Saltsmith: offline support unavailable:', err);
      });
  };
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}
