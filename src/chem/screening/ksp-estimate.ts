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
 *    Δlog₁₀ s_D ≈ −(ΔH_sol − m·ΔH_ref)/((m + n)·RT·ln 10), with ΔH_ref the median per drug ion over
 *    the candidates. ΔH_sol is a small difference of large numbers and its uncertainty is often tens
 *    of kJ/mol, i.e. several decades here, so the shift is not applied at face value: it is combined
 *    with the anchor's own spread as two normal estimates of the same deviation (prior N(0, 1 decade)
 *    from the anchor, "measurement" N(shift, σ_shift) from the thermochemistry; the standard
 *    normal–normal update, e.g. Gelman et al., "Bayesian Data Analysis", 3rd ed., §2.5):
 *    applied shift = shift·τ²/(τ² + σ²), σ_post = τσ/√(τ² + σ²). A precise ΔH_sol moves the
 *    estimate; an imprecise one leaves it at the anchor and says so. The candidate's own ΔH_sol
 *    uncertainty is used without credit for error cancellation (conservative).
 *
 * K_sp then follows from s (formula units per litre) for the fully ionised salt in pure water:
 * K_sp = (m·s)^m·(n·s)^n.
 */
export const SALT_TO_FREE_FORM_LOG10_ANCHOR = 2;
export const SALT_TO_FREE_FORM_LOG10_SIGMA = 1;

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
  /** The thermochemical shift applied after the normal–normal update, decades (0 without thermochemistry). */
  thermoShiftDecades: number;
  /** The raw thermochemical shift before the update, decades, and its 1σ (null without thermochemistry). */
  rawThermoShiftDecades: number | null;
  rawThermoShiftSigma: number | null;
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
  const tau = SALT_TO_FREE_FORM_LOG10_SIGMA;
  let shift = 0;
  let sigmaDeviation = tau;
  let raw: number | null = null;
  let rawSigma: number | null = null;
  const notes: string[] = [
    `anchor: salt-limited solubility ${anchor} decades above S₀ (common practice, σ ${tau} decade)`,
  ];
  const dH = i.solutionEnthalpyKJ;
  if (
    dH &&
    i.referenceSolutionEnthalpyPerDrugKJ !== undefined &&
    i.referenceSolutionEnthalpyPerDrugKJ !== null
  ) {
    raw = -(dH.value - m * i.referenceSolutionEnthalpyPerDrugKJ) / ((m + n) * perDecade);
    rawSigma = Math.max(dH.uncertainty, 1e-9) / ((m + n) * perDecade);
    const w = (tau * tau) / (tau * tau + rawSigma * rawSigma);
    shift = raw * w;
    sigmaDeviation = (tau * rawSigma) / Math.sqrt(tau * tau + rawSigma * rawSigma);
    notes.push(
      `thermochemistry: ΔH_sol ${dH.value.toFixed(0)} ± ${dH.uncertainty.toFixed(0)} kJ/mol vs the candidates’ median suggests ${raw >= 0 ? '+' : ''}${raw.toFixed(1)} ± ${rawSigma.toFixed(1)} decades; applied ${shift >= 0 ? '+' : ''}${shift.toFixed(2)} (weight ${(w * 100).toFixed(0)} %, equal entropies of solution assumed)`,
    );
  } else {
    notes.push('no thermochemistry available: anchor only');
  }
  const logSD = i.log10IntrinsicM.value + anchor + shift;
  const sigmaSD = Math.sqrt(i.log10IntrinsicM.uncertainty ** 2 + sigmaDeviation ** 2);
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
    log10SaltLimitedDrugM: {
      value: logSD,
      uncertainty: sigmaSD,
      method: dH ? 'ksp-estimate-anchor-thermo' : 'ksp-estimate-anchor',
      sources,
      notes,
    },
    thermoShiftDecades: shift,
    rawThermoShiftDecades: raw,
    rawThermoShiftSigma: rawSigma,
  };
}
