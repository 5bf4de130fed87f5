/**
 * Register the service worker that vite-plugin-pwa generates, so the workbench opens with no network
 * after one visit. Skipped in development, where there is no generated worker.
 */
export function registerServiceWorker(): void {
  if (import.meta.env.DEV || !('serviceWorker' in navigator)) return;
  window.addEventListener('load', () => {
    navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch((err: unknown) => {
      console.warn('Saltsmith: offline support unavailable:', err);
    });
  });
}
