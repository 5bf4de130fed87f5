import { z } from 'zod';
import {
  ChemInputError,
  estimateSaltThermo,
  findThermoIon,
  findThermoIonByFormula,
  getCounterIon,
  organicIonFromFormula,
  organicIonFromSmiles,
  stoichiometryFromCharges,
  type ThermoIon,
} from '@/chem';
import { requireBuiltIonPlausible, requireFormulaChargeAgrees } from '../../args/ion-consistency';
import { LATTICE_CAUTION } from '../../output/cautions';
import { LATTICE_METHODS, SIZE_RANGES, STRUCTURE_TYPES } from '../lattice-options';
import type { EvalHandler } from './registry';

/** `"kind": "salt"`: lattice, hydration and solution enthalpies of one salt. */

const ringsSchema = z
  .object({
    aromatic: z.number().int().min(0).max(50),
    nonAromatic: z.number().int().min(0).max(50),
  })
  .strict();
const chargeSchema = z
  .number()
  .int()
  .min(-4)
  .max(4)
  .refine((z_) => z_ !== 0, 'charge must not be zero');

/**
 * An ion: a bundled id or symbol, a library counter-ion id, a formula with charge (a bundled ion with the same
 * formula and charge is used when no ring counts are given), or a SMILES with charge.
 */
export const ionSpecSchema = z.union([
  z.string().min(1).max(80),
  z
    .object({
      formula: z.string().min(1).max(200),
      charge: chargeSchema,
      rings: ringsSchema.optional(),
      label: z.string().max(80).optional(),
    })
    .strict(),
  z
    .object({
      smiles: z.string().min(1).max(500),
      charge: chargeSchema,
      label: z.string().max(80).optional(),
    })
    .strict(),
]);

const ranged = (r: { min: number; max: number }) => z.number().min(r.min).max(r.max);

/** The `"kind": "salt"` request. */
export const saltRequestSchema = z
  .object({
    kind: z.literal('salt'),
    /** Echoed back, to match answers to questions. */
    id: z.union([z.string().max(200), z.number()]).optional(),
    cation: ionSpecSchema,
    anion: ionSpecSchema,
    cationsPerFormula: z.number().int().min(1).max(6).optional(),
    anionsPerFormula: z.number().int().min(1).max(6).optional(),
    method: z.enum(LATTICE_METHODS).optional(),
    structureType: z.enum(STRUCTURE_TYPES).optional(),
    formulaUnitVolumeNm3: ranged(SIZE_RANGES.formulaUnitVolumeNm3).optional(),
    densityGPerCm3: ranged(SIZE_RANGES.densityGPerCm3).optional(),
    molarMassGPerMol: ranged(SIZE_RANGES.molarMassGPerMol).optional(),
    temperatureK: z.number().min(250).max(400).optional(),
    packingCoefficient: z.number().min(0.4).max(0.95).optional(),
  })
  .strict()
  .refine((r) => !(r.formulaUnitVolumeNm3 !== undefined && r.densityGPerCm3 !== undefined), {
    message: 'give formulaUnitVolumeNm3 or densityGPerCm3, not both',
    path: ['densityGPerCm3'],
  })
  .refine((r) => r.densityGPerCm3 === undefined || r.molarMassGPerMol !== undefined, {
    message: 'a density needs molarMassGPerMol (the salt formula unit, g/mol)',
    path: ['molarMassGPerMol'],
  });

type IonSpec = z.infer<typeof ionSpecSchema>;

