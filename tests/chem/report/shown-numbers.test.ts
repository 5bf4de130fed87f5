import { describe, expect, it } from 'vitest';
import {
  roundLogNormal,
  roundScore,
  shownRowNumbers,
  significantDigitsForLog10Sigma,
} from '@/chem/report';

// Hand computations (JCGM 100:2008 §7.2.6: the uncertainty to at most two significant digits, the
// value to the same place), shown beside each assertion.

describe('significant digits from a log σ', () => {
  it('σ = 1 decade: r = 10¹ − 1 = 9 → 1 − ⌊log₁₀ 9⌋ = 1, raised to the floor of 2', () => {
    expect(significantDigitsForLog10Sigma(1)).toBe(2);
  });
  it('σ = 0.1 decade: r = 10^0.1 − 1 = 0.2589 → 1 − ⌊−0.587⌋ = 2', () => {
    expect(significantDigitsForLog10Sigma(0.1)).toBe(2);
  });
  it('σ = 0.01 decade: r = 0.02329 → 1 − ⌊−1.633⌋ = 3', () => {
    expect(significantDigitsForLog10Sigma(0.01)).toBe(3);
  });
  it('σ = 0.001 decade: r = 0.002305 → 1 − ⌊−2.637⌋ = 4', () => {
    expect(significantDigitsForLog10Sigma(0.001)).toBe(4);
  });
  it('no σ: six digits (float noise only)', () => {
    expect(significantDigitsForLog10Sigma(0)).toBe(6);
  });
});

describe('roundLogNormal', () => {
  it('D₀ 2.4213 ± 0.6 decades: 2.4, range 2.4213 / 3.981 = 0.6082 → 0.61, × 3.981 = 9.639 → 9.6', () => {
    expect(roundLogNormal(2.4213, 0.6)).toStrictEqual({
      value: 2.4,
      low: 0.61,
      high: 9.6,
      digits: 2,
    });
  });
  it('0.5621 mg/mL ± 0.01 decades: three digits, 0.562, 0.5621/1.02329 = 0.5493 → 0.549, × 1.02329 = 0.5752 → 0.575', () => {
    expect(roundLogNormal(0.5621, 0.01)).toStrictEqual({
      value: 0.562,
      low: 0.549,
      high: 0.575,
      digits: 3,
    });
  });
});

describe('roundScore', () => {
  it('0.792242 → 0.79 (two decimals, half the 0.02 of the separation statistic)', () => {
    expect(roundScore(0.792242)).toBe(0.79);
  });
});

describe('shownRowNumbers', () => {
  // A hand-made row: ΔpKa 6.106 with the drug's pKa σ 0.1; salt log σ 0.9 (0.5 shared, 0.7483 own:
  // √(0.25 + 0.56) = 0.9); S₀ σ 0.1; pH_max 6.2874 with σ √(0.1² + 0.9² + 0.1²) = 0.9110 (not anchored).
  const row = {
    deltaPka: 6.106,
    phMax: 6.2874,
    saltWaterSolubility: {
      mgPerMlAsSalt: 0.5621,
      log10DrugM: { value: -2.83, uncertainty: 0.9 },
    },
    worst: { doseNumber: 2.4213, solid: 'free-form' as const, pH: 6.8 },
    gastric: { doseNumber: 32.21, solid: 'salt' as const },
    robustness: {
      saltLog10Sigma: Math.sqrt(0.56),
      saltSharedLog10Sigma: 0.5,
      saltAnchoredOnIntrinsic: false,
    },
    solutionEnthalpyPerDrugIon: {
      valueKJPerMolDrugIon: -44.31,
      sigmaKJPerMolDrugIon: 7.72,
      notInformative: null,
    },
  } as unknown as Parameters<typeof shownRowNumbers>[0];
  const shown = shownRowNumbers(row, { drugPkaSigma: 0.1, log10IntrinsicSigma: 0.1 });

  it('ΔpKa 6.106 ± 0.1 → 6.11 ± 0.10 (was printed 6.106)', () => {
    expect(shown.deltaPka).toStrictEqual({ value: 6.11, sigma: 0.1, decimals: 2 });
  });
  it('pH_max 6.2874 ± 0.9110 → 6.29 ± 0.91', () => {
    expect(shown.phMax).toStrictEqual({ value: 6.29, sigma: 0.91, decimals: 2 });
  });
  it('the worst D₀, limited by the free form, takes S₀’s σ 0.1: 2.4213 → 2.4 (2.4213/1.2589 = 1.923 → 1.9; × 1.2589 = 3.048 → 3.0)', () => {
    expect(shown.worstDoseNumber).toStrictEqual({ value: 2.4, low: 1.9, high: 3, digits: 2 });
  });
  it('the gastric D₀, limited by the salt, takes the salt’s σ 0.9: 32.21 → 32 (÷ 7.943 = 4.055 → 4.1; × 7.943 = 255.8 → 260)', () => {
    expect(shown.gastricDoseNumber).toStrictEqual({ value: 32, low: 4.1, high: 260, digits: 2 });
  });
  it('mg/mL with the salt’s own σ 0.9: 0.5621 → 0.56 (÷ 7.943 = 0.07077 → 0.071; × 7.943 = 4.465 → 4.5)', () => {
    expect(shown.saltWaterMgPerMl).toStrictEqual({ value: 0.56, low: 0.071, high: 4.5, digits: 2 });
  });
  it('ΔH_sol −44.31 ± 7.72 → −44.3 ± 7.7', () => {
    expect(shown.solutionEnthalpyKJPerMolDrugIon).toStrictEqual({
      value: -44.3,
      sigma: 7.7,
      decimals: 1,
    });
  });
});
