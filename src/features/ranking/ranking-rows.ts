import {
  saltSolubilityBasisWords,
  roundLogNormal,
  shownRowNumbers,
  SALT_WATER_ORIGIN_LABELS,
  SOLUBILITY_DRIVER_WORDS,
  type RankedRow,
  type ScreenRow,
} from '@/chem';
import { uncertaintiesOf } from '@/screening-data/uncertainty';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import type { RankingSortKey } from '@/stores/ranking-view-store';

/** A number as the ranking shows it: value, 1σ (or a ±1σ range), and whether a measurement backs it. */
export interface ShownNumber {
  value: number;
  /** Symmetric 1σ in the same unit, when additive. */
  sigma?: number;
  /** A ±1σ range for quantities whose error is multiplicative (dose numbers). */
  range?: [number, number];
  origin: 'estimated' | 'measured';
  /** Why the origin is what it is (e.g. "K_sp from the measured solubility"). */
  basis: string;
}

export interface DisplayRow {
  id: string;
  label: string;
  ionName: string;
  rank: number | null;
  score: number | null;
  contributions: RankedRow['contributions'];
  row: ScreenRow;
  deltaPka: number | null;
  /** Decimal places of ΔpKa: those of the drug's pKa 1σ (roundToUncertainty), as the sheet and CLI print it. */
  deltaPkaDecimals?: number;
  /** The salt's own solubility in water, mg/mL as salt, with its ±1σ range and where it comes from. */
  saltWater: SaltWaterShown | null;
  phMax: ShownNumber | null;
  worstDose: (ShownNumber & { pH: number; solid: string }) | null;
  gastricDose: (ShownNumber & { solid: string }) | null;
  /** ΔH_sol per drug ion, kJ/mol; `notInformative` says why a value is shown as words instead. */
  solutionEnthalpy: (ShownNumber & { notInformative: string | null }) | null;
  activeFraction: number;
  saltMassPerDoseMg: number | null;
  acceptabilityClass: 1 | 2 | 3 | null;
}

export interface SaltWaterShown extends ShownNumber {
  freeFormMgPerMl: number;
  log10DrugM: number;
  log10Sigma: number;
  /** 'model', 'model + fusion data', 'measured' or 'anchor on S₀'. */
  originWord: string;
  /** The drivers of the estimate in words, largest first. */
  drivers: string;
}

function saltWaterShown(row: ScreenRow): SaltWaterShown | null {
  const sw = row.saltWaterSolubility;
  if (!sw) return null;
  const sigma = sw.log10DrugM.uncertainty;
  return {
    value: sw.mgPerMlAsSalt,
    range: doseRange(sw.mgPerMlAsSalt, sigma),
    origin: sw.origin === 'measured' ? 'measured' : 'estimated',
    basis: saltSolubilityBasisWords(sw.basis),
    freeFormMgPerMl: sw.mgPerMlAsFreeForm,
    log10DrugM: sw.log10DrugM.value,
    log10Sigma: sigma,
    originWord: SALT_WATER_ORIGIN_LABELS[sw.origin],
    drivers: sw.drivers.map((d) => SOLUBILITY_DRIVER_WORDS[d.id]).join(', '),
  };
}

/** ΔH_sol per drug ion as the core states it (screen row), with the engine's words where it estimated it. */
function solutionEnthalpyOf(
  row: ScreenRow,
  data: ProjectScreening,
): DisplayRow['solutionEnthalpy'] {
  const h = row.solutionEnthalpyPerDrugIon;
  if (!h) return null;
  const thermo = data.energetics[row.id]?.thermo;
  const basis =
    h.origin === 'estimated' && thermo
      ? `Hess cycle: ${thermo.methodChosen} lattice + hydration (${thermo.methodReason}); per drug ion (formula unit ÷ ${row.drugPerSalt})`
      : h.basis;
  return {
    value: h.valueKJPerMolDrugIon,
    ...(h.sigmaKJPerMolDrugIon !== null ? { sigma: h.sigmaKJPerMolDrugIon } : {}),
    origin: h.origin,
    basis,
    notInformative: h.notInformative,
  };
}

