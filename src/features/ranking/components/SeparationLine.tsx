import { memo } from 'react';
import type { SeparationSummary } from '@/chem';

/**
 * One line above the ranking table: which criteria separate this shortlist beyond their uncertainty
 * and which do not (the core's separationSummary; the statistic is defined in DEVELOPERS.md), with
 * the details folded below it.
 */
export const SeparationLine = memo(function SeparationLineView({
  summary,
}: {
  summary: SeparationSummary | null;
}) {
  if (!summary) return null;
  return (
    <section className="separation-line" aria-label="What separates this shortlist">
      <p>
        <strong>What separates the candidates:</strong> {summary.headline}
      </p>
      {summary.details.length ? (
        <details>
          <summary>How this is judged</summary>
          <ul>
            {summary.details.map((d) => (
              <li key={d}>{d}</li>
            ))}
            <li>
              A criterion separates when its spread across the candidates is more than twice its
              pooled 1σ; weights and uncertainties as in the table.
            </li>
          </ul>
        </details>
      ) : null}
    </section>
  );
});
