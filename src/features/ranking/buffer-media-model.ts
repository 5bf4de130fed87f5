import {
  BIORELEVANT_MEDIA,
  biorelevantMedium,
  mediumSchema,
  type BiorelevantMediumRecord,
  type ScreeningMedium,
} from '@/chem';

/** The buffer form's draft: every field as typed. */
export interface BufferDraft {
  label: string;
  pH: string;
  ionId: string;
  concentrationM: string;
  ionicStrengthM: string;
}

export type BufferErrors = Partial<Record<keyof BufferDraft, string>>;

export const EMPTY_BUFFER: BufferDraft = {
  label: '',
  pH: '',
  ionId: '',
  concentrationM: '',
  ionicStrengthM: '',
};

const num = (t: string): number => {
  const s = t.trim().replace(',', '.').replace('−', '-');
  return s === '' ? Number.NaN : Number(s);
};

/**
 * A user-defined dissolution medium from the form: its pH, one counter-ion it contains (by library id)
 * at a concentration — the common ion the screen applies to salts of that counter-ion — and optionally
 * its ionic strength for the Davies option (defaults to the counter-ion's concentration).
 */
export function bufferFromDraft(
  draft: BufferDraft,
  existing: readonly ScreeningMedium[],
): { ok: true; medium: ScreeningMedium } | { ok: false; errors: BufferErrors } {
  const errors: BufferErrors = {};
  const label = draft.label.trim();
  if (!label) errors.label = 'Give the medium a name';
  else if (existing.some((m) => m.label.toLowerCase() === label.toLowerCase()))
    errors.label = 'A medium of that name exists';
  const pH = num(draft.pH);
  if (!Number.isFinite(pH)) errors.pH = 'pH must be a number';
  else if (pH < 0 || pH > 14) errors.pH = 'pH must be from 0 to 14';
  if (!draft.ionId) errors.ionId = 'Choose the counter-ion the medium contains';
  const c = num(draft.concentrationM);
  if (!Number.isFinite(c)) errors.concentrationM = 'Concentration must be a number';
  else if (c < 0 || c > 20) errors.concentrationM = 'Concentration must be from 0 to 20 mol/L';
  const iText = draft.ionicStrengthM.trim();
  const ionic = iText === '' ? c : num(iText);
  if (iText !== '' && !Number.isFinite(ionic))
    errors.ionicStrengthM = 'Ionic strength must be a number';
  else if (iText !== '' && (ionic < 0 || ionic > 5))
    errors.ionicStrengthM = 'Ionic strength must be from 0 to 5 mol/L';
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const id = `buffer-${
    label
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 40) || 'medium'
  }`;
  const parsed = mediumSchema.safeParse({
    id,
    label,
    pH,
    ions: { [draft.ionId]: c },
    ionicStrengthM: Math.min(ionic, 5),
  });
  if (!parsed.success)
    return {
      ok: false,
      errors: { label: parsed.error.issues[0]?.message ?? 'Not a valid medium' },
    };
  return { ok: true, medium: parsed.data };
}

/** Said beside the presets and in the README: what the workbench does not model in these media. */
export const BIORELEVANT_NOT_MODELLED =
  'Not modelled: solubilisation by the bile salt (sodium taurocholate) and lecithin micelles, the lipids of FeSSIF-V2 and pepsin. The workbench applies each medium’s pH and its common ions (chloride, the buffer anion — phosphate, acetate or maleate — and sodium for salts of acids); a poorly soluble drug usually dissolves better in these media than the numbers here say.';

export interface PresetChoice {
  preset: BiorelevantMediumRecord;
  medium: ScreeningMedium;
  /** True when the project's media already hold it (by id or by name). */
  added: boolean;
}

/** The biorelevant presets as one-click choices, marked when already in the project's media. */
export function presetChoices(existing: readonly ScreeningMedium[]): PresetChoice[] {
  return BIORELEVANT_MEDIA.map((preset) => {
    const medium = biorelevantMedium(preset);
    const added = existing.some(
      (m) => m.id === medium.id || m.label.toLowerCase() === medium.label.toLowerCase(),
    );
    return { preset, medium, added };
  });
}

/** A preset's composition in one line (mmol/L), e.g. "phosphate 28.65, NaCl 105.85, …". */
export function presetComposition(p: BiorelevantMediumRecord): string {
  const parts = [
    p.buffer.species !== 'none' ? `${p.buffer.species} ${p.buffer.mM} mM` : null,
    p.hydrochloricAcidMM > 0 ? `HCl to pH ${p.pH} (≈ ${p.hydrochloricAcidMM.toFixed(1)} mM)` : null,
    p.sodiumHydroxideMM > 0 ? `NaOH ${p.sodiumHydroxideMM} mM` : null,
    `NaCl ${p.sodiumChlorideMM} mM`,
    `sodium taurocholate ${p.sodiumTaurocholateMM} mM`,
    `lecithin ${p.lecithinMM} mM`,
    p.other || null,
    `${p.osmolalityMOsmPerKg} mOsm/kg`,
  ];
  return parts.filter((x): x is string => x !== null).join(', ');
}
