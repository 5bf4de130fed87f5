import { CAUTION_LINES } from '@/components/Cautions';
import { EnergyLevelDiagram } from '@/components/charts/EnergyLevelDiagram';
import { PhSolubilityChart } from '@/components/charts/PhSolubilityChart';
import type { SheetModel } from '../sheet.types';
import { ORIGIN_MARK } from '../sheet-format';

/** The sheet's sections after the ranked tables: reasons, pictures, model check, notes, cautions. */

/** A percentage to one decimal, typographic minus. */
const pct = (x: number) => (Number.isFinite(x) ? x.toFixed(1).replace(/^-/, '\u2212') : '—');

/** Why each candidate sits where it does, in rank order (unranked ones marked). */
export function SheetReasons({ rows }: { rows: SheetModel['rows'] }) {
  if (!rows.some((r) => r.reasons.length)) return null;
  return (
    <div className="sheet-reasons-block">
      <h3>Why each candidate sits where it does</h3>
      <ol className="sheet-reasons">
        {rows.map((r) => (
          <li
            key={r.id}
            value={r.rank ?? undefined}
            className={r.rank === null ? 'unranked' : undefined}
          >
            <strong>{r.label}</strong>
            {r.rank === null ? ' (not ranked)' : ''}
            {r.reasons.length ? (
              <ul>
                {r.reasons.map((x) => (
                  <li key={x}>{x}</li>
                ))}
              </ul>
            ) : null}
          </li>
        ))}
      </ol>
    </div>
  );
}

/** What the origin marks and "±" mean, and how to read the enthalpies. */
export function SheetLegend() {
  return (
    <p className="sheet-legend">
      Marks:{' '}
      {Object.values(ORIGIN_MARK)
        .map((o) => `“${o.mark}” ${o.words}`)
        .join(', ')}
      . “±” is one standard uncertainty (1σ). Lattice enthalpy is the dissociation enthalpy (&gt;
      0); hydration enthalpies are negative; ΔH_sol = ΔH_L + Σ ΔH_hyd, a small difference of large
      numbers — compare candidates with each other rather than trusting one value alone.
    </p>
  );
}

/** Solubility against pH for the free form and the best-ranked salts. */
export function SheetSolubility({ solubility }: { solubility: SheetModel['solubility'] }) {
  if (!solubility || !solubility.series.length) return null;
  return (
    <section className="sheet-block sheet-figure" aria-labelledby="sheet-solubility">
      <h2 id="sheet-solubility">Solubility against pH</h2>
      <PhSolubilityChart
        series={solubility.series}
        doseLineMgPerMl={solubility.doseLineMgPerMl}
        width={640}
        height={320}
      />
    </section>
  );
}

/** One energy-level diagram of the dissolution cycle per candidate. */
export function SheetEnergy({ cycles }: { cycles: SheetModel['energyCycles'] }) {
  if (!cycles.length) return null;
  return (
    <section className="sheet-block" aria-labelledby="sheet-energy">
      <h2 id="sheet-energy">Enthalpy of dissolving, per candidate</h2>
      <div className="sheet-energy-grid">
        {cycles.map((c) => (
          <div className="sheet-figure" key={c.saltLabel}>
            <h3>{c.saltLabel}</h3>
            <EnergyLevelDiagram cycle={c} width={350} height={250} />
          </div>
        ))}
      </div>
    </section>
  );
}

/** How far to trust the models: each model's errors against published data. */
export function SheetConfidence({ confidence }: { confidence: SheetModel['confidence'] }) {
  return (
    <section className="sheet-block" aria-labelledby="sheet-confidence">
      <h2 id="sheet-confidence">How far to trust the models</h2>
      {confidence.length ? (
        <table className="sheet-confidence">
          <thead>
            <tr>
              <th scope="col">Model, against published data</th>
              <th scope="col">n</th>
              <th scope="col">Mean |error| (%)</th>
              <th scope="col">Largest |error| (%)</th>
              <th scope="col">Signed bias (%)</th>
            </tr>
          </thead>
          <tbody>
            {confidence.map((m) => (
              <tr key={m.label}>
                <th scope="row">{m.label}</th>
                <td className="num">{m.n}</td>
                <td className="num">{pct(m.meanAbsPercentError)}</td>
                <td className="num">{pct(m.maxAbsPercentError)}</td>
                <td className="num">{pct(m.signedBiasPercent)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p>No model check is available in this build.</p>
      )}
    </section>
  );
}

/** The screen's assumptions and the sheet's notes. */
export function SheetNotes({ notes }: { notes: string[] }) {
  if (!notes.length) return null;
  return (
    <section className="sheet-block" aria-labelledby="sheet-notes">
      <h2 id="sheet-notes">Assumptions and notes</h2>
      <ul>
        {notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
    </section>
  );
}

/** The cautions in full, from the one source of cautions. */
export function SheetCautions() {
  return (
    <section
      className="sheet-block sheet-cautions"
      aria-labelledby="sheet-cautions-title"
      data-testid="sheet-cautions"
    >
      <h2 id="sheet-cautions-title">Before you act on this ranking</h2>
      <ul>
        {CAUTION_LINES.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
    </section>
  );
}
