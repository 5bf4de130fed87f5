import { z } from 'zod';
import { hillFormula, molarMassGPerMol, parseFormula, withHydrogens } from '../compound/formula';
import { ChemInputError } from '../result';
import type { CounterIon } from './counter-ion.types';

const pkaValue = z
  .number()
  .finite()
  .min(-10, 'pKa must be at least −10')
  .max(20, 'pKa must be at most 20');
const classSchema = z.union([z.literal(1), z.literal(2), z.literal(3)]).nullable();
const positiveMass = z.number().finite().positive('Molar mass must be greater than zero').max(5000);

/** Full counter-ion shape (bundled or stored in-house), validated when read back from storage or files. */
export const counterIonSchema = z.object({
  id: z.string().min(1).max(120),
  name: z.string().trim().min(1).max(120),
  synonyms: z.array(z.string().max(120)).max(30),
  kind: z.enum(['anion', 'cation']),
  formula: z.string().min(1).max(200),
  charge: z
    .number()
    .int()
    .min(-4)
    .max(4)
    .refine((c) => c !== 0, 'An ion cannot be neutral'),
  ionSmiles: z.string().max(2000),
  rings: z.object({
    aromatic: z.number().int().min(0).max(30),
    nonAromatic: z.number().int().min(0).max(30),
  }),
  molarMassGPerMol: positiveMass,
  parent: z.object({
    name: z.string().max(200),
    formula: z.string().max(200),
    smiles: z.string().max(2000),
    molarMassGPerMol: positiveMass,
  }),
  pKas: z.array(z.object({ value: pkaValue, source: z.string().min(1).max(500) })).max(6),
  stoichiometries: z
    .array(
      z.object({
        label: z.string().min(1).max(120),
        drugPerSalt: z.number().int().min(1).max(4),
        counterIonPerSalt: z.number().int().min(1).max(4),
        ionCharge: z
          .number()
          .int()
          .min(-4)
          .max(4)
          .refine((c) => c !== 0, 'An ion cannot be neutral'),
        ionFormula: z.string().min(1).max(200),
        ionMolarMassGPerMol: positiveMass,
        pKaIndex: z.number().int().min(0).nullable(),
      }),
    )
    .min(1)
    .max(8),
  acceptabilityClass: classSchema,
  classSource: z.string().max(500),
  thermoId: z.string().optional(),
  referenceOnly: z.boolean().optional(),
  tradeNote: z.string().max(1000),
  sources: z.record(z.string(), z.string()),
});

/**
 * What a person types to add an in-house counter-ion. Formula and charge are required; the molar mass
 * is computed from the formula (never typed), the parent acid/base formula follows from the charge.
 */
export const customCounterIonInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the ion a name').max(80, 'At most 80 characters'),
    kind: z.enum(['anion', 'cation']),
    formula: z.string().trim().min(1, 'Give the ion formula, e.g. C7H7O3S').max(200),
    charge: z
      .number({ error: 'Charge must be a whole number' })
      .int('Charge must be a whole number')
      .min(-3, 'Charge must be between −3 and +3')
      .max(3, 'Charge must be between −3 and +3')
      .refine((c) => c !== 0, 'An ion cannot be neutral'),
    ionSmiles: z.string().trim().max(2000).default(''),
    pKas: z.array(pkaValue).max(4, 'At most four pKa values'),
    pKaSource: z.string().trim().max(300).default(''),
    acceptabilityClass: classSchema,
    tradeNote: z.string().max(500).default(''),
    aromaticRings: z.number().int().min(0).max(20).default(0),
    nonAromaticRings: z.number().int().min(0).max(20).default(0),
  })
  .refine((v) => (v.kind === 'anion' ? v.charge < 0 : v.charge > 0), {
    message: 'An anion needs a negative charge and a cation a positive one',
    path: ['charge'],
  });
export type CustomCounterIonInput = z.input<typeof customCounterIonInputSchema>;

