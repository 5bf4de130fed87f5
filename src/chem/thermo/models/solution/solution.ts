import { requireFiniteInRange, type Estimate } from '../../../result';
import { solutionCycle } from '../cycle/cycle';

/**
 * Back a lattice enthalpy out of a measured enthalpy of solution (the bench-data case):
 * ΔH_L = ΔH_sol − p·ΔH_hyd,+ − q·ΔH_hyd,−, through {@link solutionCycle}, with the uncertainty of the
 * measurement and the hydration enthalpies in quadrature. A measured ΔH_sol at finite concentration (or an
 * apparent one from a van 't Hoff fit) differs from the infinite-dilution value; say which in the notes.
 */
export function latticeFromSolutionEnthalpy(input: {
  solutionEnthalpyKJ: number;
  solutionUncertaintyKJ?: number;
  cationHydration: Estimate;
  anionHydration: Estimate;
  cationsPerFormula: number;
  anionsPerFormula: number;
}): Estimate {
  const dsol = requireFiniteInRange(
    'solutionEnthalpyKJ',
    input.solutionEnthalpyKJ,
    -1000,
    1000,
    'kJ/mol',
  );
  const sol = solutionCycle({
    solutionEnthalpyKJ: dsol,
    solutionUncertaintyKJ: input.solutionUncertaintyKJ ?? 0,
    latticeEnthalpyKJ: null,
    cationHydrationKJ: input.cationHydration.value,
    cationHydrationUncertaintyKJ: input.cationHydration.uncertainty,
    anionHydrationKJ: input.anionHydration.value,
    anionHydrationUncertaintyKJ: input.anionHydration.uncertainty,
    cationsPerFormula: input.cationsPerFormula,
    anionsPerFormula: input.anionsPerFormula,
  });
  return {
    value: sol.unknown!.value,
    uncertainty: sol.unknown!.uncertainty,
    method: 'solution-cycle',
    sources: [...new Set([...input.cationHydration.sources, ...input.anionHydration.sources])],
    notes: [
      'ΔH_L = ΔH_sol − Σν·ΔH_hyd; valid for ΔH_sol at infinite dilution',
      ...(input.solutionUncertaintyKJ === undefined
        ? [
            'the measured ΔH_sol carries no stated uncertainty: the ±1σ is the hydration estimates’ alone',
          ]
        : []),
    ],
  };
}
