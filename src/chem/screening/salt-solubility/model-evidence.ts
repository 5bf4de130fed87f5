import { rootMeanSquareError } from './rank-statistics';
import type { CrossValidationReport } from './cross-validation';
import {
  featureRow,
  log10IdealMoleFraction,
  SALT_SOLUBILITY_FEATURES,
} from './salt-solubility-features';
import type { SaltSolubilityTrainingRow } from './fit-salt-solubility';

/**
 * What the cross-validated residuals of the shipped procedure say beyond one RMSE: how the error
 * splits into a level shared by all salts of one drug and a part that differs salt by salt; whether
 * the melting-point (fusion) correction earns its place; what the few salts of divalent cations with
 * acids say; and the range of counter-ion descriptors the model was trained on (its applicability
 * domain). Everything here is computed from out-of-fold predictions (`CrossValidationReport.folds`),
 * never from the training fit.
 */

/** A margin below which a correction is not worth applying, log₁₀ units (our choice, as in variant-choice.ts). */
const RMSE_MARGIN = 0.02;

export interface ResidualSplit {
  /** 1σ of the level shared by every salt of one drug, decades. */
  sharedLog10Sd: number;
  /** 1σ of a salt around its drug's level, decades. */
  withinLog10Sd: number;
  /** √(shared² + within²) = the cross-validated RMSE. */
  totalLog10Sd: number;
  /** Degrees of freedom of the within part: Σ (salts of a drug − 1) over drugs with ≥ 2 salts. */
  withinDof: number;
}

/**
 * One-way random-effects split of the out-of-fold residuals e = predicted − measured by drug, by the
 * ANOVA (method-of-moments) estimator (Searle, Casella & McCulloch, "Variance Components", Wiley 1992,
 * ch. 3 — from memory): within² = Σ_drugs Σ_salts (e − ē_drug)² / Σ (n_drug − 1); shared² = RMSE² −
 * within², floored at 0, so that shared² + within² is the cross-validated mean square error.
 */
export function splitResiduals(cv: CrossValidationReport): ResidualSplit {
  let ss = 0;
  let dof = 0;
  for (const f of cv.folds) {
    if (f.n < 2) continue;
    const e = f.predicted.map((p, i) => p - f.measured[i]!);
    const mean = e.reduce((a, b) => a + b, 0) / e.length;
    ss += e.reduce((a, x) => a + (x - mean) ** 2, 0);
    dof += f.n - 1;
  }
  const total = cv.rmse;
  const within = dof > 0 ? Math.min(Math.sqrt(ss / dof), total) : total;
  return {
    sharedLog10Sd: Math.sqrt(Math.max(0, total ** 2 - within ** 2)),
    withinLog10Sd: within,
    totalLog10Sd: total,
    withinDof: dof,
  };
}

function outOfFold(cv: CrossValidationReport): Map<string, number> {
  const m = new Map<string, number>();
  for (const f of cv.folds) f.labels.forEach((l, i) => m.set(`${f.drugId}|${l}`, f.predicted[i]!));
  return m;
}

export interface FusionCheck {
  nSalts: number;
  nDrugs: number;
  /** LODO RMSE on the salts with a melting point, without and with the crystal term, decades. */
  rmseWithout: number;
  rmseWith: number;
  /** Salts whose absolute error the correction lowers, and raises. */
  nImproved: number;
  nWorsened: number;
  /** True only when the correction lowers the RMSE by the margin and helps more salts than it hurts. */
  fusionCorrectionApplies: boolean;
}

/**
 * The melting-point correction judged leave-one-drug-out on every published salt with a melting point:
 * each such salt's out-of-fold estimate, shifted by its Schröder–van Laar crystal term (Walden's rule
 * where no ΔH_fus is published) against the mean crystal term of the OTHER drugs' salts with a melting
 * point — exactly what estimate-salt-solubility.ts would do for a new drug — against the same estimate
 * without the shift. It is applied only if it lowers that RMSE by the margin AND improves more salts
 * than it worsens: on a handful of salts one large miss can carry the RMSE, and a correction that
 * makes most salts worse is not one to apply (the direction condition of a sign test; common practice).
 */
export function checkFusionCorrection(
  rows: readonly SaltSolubilityTrainingRow[],
  cv: CrossValidationReport,
  temperatureK = 298.15,
): FusionCheck {
  const pred = outOfFold(cv);
  const withMp = rows.filter((r) => Number.isFinite(log10IdealMoleFraction(r.input, temperatureK)));
  const walden = (r: SaltSolubilityTrainingRow) =>
    log10IdealMoleFraction({ ...r.input, fusionEnthalpyKJPerMol: null }, temperatureK);
  const without: number[] = [];
  const withShift: number[] = [];
  const measured: number[] = [];
  for (const r of withMp) {
    const refs = withMp.filter((o) => o.drugId !== r.drugId).map(walden);
    if (refs.length === 0) continue;
    const p = pred.get(`${r.drugId}|${r.label}`)!;
    const shift =
      log10IdealMoleFraction(r.input, temperatureK) - refs.reduce((a, b) => a + b, 0) / refs.length;
    without.push(p);
    withShift.push(p + shift);
    measured.push(r.log10DrugM);
  }
  const rmseWithout = rootMeanSquareError(without, measured);
  const rmseWith = rootMeanSquareError(withShift, measured);
  const gain = measured.map((m, i) => Math.abs(without[i]! - m) - Math.abs(withShift[i]! - m));
  const nImproved = gain.filter((g) => g > 0).length;
  const nWorsened = gain.filter((g) => g < 0).length;
  return {
    nSalts: measured.length,
    nDrugs: new Set(withMp.map((r) => r.drugId)).size,
    rmseWithout,
    rmseWith,
    nImproved,
    nWorsened,
    fusionCorrectionApplies:
      measured.length > 0 && rmseWith <= rmseWithout - RMSE_MARGIN && nImproved > nWorsened,
  };
}

