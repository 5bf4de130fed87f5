import type { IonShape } from '../thermo/thermo.types';
import { CHECKED, SRC } from './thermo-sources';

/** A number read (or recalled) from a published table, with its citation. */
export interface SourcedValue {
  value: number;
  source: string;
  /** True when recalled rather than read from the table at the time of writing (see provenance.md). */
  fromMemory: boolean;
}

/** A bundled ion's data row. Units: radii Å, volumes nm³, enthalpies kJ/mol. */
export interface ThermoIonRecord {
  id: string;
  label: string;
  /** Symbols a user may type: `Na+`, `SO4 2-`, `SO4--`… (matched without spaces). */
  symbols: string[];
  charge: number;
  shape: IonShape;
  /** Formula of the ion without charge, Hill-free, for molar mass. */
  formula: string;
  shannonRadiusA?: SourcedValue;
  goldschmidtRadiusA?: SourcedValue;
  thermochemicalRadiusA?: SourcedValue;
  volumeNm3?: SourcedValue;
  hydrationEnthalpyKJ?: SourcedValue;
  /** Born exponent (Pauling), monatomic ions. */
  bornExponent?: number;
}

const mem = (value: number, source: string): SourcedValue => ({
  value,
  source: `${source} — from memory`,
  fromMemory: true,
});

/** A value entered from memory and since compared with a published copy of its table (see CHECKED). */
const chk = (value: number, source: string, check: string): SourcedValue => ({
  value,
  source: `${source}; ${check}`,
  fromMemory: false,
});

/**
 * Bundled ions. Every value cites its table; all were entered from memory of those tables (no copy of
 * the tables was available offline when this file was written) and are marked so, except the Shannon CN VI
 * radii, which were compared on 2026-12-01 with a published copy of Shannon's table (all 16 agree to the
 * 0.01 Å that copy gives; Al³⁺ 0.535 Å appears there as 54 pm) and cite that copy (`chk`). The Goldschmidt
 * and thermochemical radii, Jenkins volumes and Marcus hydration enthalpies could not be found in a readable
 * copy and stay "from memory". The tests compare the
 * data with independent published quantities (lattice and solution enthalpies from the NBS tables), which
 * catches gross slips but not a 1 % copying error — check a value against its source before
 * publishing a number that depends on it.
 *
 * Hydration enthalpies are absolute on Marcus's scale; the proton's conventional value behind the scale is
 * ΔH_hyd(H⁺) = −1103 kJ/mol (Marcus 1987, consistent with his Na⁺ value and the NBS ΔfH° of Na⁺(g) and
 * Na⁺(aq)). Sums over a neutral salt do not depend on that choice.
 *
 * Volumes of polyatomic anions that are marked "derived" were obtained here from published densities of
 * their alkali salts minus Jenkins's cation volumes (see `thermo-reference.ts`, VOLUME_CALIBRATION_SALTS)
 * where the published Jenkins value was not recalled with confidence.
 */
