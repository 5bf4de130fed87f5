/** Shapes of the reference tables in thermo-reference.data.ts (units: kJ/mol, g/cm³, Å). */

/** State of a species in the formation-enthalpy tables: crystal, aqueous ion, gaseous atom. */
export type FormationState = 'cr' | 'aq' | 'g';

/** How a reference salt's formula-unit volume is known. */
export type VolumeSource =
  | {
      kind: 'cell';
      structure: 'rock-salt' | 'caesium-chloride' | 'fluorite';
      edgeA: number;
      source: string;
    }
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

/** The alkali salts whose densities give one polyatomic anion's volume. */
export interface AnionVolumeSalts {
  anion: string;
  salts: { formula: string; cation: string; p: number; q: number; densityGPerCm3: number }[];
}

/** A salt with an enthalpy of solution computed from the NBS ΔfH° (Hess's law). */
export interface SolutionReferenceSalt {
  formula: string;
  cation: string;
  anion: string;
  p: number;
  q: number;
}
