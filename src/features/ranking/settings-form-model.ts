import {
  ASSUMED_MICROENVIRONMENT_PH,
  celsiusToKelvin,
  screeningSettingsSchema,
  type ScreeningSettings,
} from '@/chem';
import { projectSettingsSchema, type ProjectSettings } from '@/persistence/records';
import { microenvironmentPhStatedOf } from '@/screening-data/screening-settings';

/** The screening-conditions form as typed. */
export interface ConditionsDraft {
  gastricChlorideM: string;
  gastricPh: string;
  microenvironmentPh: string;
  temperatureC: string;
  cocrystalBelow: string;
  saltAbove: string;
  stableSaltMin: string;
  activityModel: 'ideal' | 'davies';
}
export type ConditionsErrors = Partial<Record<keyof ConditionsDraft, string>>;

export function conditionsDraftOf(project: ProjectSettings, s: ScreeningSettings): ConditionsDraft {
  return {
    gastricChlorideM: String(project.gastricChlorideM),
    gastricPh: String(s.gastricPh),
    // empty while the pH is not stated (the screen then assumes 7 and says so)
    microenvironmentPh: microenvironmentPhStatedOf(project)
      ? String(project.microenvironmentPh)
      : '',
    temperatureC: String(project.temperatureC),
    cocrystalBelow: String(s.deltaPkaBands.cocrystalBelow),
    saltAbove: String(s.deltaPkaBands.saltAbove),
    stableSaltMin: String(s.deltaPkaBands.stableSaltMin),
    activityModel: s.activityModel,
  };
}

const RANGES: Record<
  Exclude<keyof ConditionsDraft, 'activityModel'>,
  { label: string; min: number; max: number; unit?: string }
> = {
  gastricChlorideM: { label: 'Chloride in gastric medium', min: 0, max: 5, unit: 'mol/L' },
  gastricPh: { label: 'Gastric pH', min: 0, max: 14 },
  microenvironmentPh: { label: 'Microenvironment pH', min: 0, max: 14 },
  temperatureC: { label: 'Temperature', min: 0, max: 100, unit: '°C' },
  cocrystalBelow: { label: 'Cocrystal below ΔpKa', min: -10, max: 10 },
  saltAbove: { label: 'Salt above ΔpKa', min: -10, max: 15 },
  stableSaltMin: { label: 'Stable salt from ΔpKa', min: -10, max: 15 },
};

/**
 * Validate the conditions form into the project's own settings and the screening block, or into
 * field messages. Nothing half-valid comes out.
 */
export function conditionsFromDraft(
  draft: ConditionsDraft,
  project: ProjectSettings,
  current: ScreeningSettings,
):
  | { ok: true; projectSettings: ProjectSettings; screening: ScreeningSettings }
  | { ok: false; errors: ConditionsErrors } {
  const errors: ConditionsErrors = {};
  const num: Partial<Record<keyof typeof RANGES, number>> = {};
  // An empty microenvironment pH means "not stated": the assumed value is used and said.
  const microStated = draft.microenvironmentPh.trim() !== '';
  for (const [key, r] of Object.entries(RANGES) as [
    keyof typeof RANGES,
    (typeof RANGES)[keyof typeof RANGES],
  ][]) {
    if (key === 'microenvironmentPh' && !microStated) continue;
    const t = draft[key].trim().replace(',', '.').replace('−', '-');
    const x = t === '' ? Number.NaN : Number(t);
    if (!Number.isFinite(x)) errors[key] = `${r.label} must be a number`;
    else if (x < r.min || x > r.max)
      errors[key] = `${r.label} must be from ${r.min} to ${r.max}${r.unit ? ' ' + r.unit : ''}`;
    else num[key] = x;
  }
  if (
    num.cocrystalBelow !== undefined &&
    num.saltAbove !== undefined &&
    num.cocrystalBelow >= num.saltAbove
  ) {
    errors.saltAbove = 'The salt band must start above the cocrystal band';
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  if (!microStated) num.microenvironmentPh = ASSUMED_MICROENVIRONMENT_PH;
  const projectSettings = projectSettingsSchema.parse({
    ...project,
    gastricChlorideM: num.gastricChlorideM,
    microenvironmentPh: num.microenvironmentPh,
    microenvironmentPhStated: microStated,
    temperatureC: num.temperatureC,
  });
  const screening = screeningSettingsSchema.parse({
    ...current,
    gastricPh: num.gastricPh,
    gastricChlorideM: num.gastricChlorideM,
    microenvironmentPh: num.microenvironmentPh,
    microenvironmentPhStated: microStated,
    temperatureK: celsiusToKelvin(num.temperatureC!),
    activityModel: draft.activityModel,
    deltaPkaBands: {
      cocrystalBelow: num.cocrystalBelow,
      saltAbove: num.saltAbove,
      stableSaltMin: num.stableSaltMin,
    },
  });
  return { ok: true, projectSettings, screening };
}

export const CONDITION_FIELDS = RANGES;

/**
 * The fields this form owns, shaped like the stored project settings (three at the top level, the rest
 * in the screening block): what `projectsRepo.changeSettings` compares, so only the fields that differ
 * from what the form started from are written.
 */
export function conditionsSettingsShape(
  r: { projectSettings: ProjectSettings; screening: ScreeningSettings },
  screeningKey: string,
) {
  return {
    gastricChlorideM: r.projectSettings.gastricChlorideM,
    microenvironmentPh: r.projectSettings.microenvironmentPh,
    microenvironmentPhStated: r.projectSettings.microenvironmentPhStated,
    temperatureC: r.projectSettings.temperatureC,
    extra: {
      [screeningKey]: {
        gastricPh: r.screening.gastricPh,
        activityModel: r.screening.activityModel,
        deltaPkaBands: { ...r.screening.deltaPkaBands },
      },
    },
  };
}
