import { requireFiniteInRange } from '../result';

/**
 * Hygroscopicity classes of the European Pharmacopoeia, general text 5.11 "Characters section in
 * monographs" (mass increase after 24 h at 25 ± 1 °C and 80 ± 2 % relative humidity):
 * deliquescent — sufficient water is absorbed to form a liquid; very hygroscopic — increase ≥ 15 %;
 * hygroscopic — < 15 % and ≥ 2 %; slightly hygroscopic — < 2 % and ≥ 0.2 %.
 * Below 0.2 % the text defines no class; "non-hygroscopic" is common practice.
 * (Limits from memory of the Ph. Eur. text.)
 */
export type HygroscopicityClass =
  'non-hygroscopic' | 'slightly hygroscopic' | 'hygroscopic' | 'very hygroscopic' | 'deliquescent';

export const PH_EUR_HYGROSCOPICITY_LIMITS_PERCENT = {
  slightly: 0.2,
  hygroscopic: 2,
  very: 15,
} as const;

/**
 * Class from a measured mass gain (% w/w) at 80 % RH. `liquefied` marks a sample that turned liquid
 * (deliquescence cannot be told from the number alone).
 */
export function hygroscopicityClass(
  massGainPercent: number,
  liquefied = false,
): HygroscopicityClass {
  requireFiniteInRange('massGainPercent', massGainPercent, -5, 1000, '%');
  if (liquefied) return 'deliquescent';
  const L = PH_EUR_HYGROSCOPICITY_LIMITS_PERCENT;
  if (massGainPercent >= L.very) return 'very hygroscopic';
  if (massGainPercent >= L.hygroscopic) return 'hygroscopic';
  if (massGainPercent >= L.slightly) return 'slightly hygroscopic';
  return 'non-hygroscopic';
}
