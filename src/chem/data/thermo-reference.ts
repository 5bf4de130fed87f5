import { CHECKED, SRC } from './thermo-sources';

/**
 * Published reference data the thermochemistry engine is checked and calibrated against. Every row names
 * its source; values recalled rather than read from a table at writing time say "from memory" (no copy of
 * the NBS tables or the CRC Handbook was available offline). fixtures/reference/*.csv hold the same rows
 * for people and other tools; tests/chem/thermo/reference-fixtures.test.ts keeps the two in step.
 *
 * On 2026-12-01 the ΔfH° values, ionisation energies and electron affinities were compared with published
 * copies of their tables; {@link FORMATION_ENTHALPY_CHECKS} names, per species, the copy that agrees.
 * Species without an entry there remain "from memory" — see {@link formationEnthalpySource}.
 *
 * Units: kJ/mol, g/cm³, Å.
 */

const FM = ' — from memory';

/**
 * ΔfH° of crystalline salts, kJ/mol, 298.15 K (Wagman et al. 1982, NBS tables). 48 agree with the CRC
 * Handbook table (CHECKED.crcThermo) to its 0.1 kJ/mol; NaCl and Na2SO4 also with the NBS values in
 * reaktoro's data; NaOH, CaCl2 and BaCl2 with Thomsen's NBS-based data in reaktoro (the CRC table gives the
 * CODATA values −425.8, −795.4 and −855.0 there). KCH3COO was corrected from −723.33 (from memory) to −723.0
 * (CRC table) on 2026-12-01. Still from memory (the CRC table, which adopts CODATA key values for these,
 * gives the number in brackets): NaF (−576.6), KCl (−436.5), MgF2 (−1124.2), CaF2 (−1228.0), LiOH (−487.5),
 * KOH (−424.6), CaSO4 (−1434.5), CaCO3 (−1207.6).
 */
export const SOLID_FORMATION_KJ: Readonly<Record<string, number>> = {
  LiF: -615.97, LiCl: -408.61, LiBr: -351.21, LiI: -270.41,
  NaF: -573.65, NaCl: -411.15, NaBr: -361.06, NaI: -287.78,
  KF: -567.27, KCl: -436.75, KBr: -393.8, KI: -327.9,
  RbF: -557.7, RbCl: -435.35, RbBr: -394.59, RbI: -333.8,
  CsF: -553.5, CsCl: -443.04, CsBr: -405.81, CsI: -346.6,
  MgF2: -1123.4, MgCl2: -641.32, MgBr2: -524.3, MgI2: -364.0,
  CaF2: -1219.6, CaCl2: -795.8, CaBr2: -682.8, CaI2: -533.5,
  SrF2: -1216.3, SrCl2: -828.9, SrBr2: -717.6, SrI2: -558.1,
  BaF2: -1207.1, BaCl2: -858.6, BaBr2: -757.3, BaI2: -602.1,
  ZnCl2: -415.05,
  NaNO3: -467.85, KNO3: -494.63, NH4Cl: -314.43, NH4Br: -270.83, NH4I: -201.42, NH4NO3: -365.56,
  LiOH: -484.93, NaOH: -425.61, KOH: -424.76,
  NaClO4: -383.3, KClO4: -432.75, NH4ClO4: -295.31,
  Na2SO4: -1387.08, K2SO4: -1437.79, MgSO4: -1284.9, CaSO4: -1434.11, BaSO4: -1473.2,
  Na2CO3: -1130.68, K2CO3: -1151.02, CaCO3: -1206.92,
  KH2PO4: -1568.33, NaCH3COO: -708.81, KCH3COO: -723.0,
};

/**
 * ΔfH° of aqueous ions at infinite dilution, kJ/mol, 298.15 K (Wagman et al. 1982; H⁺(aq) = 0). All 22 agree
 * with the CRC Handbook table of aqueous ions (CHECKED.crcAqueous) to its 0.1 kJ/mol; Na⁺, K⁺, NH₄⁺, Cl⁻,
 * SO₄²⁻, NO₃⁻, OH⁻ and CO₃²⁻ also with reaktoro's NBS-cited data (CHECKED.nbsReaktoro1997), Mg²⁺, Ca²⁺, Sr²⁺
 * and Ba²⁺ with Thomsen's data in reaktoro (CHECKED.thomsenReaktoro).
 */