/** The free form as a row of the same columns, read against the salts (not ranked). */
export interface FreeFormShown {
  label: string;
  /** S₀ in mg/mL with its ±1σ range (the free form's own solubility in water, at its own pH). */
  intrinsic: ShownNumber;
  worstDose: (ShownNumber & { pH: number; solid: string }) | null;
  gastricDose: (ShownNumber & { solid: string }) | null;
  /** The dose itself: the free form carries no counter-ion mass. */
  doseMg: number | null;
  flags: string[];
}

export function freeFormShown(
  data: ProjectScreening,
  drugName: string,
  doseMg: number | null,
): FreeFormShown {
  const ff = data.screen.freeForm;
  const s0 = ff.log10IntrinsicM;
  const mgPerMl = 10 ** s0.value * data.drugIon.freeFormMolarMassGPerMol;
  const measured = ff.intrinsicOrigin === 'measured';
  const basis = measured
    ? 'S₀ entered in the Compound area'
    : 'S₀ from the General Solubility Equation';
  const origin = measured ? 'measured' : 'estimated';
  return {
    label: `${drugName || 'Drug'} free ${data.screen.drugKind} (no salt)`,
    intrinsic: { value: mgPerMl, range: doseRange(mgPerMl, s0.uncertainty), origin, basis },
    worstDose:
      ff.worst && ff.worst.doseNumber !== null
        ? {
            value: ff.worst.doseNumber,
            range: doseRange(ff.worst.doseNumber, s0.uncertainty),
            origin,
            basis: `free form at pH ${ff.worst.pH}; ${basis}`,
            pH: ff.worst.pH,
            solid: 'free-form',
          }
        : null,
    gastricDose:
      ff.gastric && ff.gastric.doseNumber !== null
        ? {
            value: ff.gastric.doseNumber,
            range: doseRange(ff.gastric.doseNumber, s0.uncertainty),
            origin,
            basis: `${ff.gastric.label}${ff.gastric.convertsTo ? `; the ${ff.gastric.convertsTo} limits it` : ''}`,
            solid: ff.gastric.solid,
          }
        : null,
    doseMg,
    flags: ff.flags.map((f) => f.text),
  };
}

/** The ±1σ range of a multiplicative-error number, at the digits the sheet and the CLI print (roundLogNormal). */
const doseRange = (d: number, logSigma: number): [number, number] => {
  const r = roundLogNormal(d, logSigma);
  return [r.low, r.high];
};

type ScreenPart = Omit<DisplayRow, 'rank' | 'score' | 'contributions'>;

/**
 * What a row shows that depends on the screen only (not on the weights), built once per screen and
 * candidate: a weight change then builds only the rank, score and score parts of each row, and the
 * table's memoised cells see the same objects as before.
 */
const screenParts = new WeakMap<ProjectScreening, Map<string, ScreenPart>>();

function screenPartsOf(data: ProjectScreening): Map<string, ScreenPart> {
  let parts = screenParts.get(data);
  if (!parts) {
    parts = new Map(data.screen.rows.map((row) => [row.id, screenPart(data, row)]));
    screenParts.set(data, parts);
  }
  return parts;
}

/** Build what the table shows from the screen and the current weighting. */
export function displayRows(data: ProjectScreening, ranked: readonly RankedRow[]): DisplayRow[] {
  const parts = screenPartsOf(data);
  return ranked.flatMap((k) => {
    const part = parts.get(k.id);
    return part ? [{ ...part, rank: k.rank, score: k.score, contributions: k.contributions }] : [];
  });
}

