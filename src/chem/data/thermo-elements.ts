/**
 * Element data for formula work: conventional atomic weights (g/mol) and Bondi van der Waals radii (Å)
 * with the corresponding sphere volumes (Å³) used as atom contributions by Zhao, Abraham & Zissimos.
 *
 * Atomic weights: IUPAC conventional values (2013 table), abridged to what salts of drugs need — from memory.
 * vdW volumes: Y. H. Zhao, M. H. Abraham, A. M. Zissimos, J. Org. Chem. 68 (2003) 7368, Table 1 (sphere
 * volumes of Bondi radii, A. Bondi, J. Phys. Chem. 68 (1964) 441) — the values quoted in the science brief,
 * checked here against (4/3)πr³ of the Bondi radius (tests/chem/thermo/ion-volume.test.ts).
 */
export const ATOMIC_WEIGHT_G_PER_MOL: Readonly<Record<string, number>> = {
  H: 1.008, Li: 6.94, B: 10.81, C: 12.011, N: 14.007, O: 15.999, F: 18.998, Na: 22.99, Mg: 24.305,
  Al: 26.982, Si: 28.085, P: 30.974, S: 32.06, Cl: 35.45, K: 39.098, Ca: 40.078, Zn: 65.38, Se: 78.971,
  Br: 79.904, Rb: 85.468, Sr: 87.62, I: 126.904, Cs: 132.905, Ba: 137.327,
};

/** Bondi (1964) van der Waals radii, Å — the radii behind {@link ZHAO_ATOM_VOLUME_A3}. */
export const BONDI_RADIUS_A: Readonly<Record<string, number>> = {
  H: 1.2, C: 1.7, N: 1.55, O: 1.52, F: 1.47, Cl: 1.75, Br: 1.85, I: 1.98, P: 1.8, S: 1.8, B: 1.92, Si: 2.1, Se: 1.9,
};

/**
 * Atom contributions to the van der Waals volume, Å³ (Zhao, Abraham & Zissimos 2003, Table 1; the sphere
 * volume of each Bondi radius). B, Si and Se are computed here as (4/3)πr³ of their Bondi radii.
 */
export const ZHAO_ATOM_VOLUME_A3: Readonly<Record<string, number>> = {
  H: 7.24, C: 20.58, N: 15.6, O: 14.71, F: 13.31, Cl: 22.45, Br: 26.52, I: 32.52, P: 24.43, S: 24.43,
  B: 29.65, Si: 38.79, Se: 28.73,
};
