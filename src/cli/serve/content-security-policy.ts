/**
 * The Content-Security-Policy of the production build, in one place: vite.config.ts writes it into
 * index.html as a meta tag at build time, and `saltsmith serve` sends it as a header with
 * `frame-ancestors 'none'` added (a meta tag cannot carry that directive). Scripts, workers, styles,
 * fonts, data and the manifest come from the app's own origin only; no inline script, no remote
 * origin, no plugins. Inline styles stay allowed because React and recharts set `style` attributes;
 * `blob:` images are the structure pictures and downloads; `blob:` workers are left open for bundlers
 * that inline a worker. The browser tests fail on any violation (tests/e2e/csp.e2e.ts).
 */
export const CONTENT_SECURITY_POLICY_META = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "manifest-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join('; ');

/** The header `saltsmith serve` sends: the same policy plus `frame-ancestors 'none'`. */
export const CONTENT_SECURITY_POLICY = `${CONTENT_SECURITY_POLICY_META}; frame-ancestors 'none'`;
