import type * as OpenChemLib from 'openchemlib';
import {
  crossValidateByDrug,
  fitSaltSolubilityModel,
  RIDGE_LAMBDA_GRID,
  type CrossValidationReport,
  type FittedSaltSolubilityModel,
  type SaltSolubilityModelKind,
  type SaltSolubilityTrainingRow,
} from './fit-salt-solubility';
import {
  IDEAL_SOLUBILITY_FEATURE,
  SALT_SOLUBILITY_FEATURES,
  THERMO_SHIFT_FEATURE,
  type SaltSolubilityFeature,
} from './salt-solubility-features';
import { buildTrainingSet, type CsvRecord, type TrainingSet } from './training-rows';

/**
 * Builds the shipped salt-solubility model from the reference set: the variants, their nested
 * leave-one-drug-out cross-validation, the declared rule that picks the shipped one, and the text of
 * the generated data module. Pure; fixtures/reference/fit-salt-solubility.ts does the file I/O.
 */
export type VariantId =
  | 'pooled'
  | 'pooled+thermo'
  | 'within-series'
  | 'within-series+thermo'
  | 'pooled+fusion'
  | 'pooled-on-fusion-subset';

export interface VariantResult {
  id: VariantId;
  kind: SaltSolubilityModelKind;
  features: string[];
  cv: CrossValidationReport;
}

export interface ShippedVariant {
  id: VariantId;
  model: FittedSaltSolubilityModel;
  /** Cross-validated RMSE, log₁₀ units: the 1σ every estimate from this model carries. */
  cvRmseLog10: number;
  nSalts: number;
  nDrugs: number;
}

export interface SaltSolubilityBuild {
  shipped: ShippedVariant;
  /** The fusion variant, used only when it beats the descriptors on the salts with melting data. */
  fusion: ShippedVariant | null;
  /** Melting points of the training salts that have one, K: the reference crystal term. */
  fusionReferenceMeltingPointsK: number[];
  report: {
    summary: {
      nSalts: number;
      nDrugs: number;
      shipped: VariantId;
      fusionUsed: boolean;
      rule: string;
    };
    drugs: TrainingSet['drugs'];
    excluded: TrainingSet['excluded'];
    variants: VariantResult[];
  };
}

/**
 * The rule, declared before the fit: the thermochemical term is kept only if it lowers the
 * cross-validated RMSE by at least 0.02 log units without lowering the mean within-series ρ; the
 * fusion variant is used for salts with bench melting data only if it beats the descriptors-only
 * model on the same salts by the same margin.
 */
export const VARIANT_RULE =
  'of the pooled and within-series fits, the one with the higher mean within-series Spearman ρ under LODO (the screen ranks salts of one drug), the lower LODO RMSE breaking a tie within 0.05; the ΔH_sol term kept only if it raises that ρ by ≥ 0.05 without raising the RMSE by more than 0.02; the fusion variant used only if it beats the descriptors-only model on the same salts by ≥ 0.02 in RMSE';
const MARGIN = 0.02;

function variant(
  id: VariantId,
  kind: SaltSolubilityModelKind,
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[],
): VariantResult {
  return {
    id,
    kind,
    features: features.map((f) => f.name),
    cv: crossValidateByDrug(rows, features, RIDGE_LAMBDA_GRID, kind),
  };
}

function ship(
  v: VariantResult,
  rows: readonly SaltSolubilityTrainingRow[],
  features: readonly SaltSolubilityFeature[],
): ShippedVariant {
  return {
    id: v.id,
    model: fitSaltSolubilityModel(rows, features, RIDGE_LAMBDA_GRID, v.kind),
    cvRmseLog10: v.cv.rmse,
    nSalts: v.cv.nSalts,
    nDrugs: v.cv.nDrugs,
  };
}

export function fitAndValidateSaltSolubility(
  ocl: typeof OpenChemLib,
  saltRecords: readonly CsvRecord[],
  drugRecords: readonly CsvRecord[],
): SaltSolubilityBuild {
  const set = buildTrainingSet(ocl, saltRecords, drugRecords);
  const rows = set.rows;
  const base = SALT_SOLUBILITY_FEATURES;
  const withThermo = [...base, THERMO_SHIFT_FEATURE];
  const withFusion = [...base, IDEAL_SOLUBILITY_FEATURE];
  const pooled = variant('pooled', 'pooled', rows, base);
  const pooledThermo = variant('pooled+thermo', 'pooled', rows, withThermo);
  const within = variant('within-series', 'within-series', rows, base);
  const withinThermo = variant('within-series+thermo', 'within-series', rows, withThermo);
  const fusionRows = rows.filter((r) => Number.isFinite(IDEAL_SOLUBILITY_FEATURE.value(r.input)));
  const fusionDrugs = new Set(fusionRows.map((r) => r.drugId)).size;
  const variants: VariantResult[] = [pooled, pooledThermo, within, withinThermo];
  let fusion: ShippedVariant | null = null;
  if (fusionDrugs >= 3) {
    const vFusion = variant('pooled+fusion', 'pooled', fusionRows, withFusion);
    const vSubset = variant('pooled-on-fusion-subset', 'pooled', fusionRows, base);
    variants.push(vFusion, vSubset);
    if (vFusion.cv.rmse <= vSubset.cv.rmse - MARGIN) fusion = ship(vFusion, fusionRows, withFusion);
  }
  const RHO_TIE = 0.05;
  const withinFirst =
    within.cv.meanSpearman > pooled.cv.meanSpearman + RHO_TIE ||
    (Math.abs(within.cv.meanSpearman - pooled.cv.meanSpearman) <= RHO_TIE &&
      within.cv.rmse < pooled.cv.rmse);
  const [plain, thermo] = withinFirst ? [within, withinThermo] : [pooled, pooledThermo];
  const thermoHelps =
    thermo.cv.meanSpearman >= plain.cv.meanSpearman + RHO_TIE &&
    thermo.cv.rmse <= plain.cv.rmse + MARGIN;
  const shipped = thermoHelps ? ship(thermo, rows, withThermo) : ship(plain, rows, base);
  const fusionReferenceMeltingPointsK = fusionRows
    .map((r) => r.input.meltingPointK!)
    .sort((a, b) => a - b);
  return {
    shipped,
    fusion,
    fusionReferenceMeltingPointsK,
    report: {
      summary: {
        nSalts: rows.length,
        nDrugs: new Set(rows.map((r) => r.drugId)).size,
        shipped: shipped.id,
        fusionUsed: fusion !== null,
        rule: VARIANT_RULE,
      },
      drugs: set.drugs,
      excluded: set.excluded,
      variants,
    },
  };
}