export const AQUEOUS_ION_FORMATION_KJ: Readonly<Record<string, number>> = {
  lithium: -278.49, sodium: -240.12, potassium: -252.38, rubidium: -251.17, caesium: -258.28,
  ammonium: -132.51, magnesium: -466.85, calcium: -542.83, strontium: -545.8, barium: -537.64, zinc: -153.89,
  fluoride: -332.63, chloride: -167.16, bromide: -121.55, iodide: -55.19, hydroxide: -229.99,
  nitrate: -207.36, sulfate: -909.27, carbonate: -677.14, perchlorate: -129.33,
  'dihydrogen-phosphate': -1296.29, acetate: -486.01,
};

/**
 * Enthalpy of atomisation of the elements = ΔfH° of the gaseous atom, kJ/mol, 298.15 K (Wagman et al. 1982).
 * K, Rb, Sr, Ba, F, Br and I agree with the CRC table (CHECKED.crcThermo); F 79.38 and K 89.0 are the CODATA
 * key values that table gives (from memory, the NBS tables have F 78.99 and K 89.24 — a 0.4 kJ/mol
 * difference that does not matter for lattice enthalpies of 600–2900 kJ/mol). Li, Na, Cs, Mg, Ca and Cl are
 * NBS values from memory; the CRC table gives the CODATA values 159.3, 107.5, 76.5, 147.1, 177.8, 121.3.
 */
export const ATOM_FORMATION_KJ: Readonly<Record<string, number>> = {
  Li: 159.37, Na: 107.32, K: 89.0, Rb: 80.88, Cs: 76.06, Mg: 147.7, Ca: 178.2, Sr: 164.4, Ba: 180.0,
  F: 79.38, Cl: 121.68, Br: 111.88, I: 106.84,
};

/**
 * Ionisation energies (sum of the first z), kJ/mol, and electron affinities, kJ/mol — CRC Handbook
 * "Ionization Energies of Atoms and Atomic Ions" and "Electron Affinities" (NIST values), at 0 K. All 18
 * values agree to 0.1 kJ/mol with the eV table in iRASPA/RASPA3 (CHECKED.ieEa) converted at 96.485 kJ/mol
 * per eV (e.g. Na 5.139076 eV → 495.85, Cl 3.612724 eV → 348.57). The
 * (5/2)RT corrections that turn them into 298 K enthalpies cancel around a neutral salt's cycle (one
 * electron out per electron in), so they are left out; see the Born–Haber test.
 */
export const IONISATION_ENERGY_SUM_KJ: Readonly<Record<string, number>> = {
  Li: 520.2, Na: 495.8, K: 418.8, Rb: 403.0, Cs: 375.7,
  Mg: 737.7 + 1450.7, Ca: 589.8 + 1145.4, Sr: 549.5 + 1064.2, Ba: 502.9 + 965.2,
};
export const ELECTRON_AFFINITY_KJ: Readonly<Record<string, number>> = { F: 328.2, Cl: 348.6, Br: 324.5, I: 295.2 };

export const CYCLE_DATA_SOURCE = `${SRC.nbs1982} (ΔfH°; per-species checks in FORMATION_ENTHALPY_CHECKS, the rest from memory); ionisation energies and electron affinities: CRC Handbook (NIST), ${CHECKED.ieEa}`;

/** State of a species in the formation-enthalpy tables: crystal, aqueous ion, gaseous atom. */
export type FormationState = 'cr' | 'aq' | 'g';

