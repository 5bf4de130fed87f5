import { formatWithUncertainty, latticeFromSolutionEnthalpy, type SaltThermoResult } from '@/chem';
import type { CandidateEnergetics, ProjectScreening } from '@/screening-data/compute-screening';
import { sourcesOf } from '../energetics-model';
import { kj, labelOf } from './energetics-labels';

/** One salt's cycle as a table: each step's estimate ± 1σ and method, measured ΔH_sol and its back-out. */
export function CycleDetails({
  data,
  e,
  measured,
}: {
  data: ProjectScreening;
  e: CandidateEnergetics & { thermo: SaltThermoResult };
  measured: number | null;
}) {
  const t = e.thermo;
  const screened = data.screen.rows.find((r) => r.id === e.candidateId);
  const perDrug = screened?.solutionEnthalpyPerDrugIon ?? null;
  const drugIons = screened?.drugPerSalt ?? 1;
  let backed: { value: number; uncertainty: number } | null = null;
  let backedError: string | null = null;
  if (measured !== null) {
    try {
      backed = latticeFromSolutionEnthalpy({
        solutionEnthalpyKJ: measured,
        cationHydration: t.cationHydrationKJ,
        anionHydration: t.anionHydrationKJ,
        cationsPerFormula: e.cationsPerFormula,
        anionsPerFormula: e.anionsPerFormula,
      });
    } catch (err) {
      backedError = err instanceof Error ? err.message : String(err);
    }
  }
  const rows: [string, string, { value: number; uncertainty: number; method: string }][] = [
    ['ΔH_L', 'lattice dissociation, per formula unit', t.latticeEnthalpyKJ],
    [
      `ΔH_hyd,+`,
      `one ${e.cationLabel}${e.cationsPerFormula > 1 ? ` (× ${e.cationsPerFormula})` : ''}`,
      t.cationHydrationKJ,
    ],
    [
      `ΔH_hyd,−`,
      `one ${e.anionLabel}${e.anionsPerFormula > 1 ? ` (× ${e.anionsPerFormula})` : ''}`,
      t.anionHydrationKJ,
    ],
    ['ΔH_sol', 'solution at infinite dilution, per formula unit', t.solutionEnthalpyKJ],
  ];
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
          {rows.map(([sym, what, est]) => (
            <tr key={sym}>
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
              <td className="method">{est.method}</td>
            </tr>
          ))}
          {perDrug ? (
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
                    ? formatWithUncertainty(
                        perDrug.valueKJPerMolDrugIon,
                        perDrug.sigmaKJPerMolDrugIon,
                      )
                    : kj(perDrug.valueKJPerMolDrugIon)}
              </td>
              <td className="method">{perDrug.notInformative ?? perDrug.basis}</td>
            </tr>
          ) : null}
          {measured !== null ? (
            <tr>
              <th scope="row">
                ΔH_sol <div className="muted small-note">measured (calorimetry)</div>
              </th>
              <td>
                {kj(measured)} <span className="origin origin-measured">meas.</span>
              </td>
              <td className="method">bench data</td>
            </tr>
          ) : null}
          {backed ? (
            <tr>
              <th scope="row">
                ΔH_L <div className="muted small-note">backed out of the measured ΔH_sol</div>
              </th>
              <td>
                {kj(backed.value)} ± {backed.uncertainty.toFixed(0)}
              </td>
              <td className="method">cycle solver</td>
            </tr>
          ) : null}
        </tbody>
      </table>
      {backedError ? (
        <p className="field-error">Lattice enthalpy not backed out: {backedError}</p>
      ) : null}
      <p className="muted small-note">
        Lattice method: {t.methodChosen} — {t.methodReason}
      </p>
      <details className="sources">
        <summary>Sources</summary>
        <ul>
          {sourcesOf(t.latticeEnthalpyKJ, t.cationHydrationKJ, t.anionHydrationKJ).map((s) => (
            <li key={s}>{s}</li>
          ))}
        </ul>
        {(t.solutionEnthalpyKJ.notes ?? []).length ? (
          <ul>
            {(t.solutionEnthalpyKJ.notes ?? []).map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        ) : null}
      </details>
    </>
  );
}
