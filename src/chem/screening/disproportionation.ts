import { requireFiniteInRange } from '../result';

/**
 * Disproportionation risk of a salt in a solid dose form (Serajuddin 2007, Adv. Drug Deliv. Rev. 59,
 * 603, §3; Stephenson, Aburub & Woods 2011, J. Pharm. Sci. 100, 1607): a salt of a weak base converts
 * to its free base where the microenvironment pH exceeds pH_max (a salt of a weak acid: where it falls
 * below pH_max). The margin bands below (≥ 1 pH unit safe, 0–1 watch) are common practice.
 */
export type DisproportionationRisk = 'low' | 'watch' | 'high' | 'unknown';

export interface DisproportionationResult {
  risk: DisproportionationRisk;
  /** pH units between pH_max and the microenvironment pH, positive = on the salt's side. */
  marginPh: number | null;
  reason: string;
}

export function disproportionationRisk(
  phMax: number | null,
  microenvironmentPh: number,
  drugKind: 'base' | 'acid',
): DisproportionationResult {
  requireFiniteInRange('microenvironmentPh', microenvironmentPh, 0, 14);
  if (phMax === null) {
    return {
      risk: 'unknown',
      marginPh: null,
      reason: 'pH_max lies outside pH 0–14, so no disproportionation check was possible',
    };
  }
  const margin = drugKind === 'base' ? phMax - microenvironmentPh : microenvironmentPh - phMax;
  const where = `pH_max ${phMax.toFixed(1)} vs microenvironment pH ${microenvironmentPh.toFixed(1)}`;
  if (margin < 0)
    return {
      risk: 'high',
      marginPh: margin,
      reason: `may convert to the free form in the dose form (${where})`,
    };
  if (margin < 1)
    return {
      risk: 'watch',
      marginPh: margin,
      reason: `less than one pH unit from disproportionation (${where})`,
    };
  return {
    risk: 'low',
    marginPh: margin,
    reason: `salt side by ${margin.toFixed(1)} pH units (${where})`,
  };
}
