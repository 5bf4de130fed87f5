import { useId } from 'react';
import { SIGN_CONVENTION, type SaltThermoResult } from '@/chem';
import { EnergyLevelDiagram } from '@/components/charts/EnergyLevelDiagram';
import { WhiskerBars } from '@/components/charts/WhiskerBars';
import type { ProjectRecord } from '@/persistence/records';
import type { CandidateEnergetics, ProjectScreening } from '@/screening-data/compute-screening';
import { useProjectScreening } from '@/screening-data/use-screening';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import { cancellationNote, energyCycleOf, relativeSolutionEnthalpies } from '../energetics-model';
import { CycleDetails } from './CycleDetails';
import { drugsPerFormula, kj, labelOf } from './energetics-labels';
import '../energetics.css';

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
