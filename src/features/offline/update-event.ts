/**
 * Fired on `window` when a new version's service worker has taken over a page that was already
 * controlled by an older one. The page still runs the old code; its lazily loaded parts may no longer
 * be cached, so the offline status offers a reload.
 */
export const SW_UPDATE_EVENT = 'saltsmith:sw-updated';