/** Per-project edits of a bundled ion: only these fields may be changed; the original is kept beside them. */
export const counterIonEditSchema = z
  .object({
    pKas: z.array(pkaValue).max(6),
    acceptabilityClass: classSchema,
    tradeNote: z.string().max(1000),
  })
  .partial();
export type CounterIonEdit = z.infer<typeof counterIonEditSchema>;

export const IN_HOUSE_SOURCE = 'in-house entry (entered by the user; not checked by Saltsmith)';
export const EDIT_SOURCE =
  'edited for this project by the user (bundled value kept and restorable)';

/**
 * Build a full in-house {@link CounterIon} from validated form input.
 * @throws ChemInputError when the input is invalid (field named in the error).
 */
export function buildCustomCounterIon(input: CustomCounterIonInput, id: string): CounterIon {
  const parsed = customCounterIonInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new ChemInputError(String(issue.path[0] ?? 'ion'), issue.message, 'see the form hints');
  }
  const v = parsed.data;
  const ion = parseFormula(v.formula, 'formula');
  if (ion.charge !== 0 && ion.charge !== v.charge) {
    throw new ChemInputError(
      'formula',
      `the formula says charge ${ion.charge} but the charge field says ${v.charge}`,
      'one charge',
    );
  }
  // Parent acid: the anion plus its protons; parent base: the cation minus its protons when it has them.
  let parentElements = ion.elements;
  if (v.kind === 'anion') parentElements = withHydrogens(ion.elements, -v.charge);
  else if ((ion.elements.H ?? 0) >= v.charge)
    parentElements = withHydrogens(ion.elements, -v.charge);
  const mass = molarMassGPerMol(ion.elements);
  const pKas = [...v.pKas]
    .sort((a, b) => a - b)
    .map((value) => ({ value, source: v.pKaSource || IN_HOUSE_SOURCE }));
  const n = Math.abs(v.charge);
  const stoich =
    v.kind === 'anion'
      ? { label: `${v.name} (${n}:1)`, drugPerSalt: n, counterIonPerSalt: 1 }
      : { label: `${v.name} (${n}:1)`, drugPerSalt: n, counterIonPerSalt: 1 };
  const pKaIndex =
    pKas.length === 0
      ? null
      : v.kind === 'anion'
        ? Math.min(n - 1, pKas.length - 1)
        : pKas.length - n >= 0
          ? pKas.length - n
          : 0;
  return {
    id,
    name: v.name,
    synonyms: [],
    kind: v.kind,
    formula: ion.hill,
    charge: v.charge,
    ionSmiles: v.ionSmiles,
    rings: { aromatic: v.aromaticRings, nonAromatic: v.nonAromaticRings },
    molarMassGPerMol: Math.round(mass * 1e4) / 1e4,
    parent: {
      name: `parent of ${v.name}`,
      formula: hillFormula(parentElements),
      smiles: '',
      molarMassGPerMol: Math.round(molarMassGPerMol(parentElements) * 1e4) / 1e4,
    },
    pKas,
    stoichiometries: [
      {
        ...stoich,
        ionCharge: v.charge,
        ionFormula: ion.hill,
        ionMolarMassGPerMol: Math.round(mass * 1e4) / 1e4,
        pKaIndex,
      },
    ],
    acceptabilityClass: v.acceptabilityClass,
    classSource: v.acceptabilityClass === null ? 'not set' : IN_HOUSE_SOURCE,
    tradeNote: v.tradeNote,
    sources: {
      formula: IN_HOUSE_SOURCE,
      molarMassGPerMol:
        'computed from the in-house formula with IUPAC 2021 standard atomic weights',
      pKas: v.pKaSource || IN_HOUSE_SOURCE,
      acceptabilityClass: IN_HOUSE_SOURCE,
      tradeNote: IN_HOUSE_SOURCE,
    },
  };
}
