import { z } from 'zod';

/**
 * The compound a formulator screens: the drug as a weak base or acid, with the data the screening
 * models use. Validated with zod at every trust boundary (form input, stored records, files, CLI).
 * Units live in field names: mg/mL, °C, mg, g/cm³.
 */
/** Where a pKa comes from; 'not-stated' (the default of a new compound) is screened with the predicted σ. */
export const pkaOriginSchema = z.enum(['measured', 'literature', 'predicted', 'not-stated']);
export type PkaOrigin = z.infer<typeof pkaOriginSchema>;

export const pkaEntrySchema = z.object({
  /** pKa at 25 °C in water; for a base, the pKa of its conjugate acid BH⁺. */
  value: z.number().min(-10, 'pKa must be at least −10').max(20, 'pKa must be at most 20'),
  origin: pkaOriginSchema,
});
export type PkaEntry = z.infer<typeof pkaEntrySchema>;

/** Where an entered S₀ comes from. */
export const intrinsicSolubilityOriginSchema = z.enum([
  'measured',
  'literature',
  'predicted',
  'not-stated',
]);
export type IntrinsicSolubilityOrigin = z.infer<typeof intrinsicSolubilityOriginSchema>;

const positiveOrNull = (what: string, max: number) =>
  z
    .number()
    .positive(`${what} must be greater than zero`)
    .max(max, `${what} must be at most ${max}`)
    .nullable();

export const compoundSchema = z.object({
  name: z.string().trim().min(1, 'Give the compound a name').max(120),
  /** OpenSMILES of the neutral free form; empty when the formula alone is given. */
  smiles: z.string().max(2000),
  /** Molecular formula of the neutral free form (Hill order or any order), e.g. C17H22N2O2. */
  formula: z.string().max(200),
  kind: z.enum(['base', 'acid']),
  pKas: z.array(pkaEntrySchema).min(1, 'Give at least one pKa').max(4),
  /** Charge of the salt-forming drug ion: +1/+2 for a base, −1/−2 for an acid. */
  ionCharge: z
    .number()
    .int()
    .min(-3)
    .max(3)
    .refine((charge) => charge !== 0, 'The drug ion cannot be neutral'),
  /** Intrinsic solubility S₀ of the free form, mg/mL, when known (else the General Solubility Equation). */
  intrinsicSolubilityMgPerMl: positiveOrNull('Intrinsic solubility', 1e4),
  /**
   * Where S₀ comes from (its σ follows: screen-context.ts). Absent or null: not stated — never read as
   * measured (added after version 1 records).
   */
  intrinsicSolubilityOrigin: intrinsicSolubilityOriginSchema.nullable().optional(),
  /** Melting point of the free form, °C. */
  meltingPointC: z.number().min(-100).max(600).nullable(),
  /** log P (octanol/water) of the neutral form. */
  logP: z.number().min(-10).max(15).nullable(),
  logPOrigin: z.enum(['measured', 'computed', 'literature']).nullable(),
  /**
   * Highest single therapeutic dose, mg (as free form), from 0.000001 to 100000 mg: the range `saltsmith screen --dose` accepts (a dose of 1e-320 mg is a
   * number but no dose; the bounds are common practice, far outside any medicine).
   */
  doseMg: positiveOrNull('Dose', 1e5).refine(
    (v) => v === null || v >= 1e-6,
    'Dose must be at least 0.000001 mg',
  ),
  /** Measured true density of the free form, g/cm³. */
  densityGPerCm3: positiveOrNull('Density', 30),
  /** Unit-cell volume of the free form's crystal structure, Å³ (optional; added after version 1 records). */
  cellVolumeA3: positiveOrNull('Cell volume', 1e6).optional(),
  /** Formula units (molecules) per unit cell, Z, for `cellVolumeA3`. */
  formulaUnitsPerCell: z
    .number()
    .int('Z must be a whole number')
    .min(1, 'Z must be at least 1')
    .max(64, 'Z must be at most 64')
    .nullable()
    .optional(),
  notes: z.string().max(5000),
});
export type Compound = z.infer<typeof compoundSchema>;
