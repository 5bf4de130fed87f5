import { z } from 'zod';

/**
 * The plan of a salt screen on one plate, as a user writes it (the `plan` block of `saltsmith plan
 * --input`, and what the app stores): which counter-ions, which solvents, how many equivalents, which
 * crystallisation methods, how much drug and solvent per well, which plate, and optional stock solutions.
 */

/** Ways to bring a salt out of solution in a screen (the usual names of the trade). */
export const CRYSTALLISATION_METHODS = [
  'slurry',
  'cooling',
  'evaporation',
  'anti-solvent',
] as const;
export type CrystallisationMethod = (typeof CRYSTALLISATION_METHODS)[number];

const id = z.string().trim().min(1).max(80);
/** Equivalents of the counter-ion's parent per mole of drug: above 0 and at most 4. */
const equivalent = z.number().gt(0).max(4);
const equivalentLevels = z.union([equivalent, z.array(equivalent).min(1).max(4)]);

export const stockSolutionSchema = z
  .object({
    /** Solvent id of the stock solution. */
    solvent: id,
    /** Concentration of the counter-ion's parent, mol/L. */
    molar: z.number().gt(0).max(20),
  })
  .strict();
export type StockSolution = z.infer<typeof stockSolutionSchema>;

export const platePlanSchema = z
  .object({
    counterIons: z.array(id).min(1).max(96),
    solvents: z.array(id).min(1).max(96),
    /** One level or several for every counter-ion, or per counter-ion id; missing ions take their default. */
    equivalents: z.union([equivalentLevels, z.record(id, equivalentLevels)]).optional(),
    methods: z.array(z.enum(CRYSTALLISATION_METHODS)).min(1).max(4).optional(),
    apiMgPerWell: z.number().gt(0).max(1000),
    solventUlPerWell: z.number().gt(0).max(20000),
    plate: z.union([z.literal(24), z.literal(48), z.literal(96)]),
    stock: z.record(id, stockSolutionSchema).optional(),
    allowClass1: z.boolean().optional(),
  })
  .strict();
export type PlatePlanInput = z.infer<typeof platePlanSchema>;

/** What came out of a well (recorded by the lab after the screen). */
export const WELL_OUTCOMES = [
  'clear-solution',
  'oil-or-gum',
  'amorphous-solid',
  'crystalline-solid',
  'new-crystalline-form',
] as const;
export type WellOutcomeKind = (typeof WELL_OUTCOMES)[number];

/** Words for each outcome, as the app and the pick list show them. */
export const WELL_OUTCOME_LABELS: Record<WellOutcomeKind, string> = {
  'clear-solution': 'clear solution',
  'oil-or-gum': 'oil or gum',
  'amorphous-solid': 'amorphous solid',
  'crystalline-solid': 'crystalline solid',
  'new-crystalline-form': 'new crystalline form (XRPD)',
};

export const wellOutcomeSchema = z
  .object({
    outcome: z.enum(WELL_OUTCOMES),
    /** Melting point of the solid, °C (onset), or null. */
    meltingPointC: z.number().min(-50).max(500).nullable(),
    note: z.string().max(2000),
  })
  .strict();
export type WellOutcome = z.infer<typeof wellOutcomeSchema>;
