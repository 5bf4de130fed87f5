import { useEffect, useMemo, useState } from 'react';
import {
  COUNTER_IONS,
  mergeLibrary,
  PLATE_FILL_ORDER,
  PLATE_PLAN_CAUTIONS,
  type PlatePlan,
  type PlatePlanInput,
} from '@/chem';
import { downloadText } from '@/components/download-text';
import type { ProjectRecord, ScreenPlanRecord } from '@/persistence/records';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';
import {
  currentOutcomes,
  layOutPlan,
  useScreenPlanData,
  type ScreenPlanData,
} from '@/screening-data/use-screen-outcomes';
import { pickListCsv, startingPlan } from '../screen-plan-model';
import { OutcomeForm } from './OutcomeForm';
import { PlanForm } from './PlanForm';
import { PlateMap } from './PlateMap';
import { WellTable } from './WellTable';
import '../screen-plan.css';

/** A valid plan is stored this long after the last change (ms). */
const SAVE_DELAY_MS = 250;

/** The salt-screen plan: choices, plate map, per-well table, pick list, and the outcomes of the wells. */
export function ScreenPlanArea({ project }: { project: ProjectRecord }) {
  const data = useScreenPlanData(project.id);
  if (!data) {
    return (
      <section className="panel">
        <h2>Salt screen</h2>
        <p className="loading" role="status">
          Reading the plan…
        </p>
      </section>
    );
  }
  if (data.candidates.length === 0 && !data.record) {
    return (
      <section className="panel">
        <h2>Salt screen</h2>
        <p>
          The shortlist is empty. Shortlist counter-ions under Counter-ions, then plan their screen
          here.
        </p>
      </section>
    );
  }
  return <PlanWorkspace key={project.id} project={project} data={data} />;
}

function PlanWorkspace({ project, data }: { project: ProjectRecord; data: ScreenPlanData }) {
  const [draft, setDraft] = useState<PlatePlanInput>(
    () => data.record?.plan ?? startingPlan(data.candidates),
  );
  const [selected, setSelected] = useState<string | null>(null);
  const laid = useMemo(
    () => layOutPlan(project, draft, data.candidates, data.customIons),
    [project, draft, data.candidates, data.customIons],
  );
  const ionNames = useMemo(() => {
    const lib = mergeLibrary(COUNTER_IONS, data.customIons, project.id).ions;
    return Object.fromEntries(lib.map((i) => [i.id, i.name]));
  }, [data.customIons, project.id]);

  // Store the plan once it is valid and has stood still a moment.
  const valid = laid.plan !== null;
  const stored = JSON.stringify(data.record?.plan ?? null);
  useEffect(() => {
    if (!valid || JSON.stringify(draft) === stored) return;
    const t = setTimeout(() => void screenPlansRepo.savePlan(project.id, draft), SAVE_DELAY_MS);
    return () => clearTimeout(t);
  }, [draft, valid, stored, project.id]);

  const outcomes = laid.plan && data.record ? currentOutcomes(laid.plan, data.record) : {};
  return (
    <div className="screen-plan-area">
      <section className="panel screen-plan-choices" aria-labelledby="plan-title">
        <header className="panel-head">
          <h2 id="plan-title">Salt screen plan</h2>
          <span className="muted">saved with the project</span>
        </header>
        <PlanForm
          draft={draft}
          candidates={data.candidates}
          ionNames={ionNames}
          onChange={setDraft}
        />
      </section>
      {laid.error ? (
        <p className="field-error plan-error" role="alert">
          {laid.error.message}
        </p>
      ) : null}
      {laid.plan ? (
        <PlanSheet
          project={project}
          data={data}
          plan={laid.plan}
          outcomes={outcomes}
          ionNames={ionNames}
          selected={selected}
          onSelect={setSelected}
        />
      ) : null}
    </div>
  );
}

/** The laid-out plan: pick list, print, cautions, plate map, notes, the selected well's outcome, the table. */
function PlanSheet({
  project,
  data,
  plan,
  outcomes,
  ionNames,
  selected,
  onSelect,
}: {
  project: ProjectRecord;
  data: ScreenPlanData;
  plan: PlatePlan;
  outcomes: ScreenPlanRecord['outcomes'];
  ionNames: Record<string, string>;
  selected: string | null;
  onSelect: (well: string) => void;
}) {
  const well = plan.wells.find((w) => w.well === selected);
  return (
    <section className="panel screen-plan-sheet" aria-labelledby="plate-title">
      <header className="panel-head">
        <h2 id="plate-title">
          {project.compound.name}: {plan.wells.length} wells on a {plan.plate}-well plate
        </h2>
        <span className="plan-actions">
          <button
            type="button"
            onClick={() =>
              downloadText(
                `${project.name}-pick-list.csv`,
                pickListCsv(plan),
                'text/csv;charset=utf-8',
              )
            }
          >
            Download pick list (CSV)
          </button>
          <button type="button" onClick={() => window.print()}>
            Print plan
          </button>
        </span>
      </header>
      <aside className="plan-cautions" aria-label="Cautions for this plan">
        <ul>
          {PLATE_PLAN_CAUTIONS.map((l) => (
            <li key={l}>{l}</li>
          ))}
        </ul>
      </aside>
      <PlateMap
        plan={plan}
        outcomes={outcomes}
        ionNames={ionNames}
        selected={selected}
        onSelect={onSelect}
      />
      <p className="muted">{PLATE_FILL_ORDER} Click a well to record what came out of it.</p>
      {plan.notes.length ? (
        <ul className="plan-notes">
          {plan.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
      {well && data.record ? (
        <OutcomeForm
          planId={data.record.id}
          projectId={project.id}
          well={well}
          stored={outcomes[well.well]}
          candidate={data.candidates.find((c) => c.ionId === well.counterIonId)}
          ionName={ionNames[well.counterIonId] ?? well.counterIonId}
        />
      ) : null}
      <WellTable plan={plan} outcomes={outcomes} ionNames={ionNames} />
    </section>
  );
}