const CRC_CR = ['LiF', 'LiCl', 'LiBr', 'LiI', 'NaBr', 'NaI', 'KF', 'KBr', 'KI', 'RbF', 'RbCl', 'RbBr', 'RbI', 'CsF', 'CsCl', 'CsBr', 'CsI',
  'MgBr2', 'MgI2', 'CaBr2', 'CaI2', 'SrF2', 'SrBr2', 'SrI2', 'BaF2', 'BaBr2', 'BaI2', 'ZnCl2', 'NaNO3', 'KNO3', 'NH4Cl', 'NH4Br', 'NH4I',
  'NH4NO3', 'NaClO4', 'KClO4', 'NH4ClO4', 'K2SO4', 'BaSO4', 'K2CO3', 'KH2PO4', 'NaCH3COO'];

/**
 * Per species (`formula|state`, aqueous ions by ion id): the published copy a ΔfH° value was compared with on
 * 2026-12-01 and agrees with (to the precision of that copy). Species not listed are from memory.
 */
export const FORMATION_ENTHALPY_CHECKS: Readonly<Record<string, string>> = {
  ...Object.fromEntries(CRC_CR.map((f) => [`${f}|cr`, CHECKED.crcThermo])),
  'NaCl|cr': `${CHECKED.nbsReaktoro1997}; ${CHECKED.crcThermo}`,
  'Na2SO4|cr': `${CHECKED.nbsReaktoro1997}; ${CHECKED.crcThermo}`,
  'MgCl2|cr': `${CHECKED.thomsenReaktoro}; ${CHECKED.crcThermo}`,
  'MgSO4|cr': `${CHECKED.thomsenReaktoro}; ${CHECKED.crcThermo}`,
  'Na2CO3|cr': `${CHECKED.thomsenReaktoro}; ${CHECKED.crcThermo}`,
  'SrCl2|cr': `${CHECKED.thomsenReaktoro}; ${CHECKED.crcThermo}`,
  'NaOH|cr': CHECKED.thomsenReaktoro,
  'CaCl2|cr': CHECKED.thomsenReaktoro,
  'BaCl2|cr': CHECKED.thomsenReaktoro,
  'KCH3COO|cr': `corrected 2026-12-01 from −723.33 (from memory) to the CRC value; ${CHECKED.crcThermo}`,
  ...Object.fromEntries(['sodium', 'potassium', 'ammonium', 'chloride', 'sulfate', 'nitrate', 'hydroxide', 'carbonate'].map((i) => [`${i}|aq`, `${CHECKED.nbsReaktoro1997}; ${CHECKED.crcAqueous}`])),
  ...Object.fromEntries(['magnesium', 'calcium', 'strontium', 'barium'].map((i) => [`${i}|aq`, `${CHECKED.thomsenReaktoro}; ${CHECKED.crcAqueous}`])),
  ...Object.fromEntries(['lithium', 'rubidium', 'caesium', 'zinc', 'fluoride', 'bromide', 'iodide', 'perchlorate', 'dihydrogen-phosphate', 'acetate'].map((i) => [`${i}|aq`, CHECKED.crcAqueous])),
  ...Object.fromEntries(['Rb', 'Sr', 'Ba', 'Br', 'I'].map((e) => [`${e}|g`, CHECKED.crcThermo])),
  'F|g': `CODATA key value (J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, 1989) as given in the CRC table; ${CHECKED.crcThermo}`,
  'K|g': `CODATA key value (J. D. Cox, D. D. Wagman, V. A. Medvedev, CODATA Key Values for Thermodynamics, 1989) as given in the CRC table; ${CHECKED.crcThermo}`,
};

/** The source of one ΔfH° value: the NBS tables plus the copy it was checked against, or "from memory". */
export function formationEnthalpySource(species: string, state: FormationState): string {
  const check = FORMATION_ENTHALPY_CHECKS[`${species}|${state}`];
  if (!check) return `${SRC.nbs1982}${FM}`;
  return check.startsWith('CODATA') ? check : `${SRC.nbs1982}; ${check}`;
}

/** How a reference salt's formula-unit volume is known. */
export type VolumeSource =
  | { kind: 'cell'; structure: 'rock-salt' | 'caesium-chloride' | 'fluorite'; edgeA: number; source: string }
  | { kind: 'cell-volume'; cellVolumeA3: number; z: number; structure?: 'rutile'; source: string }
  | { kind: 'density'; densityGPerCm3: number; source: string };

