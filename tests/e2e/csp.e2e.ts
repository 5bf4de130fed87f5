import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';
import { area } from './support/navigation';

// Issue 13: the production build carries a Content-Security-Policy that forbids inline script and
// remote origins, and the whole workbench (service worker, workers, openchemlib, charts) runs under it.

/** The policy the build must carry, word for word (vite.config.ts injects it into index.html). */
const POLICY =
  "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; font-src 'self'; connect-src 'self'; worker-src 'self' blob:; manifest-src 'self'; object-src 'none'; base-uri 'self'; form-action 'self'";

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

describe('Content-Security-Policy (Chromium, production build)', () => {
  it('is in the served page and refuses inline script and remote origins', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await expect(
      page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content'),
    ).resolves.toBe(POLICY);

    const ran = await page.evaluate(async () => {
      const w = window as unknown as { inlineRan?: boolean };
      const el = document.createElement('script');
      el.textContent = 'window.inlineRan = true';
      document.head.append(el);
      let remote = 'loaded';
      try {
        await fetch('https://example.invalid/x');
      } catch {
        remote = 'refused';
      }
      await new Promise((r) => setTimeout(r, 100));
      return { inline: w.inlineRan === true, remote };
    });
    expect(ran).toEqual({ inline: false, remote: 'refused' });
    await expect.poll(() => s.cspViolations.join('\n')).toMatch(/script-src/);
    expect(s.cspViolations.join('\n')).toMatch(/connect-src/);
    s.cspViolations.length = 0; // provoked on purpose above; the session's own check stays for the rest
  });

  it('runs the service worker, the structure library, the robustness worker and the charts with zero violations', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    // openchemlib (lazy chunk) draws the structure.
    await page.getByRole('img', { name: /Structure of Demorazine/ }).waitFor({ timeout: 20000 });
    // The service worker takes control.
    await expect
      .poll(
        () =>
          page.evaluate(() => navigator.serviceWorker.ready.then((r) => r.active?.state ?? 'none')),
        { timeout: 20000 },
      )
      .toBe('activated');
    // Ranking: the Monte Carlo robustness runs in a module worker; recharts draws the pH-solubility chart.
    await area(page, 'Ranking');
    await page.getByRole('table', { name: /Ranked candidates/ }).waitFor();
    await page
      .getByText(/\(first \d+ %\)/)
      .first()
      .waitFor({ timeout: 30000 });
    await page.locator('.recharts-surface').first().waitFor({ timeout: 20000 });
    expect(s.errors).toEqual([]);
    expect(s.cspViolations).toEqual([]);
  });
});
