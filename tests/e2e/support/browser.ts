import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CHROMIUM_ARGS } from './chromium.mjs';

/** The served production build (set by run-browser-tests.mjs). */
export const BASE_URL = process.env.SALTSMITH_URL ?? 'http://127.0.0.1:4173/';

export { CHROMIUM_ARGS };

export interface Session {
  context: BrowserContext;
  page: Page;
  /** Console errors and uncaught page errors seen so far. */
  errors: string[];
  /**
   * Content-Security-Policy violations seen in any page of the session (the page's
   * `securitypolicyviolation` events and Chromium's "Refused to …" console reports). `close()` fails
   * the test when this is not empty, so every browser test runs under the policy with zero violations.
   * A test that provokes a violation on purpose empties it after checking it.
   */
  cspViolations: string[];
  close: () => Promise<void>;
}

/** Name of the binding through which pages report CSP violations to the test. */
const CSP_BINDING = '__saltsmithCspViolation';

/** Installed in every document before its own scripts run: forward each violation to the test. */
const CSP_LISTENER = `document.addEventListener('securitypolicyviolation', (e) => {
  const report = window['${CSP_BINDING}'];
  if (typeof report === 'function') {
    void report([e.violatedDirective, e.blockedURI || '(inline)', e.sourceFile + ':' + e.lineNumber].join(' '));
  }
});`;

/** Open a persistent browser profile (so IndexedDB survives reloads) with one page watched for errors. */
export async function openSession(
  opts: { viewport?: { width: number; height: number } } = {},
): Promise<Session> {
  const userDataDir = mkdtempSync(join(tmpdir(), 'saltsmith-e2e-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [...CHROMIUM_ARGS],
    viewport: opts.viewport ?? { width: 1280, height: 800 },
    acceptDownloads: true,
  });
  const errors: string[] = [];
  const cspViolations: string[] = [];
  await context.exposeBinding(CSP_BINDING, (_source, text: string) => {
    cspViolations.push(text);
  });
  await context.addInitScript({ content: CSP_LISTENER });
  const watch = (page: Page) => {
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
      if (/Content Security Policy/i.test(m.text())) cspViolations.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(String(e)));
  };
  context.on('page', watch);
  const page = context.pages()[0] ?? (await context.newPage());
  watch(page);
  return {
    context,
    page,
    errors,
    cspViolations,
    close: async () => {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
      if (cspViolations.length) {
        throw new Error(
          `Content-Security-Policy violations:\n${[...new Set(cspViolations)].join('\n')}`,
        );
      }
    },
  };
}

export type { Browser };
