import { ChemInputError, compoundSchema, parseFormula, type Compound } from '@/chem';

/** The compound form's draft: every field as the text the user typed. */
export interface CompoundDraft {
  name: string;
  smiles: string;
  formula: string;
  kind: 'base' | 'acid';
  pKas: string;
  pKaOrigin: 'measured' | 'literature' | 'predicted' | 'not-stated';
  ionCharge: string;
  intrinsicSolubilityMgPerMl: string;
  /** Where S₀ comes from; '' is not stated (screened with the predicted σ, never shown as measured). */
  intrinsicSolubilityOrigin: '' | 'measured' | 'literature' | 'predicted';
  meltingPointC: string;
  logP: string;
  logPOrigin: '' | 'measured' | 'computed' | 'literature';
  doseMg: string;
  densityGPerCm3: string;
  cellVolumeA3: string;
  formulaUnitsPerCell: string;
  notes: string;
}

export function draftFromCompound(c: Compound): CompoundDraft {
  const num = (x: number | null) => (x === null ? '' : String(x));
  return {
    name: c.name,
    smiles: c.smiles,
    formula: c.formula,
    kind: c.kind,
    pKas: c.pKas.map((p) => p.value).join(', '),
    pKaOrigin: c.pKas[0]?.origin ?? 'not-stated',
    ionCharge: String(c.ionCharge),
    intrinsicSolubilityMgPerMl: num(c.intrinsicSolubilityMgPerMl),
    intrinsicSolubilityOrigin:
      !c.intrinsicSolubilityOrigin || c.intrinsicSolubilityOrigin === 'not-stated'
        ? ''
        : c.intrinsicSolubilityOrigin,
    meltingPointC: num(c.meltingPointC),
    logP: num(c.logP),
    logPOrigin: c.logPOrigin ?? '',
    doseMg: num(c.doseMg),
    densityGPerCm3: num(c.densityGPerCm3),
    cellVolumeA3: num(c.cellVolumeA3 ?? null),
    formulaUnitsPerCell: num(c.formulaUnitsPerCell ?? null),
    notes: c.notes,
  };
}

export type FieldErrors = Partial<Record<keyof CompoundDraft, string>>;

/** Parse a decimal typed by a person: accepts a comma as decimal mark; '' is null. */
function parseOptionalNumber(text: string): number | null | typeof NaN {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : NaN;
}

/**
 * Turn a draft into a valid compound, or into messages keyed by field. Nothing half-valid comes out:
 * either every field passes or the caller keeps the previous good compound.
 */
export function compoundFromDraft(
  draft: CompoundDraft,
  previous: Compound,
): { ok: true; compound: Compound } | { ok: false; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const numberField = (key: keyof CompoundDraft, label: string): number | null => {
    const x = parseOptionalNumber(draft[key]);
    if (Number.isNaN(x)) {
      errors[key] = `${label} must be a number`;
      return null;
    }
    return x as number | null;
  };
  const pKaValues = readPKas(draft.pKas, errors);

  const ionCharge = Number(draft.ionCharge);
  const candidate = {
    ...previous,
    name: draft.name,
    smiles: draft.smiles.trim(),
    formula: draft.formula.trim(),
    kind: draft.kind,
    pKas: pKaValues.map((value) => ({ value, origin: draft.pKaOrigin })),
    ionCharge,
    intrinsicSolubilityMgPerMl: numberField('intrinsicSolubilityMgPerMl', 'Intrinsic solubility'),
    intrinsicSolubilityOrigin:
      draft.intrinsicSolubilityOrigin === '' ? null : draft.intrinsicSolubilityOrigin,
    meltingPointC: numberField('meltingPointC', 'Melting point'),
    logP: numberField('logP', 'log P'),
    logPOrigin: draft.logPOrigin === '' ? null : draft.logPOrigin,
    doseMg: numberField('doseMg', 'Dose'),
    densityGPerCm3: numberField('densityGPerCm3', 'Density'),
    cellVolumeA3: numberField('cellVolumeA3', 'Cell volume'),
    formulaUnitsPerCell: numberField('formulaUnitsPerCell', 'Z'),
    notes: draft.notes,
  };
  checkFormula(draft, errors);
  if ((candidate.cellVolumeA3 === null) !== (candidate.formulaUnitsPerCell === null)) {
    const missing = candidate.cellVolumeA3 === null ? 'cellVolumeA3' : 'formulaUnitsPerCell';
    errors[missing] ??= 'Give both the cell volume and Z, or neither';
  }
  if (candidate.logP !== null && candidate.logPOrigin === null) candidate.logPOrigin = 'measured';
  const chargeError = ionChargeError(draft.kind, ionCharge, pKaValues.length);
  if (chargeError) errors.ionCharge = chargeError;
  const parsed = compoundSchema.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? 'name') as keyof CompoundDraft;
      errors[key] ??= issue.message;
    }
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, compound: parsed.data! };
}

