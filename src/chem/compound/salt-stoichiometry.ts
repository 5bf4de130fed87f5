import { ChemInputError } from '../result';

/** Greatest common divisor of two positive integers (Euclid). */
function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * The smallest charge-balanced salt formula for two ions (electroneutrality: drug ions × |z_drug| =
 * counter-ions × |z_counter|, in lowest terms). A +1 drug with sulfate (−2) gives 2:1 (the
 * hemisulfate), with chloride (−1) 1:1; a +2 drug with chloride 1:2. Only the magnitudes count, so the
 * same function serves a base's and an acid's salts, and a cation–anion pair (Kapustinskii's p and q).
 * Charges are rounded to whole numbers.
 * @throws ChemInputError when a charge rounds to zero or is not a finite number.
 */
export function saltStoichiometryFromCharges(
  drugIonCharge: number,
  counterIonCharge: number,
): { drugPerSalt: number; counterIonPerSalt: number } {
  const zd = Math.abs(Math.round(drugIonCharge));
  const zx = Math.abs(Math.round(counterIonCharge));
  if (!(zd > 0 && zx > 0)) {
    throw new ChemInputError(
      'charge',
      `charges must be non-zero whole numbers, got ${drugIonCharge} and ${counterIonCharge}`,
      'non-zero ion charges, e.g. +1 and −2',
    );
  }
  const g = gcd(zd, zx);
  return { drugPerSalt: zx / g, counterIonPerSalt: zd / g };
}
