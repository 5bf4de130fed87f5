/**
 * The bundled solvent table of the salt-screen plan: the solvents salt screens commonly use, with their
 * boiling point, a polarity measure, water miscibility, density and their ICH Q3C(R8) class and limit.
 * Every value names its source in the row; "from memory" marks values recalled rather than read in this
 * session. The five Class 1 solvents are kept only so that a plan naming one can be refused with the
 * reason (ICH Q3C: "should not be employed").
 *
 * Polarity measure: the static relative permittivity (dielectric constant) ε_r of the liquid at the
 * temperature given in the row (CRC Handbook, "Permittivity (Dielectric Constant) of Liquids").
 *
 * ICH Q3C limits: Class 1 — concentration limit in ppm (Table 1); Class 2 — PDE in mg/day and the
 * Option 1 concentration limit in ppm = 1000 × PDE / 10 g daily dose (Table 2); Class 3 — 50 mg/day,
 * 5000 ppm under Option 1 (section 3.3 and Table 3).
 */

/** ICH Q3C(R8), Table 1, concentration limits of the Class 1 solvents (the five values read 2026-12-03
 * in a copy of the guideline's table). */
export const SRC_Q3C_TABLE1 =
  'ICH Q3C(R8) Impurities: Guideline for Residual Solvents (Step 4, 22 April 2021), Table 1 (Class 1 solvents, concentration limit in ppm)';

/** ICH Q3C(R8), Table 2 — values recalled (from memory). */
export const SRC_Q3C_TABLE2 =
  'ICH Q3C(R8) Impurities: Guideline for Residual Solvents (Step 4, 22 April 2021), Table 2 (Class 2 solvents, PDE in mg/day and concentration limit in ppm) — from memory';

/** ICH Q3C(R8), Table 3 and section 3.3: Class 3, 50 mg/day or 5000 ppm (Option 1) — from memory. */
export const SRC_Q3C_TABLE3 =
  'ICH Q3C(R8) Impurities: Guideline for Residual Solvents (Step 4, 22 April 2021), Table 3 (Class 3 solvents; 50 mg/day, 5000 ppm under Option 1) — from memory';

/** The R8 revision placed 2-methyltetrahydrofuran in Class 3 with a PDE of 50 mg/day (checked 2026-12-03
 * against the ICH Step 2b/Step 4 announcements of Q3C(R8)). */
export const SRC_Q3C_R8_METHF =
  'ICH Q3C(R8) (2021), PDE for 2-methyltetrahydrofuran: 50 mg/day, Class 3';

/** Physical constants of the liquids: CRC Handbook of Chemistry and Physics — from memory. */
export const SRC_CRC_SOLVENT =
  'CRC Handbook of Chemistry and Physics (97th ed., 2016), "Physical Constants of Organic Compounds" and "Permittivity (Dielectric Constant) of Liquids" — from memory';

/** Mutual solubility with water, qualitative: from memory of the CRC "Aqueous Solubility of Organic Compounds" table. */
export const SRC_CRC_MISCIBILITY =
  'CRC Handbook of Chemistry and Physics (97th ed., 2016), "Aqueous Solubility of Organic Compounds" — from memory';

/** Water is not a residual solvent in ICH Q3C: it has no class. */
export const SRC_WATER_NO_CLASS = 'ICH Q3C(R8): water is not listed (not a residual solvent)';

export type IchQ3cClass = 1 | 2 | 3;
export type WaterMiscibility = 'miscible' | 'partial' | 'immiscible';

export interface Solvent {
  /** Lowercase kebab-case id used in plans ('2-propanol', 'ethyl-acetate'). */
  id: string;
  name: string;
  boilingPointC: number;
  /** Static relative permittivity ε_r at {@link dielectricTemperatureC}. */
  dielectricConstant: number;
  dielectricTemperatureC: number;
  waterMiscibility: WaterMiscibility;
  /** A few words on the mutual solubility when it is partial (e.g. "about 8 g per 100 mL water at 20 °C"). */
  miscibilityNote: string;
  densityGPerMl: number;
  densityTemperatureC: number;
  /** ICH Q3C(R8) class, or null when the guideline does not list the solvent (water). */
  ichQ3cClass: IchQ3cClass | null;
  /** Permitted daily exposure, mg/day (Class 2 and 3), null for Class 1 and water. */
  ichPdeMgPerDay: number | null;
  /** Option 1 concentration limit, ppm, null for water. */
  ichConcentrationLimitPpm: number | null;
  sources: { physical: string; miscibility: string; ich: string };
}

type Row = [
  id: string,
  name: string,
  bpC: number,
  epsilon: number,
  epsilonT: number,
  miscibility: WaterMiscibility,
  miscibilityNote: string,
  density: number,
  densityT: number,
  cls: IchQ3cClass | null,
  pde: number | null,
  ppm: number | null,
];

