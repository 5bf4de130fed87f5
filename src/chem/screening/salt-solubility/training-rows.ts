import type * as OpenChemLib from 'openchemlib';
import { GAS_CONSTANT_KJ_PER_MOL_K, STANDARD_TEMPERATURE_K } from '../../constants/physical';
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
import { estimateKsp } from '../ksp-estimate';
import { candidateSolutionEnthalpyKJ, drugThermoIon, type ThermoCounterIon } from '../thermo-link';
import { counterIonFromParentSmiles, type CounterIonDescriptors } from './counter-ion-descriptors';
import type { SaltSolubilityTrainingRow } from './fit-salt-solubility';

/**
 * Turns the published reference set (fixtures/reference/salt-solubility.csv and
 * salt-solubility-drugs.csv, parsed to plain string records by the caller) into training rows:
 * descriptors from the structures (openchemlib, passed in), the measured solubility as log₁₀ mol/L of
 * drug, and today's anchor estimate for the same salt for comparison. Rows that cannot be used (no
 * value convertible to mg/mL as salt, a value recalled rather than read, an unreadable structure) are
 * returned apart with the reason, never silently dropped.
 */
export type CsvRecord = Record<string, string | undefined>;

export interface TrainingSet {
  rows: SaltSolubilityTrainingRow[];
  excluded: { line: number; label: string; reason: string }[];
  drugs: { drugId: string; name: string; kind: 'base' | 'acid'; nSalts: number; source: string }[];
}

type Ocl = typeof OpenChemLib;

/** Temperature the published series were mostly measured at; the anchor is computed there, K. */
const REFERENCE_TEMPERATURE_K = STANDARD_TEMPERATURE_K;

function num(s: string | undefined): number | null {
  if (s === undefined) return null;
  const t = s.trim();
  if (t === '') return null;
  const x = Number(t);
  return Number.isFinite(x) ? x : null;
}

interface DrugInfo {
  id: string;
  name: string;
  kind: 'base' | 'acid';
  molarMassGPerMol: number;
  formula: string;
  rings: { aromatic: number; nonAromatic: number };
  log10IntrinsicM: number;
  logP: number;
  pKa: number;
  source: string;
}

function ringsOf(mol: InstanceType<Ocl['Molecule']>): { aromatic: number; nonAromatic: number } {
  const total = mol.getRingSet().getSize();
  const aromatic = mol.getAromaticRingCount();
  return { aromatic, nonAromatic: Math.max(0, total - aromatic) };
}

