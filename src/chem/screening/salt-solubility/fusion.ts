import { WATER_MOLAR_MASS_G_PER_MOL } from '../../constants/water';
import {
  schroderVanLaarLnMoleFraction,
  type FusionHeatCapacityAssumption,
} from '../../thermo/models/fusion/schroder-van-laar';
import { ChemInputError, requireFiniteInRange } from '../../result';

/**
 * Ideal solubility of a crystal from its melting data — the Schröder–van Laar equation (Schröder 1893,
 * Z. Phys. Chem. 11, 449; van Laar 1903), in the forms Yalkowsky gives ("Solubility and
 * Solubilization in Aqueous Media", ACS/Oxford 1999, ch. 3):
 *
 * - ΔC_p ≈ 0:       ln x = −(ΔH_fus/R)·(1/T − 1/T_m)
 * - ΔC_p ≈ ΔS_m:    ln x = −(ΔS_m/R)·ln(T_m/T),  ΔS_m = ΔH_fus/T_m
 *
 * x is the mole fraction of the solute in an ideal solution at T. Measured x = x_ideal/γ: the
 * activity coefficient γ carries everything on the solution side (hydration, hydrophobic effect,
 * dissociation of a salt into ions); this module computes the crystal term only. Above T_m the
 * solid does not exist and the "ideal solubility" is 1 (complete miscibility of the melt).
 */
export type { FusionHeatCapacityAssumption };

export interface IdealSolubilityInput {
  /** Melting point of the crystal, K. */
  meltingPointK: number;
  /** Enthalpy of fusion at the melting point, kJ/mol (DSC peak area per mole of formula unit). */
  fusionEnthalpyKJPerMol: number;
  /** Temperature of the solubility, K. */
  temperatureK: number;
  /** ΔC_p of melting taken as 0 (default) or as ΔS_m. */
  heatCapacity?: FusionHeatCapacityAssumption;
}

export interface IdealSolubility {
  /** ln of the ideal mole-fraction solubility. */
  lnMoleFraction: number;
  moleFraction: number;
  /** The same in mol/L of water (dilute aqueous solution, water 1000 g/L). */
  log10MolPerL: number;
  heatCapacity: FusionHeatCapacityAssumption;
}

/**
 * Mole fraction → mol/L for a dilute aqueous solution: c = x/(1 − x)·(1000 g/L)/M_water.
 * The worked paracetamol example in the sources above converts the same way.
 */
export function moleFractionToMolPerL(x: number): number {
  return (x / (1 - x)) * (1000 / WATER_MOLAR_MASS_G_PER_MOL);
}

export function idealSolubility(input: IdealSolubilityInput): IdealSolubility {
  const tm = requireFiniteInRange('meltingPointK', input.meltingPointK, 200, 800, 'K');
  const dh = requireFiniteInRange(
    'fusionEnthalpyKJPerMol',
    input.fusionEnthalpyKJPerMol,
    0.5,
    300,
    'kJ/mol',
  );
  const t = requireFiniteInRange('temperatureK', input.temperatureK, 250, 400, 'K');
  const heatCapacity = input.heatCapacity ?? 'zero';
  if (heatCapacity !== 'zero' && heatCapacity !== 'equal-to-entropy-of-melting') {
    throw new ChemInputError(
      'heatCapacity',
      `unknown assumption ${String(heatCapacity)}`,
      "'zero' or 'equal-to-entropy-of-melting'",
    );
  }
  const lnX = schroderVanLaarLnMoleFraction(dh * 1000, tm, t, heatCapacity);
  // Keep x strictly below 1 for the molar conversion (a melt at or above T_m mixes completely).
  const x = Math.min(Math.exp(lnX), 0.999);
  return {
    lnMoleFraction: lnX,
    moleFraction: x,
    log10MolPerL: Math.log10(moleFractionToMolPerL(x)),
    heatCapacity,
  };
}
