import { formatWithUncertainty, latticeFromSolutionEnthalpy, type SaltThermoResult } from '@/chem';
import { methodLabel } from '@/components/method-label';
import type { CandidateEnergetics, ProjectScreening } from '@/screening-data/compute-screening';
import { sourcesOf } from '../energetics-model';
import { kj, labelOf } from './energetics-labels';

type Thermo = CandidateEnergetics & { thermo: SaltThermoResult };
type Step = [string, string, { value: number; uncertainty: number; method: string }];

/** One salt's cycle as a table: each step's estimate ± 1σ and method, measured ΔH_sol and its back-out. */
export function CycleDetails({
  data,
  e,
  measured,
}: {
  data: ProjectScreening;
  e: Thermo;
  measured: number | null;
}) {
  const t = e.thermo;
  const screened = data.screen.rows.find((r) => r.id === e.candidateId);
  const backOut = measured !== null ? backedOutLatticeOf(e, measured) : null;
  return (
    <>
      <table className="data-table cycle-table">
        <caption className="sr-only">Cycle of {labelOf(data, e.candidateId)}</caption>
        <thead>
          <tr>
            <th scope="col">Step</th>
            <th scope="col">kJ/mol ± 1σ</th>
            <th scope="col">Method</th>
          </tr>
        </thead>
        <tbody>
          {cycleSteps(e).map((step) => (
            <StepRow key={step[0]} step={step} />
          ))}
          {screened?.solutionEnthalpyPerDrugIon ? (
            <PerDrugIonRow
              perDrug={screened.solutionEnthalpyPerDrugIon}
              drugIons={screened.drugPerSalt ?? 1}
            />
          ) : null}
          {measured !== null ? <MeasuredRow measured={measured} /> : null}
          {backOut && 'value' in backOut ? <BackedOutRow backed={backOut} /> : null}
        </tbody>
      </table>
      {backOut && 'error' in backOut ? (
        <p className="field-error">Lattice enthalpy not backed out: {backOut.error}</p>
      ) : null}
      <p className="muted small-note">
        Lattice method: {t.methodChosen} — {t.methodReason}
      </p>
      <CycleSources thermo={t} />
    </>
  );
}

/**
 * ΔH_L backed out of a measured ΔH_sol by the core's cycle solver (no σ typed in: the record states
 * none, so the ±1σ is the hydration terms' alone), or why it cannot be.
 */
function backedOutLatticeOf(
  e: Thermo,
  measured: number,
): { value: number; uncertainty: number } | { error: string } {
  try {
    return latticeFromSolutionEnthalpy({
      solutionEnthalpyKJ: measured,
      cationHydration: e.thermo.cationHydrationKJ,
      anionHydration: e.thermo.anionHydrationKJ,
      cationsPerFormula: e.cationsPerFormula,
      anionsPerFormula: e.anionsPerFormula,
    });
  } catch (err) {
    return { error: err instanceof Error ? err.message : String(err) };
  }
}

/** The four steps of the cycle: symbol, what it is, and the core's estimate. */
function cycleSteps(e: Thermo): Step[] {
  const t = e.thermo;
  const times = (n: number) => (n > 1 ? ` (× ${n})` : '');
  return [
    ['ΔH_L', 'lattice dissociation, per formula unit', t.latticeEnthalpyKJ],
    [`ΔH_hyd,+`, `one ${e.cationLabel}${times(e.cationsPerFormula)}`, t.cationHydrationKJ],
    [`ΔH_hyd,−`, `one ${e.anionLabel}${times(e.anionsPerFormula)}`, t.anionHydrationKJ],
    ['ΔH_sol', 'solution at infinite dilution, per formula unit', t.solutionEnthalpyKJ],
  ];
}

function StepRow({ step: [sym, what, est] }: { step: Step }) {
  return (
    <tr>
      <th scope="row">
        {sym} <div className="muted small-note">{what}</div>
      </th>
      <td>
        {kj(est.value)} ± {est.uncertainty.toFixed(0)}{' '}
        {est.method === 'published' ? (
          <span
            className="origin origin-published"
            title="published single-ion value (see Sources)"
          >
            pub.
          </span>
        ) : (
          <span className="origin origin-estimated">est.</span>
        )}
      </td>
      <td className="method">{methodLabel(est.method)}</td>
    </tr>
  );
}

type PerDrug = NonNullable<
  ProjectScreening['screen']['rows'][number]['solutionEnthalpyPerDrugIon']
>;

/** ΔH_sol per drug ion, as the Ranking, the sheet and the CSV show it (a number or "not informative"). */
function PerDrugIonRow({ perDrug, drugIons }: { perDrug: PerDrug; drugIons: number }) {
  return (
    <tr>
      <th scope="row">
        ΔH_sol per drug ion
        <div className="muted small-note">
          ÷ {drugIons}, as the Ranking, the sheet and the CSV show it
        </div>
      </th>
      <td
        className={perDrug.notInformative ? 'muted not-informative' : undefined}
        title={perDrug.notInformative ?? undefined}
      >
        {perDrug.notInformative
          ? 'not informative'
          : perDrug.sigmaKJPerMolDrugIon !== null
            ? formatWithUncertainty(perDrug.valueKJPerMolDrugIon, perDrug.sigmaKJPerMolDrugIon)
            : kj(perDrug.valueKJPerMolDrugIon)}
      </td>
      <td className="method">{perDrug.notInformative ?? perDrug.basis}</td>
    </tr>
  );
}

function MeasuredRow({ measured }: { measured: number }) {
  return (
    <tr>
      <th scope="row">
        ΔH_sol <div className="muted small-note">measured (calorimetry)</div>
      </th>
      <td>
        {kj(measured)} <span className="origin origin-measured">meas.</span>
      </td>
      <td className="method">bench data</td>
    </tr>
  );
}

function BackedOutRow({ backed }: { backed: { value: number; uncertainty: number } }) {
  return (
    <tr>
      <th scope="row">
        ΔH_L <div className="muted small-note">backed out of the measured ΔH_sol</div>
      </th>
      <td>
        {kj(backed.value)} ± {backed.uncertainty.toFixed(0)}
      </td>
      <td className="method">cycle solver</td>
    </tr>
  );
}

/** The published sources behind the estimates, and the notes the core attached to ΔH_sol. */
function CycleSources({ thermo: t }: { thermo: SaltThermoResult }) {
  const notes = t.solutionEnthalpyKJ.notes ?? [];
  return (
    <details className="sources">
      <summary>Sources</summary>
      <ul>
        {sourcesOf(t.latticeEnthalpyKJ, t.cationHydrationKJ, t.anionHydrationKJ).map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
      {notes.length ? (
        <ul>
          {notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </details>
  );
}
