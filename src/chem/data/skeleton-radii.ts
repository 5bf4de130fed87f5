/**
 * A handful of six-coordinate ionic radii for the first screen, Å.
 * Source: R. D. Shannon, Acta Cryst. A32 (1976) 751–767, Table 1, "IR" column, CN VI —
 * values from memory; to be checked against the table by the thermochemistry engine's data.
 */
export const SKELETON_RADII_A = {
  'Na+': { charge: 1, radiusA: 1.02, source: 'Shannon 1976, Acta Cryst. A32, 751, CN VI (from memory)' },
  'K+': { charge: 1, radiusA: 1.38, source: 'Shannon 1976, Acta Cryst. A32, 751, CN VI (from memory)' },
  'Cl-': { charge: -1, radiusA: 1.81, source: 'Shannon 1976, Acta Cryst. A32, 751, CN VI (from memory)' },
  'Br-': { charge: -1, radiusA: 1.96, source: 'Shannon 1976, Acta Cryst. A32, 751, CN VI (from memory)' },
} as const;
