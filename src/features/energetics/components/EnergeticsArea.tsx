import { useId } from 'react';
import { SIGN_CONVENTION, latticeFromSolutionEnthalpy, type SaltThermoResult } from '@/chem';
import { EnergyLevelDiagram } from '@/components/charts/EnergyLevelDiagram';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import { CautionNote } from '@/components/Cautions';
import type { ProjectRecord } from '@/persistence/records';
import { candidateLabel } from '@/screening-data/candidate-label';
import type { CandidateEnergetics, ProjectScreening } from '@/screening-data/compute-screening';
import { useProjectScreening } from '@/screening-data/use-screening';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import {
  cancellationNote,
  energyCycleOf,
  relativeSolutionEnthalpies,
  sourcesOf,
} from '../energetics-model';
import '../energetics.css';

const kj = (x: number) => x.toFixed(0).replace(/^-/, '−');

function labelOf(data: ProjectScreening, id: string): string {
  const row = data.screen.rows.find((r) => r.id === id);
  if (!row) return data.ionNames[id] ?? id;
  return candidateLabel(
    {
      ionId: row.counterIonId,
      drugPerSalt: row.drugPerSalt,
      counterIonPerSalt: row.counterIonPerSalt,
    },
    data.ionNames[id],
  );
}

/** Drug ions per formula unit of a candidate's salt (1 when unknown). */
function drugsPerFormula(data: ProjectScreening, id: string): number {
  return data.screen.rows.find((r) => r.id === id)?.drugPerSalt ?? 1;
}

/** The Energetics area: each salt's enthalpy cycle to scale, and all candidates side by side. */
export function EnergeticsArea({ project }: { project: ProjectRecord }) {
  const screening = useProjectScreening(project);
  const focusId = useRankingViewStore((s) => s.focusCandidateId);
  const focus = useRankingViewStore((s) => s.focus);
  const uid = useId();
  const data = screening.result;

  if (!data) {
    return (
      <section className="panel" aria-labelledby="energetics-title">
        <h2 id="energetics-title">Energetics</h2>
        {screening.status === 'error' ? (
          <p role="alert">The shortlist cannot be screened yet: {screening.error}</p>
        ) : screening.candidates?.length === 0 ? (
          <p>The shortlist is empty: add counter-ions first.</p>
        ) : (
          <p className="loading" role="status">
            Estimating lattice and hydration enthalpies…
          </p>
        )}
      </section>
    );
  }
  const withThermo = Object.values(data.energetics).filter(
    (e): e is CandidateEnergetics & { thermo: SaltThermoResult } => e.thermo !== null,
  );
  const current = withThermo.find((e) => e.candidateId === focusId) ?? withThermo[0];
  const measuredDH = new Map(
    data.screen.rows
      .filter((r) => r.measured?.solutionEnthalpyKJ != null)
      .map((r) => [r.id, r.measured!.solutionEnthalpyKJ!]),
  );
  const withoutThermo = Object.values(data.energetics).filter((e) => e.thermo === null);

  return (
    <div className="energetics-area">
      <section className="panel" aria-labelledby="energetics-title">
        <header className="panel-head">
          <h2 id="energetics-title">Energetics</h2>
          {screening.status === 'loading' ? (
            <span className="muted" role="status">
              Recomputing…
            </span>
          ) : null}
        </header>
        <p className="convention">
          <strong>Sign convention.</strong> {SIGN_CONVENTION}
        </p>
        {withThermo.length === 0 ? (
          <p>
            No candidate could be estimated:{' '}
            {withoutThermo.map((e) => `${labelOf(data, e.candidateId)}: ${e.reason}`).join('; ')}
          </p>
        ) : (
          <div className="energetics-layout">
            <div>
              <div className="field">
                <label htmlFor={`${uid}-pick`}>Salt</label>
                <select
                  id={`${uid}-pick`}
                  value={current?.candidateId ?? ''}
                  onChange={(e) => focus(e.target.value)}
                >
                  {withThermo.map((e) => (
                    <option key={e.candidateId} value={e.candidateId}>
                      {labelOf(data, e.candidateId)}
                    </option>
                  ))}
                </select>
              </div>
              {current ? (
                <CycleDetails
                  data={data}
                  e={current}
                  measured={measuredDH.get(current.candidateId) ?? null}
                />
              ) : null}
            </div>
            {current ? (
              <div>
                <EnergyLevelDiagram
                  cycle={energyCycleOf(current, labelOf(data, current.candidateId))}
                />
                <p className="weak-model" role="note">
                  {cancellationNote(energyCycleOf(current, ''))}
                </p>
              </div>
            ) : null}
          </div>
        )}
      </section>
      {withThermo.length > 0 ? (
        <section className="panel" aria-labelledby="compare-title">
          <h2 id="compare-title">All candidates side by side</h2>
          <p className="muted">
            ΔH<sub>sol</sub> is compared per drug ion (per formula unit ÷ drug ions in it), so that
            a 2:1 salt stands beside 1:1 salts on the same footing.
          </p>
          <WhiskerBars
            title="Estimated enthalpy of solution per drug ion"
            caption={`Bars: estimated ΔH_sol per drug ion (kJ/mol) with ±1σ whiskers; diamonds: ΔH_sol measured by calorimetry where recorded. ${withThermo
              .map((e) => {
                const m = drugsPerFormula(data, e.candidateId);
                return `${labelOf(data, e.candidateId)} ${kj(e.thermo.solutionEnthalpyKJ.value / m)} ± ${(e.thermo.solutionEnthalpyKJ.uncertainty / m).toFixed(0)}`;
              })
              .join('; ')}.`}
            unit="ΔH_sol per drug ion, kJ/mol (negative: dissolving releases heat)"
            format={(x) => kj(x)}
            rows={withThermo.map((e) => {
              const n = drugsPerFormula(data, e.candidateId);
              const m = measuredDH.get(e.candidateId);
              return {
                id: e.candidateId,
                label: labelOf(data, e.candidateId),
                value: e.thermo.solutionEnthalpyKJ.value / n,
                uncertainty: e.thermo.solutionEnthalpyKJ.uncertainty / n,
                ...(m !== undefined
                  ? { marker: { value: m / n, label: `measured ${kj(m / n)} kJ/mol per drug ion` } }
                  : {}),
              };
            })}
            width={760}
          />
          <RelativeBars data={data} items={withThermo} />
          <WhiskerBars
            title="Estimated lattice enthalpy per formula unit"
            caption={`Lattice dissociation enthalpy ΔH_L (> 0) with ±1σ whiskers: ${withThermo
              .map(
                (e) =>
                  `${labelOf(data, e.candidateId)} ${kj(e.thermo.latticeEnthalpyKJ.value)} ± ${e.thermo.latticeEnthalpyKJ.uncertainty.toFixed(0)} (${e.thermo.methodChosen})`,
              )
              .join('; ')}.`}
            unit="ΔH_L, kJ/mol"
            format={(x) => kj(x)}
            rows={withThermo.map((e) => ({
              id: e.candidateId,
              label: labelOf(data, e.candidateId),
              value: e.thermo.latticeEnthalpyKJ.value,
              uncertainty: e.thermo.latticeEnthalpyKJ.uncertainty,
              note: e.thermo.methodChosen,
            }))}
            width={760}
          />
          {withoutThermo.length ? (
            <p className="muted">
              Not estimated:{' '}
              {withoutThermo.map((e) => `${labelOf(data, e.candidateId)} (${e.reason})`).join('; ')}
              .
            </p>
          ) : null}
          <CautionNote />
        </section>
      ) : null}
    </div>
  );
}

