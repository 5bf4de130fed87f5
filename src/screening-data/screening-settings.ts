import {
  ASSUMED_MICROENVIRONMENT_PH,
  CELSIUS_ZERO_K,
  screeningSettingsSchema,
  type ScreeningSettings,
} from '@/chem';
import type { ProjectRecord, ProjectSettings } from '@/persistence/records';

/** Key of the screening block in `project.settings.extra`. */
export const SCREENING_SETTINGS_KEY = 'screening';

/**
 * Whether the project's microenvironment pH was stated by the user. Records written before the flag
 * existed keep their users' explicit values: a value other than the old silent default 7 was typed
 * by someone and counts as stated; a 7 is read as the assumption it most likely was (the number the
 * screen uses is the same either way — only the words change).
 */
export function microenvironmentPhStatedOf(s: ProjectSettings): boolean {
  return s.microenvironmentPhStated ?? s.microenvironmentPh !== ASSUMED_MICROENVIRONMENT_PH;
}

/**
 * The screening settings of a project. Three values live in the project's own settings record
 * (gastric chloride, microenvironment pH, temperature in °C) and win over the screening block; the
 * rest (weights, ΔpKa bands, media, gastric pH, …) live in `settings.extra.screening`. A stored block
 * that no longer validates falls back to the defaults field by field, never to a half-read object.
 */
export function screeningSettingsOf(project: ProjectRecord): ScreeningSettings {
  const stored = project.settings.extra[SCREENING_SETTINGS_KEY];
  const block = stored && typeof stored === 'object' ? (stored as Record<string, unknown>) : {};
  const top = {
    gastricChlorideM: project.settings.gastricChlorideM,
    microenvironmentPh: project.settings.microenvironmentPh,
    microenvironmentPhStated: microenvironmentPhStatedOf(project.settings),
    temperatureK: project.settings.temperatureC + CELSIUS_ZERO_K,
  };
  const full = screeningSettingsSchema.safeParse({ ...block, ...top });
  if (full.success) return full.data;
  // Keep the valid fields of the stored block, drop the rest.
  const keep: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(block)) {
    const trial = screeningSettingsSchema.safeParse({ [key]: value, ...top });
    if (trial.success) keep[key] = value;
  }
  return screeningSettingsSchema.parse({ ...keep, ...top });
}

/** The part of the screening settings stored in `settings.extra.screening` (the rest is top-level). */
export function screeningBlockOf(
  s: ScreeningSettings,
): Omit<
  ScreeningSettings,
  'gastricChlorideM' | 'microenvironmentPh' | 'microenvironmentPhStated' | 'temperatureK'
> {
  const {
    gastricChlorideM: _g,
    microenvironmentPh: _m,
    microenvironmentPhStated: _ms,
    temperatureK: _t,
    ...rest
  } = s;
  return rest;
}
