import type { RobustnessRow, RobustnessShared } from '../rank-robustness';

/**
 * The 1σ of the salt-limited log₁₀ solubility and of pH_max, linearised exactly as the rank-robustness
 * draw perturbs them (rank-robustness.ts): pH_max moves by Δ(pKa) + Δ(log S₀) − Δ(log s_salt) for a
 * base; when K_sp is anchored on S₀ the S₀ term cancels.
 */
export function uncertaintiesOf(
  row: {
    robustness: Pick<
      RobustnessRow,
      'saltLog10Sigma' | 'saltSharedLog10Sigma' | 'saltAnchoredOnIntrinsic'
    >;
  },
  shared: Pick<RobustnessShared, 'drugPkaSigma' | 'log10IntrinsicSigma'>,
): { saltLogSigma: number; freeLogSigma: number; phMaxSigma: number } {
  const r = row.robustness;
  const s0 = shared.log10IntrinsicSigma;
  // The salt's own spread: its per-candidate part and the model's level shared by the drug's salts.
  const own = r.saltLog10Sigma ** 2 + (r.saltSharedLog10Sigma ?? 0) ** 2;
  const saltLogSigma = Math.sqrt(own + (r.saltAnchoredOnIntrinsic ? s0 ** 2 : 0));
  const phMaxSigma = Math.sqrt(
    shared.drugPkaSigma ** 2 + own + (r.saltAnchoredOnIntrinsic ? 0 : s0 ** 2),
  );
  return { saltLogSigma, freeLogSigma: s0, phMaxSigma };
}
