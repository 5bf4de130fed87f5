import type { SaltThermoResult } from '@/chem';
import type { EnergyCycle } from '@/components/charts/EnergyLevelDiagram';
import type { CandidateEnergetics } from './compute-screening';

/**
 * The energy picture's numbers for one salt, shared by the Energetics area and the comparison sheet:
 * hydration of all p cations and q anions of a formula unit (identical ions share their model error,
 * so σ scales with p and q), and ΔH_sol as the engine carried it through the cycle.
 */
export function energyCycleOf(
  e: CandidateEnergetics & { thermo: SaltThermoResult },
  saltLabel: string,
): EnergyCycle {
  const t = e.thermo;
  return {
    saltLabel,
    cationLabel: e.cationLabel,
    anionLabel: e.anionLabel,
    cationsPerFormula: e.cationsPerFormula,
    anionsPerFormula: e.anionsPerFormula,
    lattice: { value: t.latticeEnthalpyKJ.value, uncertainty: t.latticeEnthalpyKJ.uncertainty },
    cationHydration: {
      value: e.cationsPerFormula * t.cationHydrationKJ.value,
      uncertainty: e.cationsPerFormula * t.cationHydrationKJ.uncertainty,
    },
    anionHydration: {
      value: e.anionsPerFormula * t.anionHydrationKJ.value,
      uncertainty: e.anionsPerFormula * t.anionHydrationKJ.uncertainty,
    },
    solution: { value: t.solutionEnthalpyKJ.value, uncertainty: t.solutionEnthalpyKJ.uncertainty },
  };
}
