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

// Issue 16 item 5 in the browser: the demo's Ranking says in one line what separates its shortlist
// and lists the free form, unranked, in the same table. The demo compound is fictional; nothing here
// compares with its invented numbers — only that the line and the row are there and say what they must.
describe('what separates the shortlist, and the free form read against it (production build)', () => {
  it('shows the separation line above the table and the free-form row in it for the demo', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await area(page, 'Ranking');
    const line = page.getByRole('region', { name: 'What separates this shortlist' });
    await line.waitFor({ timeout: 30_000 });
    await expect(line.textContent()).resolves.toMatch(
      /What separates the candidates: (The order rests on|No criterion separates)/,
    );
    await expect(line.textContent()).resolves.toMatch(/solubilities in water/);

    const table = page.getByRole('table', { name: /Ranked candidates/ });
    const freeRow = table.getByRole('row', { name: /free base \(no salt\)/ });
    await freeRow.waitFor();
    await expect(freeRow.textContent()).resolves.toMatch(/read against; not ranked/);
    await expect(table.getByRole('columnheader', { name: /per drug ion/ }).count()).resolves.toBe(
      1,
    );
    // The line comes before the table on the page.
    const [lineTop, tableTop] = await Promise.all([
      line.boundingBox().then((b) => b!.y),
      table.boundingBox().then((b) => b!.y),
    ]);
    expect(lineTop).toBeLessThan(tableTop);
    expect(s.errors).toEqual([]);
  });
});
