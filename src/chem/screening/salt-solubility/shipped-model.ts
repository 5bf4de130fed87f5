import type { FittedSaltSolubilityModel, SaltSolubilityModelKind } from './fit-salt-solubility';
import {
  IDEAL_SOLUBILITY_FEATURE,
  SALT_SOLUBILITY_FEATURES,
  THERMO_SHIFT_FEATURE,
  type SaltSolubilityFeature,
} from './salt-solubility-features';
import { SALT_SOLUBILITY_MODEL } from './salt-solubility-model.data';

/** The generated model literal (salt-solubility-model.data.ts) as the estimate reads it. */
interface ShippedLiteral {
  readonly id: string;
  readonly kind: SaltSolubilityModelKind;
  readonly level: number | null;
  readonly featureNames: readonly string[];
  readonly featureMeans: readonly (number | null)[];
  readonly featureScales: readonly (number | null)[];
  readonly intercept: number | null;
  readonly coefficients: readonly (number | null)[];
  readonly lambda: number;
  readonly cvRmseLog10: number | null;
  readonly sharedLog10Sd: number | null;
  readonly withinLog10Sd: number | null;
  readonly nSalts: number;
  readonly nDrugs: number;
}

const ALL_FEATURES: readonly SaltSolubilityFeature[] = [
  ...SALT_SOLUBILITY_FEATURES,
  THERMO_SHIFT_FEATURE,
  IDEAL_SOLUBILITY_FEATURE,
];

export interface ShippedModel {
  literal: ShippedLiteral;
  model: FittedSaltSolubilityModel;
  features: SaltSolubilityFeature[];
}

function asModel(s: ShippedLiteral): ShippedModel {
  const features = s.featureNames.map((name) => {
    const f = ALL_FEATURES.find((x) => x.name === name);
    if (!f) throw new Error(`salt-solubility model: unknown predictor ${name}`);
    return f;
  });
  return {
    literal: s,
    features,
    model: {
      kind: s.kind,
      level: s.level ?? 0,
      ridge: {
        featureNames: s.featureNames,
        featureMeans: s.featureMeans.map((x) => x ?? 0),
        featureScales: s.featureScales.map((x) => x ?? 1),
        intercept: s.intercept ?? 0,
        coefficients: s.coefficients.map((x) => x ?? 0),
        lambda: s.lambda,
      },
    },
  };
}

export const SHIPPED = asModel(SALT_SOLUBILITY_MODEL as ShippedLiteral);

/** Its split: a level shared by every salt of one drug, and a part that differs salt by salt, decades. */
export const SALT_SOLUBILITY_SHARED_LOG10_SD = SHIPPED.literal.sharedLog10Sd ?? Number.NaN;
export const SALT_SOLUBILITY_WITHIN_LOG10_SD = SHIPPED.literal.withinLog10Sd ?? Number.NaN;
