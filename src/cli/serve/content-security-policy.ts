/**
 * The Content-Security-Policy `saltsmith serve` sends with every response. It is the same policy the
 * production build carries in its index.html meta tag; the header adds what a meta tag cannot enforce
 * (`frame-ancestors`). No inline script, no remote origin: scripts, styles, fonts, workers and fetches
 * come from the app's own origin only; inline styles are allowed (the charts set style attributes);
 * images may also be data: or blob: URLs (structure drawings, chart exports).
 */
export const CONTENT_SECURITY_POLICY =
  "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; font-src 'self'; connect-src 'self'; worker-src 'self' blob:; manifest-src 'self'; object-src 'none'; base-uri 'self'; form-action 'self'; frame-ancestors 'none'";
