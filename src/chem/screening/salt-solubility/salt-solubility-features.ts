import { schroderVanLaarLnMoleFraction } from '../../thermo/models/fusion/schroder-van-laar';
import type { CounterIonDescriptors } from './counter-ion-descriptors';

/**
 * What the salt-solubility model reads of one candidate salt D_m X_n: the drug (free form's intrinsic
 * solubility, log P, kind), the counter-ion's computed descriptors and charge, and the stoichiometry.
 * Everything here is known at screening time, before any salt has been made.
 */
export interface SaltSolubilityInput {
  drug: {
    kind: 'base' | 'acid';
    /** log₁₀ of the free form's intrinsic solubility S₀, mol/L. */
    log10IntrinsicM: number;
    /** Octanol/water log P of the free form (measured or computed); null when unknown. */
    logP: number | null;
  };
  counterIon: CounterIonDescriptors & {
    /** Charge of the counter-ion in this salt (−1, −2, +1, +2 …). */
    charge: number;
  };
  drugPerSalt: number;
  counterIonPerSalt: number;
  /** The salt's melting point, K, when the bench has measured it (used by the fusion variant only). */
  meltingPointK?: number | null;
  /** The salt's enthalpy of fusion, kJ/mol, when the bench has measured it (fusion variant only). */
  fusionEnthalpyKJPerMol?: number | null;
  /**
   * The thermochemical hint, decades: −(ΔH_sol − m·ΔH_ref)/((m + n)·RT ln 10), ΔH_ref the median ΔH_sol
   * per drug ion over the candidates (see ksp-estimate.ts); null when the cycle gave no ΔH_sol.
   */
  thermoShiftDecades?: number | null;
}

/** A named predictor: how to compute it, and the words used when it drives an estimate. */
export interface SaltSolubilityFeature {
  name: string;
  /** What it is, with its unit, for the Model check and the docs. */
  description: string;
  value: (input: SaltSolubilityInput) => number;
  /**
   * True when `value` reads `input.counterIon` alone (its descriptors and charge): for a fixed
   * counter-ion (fixedCounterIon) featureRow computes it once. tests/chem/screening/salt-solubility/
   * feature-row-cache.test.ts checks the claim.
   */
  counterIonOnly?: true;
}

/** log P used when a drug's log P is unknown: the feature then carries no information (0 after centring is not guaranteed, so the model notes it). */
const UNKNOWN_LOGP = 2;

/**
 * The predictors of the water-solubility model, in column order. The set is declared before any fit
 * (no search over subsets, which would flatter the cross-validation): the drug's own solubility, and
 * the counter-ion properties the trade names as drivers of salt solubility — hydrophobicity,
 * aromaticity, hydrogen bonding, size, charge (Gould 1986, Int. J. Pharm. 33, 201; Serajuddin 2007,
 * Adv. Drug Deliv. Rev. 59, 603).
 */
export const SALT_SOLUBILITY_FEATURES: readonly SaltSolubilityFeature[] = [
  {
    name: 'drugLog10IntrinsicM',
    description: 'log₁₀ S₀ of the free form, mol/L',
    value: (i) => i.drug.log10IntrinsicM,
  },
  {
    name: 'drugLogP',
    description: 'log P of the free form',
    value: (i) => i.drug.logP ?? UNKNOWN_LOGP,
  },
  {
    name: 'counterIonLogPParent',
    counterIonOnly: true,
    description: "counter-ion's parent log P (openchemlib), clipped to −4…6",
    value: (i) => (i.counterIon.inorganic ? 0 : i.counterIon.logPParent),
  },
  {
    name: 'counterIonAromaticRings',
    counterIonOnly: true,
    description: "aromatic rings of the counter-ion's parent",
    value: (i) => i.counterIon.aromaticRings,
  },
  {
    name: 'counterIonHBondDonorsAcceptors',
    counterIonOnly: true,
    description: "H-bond donors + acceptors of the counter-ion's parent",
    value: (i) => i.counterIon.hBondDonors + i.counterIon.hBondAcceptors,
  },
  {
    name: 'counterIonHeavyAtoms',
    counterIonOnly: true,
    description: "heavy atoms of the counter-ion's parent",
    value: (i) => i.counterIon.heavyAtoms,
  },
  {
    name: 'counterIonInorganic',
    counterIonOnly: true,
    description: 'counter-ion without carbon (1) or organic (0)',
    value: (i) => (i.counterIon.inorganic ? 1 : 0),
  },
  {
    name: 'multivalentSalt',
    counterIonOnly: true,
    description: 'counter-ion charge of 2 or more (1) or singly charged (0)',
    value: (i) => (Math.abs(i.counterIon.charge) >= 2 ? 1 : 0),
  },
  {
    name: 'drugIsAcid',
    description: 'acidic drug with a cationic counter-ion (1) or basic drug (0)',
    value: (i) => (i.drug.kind === 'acid' ? 1 : 0),
  },
];

