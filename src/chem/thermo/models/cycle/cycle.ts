import { ChemInputError, requireFiniteInRange } from '../../../result';
import type { CycleSolution, CycleStep } from '../../thermo.types';

/**
 * Solve a closed thermochemical cycle by Hess's law: the steps, walked in the direction written, return to
 * the starting state, so Σ multiplierᵢ·ΔHᵢ = 0. At most one step may be unknown (`enthalpyKJ: null`); it is
 * solved, with its uncertainty from the others' uncertainties in quadrature. The closure Σ is reported and
 * checked; with no unknown, `closes` says whether the given data close within their own uncertainty
 * (2σ, at least 1e-9 of the largest step).
 */
export function solveCycle(steps: CycleStep[]): CycleSolution {
  if (!Array.isArray(steps) || steps.length < 2 || steps.length > 50) {
    throw new ChemInputError('steps', 'a cycle needs 2 to 50 steps', '2–50 steps');
  }
  const unknowns = steps.flatMap((s, i) => (s.enthalpyKJ === null ? [i] : []));
  if (unknowns.length > 1) {
    throw new ChemInputError(
      'steps',
      `${unknowns.length} unknown steps (${unknowns.map((i) => steps[i]!.label).join(', ')})`,
      'at most one unknown step',
    );
  }
  const norm = steps.map((s, i) => {
    const m = requireFiniteInRange(`steps[${i}].multiplier`, s.multiplier ?? 1, -100, 100);
    if (m === 0)
      throw new ChemInputError(
        `steps[${i}].multiplier`,
        'a zero multiplier removes the step',
        'non-zero, −100…100',
      );
    const u = requireFiniteInRange(
      `steps[${i}].uncertaintyKJ`,
      s.uncertaintyKJ ?? 0,
      0,
      1e6,
      'kJ/mol',
    );
    const h =
      s.enthalpyKJ === null
        ? null
        : requireFiniteInRange(`steps[${i}].enthalpyKJ`, s.enthalpyKJ, -1e6, 1e6, 'kJ/mol');
    return { label: String(s.label ?? `step ${i + 1}`), h, m, u };
  });
  const knownSum = norm.reduce((a, s) => (s.h === null ? a : a + s.m * s.h), 0);
  const knownVar = norm.reduce((a, s) => (s.h === null ? a : a + (s.m * s.u) ** 2), 0);
  const unknownIndex = unknowns[0] ?? -1;
  let unknownValue: number | undefined;
  if (unknownIndex >= 0) {
    const m = norm[unknownIndex]!.m;
    unknownValue = -knownSum / m;
    norm[unknownIndex]!.h = unknownValue;
  }
  const filled = norm.map((s) => ({
    label: s.label,
    enthalpyKJ: s.h!,
    multiplier: s.m,
    uncertaintyKJ: s.u,
  }));
  // Sum small to large to keep rounding low.
  const terms = filled
    .map((s) => s.multiplier * s.enthalpyKJ)
    .sort((a, b) => Math.abs(a) - Math.abs(b));
  const closure = terms.reduce((a, b) => a + b, 0);
  const scale = Math.max(1, ...terms.map(Math.abs));
  const tol = unknownIndex >= 0 ? 1e-9 * scale : Math.max(1e-9 * scale, 2 * Math.sqrt(knownVar));
  const result: CycleSolution = {
    unknownIndex,
    steps: filled,
    closureKJ: closure,
    closes: Math.abs(closure) <= tol,
  };
  if (unknownIndex >= 0) {
    result.unknown = {
      value: unknownValue!,
      uncertainty: Math.sqrt(knownVar) / Math.abs(norm[unknownIndex]!.m),
      method: 'hess-cycle',
      sources: [...new Set(steps.flatMap((s) => (s.source ? [s.source] : [])))],
    };
  }
  return result;
}

export interface BornHaberInput {
  /** Salt label, e.g. `NaCl`, `CaF2`. */
  salt: string;
  /** Metal atoms and halogen/non-metal atoms per formula unit. */
  metalCount: number;
  nonMetalCount: number;
  /** ΔfH° of the solid salt, kJ/mol (null to solve for it). */
  formationEnthalpyKJ: number | null;
  /** ΔfH° of the gaseous metal atom (atomisation), kJ/mol. */
  metalAtomisationKJ: number;
  /** Sum of the ionisation energies to reach the cation's charge, kJ/mol. */
  ionisationEnergySumKJ: number;
  /** ΔfH° of the gaseous non-metal atom, kJ/mol. */
  nonMetalAtomisationKJ: number;
  /** Electron-gain enthalpy of the non-metal atom (−EA for a halogen), kJ/mol, per atom, to the anion's charge. */
  electronGainKJ: number;
  /** Lattice dissociation enthalpy, kJ/mol (null to solve for it — the usual case). */
  latticeEnthalpyKJ: number | null;
  source?: string;
}

