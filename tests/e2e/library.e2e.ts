import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

describe('counter-ion library in Chromium (production build)', () => {
  it('adds an in-house ion, finds it after a reload and screens it against the demo compound', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await page
      .getByRole('navigation', { name: 'Workbench areas' })
      .getByRole('link', { name: 'Counter-ions' })
      .click();
    const table = page.getByRole('table', { name: 'Counter-ion library' });
    await table.waitFor();

    await page.getByText('Add an in-house counter-ion').click();
    await page.getByLabel('Ion name').fill('Lab sulfonate E2E');
    await page.getByLabel('Ion formula').fill('C3H7O3S');
    await page.getByLabel('Ion charge').fill('-1');
    await page.getByLabel('pKa values of the parent').fill('-1.5');
    await page.getByLabel('Source of the pKa values').fill('in-house titration (test entry)');
    await page.getByRole('button', { name: 'Save in-house ion' }).click();
    await page.getByText('Saved “Lab sulfonate E2E”').waitFor();

    await page.reload();
    await table.waitFor();
    await page.getByLabel('Search counter-ions').fill('Lab sulfonate');
    const row = table.getByRole('row').filter({ hasText: 'Lab sulfonate E2E' });
    await row.waitFor();
    await expect(row.getByText('in-house').count()).resolves.toBe(1);
    // ΔpKa against the demo compound's (invented) pKa 7.8: 7.8 − (−1.5) = 9.3 → the salt band.
    await row.getByText(/9\.3 · salt expected/).waitFor();
    await row.getByRole('button', { name: /to the shortlist/ }).click();
    await row.getByText('On shortlist').waitFor();

    await page.screenshot({ path: '/tmp/saltsmith-library-e2e.png', fullPage: false });
    expect(s.errors).toEqual([]);
  });

  it('shows the structure picture in the compound area without blocking the first screen', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await page.getByRole('img', { name: /Structure of Demorazine/ }).waitFor({ timeout: 15000 });
    await page.getByText(/Salt-forming drug ion/).waitFor();
    await page.screenshot({ path: '/tmp/saltsmith-compound-e2e.png', fullPage: true });
    expect(s.errors).toEqual([]);
  });

  it('works without the chemistry library: the first screen and saving never wait for it', async () => {
    const { page } = s;
    // Refuse the lazily loaded openchemlib chunk: the compound area must still open and save.
    await page.route(/openchemlib-[^/]*\.js$/, (route) => route.abort());
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await page.getByText(/the chemistry library could not be loaded/).waitFor({ timeout: 15000 });
    await page.getByText(/C18H20ClN3O, 329\.83 g\/mol/).waitFor();
    await page.getByLabel('Name', { exact: true }).fill('Compound without pictures');
    await page.getByText('All changes saved').waitFor();
  });
});
