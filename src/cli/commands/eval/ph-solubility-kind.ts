import { z } from 'zod';
import {
  ChemInputError,
  counterIonProtolyte,
  getCounterIon,
  phMaxAcid,
  phMaxBase,
  phSolubilityProfile,
  saltStoichiometryFromCharges,
} from '@/chem';
import { SCREENING_CAUTIONS } from '../../output/cautions';
import type { EvalHandler } from './registry';

/** `"kind": "ph-solubility"`: one pH–solubility profile with pH_max. */

const pka = z.number().min(-10).max(20);
const ph = z.number().min(0).max(14);

export const phSolubilityRequestSchema = z
  .object({
    kind: z.literal('ph-solubility'),
    id: z.union([z.string().max(200), z.number()]).optional(),
    drug: z
      .object({
        kind: z.enum(['base', 'acid']),
        pKas: z.array(pka).min(1).max(4),
        ionCharge: z
          .number()
          .int()
          .min(-3)
          .max(3)
          .refine((q) => q !== 0, 'the drug ion cannot be neutral')
          .optional(),
        /** S₀ of the free form: log₁₀ mol/L, or mg/mL with molarMassGPerMol. */
        log10IntrinsicM: z.number().min(-15).max(2).optional(),
        intrinsicSolubilityMgPerMl: z.number().positive().max(1e4).optional(),
        molarMassGPerMol: z.number().min(1).max(1e5).optional(),
      })
      .strict(),
    salt: z
      .object({
        /** A library counter-ion id, or the counter-ion's pKa values and charge. */
        counterIon: z.union([
          z.string().min(1).max(80),
          z.object({ pKas: z.array(pka).max(4), kind: z.enum(['anion', 'cation']) }).strict(),
        ]),
        ionCharge: z
          .number()
          .int()
          .min(-4)
          .max(4)
          .refine((q) => q !== 0, 'the counter-ion cannot be neutral')
          .optional(),
        drugPerSalt: z.number().int().min(1).max(4).optional(),
        counterIonPerSalt: z.number().int().min(1).max(4).optional(),
        log10Ksp: z.number().min(-60).max(10),
      })
      .strict()
      .optional(),
    phFrom: ph.optional(),
    phTo: ph.optional(),
    phStep: z.number().min(0.01).max(2).optional(),
    commonIonM: z.number().min(0).max(20).optional(),
    activity: z.enum(['ideal', 'davies']).optional(),
    temperatureK: z.number().min(250).max(400).optional(),
    ionicStrengthM: z.number().min(0).max(5).optional(),
  })
  .strict();

type PhSolubilityRequest = z.infer<typeof phSolubilityRequestSchema>;

/** The drug ion's charge: given, or ±1 by kind; a sign that does not fit the kind is an error. */
function drugIonCharge(r: PhSolubilityRequest): number {
  const ionCharge = r.drug.ionCharge ?? (r.drug.kind === 'base' ? 1 : -1);
  if (Math.sign(ionCharge) !== (r.drug.kind === 'base' ? 1 : -1)) {
    throw new ChemInputError(
      'drug.ionCharge',
      `a ${r.drug.kind} cannot form an ion of charge ${ionCharge}`,
      r.drug.kind === 'base' ? '+1 to +3' : '−3 to −1',
    );
  }
  return ionCharge;
}

/** log₁₀ S₀ (mol/L): given, or from mg/mL and the molar mass. */
function intrinsicLog10M(r: PhSolubilityRequest): number {
  if (r.drug.log10IntrinsicM !== undefined) return r.drug.log10IntrinsicM;
  if (r.drug.intrinsicSolubilityMgPerMl !== undefined && r.drug.molarMassGPerMol !== undefined) {
    return Math.log10(r.drug.intrinsicSolubilityMgPerMl / r.drug.molarMassGPerMol);
  }
  throw new ChemInputError(
    'drug.log10IntrinsicM',
    'no intrinsic solubility',
    'log10IntrinsicM, or intrinsicSolubilityMgPerMl with molarMassGPerMol',
  );
}

type CounterIonSpec = NonNullable<PhSolubilityRequest['salt']>['counterIon'];

