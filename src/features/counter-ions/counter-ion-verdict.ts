import {
  counterIonDeltaPka,
  saltFormationVerdict,
  screeningSettingsSchema,
  type CounterIon,
  type Stoichiometry,
} from '@/chem';
import type { ProjectRecord } from '@/persistence/records';

export interface ShownVerdict {
  deltaPka: number;
  /** 'salt' | 'uncertain' | 'cocrystal' from the screening bands. */
  band: string;
  label: string;
  reason: string;
}

const LABEL: Record<string, string> = {
  salt: 'salt expected',
  uncertain: 'salt or cocrystal',
  cocrystal: 'salt unlikely',
};

/**
 * ΔpKa of one counter-ion stoichiometry against the project's compound, with the screening verdict
 * under the project's ΔpKa bands (stored in settings.extra.screening; defaults otherwise).
 */
export function verdictFor(
  project: ProjectRecord,
  ion: CounterIon,
  stoichiometry?: Stoichiometry,
): ShownVerdict | null {
  const d = counterIonDeltaPka(project.compound, ion, stoichiometry);
  if (!d) return null;
  const block = project.settings.extra.screening;
  const settings = screeningSettingsSchema.safeParse(
    block && typeof block === 'object' ? block : {},
  );
  const bands = settings.success
    ? settings.data.deltaPkaBands
    : screeningSettingsSchema.parse({}).deltaPkaBands;
  const v = saltFormationVerdict(Math.max(-30, Math.min(30, d.deltaPka)), bands);
  const stable = v.meetsStableSaltRule
    ? ''
    : ` — below the ΔpKa ${bands.stableSaltMin} common-practice minimum for a stable salt`;
  return {
    deltaPka: d.deltaPka,
    band: v.band,
    label: LABEL[v.band] ?? v.band,
    reason: `${v.reason}${stable}`,
  };
}

/** Best verdict over an ion's stoichiometries (largest ΔpKa). */
export function bestVerdictFor(project: ProjectRecord, ion: CounterIon): ShownVerdict | null {
  let best: ShownVerdict | null = null;
  for (const s of ion.stoichiometries) {
    const v = verdictFor(project, ion, s);
    if (v && (!best || v.deltaPka > best.deltaPka)) best = v;
  }
  return best;
}
