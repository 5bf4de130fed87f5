import { formatWithUncertainty } from '@/chem';
import type { DisplayRow } from '../ranking-rows';
import { Origin } from './RankingCells';

/**
 * ΔH_sol per drug ion (kJ/mol): value ± 1σ at the precision its 1σ allows, or "not informative" in
 * words (no colour, no number to read) when its 1σ exceeds it or it lies outside the plausible range
 * (the core's verdict, solution-enthalpy-shown.ts), with the reason on hover and for screen readers.
 */
export function SolutionEnthalpyCell({ h }: { h: DisplayRow['solutionEnthalpy'] }) {
  if (!h) return <td className="muted">—</td>;
  if (h.notInformative) {
    return (
      <td className="muted not-informative" title={h.notInformative}>
        not informative
        <span className="sr-only"> ({h.notInformative})</span>
      </td>
    );
  }
  return (
    <td>
      {h.sigma !== undefined
        ? formatWithUncertainty(h.value, h.sigma)
        : h.value.toFixed(0).replace(/^-/, '−')}{' '}
      <Origin n={h} />
    </td>
  );
}
