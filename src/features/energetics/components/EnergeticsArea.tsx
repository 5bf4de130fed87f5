import { useId } from 'react';
import { SIGN_CONVENTION, type SaltThermoResult } from '@/chem';
import { EnergyLevelDiagram } from '@/components/charts/EnergyLevelDiagram';
import type { ProjectRecord } from '@/persistence/records';
import type { CandidateEnergetics, ProjectScreening } from '@/screening-data/compute-screening';
import { useProjectScreening } from '@/screening-data/use-screening';
import { useRankingViewStore } from '@/stores/ranking-view-store';
import { cancellationNote, energyCycleOf } from '../energetics-model';
import { CandidateComparison } from './CandidateComparison';
import { CycleDetails } from './CycleDetails';
import { labelOf } from './energetics-labels';
import '../energetics.css';

type Thermo = CandidateEnergetics & { thermo: SaltThermoResult };

/** The Energetics area: each salt's enthalpy cycle to scale, and all candidates side by side. */
export function EnergeticsArea({ project }: { project: ProjectRecord }) {
  const screening = useProjectScreening(project);
  const data = screening.result;
  if (!data) return <EnergeticsPending screening={screening} />;
  const withThermo = Object.values(data.energetics).filter((e): e is Thermo => e.thermo !== null);
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
          <SaltCycle data={data} withThermo={withThermo} measuredDH={measuredDH} />
        )}
      </section>
      {withThermo.length > 0 ? (
        <CandidateComparison
          data={data}
          withThermo={withThermo}
          withoutThermo={withoutThermo}
          measuredDH={measuredDH}
        />
      ) : null}
    </div>
  );
}

/** The area before a screen exists: why not yet, or that it is being computed. */
function EnergeticsPending({ screening }: { screening: ReturnType<typeof useProjectScreening> }) {
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

/** The salt in focus: its picker, its cycle as a table, and its energy-level diagram. */
function SaltCycle({
  data,
  withThermo,
  measuredDH,
}: {
  data: ProjectScreening;
  withThermo: Thermo[];
  measuredDH: Map<string, number>;
}) {
  const focusId = useRankingViewStore((s) => s.focusCandidateId);
  const focus = useRankingViewStore((s) => s.focus);
  const uid = useId();
  const current = withThermo.find((e) => e.candidateId === focusId) ?? withThermo[0];
  return (
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
          <EnergyLevelDiagram cycle={energyCycleOf(current, labelOf(data, current.candidateId))} />
          <p className="weak-model" role="note">
            {cancellationNote(energyCycleOf(current, ''))}
          </p>
        </div>
      ) : null}
    </div>
  );
}
