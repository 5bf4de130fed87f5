import { ChemInputError, requireFiniteInRange } from '../result';

/**
 * Closed-form pH–solubility relations for a monoprotic drug and its 1:1 salt with a fully ionised
 * counter-ion (Kramer & Flynn 1972, J. Pharm. Sci. 61, 1896; Bogardus & Blackwood 1979,
 * J. Pharm. Sci. 68, 188; Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603, eqs. 1–6).
 * All concentrations mol/L, K_sp in mol²/L², activities taken equal to concentrations.
 *
 * The salt-limited branch assumes [X⁻] = [BH⁺] (+ any background counter-ion c): exact where the
 * dissolved drug is fully ionised (pH ≪ pKa for a base), which is where a salt is usually the solid
 * phase. The numerical solver in salt-equilibrium.ts keeps the full mass balance instead
 * ([X⁻] = total dissolved drug + c) and reduces to these forms there.
 */

const requirePositive = (field: string, x: number, unit: string) => {
  if (!(Number.isFinite(x) && x > 0)) {
    throw new ChemInputError(
      field,
      `must be greater than zero, got ${String(x)}`,
      `a finite number > 0 ${unit}`,
    );
  }
  return x;
};
const requirePh = (pH: number) => requireFiniteInRange('pH', pH, 0, 14);

/** Free-base-limited solubility S = S₀·(1 + 10^(pKa − pH)), mol/L (pH above pH_max). */
export function freeBaseSolubilityM(intrinsicM: number, pKa: number, pH: number): number {
  requirePositive('intrinsicSolubility', intrinsicM, 'mol/L');
  requirePh(pH);
  return intrinsicM * (1 + 10 ** (pKa - pH));
}

/**
 * The salt-forming ion's concentration in equilibrium with a 1:1 salt when the medium already holds
 * c mol/L of the counter-ion: x(x + c) = K_sp, x = (−c + √(c² + 4K_sp))/2, evaluated in the
 * cancellation-free form 2K_sp/(c + √(c² + 4K_sp)). With c = 0 it is √K_sp.
 */
export function commonIonSaltIonM(kspM2: number, commonIonM = 0): number {
  requirePositive('ksp', kspM2, 'mol²/L²');
  requireFiniteInRange('commonIonConcentration', commonIonM, 0, 20, 'mol/L');
  return (2 * kspM2) / (commonIonM + Math.sqrt(commonIonM * commonIonM + 4 * kspM2));
}

/** Salt-limited solubility of a weak base's 1:1 salt: S = [BH⁺]·(1 + 10^(pH − pKa)), mol/L. */
export function saltLimitedBaseSolubilityM(
  kspM2: number,
  pKa: number,
  pH: number,
  commonIonM = 0,
): number {
  requirePh(pH);
  return commonIonSaltIonM(kspM2, commonIonM) * (1 + 10 ** (pH - pKa));
}

/**
 * pH_max of a weak base's 1:1 salt: pKa + log₁₀(S₀/[BH⁺]), where [BH⁺] is the salt-forming ion's
 * concentration at saturation, (−c + √(c² + 4K_sp))/2 with c mol/L of the counter-ion already in the
 * medium ({@link commonIonSaltIonM}); without a common ion [BH⁺] = √K_sp and this is
 * pKa + log₁₀(S₀/√K_sp) (Bogardus & Blackwood 1979, J. Pharm. Sci. 68, 188; the common-ion form follows
 * from the same two branches, S₀(1 + 10^(pKa − pH)) = [BH⁺](1 + 10^(pH − pKa)), solved where the
 * dissolved drug is mostly ionised).
 */
export function phMaxBase(pKa: number, intrinsicM: number, kspM2: number, commonIonM = 0): number {
  requirePositive('intrinsicSolubility', intrinsicM, 'mol/L');
  return pKa + Math.log10(intrinsicM / commonIonSaltIonM(kspM2, commonIonM));
}

/** pH_max of a weak acid's 1:1 salt: pKa − log₁₀(S₀/[A⁻]), [A⁻] as in {@link phMaxBase} (√K_sp without a common ion). */
export function phMaxAcid(pKa: number, intrinsicM: number, kspM2: number, commonIonM = 0): number {
  requirePositive('intrinsicSolubility', intrinsicM, 'mol/L');
  return pKa - Math.log10(intrinsicM / commonIonSaltIonM(kspM2, commonIonM));
}

/** pH_max of a 1:1 salt of a weak base or acid with a single salt-forming pKa (dispatches to the two forms above). */
export function phMax(
  kind: 'base' | 'acid',
  pKa: number,
  intrinsicM: number,
  kspM2: number,
  commonIonM = 0,
): number {
  return kind === 'base'
    ? phMaxBase(pKa, intrinsicM, kspM2, commonIonM)
    : phMaxAcid(pKa, intrinsicM, kspM2, commonIonM);
}
