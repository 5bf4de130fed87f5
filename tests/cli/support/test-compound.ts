/**
 * The made-up base the CLI tests screen (formula, pKa, S₀ and dose are inputs, never expected values;
 * the tests check structure, identities and refusals).
 */
export const TEST_COMPOUND_ARGS: readonly string[] = [
  '--formula',
  'C17H20N2O2',
  '--pka',
  '8',
  '--s0',
  '0.02',
  '--dose',
  '100',
];
