import { CHECKED, SRC } from './thermo-sources';

/**
 * Element data for molecular volumes: Bondi van der Waals radii (Å) with the corresponding sphere
 * volumes (Å³) used as atom contributions by Zhao, Abraham & Zissimos. Atomic weights have one home,
 * src/chem/compound/atomic-weights.ts (IUPAC 2021).
 *
 * vdW volumes: Y. H. Zhao, M. H. Abraham, A. M. Zissimos, J. Org. Chem. 68 (2003) 7368, Table 1 (sphere
 * volumes of Bondi radii, A. Bondi, J. Phys. Chem. 68 (1964) 441) — the values Zhao, Abraham & Zissimos tabulate,
 * checked here against (4/3)πr³ of the Bondi radius (tests/chem/thermo/ion-volume.test.ts).
 */

/**
 * Van der Waals radii, Å — the radii behind {@link ZHAO_ATOM_VOLUME_A3}. H, C, N, O, F, P, S, Cl, Br, I, Si
 * and Se are Bondi's (1964) values, checked 2026-12-01 against gromacs/gromacs share/top/vdwradii.dat and
 * exciting/exciting tools/ase/ase/data/vdw.py (both cite Bondi 1964) and against the radii of
 * mordred-descriptor/mordred mordred/VdwVolumeABC.py (its implementation of Zhao et al. 2003).
 * B is not a Bondi radius: Bondi 1964 gives none (1.92 Å, entered here earlier from memory, is Mantina et al.
 * 2009, as the ASE table marks it). Zhao et al.'s table, as implemented in mordred's VdwVolumeABC.py, uses
 * 2.13 Å for B, and that is the value used here (corrected 2026-12-01; not seen in the paper itself).
 */
export const BONDI_RADIUS_A: Readonly<Record<string, number>> = {
  H: 1.2, C: 1.7, N: 1.55, O: 1.52, F: 1.47, Cl: 1.75, Br: 1.85, I: 1.98, P: 1.8, S: 1.8, B: 2.13, Si: 2.1, Se: 1.9,
};

/** Where each radius in {@link BONDI_RADIUS_A} was checked (every entry names its source). */
export const BONDI_RADIUS_SOURCE: Readonly<Record<string, string>> = {
  ...Object.fromEntries(['H', 'C', 'N', 'O', 'F', 'P', 'S', 'Cl', 'Br', 'I', 'Si', 'Se'].map((el) => [el, `${SRC.bondi1964}; ${CHECKED.bondi}`])),
  B: `Zhao, Abraham & Zissimos 2003 atom radius as implemented in mordred-descriptor/mordred mordred/VdwVolumeABC.py (read 2026-12-01; Bondi 1964 lists no B)`,
};

/**
 * Atom contributions to the van der Waals volume, Å³ (Zhao, Abraham & Zissimos 2003, Table 1; the sphere
 * volume (4/3)πr³ of each radius in {@link BONDI_RADIUS_A}, which is how mordred-descriptor/mordred
 * mordred/VdwVolumeABC.py computes them — checked 2026-12-01). B, Si and Se are computed here the same way;
 * B is 40.48 Å³ (r = 2.13 Å, corrected 2026-12-01 from 29.65 Å³ for r = 1.92 Å).
 */
export const ZHAO_ATOM_VOLUME_A3: Readonly<Record<string, number>> = {
  H: 7.24, C: 20.58, N: 15.6, O: 14.71, F: 13.31, Cl: 22.45, Br: 26.52, I: 32.52, P: 24.43, S: 24.43,
  B: 40.48, Si: 38.79, Se: 28.73,
};
