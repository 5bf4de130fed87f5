import { useMemo } from 'react';
import { useLiveQuery } from 'dexie-react-hooks';
import { searchCounterIons, type CounterIonFilters, type LibraryIon } from '@/chem';
import { candidatesRepo } from '@/persistence/candidates-repo';
import type { CandidateRecord, ProjectRecord } from '@/persistence/records';
import { useCounterIonsViewStore } from '../counter-ions-store';
import { useProjectLibrary } from '../hooks/use-project-library';
import { CounterIonRow } from './CounterIonRow';
import { InHouseIonForm } from './InHouseIonForm';
import { IonFilters } from './IonFilters';
import { RejectedIons } from './RejectedIons';
import '../counter-ions.css';

type View = ReturnType<typeof useCounterIonsViewStore.getState>;

/** The minimum ΔpKa typed in the filter: undefined when empty, NaN when not a number. */
function minDeltaOf(view: View): number | undefined {
  return view.minDeltaPka.trim() === '' ? undefined : Number(view.minDeltaPka.replace(',', '.'));
}

/** The library rows the filters keep, against the open compound. */
function useIonRows(view: View, ions: LibraryIon[], compound: ProjectRecord['compound']) {
  const pairedKind = compound.kind === 'base' ? 'anion' : 'cation';
  const minDelta = minDeltaOf(view);
  return useMemo(() => {
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
}

/**
 * The Counter-ions area: search and filter the library against the open compound, read each ion's
 * sources, shortlist a salt form (and take it off again), add in-house ions and edit bundled values
 * for this project.
 */
export function CounterIonsPanel({ project }: { project: ProjectRecord }) {
  const view = useCounterIonsViewStore();
  const { ions, loading, rejected } = useProjectLibrary(project.id);
  const shortlist = useLiveQuery(() => candidatesRepo.listForProject(project.id), [project.id], []);
  const compound = project.compound;
  const minDelta = minDeltaOf(view);
  const rows = useIonRows(view, ions, compound);
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
      <IonFilters
        view={view}
        compound={compound}
        minDeltaInvalid={minDelta !== undefined && !Number.isFinite(minDelta)}
      />
      <RejectedIons rejected={rejected} />
      <p className="muted" role="status" aria-live="polite">
        {loading ? 'Reading in-house ions…' : `${rows.length} counter-ion(s) shown`}
      </p>
      <IonTable rows={rows} project={project} shortlisted={shortlisted} view={view} />
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

function IonTable({
  rows,
  project,
  shortlisted,
  view,
}: {
  rows: LibraryIon[];
  project: ProjectRecord;
  shortlisted: Map<string, CandidateRecord>;
  view: View;
}) {
  return (
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
              candidate={shortlisted.get(ion.id) ?? null}
              open={view.openId === ion.id}
              onToggle={() => view.toggleOpen(ion.id)}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}
