import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

// Results being recomputed (Measure next, robustness) keep their text at full contrast: WCAG 2.x
// success criterion 1.4.3 (contrast minimum 4.5:1) applies to text whatever the state. Fading the
// block to opacity 0.6 put the muted text below it, and axe-core flagged it in the browser test
// (tests/e2e/excipients-media.e2e.ts) whenever a run was still going when it looked.
describe('the "being recomputed" mark', () => {
  const css = readFileSync('src/features/ranking/ranking.css', 'utf8');
  const rule = /\n\.stale\s*\{([^}]*)\}/.exec(css)?.[1];

  it('exists and does not fade the text', () => {
    expect(rule).toBeDefined();
    expect(rule).not.toMatch(/opacity|filter|color\s*:/);
  });
});
