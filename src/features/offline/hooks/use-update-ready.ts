import { useEffect, useState } from 'react';
import { SW_UPDATE_EVENT } from '../update-event';

/** True once a newer version of the app has taken over this page (see register-sw.ts). */
export function useUpdateReady(): boolean {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    const on = () => setReady(true);
    window.addEventListener(SW_UPDATE_EVENT, on);
    return () => window.removeEventListener(SW_UPDATE_EVENT, on);
  }, []);
  return ready;
}
