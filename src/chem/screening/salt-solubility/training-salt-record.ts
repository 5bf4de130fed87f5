import type * as OpenChemLib from 'openchemlib';
import { WATER_MOLAR_MASS_G_PER_MOL } from '../../constants/water';
import { celsiusToKelvin } from '../../units/temperature';
import {
  formulaMolarMassGPerMol,
  hillFormula,
  parseFormula,
  withHydrogens,
} from '../../compound/formula';
import { COUNTER_IONS } from '../../library';
import type { CounterIon } from '../../library';
import type { ThermoCounterIon } from '../thermo-link';
import { counterIonFromParentSmiles, type CounterIonDescriptors } from './counter-ion-descriptors';
import { num, type CsvRecord, type DrugInfo } from './training-drugs';

/**
 * One row of the published salt-solubility set read for the fit (training-rows.ts): the checks that
 * may exclude it (with the reason), its counter-ion's descriptors from the parent's structure, the
 * measured solubility as log₁₀ mol/L of drug, and the counter-ion as the thermochemistry takes it.
 */

type Ocl = typeof OpenChemLib;

/** A salt record read and checked, before the thermochemistry gives its anchor. */
export interface SaltRecordRow {
  line: number;
  drug: DrugInfo;
  label: string;
  m: number;
  n: number;
  charge: number;
  desc: CounterIonDescriptors;
  log10DrugM: number;
  counter: ThermoCounterIon;
  ionFormula: string;
  drugIonFormula: string;
  meltingPointK: number | null;
  fusionKJ: number | null;
}

/** Why a record is left out, said to the report. */
export interface ExcludedRecord {
  line: number;
  label: string;
  reason: string;
}

/** Hill formula after adding (or removing, with a negative count) hydrogens. */
function shiftHydrogens(formula: string, dH: number): string {
  return hillFormula(withHydrogens(parseFormula(formula).elements, dH));
}

/** The library ion whose parent is this structure (same openchemlib ID code), if any. */
function libraryIonFor(ocl: Ocl, parentSmiles: string): CounterIon | undefined {
  let code: string;
  try {
    code = ocl.Molecule.fromSmiles(parentSmiles).getIDCode();
  } catch {
    return undefined;
  }
  return COUNTER_IONS.find((ion) => {
    try {
      return ocl.Molecule.fromSmiles(ion.parent.smiles).getIDCode() === code;
    } catch {
      return false;
    }
  });
}

/** Why a record cannot be used before its structures are read (none: null). */
function recordProblem(r: CsvRecord, drug: DrugInfo | undefined): string | null {
  if (!drug) return 'drug not in the drugs file (or excluded there)';
  const provenance = `${r.value_read_from ?? ''} ${r.authors ?? ''}`.toLowerCase();
  if (provenance.includes('from memory')) return 'value from memory, not read from the paper';
  const mgPerMl = num(r.solubility_mg_per_ml_as_salt);
  if (mgPerMl === null || mgPerMl <= 0) return 'no solubility convertible to mg/mL as salt';
  const charge = num(r.counter_ion_charge);
  if (charge === null || charge === 0) return 'no counter-ion charge';
  return null;
}

/** The counter-ion as the thermochemistry takes it: the library's ion if its parent is the same, else a reference ion. */
function thermoCounterIon(
  ocl: Ocl,
  r: CsvRecord,
  parentSmiles: string,
  ionFormula: string,
  parentRings: { aromatic: number; nonAromatic: number },
): ThermoCounterIon {
  const lib = libraryIonFor(ocl, parentSmiles);
  return lib
    ? {
        id: lib.id,
        ...(lib.thermoId ? { thermoId: lib.thermoId } : {}),
        formula: lib.formula,
        rings: lib.rings,
      }
    : {
        id: `ref-${(r.counter_ion_name ?? 'ion')
          .trim()
          .toLowerCase()
          .replace(/[^a-z0-9]+/g, '-')}`,
        formula: ionFormula,
        rings: parentRings,
      };
}

/** log₁₀ mol/L of drug from mg/mL as salt: the salt's molar mass from its ions and water of hydration. */
function log10DrugMolar(
  mgPerMl: number,
  m: number,
  n: number,
  drugIonFormula: string,
  ionFormula: string,
  hydrate: number,
): number {
  const saltMass =
    m * formulaMolarMassGPerMol(drugIonFormula) +
    n * formulaMolarMassGPerMol(ionFormula) +
    hydrate * WATER_MOLAR_MASS_G_PER_MOL;
  return Math.log10((mgPerMl / saltMass) * m);
}

/** Read one salt record (line numbers from 2, after the header): the row, or why it is excluded. */
export function readSaltRecord(
  ocl: Ocl,
  r: CsvRecord,
  line: number,
  drugs: ReadonlyMap<string, DrugInfo>,
): SaltRecordRow | ExcludedRecord {
  const drug = drugs.get((r.drug_id ?? '').trim());
  const label = `${r.drug_name ?? r.drug_id} · ${r.counter_ion_name ?? '?'}`;
  const problem = recordProblem(r, drug);
  if (problem !== null || !drug) return { line, label, reason: problem ?? '' };
  const m = num(r.drug_per_salt) ?? 1;
  const n = num(r.counter_ion_per_salt) ?? 1;
  const charge = num(r.counter_ion_charge)!;
  const parentSmiles = (r.counter_ion_parent_smiles ?? '').trim();
  let ion: ReturnType<typeof counterIonFromParentSmiles>;
  try {
    ion = counterIonFromParentSmiles(ocl, parentSmiles, charge);
  } catch (err) {
    const why = err instanceof Error ? err.message : String(err);
    return { line, label, reason: `counter-ion structure: ${why}` };
  }
  const drugIonFormula = shiftHydrogens(drug.formula, drug.kind === 'base' ? 1 : -1);
  const mgPerMl = num(r.solubility_mg_per_ml_as_salt)!;
  const hydrate = num(r.hydrate_water) ?? 0;
  const meltingPointC = num(r.salt_melting_point_c);
  return {
    line,
    drug,
    label: `${drug.name} · ${(r.counter_ion_name ?? '').trim()} (${m}:${n})`,
    m,
    n,
    charge,
    desc: ion.descriptors,
    log10DrugM: log10DrugMolar(mgPerMl, m, n, drugIonFormula, ion.ionFormula, hydrate),
    counter: thermoCounterIon(ocl, r, parentSmiles, ion.ionFormula, ion.rings),
    ionFormula: ion.ionFormula,
    drugIonFormula,
    meltingPointK: meltingPointC === null ? null : celsiusToKelvin(meltingPointC),
    fusionKJ: num(r.salt_fusion_enthalpy_kj_per_mol),
  };
}
