import { useMemo, useState } from 'react';
import { validationReport, type ModelValidation } from '@/chem';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import { SaltSolubilityCheck } from './SaltSolubilityCheck';
import { EngineCheck } from './EngineCheck';
import '../model-check.css';

const pct = (x: number) => `${x.toFixed(1)} %`;
const signedPct = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(1)} %`;

/** Extra figures the ΔH_sol validation carries (kJ/mol errors and ±2σ coverage). */
function solutionExtras(m: ModelValidation): string | null {
  const s = m as ModelValidation & {
    meanAbsErrorKJ?: number;
    maxAbsErrorKJ?: number;
    coverage2Sigma?: number;
  };
  if (typeof s.meanAbsErrorKJ !== 'number') return null;
  return `mean |error| ${s.meanAbsErrorKJ.toFixed(1)} kJ/mol, max ${s.maxAbsErrorKJ?.toFixed(1)} kJ/mol; reference inside the ±2σ band for ${((s.coverage2Sigma ?? 0) * 100).toFixed(0)} % of salts`;
}

/**
 * Model check: every thermochemistry model against the published reference data bundled with the
 * workbench (the engine's validation report), as a table and a bar chart of the mean and largest
 * absolute errors. Shows where the estimates deserve trust and where they do not.
 */
export function ModelCheckArea() {
  const report = useMemo(() => {
    try {
      return { ok: true as const, rows: validationReport() };
    } catch (err) {
      return { ok: false as const, error: String(err) };
    }
  }, []);
  const [open, setOpen] = useState<string | null>(null);

  if (!report.ok) {
    return (
      <section className="panel">
        <h2>Model check</h2>
        <p role="alert">The validation report could not be computed: {report.error}</p>
      </section>
    );
  }
  const models = report.rows;
  const key = (m: ModelValidation) => `${m.model}/${m.group}`;
  // The chart shows each model once, on its widest reference set; the table below has every set.
  const charted = models.filter(
    (m) => m.group === 'all' || !models.some((o) => o.model === m.model && o.group === 'all'),
  );
  const shortLabel = (m: ModelValidation) =>
    `${m.label.split(' (')[0]}${m.group === 'all' ? '' : ` · ${m.group}`}`;
  return (
    <div className="confidence-area">
      <h2 id="confidence-title">Model check</h2>
      <SaltSolubilityCheck />
      <details className="panel lattice-models">
        <summary>
          Thermochemistry models (lattice, hydration, ΔH<sub>sol</sub>) against published values
        </summary>
        <section aria-labelledby="confidence-chart-title">
          <h3 id="confidence-chart-title">Errors per model</h3>
          <p>
            Each model run on the salts and ions whose values are published, with the same code and
            data the ranking uses. Errors are (estimate − reference) / reference; for ΔH
            <sub>sol</sub>, relative to the lattice enthalpy, because ΔH<sub>sol</sub> itself is a
            small difference of two large numbers and sits near zero — its absolute error in kJ/mol
            is the figure to read.
          </p>
          <WhiskerBars
            title="Mean and largest absolute error per model"
            caption={`Bars: mean absolute % error over n reference values; diamonds: the largest single error. ${charted.length} models, each on its widest reference set (${models.length} model/set pairs in the table). ${charted
              .map(
                (m) =>
                  `${shortLabel(m)}: ${pct(m.meanAbsPercentError)} mean, ${pct(m.maxAbsPercentError)} max, n ${m.n}`,
              )
              .join('; ')}.`}
            unit="% error"
            domain={[0, Math.min(60, Math.max(5, ...charted.map((m) => m.maxAbsPercentError)))]}
            labelWidth={300}
            format={(x) => x.toFixed(1)}
            rows={charted.map((m) => ({
              id: key(m),
              label: shortLabel(m),
              value: m.meanAbsPercentError,
              marker: {
                value: m.maxAbsPercentError,
                label: `largest error ${pct(m.maxAbsPercentError)}`,
              },
              note: `(n ${m.n})`,
            }))}
            width={760}
          />
        </section>
        <section aria-labelledby="confidence-table-title">
          <h3 id="confidence-table-title">Figures</h3>
          <div className="table-scroll">
            <table className="data-table">
              <caption className="sr-only">
                Validation of each model against published reference values
              </caption>
              <thead>
                <tr>
                  <th scope="col">Model</th>
                  <th scope="col">Reference set</th>
                  <th scope="col">n</th>
                  <th scope="col">Mean |error|</th>
                  <th scope="col">Max |error|</th>
                  <th scope="col">Signed bias</th>
                  <th scope="col">RMS</th>
                  <th scope="col">
                    <span className="sr-only">Details</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {models.map((m, i) => {
                  const k = key(m);
                  const extra = solutionExtras(m);
                  const sameAsAbove = i > 0 && models[i - 1]!.label === m.label;
                  return [
                    <tr key={k} className={sameAsAbove ? 'continued' : 'first-of-model'}>
                      <th scope="row">
                        {sameAsAbove ? <span className="sr-only">{m.label}</span> : m.label}
                        {extra ? <div className="muted small-note">{extra}</div> : null}
                      </th>
                      <td>{m.group}</td>
                      <td>{m.n}</td>
                      <td>{pct(m.meanAbsPercentError)}</td>
                      <td>{pct(m.maxAbsPercentError)}</td>
                      <td>{signedPct(m.signedBiasPercent)}</td>
                      <td>{pct(m.rmsPercentError)}</td>
                      <td>
                        <button
                          type="button"
                          className="small"
                          aria-expanded={open === k}
                          aria-controls={`rows-${k}`}
                          onClick={() => setOpen(open === k ? null : k)}
                        >
                          {open === k ? 'Hide' : 'Show'} {m.n} values
                          <span className="sr-only">
                            {' '}
                            for {m.label}, {m.group}
                          </span>
                        </button>
                      </td>
                    </tr>,
                    open === k ? (
                      <tr key={`${k}-rows`} id={`rows-${k}`}>
                        <td colSpan={8}>
                          <table className="data-table inner">
                            <caption className="sr-only">Reference values for {m.label}</caption>
                            <thead>
                              <tr>
                                <th scope="col">Salt or ion</th>
                                <th scope="col">Reference (kJ/mol)</th>
                                <th scope="col">Estimate (kJ/mol)</th>
                                <th scope="col">Error</th>
                                <th scope="col">Source</th>
                              </tr>
                            </thead>
                            <tbody>
                              {m.rows.map((r) => (
                                <tr key={r.id}>
                                  <th scope="row">{r.label}</th>
                                  <td>{r.referenceKJ.toFixed(1)}</td>
                                  <td>{r.estimateKJ.toFixed(1)}</td>
                                  <td>{signedPct(r.errorPercent)}</td>
                                  <td className="source">{r.source}</td>
                                </tr>
                              ))}
                            </tbody>
                          </table>
                        </td>
                      </tr>
                    ) : null,
                  ];
                })}
              </tbody>
            </table>
          </div>
          <p className="convention">
            Lattice enthalpies are dissociation enthalpies (ΔH<sub>L</sub> &gt; 0); hydration
            enthalpies are negative on the conventional absolute scale. Sources are named per value;
            the engine’s documentation gives each model’s constants and their origin.
          </p>
        </section>
      </details>
      <EngineCheck />
    </div>
  );
}
