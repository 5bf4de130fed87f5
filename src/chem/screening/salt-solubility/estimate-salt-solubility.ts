import { STANDARD_TEMPERATURE_K } from '../../constants/physical';
import { kelvinToCelsius } from '../../units/temperature';
import type { Estimate } from '../../result';
import {
  applicabilityDomain,
  divalentCationAdjustment,
  domainSigmaFactor,
  isDivalentCationInput,
  type DomainVerdict,
} from './applicability-domain';
import { predictSaltSolubility } from './fit-salt-solubility';
import { ridgeContributions } from './ridge-regression';
import {
  featureRow,
  log10IdealMoleFraction,
  type SaltSolubilityInput,
} from './salt-solubility-features';
import {
  SALT_SOLUBILITY_FUSION_CHECK,
  SALT_SOLUBILITY_REFERENCE_MELTING_POINTS_K,
} from './salt-solubility-model.data';
import {
  SALT_SOLUBILITY_SHARED_LOG10_SD,
  SALT_SOLUBILITY_WITHIN_LOG10_SD,
  SHIPPED,
} from './shipped-model';

export { SALT_SOLUBILITY_SHARED_LOG10_SD, SALT_SOLUBILITY_WITHIN_LOG10_SD } from './shipped-model';

/**
 * The salt's own solubility in pure water, estimated before the salt exists: a ridge regression in
 * log₁₀ units on the drug's intrinsic solubility and the counter-ion's computed descriptors,
 * calibrated on published series of salts (fixtures/reference/salt-solubility.csv). Its 1σ is the
 * error measured by leaving whole drugs out with the variant chosen inside each fold (model-build.ts),
 * split into a level shared by every salt of one drug and a within-series part (model-evidence.ts);
 * the within part is widened for a counter-ion outside the training descriptors' range and for a
 * divalent cation with an acid (applicability-domain.ts), and S₀'s own 1σ is added to the total.
 *
 * With the salt's melting point (and, from DSC, its ΔH_fus) the crystal term
 * log x_ideal (Schröder–van Laar, ΔC_p = 0; Walden's rule without ΔH_fus) differs from that of the
 * typical training salt by log x_ideal(this salt) − mean log x_ideal(training salts). That shift is
 * added to the estimate only when the generated leave-one-drug-out check on the published salts with a
 * melting point says it helps (SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies); otherwise it is
 * reported beside the estimate as information and the origin stays 'model'.
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
  | 'low-melting-salt'
  | 'divalent-cation';

export interface SolubilityDriver {
  id: SolubilityDriverId;
  /** Contribution to log₁₀ solubility relative to the average training salt, decades. */
  decades: number;
}

export interface SaltWaterSolubilityEstimate {
  /** log₁₀ of the drug's molar solubility from the salt in pure water, mol/L of drug; 1σ in decades. */
  log10DrugM: Estimate;
  /** The 1σ split: a level shared by every salt of this drug, and this salt's own part, decades. */
  sharedLog10Sd: number;
  withinLog10Sd: number;
  origin: SaltSolubilityOrigin;
  /**
   * The bench melting data's crystal term (Schröder–van Laar) against the typical published salt, and
   * whether it was applied (only when the published check favours it); null without a melting point.
   */
  fusion: { crystalShiftDecades: number; applied: boolean } | null;
  /** Whether the counter-ion's descriptors lie inside the training range, and the σ factor if not. */
  domain: DomainVerdict;
  /**
   * What a reader of the ranking must be told about this estimate, in words (also in the notes):
   * outside the training range, divalent cation with an acid, bench melting data used or only shown.
   */
  remarks: string[];
  /** Counter-ion properties that move this estimate by ≥ {@link DRIVER_THRESHOLD_DECADES}, largest first. */
  drivers: SolubilityDriver[];
}

/** A predictor moving the estimate by at least this much is named as a driver, decades (our choice). */
export const DRIVER_THRESHOLD_DECADES = 0.15;

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

/** The bench melting data's crystal term against the mean of the published training salts, decades. */
function crystalShiftDecades(input: SaltSolubilityInput, temperatureK: number): number | null {
  const tm = input.meltingPointK;
  if (tm === null || tm === undefined || !Number.isFinite(tm)) return null;
  const refs: readonly number[] = SALT_SOLUBILITY_REFERENCE_MELTING_POINTS_K;
  if (refs.length === 0) return null;
  const own = log10IdealMoleFraction(input, temperatureK);
  const mean =
    refs
      .map((t) =>
        log10IdealMoleFraction(
          { ...input, meltingPointK: t, fusionEnthalpyKJPerMol: null },
          temperatureK,
        ),
      )
      .reduce((a, b) => a + b, 0) / refs.length;
  return own - mean;
}

