import { useState } from 'react';
import type { ModelValidation } from '@/chem';
import { WhiskerBars } from '@/components/charts/WhiskerBars';

const pct = (x: number) => `${x.toFixed(1)} %`;
const signedPct = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(1)} %`;
const keyOf = (m: ModelValidation) => `${m.model}/${m.group}`;
const shortLabel = (m: ModelValidation) =>
  `${m.label.split(' (')[0]}${m.group === 'all' ? '' : ` · ${m.group}`}`;

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
 * The thermochemistry models (lattice, hydration, ΔH_sol) against published values, folded under a
 * disclosure after the salt-solubility evidence: the chart of errors per model, then every
 * model/reference-set pair with its values on demand.
 */
export function LatticeModelCheck({ models }: { models: ModelValidation[] }) {
  return (
    <details className="panel lattice-models">
      <summary>
        Thermochemistry models (lattice, hydration, ΔH<sub>sol</sub>) against published values
      </summary>
      <ModelErrorsChart models={models} />
      <section aria-labelledby="confidence-table-title">
        <h3 id="confidence-table-title">Figures</h3>
        <ModelFiguresTable models={models} />
        <p className="convention">
          Lattice enthalpies are dissociation enthalpies (ΔH<sub>L</sub> &gt; 0); hydration
          enthalpies are negative on the conventional absolute scale. Sources are named per value;
          the engine’s documentation gives each model’s constants and their origin.
        </p>
      </section>
    </details>
  );
}

/** The bar chart: each model once, on its widest reference set (the table has every set). */
function ModelErrorsChart({ models }: { models: ModelValidation[] }) {
  const charted = models.filter(
    (m) => m.group === 'all' || !models.some((o) => o.model === m.model && o.group === 'all'),
  );
  const figures = charted
    .map(
      (m) =>
        `${shortLabel(m)}: ${pct(m.meanAbsPercentError)} mean, ${pct(m.maxAbsPercentError)} max, n ${m.n}`,
    )
    .join('; ');
  return (
    <section aria-labelledby="confidence-chart-title">
      <h3 id="confidence-chart-title">Errors per model</h3>
      <p>
        Each model run on the salts and ions whose values are published, with the same code and data
        the ranking uses. Errors are (estimate − reference) / reference; for ΔH<sub>sol</sub>,
        relative to the lattice enthalpy, because ΔH<sub>sol</sub> itself is a small difference of
        two large numbers and sits near zero — its absolute error in kJ/mol is the figure to read.
      </p>
      <WhiskerBars
        title="Mean and largest absolute error per model"
        caption={`Bars: mean absolute % error over n reference values; diamonds: the largest single error. ${charted.length} models, each on its widest reference set (${models.length} model/set pairs in the table). ${figures}.`}
        unit="% error"
        domain={[0, Math.min(60, Math.max(5, ...charted.map((m) => m.maxAbsPercentError)))]}
        labelWidth={300}
        format={(x) => x.toFixed(1)}
        rows={charted.map((m) => ({
          id: keyOf(m),
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
  );
}

/** Every model/reference-set pair with its figures; one pair's values open at a time. */
function ModelFiguresTable({ models }: { models: ModelValidation[] }) {
  const [open, setOpen] = useState<string | null>(null);
  return (
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
            const k = keyOf(m);
            const isOpen = open === k;
            return [
              <ModelFigureRow
                key={k}
                m={m}
                sameAsAbove={i > 0 && models[i - 1]!.label === m.label}
                isOpen={isOpen}
                onToggle={() => setOpen(isOpen ? null : k)}
              />,
              isOpen ? <ReferenceValuesRow key={`${k}-rows`} m={m} /> : null,
            ];
          })}
        </tbody>
      </table>
    </div>
  );
}

function ModelFigureRow({
  m,
  sameAsAbove,
  isOpen,
  onToggle,
}: {
  m: ModelValidation;
  sameAsAbove: boolean;
  isOpen: boolean;
  onToggle: () => void;
}) {
  const extra = solutionExtras(m);
  return (
    <tr className={sameAsAbove ? 'continued' : 'first-of-model'}>
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
          aria-expanded={isOpen}
          aria-controls={`rows-${keyOf(m)}`}
          onClick={onToggle}
        >
          {isOpen ? 'Hide' : 'Show'} {m.n} values
          <span className="sr-only">
            {' '}
            for {m.label}, {m.group}
          </span>
        </button>
      </td>
    </tr>
  );
}

/** One model's reference values, each with its source, in a row under its figures. */
function ReferenceValuesRow({ m }: { m: ModelValidation }) {
  return (
    <tr id={`rows-${keyOf(m)}`}>
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
  );
}
