import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

describe('offline after one visit (service worker precache)', () => {
  it(
    'reloads with no network, creates a project from a structure, screens it and keeps it',
    { timeout: 180_000 },
    async () => {
      const { page, context } = s;
      await page.goto(BASE_URL);
      await page.getByRole('navigation', { name: 'Workbench areas' }).waitFor();
      // The first visit installs the worker; with clientsClaim it takes control of this page.
      await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
        timeout: 30_000,
      });
      await page.getByTestId('offline-ready').waitFor();

      await context.setOffline(true);
      await page.reload();
      await page.getByText('Offline — working from this browser').waitFor();
      // Every precached asset came from the worker: the app is there and interactive.
      await page.goto(`${BASE_URL}#/projects`);
      await page.getByLabel('Project name').fill('Offline bench project');
      await page.getByLabel('Structure (SMILES)').fill('CN1CCN(CC1)c1ccc(cc1)C(=O)Nc1ccccc1');
      await page.getByLabel('pKa of the conjugate acid').fill('7.5');
      await page.getByRole('button', { name: 'Create project' }).click();
      await expect
        .poll(() => page.locator('.topbar-project').textContent())
        .toContain('Offline bench project');

      // The screen needs S₀ and a dose (arbitrary inputs for this made-up compound, not expected values).
      await page.goto(`${BASE_URL}#/compound`);
      await page.getByLabel('Intrinsic solubility S₀').fill('0.02');
      await page.getByLabel('Highest single dose').fill('100');
      await page.getByText('All changes saved').waitFor();
      // Shortlist two counter-ions from the library, still offline.
      await page.goto(`${BASE_URL}#/counter-ions`);
      for (const query of ['mesylate', 'chloride']) {
        await page.getByLabel('Search counter-ions').fill(query);
        await page
          .getByRole('button', { name: /^Add .* to the shortlist$/ })
          .first()
          .click();
        await page.getByText('On shortlist').first().waitFor();
      }

      // Screen it: the SMILES is parsed by openchemlib's lazily loaded chunk (no formula was given, so
      // the screen cannot fall back on one), and the rank robustness runs in the Monte Carlo worker —
      // both served by the service worker.
      await page.goto(`${BASE_URL}#/ranking`);
      const table = page.locator('table.ranking-table');
      await table.waitFor({ timeout: 30_000 });
      await expect
        .poll(async () => table.locator('tbody:not(.free-form-body) th[scope="row"]').count(), {
          timeout: 30_000,
        })
        .toBe(2);
      await expect(page.getByText(/SMILES could not be read/).count()).resolves.toBe(0);
      await page
        .getByText(/% top three, \d+ % first/)
        .first()
        .waitFor({ timeout: 60_000 });
      await expect(
        page
          .getByRole('alert')
          .filter({ hasText: /could not be computed/ })
          .count(),
      ).resolves.toBe(0);

      // Still offline: a reload keeps the new project (IndexedDB) and the app (precache).
      await page.reload();
      await page.goto(`${BASE_URL}#/projects`);
      await page
        .getByRole('heading', { name: 'Offline bench project' })
        .waitFor({ timeout: 60_000 });
      await context.setOffline(false);
      expect(s.errors.filter((e) => !/ERR_INTERNET_DISCONNECTED/.test(e))).toEqual([]);
    },
  );
});

describe('what the service worker precaches', () => {
  it('lists the structure-parsing chunk and the Monte Carlo worker, not the predictor resources', async () => {
    const { page } = s;
    const res = await page.request.get(new URL('sw.js', BASE_URL).toString());
    expect(res.ok()).toBe(true);
    const sw = await res.text();
    const urls = [...sw.matchAll(/url:"([^"]+)"/g)].map((m) => m[1] ?? '');
    expect(urls).toContain('index.html');
    expect(urls).toContain('manifest.webmanifest');
    expect(urls.some((u) => /assets\/openchemlib-[\w-]+\.js$/.test(u))).toBe(true);
    expect(urls.some((u) => /assets\/robustness\.worker-[\w-]+\.js$/.test(u))).toBe(true);
    expect(urls.some((u) => /resources-[\w-]+\.json$/.test(u))).toBe(false);
    for (const icon of ['icon.svg', 'icon-192.png', 'icon-512.png', 'icon-maskable-512.png'])
      expect(urls).toContain(icon);
  });
});

describe('storage failures are shown, not swallowed', () => {
  it('says so plainly when another tab takes the database away', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByRole('navigation', { name: 'Workbench areas' }).waitFor();
    await page.getByText('Demorazine is fictional').waitFor();
    // Another connection asks for a newer schema version, as a newer Saltsmith in a second tab would
    // (W3C Indexed Database API: the open connection receives "versionchange").
    await page.evaluate(
      () =>
        new Promise<void>((res, rej) => {
          const req = indexedDB.open('saltsmith', 9999);
          req.onsuccess = () => {
            req.result.close();
            res();
          };
          req.onerror = () => rej(req.error);
        }),
    );
    const banner = page.getByRole('alert').filter({ hasText: 'Storage problem' });
    await banner.waitFor();
    await expect(banner.textContent()).resolves.toMatch(/Reload this tab/);
  });
});
