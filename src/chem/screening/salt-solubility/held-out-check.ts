import type * as OpenChemLib from 'openchemlib';
import { counterIonFromParentSmiles } from './counter-ion-descriptors';
import { estimateSaltWaterSolubility } from './estimate-salt-solubility';
import { idealSolubility, moleFractionToMolPerL } from './fusion';
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
  /**
   * On the salts with an ideal solubility (the paper's own, or Schröder–van Laar from its melting point
   * and ΔH_fus at 298.15 K), without and with it as crystal term (centred on those salts); null when
   * fewer than three salts have one.
   */
  withFusion: {
    n: number;
    spearmanWithout: number;
    spearmanWith: number;
    withinRmseWithout: number;
    withinRmseWith: number;
  } | null;
}

const centred = (xs: readonly number[]) => {
  const m = xs.reduce((a, b) => a + b, 0) / xs.length;
  return xs.map((x) => x - m);
};
const centredRms = (xs: readonly number[]) =>
  rootMeanSquareError(
    centred(xs),
    xs.map(() => 0),
  );

/** Measured log₁₀ mol/L of drug: from a mole fraction (dilute, per litre of water) or from mM. */
function measuredLog10(r: CsvRecord): number {
  const m = Number(r.drug_per_salt);
  const x = Number(r.measured_mole_fraction);
  if (r.measured_mole_fraction && x > 0) return Math.log10(moleFractionToMolPerL(x) * m);
  return Math.log10((Number(r.solubility_mM) / 1000) * m);
}

/** log₁₀ of the ideal mole fraction: the paper's own, else from T_m and ΔH_fus; null without either. */
function idealLog10(r: CsvRecord): number | null {
  const x = Number(r.ideal_mole_fraction);
  if (r.ideal_mole_fraction && x > 0) return Math.log10(x);
  if (!r.salt_melting_point_c || !r.fusion_enthalpy_kj_per_mol) return null;
  const ideal = idealSolubility({
    meltingPointK: Number(r.salt_melting_point_c) + 273.15,
    fusionEnthalpyKJPerMol: Number(r.fusion_enthalpy_kj_per_mol),
    temperatureK: 298.15,
  });
  return ideal.lnMoleFraction / Math.LN10;
}

function fusionFigures(
  predicted: readonly number[],
  measured: readonly number[],
  ideal: readonly (number | null)[],
): HeldOutSeriesCheck['withFusion'] {
  const idx = ideal.flatMap((v, i) => (v === null ? [] : [i]));
  if (idx.length < 3) return null;
  const p = idx.map((i) => predicted[i]!);
  const m = idx.map((i) => measured[i]!);
  const shift = centred(idx.map((i) => ideal[i]!));
  const p2 = p.map((v, k) => v + shift[k]!);
  return {
    n: idx.length,
    spearmanWithout: spearmanRho(p, m),
    spearmanWith: spearmanRho(p2, m),
    withinRmseWithout: centredRms(p.map((v, k) => v - m[k]!)),
    withinRmseWith: centredRms(p2.map((v, k) => v - m[k]!)),
  };
}

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
    const measured = rs.map(measuredLog10);
    const resid = centred(predicted.map((p, i) => p - measured[i]!));
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
      withFusion: fusionFigures(predicted, measured, rs.map(idealLog10)),
    };
  });
}
