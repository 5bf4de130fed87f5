import { describe, expect, it } from 'vitest';
import { formatWithUncertainty, roundToUncertainty } from '@/chem';

// Rounding to the uncertainty (JCGM 100:2008 §7.2.6: σ with at most two significant digits, the
// value to the same decimal place). Each expected value is rounded by hand beside it.
describe('precision that follows the uncertainty', () => {
  it('σ 0.31 → two decimals: 7.2154 ± 0.31 → 7.22 ± 0.31', () => {
    expect(roundToUncertainty(7.2154, 0.31)).toEqual({ value: 7.22, sigma: 0.31, decimals: 2 });
  });
  it('σ 54 → units: −160.4 ± 54 → −160 ± 54 (typographic minus)', () => {
    expect(formatWithUncertainty(-160.4, 54)).toBe('−160 ± 54');
  });
  it('σ 108 → tens: −321.4 ± 108 → −320 ± 110', () => {
    expect(roundToUncertainty(-321.4, 108)).toEqual({ value: -320, sigma: 110, decimals: 0 });
  });
  it('σ 0.0123 → three decimals: 0.7922 ± 0.0123 → 0.792 ± 0.012 (no "0.792242")', () => {
    expect(formatWithUncertainty(0.792242, 0.0123)).toBe('0.792 ± 0.012');
  });
});
