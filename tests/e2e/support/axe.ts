import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';

/** axe-core's browser build, injected into the page under test (devDependency, no network). */
const AXE_SOURCE = readFileSync(
  fileURLToPath(new URL('../../../node_modules/axe-core/axe.min.js', import.meta.url)),
  'utf8',
);

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: string[];
}

/**
 * Run axe-core on the current page (WCAG 2.x A/AA rules and best practices) and return the violations
 * of the given impacts, each with the selectors of the offending nodes.
 */
export async function axeViolations(
  page: Page,
  impacts: string[] = ['serious', 'critical'],
): Promise<AxeViolation[]> {
  const present = await page.evaluate(
    () => typeof (window as unknown as { axe?: unknown }).axe !== 'undefined',
  );
  // Evaluated through the DevTools protocol, not as an inline <script>: the app's Content-Security-Policy
  // rightly refuses inline script, and the session fails any test that causes a violation.
  if (!present) await page.evaluate(AXE_SOURCE);
  const result = await page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: {
          run: (
            ctx: Document,
            opts: unknown,
          ) => Promise<{
            violations: {
              id: string;
              impact: string | null;
              help: string;
              nodes: { target: string[] }[];
            }[];
          }>;
        };
      }
    ).axe;
    const r = await axe.run(document, { resultTypes: ['violations'] });
    return r.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      nodes: v.nodes.map((n) => n.target.join(' ')),
    }));
  });
  return result.filter((v) => v.impact !== null && impacts.includes(v.impact));
}
