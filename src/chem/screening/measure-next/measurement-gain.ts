import type { ScreenRow } from '../screen/screen.types';
import { SALT_SOLUBILITY_FUSION_CHECK } from '../salt-solubility/salt-solubility-model.data';

/**
 * What one bench measurement would tell the screen about one candidate, as the share of that
 * candidate's salt-solubility variance it resolves (its Kalman gain, 0–1) and the outcome's own noise.
 *
 * - **Solubility** of the salt: measured to 1σ = {@link MEASUREMENT_LOG10_SOLUBILITY_SIGMA} decades —
 *   common practice (about ±10 % for a shake-flask value; the same 0.05 decades the screen carries
 *   once a measured solubility replaces the estimate, MEASURED_LOG10_S_SIGMA). Gain V/(V + σ²).
 * - **Melting point with ΔH_fus** (DSC): moves the estimate only through the fusion path of the
 *   shipped salt-solubility model. It resolves the variance that path is shown by leave-one-drug-out
 *   cross-validation to remove, cv(model)² − cv(fusion variant)²; with no fusion variant shipped, or
 *   one that is not more accurate, it resolves nothing (gain 0): the crystal-term shift the screen
 *   then applies is not cross-validated and leaves the 1σ unchanged, so for the ranking's doubt
 *   a melting point is worth nothing yet.
 */
export type BenchMeasurement = 'solubility' | 'melting-point';

/** Solubility 1σ of a measurement, decades (common practice: about ±10 %; see above). */
export const MEASUREMENT_LOG10_SOLUBILITY_SIGMA = 0.05;

/**
 * A measurement already taken is proposed again only while the candidate's salt-solubility 1σ is
 * still wider than this, decades (our choice: a factor of two in solubility).
 */
export const STILL_WIDE_LOG10_SIGMA = 0.3;

/** What the shipped model says of its fusion (melting-point) path, leave-one-drug-out. */
export interface FusionPathCheck {
  /** The path is applied to estimates (cross-validation favoured it). */
  applies: boolean;
  /** Cross-validated RMSE without and with the path, decades (null: not measured). */
  rmseWithout: number | null;
  rmseWith: number | null;
}

/**
 * The shipped model's fusion path: the melting-point correction is applied only when its generated
 * leave-one-drug-out check on the published salts with a melting point favoured it
 * (SALT_SOLUBILITY_FUSION_CHECK, salt-solubility/model-evidence.ts). The one place measure-next reads it.
 */
export function shippedFusionPath(): FusionPathCheck {
  const c = SALT_SOLUBILITY_FUSION_CHECK as {
    readonly fusionCorrectionApplies: boolean;
    readonly rmseWithout: number | null;
    readonly rmseWith: number | null;
  };
  return {
    applies: c.fusionCorrectionApplies,
    rmseWithout: c.rmseWithout,
    rmseWith: c.rmseWith,
  };
}

/** Variance of log₁₀ solubility the fusion path removes by cross-validation, decades² (0 if none). */
export function fusionPathExplainedVariance(check: FusionPathCheck = shippedFusionPath()): number {
  const a = check.rmseWithout;
  const b = check.rmseWith;
  if (!check.applies || a == null || b == null || !Number.isFinite(a) || !Number.isFinite(b))
    return 0;
  return Math.max(0, a * a - b * b);
}

/** Where each candidate stands with its bench data (from its screen row). */
export interface MeasureNextStatus {
  id: string;
  /** A measured salt solubility already sets its K_sp. */
  solubilityMeasured: boolean;
  /** Its estimate comes from the salt-solubility model, the only path a melting point can move. */
  meltingPointApplies: boolean;
  /** A bench melting point already feeds that estimate. */
  meltingPointMeasured: boolean;
}

/** The bench status of a screened candidate, read from its screen row. */
export function measureNextStatusOf(row: ScreenRow): MeasureNextStatus {
  const origin = row.saltWaterSolubility?.origin ?? null;
  return {
    id: row.id,
    solubilityMeasured: row.kspOrigin === 'measured',
    meltingPointApplies: origin === 'model' || origin === 'model+fusion',
    meltingPointMeasured: origin === 'model+fusion',
  };
}

export interface MeasurementGain {
  /** Share of the candidate's salt-solubility variance the outcome resolves, 0–1. */
  gain: number;
  /** 1σ of the outcome about the true value, decades (0 for a perfect measurement). */
  noiseSd: number;
}

/**
 * Gain of one measurement for a candidate whose salt-limited log₁₀ solubility has prior variance
 * `variance` (decades²) in the Monte Carlo draw.
 */
export function measurementGain(
  kind: BenchMeasurement,
  variance: number,
  explainedByFusion: number = fusionPathExplainedVariance(),
): MeasurementGain {
  if (!(variance > 0)) return { gain: 0, noiseSd: 0 };
  const noiseVar =
    kind === 'solubility'
      ? MEASUREMENT_LOG10_SOLUBILITY_SIGMA ** 2
      : explainedByFusion <= 0
        ? Number.POSITIVE_INFINITY
        : explainedByFusion >= variance
          ? 0
          : (variance * (variance - explainedByFusion)) / explainedByFusion;
  if (!Number.isFinite(noiseVar)) return { gain: 0, noiseSd: 0 };
  return { gain: variance / (variance + noiseVar), noiseSd: Math.sqrt(noiseVar) };
}
