import { describe, expect, it } from 'vitest';
import { methodLabel } from '@/components/method-label';

// Issue 19: screens showed the core's method ids ("born-fitted", "hess-law", "zhao-vdw/packing").
// The names are the methods' usual names in the literature (Kapustinskii; Born–Mayer; Hess's law).
describe('methodLabel: a method id as a formulator reads it', () => {
  it('names the ids the Energetics and Compound areas show', () => {
    expect(methodLabel('born-fitted')).toBe('Born, fitted offsets');
    expect(methodLabel('hess-law')).toBe('Hess’s law (sum of the steps)');
    expect(methodLabel('zhao-vdw/packing')).toBe('Zhao van der Waals volume ÷ packing coefficient');
  });

  it('keeps the "(calibrated)" the core adds to a calibrated lattice method', () => {
    expect(methodLabel('kapustinskii (calibrated)')).toBe('Kapustinskii (calibrated)');
    expect(methodLabel('vbt (calibrated)')).toBe('volume-based thermodynamics (calibrated)');
  });

  it('shows an id it does not know as it is', () => {
    expect(methodLabel('published')).toBe('published');
    expect(methodLabel('something-new')).toBe('something-new');
  });
});
