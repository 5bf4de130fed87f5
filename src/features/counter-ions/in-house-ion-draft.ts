import {
  ChemInputError,
  parseFormula,
  parseStructure,
  sameElements,
  type AcceptabilityClass,
  type buildCustomCounterIon,
} from '@/chem';

/** The in-house ion form as typed. */
export interface InHouseDraft {
  name: string;
  kind: 'anion' | 'cation';
  formula: string;
  charge: string;
  pKas: string;
  pKaSource: string;
  acceptabilityClass: string;
  ionSmiles: string;
  tradeNote: string;
}

export const EMPTY_IN_HOUSE_DRAFT: InHouseDraft = {
  name: '',
  kind: 'anion',
  formula: '',
  charge: '-1',
  pKas: '',
  pKaSource: '',
  acceptabilityClass: '',
  ionSmiles: '',
  tradeNote: '',
};

export type InHouseErrors = Partial<Record<keyof InHouseDraft, string>>;
type Rings = { aromatic: number; nonAromatic: number };

/** The charge and pKa values as numbers, or the fields' messages. */
export function readChargeAndPKas(
  draft: InHouseDraft,
): { ok: true; charge: number; pKas: number[] } | { ok: false; errors: InHouseErrors } {
  const errors: InHouseErrors = {};
  const charge = Number(draft.charge.replace('−', '-').replace('+', ''));
  if (!Number.isInteger(charge)) errors.charge = 'Charge must be a whole number';
  const pkTexts = draft.pKas
    .split(/[;\s]+|,\s*/)
    .map((s) => s.trim())
    .filter(Boolean);
  const pKas = pkTexts.map((t) => Number(t.replace('−', '-')));
  if (pKas.some((v) => !Number.isFinite(v)))
    errors.pKas = 'pKa values must be numbers, separated by commas';
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, charge, pKas };
}

/**
 * The ring counts from the ion's SMILES (none without one), after checking that the SMILES reads and
 * matches the typed formula and charge; otherwise the field's message.
 */
export async function ringsFromSmiles(
  draft: InHouseDraft,
  charge: number,
): Promise<{ ok: true; rings: Rings } | { ok: false; errors: InHouseErrors }> {
  if (!draft.ionSmiles.trim()) return { ok: true, rings: { aromatic: 0, nonAromatic: 0 } };
  let s;
  try {
    s = await parseStructure(draft.ionSmiles);
  } catch (err) {
    const message =
      err instanceof ChemInputError
        ? err.message.replace(/^smiles: /, '')
        : 'Cannot read this SMILES';
    return { ok: false, errors: { ionSmiles: message } };
  }
  let typed;
  try {
    typed = parseFormula(draft.formula, 'formula').elements;
  } catch (err) {
    const message =
      err instanceof Error ? err.message.replace(/^formula: /, '') : 'Cannot read this formula';
    return { ok: false, errors: { formula: message } };
  }
  if (!sameElements(typed, s.elements))
    return { ok: false, errors: { formula: `The formula differs from the SMILES (${s.formula})` } };
  if (s.netCharge !== charge)
    return { ok: false, errors: { charge: `The SMILES carries charge ${s.netCharge}` } };
  return { ok: true, rings: s.rings };
}

/** The core's input for a custom counter-ion, from the checked draft. */
export function customIonInput(
  draft: InHouseDraft,
  charge: number,
  pKas: number[],
  rings: Rings,
): Parameters<typeof buildCustomCounterIon>[0] {
  return {
    name: draft.name,
    kind: draft.kind,
    formula: draft.formula,
    charge,
    ionSmiles: draft.ionSmiles,
    pKas,
    pKaSource: draft.pKaSource,
    acceptabilityClass:
      draft.acceptabilityClass === ''
        ? null
        : (Number(draft.acceptabilityClass) as AcceptabilityClass),
    tradeNote: draft.tradeNote,
    aromaticRings: rings.aromatic,
    nonAromaticRings: rings.nonAromatic,
  };
}

/** A failed save as a field message: the core's input error on its field, anything else on the name. */
export function errorsOfFailedSave(err: unknown): InHouseErrors {
  if (err instanceof ChemInputError) {
    const key = (err.field in EMPTY_IN_HOUSE_DRAFT ? err.field : 'name') as keyof InHouseDraft;
    return { [key]: err.message.replace(/^[^:]+: /, '') };
  }
  return { name: err instanceof Error ? err.message : 'Could not save the ion' };
}
