import { z } from 'zod';
import { compoundSchema, type Compound } from '@/chem';

/** The new-project form as typed: every field is text until it validates. */
export interface NewProjectDraft {
  name: string;
  smiles: string;
  formula: string;
  kind: 'base' | 'acid';
  pKa: string;
  ionCharge: string;
}

export const EMPTY_NEW_PROJECT: NewProjectDraft = {
  name: '',
  smiles: '',
  formula: '',
  kind: 'base',
  pKa: '',
  ionCharge: '1',
};

export type NewProjectErrors = Partial<Record<keyof NewProjectDraft, string>>;

/** Characters OpenSMILES allows in a structure string (atoms, bonds, rings, branches, charges, stereo). */
const SMILES_CHARS = /^[A-Za-z0-9@+\-[\]()=#$:/\\.%*]+$/;
/** A molecular formula: element symbols with optional counts, e.g. C18H20ClN3O. */
const FORMULA = /^(?:[A-Z][a-z]?\d*)+$/;

const draftSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the project a name').max(120, 'At most 120 characters'),
    smiles: z
      .string()
      .trim()
      .max(2000, 'At most 2000 characters')
      .refine(
        (s) => s === '' || SMILES_CHARS.test(s),
        'Not a SMILES string: no spaces or other characters',
      ),
    formula: z
      .string()
      .trim()
      .max(200)
      .refine(
        (s) => s === '' || FORMULA.test(s),
        'Write a formula as element symbols and counts, e.g. C18H20ClN3O',
      ),
    kind: z.enum(['base', 'acid']),
    pKa: z
      .string()
      .trim()
      .min(1, 'Give the pKa (you can add more later)')
      .transform((s) => Number(s.replace(',', '.')))
      .pipe(
        z
          .number({ error: 'pKa must be a number' })
          .min(-10, 'pKa must be at least −10')
          .max(20, 'pKa must be at most 20'),
      ),
    ionCharge: z
      .string()
      .trim()
      .transform((s) => Number(s.replace('−', '-')))
      .pipe(
        z
          .number({ error: 'Charge must be a whole number' })
          .int('Charge must be a whole number')
          .min(-3)
          .max(3),
      ),
  })
  .superRefine((d, ctx) => {
    if (d.smiles === '' && d.formula === '') {
      ctx.addIssue({
        code: 'custom',
        path: ['smiles'],
        message: 'Give a SMILES string or a molecular formula',
      });
    }
    if (d.kind === 'base' && d.ionCharge <= 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['ionCharge'],
        message: 'A base forms a cation: charge +1, +2 or +3',
      });
    }
    if (d.kind === 'acid' && d.ionCharge >= 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['ionCharge'],
        message: 'An acid forms an anion: charge −1, −2 or −3',
      });
    }
  });

/**
 * Validate the new-project form. The compound gets the values the user gave; everything else starts
 * empty (no invented defaults) and is filled in the Compound area.
 */
export function newProjectFromDraft(
  draft: NewProjectDraft,
): { ok: true; name: string; compound: Compound } | { ok: false; errors: NewProjectErrors } {
  const parsed = draftSchema.safeParse(draft);
  if (!parsed.success) {
    const errors: NewProjectErrors = {};
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? 'name') as keyof NewProjectDraft;
      errors[key] ??= issue.message;
    }
    return { ok: false, errors };
  }
  const d = parsed.data;
  const compound = compoundSchema.parse({
    name: d.name,
    smiles: d.smiles,
    formula: d.formula,
    kind: d.kind,
    pKas: [{ value: d.pKa, origin: 'not-stated' }],
    ionCharge: d.ionCharge,
    intrinsicSolubilityMgPerMl: null,
    meltingPointC: null,
    logP: null,
    logPOrigin: null,
    doseMg: null,
    densityGPerCm3: null,
    notes: '',
  });
  return { ok: true, name: d.name, compound };
}
