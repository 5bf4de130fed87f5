import {
  featureRow,
  SALT_SOLUBILITY_FEATURES,
  type SaltSolubilityInput,
} from './salt-solubility-features';
import {
  SALT_SOLUBILITY_DIVALENT_CATIONS,
  SALT_SOLUBILITY_DOMAIN,
} from './salt-solubility-model.data';

/**
 * Applicability domain of the salt-solubility model, in the spirit of OECD principle 3 for QSAR
 * validation ("a defined domain of applicability"; OECD 2007, Guidance Document on the Validation of
 * (Q)SAR Models, ENV/JM/MONO(2007)2). A counter-ion whose computed descriptors fall outside the range
 * of the published training salts is an extrapolation: its within-series 1σ is multiplied by
 * 1 + d, d the largest distance outside the range in training standard deviations, at most ×3
 * (a range check with a linear widening and a cap: common practice, no published factor).
 */
export const DOMAIN_MAX_SIGMA_FACTOR = 3;

const WORDS: Record<string, string> = {
  counterIonLogPParent: 'parent log P',
  counterIonAromaticRings: 'aromatic rings',
  counterIonHBondDonorsAcceptors: 'H-bond donors + acceptors',
  counterIonHeavyAtoms: 'heavy atoms',
};

const fmt = (x: number) => (Number.isInteger(x) ? String(x) : x.toFixed(1));

export interface DomainVerdict {
  /** Multiplier on the within-series 1σ (1 inside the domain). */
  sigmaFactor: number;
  /** One phrase per descriptor outside the range, e.g. "heavy atoms 20 (training 1–14)". */
  outside: string[];
}

/** Each domain descriptor with its predictor and training range, looked up once. */
const DOMAIN_CHECKS = SALT_SOLUBILITY_DOMAIN.map((r) => ({
  name: r.name,
  feature: SALT_SOLUBILITY_FEATURES.find((f) => f.name === r.name),
  min: r.min ?? 0,
  max: r.max ?? 0,
  sd: r.sd ?? 1,
}));

const FEATURE_NAMES = SALT_SOLUBILITY_FEATURES.map((f) => f.name);

/** The column of each domain descriptor in a feature row with these names (−1: not among them). */
let columnsFor: { names: readonly string[]; columns: number[] } | null = null;
function domainColumns(names: readonly string[]): number[] {
  if (columnsFor?.names !== names)
    columnsFor = { names, columns: DOMAIN_CHECKS.map((c) => names.indexOf(c.name)) };
  return columnsFor.columns;
}

/**
 * The largest distance outside the training range, in training SDs (0 inside), read from a feature
 * row already computed (columns named by `names`); `outside` (when given) receives one phrase per
 * descriptor outside. One loop for the verdict and for the factor alone, so both widen the 1σ by
 * the same number.
 */
function domainExcess(
  input: SaltSolubilityInput,
  row: readonly number[],
  names: readonly string[],
  outside?: string[],
): number {
  const columns = domainColumns(names);
  let d = 0;
  for (let k = 0; k < DOMAIN_CHECKS.length; k++) {
    const { name, feature, min, max, sd } = DOMAIN_CHECKS[k]!;
    const j = columns[k]!;
    const x = j >= 0 ? row[j]! : feature!.value(input);
    const excess = Math.max(0, x - max, min - x) / sd;
    if (excess > 0) {
      outside?.push(`${WORDS[name] ?? name} ${fmt(x)} (training ${fmt(min)}–${fmt(max)})`);
      d = Math.max(d, excess);
    }
  }
  return d;
}

export function applicabilityDomain(input: SaltSolubilityInput): DomainVerdict {
  const outside: string[] = [];
  const d = domainExcess(input, featureRow(input), FEATURE_NAMES, outside);
  return { sigmaFactor: Math.min(1 + d, DOMAIN_MAX_SIGMA_FACTOR), outside };
}

/**
 * applicabilityDomain's σ factor without its words, from the model's feature row of the same input
 * (`names` its columns; a descriptor the model does not read is computed from the input).
 */
export function domainSigmaFactor(
  input: SaltSolubilityInput,
  row: readonly number[],
  names: readonly string[],
): number {
  return Math.min(1 + domainExcess(input, row, names), DOMAIN_MAX_SIGMA_FACTOR);
}

/** A salt of an acidic drug with a cation of charge ≥ 2 (calcium, magnesium, zinc …). */
export function isDivalentCationInput(input: SaltSolubilityInput): boolean {
  return input.drug.kind === 'acid' && input.counterIon.charge >= 2;
}

export interface DivalentAdjustment {
  /** Shift of log₁₀ S applied (0 when the published pairs did not earn it), decades. */
  offsetDecades: number;
  /** 1σ added in quadrature to the within-series part, decades. */
  extraWithinLog10Sd: number;
  note: string;
}

/**
 * What the published pairs say about a divalent cation with an acid (model-evidence.ts,
 * checkDivalentCations): the class offset when leave-one-drug-out it beat the model without it, and
 * always the extra 1σ of an offset learnt from so few pairs.
 */
export function divalentCationAdjustment(): DivalentAdjustment {
  const d = SALT_SOLUBILITY_DIVALENT_CATIONS;
  const pairs = d.pairs.map((p) => `${p.label} ${(p.contrastDecades ?? 0).toFixed(1)}`).join(', ');
  const offset = d.offsetApplies ? (d.offsetDecades ?? 0) : 0;
  const extra = d.extraWithinLog10Sd ?? 0;
  const applied = d.offsetApplies
    ? `shifted by ${offset.toFixed(2)} decades, the mean miss of the model on those pairs (leave-one-drug-out RMSE of the contrast ${(d.rmseWithout ?? 0).toFixed(2)} without, ${(d.rmseWith ?? 0).toFixed(2)} with)`
    : 'not shifted (the pairs did not earn it under leave-one-drug-out)';
  return {
    offsetDecades: offset,
    extraWithinLog10Sd: extra,
    note: `divalent cation with an acid: the published set holds only ${d.pairs.length} such salts (decades against the same acid's singly charged salts: ${pairs}); estimate ${applied}; within-series 1σ widened by ${extra.toFixed(2)} decades in quadrature for an offset learnt from ${d.pairs.length} pairs`,
  };
}
