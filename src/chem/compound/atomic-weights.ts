/**
 * Standard atomic weights, g/mol (dimensionless relative atomic masses × 1 g/mol).
 *
 * Source: IUPAC Commission on Isotopic Abundances and Atomic Weights (CIAAW), "Standard atomic weights
 * of the elements 2021" (T. Prohaska et al., Pure Appl. Chem. 94 (2022) 573–600), abridged values to
 * five significant figures (Table 2 of that report; for elements given as an interval, the
 * "conventional" abridged value). Values from memory of that table; tests/chem/compound check every
 * bundled formula against openchemlib's own weights within 0.02 g/mol.
 *
 * Only elements met in drug substances and their counter-ions are listed; a formula with any other
 * element is rejected with a message rather than given a guessed mass.
 */
export const ATOMIC_WEIGHTS_G_PER_MOL: Readonly<Record<string, number>> = Object.freeze({
  H: 1.008,
  Li: 6.94,
  B: 10.81,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  F: 18.998,
  Na: 22.99,
  Mg: 24.305,
  Al: 26.982,
  Si: 28.085,
  P: 30.974,
  S: 32.06,
  Cl: 35.45,
  K: 39.098,
  Ca: 40.078,
  Ti: 47.867,
  Mn: 54.938,
  Fe: 55.845,
  Co: 58.933,
  Ni: 58.693,
  Cu: 63.546,
  Zn: 65.38,
  Ga: 69.723,
  Ge: 72.63,
  As: 74.922,
  Se: 78.971,
  Br: 79.904,
  Rb: 85.468,
  Sr: 87.62,
  Ag: 107.87,
  Sn: 118.71,
  Sb: 121.76,
  Te: 127.6,
  I: 126.9,
  Cs: 132.91,
  Ba: 137.33,
  Gd: 157.25,
  Pt: 195.08,
  Au: 196.97,
  Hg: 200.59,
  Bi: 208.98,
});

/** Source line for data rows whose molar mass is computed from {@link ATOMIC_WEIGHTS_G_PER_MOL}. */
export const ATOMIC_WEIGHTS_SOURCE =
  'Computed from IUPAC/CIAAW standard atomic weights 2021, abridged (Prohaska et al., Pure Appl. Chem. 94 (2022) 573; values from memory, checked against openchemlib)';

/** Element symbols of the periodic table (to tell an unknown symbol from a real but unsupported one). */
export const ELEMENT_SYMBOLS: ReadonlySet<string> = new Set(
  (
    'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
    'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm ' +
    'Yb Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No ' +
    'Lr Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
  ).split(' '),
);