function screenPart(data: ProjectScreening, row: ScreenRow): ScreenPart {
  const shared = data.screen.robustnessShared;
  const ionName = data.ionNames[row.id] ?? row.counterIonName;
  // The core's salt name (saltLabel), the same words the CLI writes for this row.
  const label = row.label;
  const u = uncertaintiesOf(row, shared);
  const kspMeasured = row.kspOrigin === 'measured';
  const kspBasis = kspMeasured
    ? 'K_sp from the measured salt solubility'
    : 'K_sp estimated (no measured salt solubility)';
  const logSigmaFor = (solid: string) => (solid === 'salt' ? u.saltLogSigma : u.freeLogSigma);
  // A dose number's mark follows the solid that limits it: the salt's K_sp or the free form's S₀.
  const freeMeasured = data.screen.freeForm.intrinsicOrigin === 'measured';
  const originOf = (solid: string) =>
    (solid === 'salt' ? kspMeasured : freeMeasured) ? 'measured' : 'estimated';
  const dpka = shownRowNumbers(row, shared).deltaPka;
  const solutionEnthalpy = solutionEnthalpyOf(row, data);
  return {
    id: row.id,
    label,
    ionName,
    row,
    deltaPka: dpka ? dpka.value : null,
    ...(dpka ? { deltaPkaDecimals: dpka.decimals } : {}),
    saltWater: saltWaterShown(row),
    phMax:
      row.phMax === null
        ? null
        : {
            value: row.phMax,
            sigma: u.phMaxSigma,
            origin: kspMeasured ? 'measured' : 'estimated',
            basis: kspBasis,
          },
    worstDose:
      row.worst && row.worst.doseNumber !== null
        ? {
            value: row.worst.doseNumber,
            range: doseRange(row.worst.doseNumber, logSigmaFor(row.worst.solid)),
            origin: originOf(row.worst.solid),
            basis: `${row.worst.solid === 'salt' ? 'salt' : 'free form'} limits at pH ${row.worst.pH}; ${row.worst.solid === 'salt' ? kspBasis : 'free-form solubility from S₀'}`,
            pH: row.worst.pH,
            solid: row.worst.solid,
          }
        : null,
    gastricDose:
      row.gastric && row.gastric.doseNumber !== null
        ? {
            value: row.gastric.doseNumber,
            range: doseRange(row.gastric.doseNumber, logSigmaFor(row.gastric.solid)),
            origin: originOf(row.gastric.solid),
            basis: `${row.gastric.label}${row.gastric.commonIonM > 0 ? `; common ion ${row.gastric.commonIonM.toFixed(3)} M` : ''}`,
            solid: row.gastric.solid,
          }
        : null,
    solutionEnthalpy,
    activeFraction: row.activeFraction,
    saltMassPerDoseMg: row.saltMassPerDoseMg,
    acceptabilityClass: data.counterIons[row.id]?.acceptabilityClass ?? null,
  };
}

const SORT_VALUE: Record<RankingSortKey, (r: DisplayRow) => number | string | null> = {
  rank: (r) => r.rank,
  name: (r) => r.label.toLowerCase(),
  deltaPka: (r) => r.deltaPka,
  saltWaterSolubility: (r) => r.saltWater?.log10DrugM ?? null,
  phMax: (r) => r.phMax?.value ?? null,
  worstDoseNumber: (r) => r.worstDose?.value ?? null,
  gastricDoseNumber: (r) => r.gastricDose?.value ?? null,
  solutionEnthalpy: (r) => r.solutionEnthalpy?.value ?? null,
  activeFraction: (r) => r.activeFraction,
};

/** Sort display rows; rows without a value go last whatever the direction. */
export function sortRows(
  rows: readonly DisplayRow[],
  key: RankingSortKey,
  dir: 'asc' | 'desc',
): DisplayRow[] {
  const get = SORT_VALUE[key];
  const sign = dir === 'asc' ? 1 : -1;
  return rows
    .map((r, i) => ({ r, i, v: get(r) }))
    .sort((a, b) => {
      if (a.v === null && b.v === null) return a.i - b.i;
      if (a.v === null) return 1;
      if (b.v === null) return -1;
      const c =
        typeof a.v === 'string'
          ? a.v.localeCompare(String(b.v))
          : (a.v as number) - (b.v as number);
      return c * sign || a.i - b.i;
    })
    .map((x) => x.r);
}