/** A salt of the lattice reference set. */
export interface LatticeReferenceSalt {
  id: string;
  formula: string;
  cation: string;
  anion: string;
  p: number;
  q: number;
  group: 'alkali-halide' | 'alkaline-earth-halide' | 'polyatomic';
  /** How the reference ΔH_L is obtained. */
  route: 'born-haber' | 'solution-cycle';
  volume: VolumeSource;
  /** Metal and halogen symbols for the Born–Haber route. */
  metal?: string;
  halogen?: string;
}

/**
 * Source of a cubic cell edge. `check`: the edge was read in a published copy. `byDensity`: the recalled edge
 * agrees within 0.1 % with the edge implied by the CRC density, a = (Z·M/(ρ·N_A))^(1/3) — a consistency check
 * on a different measurement, not a reading of Wyckoff's table, so the value still says "from memory".
 * Edges that differ more from the density-implied one (2026-12-01: LiCl −0.25 %, LiI −0.45 %, NaF −0.27 %,
 * KF −0.59 %, KBr −0.11 %, RbF −6.1 %, RbCl −0.69 %, RbBr −0.15 %, RbI −0.13 %, CsBr −0.43 %, CsI −0.14 %,
 * SrF2 −0.28 %) are left as recalled: densities of hygroscopic halides are often low.
 */
const cellSource = (check?: string, byDensity = false): string =>
  check ? `${SRC.wyckoff}; ${check}` : `${SRC.wyckoff}${FM}${byDensity ? `; consistent within 0.1 % with the edge implied by the CRC density (${CHECKED.crcDensity})` : ''}`;
const rs = (edgeA: number, check?: string, byDensity = false): VolumeSource => ({ kind: 'cell', structure: 'rock-salt', edgeA, source: cellSource(check, byDensity) });
const cc = (edgeA: number, byDensity = false): VolumeSource => ({ kind: 'cell', structure: 'caesium-chloride', edgeA, source: cellSource(undefined, byDensity) });
const fl = (edgeA: number, byDensity = false): VolumeSource => ({ kind: 'cell', structure: 'fluorite', edgeA, source: cellSource(undefined, byDensity) });
const D = true;
/** A CRC density checked against a published copy (CHECKED.crcDensity); `was` records a corrected recalled value. */
const rhoC = (densityGPerCm3: number, was?: number): VolumeSource => ({
  kind: 'density',
  densityGPerCm3,
  source: `${SRC.crcDensity}; ${CHECKED.crcDensity}${was === undefined ? '' : `; corrected 2026-12-01 from ${was} (from memory)`}`,
});

/**
 * Densities (g/cm³) of the polyatomic reference salts, CRC Handbook "Physical Constants of Inorganic Compounds",
 * all checked 2026-12-01 against CHECKED.crcDensity. Corrected then (recalled value → CRC): NaNO3 2.26 → 2.261,
 * KNO3 2.11 → 2.105, NH4Cl 1.53 → 1.519, NH4Br 2.43 → 2.429, NH4I 2.51 → 2.514, KOH 2.04 → 2.044,
 * NaClO4 2.50 → 2.52, Na2SO4 2.66 → 2.70, BaSO4 4.50 → 4.49, LiOH 1.46 → 1.45.
 */
const POLYATOMIC_DENSITY: Readonly<Record<string, [number, number?]>> = {
  NaNO3: [2.261, 2.26], KNO3: [2.105, 2.11], NH4NO3: [1.72], NH4Cl: [1.519, 1.53], NH4Br: [2.429, 2.43], NH4I: [2.514, 2.51],
  LiOH: [1.45, 1.46], NaOH: [2.13], KOH: [2.044, 2.04], NaClO4: [2.52, 2.5], KClO4: [2.52], NH4ClO4: [1.95],
  Na2SO4: [2.7, 2.66], K2SO4: [2.66], MgSO4: [2.66], CaSO4: [2.96], BaSO4: [4.49, 4.5], Na2CO3: [2.54], K2CO3: [2.29],
  CaCO3: [2.71], KH2PO4: [2.34], NaCH3COO: [1.528], KCH3COO: [1.57],
};
const polyDensity = (formula: string): number => POLYATOMIC_DENSITY[formula]![0];

