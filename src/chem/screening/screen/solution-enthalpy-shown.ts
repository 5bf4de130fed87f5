import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import type { Estimate } from '../../result';

/**
 * ΔH_sol as every area shows it: always per mole of drug ion (the formula unit's value ÷ drug ions in
 * it), because the dose, the solubilities, the dose numbers and the temperature argument below all
 * count moles of drug — a hemisulfate's −321 kJ/mol per formula unit is −161 per drug ion, the number
 * to set beside a hydrochloride's. A value that says nothing is shown as "not informative" instead of
 * as a number:
 * - its 1σ exceeds its magnitude (the sign itself is not known); or
 * - it is an estimate outside ±{@link PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ} kJ/mol per drug ion.
 *   The bound is the temperature argument of van 't Hoff, d ln S/d(1/T) = −ΔH_sol/R: between 25 °C and
 *   37 °C a salt with |ΔH_sol| = 70 kJ/mol per drug ion changes its solubility threefold
 *   (exp(70.4/R·(1/298.15 − 1/310.15)) = 3.0). A larger change — −124 kJ/mol would make a salt 7× less
 *   soluble at 37 °C than at 25 °C — is not what drug salts are seen to do between room and body
 *   temperature (common practice; our rule, not a published range). A measured value is shown as
 *   measured whatever its size.
 */
export interface SolutionEnthalpyShown {
  /** kJ per mole of drug ion. */
  valueKJPerMolDrugIon: number;
  /** 1σ, kJ per mole of drug ion (null when the value carries none). */
  sigmaKJPerMolDrugIon: number | null;
  origin: 'estimated' | 'measured';
  /** Where it comes from, in words. */
  basis: string;
  /** Null when the value is informative; else why it is not, in words. */
  notInformative: string | null;
}

/** The largest solubility change between 25 and 37 °C taken as plausible for a drug salt (common practice). */
export const PLAUSIBLE_SOLUBILITY_FACTOR_25_TO_37_C = 3;

/** |ΔH_sol| per drug ion that changes solubility by that factor between 25 and 37 °C, kJ/mol (≈ 70.4). */
export const PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ =
  (GAS_CONSTANT_KJ_PER_MOL_K * Math.log(PLAUSIBLE_SOLUBILITY_FACTOR_25_TO_37_C)) /
  (1 / 298.15 - 1 / 310.15);

/** The factor by which solubility changes from 25 to 37 °C for a ΔH_sol per drug ion (van 't Hoff). */
export function solubilityFactor25To37C(solutionEnthalpyKJPerMolDrugIon: number): number {
  return Math.exp(
    (solutionEnthalpyKJPerMolDrugIon / GAS_CONSTANT_KJ_PER_MOL_K) * (1 / 298.15 - 1 / 310.15),
  );
}

/** ΔH_sol per drug ion with its plausibility verdict, from the screen's per-formula-unit value. */
export function solutionEnthalpyShown(
  perFormulaUnit: Estimate | null,
  drugPerSalt: number,
  origin: string | null,
): SolutionEnthalpyShown | null {
  if (!perFormulaUnit || !(drugPerSalt > 0)) return null;
  const value = perFormulaUnit.value / drugPerSalt;
  const sigma =
    Number.isFinite(perFormulaUnit.uncertainty) && perFormulaUnit.uncertainty > 0
      ? perFormulaUnit.uncertainty / drugPerSalt
      : null;
  const measured = origin?.startsWith('measured') ?? false;
  const kj = (x: number) => x.toFixed(0).replace(/^-/, '−');
  let notInformative: string | null = null;
  if (sigma !== null && sigma > Math.abs(value)) {
    notInformative = `1σ ${sigma.toFixed(0)} kJ/mol exceeds the value (${kj(value)}): not even its sign is known`;
  } else if (!measured && Math.abs(value) > PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ) {
    const f = solubilityFactor25To37C(value);
    notInformative = `at ${kj(value)} kJ/mol per drug ion the salt would be ${f >= 1 ? `${f.toFixed(0)}× more` : `${(1 / f).toFixed(0)}× less`} soluble at 37 °C than at 25 °C — outside ±${PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ.toFixed(0)} kJ/mol (a threefold change, van 't Hoff)`;
  }
  return {
    valueKJPerMolDrugIon: value,
    sigmaKJPerMolDrugIon: sigma,
    origin: measured ? 'measured' : 'estimated',
    basis: `${origin ?? 'thermochemistry estimate'}, per drug ion (formula unit ÷ ${drugPerSalt})`,
    notInformative,
  };
}
