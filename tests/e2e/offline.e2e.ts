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
  it('reloads with no network, creates a project and keeps it', async () => {
    const { page, context } = s;
    await page.goto(BASE_URL);
    await page.getByRole('navigation', { name: 'Workbench areas' }).waitFor();
    // The first visit installs the worker; with clientsClaim it takes control of this page.
    await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, { timeout: 30_000 });
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
    await expect.poll(() => page.locator('.topbar-project').textContent()).toContain('Offline bench project');

    // Still offline: a reload keeps the new project (IndexedDB) and the app (precache).
    await page.reload();
    await page.goto(`${BASE_URL}#/projects`);
    await page.getByRole('button', { name: 'Open Offline bench project' }).waitFor();
    await context.setOffline(false);
    expect(s.errors.filter((e) => !/ERR_INTERNET_DISCONNECTED/.test(e))).toEqual([]);
  });
});
