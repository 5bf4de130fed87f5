/**
 * The one relative ΔH_sol of the project: ΔH_sol per drug ion of each candidate relative to the
 * median candidate (the Energetics area's bars). The drug ion's own
 * hydration estimate is the same number in every candidate's cycle, so its error cancels in the
 * difference: σ_rel = √(max(0, σ² − σ_hyd,drug²)) per drug ion (our assumption: that term fully common,
 * the others independent). This is the comparison the cycle supports best.
 */
export function solutionEnthalpiesRelativeToMedianKJ(
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
