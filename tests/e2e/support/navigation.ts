import type { Page } from 'playwright-core';

/** Open one of the workbench's areas by its label in the area bar. */
export async function area(page: Page, name: string): Promise<void> {
  await page
    .getByRole('navigation', { name: 'Workbench areas' })
    .getByRole('link', { name, exact: true })
    .click();
}