function fusionNote(input: SaltSolubilityInput, shift: number, applied: boolean): string {
  const c = SALT_SOLUBILITY_FUSION_CHECK;
  const dh =
    input.fusionEnthalpyKJPerMol != null
      ? `ΔH_fus ${input.fusionEnthalpyKJPerMol} kJ/mol (measured)`
      : "ΔH_fus from Walden's rule (ΔS_m 56.5 J/(mol·K); no DSC enthalpy entered)";
  const check = `on the ${c.nSalts} published salts with a melting point, leave-one-drug-out RMSE ${(c.rmseWithout ?? 0).toFixed(2)} without the term and ${(c.rmseWith ?? 0).toFixed(2)} with it (better for ${c.nImproved}, worse for ${c.nWorsened})`;
  const sign = shift >= 0 ? '+' : '';
  return applied
    ? `bench fusion data: T_m ${kelvinToCelsius(input.meltingPointK!).toFixed(1)} °C, ${dh}; Schröder–van Laar (ΔC_p = 0) crystal term ${sign}${shift.toFixed(2)} decades against the typical published salt, applied (${check})`
    : `bench fusion data: T_m ${kelvinToCelsius(input.meltingPointK!).toFixed(1)} °C, ${dh}; the ideal solubility (Schröder–van Laar, ΔC_p = 0) would move the estimate by ${sign}${shift.toFixed(2)} decades against the typical published salt — shown as information, NOT applied: ${check}`;
}

/**
 * The estimate's numbers alone: what a ranking reads of every candidate (value and 1σ), and what the
 * words need to be written later for the rows that are shown. estimateSaltWaterSolubility is
 * saltWaterEstimateOf(saltWaterNumbers(…)): the same operations in the same order either way.
 */
export interface SaltWaterNumbers {
  /** log₁₀ of the drug's molar solubility from the salt, mol/L of drug. */
  value: number;
  /** Its total 1σ, decades (shared ⊕ within ⊕ S₀'s part). */
  uncertainty: number;
  withinLog10Sd: number;
  /** The predictors of this salt, in the shipped model's column order. */
  row: number[];
  /** An acid's salt with a cation of charge ≥ 2 (isDivalentCationInput). */
  divalent: boolean;
  /** The crystal term from the bench melting data (null without), and whether it was applied. */
  shift: number | null;
  applied: boolean;
}

/** The divalent-cation adjustment: data constants only, so made once. */
let divalentOnce: ReturnType<typeof divalentCationAdjustment> | null = null;
const divalent = () => (divalentOnce ??= divalentCationAdjustment());

/** Slope of the estimate on log₁₀ S₀ (how much of S₀'s 1σ it carries): a model constant. */
const SLOPE_S0 = ((): number => {
  const { model } = SHIPPED;
  const s0Index = model.ridge.featureNames.indexOf('drugLog10IntrinsicM');
  return model.kind === 'within-series'
    ? 1
    : s0Index >= 0
      ? model.ridge.coefficients[s0Index]! / model.ridge.featureScales[s0Index]!
      : 0;
})();

export function saltWaterNumbers(
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions = {},
): SaltWaterNumbers {
  const { model, features } = SHIPPED;
  const row = featureRow(input, features);
  let value = predictSaltSolubility(model, row, input.drug.log10IntrinsicM);
  let within = SALT_SOLUBILITY_WITHIN_LOG10_SD;
  const sigmaFactor = domainSigmaFactor(input, row, model.ridge.featureNames);
  if (sigmaFactor > 1) within *= sigmaFactor;
  const isDivalent = isDivalentCationInput(input);
  if (isDivalent) {
    const adj = divalent();
    value += adj.offsetDecades;
    within = Math.hypot(within, adj.extraWithinLog10Sd);
  }
  const shift = crystalShiftDecades(input, opts.temperatureK ?? STANDARD_TEMPERATURE_K);
  const applied = shift !== null && SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies;
  if (applied) value += shift;
  const s0Part = SLOPE_S0 * (opts.log10IntrinsicSigma ?? 0);
  const uncertainty = Math.sqrt(SALT_SOLUBILITY_SHARED_LOG10_SD ** 2 + within ** 2 + s0Part ** 2);
  return { value, uncertainty, withinLog10Sd: within, row, divalent: isDivalent, shift, applied };
}

