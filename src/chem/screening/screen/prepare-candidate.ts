import type { Estimate } from '../../result';
import { saltMolarMassGPerMol } from '../mass-cost';
import { interpretMeasurements, type InterpretedMeasurements } from '../measurements';
import type { Protolyte } from '../speciation';
import { candidateProtolyte } from '../candidate-skeletons';
import { saltMassInput, type ScreenContext } from './screen-context';
import type { ScreeningCandidate } from './screen.types';

/** σ assumed for a calorimetric ΔH_sol the user measured, kJ/mol (our assumption). */
const MEASURED_SOLUTION_ENTHALPY_SIGMA_KJ = 2;

/** One candidate made ready for the screen: its protolyte, salt mass, measurements and ΔH_sol. */
export interface PreparedCandidate {
  cand: ScreeningCandidate;
  protolyte: Protolyte;
  saltMolarMassGPerMol: number;
  measured: InterpretedMeasurements | null;
  /** ΔH_sol per formula unit, kJ/mol: measured where the user has one, else the engine's estimate. */
  solutionEnthalpyKJ: Estimate | null;
  /** Where ΔH_sol came from, in words (null without one). */
  solutionEnthalpyOrigin: string | null;
}

export type PreparedOrError = PreparedCandidate | { cand: ScreeningCandidate; error: string };

export const isPrepared = (p: PreparedOrError): p is PreparedCandidate => !('error' in p);

/**
 * Prepare a candidate. Measurements come first: a measured ΔH_sol (calorimetry, or a van ’t Hoff fit)
 * replaces the engine's estimate before the reference median is taken. A bad candidate gets `error`.
 */
export function prepareCandidate(ctx: ScreenContext, cand: ScreeningCandidate): PreparedOrError {
  try {
    const st = cand.stoichiometry;
    // a library candidate's protolyte was built with its skeleton (candidate-skeletons.ts)
    const protolyte = candidateProtolyte(cand.counterIon, st);
    const saltGPerMol = saltMolarMassGPerMol(saltMassInput(ctx, cand));
    const measured = cand.measurements?.length
      ? interpretMeasurements(cand.measurements, {
          saltMolarMassGPerMol: saltGPerMol,
          freeFormMolarMassGPerMol: ctx.freeFormMolarMassGPerMol,
          drugPerSalt: st.drugPerSalt,
          temperatureK: ctx.temperatureK,
        })
      : null;
    let dH: Estimate | null = cand.solutionEnthalpyKJ ?? null;
    let origin: string | null = dH ? 'thermochemistry estimate' : null;
    if (measured?.solutionEnthalpyKJ !== null && measured?.solutionEnthalpyKJ !== undefined) {
      dH = {
        value: measured.solutionEnthalpyKJ,
        uncertainty: MEASURED_SOLUTION_ENTHALPY_SIGMA_KJ,
        method: 'measured-calorimetric',
        sources: ['measured ΔH_sol (user data; σ 2 kJ/mol assumed)'],
      };
      origin = 'measured (calorimetry)';
    } else if (measured?.vantHoff) {
      dH = measured.vantHoff.solutionEnthalpyKJ;
      origin = 'measured (van ’t Hoff fit)';
    }
    return {
      cand,
      protolyte,
      saltMolarMassGPerMol: saltGPerMol,
      measured,
      solutionEnthalpyKJ: dH,
      solutionEnthalpyOrigin: origin,
    };
  } catch (err) {
    return { cand, error: err instanceof Error ? err.message : String(err) };
  }
}

function median(xs: number[]): number | null {
  if (xs.length === 0) return null;
  const s = [...xs].sort((a, b) => a - b);
  const k = Math.floor(s.length / 2);
  return s.length % 2 ? s[k]! : (s[k - 1]! + s[k]!) / 2;
}

/** The median ΔH_sol per drug ion over the prepared candidates, kJ/mol: the reference K_sp shifts from. */
export function referenceSolutionEnthalpyPerDrugKJ(
  prepared: readonly PreparedOrError[],
): number | null {
  return median(
    prepared.flatMap((p) =>
      !isPrepared(p) || !p.solutionEnthalpyKJ
        ? []
        : [p.solutionEnthalpyKJ.value / p.cand.stoichiometry.drugPerSalt],
    ),
  );
}
