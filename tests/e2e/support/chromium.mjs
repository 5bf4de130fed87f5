// Where the system Chromium is. Browser tests never download a browser: they use Debian's package
// (apt-get install -y chromium) or the binary named by CHROME_PATH.
import { existsSync } from 'node:fs';

/** Chromium flags that keep it off a network the test machines do not have (DEVELOPERS.md, "Commands"). */
export const CHROMIUM_ARGS = [
  '--headless=new',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export function findChromium() {
  const candidates = [
    process.env.CHROME_PATH,
    '/usr/bin/chromium',
    '/usr/bin/chromium-browser',
  ].filter(Boolean);
  return candidates.find((p) => existsSync(p)) ?? null;
}

export const CHROMIUM_MISSING_MESSAGE = `Saltsmith's browser tests need Chromium, and none was found.
Install it (Debian/Ubuntu):   sudo apt-get update && sudo apt-get install -y chromium
or point CHROME_PATH at a Chromium or Chrome binary:   CHROME_PATH=/path/to/chrome npm test
The browser tests are never skipped silently.`;