export const THERMO_IONS: readonly ThermoIonRecord[] = [
  // ---- alkali metal cations ----
  {
    id: 'lithium', label: 'Li⁺', symbols: ['Li+', 'Li'], charge: 1, shape: 'monatomic', formula: 'Li',
    shannonRadiusA: chk(0.76, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(0.78, SRC.goldschmidt),
    volumeNm3: mem(0.00199, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-531, SRC.marcusHydration), bornExponent: 5,
  },
  {
    id: 'sodium', label: 'Na⁺', symbols: ['Na+', 'Na'], charge: 1, shape: 'monatomic', formula: 'Na',
    shannonRadiusA: chk(1.02, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(0.98, SRC.goldschmidt),
    volumeNm3: mem(0.00394, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-416, SRC.marcusHydration), bornExponent: 7,
  },
  {
    id: 'potassium', label: 'K⁺', symbols: ['K+', 'K'], charge: 1, shape: 'monatomic', formula: 'K',
    shannonRadiusA: chk(1.38, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.33, SRC.goldschmidt),
    volumeNm3: mem(0.00986, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-334, SRC.marcusHydration), bornExponent: 9,
  },
  {
    id: 'rubidium', label: 'Rb⁺', symbols: ['Rb+', 'Rb'], charge: 1, shape: 'monatomic', formula: 'Rb',
    shannonRadiusA: chk(1.52, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.49, SRC.goldschmidt),
    volumeNm3: mem(0.01386, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-308, SRC.marcusHydration), bornExponent: 10,
  },
  {
    id: 'caesium', label: 'Cs⁺', symbols: ['Cs+', 'Cs'], charge: 1, shape: 'monatomic', formula: 'Cs',
    shannonRadiusA: chk(1.67, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.65, SRC.goldschmidt),
    volumeNm3: mem(0.01882, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-283, SRC.marcusHydration), bornExponent: 12,
  },
  // ---- alkaline-earth and other metal cations ----
  {
    id: 'magnesium', label: 'Mg²⁺', symbols: ['Mg2+', 'Mg++', 'Mg'], charge: 2, shape: 'monatomic', formula: 'Mg',
    shannonRadiusA: chk(0.72, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(0.78, SRC.goldschmidt),
    volumeNm3: mem(0.00199, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-1949, SRC.marcusHydration), bornExponent: 7,
  },
  {
    id: 'calcium', label: 'Ca²⁺', symbols: ['Ca2+', 'Ca++', 'Ca'], charge: 2, shape: 'monatomic', formula: 'Ca',
    shannonRadiusA: chk(1.0, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.06, SRC.goldschmidt),
    volumeNm3: mem(0.00499, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-1602, SRC.marcusHydration), bornExponent: 9,
  },
  {
    id: 'strontium', label: 'Sr²⁺', symbols: ['Sr2+', 'Sr++', 'Sr'], charge: 2, shape: 'monatomic', formula: 'Sr',
    shannonRadiusA: chk(1.18, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.27, SRC.goldschmidt),
    volumeNm3: mem(0.00858, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-1470, SRC.marcusHydration), bornExponent: 10,
  },
  {
    id: 'barium', label: 'Ba²⁺', symbols: ['Ba2+', 'Ba++', 'Ba'], charge: 2, shape: 'monatomic', formula: 'Ba',
    shannonRadiusA: chk(1.35, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.43, SRC.goldschmidt),
    volumeNm3: mem(0.01225, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-1332, SRC.marcusHydration), bornExponent: 12,
  },
  {
    id: 'zinc', label: 'Zn²⁺', symbols: ['Zn2+', 'Zn++', 'Zn'], charge: 2, shape: 'monatomic', formula: 'Zn',
    shannonRadiusA: chk(0.74, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(0.83, SRC.goldschmidt),
    hydrationEnthalpyKJ: mem(-2070, SRC.marcusHydration), bornExponent: 9,
  },
  {
    id: 'aluminium', label: 'Al³⁺', symbols: ['Al3+', 'Al+++', 'Al'], charge: 3, shape: 'monatomic', formula: 'Al',
    shannonRadiusA: chk(0.535, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(0.57, SRC.goldschmidt),
    hydrationEnthalpyKJ: mem(-4715, SRC.marcusHydration), bornExponent: 7,
  },
  // ---- polyatomic cations ----
  {
    id: 'ammonium', label: 'NH₄⁺', symbols: ['NH4+', 'NH4'], charge: 1, shape: 'nonlinear', formula: 'NH4',
    thermochemicalRadiusA: { value: 1.36, source: `${SRC.thermoRadii} (0.136 nm; quoted in the CRC section's worked example)`, fromMemory: false },
    volumeNm3: mem(0.021, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-329, SRC.marcusHydration),
  },
  {
    id: 'tetramethylammonium', label: 'N(CH₃)₄⁺', symbols: ['NMe4+', 'N(CH3)4+', 'Me4N+'], charge: 1, shape: 'nonlinear', formula: 'C4H12N',
    thermochemicalRadiusA: mem(2.34, SRC.thermoRadii),
    volumeNm3: mem(0.113, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-218, SRC.marcus1994),
  },
  {
    id: 'tetraethylammonium', label: 'N(C₂H₅)₄⁺', symbols: ['NEt4+', 'N(C2H5)4+', 'Et4N+'], charge: 1, shape: 'nonlinear', formula: 'C8H20N',
    hydrationEnthalpyKJ: mem(-190, SRC.marcus1994),
  },
  // ---- halides and oxide ----
  {
    id: 'fluoride', label: 'F⁻', symbols: ['F-', 'F'], charge: -1, shape: 'monatomic', formula: 'F',
    shannonRadiusA: chk(1.33, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.33, SRC.goldschmidt),
    volumeNm3: mem(0.025, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-510, SRC.marcusHydration), bornExponent: 7,
  },
  {
    id: 'chloride', label: 'Cl⁻', symbols: ['Cl-', 'Cl'], charge: -1, shape: 'monatomic', formula: 'Cl',
    shannonRadiusA: chk(1.81, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.81, SRC.goldschmidt),
    volumeNm3: mem(0.047, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-367, SRC.marcusHydration), bornExponent: 9,
  },
  {
    id: 'bromide', label: 'Br⁻', symbols: ['Br-', 'Br'], charge: -1, shape: 'monatomic', formula: 'Br',
    shannonRadiusA: chk(1.96, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.96, SRC.goldschmidt),
    volumeNm3: mem(0.056, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-336, SRC.marcusHydration), bornExponent: 10,
  },
  {
    id: 'iodide', label: 'I⁻', symbols: ['I-', 'I'], charge: -1, shape: 'monatomic', formula: 'I',
    shannonRadiusA: chk(2.2, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(2.2, SRC.goldschmidt),
    volumeNm3: mem(0.072, SRC.jenkinsVolumes), hydrationEnthalpyKJ: mem(-291, SRC.marcusHydration), bornExponent: 12,
  },
  {
    id: 'oxide', label: 'O²⁻', symbols: ['O2-', 'O--', 'O'], charge: -2, shape: 'monatomic', formula: 'O',
    shannonRadiusA: chk(1.4, SRC.shannon1976, CHECKED.shannon), goldschmidtRadiusA: mem(1.32, SRC.goldschmidt),
    bornExponent: 7,
  },
  // ---- polyatomic anions ----
  {
    id: 'hydroxide', label: 'OH⁻', symbols: ['OH-', 'OH'], charge: -1, shape: 'linear', formula: 'OH',
    thermochemicalRadiusA: mem(1.33, SRC.thermoRadii), hydrationEnthalpyKJ: mem(-520, SRC.marcusHydration),
  },
  {
    id: 'nitrate', label: 'NO₃⁻', symbols: ['NO3-', 'NO3'], charge: -1, shape: 'nonlinear', formula: 'NO3',
    thermochemicalRadiusA: mem(2.0, SRC.thermoRadii), volumeNm3: mem(0.064, SRC.jenkinsVolumes),
    hydrationEnthalpyKJ: mem(-312, SRC.marcusHydration),
  },
  {
    id: 'sulfate', label: 'SO₄²⁻', symbols: ['SO42-', 'SO4--', 'SO4'], charge: -2, shape: 'nonlinear', formula: 'SO4',
    thermochemicalRadiusA: mem(2.58, SRC.thermoRadii), volumeNm3: mem(0.091, SRC.jenkinsVolumes),
    hydrationEnthalpyKJ: mem(-1035, SRC.marcusHydration),
  },
  {
    id: 'hydrogen-sulfate', label: 'HSO₄⁻', symbols: ['HSO4-', 'HSO4'], charge: -1, shape: 'nonlinear', formula: 'HSO4',
    thermochemicalRadiusA: mem(2.21, SRC.thermoRadii),
  },
  {
    id: 'carbonate', label: 'CO₃²⁻', symbols: ['CO32-', 'CO3--', 'CO3'], charge: -2, shape: 'nonlinear', formula: 'CO3',
    thermochemicalRadiusA: mem(1.78, SRC.thermoRadii), volumeNm3: mem(0.061, SRC.jenkinsVolumes),
    hydrationEnthalpyKJ: mem(-1397, SRC.marcusHydration),
  },
  {
    id: 'perchlorate', label: 'ClO₄⁻', symbols: ['ClO4-', 'ClO4'], charge: -1, shape: 'nonlinear', formula: 'ClO4',
    thermochemicalRadiusA: mem(2.4, SRC.thermoRadii), volumeNm3: mem(0.082, SRC.jenkinsVolumes),
    hydrationEnthalpyKJ: mem(-246, SRC.marcusHydration),
  },
  {
    id: 'phosphate', label: 'PO₄³⁻', symbols: ['PO43-', 'PO4---', 'PO4'], charge: -3, shape: 'nonlinear', formula: 'PO4',
    thermochemicalRadiusA: mem(2.38, SRC.thermoRadii), hydrationEnthalpyKJ: mem(-2879, SRC.marcusHydration),
  },
  {
    id: 'hydrogen-phosphate', label: 'HPO₄²⁻', symbols: ['HPO42-', 'HPO4--', 'HPO4'], charge: -2, shape: 'nonlinear', formula: 'HPO4',
  },
  {
    id: 'dihydrogen-phosphate', label: 'H₂PO₄⁻', symbols: ['H2PO4-', 'H2PO4'], charge: -1, shape: 'nonlinear', formula: 'H2PO4',
    thermochemicalRadiusA: mem(2.13, SRC.thermoRadii), hydrationEnthalpyKJ: mem(-522, SRC.marcusHydration),
  },
  {
    id: 'acetate', label: 'CH₃COO⁻', symbols: ['CH3COO-', 'AcO-', 'OAc-', 'C2H3O2-'], charge: -1, shape: 'nonlinear', formula: 'C2H3O2',
    thermochemicalRadiusA: mem(1.62, SRC.thermoRadii), hydrationEnthalpyKJ: mem(-425, SRC.marcusHydration),
  },
];
