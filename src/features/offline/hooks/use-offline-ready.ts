import { useEffect, useState } from 'react';

/**
 * True once a service worker controls this page, i.e. the app is precached and will open with no
 * network. Stays false in development and in browsers without service workers.
 */
export function useOfflineReady(): boolean {
  const [ready, setReady] = useState(
    () =>
      typeof navigator !== 'undefined' &&
      'serviceWorker' in navigator &&
      !!navigator.serviceWorker.controller,
  );
  useEffect(() => {
    if (ready || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
    let cancelled = false;
    const sw = navigator.serviceWorker;
    const onChange = () => {
      if (!cancelled && sw.controller) setReady(true);
    };
    sw.addEventListener('controllerchange', onChange);
    void sw.ready.then(onChange);
    return () => {
      cancelled = true;
      sw.removeEventListener('controllerchange', onChange);
    };
  }, [ready]);
  return ready;
}