const ALKALI: [string, string][] = [['Li', 'lithium'], ['Na', 'sodium'], ['K', 'potassium'], ['Rb', 'rubidium'], ['Cs', 'caesium']];
const EARTH: [string, string][] = [['Mg', 'magnesium'], ['Ca', 'calcium'], ['Sr', 'strontium'], ['Ba', 'barium']];
const HAL: [string, string][] = [['F', 'fluoride'], ['Cl', 'chloride'], ['Br', 'bromide'], ['I', 'iodide']];

const ALKALI_VOLUME: Record<string, VolumeSource> = {
  LiF: rs(4.027, undefined, D), LiCl: rs(5.13), LiBr: rs(5.501, undefined, D), LiI: rs(6.0),
  NaF: rs(4.634), NaCl: rs(5.64, CHECKED.naclCell), NaBr: rs(5.977, undefined, D), NaI: rs(6.473, undefined, D),
  KF: rs(5.347), KCl: rs(6.293, undefined, D), KBr: rs(6.6), KI: rs(7.066, undefined, D),
  RbF: rs(5.64), RbCl: rs(6.581), RbBr: rs(6.885), RbI: rs(7.342),
  CsF: rs(6.008, undefined, D), CsCl: cc(4.123, D), CsBr: cc(4.286), CsI: cc(4.567),
};
const EARTH_VOLUME: Record<string, VolumeSource> = {
  MgF2: { kind: 'cell-volume', cellVolumeA3: 4.62 * 4.62 * 3.05, z: 2, structure: 'rutile', source: `${SRC.wyckoff} (rutile type, a 4.62, c 3.05 Å)${FM}` },
  MgCl2: rhoC(2.325, 2.32), MgBr2: rhoC(3.72), MgI2: rhoC(4.43),
  CaF2: fl(5.463, D), CaCl2: rhoC(2.15), CaBr2: rhoC(3.38), CaI2: rhoC(3.96),
  SrF2: fl(5.8), SrCl2: rhoC(3.052, 3.05), SrBr2: rhoC(4.216, 4.22), SrI2: rhoC(4.55),
  BaF2: fl(6.2, D), BaCl2: rhoC(3.9, 3.86), BaBr2: rhoC(4.781, 4.78), BaI2: rhoC(5.15),
};

/** Reference salts: 20 alkali halides, 16 alkaline-earth halides (Born–Haber), 22 salts of polyatomic ions. */
export const LATTICE_REFERENCE_SALTS: readonly LatticeReferenceSalt[] = [
  ...ALKALI.flatMap(([m, mid]) =>
    HAL.map(([x, xid]) => ({
      id: `${m}${x}`, formula: `${m}${x}`, cation: mid, anion: xid, p: 1, q: 1, group: 'alkali-halide' as const,
      route: 'born-haber' as const, volume: ALKALI_VOLUME[`${m}${x}`]!, metal: m, halogen: x,
    })),
  ),
  ...EARTH.flatMap(([m, mid]) =>
    HAL.map(([x, xid]) => ({
      id: `${m}${x}2`, formula: `${m}${x}2`, cation: mid, anion: xid, p: 1, q: 2, group: 'alkaline-earth-halide' as const,
      route: 'born-haber' as const, volume: EARTH_VOLUME[`${m}${x}2`]!, metal: m, halogen: x,
    })),
  ),
  ...(
    [
      ['NaNO3', 'sodium', 'nitrate', 1, 1],
      ['KNO3', 'potassium', 'nitrate', 1, 1],
      ['NH4NO3', 'ammonium', 'nitrate', 1, 1],
      ['NH4Cl', 'ammonium', 'chloride', 1, 1],
      ['NH4Br', 'ammonium', 'bromide', 1, 1],
      ['NH4I', 'ammonium', 'iodide', 1, 1],
      ['LiOH', 'lithium', 'hydroxide', 1, 1],
      ['NaOH', 'sodium', 'hydroxide', 1, 1],
      ['KOH', 'potassium', 'hydroxide', 1, 1],
      ['NaClO4', 'sodium', 'perchlorate', 1, 1],
      ['KClO4', 'potassium', 'perchlorate', 1, 1],
      ['NH4ClO4', 'ammonium', 'perchlorate', 1, 1],
      ['Na2SO4', 'sodium', 'sulfate', 2, 1],
      ['K2SO4', 'potassium', 'sulfate', 2, 1],
      ['MgSO4', 'magnesium', 'sulfate', 1, 1],
      ['CaSO4', 'calcium', 'sulfate', 1, 1],
      ['BaSO4', 'barium', 'sulfate', 1, 1],
      ['Na2CO3', 'sodium', 'carbonate', 2, 1],
      ['K2CO3', 'potassium', 'carbonate', 2, 1],
      ['CaCO3', 'calcium', 'carbonate', 1, 1],
      ['KH2PO4', 'potassium', 'dihydrogen-phosphate', 1, 1],
      ['NaCH3COO', 'sodium', 'acetate', 1, 1],
      ['KCH3COO', 'potassium', 'acetate', 1, 1],
    ] as const
  ).map(([f, c, a, p, q]) => ({
    id: f, formula: f, cation: c, anion: a, p, q, group: 'polyatomic' as const, route: 'solution-cycle' as const,
    volume: rhoC(polyDensity(f), POLYATOMIC_DENSITY[f]![1]),
  })),
];

