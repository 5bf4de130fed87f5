import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';
import { axeViolations } from './support/axe';

/*
 * Accessibility of every area with axe-core (Deque's rules for WCAG 2.x): no serious or critical
 * violations, at 1280×800 and on a 1024-wide tablet; every area reachable from the keyboard.
 */

const AREAS = [
  { id: 'compound', ready: 'Demorazine is fictional' },
  { id: 'counter-ions', ready: /on this project’s shortlist/ },
  { id: 'ranking', ready: /candidates ranked/ },
  { id: 'energetics', ready: 'Sign convention.' },
  { id: 'bench', ready: 'Recorded for' },
  { id: 'salt-screen', ready: /wells on a 24-well plate/ },
  { id: 'model-check', ready: /tested on drugs it never saw/ },
  { id: 'projects', ready: 'Start a project' },
] as const;

for (const viewport of [
  { width: 1280, height: 800 },
  { width: 1024, height: 768 },
]) {
  describe(`axe on each area at ${viewport.width}×${viewport.height}`, () => {
    let s: Session;
    beforeAll(async () => {
      s = await openSession({ viewport });
      await s.page.goto(BASE_URL);
      await s.page.getByText('Demorazine is fictional').waitFor();
    });
    afterAll(async () => {
      await s.close();
    });

    for (const a of AREAS) {
      it(`${a.id}: no serious or critical violations, no horizontal page scroll`, async () => {
        const { page } = s;
        await page.goto(`${BASE_URL}#/${a.id}`);
        await page.reload();
        await page.getByText(a.ready).first().waitFor({ timeout: 30_000 });
        const violations = await axeViolations(page);
        expect(violations, JSON.stringify(violations, null, 1)).toEqual([]);
        const overflow = await page.evaluate(
          () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
        );
        expect(overflow).toBeLessThanOrEqual(0);
      }, 60_000);
    }
  });
}

describe('keyboard', () => {
  it('reaches every area and the weight sliders with Tab and Enter alone', async () => {
    const s = await openSession();
    try {
      const { page } = s;
      await page.goto(BASE_URL);
      await page.getByText('Demorazine is fictional').waitFor();
      // Tab from the top of the page to the Ranking link and follow it with Enter.
      let found = false;
      for (let i = 0; i < 30 && !found; i++) {
        await page.keyboard.press('Tab');
        found = await page.evaluate(() => document.activeElement?.textContent === 'Ranking');
      }
      expect(found).toBe(true);
      await page.keyboard.press('Enter');
      await page.getByText(/candidates ranked/).waitFor({ timeout: 30_000 });
      // A slider moves with the arrow keys.
      const slider = page.getByLabel('Tablet mass', { exact: true });
      await slider.focus();
      const before = Number(await slider.inputValue());
      await page.keyboard.press('ArrowRight');
      expect(Number(await slider.inputValue())).toBeCloseTo(before + 0.1, 6);
      expect(s.errors).toEqual([]);
    } finally {
      await s.close();
    }
  }, 60_000);
});
