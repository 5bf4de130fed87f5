import type * as OpenChemLib from 'openchemlib';
import { GAS_CONSTANT_KJ_PER_MOL_K, STANDARD_TEMPERATURE_K } from '../../constants/physical';
import type { Estimate } from '../../result';
import { estimateKsp } from '../ksp-estimate';
import { candidateSolutionEnthalpyKJ, drugThermoIon } from '../thermo-link';
import type { SaltSolubilityTrainingRow } from './fit-salt-solubility';
import { parseDrug, type CsvRecord, type DrugInfo } from './training-drugs';
import { readSaltRecord, type ExcludedRecord, type SaltRecordRow } from './training-salt-record';

/**
 * Turns the published reference set (fixtures/reference/salt-solubility.csv and
 * salt-solubility-drugs.csv, parsed to plain string records by the caller) into training rows:
 * descriptors from the structures (openchemlib, passed in), the measured solubility as log₁₀ mol/L of
 * drug, and today's anchor estimate for the same salt for comparison. Rows that cannot be used (no
 * value convertible to mg/mL as salt, a value recalled rather than read, an unreadable structure) are
 * returned apart with the reason, never silently dropped.
 */
export type { CsvRecord } from './training-drugs';

export interface TrainingSet {
  rows: SaltSolubilityTrainingRow[];
  excluded: ExcludedRecord[];
  drugs: { drugId: string; name: string; kind: 'base' | 'acid'; nSalts: number; source: string }[];
}

type Ocl = typeof OpenChemLib;

/** Temperature the published series were mostly measured at; the anchor is computed there, K. */
const REFERENCE_TEMPERATURE_K = STANDARD_TEMPERATURE_K;

/** The drugs file read: each drug by id, and the records left out with their reason. */
function readDrugs(
  ocl: Ocl,
  drugRecords: readonly CsvRecord[],
  excluded: ExcludedRecord[],
): Map<string, DrugInfo> {
  const drugs = new Map<string, DrugInfo>();
  drugRecords.forEach((r, i) => {
    const d = parseDrug(ocl, r);
    if (typeof d === 'string')
      excluded.push({ line: i + 2, label: String(r.drug_id ?? ''), reason: d });
    else drugs.set(d.id, d);
  });
  return drugs;
}

/** Each salt's ΔH_sol from the thermochemistry engine, as the screen computes it (null where it cannot). */
function solutionEnthalpies(rows: readonly SaltRecordRow[]): (Estimate | null)[] {
  return rows.map((p) => {
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
}

/** The median ΔH_sol per drug ion over each drug's salts (lower median), the anchor's reference. */
function medianPerDrug(
  rows: readonly SaltRecordRow[],
  thermo: readonly (Estimate | null)[],
): Map<string, number> {
  const refByDrug = new Map<string, number>();
  for (const id of new Set(rows.map((p) => p.drug.id))) {
    const perDrug = rows
      .flatMap((p, i) => (p.drug.id === id && thermo[i] ? [thermo[i]!.value / p.m] : []))
      .sort((a, b) => a - b);
    if (perDrug.length) refByDrug.set(id, perDrug[Math.floor((perDrug.length - 1) / 2)]!);
  }
  return refByDrug;
}

/** One training row: the model's inputs, the measured value and today's anchor estimate beside it. */
function trainingRow(
  p: SaltRecordRow,
  dH: Estimate | null,
  ref: number | undefined,
): SaltSolubilityTrainingRow {
  const anchor = estimateKsp({
    log10IntrinsicM: {
      value: p.drug.log10IntrinsicM,
      uncertainty: 0.3,
      method: 'published',
      sources: [],
    },
    drugPerSalt: p.m,
    counterIonPerSalt: p.n,
    solutionEnthalpyKJ: dH ?? null,
    referenceSolutionEnthalpyPerDrugKJ: ref ?? null,
    temperatureK: REFERENCE_TEMPERATURE_K,
  });
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
}

/**
 * The training set in named steps: the drugs read, each salt record read (or excluded with its
 * reason), each salt's ΔH_sol and the median per drug ion (the anchor needs both, as the screen
 * does), then one row per salt and a summary per drug.
 */
export function buildTrainingSet(
  ocl: Ocl,
  saltRecords: readonly CsvRecord[],
  drugRecords: readonly CsvRecord[],
): TrainingSet {
  const excluded: ExcludedRecord[] = [];
  const drugs = readDrugs(ocl, drugRecords, excluded);
  const read: SaltRecordRow[] = [];
  saltRecords.forEach((r, i) => {
    const row = readSaltRecord(ocl, r, i + 2, drugs);
    if ('reason' in row) excluded.push(row);
    else read.push(row);
  });
  const thermo = solutionEnthalpies(read);
  const refByDrug = medianPerDrug(read, thermo);
  const rows = read.map((p, i) => trainingRow(p, thermo[i] ?? null, refByDrug.get(p.drug.id)));
  const drugList = [...drugs.values()].map((d) => ({
    drugId: d.id,
    name: d.name,
    kind: d.kind,
    nSalts: rows.filter((r) => r.drugId === d.id).length,
    source: d.source,
  }));
  return { rows, excluded, drugs: drugList };
}