/** pKa values typed as a list (commas, semicolons or spaces); a message in `errors` if unreadable. */
function readPKas(text: string, errors: FieldErrors): number[] {
  const pKaTexts = text
    .split(/[;\s]+|,\s+/)
    .map((s) => s.trim())
    .filter(Boolean);
  const pKaValues = pKaTexts.map((s) => Number(s.replace(',', '.')));
  if (pKaTexts.length === 0) errors.pKas = 'Give at least one pKa';
  else if (pKaValues.some((x) => !Number.isFinite(x)))
    errors.pKas = 'pKa values must be numbers, separated by commas';
  return pKaValues;
}

/** The formula must read as a neutral free form; without a SMILES it is required. */
function checkFormula(draft: CompoundDraft, errors: FieldErrors): void {
  const formulaText = draft.formula.trim();
  if (formulaText !== '') {
    try {
      const f = parseFormula(formulaText, 'formula');
      if (f.charge !== 0) errors.formula = 'Give the neutral free form, without a charge';
    } catch (err) {
      errors.formula =
        err instanceof ChemInputError
          ? err.message.replace(/^formula: /, '')
          : 'Cannot read this formula';
    }
  } else if (draft.smiles.trim() === '') {
    errors.formula = 'Give a SMILES or a molecular formula';
  }
}

/** Why the ion charge does not fit the kind or the number of pKa values, or null. */
function ionChargeError(
  kind: CompoundDraft['kind'],
  ionCharge: number,
  pKaCount: number,
): string | null {
  if (kind === 'base' && ionCharge < 0) return 'A base forms a cation: charge must be +1, +2 or +3';
  if (kind === 'acid' && ionCharge > 0)
    return 'An acid forms an anion: charge must be −1, −2 or −3';
  if (Number.isInteger(ionCharge) && pKaCount > 0 && Math.abs(ionCharge) > pKaCount)
    return `A charge of ${Math.abs(ionCharge)} needs ${Math.abs(ionCharge)} pKa values (one per ionised group)`;
  return null;
}

/** Every field of the form, in display order. */
export const DRAFT_KEYS: readonly (keyof CompoundDraft)[] = [
  'name',
  'smiles',
  'formula',
  'kind',
  'pKas',
  'pKaOrigin',
  'ionCharge',
  'intrinsicSolubilityMgPerMl',
  'intrinsicSolubilityOrigin',
  'meltingPointC',
  'logP',
  'logPOrigin',
  'doseMg',
  'densityGPerCm3',
  'cellVolumeA3',
  'formulaUnitsPerCell',
  'notes',
];

/**
 * The stored compound fields a form field writes. Fields that only make sense together travel
 * together (a log P with its origin, a cell volume with its Z; the pKa origin lives on the pKas).
 */
const FIELDS_OF: Record<keyof CompoundDraft, readonly (keyof Compound)[]> = {
  name: ['name'],
  smiles: ['smiles'],
  formula: ['formula'],
  kind: ['kind'],
  pKas: ['pKas'],
  pKaOrigin: ['pKas'],
  ionCharge: ['ionCharge'],
  intrinsicSolubilityMgPerMl: ['intrinsicSolubilityMgPerMl'],
  intrinsicSolubilityOrigin: ['intrinsicSolubilityOrigin'],
  meltingPointC: ['meltingPointC'],
  logP: ['logP', 'logPOrigin'],
  logPOrigin: ['logPOrigin'],
  doseMg: ['doseMg'],
  densityGPerCm3: ['densityGPerCm3'],
  cellVolumeA3: ['cellVolumeA3', 'formulaUnitsPerCell'],
  formulaUnitsPerCell: ['cellVolumeA3', 'formulaUnitsPerCell'],
  notes: ['notes'],
};

/**
 * The part of a valid compound that the edited form fields own: what a field-level save writes,
 * so that the other fields keep whatever is stored (perhaps written by another tab meanwhile).
 */
export function changesFor(
  compound: Compound,
  edited: Iterable<keyof CompoundDraft>,
): Partial<Compound> {
  const out: Record<string, unknown> = {};
  for (const key of edited) {
    for (const field of FIELDS_OF[key]) out[field] = compound[field] ?? null;
  }
  return out as Partial<Compound>;
}

const NUMERIC_KEYS = new Set<keyof CompoundDraft>([
  'intrinsicSolubilityMgPerMl',
  'meltingPointC',
  'logP',
  'doseMg',
  'densityGPerCm3',
  'cellVolumeA3',
  'formulaUnitsPerCell',
  'ionCharge',
]);

/**
 * True when the text on screen already says what is stored ("150." and "150", "7,8" and "7.8"), so
 * that taking over the stored value would only rewrite what the user is typing.
 */
export function sameFieldValue(key: keyof CompoundDraft, shown: string, stored: string): boolean {
  if (shown === stored) return true;
  if (NUMERIC_KEYS.has(key)) {
    const a = parseOptionalNumber(shown);
    const b = parseOptionalNumber(stored);
    return a === b;
  }
  if (key === 'pKas') {
    const list = (t: string) =>
      t
        .split(/[;\s]+|,\s+/)
        .filter(Boolean)
        .map((x) => Number(x.replace(',', '.')))
        .join(' ');
    return list(shown) === list(stored);
  }
  if (key === 'smiles' || key === 'formula') return shown.trim() === stored.trim();
  return false;
}