/** Formula (without charge) of each reference salt's ions, for molar masses. */
export const REFERENCE_SALT_SOURCES = {
  bornHaber: `Born–Haber cycle: ${CYCLE_DATA_SOURCE}`,
  solutionCycle: `Solution cycle ΔH_L = ΔH_sol − Σν·ΔH_hyd: ΔH_sol from ${SRC.nbs1982}${FM}; ΔH_hyd from ${SRC.marcusHydration}${FM}`,
};

/**
 * Salts of small organic ions with a published density, used to calibrate the packing coefficient that
 * turns a Zhao–Abraham–Zissimos van der Waals volume into a volume in the crystal. Organic ion given by
 * formula, charge and ring counts; the partner is a bundled inorganic ion with a Jenkins volume.
 */
export interface PackingCalibrationSalt {
  id: string;
  name: string;
  organicFormula: string;
  organicCharge: number;
  rings: { aromatic: number; nonAromatic: number };
  partner: string;
  /** Organic ions and partner ions per formula unit. */
  organicPerFormula: number;
  partnerPerFormula: number;
  densityGPerCm3: number;
  source: string;
}

export const PACKING_CALIBRATION_SALTS: readonly PackingCalibrationSalt[] = [
  { id: 'sodium-acetate', name: 'sodium acetate', organicFormula: 'C2H3O2', organicCharge: -1, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'sodium', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.528, source: `${SRC.crcOrganicDensity}; ${CHECKED.crcDensity}` },
  { id: 'potassium-acetate', name: 'potassium acetate', organicFormula: 'C2H3O2', organicCharge: -1, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'potassium', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.57, source: `${SRC.crcOrganicDensity}; ${CHECKED.crcDensity}` },
  { id: 'sodium-formate', name: 'sodium formate', organicFormula: 'CHO2', organicCharge: -1, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'sodium', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.92, source: `${SRC.crcOrganicDensity}; ${CHECKED.crcDensity}` },
  { id: 'sodium-benzoate', name: 'sodium benzoate', organicFormula: 'C7H5O2', organicCharge: -1, rings: { aromatic: 1, nonAromatic: 0 }, partner: 'sodium', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.44, source: SRC.crcOrganicDensity + FM },
  { id: 'potassium-hydrogen-phthalate', name: 'potassium hydrogen phthalate', organicFormula: 'C8H5O4', organicCharge: -1, rings: { aromatic: 1, nonAromatic: 0 }, partner: 'potassium', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.636, source: SRC.crcOrganicDensity + FM },
  { id: 'sodium-oxalate', name: 'sodium oxalate', organicFormula: 'C2O4', organicCharge: -2, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'sodium', organicPerFormula: 1, partnerPerFormula: 2, densityGPerCm3: 2.34, source: `${SRC.crcDensity}; ${CHECKED.crcDensity}` },
  { id: 'tetramethylammonium-chloride', name: 'tetramethylammonium chloride', organicFormula: 'C4H12N', organicCharge: 1, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'chloride', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.169, source: SRC.crcOrganicDensity + FM },
  { id: 'tetramethylammonium-bromide', name: 'tetramethylammonium bromide', organicFormula: 'C4H12N', organicCharge: 1, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'bromide', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.56, source: SRC.crcOrganicDensity + FM },
  { id: 'tetraethylammonium-bromide', name: 'tetraethylammonium bromide', organicFormula: 'C8H20N', organicCharge: 1, rings: { aromatic: 0, nonAromatic: 0 }, partner: 'bromide', organicPerFormula: 1, partnerPerFormula: 1, densityGPerCm3: 1.397, source: SRC.crcOrganicDensity + FM },
];

