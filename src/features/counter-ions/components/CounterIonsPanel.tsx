import { useMemo } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { searchCounterIons, type CounterIonFilters, type LibraryIon } from '@/chem';
import { candidatesRepo } from '@/persistence/candidates-repo';
import type { ProjectRecord } from '@/persistence/records';
import { useCounterIonsViewStore, type ClassFilter } from '../counter-ions-store';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import { acknowledgeRejected, useProjectLibrary } from '../hooks/use-project-library';
import { CounterIonRow } from './CounterIonRow';
import { InHouseIonForm } from './InHouseIonForm';
import '../counter-ions.css';

const CLASS_OPTIONS: { value: ClassFilter; label: string }[] = [
  { value: 1, label: 'Class 1' },
  { value: 2, label: 'Class 2' },
  { value: 3, label: 'Class 3' },
  { value: 'none', label: 'Unclassified' },
];

/**
 * The Counter-ions area: search and filter the library against the open compound, read each ion's
 * sources, shortlist a salt form, add in-house ions and edit bundled values for this project.
 */
export function CounterIonsPanel({ project }: { project: ProjectRecord }) {
  const view = useCounterIonsViewStore();
  const { ions, loading, rejected } = useProjectLibrary(project.id);
  const shortlist = useLiveQuery(() => candidatesRepo.listForProject(project.id), [project.id], []);
  const compound = project.compound;
  const pairedKind = compound.kind === 'base' ? 'anion' : 'cation';

  const minDelta =
    view.minDeltaPka.trim() === '' ? undefined : Number(view.minDeltaPka.replace(',', '.'));
  const minDeltaInvalid = minDelta !== undefined && !Number.isFinite(minDelta);

  const rows = useMemo(() => {
    const filters: CounterIonFilters = {
      partner: compound,
      includeReferenceIons: view.showReference,
      ...(view.kind === 'paired'
        ? { kind: pairedKind }
        : view.kind === 'all'
          ? {}
          : { kind: view.kind }),
      ...(view.classes.length ? { classes: view.classes } : {}),
      ...(view.charge !== 0 ? { charge: view.charge } : {}),
      ...(view.stoichiometry ? { stoichiometry: view.stoichiometry } : {}),
      ...(minDelta !== undefined && Number.isFinite(minDelta) ? { minDeltaPka: minDelta } : {}),
    };
    return searchCounterIons<LibraryIon>(ions, view.query, filters);
  }, [
    ions,
    view.query,
    view.kind,
    view.classes,
    view.charge,
    view.stoichiometry,
    view.showReference,
    minDelta,
    compound,
    pairedKind,
  ]);

  const shortlisted = new Map((shortlist ?? []).map((c) => [c.ionId, c]));
  const pkaText = compound.pKas.map((p) => p.value).join(', ');

  return (
    <section className="panel ion-library" aria-labelledby="ions-title">
      <header className="panel-head">
        <h2 id="ions-title">Counter-ions</h2>
        <span className="muted">
          {ions.length} in the library · {shortlisted.size} on this project’s shortlist
        </span>
      </header>
      <p className="ion-against">
        ΔpKa = pKa(protonated base) − pKa(acid), against <strong>{compound.name}</strong> (
        {compound.kind === 'base' ? 'base, pKa of the conjugate acid' : 'acid, pKa'} {pkaText}; ion
        charge {compound.ionCharge > 0 ? '+' : ''}
        {compound.ionCharge}). Verdict bands follow the project’s screening settings.
      </p>

      <form
        className="ion-filters"
        role="search"
        aria-label="Filter counter-ions"
        onSubmit={(e) => e.preventDefault()}
      >
        <div className="field ion-search">
          <label htmlFor="ion-query">Search counter-ions</label>
          <input
            id="ion-query"
            type="search"
            placeholder="name, synonym or formula"
            value={view.query}
            onChange={(e) => view.setQuery(e.target.value)}
          />
        </div>
        <div className="field">
          <label htmlFor="ion-kind">Kind</label>
          <select
            id="ion-kind"
            value={view.kind}
            onChange={(e) => view.setKind(e.target.value as typeof view.kind)}
          >
            <option value="paired">
              {compound.kind === 'base'
                ? 'Anions (pair with this base)'
                : 'Cations (pair with this acid)'}
            </option>
            <option value="anion">Anions</option>
            <option value="cation">Cations</option>
            <option value="all">All ions</option>
          </select>
        </div>
        <fieldset className="field ion-classes">
          <legend>Acceptability class</legend>
          {CLASS_OPTIONS.map((c) => (
            <label key={String(c.value)}>
              <input
                type="checkbox"
                checked={view.classes.includes(c.value)}
                onChange={() => view.toggleClass(c.value)}
              />{' '}
              {c.label}
            </label>
          ))}
        </fieldset>
        <div className="field">
          <label htmlFor="ion-charge">Charge</label>
          <select
            id="ion-charge"
            value={view.charge}
            onChange={(e) => view.setCharge(Number(e.target.value))}
          >
            <option value={0}>Any</option>
            {[-1, -2, -3, 1, 2, 3].map((c) => (
              <option key={c} value={c}>
                {c > 0 ? `+${c}` : `−${-c}`}
              </option>
            ))}
          </select>
        </div>
        <div className="field">
          <label htmlFor="ion-stoich">Stoichiometry (drug : counter-ion)</label>
          <select
            id="ion-stoich"
            value={view.stoichiometry}
            onChange={(e) => view.setStoichiometry(e.target.value)}
          >
            <option value="">Any</option>
            {['1:1', '2:1', '3:1', '1:2'].map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </div>
        <div className="field">
          <label htmlFor="ion-min-dpka">Minimum ΔpKa</label>
          <input
            id="ion-min-dpka"
            inputMode="decimal"
            placeholder="no limit"
            value={view.minDeltaPka}
            aria-invalid={minDeltaInvalid || undefined}
            aria-describedby={minDeltaInvalid ? 'ion-min-dpka-error' : undefined}
            onChange={(e) => view.setMinDeltaPka(e.target.value)}
          />
          {minDeltaInvalid ? (
            <p className="field-error" id="ion-min-dpka-error" role="alert">
              Minimum ΔpKa must be a number
            </p>
          ) : null}
        </div>
        <div className="field ion-reference">
          <label>
            <input
              type="checkbox"
              checked={view.showReference}
              onChange={(e) => view.setShowReference(e.target.checked)}
            />{' '}
            Include reference ions (model checks only, not for medicines)
          </label>
        </div>
        <div className="field ion-reset">
          <button type="button" onClick={view.reset}>
            Clear filters
          </button>
        </div>
      </form>

      {rejected.length > 0 ? (
        <div className="field-error ion-rejected" role="alert">
          <p>
            {rejected.length} stored in-house record(s) cannot be used and are left out of every
            project’s library:
          </p>
          <ul>
            {rejected.map((r) => (
              <li key={r.recordId}>
                <code>{r.recordId}</code>: {r.reason}
              </li>
            ))}
          </ul>
          <button
            type="button"
            onClick={() => void Promise.all(rejected.map((r) => customIonsRepo.remove(r.recordId)))}
          >
            Delete these records
          </button>{' '}
          <button
            type="button"
            onClick={() => void acknowledgeRejected(rejected.map((r) => r.recordId))}
          >
            Keep them, stop telling me
          </button>
        </div>
      ) : null}

      <p className="muted" role="status" aria-live="polite">
        {loading ? 'Reading in-house ions…' : `${rows.length} counter-ion(s) shown`}
      </p>
      <div className="ion-table-wrap">
        <table className="data-table ion-table" aria-label="Counter-ion library">
          <thead>
            <tr>
              <th scope="col">Counter-ion</th>
              <th scope="col">Formula</th>
              <th scope="col">Charge</th>
              <th scope="col">pKa (25 °C, water)</th>
              <th scope="col">Class</th>
              <th scope="col">ΔpKa vs compound</th>
              <th scope="col">M (g/mol)</th>
              <th scope="col">Shortlist</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((ion) => (
              <CounterIonRow
                key={ion.id}
                ion={ion}
                project={project}
                onShortlist={shortlisted.has(ion.id)}
                open={view.openId === ion.id}
                onToggle={() => view.toggleOpen(ion.id)}
              />
            ))}
          </tbody>
        </table>
      </div>
      <p className="source">
        pKa: parent acid, or conjugate acid of the parent base; metal and quaternary cations carry
        water’s pKa (made from the hydroxide). Class: Stahl &amp; Wermuth, Handbook of
        Pharmaceutical Salts (2002) — recalled values are marked “from memory” in each ion’s
        sources. Molar masses from IUPAC 2021 standard atomic weights.
      </p>
      <InHouseIonForm />
    </section>
  );
}
