import { describe, expect, it } from 'vitest';
import { superscript } from '@/chem';

// The Unicode superscript characters (U+207B, U+2070, U+00B9, U+00B2, U+00B3, U+2074–U+2079).
describe('superscript: an exponent as text', () => {
  it('sets sign and digits by default', () => {
    expect(`10${superscript('-12')}`).toBe('10⁻¹²');
    expect(superscript('4')).toBe('⁴');
  });

  it('leaves what the caller does not ask for', () => {
    expect(superscript('-2.5', /[0-9.]/g)).toBe('-²·⁵');
  });
});
