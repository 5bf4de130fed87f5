import { SALT_SOLUBILITY_MODEL, SALT_SOLUBILITY_SERIES, SALT_SOLUBILITY_VARIANTS } from '@/chem';
import { ParityPlot } from '@/components/charts/ParityPlot';

const f2 = (x: number | null) => (x === null || !Number.isFinite(x) ? '—' : x.toFixed(2));
const pct0 = (x: number | null) =>
  x === null || !Number.isFinite(x) ? '—' : `${Math.round(x * 100)} %`;

const VARIANT_WORDS: Record<string, string> = {
  pooled: 'one regression over all salts',
  'pooled+thermo': 'one regression + the ΔH_sol term',
  'within-series': 'within-series slopes (fixed effects)',
  'within-series+thermo': 'within-series slopes + the ΔH_sol term',
  'pooled+fusion': 'with the salt’s melting data (salts that have it)',
  'pooled-on-fusion-subset': 'without melting data, same salts',
};

/**
 * The salt-solubility model judged on drugs it never saw: every published series predicted by a
 * model fitted without that drug (leave-one-drug-out), beside the old common-practice anchor
 * (10² × S₀) on the same folds. The figures are the ones the estimates' ±1σ come from.
 */
export function SaltSolubilityCheck() {
  const shipped = SALT_SOLUBILITY_VARIANTS.find((v) => v.id === SALT_SOLUBILITY_MODEL.id)!;
  const series = SALT_SOLUBILITY_SERIES.filter((s) => s.salts.length >= 3);
  return (
    <section className="panel" aria-labelledby="salt-solubility-check-title">
      <h2 id="salt-solubility-check-title">
        Salt solubility in water: tested on drugs it never saw
      </h2>
      <p>
        The estimate of each salt’s own solubility (log₁₀ mol/L of drug) was fitted on{' '}
        {shipped.nSalts} published salts of {shipped.nDrugs} drugs and judged by leaving each drug
        out in turn: its salts are predicted by a model that never saw it. Leave-one-drug-out RMSE{' '}
        <strong>{f2(shipped.rmse)}</strong> log units (the ±1σ every estimate carries), against{' '}
        {f2(shipped.anchorRmse)} for the old anchor; mean Spearman ρ within a drug’s series{' '}
        <strong>{f2(shipped.meanSpearman)}</strong> (anchor {f2(shipped.anchorMeanSpearman)}); the
        least soluble salt is among the two lowest predicted in{' '}
        <strong>{pct0(shipped.leastSolubleHitRate)}</strong> of series (anchor{' '}
        {pct0(shipped.anchorLeastSolubleHitRate)}). The published record readable to us is thin —
        mostly pharmacopoeial statements, {series.length} series of three or more salts — so treat
        the ranking as a hint, not a verdict.
      </p>
      <div className="table-scroll">
        <table className="data-table">
          <caption className="sr-only">
            Leave-one-drug-out figures of each model variant, with the anchor on the same folds
          </caption>
          <thead>
            <tr>
              <th scope="col">Variant</th>
              <th scope="col">Salts</th>
              <th scope="col">RMSE (log₁₀)</th>
              <th scope="col">Anchor RMSE</th>
              <th scope="col">Mean ρ in series</th>
              <th scope="col">Anchor ρ</th>
              <th scope="col">Least soluble in lowest two</th>
              <th scope="col">Anchor</th>
            </tr>
          </thead>
          <tbody>
            {SALT_SOLUBILITY_VARIANTS.map((v) => (
              <tr key={v.id}>
                <th scope="row">
                  {VARIANT_WORDS[v.id] ?? v.id}
                  {v.id === SALT_SOLUBILITY_MODEL.id ? ' — in use' : ''}
                </th>
                <td>{v.nSalts}</td>
                <td>{f2(v.rmse)}</td>
                <td>{f2(v.anchorRmse)}</td>
                <td>{f2(v.meanSpearman)}</td>
                <td>{f2(v.anchorMeanSpearman)}</td>
                <td>{pct0(v.leastSolubleHitRate)}</td>
                <td>{pct0(v.anchorLeastSolubleHitRate)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="parity-grid">
        {series.map((s) => (
          <ParityPlot
            key={s.drugId}
            title={`${s.name}: ${s.salts.length} salts, ρ ${f2(s.spearman)} (anchor ${f2(s.anchorSpearman)})`}
            unit="log₁₀ mol/L"
            modelName="model"
            otherName="anchor"
            points={s.salts.map((x, i) => ({
              id: `${s.drugId}-${i}`,
              label: x.label,
              measured: x.measured ?? Number.NaN,
              predicted: x.predicted ?? Number.NaN,
              other: x.anchor ?? Number.NaN,
            }))}
          />
        ))}
      </div>
    </section>
  );
}
