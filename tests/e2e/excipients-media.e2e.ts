import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';
import { area } from './support/navigation';
import { axeViolations } from './support/axe';

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

// The demo compound is fictional; nothing here compares with its invented numbers. The demo base's
// salts all have pH_max below its pKa, far below magnesium stearate's published slurry pH (8–10), so
// the grid must flag at least one of them as likely to convert.
describe('excipients and biorelevant media in the browser (production build)', () => {
  it('choosing magnesium stearate flags a salt in the grid, and FaSSIF is one click', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await area(page, 'Ranking');
    const panel = page.locator('section.excipient-matrix');
    await panel.waitFor({ timeout: 30_000 });
    await panel.getByRole('checkbox', { name: /Magnesium stearate/ }).check();
    const grid = panel.getByRole('table', { name: /Conversion risk of each salt/ });
    await grid.waitFor({ timeout: 30_000 });
    let text = '';
    for (let i = 0; i < 60 && !/conversion likely/.test(text); i++) {
      text = (await grid.textContent()) ?? '';
      if (!/conversion likely/.test(text)) await page.waitForTimeout(500);
    }
    expect(text).toMatch(/conversion likely/);
    await expect(panel.textContent()).resolves.toMatch(/Conversion likely: .*Magnesium stearate/);
    // The grid and the presets pass axe-core's WCAG 2.x rules (no serious or critical violation).
    expect(await axeViolations(page)).toEqual([]);

    await page.getByRole('button', { name: 'Add FaSSIF (pH 6.5)' }).click();
    const media = page.getByRole('table', { name: 'Solubility in your media' });
    await media.waitFor({ timeout: 30_000 });
    await expect(media.textContent()).resolves.toMatch(/FaSSIF/);
    await expect(
      page
        .getByText(/Not modelled: solubilisation by the bile salt/)
        .first()
        .isVisible(),
    ).resolves.toBe(true);
    expect(s.errors).toEqual([]);
  });
});
