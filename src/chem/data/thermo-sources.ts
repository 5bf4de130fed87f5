/**
 * Citations shared by the thermochemistry data files. Each data row names one of these; a row whose value
 * was recalled rather than read from the source carries `fromMemory: true` and says so in its text.
 */
export const SRC = {
  shannon1976:
    'R. D. Shannon, Acta Cryst. A32 (1976) 751–767, Table 1, effective ionic radii ("IR"), CN VI',
  goldschmidt:
    'V. M. Goldschmidt radii as used by H. D. B. Jenkins & H. K. Roobottom, "Lattice Energies", CRC Handbook of Chemistry and Physics (metal ions for Kapustinskii)',
  thermoRadii:
    'Thermochemical radii: H. K. Roobottom, H. D. B. Jenkins, J. Passmore, L. Glasser, J. Chem. Educ. 76 (1999) 1570, Table; H. D. B. Jenkins, K. P. Thakur, J. Chem. Educ. 56 (1979) 576; as in CRC "Lattice Energies" Table 2',
  jenkinsVolumes:
    'Ion volumes: H. D. B. Jenkins, H. K. Roobottom, J. Passmore, L. Glasser, Inorg. Chem. 38 (1999) 3609, Table 1',
  marcusHydration:
    'Y. Marcus, J. Chem. Soc. Faraday Trans. 1 83 (1987) 339 ("Thermodynamics of solvation of ions. Part 3. The enthalpy of hydration at 298.15 K"), absolute scale; the 1991 Part 5 (Faraday Trans. 87, 2995) gives the matching Gibbs energies',
  marcus1994: 'Y. Marcus, Biophys. Chem. 51 (1994) 111, Table (hydration of ions)',
  smith1977: 'D. W. Smith, J. Chem. Educ. 54 (1977) 540',
  pauling1960:
    'L. Pauling, The Nature of the Chemical Bond, 3rd ed. (1960): Born exponents He 5, Ne 7, Ar 9, Kr 10, Xe 12',
  nbs1982:
    'D. D. Wagman et al., "The NBS tables of chemical thermodynamic properties", J. Phys. Chem. Ref. Data 11 (1982) Suppl. 2 (ΔfH° at 298.15 K)',
  crcLattice:
    'H. D. B. Jenkins & H. K. Roobottom, "Lattice Energies", CRC Handbook of Chemistry and Physics, Table 1',
  crcDensity:
    'CRC Handbook of Chemistry and Physics, "Physical Constants of Inorganic Compounds" (density)',
  wyckoff:
    'R. W. G. Wyckoff, Crystal Structures, 2nd ed., vol. 1 (1963) (cubic cell edges at room temperature)',
  crcOrganicDensity:
    'CRC Handbook of Chemistry and Physics, "Physical Constants of Organic Compounds" (density)',
  iupacWeights:
    'IUPAC Commission on Isotopic Abundances and Atomic Weights, conventional atomic weights (2013)',
  zhao2003:
    'Y. H. Zhao, M. H. Abraham, A. M. Zissimos, J. Org. Chem. 68 (2003) 7368–7373, eq. 4 (V_vdW = Σ atoms − 5.92 N_B − 14.7 R_A − 3.8 R_NR; the three corrections checked 2026-12-01 against mordred-descriptor/mordred mordred/VdwVolumeABC.py, which implements the paper)',
  bondi1964: 'A. Bondi, J. Phys. Chem. 68 (1964) 441–451 (van der Waals radii)',
  kitaigorodskii:
    'A. I. Kitaigorodskii, Molecular Crystals and Molecules (Academic Press, 1973): packing coefficients 0.65–0.77',
  latimer1939:
    'W. M. Latimer, K. S. Pitzer, C. M. Slansky, J. Chem. Phys. 7 (1939) 108 (effective-radius Born hydration)',
  born1920: 'M. Born, Z. Phys. 1 (1920) 45 (Born solvation energy)',
  waterDielectric:
    'Water at 298.15 K: ε_r = 78.36, dε_r/dT = −0.361 K⁻¹ (D. G. Archer & P. Wang, J. Phys. Chem. Ref. Data 19 (1990) 371) — from memory; ε_r checked 2026-12-01 against CalebBell/chemicals "chemicals/Electrolytes/Permittivity (Dielectric Constant) of Liquids.tsv" (CRC fit for water, A = 249.21, B = −0.79069, C = 0.00072997: ε_r(298.15 K) = 78.36, dε_r/dT = −0.355 K⁻¹ — the slope differs by 1.6 %, which moves the Born bracket by 0.03 %)',
} as const;

/**
 * Secondary sources read on 2026-12-01 to check values first entered from memory (public repositories that
 * reproduce the primary table; each names the repository, the file and the primary it cites). A value whose
 * source string carries one of these was compared with that file and agrees to the precision the file gives.
 */
export const CHECKED = {
  shannon:
    'checked 2026-12-01 against Anthonyrr98/Future-Style-Periodic-Table radii.js (Shannon effective ionic radii, CN VI, in pm, "from Radii for All Species", i.e. Shannon 1976)',
  nbsReaktoro1997:
    'checked 2026-12-01 against reaktoro/reaktoro embedded/databases/reaktoro/ExtendedUNIQUAC.v1997.yaml (Hr, cited there to the NIST/NBS tables of chemical thermodynamic properties)',
  thomsenReaktoro:
    "agrees with reaktoro/reaktoro embedded/databases/reaktoro/ExtendedUNIQUAC.v2023.yaml and ExtendedUNIQUAC/GarciaThesis2005.yaml (Hr of K. Thomsen's extended-UNIQUAC standard-state data; those rows name no primary, checked 2026-12-01)",
  crcThermo:
    'checked 2026-12-01 against CalebBell/chemicals "chemicals/Heat Capacity/CRC Standard Thermodynamic Properties of Chemical Substances.tsv" (CRC Handbook table, 0.1 kJ/mol)',
  ieEa: 'checked 2026-12-01 against iRASPA/RASPA3 src/raspakit/charge_equilibration_wilmer_snurr.ixx (ionisation energies and electron affinities in eV from C. E. Wilmer & R. Q. Snurr, Chem. Eng. J. 171 (2011) 775, which tabulates the NIST values; converted with 1 eV = 96.485 kJ/mol)',
  bondi:
    'checked 2026-12-01 against gromacs/gromacs share/top/vdwradii.dat (H, C, N, O, F, P, S, Cl; the file cites Bondi 1964) and exciting/exciting tools/ase/ase/data/vdw.py (ASE table; Si, Se, Br, I marked as Bondi 1964)',
  zhaoMordred:
    'checked 2026-12-01 against mordred-descriptor/mordred mordred/VdwVolumeABC.py (Zhao, Abraham & Zissimos 2003 as implemented there: atom contributions (4/3)πr³ of the same radii)',
  crcDensity:
    'checked 2026-12-01 against CalebBell/chemicals "chemicals/Density/CRC Solid Inorganic Constant Densities.tsv" (molar volumes computed there from the CRC Handbook densities; ρ = M/V_m, agrees to the last digit given here)',
  crcAqueous:
    'checked 2026-12-01 against CalebBell/chemicals "chemicals/Electrolytes/CRC Thermodynamic Properties of Aqueous Ions.tsv" (CRC Handbook table, 0.1 kJ/mol)',
  naclCell:
    'a = 5.6402 Å read 2026-12-01 at http://www.ilpi.com/inorganic/structures/nacl/index.html (NaCl structure page)',
} as const;
