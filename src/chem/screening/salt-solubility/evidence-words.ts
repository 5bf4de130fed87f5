import {
  SALT_SOLUBILITY_DIVALENT_CATIONS,
  SALT_SOLUBILITY_FUSION_CHECK,
  SALT_SOLUBILITY_MODEL,
  SALT_SOLUBILITY_SELECTION,
} from './salt-solubility-model.data';

/** Below this RMSE difference, log₁₀ units, two models' errors are "not measurably different" (our choice, as the variant rule's margin). */
const RMSE_NOISE = 0.02;

// A typographic minus (U+2212), as every other screen prints a negative number.
const f2 = (x: number | null) => (x === null ? '—' : x.toFixed(2).replace(/^-/, '−'));
const f3 = (x: number | null) => (x === null ? '—' : x.toFixed(3));

/**
 * In words, from the generated figures only: what the counter-ion descriptors add over the
 * no-descriptor baseline (log₁₀ S₀ + the average offset of the other drugs' series) on the same
 * leave-one-drug-out folds. Model check and the tests read this; the README states the same figures.
 */
export function descriptorGainWords(): string {
  const s = SALT_SOLUBILITY_SELECTION;
  const dRmse = (s.baselineRmse ?? 0) - (s.rmse ?? 0);
  const error =
    Math.abs(dRmse) < RMSE_NOISE
      ? `The counter-ion descriptors do not measurably lower the error: RMSE ${f3(s.rmse)} against ${f3(s.baselineRmse)} for the baseline without them`
      : dRmse > 0
        ? `The counter-ion descriptors lower the error: RMSE ${f3(s.rmse)} against ${f3(s.baselineRmse)} for the baseline without them`
        : `The counter-ion descriptors raise the error: RMSE ${f3(s.rmse)} against ${f3(s.baselineRmse)} for the baseline without them`;
  const order =
    (s.meanSpearman ?? 0) > (s.baselineMeanSpearman ?? 0)
      ? `; what they add is an order within a drug's series — mean Spearman ρ ${f2(s.meanSpearman)} against ${f2(s.baselineMeanSpearman)} (the baseline gives every salt of one drug the same value), and the least soluble salt among the two lowest in ${s.leastSolubleHits} of ${s.nRankedSeries} series against ${s.baselineLeastSolubleHits} — a weak signal from only ${s.nRankedSeries} series of three or more salts`
      : `; nor do they order salts within a series better (mean Spearman ρ ${f2(s.meanSpearman)} against ${f2(s.baselineMeanSpearman)})`;
  return `${error}${order}.`;
}

/** The 1σ split in words. */
export function sigmaSplitWords(): string {
  const m = SALT_SOLUBILITY_MODEL;
  return `Of the ±${f2(m.cvRmseLog10)} decades, ${f2(m.sharedLog10Sd)} is a level shared by every salt of one drug and ${f2(m.withinLog10Sd)} differs salt by salt: salts of one drug are more alike than their ±1σ suggests.`;
}

/** The fusion check in words. */
export function fusionCheckWords(): string {
  const c = SALT_SOLUBILITY_FUSION_CHECK;
  return `Melting-point correction (Schröder–van Laar ideal solubility, Walden's rule where no ΔH_fus is published) on the ${c.nSalts} published salts with a melting point, leaving each drug out: RMSE ${f2(c.rmseWithout)} without, ${f2(c.rmseWith)} with; better for ${c.nImproved}, worse for ${c.nWorsened} — ${c.fusionCorrectionApplies ? 'applied to estimates with bench melting data' : 'not applied; the ideal solubility from bench melting data is shown beside the estimate as information'}.`;
}

/** The divalent-cation evidence in words. */
export function divalentCationWords(): string {
  const d = SALT_SOLUBILITY_DIVALENT_CATIONS;
  const pairs = d.pairs
    .map(
      (p) =>
        `${p.label} ${f2(p.contrastDecades)} decades against the same acid's singly charged salts`,
    )
    .join('; ');
  return `Divalent cations with acids: the published set holds ${d.pairs.length} such salts (${pairs}). ${d.offsetApplies ? `Their mean offset, ${f2(d.offsetDecades)} decades, is applied to calcium, magnesium and zinc salts of acids (leave-one-drug-out error of the contrast ${f2(d.rmseWithout)} without, ${f2(d.rmseWith)} with)` : 'Too few to learn an offset'}, and their within-series 1σ is widened by ${f2(d.extraWithinLog10Sd)} decades in quadrature, because an offset from ${d.pairs.length} pairs is itself uncertain.`;
}
