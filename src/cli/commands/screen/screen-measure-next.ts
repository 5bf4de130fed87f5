import {
  measureNext,
  measureNextStatusOf,
  type BenchMeasurement,
  type ScreenResult,
  type ScreeningWeights,
} from '@/chem';

/** One entry of `screen --format json`'s top-level `measure_next` array. */
export interface MeasureNextEntry {
  counter_ion: string;
  measurement: BenchMeasurement;
  /** Expected reduction of the probability that the candidate most often first is not the best, 0–1. */
  value: number;
}

/**
 * The "measure next" list of one screen: every proposed measurement (salt solubility, melting point
 * with ΔH_fus) of every candidate, highest value first, from the same seeded Monte Carlo as p_top3
 * (`--iterations` kept draws, `--seed`; 16 outcome strata). A melting point reads 0 while the shipped
 * salt-solubility model has no cross-validated fusion path. Rounded to 3 decimals.
 */
export function measureNextEntries(
  res: ScreenResult,
  weights: ScreeningWeights,
  opts: { iterations: number; seed: number },
): MeasureNextEntry[] {
  const r = measureNext(
    res.rows.map((x) => x.robustness),
    res.rows.map(measureNextStatusOf),
    weights,
    res.robustnessShared,
    { iterations: opts.iterations, seed: opts.seed },
  );
  const ionOf = new Map(res.rows.map((x) => [x.id, x.counterIonId]));
  return r.items.map((x) => ({
    counter_ion: ionOf.get(x.id) ?? x.id,
    measurement: x.measurement,
    value: Number(x.value.toFixed(3)),
  }));
}