/**
 * Alkali salts whose published density gives the volume of a polyatomic anion with no Jenkins volume at
 * hand: V(anion) = (M/(ρ·N_A) − p·V(cation)) / q, averaged over the listed salts. Densities: CRC Handbook,
 * checked 2026-12-01 (CHECKED.crcDensity); KHSO4 2.245 → 2.32 and Na3PO4 2.536 → 2.54 corrected then.
 */
export const ANION_VOLUME_SALTS: readonly { anion: string; salts: { formula: string; cation: string; p: number; q: number; densityGPerCm3: number }[] }[] = [
  { anion: 'hydroxide', salts: [{ formula: 'LiOH', cation: 'lithium', p: 1, q: 1, densityGPerCm3: polyDensity('LiOH') }, { formula: 'NaOH', cation: 'sodium', p: 1, q: 1, densityGPerCm3: polyDensity('NaOH') }, { formula: 'KOH', cation: 'potassium', p: 1, q: 1, densityGPerCm3: polyDensity('KOH') }] },
  { anion: 'hydrogen-sulfate', salts: [{ formula: 'KHSO4', cation: 'potassium', p: 1, q: 1, densityGPerCm3: 2.32 }] },
  { anion: 'phosphate', salts: [{ formula: 'Na3PO4', cation: 'sodium', p: 3, q: 1, densityGPerCm3: 2.54 }] },
  { anion: 'hydrogen-phosphate', salts: [{ formula: 'Na2HPO4', cation: 'sodium', p: 2, q: 1, densityGPerCm3: 1.7 }] },
  { anion: 'dihydrogen-phosphate', salts: [{ formula: 'KH2PO4', cation: 'potassium', p: 1, q: 1, densityGPerCm3: polyDensity('KH2PO4') }] },
  { anion: 'acetate', salts: [{ formula: 'NaCH3COO', cation: 'sodium', p: 1, q: 1, densityGPerCm3: polyDensity('NaCH3COO') }, { formula: 'KCH3COO', cation: 'potassium', p: 1, q: 1, densityGPerCm3: polyDensity('KCH3COO') }] },
];
export const ANION_VOLUME_SOURCE = `derived here from densities (${SRC.crcDensity}; ${CHECKED.crcDensity}; KHSO4 corrected from 2.245 and Na3PO4 from 2.536 on 2026-12-01) minus cation volumes (${SRC.jenkinsVolumes}${FM})`;

/** Salts with an enthalpy of solution at infinite dilution computed from the NBS ΔfH° (Hess's law). */
export const SOLUTION_REFERENCE_SALTS: readonly { formula: string; cation: string; anion: string; p: number; q: number }[] = [
  ...LATTICE_REFERENCE_SALTS.map((s) => ({ formula: s.formula, cation: s.cation, anion: s.anion, p: s.p, q: s.q })),
  { formula: 'ZnCl2', cation: 'zinc', anion: 'chloride', p: 1, q: 2 },
];
