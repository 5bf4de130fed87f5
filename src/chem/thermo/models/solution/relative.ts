import { ChemInputError, requireFiniteInRange, type Estimate } from '../../../result';
import type { SaltThermoResult } from '../../thermo.types';

/** One candidate salt of a shared drug ion, as `estimateSaltThermo` answered it. */
export interface RelativeCandidate {
  result: SaltThermoResult;
  /** Drug ions per formula unit (m in D_mX_n). */
  drugPerFormula: number;
  /** Counter-ions per formula unit (n in D_mX_n). */
  counterPerFormula: number;
  /** Which side of the result is the drug ion. */
  drugIs: 'cation' | 'anion';
}

/**
 * ΔH_sol per drug ion of candidate `a` minus that of reference `b`, kJ/mol, for two salts of the SAME drug
 * ion. The drug ion's hydration enthalpy enters both once per drug ion and cancels exactly; its
 * uncertainty is removed. What remains — each salt's lattice term and counter-ion hydration — is combined in
 * quadrature and scaled by `pairFactor`, the measured ratio of the RMS error of such differences to the
 * quadrature estimate on bundled reference pairs that share an ion (`relativePairFactor()` in the
 * validation), so a partial cancellation of model errors is credited only as far as it was observed.
 */
export function relativeSolutionEnthalpyKJ(
  a: RelativeCandidate,
  b: RelativeCandidate,
  pairFactor: number,
): Estimate {
  const f = requireFiniteInRange('pairFactor', pairFactor, 0.05, 5);
  const part = (c: RelativeCandidate, field: string) => {
    const m = requireFiniteInRange(`${field}.drugPerFormula`, c.drugPerFormula, 1, 6);
    if (c.drugIs !== 'cation' && c.drugIs !== 'anion')
      throw new ChemInputError(`${field}.drugIs`, `"${String(c.drugIs)}"`, 'cation or anion');
    const r = c.result;
    const counterH = c.drugIs === 'cation' ? r.anionHydrationKJ : r.cationHydrationKJ;
    // ΔH_sol = ΔH_L + m·h_drug + n·h_counter  ⇒  per drug ion: ΔH_L/m + h_drug + (n/m)·h_counter
    const n = requireFiniteInRange(`${field}.counterPerFormula`, c.counterPerFormula, 1, 6);
    const perDrugWithoutDrugH = r.latticeEnthalpyKJ.value / m + (n / m) * counterH.value;
    const u = Math.hypot(r.latticeEnthalpyKJ.uncertainty / m, (n / m) * counterH.uncertainty);
    return { v: perDrugWithoutDrugH, u, sources: r.solutionEnthalpyKJ.sources };
  };
  const pa = part(a, 'a');
  const pb = part(b, 'b');
  return {
    value: pa.v - pb.v,
    uncertainty: f * Math.hypot(pa.u, pb.u),
    method: 'relative-hess',
    sources: [...new Set([...pa.sources, ...pb.sources])],
    notes: [
      'difference per drug ion: the drug ion’s hydration enthalpy cancels exactly',
      `model uncertainties in quadrature × ${f.toFixed(2)}, the factor measured on reference pairs sharing an ion`,
    ],
  };
}

/**
 * ΔH_sol per drug ion of each candidate relative to the median candidate. The drug ion's own
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
