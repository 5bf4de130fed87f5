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

// Issue 16: a solubility measured above pH_max is the free form's, not the salt's. In the fictional
// demo (pKa 7.8 and S₀ 0.015 mg/mL, stated as measured in its invented story) a tosylate value of
// 0.13 mg/mL as salt at pH 7.6 is about 2.2× what the free form alone dissolves there —
// S₀·(1 + 10^(7.8 − 7.6)) = 0.0388 mg/mL of free form, ≈ 0.059 mg/mL as tosylate (molar-mass ratio
// ≈ 1.52) — so read as the salt's it would leave the free base supersaturated: the workbench must read
// it as limited by the free form, offer its S₀ and keep the salt's K_sp estimated.
describe('bench solubility read by what it measures (production build)', () => {
  it('a pH 7.6 sulfonate-salt value reads "limits: free form" with its implied S₀', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await area(page, 'Bench data');
    const nav = page.getByRole('navigation', { name: 'Shortlisted candidates' });
    await nav.getByRole('button', { name: /tosylate/i }).click();
    const form = page.getByRole('form', { name: /New measurement for tosylate/ });
    await form.getByLabel(/^Solubility/).fill('0.13');
    await form.getByLabel('pH at equilibrium').fill('7.6');
    await form.getByLabel(/^Temperature/).fill('37');
    await form.getByRole('button', { name: 'Save measurement' }).click();
    await page.getByText(/Saved: solubility for tosylate/).waitFor();
    const table = page.getByRole('table', { name: /Measurements for tosylate/ });
    await table.getByText('limits: free form').waitFor({ timeout: 30_000 });
    await expect(table.textContent()).resolves.toMatch(/implies S₀ ≈ 0\.0[23]\d* mg\/mL/);
    await expect(table.getByRole('button', { name: 'Use as S₀' }).count()).resolves.toBe(1);
    expect(s.errors).toEqual([]);
  });
});
