import { sig } from '@/components/charts/chart-format';
import type { SaltWaterShown } from '../ranking-rows';

/**
 * The salt's own solubility in water: mg/mL as salt with its ±1σ range, est./meas. and where it
 * comes from (red when the salt cannot carry the dose in 250 mL); below, the same as free form and as log₁₀ mol/L of drug ± 1σ, and what drives it.
 */
export function SaltWaterCell({
  s,
  poorlySoluble,
}: {
  s: SaltWaterShown | null;
  poorlySoluble: boolean;
}) {
  if (!s) return <td className="muted">—</td>;
  return (
    <td className={poorlySoluble ? 'dose-bad' : undefined} title={s.basis}>
      {sig(s.value, 2)} <span className="unit">mg/mL</span>{' '}
      <span className={`origin origin-${s.origin}`}>
        {s.origin === 'measured' ? 'meas.' : 'est.'}
        <span className="sr-only"> ({s.basis})</span>
      </span>
      {s.range ? (
        <span className="range">
          ±1σ {sig(s.range[0], 2)}–{sig(s.range[1], 2)}
        </span>
      ) : null}
      <span className="muted small-note">
        {sig(s.freeFormMgPerMl, 2)} as free form · log₁₀ S{' '}
        {s.log10DrugM.toFixed(1).replace('-', '−')} ± {s.log10Sigma.toFixed(1)} · {s.originWord}
      </span>
      {s.drivers ? <span className="muted small-note">{s.drivers}</span> : null}
    </td>
  );
}
