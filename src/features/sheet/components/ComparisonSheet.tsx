import { CAUTION_LINES } from '@/components/Cautions';
import { SheetExcipients } from './SheetExcipients';
import type { SheetModel } from '../sheet.types';
import { GROUPS, RankedTable, SettingsTable } from './SheetTables';
import {
  SheetCautions,
  SheetConfidence,
  SheetEnergy,
  SheetLegend,
  SheetNotes,
  SheetReasons,
  SheetSolubility,
} from './SheetSections';
import '../sheet.css';

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeStyle: 'short' });

/**
 * The comparison sheet for a formulation meeting: compound, date and version, then the decision —
 * what separates the candidates and the ranked tables (units in headings, ±1σ uncertainties, origin
 * marks, flags and reasons) — then every setting and weight it rests on, the pH–solubility and energy
 * pictures, the model-confidence summary and the cautions. Laid out for the screen and, through
 * sheet.css's print rules, for A4 or Letter paper. All text from the user (names, notes) is rendered
 * as text, never as markup.
 */
export function ComparisonSheet({ model }: { model: SheetModel }) {
  return (
    <article className="comparison-sheet" aria-labelledby="sheet-title">
      <SheetHead model={model} />
      <aside className="sheet-caution" aria-label="Cautions">
        <strong>Screening estimates only.</strong> {CAUTION_LINES[0]} Experiments, the regulatory
        guidance in force and your lab’s safety rules decide. See the full cautions at the end of
        this sheet.
      </aside>
      {/* The decision first: the ranking, then what it was computed from. */}
      <SheetRanking model={model} />
      <section className="sheet-block sheet-inputs" aria-label="Compound and settings">
        <SettingsTable caption="Compound" items={model.compound.facts} />
        <SettingsTable caption="Screening settings" items={model.settings} />
        <SettingsTable caption="Ranking weights" items={model.weights} />
      </section>
      <SheetSolubility solubility={model.solubility} />
      {model.excipientMatrix ? <SheetExcipients matrix={model.excipientMatrix} /> : null}
      <SheetEnergy cycles={model.energyCycles} />
      <SheetConfidence confidence={model.confidence} />
      <SheetNotes notes={model.notes} />
      <SheetCautions />
    </article>
  );
}

/** Compound, project, date and version. */
function SheetHead({ model }: { model: SheetModel }) {
  const made = new Date(model.generatedAt);
  return (
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
  );
}

/** The decision: what separates the candidates, the ranked tables, the reasons and the marks. */
function SheetRanking({ model }: { model: SheetModel }) {
  return (
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
      <SheetReasons rows={model.rows} />
      <SheetLegend />
    </section>
  );
}
