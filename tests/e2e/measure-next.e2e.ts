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

// Issue 17 item 1 / issue 20 item 3: the "Measure next" list in the Ranking area of the demo project
// (Demorazine is fictional; nothing here compares with its invented numbers). The table comes first;
// the list is computed in its own worker and appears afterwards, with its time printed.
describe('Measure next in the browser (production build)', () => {
  it('shows the list for the demo project after the table, computed in a worker', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await area(page, 'Ranking');
    const table = page.getByRole('table', { name: /Ranked candidates/ });
    await table.waitFor({ timeout: 30_000 });
    const panel = page.getByRole('region', { name: 'Measure next' });
    await panel.getByText(/the doubt about first place is \d+ %/).waitFor({ timeout: 30_000 });
    const text = (await panel.textContent()) ?? '';
    // Either a ranked list of measurements or the words that none settles a measurable share.
    expect(text).toMatch(
      /would settle \d+ % of the doubt about first place|No single measurement|not in doubt/,
    );
    const ms = Number(/computed in (\d+) ms/.exec(text)?.[1]);
    expect(Number.isFinite(ms)).toBe(true);
    console.log(`measure next (demo project): ${text.replace(/\s+/g, ' ')}`);
    expect(s.errors).toEqual([]);
  });
});
