import { GAS_CONSTANT_J_PER_MOL_K } from '../../../constants/physical';

/** How ΔC_p of melting is treated in the Schröder–van Laar equation. */
export type FusionHeatCapacityAssumption = 'zero' | 'equal-to-entropy-of-melting';

/**
 * ln of the ideal mole-fraction solubility of a crystal from its melting data — the Schröder–van Laar
 * equation (Schröder 1893, Z. Phys. Chem. 11, 449; van Laar 1903), in the forms Yalkowsky gives
 * ("Solubility and Solubilization in Aqueous Media", ACS/Oxford 1999, ch. 3; also Prausnitz,
 * Lichtenthaler & de Azevedo, "Molecular Thermodynamics of Fluid-Phase Equilibria", 3rd ed., ch. 11):
 *
 * - ΔC_p ≈ 0 (default): ln x = −(ΔH_fus/R)·(1/T − 1/T_m)
 * - ΔC_p ≈ ΔS_m:        ln x = −(ΔS_m/R)·ln(T_m/T),  ΔS_m = ΔH_fus/T_m
 *
 * 0 at or above T_m (the melt mixes completely). The one implementation in the core: the inputs are
 * checked by the caller at its edge (fusion.ts `idealSolubility`, the salt-solubility features).
 */
export function schroderVanLaarLnMoleFraction(
  fusionEnthalpyJPerMol: number,
  meltingPointK: number,
  temperatureK: number,
  heatCapacity: FusionHeatCapacityAssumption = 'zero',
): number {
  if (temperatureK >= meltingPointK) return 0;
  if (heatCapacity === 'zero')
    return (
      -(fusionEnthalpyJPerMol / GAS_CONSTANT_J_PER_MOL_K) * (1 / temperatureK - 1 / meltingPointK)
    );
  return (
    -(fusionEnthalpyJPerMol / meltingPointK / GAS_CONSTANT_J_PER_MOL_K) *
    Math.log(meltingPointK / temperatureK)
  );
}
