import { GAS_CONSTANT_KJ_PER_MOL_K } from '../constants/physical';
import { requireFiniteInRange, type Estimate } from '../result';

/**
 * Solubility product K_sp of a salt D_m X_n when no salt solubility has been measured.
 *
 * There is no reliable way to predict a salt's solubility from first principles; this estimate is a
 * screening device, labelled as such everywhere it appears, with a wide uncertainty. It has two
 * parts, both stated as assumptions:
 *
 * 1. **Anchor** (common practice, our own choice of number): a crystalline salt of a poorly soluble
 *    drug typically dissolves, fully ionised and without common ion, to 10–1000× the free form's
 *    intrinsic solubility. We take the geometric middle, log₁₀(s_D/S₀) = 2, with σ = 1 decade. For a
 *    1:1 salt this puts pH_max two units from the pKa — a typical figure, not a prediction.
 * 2. **Relative thermochemistry** (Hess cycle from the thermochemistry engine): between candidate
 *    salts of the same drug ion, a more endothermic enthalpy of solution means a less soluble salt.
 *    Assuming the entropy of solution is about the same for the candidates (our assumption; it fails
 *    for small, highly charged ions such as sulfate whose hydration entropy is strongly negative),
 *    Δlog₁₀ K_sp ≈ −ΔΔH_sol/(RT ln 10), shared over the m + n ions of the formula unit:
 *    Δlog₁₀ s_D ≈ −(ΔH_sol − ΔH_ref)/((m + n)·RT·ln 10), with ΔH_ref the median over the candidates.
 *    The candidate's own ΔH_sol uncertainty carries into σ without credit for error cancellation.
 *    The shift is capped at ±3 decades (our assumption: beyond that the model is not trusted).
 *
 * K_sp then follows from s (formula units per litre) for the fully ionised salt in pure water:
 * K_sp = (m·s)^m·(n·s)^n.
 */
export const SALT_TO_FREE_FORM_LOG10_ANCHOR = 2;
export const SALT_TO_FREE_FORM_LOG10_SIGMA = 1;
export const THERMO_SHIFT_CAP_DECADES = 3;

export interface KspEstimateInput {
  /** log₁₀ S₀ of the free form, mol/L, with its uncertainty (measured: small; GSE: ~0.6). */
  log10IntrinsicM: Estimate;
  drugPerSalt: number;
  counterIonPerSalt: number;
  /** The candidate's ΔH_sol per formula unit, kJ/mol, when the thermochemistry engine gave one. */
  solutionEnthalpyKJ?: Estimate | null;
  /** Median ΔH_sol per drug ion over the candidates of the same drug ion, kJ/mol (reference for the shift). */
  referenceSolutionEnthalpyPerDrugKJ?: number | null;
  temperatureK: number;
  /** Override of the anchor, decades above S₀ (settings). */
  anchorLog10?: number;
}

export interface KspEstimate {
  /** log₁₀ K_sp, K_sp in (mol/L)^(m+n); uncertainty in decades. */
  log10Ksp: Estimate;
  /** Salt-limited drug solubility (fully ionised, no common ion), log₁₀ mol/L; uncertainty in decades. */
  log10SaltLimitedDrugM: Estimate;
  /** The thermochemical shift applied, decades (0 without thermochemistry). */
  thermoShiftDecades: number;
  capped: boolean;
}

/** log₁₀ K_sp of D_m X_n from its solubility s (formula units, mol/L) in pure water, fully ionised. */
export function log10KspFromFormulaUnits(log10S: number, m: number, n: number): number {
  return m * (Math.log10(m) + log10S) + n * (Math.log10(n) + log10S);
}

export function estimateKsp(i: KspEstimateInput): KspEstimate {
  const T = requireFiniteInRange('temperatureK', i.temperatureK, 200, 400, 'K');
  const m = i.drugPerSalt;
  const n = i.counterIonPerSalt;
  const anchor = i.anchorLog10 ?? SALT_TO_FREE_FORM_LOG10_ANCHOR;
  const perDecade = GAS_CONSTANT_KJ_PER_MOL_K * T * Math.LN10;
  let shift = 0;
  let shiftSigma = 0;
  let capped = false;
  const notes: string[] = [
    `anchor: salt-limited solubility ${anchor} decades above S₀ (common practice, σ ${SALT_TO_FREE_FORM_LOG10_SIGMA} decade)`,
  ];
  const dH = i.solutionEnthalpyKJ;
  if (dH && i.referenceSolutionEnthalpyPerDrugKJ !== undefined && i.referenceSolutionEnthalpyPerDrugKJ !== null) {
    const perDrug = dH.value / m;
    const raw = -(perDrug - i.referenceSolutionEnthalpyPerDrugKJ) * m / ((m + n) * perDecade);
    shift = Math.max(-THERMO_SHIFT_CAP_DECADES, Math.min(THERMO_SHIFT_CAP_DECADES, raw));
    capped = shift !== raw;
    shiftSigma = dH.uncertainty / ((m + n) * perDecade);
    notes.push(
      `thermochemical shift ${shift >= 0 ? '+' : ''}${shift.toFixed(2)} decades from ΔH_sol ${dH.value.toFixed(0)} ± ${dH.uncertainty.toFixed(0)} kJ/mol relative to the candidates’ median${capped ? ' (capped at ±3 decades)' : ''}; equal entropies of solution assumed`,
    );
  } else {
    notes.push('no thermochemistry available: anchor only');
  }
  const logSD = i.log10IntrinsicM.value + anchor + shift;
  const sigmaSD = Math.sqrt(i.log10IntrinsicM.uncertainty ** 2 + SALT_TO_FREE_FORM_LOG10_SIGMA ** 2 + shiftSigma ** 2);
  const logS = logSD - Math.log10(m);
  const sources = [
    'Saltsmith screening estimate (salt-to-free-form anchor, common practice)',
    ...i.log10IntrinsicM.sources,
    ...(dH ? dH.sources : []),
  ];
  return {
    log10Ksp: {
      value: log10KspFromFormulaUnits(logS, m, n),
      uncertainty: (m + n) * sigmaSD,
      method: dH ? 'ksp-estimate-anchor-thermo' : 'ksp-estimate-anchor',
      sources,
      notes: ['ESTIMATE — no salt solubility measured', ...notes],
    },
    log10SaltLimitedDrugM: { value: logSD, uncertainty: sigmaSD, method: dH ? 'ksp-estimate-anchor-thermo' : 'ksp-estimate-anchor', sources, notes },
    thermoShiftDecades: shift,
    capped,
  };
}
