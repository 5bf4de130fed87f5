import { useLiveQuery } from 'dexie-react-hooks';
import type { ChemInputError } from '@/chem';
import {
  COUNTER_IONS,
  buildPlatePlan,
  formulaMolarMassGPerMol,
  mergeLibrary,
  summariseOutcomes,
  type CounterIon,
  type CounterIonOutcomeSummary,
  type PlatePlan,
  type PlatePlanInput,
} from '@/chem';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import type {
  CandidateRecord,
  CustomIonRecord,
  ProjectRecord,
  ScreenPlanRecord,
} from '@/persistence/records';
import { screenPlansRepo } from '@/persistence/screen-plans-repo';

/**
 * The project's salt-screen plan laid out on its plate, and what the recorded outcomes say per
 * counter-ion: read by the plan area, the Ranking's summary and the sheet (so it lives here, under the
 * features, like the screening every area reads).
 */
export type PlanLayout =
  { plan: PlatePlan; error: null } | { plan: null; error: ChemInputError | Error };

/** Lay a stored or edited plan out with the project's compound, library and shortlist stoichiometries. */
export function layOutPlan(
  project: ProjectRecord,
  input: PlatePlanInput,
  candidates: readonly CandidateRecord[],
  customIons: readonly CustomIonRecord[],
): PlanLayout {
  try {
    const library = mergeLibrary(COUNTER_IONS, [...customIons], project.id).ions;
    const byId = new Map<string, CounterIon>(library.map((i) => [i.id, i]));
    const stoich = new Map(candidates.map((c) => [c.ionId, c]));
    const plan = buildPlatePlan(input, {
      freeFormMolarMassGPerMol: formulaMolarMassGPerMol(project.compound.formula),
      drugCharge: project.compound.ionCharge,
      lookupIon: (id) => byId.get(id),
      stoichiometry: (id) => stoich.get(id),
    });
    return { plan, error: null };
  } catch (e) {
    return { plan: null, error: e instanceof Error ? e : new Error(String(e)) };
  }
}

/** Outcomes that still describe the well they were recorded for (same counter-ion and solvent). */
export function currentOutcomes(
  plan: PlatePlan,
  record: ScreenPlanRecord,
): ScreenPlanRecord['outcomes'] {
  const out: ScreenPlanRecord['outcomes'] = {};
  for (const w of plan.wells) {
    const o = record.outcomes[w.well];
    if (o && o.counterIonId === w.counterIonId && o.solventId === w.solventId) out[w.well] = o;
  }
  return out;
}

export interface ScreenPlanData {
  record: ScreenPlanRecord | undefined;
  candidates: CandidateRecord[];
  customIons: CustomIonRecord[];
}

/** The stored plan, the shortlist and the custom ions of a project, live. */
export function useScreenPlanData(projectId: string): ScreenPlanData | undefined {
  return useLiveQuery(async () => {
    const [record, candidates, customIons] = await Promise.all([
      screenPlansRepo.forProject(projectId),
      candidatesRepo.listForProject(projectId),
      customIonsRepo.listAll(),
    ]);
    return { record, candidates, customIons };
  }, [projectId]);
}

/** Per counter-ion, what the project's recorded screen outcomes say (empty when there is no plan). */
export function useScreenOutcomeSummary(project: ProjectRecord): CounterIonOutcomeSummary[] {
  const data = useScreenPlanData(project.id);
  if (!data?.record) return [];
  const laid = layOutPlan(project, data.record.plan, data.candidates, data.customIons);
  if (!laid.plan) return [];
  return summariseOutcomes(laid.plan.wells, currentOutcomes(laid.plan, data.record));
}