/**
 * Born–Haber cycle for M_pX_q: elements → gaseous atoms → gaseous ions → solid → back to elements.
 * Steps: p·ΔH_at(M), p·ΣIE, q·ΔH_at(X), q·ΔH_eg(X), −ΔH_L (ions → solid), −ΔfH(salt) (salt → elements).
 * The (5/2)RT terms that convert 0 K ionisation energies and electron affinities to 298 K enthalpies cancel
 * for a neutral salt and are omitted.
 */
export function bornHaberCycle(input: BornHaberInput): CycleSolution {
  const p = requireFiniteInRange('metalCount', input.metalCount, 1, 6);
  const q = requireFiniteInRange('nonMetalCount', input.nonMetalCount, 1, 6);
  const src = input.source;
  const step = (label: string, enthalpyKJ: number | null, multiplier = 1): CycleStep => ({
    label,
    enthalpyKJ,
    multiplier,
    ...(src ? { source: src } : {}),
  });
  return solveCycle([
    step('atomise the metal: M(s) → M(g)', input.metalAtomisationKJ, p),
    step('ionise: M(g) → Mᶻ⁺(g) + z e⁻', input.ionisationEnergySumKJ, p),
    step('atomise the non-metal: ½X₂ → X(g)', input.nonMetalAtomisationKJ, q),
    step('electron gain: X(g) + e⁻ → X⁻(g)', input.electronGainKJ, q),
    step(
      'ions form the lattice: gaseous ions → solid (−ΔH_L)',
      input.latticeEnthalpyKJ === null ? null : -input.latticeEnthalpyKJ,
    ),
    step(
      `solid returns to its elements: ${input.salt}(s) → elements (−ΔfH°)`,
      input.formationEnthalpyKJ === null ? null : -input.formationEnthalpyKJ,
    ),
  ]);
}

export interface SolutionCycleInput {
  /** Measured ΔH_sol at infinite dilution, kJ/mol, or null to solve for it. */
  solutionEnthalpyKJ: number | null;
  solutionUncertaintyKJ?: number;
  /** Lattice dissociation enthalpy, kJ/mol, or null to solve for it (the bench-data case). */
  latticeEnthalpyKJ: number | null;
  latticeUncertaintyKJ?: number;
  cationHydrationKJ: number;
  cationHydrationUncertaintyKJ?: number;
  anionHydrationKJ: number;
  anionHydrationUncertaintyKJ?: number;
  cationsPerFormula: number;
  anionsPerFormula: number;
}

/**
 * Solution cycle: solid → gaseous ions (ΔH_L) → hydrated ions (Σν·ΔH_hyd) → back to solid (−ΔH_sol).
 * With the measured ΔH_sol given and ΔH_L null, it backs a lattice enthalpy out of a measurement.
 */
export function solutionCycle(input: SolutionCycleInput): CycleSolution {
  const p = requireFiniteInRange('cationsPerFormula', input.cationsPerFormula, 1, 6);
  const q = requireFiniteInRange('anionsPerFormula', input.anionsPerFormula, 1, 6);
  return solveCycle([
    {
      label: 'lattice → gaseous ions (ΔH_L)',
      enthalpyKJ: input.latticeEnthalpyKJ,
      uncertaintyKJ: input.latticeUncertaintyKJ ?? 0,
    },
    {
      label: 'hydrate the cations (ΔH_hyd,+)',
      enthalpyKJ: input.cationHydrationKJ,
      uncertaintyKJ: input.cationHydrationUncertaintyKJ ?? 0,
      multiplier: p,
    },
    {
      label: 'hydrate the anions (ΔH_hyd,−)',
      enthalpyKJ: input.anionHydrationKJ,
      uncertaintyKJ: input.anionHydrationUncertaintyKJ ?? 0,
      multiplier: q,
    },
    {
      label: 'solution → solid (−ΔH_sol)',
      enthalpyKJ: input.solutionEnthalpyKJ === null ? null : -input.solutionEnthalpyKJ,
      uncertaintyKJ: input.solutionUncertaintyKJ ?? 0,
    },
  ]);
}
