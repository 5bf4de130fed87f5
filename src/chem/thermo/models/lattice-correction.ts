import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import type { IonShape } from '../thermo.types';

/** Degrees of freedom n for the U_POT → ΔH_L correction (Jenkins et al. 1999, Inorg. Chem. 38, 3609, eq. 2). */
export const SHAPE_DEGREES: Record<IonShape, number> = { monatomic: 3, linear: 5, nonlinear: 6 };

/**
 * ΔH_L − U_POT for salt M_pX_q, kJ/mol: [p(n_M/2 − 2) + q(n_X/2 − 2)]·RT
 * (Jenkins, Roobottom, Passmore & Glasser 1999, Inorg. Chem. 38, 3609, eq. 2; CRC "Lattice Energies").
 */
export function latticeEnthalpyCorrectionKJ(
  p: number,
  cationShape: IonShape,
  q: number,
  anionShape: IonShape,
  temperatureK: number,
): number {
  return (
    (p * (SHAPE_DEGREES[cationShape] / 2 - 2) + q * (SHAPE_DEGREES[anionShape] / 2 - 2)) *
    GAS_CONSTANT_KJ_PER_MOL_K *
    temperatureK
  );
}
