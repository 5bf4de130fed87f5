/** Measure next: the value of each bench measurement for the choice of first place (see measure-next.ts). */
export * from './measure-next';
export {
  fusionPathExplainedVariance,
  shippedFusionPath,
  type FusionPathCheck,
  measureNextStatusOf,
  measurementGain,
  MEASUREMENT_LOG10_SOLUBILITY_SIGMA,
  STILL_WIDE_LOG10_SIGMA,
  type BenchMeasurement,
  type MeasureNextStatus,
  type MeasurementGain,
} from './measurement-gain';