/**
 * The counter-ion with its charge as the model reads it, one object per descriptor record and charge,
 * for a record that never changes (the library's, module constants): featureRow then computes its
 * counterIonOnly columns once. Weak maps, so nothing outlives the record.
 */
const fixedByRecord = new WeakMap<CounterIonDescriptors, Map<number, FixedCounterIon>>();
type FixedCounterIon = SaltSolubilityInput['counterIon'];
/** Per fixed counter-ion: its first row for each feature list asked for (the model's, the domain's). */
const fixedRows = new WeakMap<
  FixedCounterIon,
  { features: readonly SaltSolubilityFeature[]; row: number[] }[]
>();
const MAX_FEATURE_LISTS = 4;
export function fixedCounterIon(d: CounterIonDescriptors, charge: number): FixedCounterIon {
  let byCharge = fixedByRecord.get(d);
  if (!byCharge) fixedByRecord.set(d, (byCharge = new Map()));
  let c = byCharge.get(charge);
  if (!c) {
    byCharge.set(charge, (c = { ...d, charge }));
    fixedRows.set(c, []);
  }
  return c;
}

export function featureRow(
  input: SaltSolubilityInput,
  features: readonly SaltSolubilityFeature[] = SALT_SOLUBILITY_FEATURES,
): number[] {
  const rows = fixedRows.get(input.counterIon);
  let fixed: { features: readonly SaltSolubilityFeature[]; row: number[] } | undefined;
  for (const r of rows ?? []) if (r.features === features) fixed = r;
  if (!fixed) {
    const row = features.map((f) => f.value(input));
    if (rows && rows.length < MAX_FEATURE_LISTS) rows.push({ features, row: row.slice() });
    return row;
  }
  // The counter-ion's own columns as first computed (same function, same fixed object), the rest now.
  const row = fixed.row.slice();
  for (let j = 0; j < features.length; j++) {
    const f = features[j]!;
    if (!f.counterIonOnly) row[j] = f.value(input);
  }
  return row;
}

/** The thermochemical predictor, tried by cross-validation and kept only if it helps (see the model data). */
export const THERMO_SHIFT_FEATURE: SaltSolubilityFeature = {
  name: 'thermoShiftDecades',
  description: 'ΔH_sol relative to the median candidate, as decades of solubility (Hess cycle)',
  value: (i) => i.thermoShiftDecades ?? 0,
};

/**
 * Walden's rule for the entropy of melting of rigid organic molecules, ΔS_m ≈ 56.5 J/(mol·K)
 * (Walden 1908, Z. Elektrochem. 14, 713; the value Yalkowsky uses in the General Solubility Equation,
 * Jain & Yalkowsky 2001, J. Pharm. Sci. 90, 234). Used for a salt whose ΔH_fus was not measured; for
 * salts it is a rough stand-in (common practice), said so wherever it is used.
 */
export const WALDEN_ENTROPY_OF_MELTING_J_PER_MOL_K = 56.5;

/**
 * The crystal term of the fusion variant: log₁₀ of the Schröder–van Laar ideal mole fraction (ΔC_p = 0)
 * at 298.15 K from the salt's melting point and, when measured, its ΔH_fus (else Walden's rule).
 * NaN when the salt's melting point is unknown.
 */
export function log10IdealMoleFraction(input: SaltSolubilityInput, temperatureK = 298.15): number {
  const tm = input.meltingPointK;
  if (tm === null || tm === undefined || !Number.isFinite(tm)) return Number.NaN;
  const dhJ =
    input.fusionEnthalpyKJPerMol != null && Number.isFinite(input.fusionEnthalpyKJPerMol)
      ? input.fusionEnthalpyKJPerMol * 1000
      : WALDEN_ENTROPY_OF_MELTING_J_PER_MOL_K * tm;
  return schroderVanLaarLnMoleFraction(dhJ, tm, temperatureK) / Math.LN10;
}

export const IDEAL_SOLUBILITY_FEATURE: SaltSolubilityFeature = {
  name: 'log10IdealMoleFraction',
  description:
    'log₁₀ ideal mole-fraction solubility of the salt crystal (Schröder–van Laar, ΔC_p = 0; Walden’s rule without ΔH_fus)',
  value: (i) => log10IdealMoleFraction(i),
};