/** A salt of an acidic drug with a cation of charge ≥ 2 (calcium, magnesium, zinc, strontium …). */
export function isDivalentCationSalt(r: Pick<SaltSolubilityTrainingRow, 'input'>): boolean {
  return r.input.drug.kind === 'acid' && r.input.counterIon.charge >= 2;
}

export interface DivalentCationCheck {
  /** Acid series that hold a divalent-cation salt and at least one salt of a singly charged cation. */
  pairs: {
    drugId: string;
    label: string;
    contrastDecades: number;
    predictedContrastDecades: number;
  }[];
  /** Mean of (measured − predicted) contrasts over the pairs, decades: the class offset. */
  offsetDecades: number;
  /** LODO RMSE of the contrasts without and with the offset learnt from the other pairs. */
  rmseWithout: number;
  rmseWith: number;
  offsetApplies: boolean;
  /** 1σ added in quadrature to the within-series σ of such a salt, decades: within·√(2/n pairs). */
  extraWithinLog10Sd: number;
}

/**
 * What the published set says about divalent cations with acids: per acid series, the within-series
 * contrast log S(divalent salt) − mean log S(the same acid's salts with singly charged cations),
 * measured against the contrast the out-of-fold estimates give. The class offset is the mean miss; it
 * is judged leave-one-drug-out (each pair corrected by the offset of the other pairs) and applied only
 * when it lowers that error by the margin and improves more pairs than it worsens (as the fusion check). Each contrast carries about 2·within² of variance, so an
 * offset from n pairs carries 2·within²/n (propagation of error), added to such a salt's σ.
 */
export function checkDivalentCations(
  rows: readonly SaltSolubilityTrainingRow[],
  cv: CrossValidationReport,
  withinLog10Sd: number,
): DivalentCationCheck {
  const pred = outOfFold(cv);
  const p = (r: SaltSolubilityTrainingRow) => pred.get(`${r.drugId}|${r.label}`)!;
  const pairs: DivalentCationCheck['pairs'] = [];
  for (const r of rows.filter(isDivalentCationSalt)) {
    const mono = rows.filter((o) => o.drugId === r.drugId && !isDivalentCationSalt(o));
    if (mono.length === 0) continue;
    const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
    pairs.push({
      drugId: r.drugId,
      label: r.label,
      contrastDecades: r.log10DrugM - mean(mono.map((o) => o.log10DrugM)),
      predictedContrastDecades: p(r) - mean(mono.map(p)),
    });
  }
  const miss = pairs.map((q) => q.contrastDecades - q.predictedContrastDecades);
  const offsetDecades = miss.length ? miss.reduce((a, b) => a + b, 0) / miss.length : 0;
  const lodoWith = pairs.map((q) => {
    const others = miss.filter((_, j) => pairs[j]!.drugId !== q.drugId);
    const off = others.length ? others.reduce((a, b) => a + b, 0) / others.length : 0;
    return q.predictedContrastDecades + off;
  });
  const contrasts = pairs.map((q) => q.contrastDecades);
  const rmseWithout = rootMeanSquareError(
    pairs.map((q) => q.predictedContrastDecades),
    contrasts,
  );
  const rmseWith = rootMeanSquareError(lodoWith, contrasts);
  const canLearn = new Set(pairs.map((q) => q.drugId)).size >= 2;
  const improved = pairs.filter(
    (q, i) =>
      Math.abs(lodoWith[i]! - q.contrastDecades) <
      Math.abs(q.predictedContrastDecades - q.contrastDecades),
  ).length;
  return {
    pairs,
    offsetDecades,
    rmseWithout,
    rmseWith,
    offsetApplies:
      canLearn && rmseWith <= rmseWithout - RMSE_MARGIN && improved > pairs.length - improved,
    extraWithinLog10Sd: withinLog10Sd * Math.sqrt(2 / Math.max(1, pairs.length)),
  };
}

/** The counter-ion predictors whose training range defines the applicability domain. */
export const DOMAIN_FEATURES = [
  'counterIonLogPParent',
  'counterIonAromaticRings',
  'counterIonHBondDonorsAcceptors',
  'counterIonHeavyAtoms',
] as const;

export interface DomainRange {
  name: (typeof DOMAIN_FEATURES)[number];
  min: number;
  max: number;
  /** Standard deviation over the training salts (the unit of distance outside the range). */
  sd: number;
}

/** Range of each counter-ion predictor over the training salts (OECD 2007 QSAR principle 3). */
export function descriptorDomain(rows: readonly SaltSolubilityTrainingRow[]): DomainRange[] {
  return DOMAIN_FEATURES.map((name) => {
    const j = SALT_SOLUBILITY_FEATURES.findIndex((f) => f.name === name);
    const xs = rows.map((r) => featureRow(r.input)[j]!);
    const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((a, x) => a + (x - mean) ** 2, 0) / xs.length);
    return { name, min: Math.min(...xs), max: Math.max(...xs), sd: sd > 0 ? sd : 1 };
  });
}
