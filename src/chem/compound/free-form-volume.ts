import { AVOGADRO_PER_MOL } from '../constants/physical';
import { ChemInputError, requireFiniteInRange, type Estimate } from '../result';

/** Å³ → nm³ (exact, 1 nm = 10 Å). */
const NM3_PER_A3 = 1e-3;
/** cm³ → nm³ (exact, 1 cm = 10⁷ nm). */
const NM3_PER_CM3 = 1e21;

/**
 * Volume per formula unit of the free form, nm³, from what the user measured, best first
 * (after Glasser & Jenkins 2000, J. Am. Chem. Soc. 122, 632):
 * (a) crystal structure: V_m = V_cell / Z; (b) density: V_m = M / (ρ·N_A).
 * The uncertainty is not known from the input; 1 % is assumed for a cell and 2 % for a density
 * (common practice for room-temperature measurements, not a published figure). Null when neither is given.
 */
export function freeFormVolumeNm3(input: {
  molarMassGPerMol: number;
  densityGPerCm3?: number | null;
  cellVolumeA3?: number | null;
  formulaUnitsPerCell?: number | null;
}): Estimate | null {
  const { cellVolumeA3, formulaUnitsPerCell, densityGPerCm3 } = input;
  if (cellVolumeA3 != null || formulaUnitsPerCell != null) {
    if (cellVolumeA3 == null || formulaUnitsPerCell == null) {
      throw new ChemInputError(
        'cellVolumeA3',
        'give both the cell volume and Z',
        'a cell volume in Å³ with Z ≥ 1',
      );
    }
    const v = requireFiniteInRange('cellVolumeA3', cellVolumeA3, 1, 1e6, 'Å³');
    const z = requireFiniteInRange('formulaUnitsPerCell', formulaUnitsPerCell, 1, 64);
    const value = (v / z) * NM3_PER_A3;
    return {
      value,
      uncertainty: 0.01 * value,
      method: 'cell',
      sources: [
        'V_m = V_cell / Z (Glasser & Jenkins 2000, J. Am. Chem. Soc. 122, 632); 1 % uncertainty assumed (common practice)',
      ],
    };
  }
  if (densityGPerCm3 != null) {
    const m = requireFiniteInRange('molarMassGPerMol', input.molarMassGPerMol, 1, 1e5, 'g/mol');
    const rho = requireFiniteInRange('densityGPerCm3', densityGPerCm3, 0.3, 30, 'g/cm³');
    const value = (m / (rho * AVOGADRO_PER_MOL)) * NM3_PER_CM3;
    return {
      value,
      uncertainty: 0.02 * value,
      method: 'density',
      sources: [
        'V_m = M / (ρ·N_A) (Glasser & Jenkins 2000); N_A exact (SI 2019); 2 % uncertainty assumed (common practice)',
      ],
    };
  }
  return null;
}
