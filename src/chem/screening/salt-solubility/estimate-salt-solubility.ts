import { STANDARD_TEMPERATURE_K } from '../../constants/physical';
import { kelvinToCelsius } from '../../units/temperature';
import type { Estimate } from '../../result';
import {
  applicabilityDomain,
  divalentCationAdjustment,
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

export function estimateSaltWaterSolubility(
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions = {},
): SaltWaterSolubilityEstimate {
  const { model, features, literal } = SHIPPED;
  const row = featureRow(input, features);
  let value = predictSaltSolubility(model, row, input.drug.log10IntrinsicM);
  const drivers: SolubilityDriver[] = [];
  ridgeContributions(model.ridge, row).forEach((c, j) => {
    if (Math.abs(c) < DRIVER_THRESHOLD_DECADES) return;
    const id = driverFor(model.ridge.featureNames[j]!, c);
    if (id) drivers.push({ id, decades: c });
  });
  const notes = [
    `ridge regression on ${literal.nSalts} published salts of ${literal.nDrugs} drugs; 1σ from leaving whole drugs out: ${SALT_SOLUBILITY_SHARED_LOG10_SD.toFixed(2)} decades shared by every salt of the drug ⊕ ${SALT_SOLUBILITY_WITHIN_LOG10_SD.toFixed(2)} for this salt`,
  ];
  const remarks: string[] = [];
  let within = SALT_SOLUBILITY_WITHIN_LOG10_SD;
  const domain = applicabilityDomain(input);
  if (domain.sigmaFactor > 1) {
    within *= domain.sigmaFactor;
    remarks.push(
      `counter-ion outside the training data's range (${domain.outside.join('; ')}): within-series 1σ widened ×${domain.sigmaFactor.toFixed(1)} (applicability domain, OECD QSAR principle 3; the factor is common practice)`,
    );
  }
  if (isDivalentCationInput(input)) {
    const adj = divalentCationAdjustment();
    value += adj.offsetDecades;
    within = Math.hypot(within, adj.extraWithinLog10Sd);
    if (Math.abs(adj.offsetDecades) >= DRIVER_THRESHOLD_DECADES)
      drivers.push({ id: 'divalent-cation', decades: adj.offsetDecades });
    remarks.push(adj.note);
  }
  const shift = crystalShiftDecades(input, opts.temperatureK ?? STANDARD_TEMPERATURE_K);
  const applied = shift !== null && SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies;
  if (shift !== null) {
    if (applied) value += shift;
    if (applied && Math.abs(shift) >= DRIVER_THRESHOLD_DECADES)
      drivers.push({ id: shift < 0 ? 'high-melting-salt' : 'low-melting-salt', decades: shift });
    remarks.push(fusionNote(input, shift, applied));
  }
  drivers.sort((a, b) => Math.abs(b.decades) - Math.abs(a.decades));
  notes.push(...remarks);
  const s0Index = model.ridge.featureNames.indexOf('drugLog10IntrinsicM');
  const slopeS0 =
    model.kind === 'within-series'
      ? 1
      : s0Index >= 0
        ? model.ridge.coefficients[s0Index]! / model.ridge.featureScales[s0Index]!
        : 0;
  const s0Part = slopeS0 * (opts.log10IntrinsicSigma ?? 0);
  if (opts.log10IntrinsicSigma)
    notes.push(`combined with S₀'s ${opts.log10IntrinsicSigma.toFixed(2)}`);
  if (
    model.ridge.featureNames.includes('thermoShiftDecades') &&
    (input.thermoShiftDecades === null || input.thermoShiftDecades === undefined)
  ) {
    notes.push('no ΔH_sol for this salt: the thermochemical term is taken as the average');
  }
  return {
    log10DrugM: {
      value,
      uncertainty: Math.sqrt(SALT_SOLUBILITY_SHARED_LOG10_SD ** 2 + within ** 2 + s0Part ** 2),
      method: applied ? 'salt-solubility-ridge-fusion' : 'salt-solubility-ridge',
      sources: [
        'Saltsmith salt-solubility model (published series in fixtures/reference/salt-solubility.csv)',
      ],
      notes,
    },
    sharedLog10Sd: SALT_SOLUBILITY_SHARED_LOG10_SD,
    withinLog10Sd: within,
    origin: applied ? 'model+fusion' : 'model',
    fusion: shift === null ? null : { crystalShiftDecades: shift, applied },
    domain,
    remarks,
    drivers,
  };
}
