import { STANDARD_TEMPERATURE_K } from '../../constants/physical';
import { kelvinToCelsius } from '../../units/temperature';
import type { Estimate } from '../../result';
import {
  predictSaltSolubility,
  type FittedSaltSolubilityModel,
  type SaltSolubilityModelKind,
} from './fit-salt-solubility';
import { ridgeContributions } from './ridge-regression';
import {
  featureRow,
  IDEAL_SOLUBILITY_FEATURE,
  log10IdealMoleFraction,
  SALT_SOLUBILITY_FEATURES,
  THERMO_SHIFT_FEATURE,
  type SaltSolubilityFeature,
  type SaltSolubilityInput,
} from './salt-solubility-features';
import {
  SALT_SOLUBILITY_FUSION_MODEL,
  SALT_SOLUBILITY_MODEL,
  SALT_SOLUBILITY_REFERENCE_MELTING_POINTS_K,
} from './salt-solubility-model.data';

/**
 * The salt's own solubility in pure water, estimated before the salt exists: a ridge regression in
 * log₁₀ units on the drug's intrinsic solubility and the counter-ion's computed descriptors,
 * calibrated on published series of salts (fixtures/reference/salt-solubility.csv) and carrying as
 * its 1σ the error measured by leaving whole drugs out (see fit-salt-solubility.ts).
 *
 * With the salt's melting point (and, from DSC, its ΔH_fus) the crystal is no longer a typical one:
 * log x = log x_ideal − log γ (Schröder–van Laar, fusion.ts). The model's estimate stands for a salt
 * with the typical crystal term of its training salts (the mean log x_ideal of the published salts
 * that report a melting point); the model's estimate of the non-ideality is then
 * log γ ≈ mean log x_ideal − log x_model, and the bench-informed estimate is
 * log S = log S_model + (log x_ideal(this salt) − mean log x_ideal(training salts)),
 * the crystal term entering with its theoretical slope of 1. ΔC_p is taken as 0; without a measured
 * ΔH_fus the entropy of melting follows Walden's rule (said so in the notes). This combination is not
 * cross-validated — too few published salts carry melting data — so its 1σ stays the model's.
 * A fusion variant fitted by cross-validation replaces it when the published set is large enough to
 * favour one (model-build.ts).
 */
export type SaltSolubilityOrigin = 'model' | 'model+fusion';

export type SolubilityDriverId =
  | 'hydrophobic-counter-ion'
  | 'hydrophilic-counter-ion'
  | 'aromatic-counter-ion'
  | 'hydrogen-bonding-counter-ion'
  | 'few-hydrogen-bonds'
  | 'large-counter-ion'
  | 'small-counter-ion'
  | 'inorganic-counter-ion'
  | 'organic-counter-ion'
  | 'multivalent-counter-ion'
  | 'endothermic-dissolution'
  | 'exothermic-dissolution'
  | 'high-melting-salt'
  | 'low-melting-salt';

export interface SolubilityDriver {
  id: SolubilityDriverId;
  /** Contribution to log₁₀ solubility relative to the average training salt, decades. */
  decades: number;
}

export interface SaltWaterSolubilityEstimate {
  /** log₁₀ of the drug's molar solubility from the salt in pure water, mol/L of drug; 1σ in decades. */
  log10DrugM: Estimate;
  origin: SaltSolubilityOrigin;
  /** Counter-ion properties that move this estimate by ≥ {@link DRIVER_THRESHOLD_DECADES}, largest first. */
  drivers: SolubilityDriver[];
}

/** A predictor moving the estimate by at least this much is named as a driver, decades (our choice). */
export const DRIVER_THRESHOLD_DECADES = 0.15;

const ALL_FEATURES: readonly SaltSolubilityFeature[] = [
  ...SALT_SOLUBILITY_FEATURES,
  THERMO_SHIFT_FEATURE,
  IDEAL_SOLUBILITY_FEATURE,
];

