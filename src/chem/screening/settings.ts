import { z } from 'zod';
import { ChemInputError } from '../result';
import { celsiusToKelvin } from '../units/temperature';

/**
 * Screening settings, validated with zod (the app keeps them in the project's `settings.extra.screening`).
 * Defaults and their basis:
 * - weights: equal 1 for the main criteria, 0.5 for mass cost and hygroscopicity (our own default;
 *   the user edits them);
 * - ΔpKa bands: Cruz-Cabeza 2012 (−1, 4) and the common-practice minimum 2 (Stahl & Wermuth 2002);
 * - gastric medium: pH 1.2 with 0.12 M chloride (USP simulated gastric fluid composition, from memory;
 *   the project setting `gastricChlorideM` overrides it);
 * - microenvironment pH: 7 (project setting) taken as an assumption until it is stated
 *   (`microenvironmentPhStated`) or the formulation's excipients are chosen (`excipients`, bundled ids
 *   of excipients.data.ts), which then replace it; 37 °C (ICH M9 temperature);
 * - salt anchor 2 decades above S₀ (see ksp-estimate.ts, common practice);
 * - pKa uncertainty by origin for the rank-robustness draw: measured 0.1, literature 0.3, predicted
 *   0.7 pKa units (our assumption; predicted pKa values are commonly quoted at ±0.5–1 unit); a pKa whose
 *   origin is not stated gets the predicted σ (nothing says it is better than a prediction).
 */
export const screeningWeightsSchema = z.object({
  saltFormation: z.number().min(0).max(10).default(1),
  solubility: z.number().min(0).max(10).default(1),
  gastric: z.number().min(0).max(10).default(1),
  disproportionation: z.number().min(0).max(10).default(1),
  massCost: z.number().min(0).max(10).default(0.5),
  acceptability: z.number().min(0).max(10).default(1),
  hygroscopicity: z.number().min(0).max(10).default(0.5),
});
export type ScreeningWeights = z.infer<typeof screeningWeightsSchema>;
export type CriterionKey = keyof ScreeningWeights;
export const CRITERIA: readonly CriterionKey[] = [
  'saltFormation',
  'solubility',
  'gastric',
  'disproportionation',
  'massCost',
  'acceptability',
  'hygroscopicity',
];

/** The microenvironment pH assumed until the formulation's pH is stated or its excipients chosen. */
export const ASSUMED_MICROENVIRONMENT_PH = 7;

export const mediumSchema = z.object({
  id: z.string().min(1).max(60),
  label: z.string().min(1).max(120),
  pH: z.number().min(0).max(14),
  /** Counter-ions present, by library id, mol/L (e.g. { chloride: 0.12 }). */
  ions: z.record(z.string(), z.number().min(0).max(20)).default({}),
  /** Ionic strength of the medium, mol/L, for the Davies option. */
  ionicStrengthM: z.number().min(0).max(5).default(0),
});
export type ScreeningMedium = z.infer<typeof mediumSchema>;

export const screeningSettingsSchema = z.object({
  weights: screeningWeightsSchema.default(screeningWeightsSchema.parse({})),
  deltaPkaBands: z
    .object({
      cocrystalBelow: z.number().min(-10).max(10).default(-1),
      saltAbove: z.number().min(-10).max(15).default(4),
      stableSaltMin: z.number().min(-10).max(15).default(2),
    })
    .refine(
      (b) => b.cocrystalBelow < b.saltAbove,
      'the cocrystal band must lie below the salt band',
    )
    .default({ cocrystalBelow: -1, saltAbove: 4, stableSaltMin: 2 }),
  gastricPh: z.number().min(0).max(14).default(1.2),
  gastricChlorideM: z.number().min(0).max(5).default(0.12),
  /** Extra media the user defines (buffers with their counter-ions). */
  media: z.array(mediumSchema).max(20).default([]),
  microenvironmentPh: z.number().min(0).max(14).default(ASSUMED_MICROENVIRONMENT_PH),
  /** True when the user gave the microenvironment pH; false: 7 (or the value) is only assumed. */
  microenvironmentPhStated: z.boolean().default(false),
  /** The formulation's excipients (bundled ids); when any are chosen they replace the single pH. */
  excipients: z.array(z.string().min(1).max(60)).max(40).default([]),
  temperatureK: z
    .number()
    .min(celsiusToKelvin(0))
    .max(celsiusToKelvin(100))
    .default(celsiusToKelvin(37)),
  activityModel: z.enum(['ideal', 'davies']).default('ideal'),
  /** Ionic strength of the dissolution media for the Davies option, mol/L. */
  backgroundIonicStrengthM: z.number().min(0).max(5).default(0.1),
  phGrid: z
    .object({
      from: z.number().min(0).max(14).default(1),
      to: z.number().min(0).max(14).default(8),
      step: z.number().min(0.01).max(2).default(0.1),
    })
    .default({ from: 1, to: 8, step: 0.1 }),
  saltAnchorLog10: z.number().min(0).max(6).default(2),
  pkaSigmaByOrigin: z
    .object({
      measured: z.number().min(0).max(3).default(0.1),
      literature: z.number().min(0).max(3).default(0.3),
      predicted: z.number().min(0).max(3).default(0.7),
      'not-stated': z.number().min(0).max(3).default(0.7),
    })
    .default({ measured: 0.1, literature: 0.3, predicted: 0.7, 'not-stated': 0.7 }),
});
export type ScreeningSettings = z.infer<typeof screeningSettingsSchema>;

