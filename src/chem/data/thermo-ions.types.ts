import type { IonShape } from '../thermo/thermo.types';

/** Shapes of the bundled-ion table in thermo-ions.data.ts. */

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
