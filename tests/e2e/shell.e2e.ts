import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BASE_URL, openSession, type Session } from './support/browser';

let s: Session;
beforeEach(async () => {
  s = await openSession();
});
afterEach(async () => {
  await s.close();
});

describe('workbench shell in Chromium (production build)', () => {
  it('opens the demo project, keeps a compound edit across a reload, logs no errors', async () => {
    const { page } = s;
    await page.goto(BASE_URL);
    await page.getByText('Demorazine is fictional').waitFor();
    await expect(page.getByText('Engine check', { exact: false }).count()).resolves.toBe(0);

    const name = page.getByLabel('Name', { exact: true });
    await name.fill('Compound BX-17');
    await page.getByText('All changes saved').waitFor();
    await page.reload();
    await page.getByText('Demorazine is fictional').waitFor();
    await expect(page.getByLabel('Name', { exact: true }).inputValue()).resolves.toBe(
      'Compound BX-17',
    );
    expect(s.errors).toEqual([]);
  });
});