const parsedSettingsMemo = new Map<string, string>();

/**
 * Validate settings, turning a zod failure into a ChemInputError that names the first bad field
 * (e.g. `temperatureK` below 273.15 K), so callers see one error type for bad input.
 */
export function parseScreeningSettings(input: unknown): ScreeningSettings {
  // Settings already checked (checkScreeningSettings) are frozen: passed through, not parsed again.
  if (isCheckedScreeningSettings(input)) return input;
  // Memoised by the input's JSON text (settings are plain data): a batch parses the same settings for
  // every compound. Each call gets its own copy, so a caller that edits the result changes nothing else.
  let key: string | null = null;
  try {
    key = JSON.stringify(input ?? {});
  } catch {
    key = null; // not plain data: the schema decides
  }
  const hit = key === null ? undefined : parsedSettingsMemo.get(key);
  if (hit !== undefined) return JSON.parse(hit) as ScreeningSettings;
  const r = screeningSettingsSchema.safeParse(input ?? {});
  if (r.success) {
    // only when the parsed settings survive JSON unchanged (they are numbers, strings, records, lists)
    if (key !== null && key.length <= 20_000) {
      if (parsedSettingsMemo.size >= 32) parsedSettingsMemo.clear();
      parsedSettingsMemo.set(key, JSON.stringify(r.data));
    }
    return r.data;
  }
  const issue = r.error.issues[0]!;
  const field = `settings.${issue.path.map(String).join('.') || 'root'}`;
  throw new ChemInputError(
    field,
    issue.message,
    'see screeningSettingsSchema (settings.ts) for each field’s range',
  );
}

declare const checkedScreeningSettings: unique symbol;

/**
 * Screening settings checked once by {@link checkScreeningSettings}: deep-frozen, so one value can be
 * shared by every screen that reads it (a batch screens thousands of compounds with the same settings),
 * and {@link parseScreeningSettings} passes it through instead of parsing it again.
 */
export type CheckedScreeningSettings = ScreeningSettings & {
  readonly [checkedScreeningSettings]: true;
};

const checkedSettings = new WeakSet<object>();

function isCheckedScreeningSettings(input: unknown): input is CheckedScreeningSettings {
  return typeof input === 'object' && input !== null && checkedSettings.has(input);
}

function deepFreeze(value: unknown): void {
  if (typeof value !== 'object' || value === null || Object.isFrozen(value)) return;
  Object.freeze(value);
  for (const v of Object.values(value)) deepFreeze(v);
}

/**
 * The one check of screening settings at an edge (the CLI's flags or input file, a batch's settings):
 * parsed as {@link parseScreeningSettings} does (same errors), then frozen and marked as checked.
 */
export function checkScreeningSettings(input: unknown): CheckedScreeningSettings {
  if (isCheckedScreeningSettings(input)) return input;
  const settings = parseScreeningSettings(input);
  deepFreeze(settings);
  checkedSettings.add(settings);
  return settings as CheckedScreeningSettings;
}
