import type * as OpenChemLib from 'openchemlib';
import {
  chooseLambda,
  crossValidateWith,
  RIDGE_LAMBDA_GRID,
  type CrossValidationReport,
} from './cross-validation';
import {
  fitOn,
  type FittedSaltSolubilityModel,
  type SaltSolubilityModelKind,
} from './fit-salt-solubility';
import {
  checkDivalentCations,
  checkFusionCorrection,
  descriptorDomain,
  splitResiduals,
  type DivalentCationCheck,
  type DomainRange,
  type FusionCheck,
  type ResidualSplit,
} from './model-evidence';
import { buildTrainingSet, type CsvRecord, type TrainingSet } from './training-rows';
import {
  applyVariantRule,
  crossValidateVariants,
  selectionProcedure,
  VARIANT_RULE,
  VARIANT_SPECS,
  variantSpec,
  type VariantId,
} from './variant-choice';

export { VARIANT_RULE, type VariantId } from './variant-choice';

/**
 * Builds the shipped salt-solubility model from the reference set. Pure; the script
 * fixtures/reference/fit-salt-solubility.ts does the file I/O.
 *
 * 1. Every variant (variant-choice.ts, the no-descriptor baseline among them) is cross-validated
 *    leave-one-drug-out with λ chosen inside each fold: these are the figures shown per variant.
 * 2. The rule VARIANT_RULE picks the shipped variant from those figures over every drug.
 * 3. The whole procedure — rule, λ, fit — is cross-validated again with the rule applied inside each
 *    outer fold on the training drugs only (fully nested; Varma & Simon 2006): that error, not the
 *    chosen variant's own figure in step 1, is the 1σ every estimate carries, split into a shared
 *    per-drug level and a within-series part, and the evidence for the fusion correction and for
 *    divalent cations is computed from those same out-of-fold predictions.
 */
export interface VariantResult {
  id: VariantId;
  kind: SaltSolubilityModelKind;
  features: string[];
  cv: CrossValidationReport;
}

export interface ShippedVariant {
  id: VariantId;
  model: FittedSaltSolubilityModel;
  /** Cross-validated RMSE of the fully nested procedure, log₁₀ units. */
  cvRmseLog10: number;
  split: ResidualSplit;
  nSalts: number;
  nDrugs: number;
}

export interface SaltSolubilityBuild {
  shipped: ShippedVariant;
  /** Melting points of the training salts that have one, K: the reference crystal term. */
  fusionReferenceMeltingPointsK: number[];
  report: {
    summary: { nSalts: number; nDrugs: number; shipped: VariantId; rule: string };
    drugs: TrainingSet['drugs'];
    excluded: TrainingSet['excluded'];
    variants: VariantResult[];
    /** The whole procedure, nested: the variant chosen inside each outer fold. */
    selection: CrossValidationReport;
    residualSplit: ResidualSplit;
    fusion: FusionCheck;
    divalentCations: DivalentCationCheck;
    domain: DomainRange[];
  };
}

export function fitAndValidateSaltSolubility(
  ocl: typeof OpenChemLib,
  saltRecords: readonly CsvRecord[],
  drugRecords: readonly CsvRecord[],
): SaltSolubilityBuild {
  const set = buildTrainingSet(ocl, saltRecords, drugRecords);
  const rows = set.rows;
  const cvs = crossValidateVariants(rows);
  const variants: VariantResult[] = VARIANT_SPECS.map((v) => ({
    id: v.id,
    kind: v.kind,
    features: v.features.map((f) => f.name),
    cv: cvs.get(v.id)!,
  }));
  const spec = variantSpec(applyVariantRule(cvs));
  const lambda = chooseLambda(rows, spec.features, RIDGE_LAMBDA_GRID, spec.kind);
  const selection = crossValidateWith(rows, selectionProcedure);
  const split = splitResiduals(selection);
  const fusionReferenceMeltingPointsK = rows
    .flatMap((r) => (r.input.meltingPointK != null ? [r.input.meltingPointK] : []))
    .sort((a, b) => a - b);
  return {
    shipped: {
      id: spec.id,
      model: fitOn(rows, spec.features, lambda, spec.kind),
      cvRmseLog10: selection.rmse,
      split,
      nSalts: rows.length,
      nDrugs: selection.nDrugs,
    },
    fusionReferenceMeltingPointsK,
    report: {
      summary: {
        nSalts: rows.length,
        nDrugs: selection.nDrugs,
        shipped: spec.id,
        rule: VARIANT_RULE,
      },
      drugs: set.drugs,
      excluded: set.excluded,
      variants,
      selection,
      residualSplit: split,
      fusion: checkFusionCorrection(rows, selection),
      divalentCations: checkDivalentCations(rows, selection, split.withinLog10Sd),
      domain: descriptorDomain(rows),
    },
  };
}