// id, name, bp °C, ε_r, at °C, water miscibility, note, density g/mL, at °C, class, PDE mg/day, limit ppm
// prettier-ignore
const ROWS: Row[] = [
  ['water', 'Water', 100.0, 78.4, 25, 'miscible', '', 0.997, 25, null, null, null],
  ['methanol', 'Methanol', 64.6, 32.7, 25, 'miscible', '', 0.791, 20, 2, 30.0, 3000],
  ['ethanol', 'Ethanol', 78.3, 24.6, 25, 'miscible', '', 0.789, 20, 3, 50, 5000],
  ['2-propanol', '2-Propanol (isopropanol)', 82.3, 19.9, 20, 'miscible', '', 0.785, 20, 3, 50, 5000],
  ['1-propanol', '1-Propanol', 97.2, 20.5, 20, 'miscible', '', 0.803, 20, 3, 50, 5000],
  ['acetone', 'Acetone', 56.1, 20.7, 25, 'miscible', '', 0.79, 20, 3, 50, 5000],
  ['2-butanone', '2-Butanone (methyl ethyl ketone)', 79.6, 18.5, 20, 'partial', 'about 25 g per 100 mL water at 20 °C', 0.805, 20, 3, 50, 5000],
  ['ethyl-acetate', 'Ethyl acetate', 77.1, 6.0, 25, 'partial', 'about 8 g per 100 mL water at 20 °C', 0.9, 20, 3, 50, 5000],
  ['isopropyl-acetate', 'Isopropyl acetate', 88.6, 6.3, 20, 'partial', 'about 3 g per 100 mL water at 20 °C', 0.872, 20, 3, 50, 5000],
  ['acetonitrile', 'Acetonitrile', 81.6, 36.6, 20, 'miscible', '', 0.786, 20, 2, 4.1, 410],
  ['tetrahydrofuran', 'Tetrahydrofuran (THF)', 66.0, 7.5, 22, 'miscible', '', 0.889, 20, 2, 7.2, 720],
  ['2-methyltetrahydrofuran', '2-Methyltetrahydrofuran (2-MeTHF)', 80.2, 7.0, 25, 'partial', 'about 14 g per 100 mL water at 20 °C, less when warm', 0.854, 20, 3, 50, 5000],
  ['tert-butyl-methyl-ether', 'tert-Butyl methyl ether (MTBE)', 55.2, 4.5, 20, 'partial', 'about 5 g per 100 mL water at 20 °C', 0.74, 20, 3, 50, 5000],
  ['heptane', 'Heptane', 98.4, 1.92, 20, 'immiscible', '', 0.684, 20, 3, 50, 5000],
  ['toluene', 'Toluene', 110.6, 2.38, 23, 'immiscible', '', 0.867, 20, 2, 8.9, 890],
  ['dichloromethane', 'Dichloromethane', 39.6, 8.93, 25, 'immiscible', 'about 1.3 g per 100 mL water at 20 °C', 1.326, 20, 2, 6.0, 600],
  ['1-4-dioxane', '1,4-Dioxane', 101.3, 2.22, 25, 'miscible', '', 1.033, 20, 2, 3.8, 380],
  ['dimethyl-sulfoxide', 'Dimethyl sulfoxide (DMSO)', 189.0, 46.7, 20, 'miscible', '', 1.1, 20, 3, 50, 5000],
  // Class 1: kept for refusal only (ICH Q3C: not to be employed unless strongly justified).
  ['benzene', 'Benzene', 80.1, 2.28, 20, 'immiscible', '', 0.877, 20, 1, null, 2],
  ['carbon-tetrachloride', 'Carbon tetrachloride', 76.8, 2.24, 20, 'immiscible', '', 1.594, 20, 1, null, 4],
  ['1-2-dichloroethane', '1,2-Dichloroethane', 83.5, 10.4, 20, 'immiscible', 'about 0.9 g per 100 mL water at 20 °C', 1.253, 20, 1, null, 5],
  ['1-1-dichloroethene', '1,1-Dichloroethene', 31.6, 4.6, 20, 'immiscible', '', 1.213, 20, 1, null, 8],
  ['1-1-1-trichloroethane', '1,1,1-Trichloroethane', 74.1, 7.2, 20, 'immiscible', '', 1.339, 20, 1, null, 1500],
];

function ichSource(id: string, cls: IchQ3cClass | null): string {
  if (cls === null) return SRC_WATER_NO_CLASS;
  if (id === '2-methyltetrahydrofuran') return SRC_Q3C_R8_METHF;
  return cls === 1 ? SRC_Q3C_TABLE1 : cls === 2 ? SRC_Q3C_TABLE2 : SRC_Q3C_TABLE3;
}

/** Every bundled solvent, in the order a plan form lists them (Class 1 last). */
export const SOLVENTS: readonly Solvent[] = Object.freeze(
  ROWS.map(([id, name, bp, eps, epsT, mis, note, rho, rhoT, cls, pde, ppm]) => ({
    id,
    name,
    boilingPointC: bp,
    dielectricConstant: eps,
    dielectricTemperatureC: epsT,
    waterMiscibility: mis,
    miscibilityNote: note,
    densityGPerMl: rho,
    densityTemperatureC: rhoT,
    ichQ3cClass: cls,
    ichPdeMgPerDay: pde,
    ichConcentrationLimitPpm: ppm,
    sources: {
      physical: SRC_CRC_SOLVENT,
      miscibility: SRC_CRC_MISCIBILITY,
      ich: ichSource(id, cls),
    },
  })),
);

const byId = new Map(SOLVENTS.map((s) => [s.id, s]));

/** A bundled solvent by id, or undefined. */
export function getSolvent(id: string): Solvent | undefined {
  return byId.get(id);
}