const r6 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(10)) : null);

function variantLiteral(v: ShippedVariant): unknown {
  const r = v.model.ridge;
  return {
    id: v.id,
    kind: v.model.kind,
    level: r6(v.model.level),
    featureNames: r.featureNames,
    featureMeans: r.featureMeans.map(r6),
    featureScales: r.featureScales.map(r6),
    intercept: r6(r.intercept),
    coefficients: r.coefficients.map(r6),
    lambda: r.lambda,
    cvRmseLog10: r6(v.cvRmseLog10),
    nSalts: v.nSalts,
    nDrugs: v.nDrugs,
  };
}

/** The text of salt-solubility-model.data.ts (generated; never edit by hand). */
export function renderModelDataModule(b: SaltSolubilityBuild): string {
  const summaries = b.report.variants.map((v) => ({
    id: v.id,
    kind: v.kind,
    nSalts: v.cv.nSalts,
    nDrugs: v.cv.nDrugs,
    rmse: r6(v.cv.rmse),
    anchorRmse: r6(v.cv.anchorRmse),
    meanSpearman: r6(v.cv.meanSpearman),
    anchorMeanSpearman: r6(v.cv.anchorMeanSpearman),
    medianSpearman: r6(v.cv.medianSpearman),
    anchorMedianSpearman: r6(v.cv.anchorMedianSpearman),
    leastSolubleHitRate: r6(v.cv.leastSolubleHitRate),
    anchorLeastSolubleHitRate: r6(v.cv.anchorLeastSolubleHitRate),
  }));
  const shippedCv = b.report.variants.find((v) => v.id === b.shipped.id)!.cv;
  const series = shippedCv.folds.map((f) => ({
    drugId: f.drugId,
    name: b.report.drugs.find((d) => d.drugId === f.drugId)?.name ?? f.drugId,
    rmse: r6(f.rmse),
    anchorRmse: r6(f.anchorRmse),
    spearman: r6(f.spearman),
    anchorSpearman: r6(f.anchorSpearman),
    leastSolubleInLowestTwo: f.leastSolubleInLowestTwo,
    salts: f.labels.map((label, i) => ({
      label,
      measured: r6(f.measured[i]!),
      predicted: r6(f.predicted[i]!),
      anchor: r6(f.anchor[i]!),
    })),
  }));
  return [
    '// GENERATED by fixtures/reference/fit-salt-solubility.ts from fixtures/reference/salt-solubility.csv',
    '// and salt-solubility-drugs.csv (published series; sources in those files and salt-solubility.md).',
    '// Do not edit: change the data or the method and run the script; tests/chem/screening/salt-solubility',
    '// fails when this file is not what the script produces.',
    '',
    `/** The shipped water-solubility model (ridge regression in log₁₀ units; rule: ${VARIANT_RULE}). */`,
    `export const SALT_SOLUBILITY_MODEL = ${JSON.stringify(variantLiteral(b.shipped), null, 2)} as const;`,
    '',
    '/** The fusion variant for salts with bench melting data, or null when cross-validation did not favour it. */',
    `export const SALT_SOLUBILITY_FUSION_MODEL = ${b.fusion ? `${JSON.stringify(variantLiteral(b.fusion), null, 2)} as const` : 'null'};`,
    '',
    '/**',
    ' * Melting points of the published training salts that report one, K. Their mean Schröder–van Laar',
    " * crystal term is the 'typical salt' the model's estimate stands for; a salt whose bench melting data",
    ' * give a different crystal term is shifted by the difference (estimate-salt-solubility.ts).',
    ' */',
    `export const SALT_SOLUBILITY_REFERENCE_MELTING_POINTS_K = ${JSON.stringify(b.fusionReferenceMeltingPointsK.map(r6))} as const;`,
    '',
    "/** Nested leave-one-drug-out cross-validation of every variant, with today's anchor on the same folds. */",
    `export const SALT_SOLUBILITY_VARIANTS = ${JSON.stringify(summaries, null, 2)} as const;`,
    '',
    '/** Per-drug series of the shipped variant: each salt predicted by a model that never saw its drug. */',
    `export const SALT_SOLUBILITY_SERIES = ${JSON.stringify(series, null, 2)} as const;`,
    '',
  ].join('\n');
}