/** Resolve an ion spec to a ThermoIon. `role` names the field in errors. */
export async function resolveIon(
  spec: IonSpec,
  role: 'cation' | 'anion',
  packingCoefficient?: number,
): Promise<ThermoIon> {
  const opts = packingCoefficient !== undefined ? { packingCoefficient } : {};
  if (typeof spec === 'string') {
    const bundled = findThermoIon(spec);
    if (bundled) return bundled;
    const lib = getCounterIon(spec.trim().toLowerCase());
    if (lib) {
      const viaThermo = lib.thermoId ? findThermoIon(lib.thermoId) : undefined;
      if (viaThermo) return viaThermo;
      return organicIonFromFormula(lib.formula, lib.charge, lib.rings, {
        ...opts,
        label: lib.name,
        id: lib.id,
      });
    }
    throw new ChemInputError(
      role,
      `unknown ion "${spec.slice(0, 80)}"`,
      'a bundled ion id or symbol (sodium, Na+, SO4 2-), a counter-ion library id (mesylate), {"formula","charge"} or {"smiles","charge"}',
    );
  }
  const label = spec.label ? { label: spec.label } : {};
  if ('formula' in spec) {
    requireFormulaChargeAgrees(role, spec.formula, spec.charge);
    const bundled = findThermoIonByFormula(spec.formula, spec.charge);
    if (bundled && !spec.rings) return bundled;
    const ion = organicIonFromFormula(
      spec.formula,
      spec.charge,
      spec.rings ?? { aromatic: 0, nonAromatic: 0 },
      { ...opts, ...label },
    );
    requireBuiltIonPlausible(role, ion);
    return ion;
  }
  const ion = await organicIonFromSmiles(spec.smiles, spec.charge, {
    ...opts,
    ...label,
    field: `${role}.smiles`,
  });
  requireBuiltIonPlausible(role, ion);
  return ion;
}

const ionSummary = (ion: ThermoIon) => ({
  label: ion.label,
  charge: ion.charge,
  ...(ion.id ? { id: ion.id } : {}),
  ...(ion.formula ? { formula: ion.formula } : {}),
  ...(ion.radiusA ? { radiusA: ion.radiusA } : {}),
  ...(ion.volumeNm3 ? { volumeNm3: ion.volumeNm3 } : {}),
  sizeEstimated: ion.estimatedSize === true,
  sources: ion.sources,
});

export const saltEvalHandler: EvalHandler = {
  schema: saltRequestSchema,
  run: async (raw) => {
    const r = saltRequestSchema.parse(raw);
    const cation = await resolveIon(r.cation, 'cation', r.packingCoefficient);
    const anion = await resolveIon(r.anion, 'anion', r.packingCoefficient);
    if (cation.charge <= 0)
      throw new ChemInputError(
        'cation.charge',
        `${cation.label} has charge ${cation.charge}`,
        'a positive charge',
      );
    if (anion.charge >= 0)
      throw new ChemInputError(
        'anion.charge',
        `${anion.label} has charge ${anion.charge}`,
        'a negative charge',
      );
    const st = stoichiometryFromCharges(cation.charge, anion.charge);
    const p = r.cationsPerFormula ?? st.cations;
    const q = r.anionsPerFormula ?? st.anions;
    const res = estimateSaltThermo({
      cation,
      anion,
      cationsPerFormula: p,
      anionsPerFormula: q,
      ...(r.method ? { method: r.method } : {}),
      ...(r.structureType !== undefined ? { structureType: r.structureType } : {}),
      ...(r.formulaUnitVolumeNm3 !== undefined
        ? { formulaUnitVolumeNm3: r.formulaUnitVolumeNm3 }
        : {}),
      ...(r.densityGPerCm3 !== undefined ? { densityGPerCm3: r.densityGPerCm3 } : {}),
      ...(r.molarMassGPerMol !== undefined ? { molarMassGPerMol: r.molarMassGPerMol } : {}),
      ...(r.temperatureK !== undefined ? { temperatureK: r.temperatureK } : {}),
    });
    return {
      cation: ionSummary(cation),
      anion: ionSummary(anion),
      cationsPerFormula: p,
      anionsPerFormula: q,
      units: 'kJ/mol per formula unit; uncertainty is one standard uncertainty',
      ...res,
      caution: LATTICE_CAUTION,
    };
  },
};
