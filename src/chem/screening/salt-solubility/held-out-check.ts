import type * as OpenChemLib from 'openchemlib';
import { counterIonFromParentSmiles } from './counter-ion-descriptors';
import { estimateSaltWaterSolubility } from './estimate-salt-solubility';
import { moleFractionToMolPerL } from './fusion';
import {
  leastSolubleAmongLowestPredicted,
  rootMeanSquareError,
  spearmanRho,
} from './rank-statistics';
import type { CsvRecord } from './training-rows';

/**
 * The shipped model checked on a published series that never entered its fit
 * (fixtures/reference/salt-solubility-held-out.csv, each row with its source). Such a series often
 * comes without the free form's S₀, so only what does not depend on the drug's level is judged: the
 * order within the series (Spearman ρ, least soluble among the two lowest), the within-series error
 * (residuals centred on the series mean, to set beside the model's within-series 1σ) and, where the
 * paper gives each salt's ideal solubility, the same with the crystal term added (centred likewise).
 */
export interface HeldOutSeriesCheck {
  drugId: string;
  n: number;
  labels: string[];
  measured: number[];
  predicted: number[];
  spearman: number;
  leastSolubleInLowestTwo: boolean;
  /** RMS of (predicted − measured) after removing the series' mean difference, decades. */
  withinRmse: number;
  /** The same for the no-descriptor baseline (one value for every salt): the SD of the measured values. */
  baselineWithinRmse: number;
  /** Share of salts whose centred residual lies inside ± the estimate's within-series 1σ. */
  withinCoverage1Sigma: number;
  /** With the paper's ideal solubility as crystal term (null without it). */
  withFusion: { spearman: number; withinRmse: number } | null;
}

const centred = (xs: readonly number[]) => {
  const m = xs.reduce((a, b) => a + b, 0) / xs.length;
  return xs.map((x) => x - m);
};

export function checkHeldOutSeries(
  ocl: typeof OpenChemLib,
  records: readonly CsvRecord[],
): HeldOutSeriesCheck[] {
  const byDrug = new Map<string, CsvRecord[]>();
  for (const r of records) byDrug.set(r.drug_id!, [...(byDrug.get(r.drug_id!) ?? []), r]);
  return [...byDrug].map(([drugId, rs]) => {
    const est = rs.map((r) => {
      const charge = Number(r.counter_ion_charge);
      const ion = counterIonFromParentSmiles(ocl, r.counter_ion_parent_smiles!, charge);
      return estimateSaltWaterSolubility({
        // the drug's level cancels in every within-series figure; S₀ and log P are placeholders
        drug: { kind: r.drug_kind === 'acid' ? 'acid' : 'base', log10IntrinsicM: -3, logP: null },
        counterIon: { ...ion.descriptors, charge },
        drugPerSalt: Number(r.drug_per_salt),
        counterIonPerSalt: Number(r.counter_ion_per_salt),
      });
    });
    const predicted = est.map((e) => e.log10DrugM.value);
    const measured = rs.map((r) =>
      Math.log10(moleFractionToMolPerL(Number(r.measured_mole_fraction)) * Number(r.drug_per_salt)),
    );
    const resid = centred(predicted.map((p, i) => p - measured[i]!));
    const ideal = rs.map((r) => Number(r.ideal_mole_fraction));
    const withFusion = ideal.every((x) => x > 0)
      ? (() => {
          const shift = centred(ideal.map((x) => Math.log10(x)));
          const p2 = predicted.map((p, i) => p + shift[i]!);
          return {
            spearman: spearmanRho(p2, measured),
            withinRmse: rootMeanSquareError(
              centred(p2.map((p, i) => p - measured[i]!)),
              resid.map(() => 0),
            ),
          };
        })()
      : null;
    return {
      drugId,
      n: rs.length,
      labels: rs.map((r) => r.counter_ion_name!),
      measured,
      predicted,
      spearman: spearmanRho(predicted, measured),
      leastSolubleInLowestTwo: leastSolubleAmongLowestPredicted(predicted, measured, 2),
      withinRmse: rootMeanSquareError(
        resid,
        resid.map(() => 0),
      ),
      baselineWithinRmse: rootMeanSquareError(
        centred(measured),
        measured.map(() => 0),
      ),
      withinCoverage1Sigma:
        resid.filter((e, i) => Math.abs(e) <= est[i]!.withinLog10Sd).length / resid.length,
      withFusion,
    };
  });
}
