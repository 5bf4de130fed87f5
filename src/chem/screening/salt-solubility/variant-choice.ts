import {
  chooseLambda,
  crossValidateByDrug,
  predictRows,
  RIDGE_LAMBDA_GRID,
  type CrossValidationReport,
  type FoldProcedure,
} from './cross-validation';
import {
  fitOn,
  type SaltSolubilityModelKind,
  type SaltSolubilityTrainingRow,
} from './fit-salt-solubility';
import {
  SALT_SOLUBILITY_FEATURES,
  THERMO_SHIFT_FEATURE,
  type SaltSolubilityFeature,
} from './salt-solubility-features';

/**
 * The model variants tried, and the rule — declared before the fit — that picks one. The rule is
 * applied to leave-one-drug-out figures over whatever rows it is given: over every published salt
 * for the shipped model, and over the training drugs only inside each outer fold when the whole
 * procedure is cross-validated (fully nested: Varma & Simon 2006, BMC Bioinformatics 7, 91).
 */
export type VariantId =
  'no-descriptor' | 'pooled' | 'pooled+thermo' | 'within-series' | 'within-series+thermo';

export interface VariantSpec {
  id: VariantId;
  kind: SaltSolubilityModelKind;
  features: readonly SaltSolubilityFeature[];
}

const WITH_THERMO = [...SALT_SOLUBILITY_FEATURES, THERMO_SHIFT_FEATURE];

/** The no-descriptor baseline: log₁₀ S₀ + the average offset of the training series (no counter-ion term). */
export const BASELINE_VARIANT: VariantSpec = {
  id: 'no-descriptor',
  kind: 'within-series',
  features: [],
};

export const VARIANT_SPECS: readonly VariantSpec[] = [
  BASELINE_VARIANT,
  { id: 'pooled', kind: 'pooled', features: SALT_SOLUBILITY_FEATURES },
  { id: 'pooled+thermo', kind: 'pooled', features: WITH_THERMO },
  { id: 'within-series', kind: 'within-series', features: SALT_SOLUBILITY_FEATURES },
  { id: 'within-series+thermo', kind: 'within-series', features: WITH_THERMO },
];

export const VARIANT_RULE =
  'pooled or within-series: the higher leave-one-drug-out mean within-series Spearman ρ (the screen ranks salts of one drug), the lower RMSE breaking a tie within 0.05; the ΔH_sol term kept, and then the counter-ion descriptors kept over the no-descriptor baseline, only if they beat the simpler model: ρ higher by ≥ 0.05 with RMSE worse by ≤ 0.02, or RMSE lower by ≥ 0.02 with ρ no lower. Applied inside every outer fold on its training drugs (fully nested) and once on every drug for the shipped model';

/** Margins of the rule, our choice (common practice: a gain smaller than this is noise on ~50 salts). */
const RHO_MARGIN = 0.05;
const RMSE_MARGIN = 0.02;

type Figures = Pick<CrossValidationReport, 'rmse' | 'meanSpearman'>;

/** Whether `a` (the richer model) earns its place over `b` (the simpler one). */
export function beats(a: Figures, b: Figures): boolean {
  return (
    (a.meanSpearman >= b.meanSpearman + RHO_MARGIN && a.rmse <= b.rmse + RMSE_MARGIN) ||
    (a.rmse <= b.rmse - RMSE_MARGIN && a.meanSpearman >= b.meanSpearman)
  );
}

/** Apply the rule to the variants' cross-validated figures (keyed by id). */
export function applyVariantRule(cv: ReadonlyMap<VariantId, Figures>): VariantId {
  const f = (id: VariantId) => cv.get(id)!;
  const within = f('within-series');
  const pooled = f('pooled');
  const withinFirst =
    within.meanSpearman > pooled.meanSpearman + RHO_MARGIN ||
    (Math.abs(within.meanSpearman - pooled.meanSpearman) <= RHO_MARGIN &&
      within.rmse < pooled.rmse);
  const plain: VariantId = withinFirst ? 'within-series' : 'pooled';
  const thermo: VariantId = withinFirst ? 'within-series+thermo' : 'pooled+thermo';
  const descriptors = beats(f(thermo), f(plain)) ? thermo : plain;
  return beats(f(descriptors), f('no-descriptor')) ? descriptors : 'no-descriptor';
}

/** Every variant's nested LODO cross-validation over `rows`. */
export function crossValidateVariants(
  rows: readonly SaltSolubilityTrainingRow[],
): Map<VariantId, CrossValidationReport> {
  return new Map(
    VARIANT_SPECS.map((v) => [
      v.id,
      crossValidateByDrug(rows, v.features, RIDGE_LAMBDA_GRID, v.kind),
    ]),
  );
}

export function variantSpec(id: VariantId): VariantSpec {
  return VARIANT_SPECS.find((v) => v.id === id)!;
}

/** The rule applied to `rows` alone: the variant it picks. */
export function chooseVariant(rows: readonly SaltSolubilityTrainingRow[]): VariantSpec {
  return variantSpec(applyVariantRule(crossValidateVariants(rows)));
}

/**
 * The whole procedure as one fold sees it: choose the variant by the rule on the training drugs
 * (each candidate judged by an inner LODO), choose its λ on the same training drugs, fit, predict.
 */
export const selectionProcedure: FoldProcedure = (train, test) => {
  const spec = chooseVariant(train);
  const lambda = chooseLambda(train, spec.features, RIDGE_LAMBDA_GRID, spec.kind);
  const m = fitOn(train, spec.features, lambda, spec.kind);
  return { predicted: predictRows(m, spec.features, test), lambda, variant: spec.id };
};