function parseDrug(ocl: Ocl, r: CsvRecord): DrugInfo | string {
  const id = (r.drug_id ?? '').trim();
  const kind = (r.drug_kind ?? '').trim();
  if (!id) return 'no drug_id';
  if (kind !== 'base' && kind !== 'acid') return `drug ${id}: kind must be base or acid`;
  let mol: InstanceType<Ocl['Molecule']>;
  try {
    mol = ocl.Molecule.fromSmiles((r.drug_smiles ?? '').trim());
  } catch {
    return `drug ${id}: unreadable SMILES`;
  }
  const mf = mol.getMolecularFormula();
  const s0 = num(r.intrinsic_solubility_mg_per_ml);
  const pKa = num(r.pka);
  if (s0 !== null && s0 <= 0) return `drug ${id}: intrinsic solubility must be > 0`;
  if (pKa === null) return `drug ${id}: no pKa`;
  const props = new ocl.MoleculeProperties(mol);
  const logPIn = num(r.log_p);
  const logP = logPIn ?? props.logP;
  // Without a read S₀ the free form's solubility is openchemlib's own log S estimate (mol/L), labelled
  // so in the report: the drug's series still informs the within-series ranking.
  const log10IntrinsicM = s0 !== null ? Math.log10(s0 / mf.relativeWeight) : props.logS;
  return {
    id,
    name: (r.drug_name ?? id).trim(),
    kind,
    molarMassGPerMol: mf.relativeWeight,
    formula: mf.formula,
    rings: ringsOf(mol),
    log10IntrinsicM,
    logP,
    pKa,
    source:
      s0 !== null ? (r.s0_source ?? '').trim() : 'S₀ not read: openchemlib log S estimate used',
  };
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

export function buildTrainingSet(
  ocl: Ocl,
  saltRecords: readonly CsvRecord[],
  drugRecords: readonly CsvRecord[],
): TrainingSet {
  const drugs = new Map<string, DrugInfo>();
  const excluded: TrainingSet['excluded'] = [];
  drugRecords.forEach((r, i) => {
    const d = parseDrug(ocl, r);
    if (typeof d === 'string')
      excluded.push({ line: i + 2, label: String(r.drug_id ?? ''), reason: d });
    else drugs.set(d.id, d);
  });
  type Pending = {
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
  };
  const pending: Pending[] = [];
  saltRecords.forEach((r, i) => {
    const line = i + 2;
    const drug = drugs.get((r.drug_id ?? '').trim());
    const label = `${r.drug_name ?? r.drug_id} · ${r.counter_ion_name ?? '?'}`;
    if (!drug)
      return excluded.push({
        line,
        label,
        reason: 'drug not in the drugs file (or excluded there)',
      });
    const provenance = `${r.value_read_from ?? ''} ${r.authors ?? ''}`.toLowerCase();
    if (provenance.includes('from memory'))
      return excluded.push({ line, label, reason: 'value from memory, not read from the paper' });
    const mgPerMl = num(r.solubility_mg_per_ml_as_salt);
    if (mgPerMl === null || mgPerMl <= 0)
      return excluded.push({ line, label, reason: 'no solubility convertible to mg/mL as salt' });
    const m = num(r.drug_per_salt) ?? 1;
    const n = num(r.counter_ion_per_salt) ?? 1;
    const charge = num(r.counter_ion_charge);
    if (charge === null || charge === 0)
      return excluded.push({ line, label, reason: 'no counter-ion charge' });
    const parentSmiles = (r.counter_ion_parent_smiles ?? '').trim();
    let desc: CounterIonDescriptors;
    let ionFormula: string;
    let parentRings: { aromatic: number; nonAromatic: number };
    try {
      const ion = counterIonFromParentSmiles(ocl, parentSmiles, charge);
      desc = ion.descriptors;
      ionFormula = ion.ionFormula;
      parentRings = ion.rings;
    } catch (err) {
      return excluded.push({
        line,
        label,
        reason: `counter-ion structure: ${err instanceof Error ? err.message : String(err)}`,
      });
    }
    const drugIonFormula = shiftHydrogens(drug.formula, drug.kind === 'base' ? 1 : -1);
    const hydrate = num(r.hydrate_water) ?? 0;
    const saltMass =
      m * formulaMolarMassGPerMol(drugIonFormula) +
      n * formulaMolarMassGPerMol(ionFormula) +
      hydrate * WATER_MOLAR_MASS_G_PER_MOL;
    const log10DrugM = Math.log10((mgPerMl / saltMass) * m);
    const lib = libraryIonFor(ocl, parentSmiles);
    const counter: ThermoCounterIon = lib
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
    const meltingPointC = num(r.salt_melting_point_c);
    pending.push({
      line,
      drug,
      label: `${drug.name} · ${(r.counter_ion_name ?? '').trim()} (${m}:${n})`,
      m,
      n,
      charge,
      desc,
      log10DrugM,
      counter,
      ionFormula,
      drugIonFormula,
      meltingPointK: meltingPointC === null ? null : celsiusToKelvin(meltingPointC),
      fusionKJ: num(r.salt_fusion_enthalpy_kj_per_mol),
    });
  });
  // Today's anchor needs every candidate's ΔH_sol and their median per drug ion (as the screen does).
  const thermo = pending.map((p) => {
    const drugIon = drugThermoIon({
      formula: p.drugIonFormula,
      charge: p.drug.kind === 'base' ? 1 : -1,
      rings: p.drug.rings,
    });
    return candidateSolutionEnthalpyKJ(drugIon, p.counter, {
      drugPerSalt: p.m,
      counterIonPerSalt: p.n,
      ionCharge: p.charge,
      ionFormula: p.ionFormula,
    }).solutionEnthalpyKJ;
  });
  const refByDrug = new Map<string, number>();
  for (const id of new Set(pending.map((p) => p.drug.id))) {
    const perDrug = pending
      .flatMap((p, i) => (p.drug.id === id && thermo[i] ? [thermo[i]!.value / p.m] : []))
      .sort((a, b) => a - b);
    if (perDrug.length) refByDrug.set(id, perDrug[Math.floor((perDrug.length - 1) / 2)]!);
  }
  const rows: SaltSolubilityTrainingRow[] = pending.map((p, i) => {
    const anchor = estimateKsp({
      log10IntrinsicM: {
        value: p.drug.log10IntrinsicM,
        uncertainty: 0.3,
        method: 'published',
        sources: [],
      },
      drugPerSalt: p.m,
      counterIonPerSalt: p.n,
      solutionEnthalpyKJ: thermo[i] ?? null,
      referenceSolutionEnthalpyPerDrugKJ: refByDrug.get(p.drug.id) ?? null,
      temperatureK: REFERENCE_TEMPERATURE_K,
    });
    const dH = thermo[i];
    const ref = refByDrug.get(p.drug.id);
    const thermoShiftDecades =
      dH && ref !== undefined
        ? -(dH.value - p.m * ref) /
          ((p.m + p.n) * GAS_CONSTANT_KJ_PER_MOL_K * REFERENCE_TEMPERATURE_K * Math.LN10)
        : null;
    return {
      drugId: p.drug.id,
      label: p.label,
      input: {
        drug: { kind: p.drug.kind, log10IntrinsicM: p.drug.log10IntrinsicM, logP: p.drug.logP },
        counterIon: { ...p.desc, charge: p.charge },
        drugPerSalt: p.m,
        counterIonPerSalt: p.n,
        meltingPointK: p.meltingPointK,
        fusionEnthalpyKJPerMol: p.fusionKJ,
        thermoShiftDecades,
      },
      log10DrugM: p.log10DrugM,
      anchorLog10DrugM: anchor.log10SaltLimitedDrugM.value,
    };
  });
  const drugList = [...drugs.values()].map((d) => ({
    drugId: d.id,
    name: d.name,
    kind: d.kind,
    nSalts: rows.filter((r) => r.drugId === d.id).length,
    source: d.source,
  }));
  return { rows, excluded, drugs: drugList };
}