/** ΔH_sol per drug ion relative to the median candidate, with the drug ion's common error taken out. */
function RelativeBars({
  data,
  items,
}: {
  data: ProjectScreening;
  items: (CandidateEnergetics & { thermo: SaltThermoResult })[];
}) {
  const drugIsCation = data.drugIon.charge > 0;
  const rel = relativeSolutionEnthalpies(
    items.map((e) => {
      const m = drugsPerFormula(data, e.candidateId);
      return {
        id: e.candidateId,
        perDrugKJ: e.thermo.solutionEnthalpyKJ.value / m,
        perDrugSigmaKJ: e.thermo.solutionEnthalpyKJ.uncertainty / m,
        drugHydrationSigmaKJ: (drugIsCation
          ? e.thermo.cationHydrationKJ
          : e.thermo.anionHydrationKJ
        ).uncertainty,
      };
    }),
  );
  return (
    <WhiskerBars
      title="Enthalpy of solution per drug ion relative to the median candidate"
      caption={`Relative ΔH_sol per drug ion (kJ/mol, median candidate = 0) with ±1σ whiskers from which the drug ion’s own hydration error is removed, as it is common to every candidate (assumption: that term fully shared, the others independent). ${rel
        .map((r) => `${labelOf(data, r.id)} ${kj(r.valueKJ)} ± ${r.sigmaKJ.toFixed(0)}`)
        .join('; ')}.`}
      unit="ΔH_sol − median, kJ/mol per drug ion"
      format={(x) => kj(x)}
      rows={rel.map((r) => ({
        id: r.id,
        label: labelOf(data, r.id),
        value: r.valueKJ,
        uncertainty: r.sigmaKJ,
      }))}
      width={760}
    />
  );
}

function CycleDetails({
  data,
  e,
  measured,
}: {
  data: ProjectScreening;
  e: CandidateEnergetics & { thermo: SaltThermoResult };
  measured: number | null;
}) {
  const t = e.thermo;
  let backed: { value: number; uncertainty: number } | null = null;
  let backedError: string | null = null;
  if (measured !== null) {
    try {
      backed = latticeFromSolutionEnthalpy({
        solutionEnthalpyKJ: measured,
        solutionUncertaintyKJ: 2,
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
