import type { Estimate } from '@/chem';
import type { EnergyCycle } from '@/components/charts/EnergyLevelDiagram';

export { energyCycleOf } from '@/screening-data/energy-cycle';

/** How small ΔH_sol is next to the two terms it is the difference of (the reason its error is large). */
export function cancellationNote(cycle: EnergyCycle): string {
  const hyd = cycle.cationHydration.value + cycle.anionHydration.value;
  const ratio = Math.abs(cycle.solution.value) / cycle.lattice.value;
  return `ΔH_sol is the difference of ΔH_L ≈ ${cycle.lattice.value.toFixed(0)} kJ/mol and Σ hydration ≈ ${hyd.toFixed(0).replace('-', '−')} kJ/mol: |ΔH_sol| is ${(ratio * 100).toFixed(0)} % of ΔH_L, so a 3 % error in each term alone moves it by about ${(0.03 * Math.hypot(cycle.lattice.value, hyd)).toFixed(0)} kJ/mol. Compare candidates of one drug ion with each other: part of the drug ion’s error is common to all of them.`;
}

/** Sources behind an estimate, de-duplicated. */
export const sourcesOf = (...es: (Estimate | undefined)[]) => [
  ...new Set(es.flatMap((e) => e?.sources ?? [])),
];

/**
 * ΔH_sol per drug ion of each candidate relative to the median candidate. The drug ion's own
 * hydration estimate is the same number in every candidate's cycle, so its error cancels in the
 * difference: σ_rel = √(max(0, σ² − σ_hyd,drug²)) per drug ion (our assumption: that term fully common,
 * the others independent). This is the comparison the cycle supports best.
 */
export function relativeSolutionEnthalpies(
  items: { id: string; perDrugKJ: number; perDrugSigmaKJ: number; drugHydrationSigmaKJ: number }[],
): { id: string; valueKJ: number; sigmaKJ: number }[] {
  if (items.length === 0) return [];
  const sorted = [...items.map((i) => i.perDrugKJ)].sort((a, b) => a - b);
  const k = Math.floor(sorted.length / 2);
  const median = sorted.length % 2 ? sorted[k]! : (sorted[k - 1]! + sorted[k]!) / 2;
  return items.map((i) => ({
    id: i.id,
    valueKJ: i.perDrugKJ - median,
    sigmaKJ: Math.sqrt(Math.max(0, i.perDrugSigmaKJ ** 2 - i.drugHydrationSigmaKJ ** 2)),
  }));
}
