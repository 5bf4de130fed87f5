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

// Issue 10: every unmeasured salt used to sit on one anchor (10² × S₀), so the salts' plateaus on the
// pH–solubility chart coincided. The salt-solubility model now gives each counter-ion its own
// estimate. The demo compound is fictional; nothing here compares with its invented numbers — only
// that the candidates differ and that the table says where each number comes from.
describe('the salt’s own solubility in the browser (production build)', () => {
  it('the pH–solubility chart shows different salt plateaus and the table shows each salt’s water solubility with its origin', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await area(page, 'Ranking');
    const chart = page.getByRole('img', {
      name: /^Solubility \(free-form equivalents\) of .* and its salts/,
    });
    await chart.waitFor({ timeout: 30_000 });
    // The chart first draws the free form, then the salts once the screen has settled: wait for them.
    let plateaus: number[] = [];
    for (let i = 0; i < 60 && plateaus.length < 2; i++) {
      const label = (await chart.getAttribute('aria-label')) ?? '';
      plateaus = [...label.matchAll(/highest ([\d.eE+-]+) mg\/mL/g)].map((m) => Number(m[1]));
      if (plateaus.length < 2) await page.waitForTimeout(500);
    }
    expect(plateaus.length).toBeGreaterThanOrEqual(2);
    expect(new Set(plateaus.map((x) => x.toPrecision(2))).size).toBeGreaterThanOrEqual(2);

    const table = page.getByRole('table', { name: /Ranked candidates/ });
    await expect(table.textContent()).resolves.toMatch(/salt in water/i);
    expect(s.errors).toEqual([]);
  });
});
