import { ChemInputError } from '../result';

/**
 * Dose number and the solubility class of ICH M9 (2019), "Biopharmaceutics Classification
 * System-based Biowaivers", §2.1.1: a drug substance is highly soluble when the highest single
 * therapeutic dose is completely soluble in 250 mL or less of aqueous media over pH 1.2–6.8 at
 * 37 ± 1 °C. Dose number D₀ = (dose / 250 mL) / S (Oh, Curl & Amidon 1993, Pharm. Res. 10, 264);
 * D₀ ≤ 1 passes.
 */
export const ICH_M9_VOLUME_ML = 250;
/** pH range of ICH M9 §2.1.1. */
export const ICH_M9_PH_RANGE = [1.2, 6.8] as const;

/** D₀ = (dose / volume) / S, with S in mg/mL (free-form equivalents). */
export function doseNumber(
  doseMg: number,
  solubilityMgPerMl: number,
  volumeMl = ICH_M9_VOLUME_ML,
): number {
  if (!(Number.isFinite(doseMg) && doseMg > 0))
    throw new ChemInputError('doseMg', `must be greater than zero, got ${doseMg}`, 'a dose > 0 mg');
  if (!(Number.isFinite(solubilityMgPerMl) && solubilityMgPerMl > 0)) {
    throw new ChemInputError(
      'solubility',
      `must be greater than zero, got ${solubilityMgPerMl}`,
      'a solubility > 0 mg/mL',
    );
  }
  if (!(Number.isFinite(volumeMl) && volumeMl > 0))
    throw new ChemInputError('volumeMl', `must be greater than zero`, 'a volume > 0 mL');
  return doseMg / volumeMl / solubilityMgPerMl;
}

export interface SolubilityClassResult {
  /** ICH M9: 'high' when D₀ ≤ 1 at every pH examined in 1.2–6.8. */
  solubilityClass: 'high' | 'low';
  worstPh: number;
  worstDoseNumber: number;
  /** Volume that would dissolve the dose at the worst pH, mL. */
  volumeNeededMl: number;
  doseNumbers: { pH: number; doseNumber: number }[];
}

/**
 * ICH M9 class from solubilities at several pH values (mg/mL, free-form equivalents). Only the
 * points inside pH 1.2–6.8 count (ICH M9 asks at least pH 1.2, 4.5 and 6.8 and the pKa if inside).
 */
export function solubilityClass(
  doseMg: number,
  points: readonly { pH: number; solubilityMgPerMl: number }[],
): SolubilityClassResult {
  const inside = points.filter(
    (p) => p.pH >= ICH_M9_PH_RANGE[0] - 1e-9 && p.pH <= ICH_M9_PH_RANGE[1] + 1e-9,
  );
  if (inside.length === 0) {
    throw new ChemInputError(
      'points',
      'no solubility inside pH 1.2–6.8',
      'at least one solubility between pH 1.2 and 6.8',
    );
  }
  const doseNumbers = inside.map((p) => ({
    pH: p.pH,
    doseNumber: doseNumber(doseMg, p.solubilityMgPerMl),
  }));
  const worst = doseNumbers.reduce((a, b) => (b.doseNumber > a.doseNumber ? b : a));
  return {
    solubilityClass: worst.doseNumber <= 1 ? 'high' : 'low',
    worstPh: worst.pH,
    worstDoseNumber: worst.doseNumber,
    volumeNeededMl: worst.doseNumber * ICH_M9_VOLUME_ML,
    doseNumbers,
  };
}