/** The counter-ion from the library or as given, checked against the drug's kind; its charge. */
function resolveCounterIon(r: PhSolubilityRequest, ionSpec: CounterIonSpec) {
  const lib = typeof ionSpec === 'string' ? getCounterIon(ionSpec) : undefined;
  if (typeof ionSpec === 'string' && !lib)
    throw new ChemInputError(
      'salt.counterIon',
      `unknown counter-ion "${ionSpec}"`,
      'a library id, or {"pKas": [...], "kind": "anion"|"cation"}',
    );
  const counterKind = lib ? lib.kind : (ionSpec as { kind: 'anion' | 'cation' }).kind;
  const wanted = r.drug.kind === 'base' ? 'anion' : 'cation';
  if (counterKind !== wanted) {
    throw new ChemInputError(
      'salt.counterIon',
      `a ${r.drug.kind} forms salts with ${wanted}s; ${lib ? lib.name : 'this counter-ion'} is an ${counterKind === 'anion' ? 'anion' : 'cation'}`,
      `a counter-${wanted}`,
    );
  }
  const q = r.salt?.ionCharge ?? (lib ? lib.charge : counterKind === 'cation' ? 1 : -1);
  if (Math.sign(q) !== (counterKind === 'cation' ? 1 : -1))
    throw new ChemInputError(
      'salt.ionCharge',
      `charge ${q} does not fit a counter-${counterKind}`,
      counterKind === 'cation' ? '+1 to +4' : '−4 to −1',
    );
  const ion = lib ?? {
    id: 'custom',
    name: 'custom',
    kind: counterKind,
    charge: q,
    molarMassGPerMol: 1,
    pKas: (ionSpec as { pKas: number[] }).pKas.map((value) => ({ value })),
    acceptabilityClass: null,
  };
  return { ion, q, pKaIndex: lib?.stoichiometries.find((s) => s.ionCharge === q)?.pKaIndex };
}

/** The salt for the profile: counter-ion, stoichiometry (checked neutral) and K_sp; null without a salt. */
function profileSalt(r: PhSolubilityRequest, ionCharge: number) {
  if (!r.salt) return null;
  const { ion, q, pKaIndex } = resolveCounterIon(r, r.salt.counterIon);
  const byCharges = saltStoichiometryFromCharges(ionCharge, q);
  const m = r.salt.drugPerSalt ?? byCharges.drugPerSalt;
  const n = r.salt.counterIonPerSalt ?? byCharges.counterIonPerSalt;
  if (m * ionCharge + n * q !== 0) {
    throw new ChemInputError(
      'salt.drugPerSalt',
      `${m}×(${ionCharge}) + ${n}×(${q}) ≠ 0: the salt is not neutral`,
      'counts that balance the charges',
    );
  }
  return {
    counterIon: counterIonProtolyte(ion, {
      drugPerSalt: m,
      counterIonPerSalt: n,
      ionCharge: q,
      pKaIndex: pKaIndex ?? null,
    }),
    counterIonCharge: q,
    drugPerSalt: m,
    counterIonPerSalt: n,
    log10Ksp: r.salt.log10Ksp,
  };
}

/**
 * The 1:1 closed form of pH_max beside the mass-balance value, with the same common ion the profile
 * uses (pKa ± log₁₀(S₀/x), x(x + c) = K_sp); null where it does not apply (not 1:1, several pKa).
 */
function closedFormPhMax(
  r: PhSolubilityRequest,
  salt: ReturnType<typeof profileSalt>,
  logS0: number,
): number | null {
  if (!salt || salt.drugPerSalt !== 1 || salt.counterIonPerSalt !== 1 || r.drug.pKas.length !== 1)
    return null;
  const f = r.drug.kind === 'base' ? phMaxBase : phMaxAcid;
  return f(r.drug.pKas[0]!, 10 ** logS0, 10 ** salt.log10Ksp, r.commonIonM ?? 0);
}

export const phSolubilityEvalHandler: EvalHandler = {
  schema: phSolubilityRequestSchema,
  run: async (raw) => {
    const r = phSolubilityRequestSchema.parse(raw);
    const ionCharge = drugIonCharge(r);
    const logS0 = intrinsicLog10M(r);
    const salt = profileSalt(r, ionCharge);
    const activity =
      r.activity === 'davies'
        ? {
            model: 'davies' as const,
            backgroundIonicStrengthM: r.ionicStrengthM ?? 0,
            temperatureK: r.temperatureK ?? 298.15,
          }
        : { model: 'ideal' as const };
    const drug = { kind: r.drug.kind, pKas: r.drug.pKas, ionCharge };
    const p = phSolubilityProfile(drug, logS0, salt, {
      ...(r.phFrom !== undefined ? { phFrom: r.phFrom } : {}),
      ...(r.phTo !== undefined ? { phTo: r.phTo } : {}),
      ...(r.phStep !== undefined ? { phStep: r.phStep } : {}),
      commonIonM: r.commonIonM ?? 0,
      activity,
    });
    const mw = r.drug.molarMassGPerMol;
    const closed = closedFormPhMax(r, salt, logS0);
    return {
      units:
        'solubility mol/L of total drug (mg/mL free-form equivalents when molarMassGPerMol is given)',
      points: p.points.map((pt) => ({
        pH: pt.pH,
        solubilityM: pt.solubilityM,
        ...(mw ? { solubilityMgPerMl: pt.solubilityM * mw } : {}),
        freeFormLimitedM: pt.freeFormLimitedM,
        saltLimitedM: pt.saltLimitedM,
        solid: pt.solid,
      })),
      phMax: p.phMax,
      ...(closed !== null ? { phMaxClosedForm1to1: closed } : {}),
      assumptions: p.assumptions,
      caution: SCREENING_CAUTIONS[0],
    };
  },
};
