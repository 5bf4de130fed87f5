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
