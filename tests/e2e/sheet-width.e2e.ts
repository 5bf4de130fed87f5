import { afterEach, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { BASE_URL, openSession, type Session } from './support/browser';

/**
 * The comparison sheet on screen keeps every table inside the page it draws (issue 19: the tables
 * ran past the page edge; print was fine). Measured in Chromium at a laptop width (1280 px) and at
 * 1024 px, on the fictional demo project with its six salts.
 */

interface TableFit {
  caption: string;
  /** How far the table's right edge passes the sheet's content edge, px (≤ 0: inside). */
  overflowPx: number;
  /** The table's own scroll overflow (content wider than its box), px. */
  innerOverflowPx: number;
}

/** Every table in the sheet, with how far it passes the sheet's content box on the right. */
async function tableFits(page: Page): Promise<{ sheetRight: number; fits: TableFit[] }> {
  return page.evaluate(() => {
    const sheet = document.querySelector('.comparison-sheet')!;
    const box = sheet.getBoundingClientRect();
    const padRight = parseFloat(getComputedStyle(sheet).paddingRight);
    const contentRight = box.right - padRight;
    const fits = Array.from(sheet.querySelectorAll('table')).map((t) => {
      const r = t.getBoundingClientRect();
      return {
        caption:
          t.caption?.textContent?.trim() ||
          t.closest('section')?.querySelector('h2')?.textContent?.trim() ||
          t.className,
        overflowPx: Math.round((r.right - contentRight) * 10) / 10,
        innerOverflowPx: t.scrollWidth - t.clientWidth,
      };
    });
    return { sheetRight: box.right, fits };
  });
}

async function openDemoSheet(width: number): Promise<{ s: Session; page: Page }> {
  const s = await openSession({ viewport: { width, height: 900 } });
  const { page } = s;
  await page.goto(BASE_URL);
  await page.getByRole('navigation', { name: 'Workbench areas' }).waitFor();
  await page.getByRole('button', { name: 'Comparison sheet' }).click();
  await page.locator('.comparison-sheet h1').waitFor({ timeout: 30_000 });
  await page.getByRole('table', { name: /^Salt formation/ }).waitFor();
  // The demo's six salts are in the ranked tables before anything is measured.
  await page.waitForFunction(
    () => document.querySelectorAll('.sheet-ranking-formation tbody tr').length >= 6,
    undefined,
    { timeout: 30_000 },
  );
  return { s, page };
}

let session: Session | null = null;
afterEach(async () => {
  await session?.close();
  session = null;
});

describe('the comparison sheet fits its page on screen', () => {
  for (const width of [1024, 1280]) {
    it(`keeps every table inside the sheet at ${width} px`, async () => {
      const { s, page } = await openDemoSheet(width);
      session = s;
      const { sheetRight, fits } = await tableFits(page);
      // The page itself fits the window (no horizontal scroll of the sheet).
      expect(sheetRight).toBeLessThanOrEqual(width);
      expect(fits.length).toBeGreaterThanOrEqual(6);
      // Each table named with how far it passes the sheet's content edge: none may.
      const past = fits
        .filter((f) => f.overflowPx > 0.5 || f.innerOverflowPx > 0)
        .map(
          (f) => `${f.caption}: ${f.overflowPx} px past the edge, ${f.innerOverflowPx} px inside`,
        );
      expect(past).toEqual([]);
      expect(s.errors).toEqual([]);
    });
  }
});
