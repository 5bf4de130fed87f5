import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';
import { area } from './support/navigation';

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

// The salt-screen plan of the fictional demo: its plate, one recorded outcome, and the outcome summary
// in the Ranking. Nothing here compares with the demo's invented numbers — only the well count
// (4 counter-ions × 4 solvents) and what the user recorded.
describe('the salt screen in the browser (production build)', () => {
  it('shows the demo plan, records an outcome that persists, and the Ranking summarises it', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await area(page, 'Salt screen');
    await page
      .getByRole('heading', { name: /16 wells on a 24-well plate/ })
      .waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: /^A5: Mesylate in Ethanol$/ }).click();
    const form = page.getByRole('region', { name: /Outcome of well A5/ });
    await form.getByLabel('What came out').selectOption('crystalline-solid');
    await form.getByLabel(/Melting point/).fill('205');
    await form.getByRole('button', { name: 'Record outcome' }).click();
    await form.getByRole('status').filter({ hasText: 'Recorded for A5' }).waitFor();
    await page
      .getByRole('button', { name: /^A5: Mesylate in Ethanol, crystalline solid$/ })
      .waitFor();

    // a reload keeps it (IndexedDB)
    await page.reload();
    await area(page, 'Salt screen');
    await page
      .getByRole('button', { name: /^A5: Mesylate in Ethanol, crystalline solid$/ })
      .waitFor({ timeout: 30_000 });

    await area(page, 'Ranking');
    const summary = page.getByRole('table', { name: /Salt screen: what the wells gave/ });
    await summary.waitFor({ timeout: 30_000 });
    const row = summary.getByRole('row', { name: /mesylate/i });
    await expect(row.textContent()).resolves.toMatch(
      /1 of 4.*1.*crystalline solid \(A5, m\.p\. 205 °C\)/,
    );
    expect(s.errors).toEqual([]);
  });
});
