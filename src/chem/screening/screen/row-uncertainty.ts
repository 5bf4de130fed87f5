import type { RobustnessRow, RobustnessShared } from '../rank-robustness';

/**
 * The 1σ of the salt-limited log₁₀ solubility and of pH_max, linearised exactly as the rank-robustness
 * draw perturbs them (rank-robustness.ts): pH_max moves by Δ(pKa) + Δ(log S₀) − Δ(log s_salt) for a
 * base; when K_sp is anchored on S₀ the S₀ term cancels.
 */
export function uncertaintiesOf(
  row: { robustness: Pick<RobustnessRow, 'saltLog10Sigma' | 'saltAnchoredOnIntrinsic'> },
  shared: Pick<RobustnessShared, 'drugPkaSigma' | 'log10IntrinsicSigma'>,
): { saltLogSigma: number; freeLogSigma: number; phMaxSigma: number } {
  const r = row.robustness;
  const s0 = shared.log10IntrinsicSigma;
  const saltLogSigma = Math.sqrt(r.saltLog10Sigma ** 2 + (r.saltAnchoredOnIntrinsic ? s0 ** 2 : 0));
  const phMaxSigma = Math.sqrt(
    shared.drugPkaSigma ** 2 + r.saltLog10Sigma ** 2 + (r.saltAnchoredOnIntrinsic ? 0 : s0 ** 2),
  );
  return { saltLogSigma, freeLogSigma: s0, phMaxSigma };
}