interface ShippedLiteral {
  readonly id: string;
  readonly kind: SaltSolubilityModelKind;
  readonly level: number | null;
  readonly featureNames: readonly string[];
  readonly featureMeans: readonly (number | null)[];
  readonly featureScales: readonly (number | null)[];
  readonly intercept: number | null;
  readonly coefficients: readonly (number | null)[];
  readonly lambda: number;
  readonly cvRmseLog10: number | null;
  readonly nSalts: number;
  readonly nDrugs: number;
}

function asModel(s: ShippedLiteral): {
  model: FittedSaltSolubilityModel;
  features: SaltSolubilityFeature[];
} {
  const features = s.featureNames.map((name) => {
    const f = ALL_FEATURES.find((x) => x.name === name);
    if (!f) throw new Error(`salt-solubility model: unknown predictor ${name}`);
    return f;
  });
  return {
    features,
    model: {
      kind: s.kind,
      level: s.level ?? 0,
      ridge: {
        featureNames: s.featureNames,
        featureMeans: s.featureMeans.map((x) => x ?? 0),
        featureScales: s.featureScales.map((x) => x ?? 1),
        intercept: s.intercept ?? 0,
        coefficients: s.coefficients.map((x) => x ?? 0),
        lambda: s.lambda,
      },
    },
  };
}

const MAIN = asModel(SALT_SOLUBILITY_MODEL as ShippedLiteral);
const FUSION = SALT_SOLUBILITY_FUSION_MODEL
  ? asModel(SALT_SOLUBILITY_FUSION_MODEL as ShippedLiteral)
  : null;

/** Cross-validated 1σ of the shipped models, decades. */
export const SALT_SOLUBILITY_CV_RMSE_LOG10 =
  (SALT_SOLUBILITY_MODEL as ShippedLiteral).cvRmseLog10 ?? Number.NaN;

function driverFor(name: string, c: number): SolubilityDriverId | null {
  const up = c > 0;
  switch (name) {
    case 'counterIonLogPParent':
      return up ? 'hydrophilic-counter-ion' : 'hydrophobic-counter-ion';
    case 'counterIonAromaticRings':
      return up ? null : 'aromatic-counter-ion';
    case 'counterIonHBondDonorsAcceptors':
      return up ? 'hydrogen-bonding-counter-ion' : 'few-hydrogen-bonds';
    case 'counterIonHeavyAtoms':
      return up ? 'small-counter-ion' : 'large-counter-ion';
    case 'counterIonInorganic':
      return up === true ? 'inorganic-counter-ion' : 'organic-counter-ion';
    case 'multivalentSalt':
      return up ? null : 'multivalent-counter-ion';
    case 'thermoShiftDecades':
      return up ? 'exothermic-dissolution' : 'endothermic-dissolution';
    case 'log10IdealMoleFraction':
      return up ? 'low-melting-salt' : 'high-melting-salt';
    default:
      return null; // the drug's own predictors are common to every candidate
  }
}

export interface SaltSolubilityOptions {
  /** Temperature of the estimate, K (the crystal term of the fusion path depends on it); default 298.15 K. */
  temperatureK?: number;
  /** 1σ of log₁₀ S₀, decades (a GSE estimate is far less certain than a measurement). */
  log10IntrinsicSigma?: number;
}

