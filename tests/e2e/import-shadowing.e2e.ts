import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openSession, type Session } from './support/browser';
import { area } from './support/navigation';
import { inHouseIonPayload } from '../support/in-house-ion';

// Issue 13: a project file whose shared in-house ion used the bundled id `mesylate` (with pKa 11)
// changed the ranking of a project that was never touched, and the library listed two Mesylates.

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

/** The ranking table's rows as text, in rank order (waits until the screen has settled). */
async function rankingRows(page: Page): Promise<string[]> {
  await area(page, 'Ranking');
  const table = page.getByRole('table', { name: /Ranked candidates/ });
  await table.waitFor();
  await table.getByText('Mesylate').first().waitFor();
  return table.locator('tbody tr').allTextContents();
}

describe('an imported file cannot shadow a bundled counter-ion (Chromium, production build)', () => {
  it('imports a file with an in-house "mesylate" (pKa 11): the demo project ranks as before, one Mesylate', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    const before = await rankingRows(page);
    expect(before.some((row) => /mesylate/i.test(row))).toBe(true);

    await area(page, 'Projects');
    const panel = page.getByRole('region', { name: 'Project files' });
    await panel.waitFor();
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export to file' }).click(),
    ]);
    const { readFileSync } = await import('node:fs');
    const file = JSON.parse(readFileSync(await download.path(), 'utf8')) as {
      project: { name: string };
      customIons: unknown[];
    };
    file.project.name = 'Hostile import';
    file.customIons.push({
      id: 'mesylate',
      scope: 'shared',
      overridesIonId: null,
      ion: inHouseIonPayload('mesylate', 'Mesylate', 11),
      updatedAt: '2026-12-01T00:00:00.000Z',
    });
    await page.getByLabel('Import a project file').setInputFiles({
      name: 'hostile.saltsmith.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify(file)),
    });
    await page.getByRole('button', { name: 'Import as a new project' }).click();
    // The import opens the imported project; back in Projects it is listed beside the demo.
    await page
      .getByRole('button', { name: 'Import as a new project' })
      .waitFor({ state: 'detached' });
    await area(page, 'Projects');
    await page.getByRole('heading', { name: 'Hostile import', exact: true }).waitFor();

    // Back on the untouched demo project: the same ranking, row for row, and one Mesylate in the library.
    const demo = page.getByRole('button', { name: /^(Open|Go to compound:) Demorazine/ });
    await demo.click();
    await expect.poll(async () => (await rankingRows(page)).join('\n')).toBe(before.join('\n'));
    await area(page, 'Counter-ions');
    const table = page.getByRole('table', { name: 'Counter-ion library' });
    await table.waitFor();
    await page.getByLabel('Search counter-ions').fill('Mesylate');
    await expect
      .poll(() => table.locator('tbody tr').filter({ hasText: 'Mesylate' }).count())
      .toBe(1);
    expect(s.errors).toEqual([]);
  });
});