/** The words that do not depend on the salt: written once. */
let ridgeNoteOnce: string | null = null;
const ridgeNote = () =>
  (ridgeNoteOnce ??= `ridge regression on ${SHIPPED.literal.nSalts} published salts of ${SHIPPED.literal.nDrugs} drugs; 1σ from leaving whole drugs out: ${SALT_SOLUBILITY_SHARED_LOG10_SD.toFixed(2)} decades shared by every salt of the drug ⊕ ${SALT_SOLUBILITY_WITHIN_LOG10_SD.toFixed(2)} for this salt`);

/** What drives the estimate (predictors moving it by ≥ the threshold, then the class terms), largest first. */
function driversOf(num: SaltWaterNumbers): SolubilityDriver[] {
  const { model } = SHIPPED;
  const drivers: SolubilityDriver[] = [];
  ridgeContributions(model.ridge, num.row).forEach((c, j) => {
    if (Math.abs(c) < DRIVER_THRESHOLD_DECADES) return;
    const id = driverFor(model.ridge.featureNames[j]!, c);
    if (id) drivers.push({ id, decades: c });
  });
  const offset = num.divalent ? divalent().offsetDecades : 0;
  if (num.divalent && Math.abs(offset) >= DRIVER_THRESHOLD_DECADES)
    drivers.push({ id: 'divalent-cation', decades: offset });
  const shift = num.shift;
  if (shift !== null && num.applied && Math.abs(shift) >= DRIVER_THRESHOLD_DECADES)
    drivers.push({ id: shift < 0 ? 'high-melting-salt' : 'low-melting-salt', decades: shift });
  return drivers.sort((a, b) => Math.abs(b.decades) - Math.abs(a.decades));
}

/** The estimate with its words, from its numbers (`sources` is the array its Estimate carries). */
export function saltWaterEstimateOf(
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions,
  num: SaltWaterNumbers,
  sources: string[] = [SALT_SOLUBILITY_MODEL_SOURCE],
): SaltWaterSolubilityEstimate {
  const remarks: string[] = [];
  const domain = applicabilityDomain(input);
  if (domain.sigmaFactor > 1) {
    remarks.push(
      `counter-ion outside the training data's range (${domain.outside.join('; ')}): within-series 1σ widened ×${domain.sigmaFactor.toFixed(1)} (applicability domain, OECD QSAR principle 3; the factor is common practice)`,
    );
  }
  if (num.divalent) remarks.push(divalent().note);
  if (num.shift !== null) remarks.push(fusionNote(input, num.shift, num.applied));
  const notes = [ridgeNote(), ...remarks];
  if (opts.log10IntrinsicSigma)
    notes.push(`combined with S₀'s ${opts.log10IntrinsicSigma.toFixed(2)}`);
  if (
    SHIPPED.model.ridge.featureNames.includes('thermoShiftDecades') &&
    (input.thermoShiftDecades === null || input.thermoShiftDecades === undefined)
  ) {
    notes.push('no ΔH_sol for this salt: the thermochemical term is taken as the average');
  }
  return {
    log10DrugM: {
      value: num.value,
      uncertainty: num.uncertainty,
      method: num.applied ? 'salt-solubility-ridge-fusion' : 'salt-solubility-ridge',
      sources,
      notes,
    },
    sharedLog10Sd: SALT_SOLUBILITY_SHARED_LOG10_SD,
    withinLog10Sd: num.withinLog10Sd,
    origin: num.applied ? 'model+fusion' : 'model',
    fusion: num.shift === null ? null : { crystalShiftDecades: num.shift, applied: num.applied },
    domain,
    remarks,
    drivers: driversOf(num),
  };
}

/** Where the estimate comes from, as its Estimate names it. */
export const SALT_SOLUBILITY_MODEL_SOURCE =
  'Saltsmith salt-solubility model (published series in fixtures/reference/salt-solubility.csv)';

export function estimateSaltWaterSolubility(
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions = {},
): SaltWaterSolubilityEstimate {
  return saltWaterEstimateOf(input, opts, saltWaterNumbers(input, opts));
}