export function estimateSaltWaterSolubility(
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions = {},
): SaltWaterSolubilityEstimate {
  const hasMelt =
    input.meltingPointK !== null &&
    input.meltingPointK !== undefined &&
    Number.isFinite(input.meltingPointK);
  const useFusion = hasMelt && FUSION !== null;
  const chosen = useFusion ? FUSION! : MAIN;
  const literal = (
    useFusion ? SALT_SOLUBILITY_FUSION_MODEL : SALT_SOLUBILITY_MODEL
  ) as ShippedLiteral;
  const row = featureRow(input, chosen.features);
  let value = predictSaltSolubility(chosen.model, row, input.drug.log10IntrinsicM);
  const T = opts.temperatureK ?? STANDARD_TEMPERATURE_K;
  let crystalShift: number | null = null;
  if (hasMelt && !useFusion && SALT_SOLUBILITY_REFERENCE_MELTING_POINTS_K.length > 0) {
    const own = log10IdealMoleFraction(input, T);
    const refs = SALT_SOLUBILITY_REFERENCE_MELTING_POINTS_K.map((tm) =>
      log10IdealMoleFraction({ ...input, meltingPointK: tm, fusionEnthalpyKJPerMol: null }, T),
    );
    crystalShift = own - refs.reduce((s, v) => s + v, 0) / refs.length;
    value += crystalShift;
  }
  const ridge = chosen.model.ridge;
  // Contributions relative to the average training salt, decades (the centred fit: relative to zero).
  const contributions = ridgeContributions(ridge, row);
  const s0Index = ridge.featureNames.indexOf('drugLog10IntrinsicM');
  const slopeS0 =
    chosen.model.kind === 'within-series'
      ? 1
      : s0Index >= 0
        ? ridge.coefficients[s0Index]! / ridge.featureScales[s0Index]!
        : 0;
  const cv = literal.cvRmseLog10 ?? Number.NaN;
  const sigma = Math.sqrt(cv ** 2 + (slopeS0 * (opts.log10IntrinsicSigma ?? 0)) ** 2);
  const drivers: SolubilityDriver[] = [];
  ridge.featureNames.forEach((name, j) => {
    const c = contributions[j]!;
    if (Math.abs(c) < DRIVER_THRESHOLD_DECADES) return;
    const id = driverFor(name, c);
    if (id) drivers.push({ id, decades: c });
  });
  if (crystalShift !== null && Math.abs(crystalShift) >= DRIVER_THRESHOLD_DECADES) {
    drivers.push({
      id: crystalShift < 0 ? 'high-melting-salt' : 'low-melting-salt',
      decades: crystalShift,
    });
  }
  drivers.sort((a, b) => Math.abs(b.decades) - Math.abs(a.decades));
  const notes = [
    `ridge regression on ${literal.nSalts} published salts of ${literal.nDrugs} drugs; 1σ = leave-one-drug-out error ${cv.toFixed(2)} decades${opts.log10IntrinsicSigma ? ` combined with S₀'s ${opts.log10IntrinsicSigma.toFixed(2)}` : ''}`,
  ];
  if (crystalShift !== null) {
    const dh =
      input.fusionEnthalpyKJPerMol != null
        ? `ΔH_fus ${input.fusionEnthalpyKJPerMol} kJ/mol (measured)`
        : "ΔH_fus from Walden's rule (ΔS_m 56.5 J/(mol·K); no DSC enthalpy entered)";
    notes.push(
      `bench fusion data: T_m ${kelvinToCelsius(input.meltingPointK!).toFixed(1)} °C, ${dh}; Schröder–van Laar (ΔC_p = 0) crystal term ${crystalShift >= 0 ? '+' : ''}${crystalShift.toFixed(2)} decades against the typical published salt, applied with slope 1 (not cross-validated)`,
    );
  }
  if (
    ridge.featureNames.includes('thermoShiftDecades') &&
    (input.thermoShiftDecades === null || input.thermoShiftDecades === undefined)
  ) {
    notes.push('no ΔH_sol for this salt: the thermochemical term is taken as the average');
  }
  return {
    log10DrugM: {
      value,
      uncertainty: sigma,
      method: useFusion ? 'salt-solubility-ridge-fusion' : 'salt-solubility-ridge',
      sources: [
        'Saltsmith salt-solubility model (published series in fixtures/reference/salt-solubility.csv)',
      ],
      notes,
    },
    origin: useFusion || crystalShift !== null ? 'model+fusion' : 'model',
    drivers,
  };
}
