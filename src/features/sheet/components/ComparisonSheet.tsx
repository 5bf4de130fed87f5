import { CAUTION_LINES } from '@/components/Cautions';
import { EnergyLevelDiagram } from '@/components/charts/EnergyLevelDiagram';
import { PhSolubilityChart } from '@/components/charts/PhSolubilityChart';
import { SheetExcipients } from './SheetExcipients';
import type { SheetModel } from '../sheet.types';
import { ORIGIN_MARK } from '../sheet-format';
import { GROUPS, RankedTable, SettingsTable } from './SheetTables';
import '../sheet.css';

/** A percentage to one decimal, typographic minus. */
const pct = (x: number) => (Number.isFinite(x) ? x.toFixed(1).replace(/^-/, '\u2212') : '—');

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeStyle: 'short' });

/**
 * The comparison sheet for a formulation meeting: compound, date and version, every setting and
 * weight, the ranked table (units in headings, ±1σ uncertainties, origin marks, flags and reasons),
 * the pH–solubility and energy pictures, the model-confidence summary and the cautions. Laid out for
 * the screen and, through sheet.css's print rules, for A4 or Letter paper. All text from the user
 * (names, notes) is rendered as text, never as markup.
 */
export function ComparisonSheet({ model }: { model: SheetModel }) {
  const made = new Date(model.generatedAt);
  return (
    <article className="comparison-sheet" aria-labelledby="sheet-title">
      <header className="sheet-head">
        <p className="sheet-kind">Saltsmith · salt comparison sheet</p>
        <h1 id="sheet-title" data-testid="sheet-compound">
          {model.compound.name}
        </h1>
        <p className="sheet-meta">
          Project <strong>{model.projectName}</strong> · made{' '}
          {Number.isNaN(made.getTime()) ? model.generatedAt : dateFormat.format(made)} · Saltsmith{' '}
          {model.appVersion}
        </p>
      </header>

      <aside className="sheet-caution" aria-label="Cautions">
        <strong>Screening estimates only.</strong> {CAUTION_LINES[0]} Experiments, the regulatory
        guidance in force and your lab’s safety rules decide. See the full cautions at the end of
        this sheet.
      </aside>

      <section className="sheet-block sheet-inputs" aria-label="Compound and settings">
        <SettingsTable caption="Compound" items={model.compound.facts} />
        <SettingsTable caption="Screening settings" items={model.settings} />
        <SettingsTable caption="Ranking weights" items={model.weights} />
      </section>

      <section className="sheet-block" aria-labelledby="sheet-ranking">
        <h2 id="sheet-ranking">Ranked candidates</h2>
        {model.separation ? (
          <div className="sheet-separation">
            <p>
              <strong>What separates the candidates:</strong> {model.separation.headline}
            </p>
            <ul>
              {model.separation.details.map((d) => (
                <li key={d}>{d}</li>
              ))}
            </ul>
          </div>
        ) : null}
        {model.freeForm ? (
          <p className="sheet-note">
            The first row is the free form itself, in the same columns: not ranked, read each salt
            against it.
          </p>
        ) : null}
        {model.rows.length === 0 ? (
          <p>No candidates are shortlisted in this project.</p>
        ) : (
          GROUPS.map((g) => (
            <RankedTable
              key={g.id}
              model={model}
              group={g.id}
              caption={g.caption}
              withFlags={g.id === 'formation'}
            />
          ))
        )}
        {model.rows.some((r) => r.reasons.length) ? (
          <div className="sheet-reasons-block">
            <h3>Why each candidate sits where it does</h3>
            <ol className="sheet-reasons">
              {model.rows.map((r) => (
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
        ) : null}
        <p className="sheet-legend">
          Marks:{' '}
          {Object.values(ORIGIN_MARK)
            .map((o) => `“${o.mark}” ${o.words}`)
            .join(', ')}
          . “±” is one standard uncertainty (1σ). Lattice enthalpy is the dissociation enthalpy
          (&gt; 0); hydration enthalpies are negative; ΔH_sol = ΔH_L + Σ ΔH_hyd, a small difference
          of large numbers — compare candidates with each other rather than trusting one value
          alone.
        </p>
      </section>

      {model.solubility && model.solubility.series.length ? (
        <section className="sheet-block sheet-figure" aria-labelledby="sheet-solubility">
          <h2 id="sheet-solubility">Solubility against pH</h2>
          <PhSolubilityChart
            series={model.solubility.series}
            doseLineMgPerMl={model.solubility.doseLineMgPerMl}
            width={640}
            height={320}
          />
        </section>
      ) : null}

      {model.excipientMatrix ? <SheetExcipients matrix={model.excipientMatrix} /> : null}

      {model.energyCycles.length ? (
        <section className="sheet-block" aria-labelledby="sheet-energy">
          <h2 id="sheet-energy">Enthalpy of dissolving, per candidate</h2>
          <div className="sheet-energy-grid">
            {model.energyCycles.map((c) => (
              <div className="sheet-figure" key={c.saltLabel}>
                <h3>{c.saltLabel}</h3>
                <EnergyLevelDiagram cycle={c} width={350} height={250} />
              </div>
            ))}
          </div>
        </section>
      ) : null}

      <section className="sheet-block" aria-labelledby="sheet-confidence">
        <h2 id="sheet-confidence">How far to trust the models</h2>
        {model.confidence.length ? (
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
              {model.confidence.map((m) => (
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

      {model.notes.length ? (
        <section className="sheet-block" aria-labelledby="sheet-notes">
          <h2 id="sheet-notes">Assumptions and notes</h2>
          <ul>
            {model.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </section>
      ) : null}

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
    </article>
  );
}
