import type { ProjectRecord } from '@/persistence/records';
import type { useCounterIonsViewStore } from '../counter-ions-store';
import { type ClassFilter } from '../counter-ions-store';

type View = ReturnType<typeof useCounterIonsViewStore.getState>;

const CLASS_OPTIONS: { value: ClassFilter; label: string }[] = [
  { value: 1, label: 'Class 1' },
  { value: 2, label: 'Class 2' },
  { value: 3, label: 'Class 3' },
  { value: 'none', label: 'Unclassified' },
];

/** The library's filters: what to search, which kind, class and charge, which salt form. */
export function IonFilters({
  view,
  compound,
  minDeltaInvalid,
}: {
  view: View;
  compound: ProjectRecord['compound'];
  minDeltaInvalid: boolean;
}) {
  return (
    <form
      className="ion-filters"
      role="search"
      aria-label="Filter counter-ions"
      onSubmit={(e) => e.preventDefault()}
    >
      <KindAndClassFilters view={view} compound={compound} />
      <FormAndDeltaFilters view={view} minDeltaInvalid={minDeltaInvalid} />
    </form>
  );
}

function KindAndClassFilters({
  view,
  compound,
}: {
  view: View;
  compound: ProjectRecord['compound'];
}) {
  return (
    <>
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
    </>
  );
}

function FormAndDeltaFilters({ view, minDeltaInvalid }: { view: View; minDeltaInvalid: boolean }) {
  return (
    <>
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
    </>
  );
}
