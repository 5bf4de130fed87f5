import { ChemInputError } from '../result';
import { hygroscopicityClass, type HygroscopicityClass } from './hygroscopicity';
import { vantHoffFit, type VanTHoffFit } from './van-t-hoff';

/**
 * Measured data for one candidate, as plain data (the app stores it as `MeasurementRecord`; the
 * core accepts this structural subset so that it does not import persistence code).
 *
 * Units: solubility 'mg/mL' (mass of the salt per mL, the usual way a salt's solubility is
 * reported), 'mg/mL free form' (free-form equivalents) or 'mol/L' (formula units); melting point
 * '°C'; enthalpy of fusion 'kJ/mol' (DSC, per formula unit); solution enthalpy 'kJ/mol' (per formula unit); mass gain '%'; crystallinity '%'.
 * `temperatureK` in K; `ph` the equilibrium pH when measured (null: unknown).
 */
export type MeasurementKind =
  | 'solubility'
  | 'melting-point'
  | 'fusion-enthalpy'
  | 'solution-enthalpy'
  | 'mass-gain-80rh'
  | 'crystallinity'
  | 'note';

/**
 * The solid the lab found in equilibrium with a saturated solution (e.g. by XRPD of the residue):
 * the salt, the free form, or not known. Null or absent: not stated.
 */
export type SolidForm = 'salt' | 'free-form' | 'unknown';

export interface MeasurementInput {
  kind: MeasurementKind;
  value: number | null;
  unit: string;
  ph: number | null;
  temperatureK: number | null;
  medium: string;
  text: string;
  /** Solubility only: the solid left at equilibrium, when the lab says (optional). */
  solidForm?: SolidForm | null;
}

export interface MeasuredSolubility {
  /** Formula units dissolved, mol/L (read as if the salt were the solid). */
  formulaUnitsM: number;
  ph: number | null;
  temperatureK: number | null;
  medium: string;
  /** What the lab said about the solid left; null when not stated. */
  solidForm: SolidForm | null;
  /** Position among the candidate's solubility measurements, in input order. */
  index: number;
}

export interface InterpretedMeasurements {
  /**
   * Solubility closest to the screening temperature, whatever solid limited it (the screen decides
   * which solid limits each value and which one K_sp rests on: screen/bench-solubility.ts).
   */
  solubility: MeasuredSolubility | null;
  allSolubilities: MeasuredSolubility[];
  /** van 't Hoff fit when ≥ 3 solubilities at ≥ 2 temperatures exist; otherwise null with a reason. */
  vantHoff: VanTHoffFit | null;
  vantHoffNote: string | null;
  meltingPointC: number | null;
  /** Enthalpy of fusion of the salt from DSC, kJ/mol per formula unit. */
  fusionEnthalpyKJPerMol: number | null;
  /** Calorimetric ΔH_sol per formula unit, kJ/mol. */
  solutionEnthalpyKJ: number | null;
  massGainPercent: number | null;
  hygroscopicity: HygroscopicityClass | null;
  crystallinityPercent: number | null;
  notes: string[];
}

const LIQUEFIED = /deliquesc|liquef|turned liquid/i;

function toFormulaUnitsM(
  m: MeasurementInput,
  saltMolarMassGPerMol: number,
  freeFormMolarMassGPerMol: number,
  drugPerSalt: number,
): number {
  const v = m.value;
  if (v === null || !(Number.isFinite(v) && v > 0)) {
    throw new ChemInputError(
      'measurement.value',
      `a solubility must be greater than zero, got ${String(v)}`,
      'a solubility > 0',
    );
  }
  const unit = m.unit.trim().toLowerCase();
  if (unit === 'mol/l' || unit === 'm') return v;
  if (unit === 'mg/ml free form' || unit === 'mg/ml (free form)')
    return v / freeFormMolarMassGPerMol / drugPerSalt;
  if (unit === 'mg/ml' || unit === 'g/l') return v / saltMolarMassGPerMol;
  if (unit === 'µg/ml' || unit === 'ug/ml') return v / 1000 / saltMolarMassGPerMol;
  throw new ChemInputError(
    'measurement.unit',
    `unknown solubility unit '${m.unit}'`,
    "'mg/mL' (as salt), 'mg/mL free form', 'µg/mL' or 'mol/L'",
  );
}

/**
 * Read a candidate's measurements: the latest value of each kind wins (input order = record order),
 * solubilities are converted to mol/L of formula units, a van 't Hoff fit is attempted when the
 * data allow it, and the mass gain is classed by Ph. Eur. 5.11.
 */
export function interpretMeasurements(
  list: readonly MeasurementInput[],
  ctx: {
    saltMolarMassGPerMol: number;
    freeFormMolarMassGPerMol: number;
    drugPerSalt: number;
    temperatureK: number;
  },
): InterpretedMeasurements {
  const out: InterpretedMeasurements = {
    solubility: null,
    allSolubilities: [],
    vantHoff: null,
    vantHoffNote: null,
    meltingPointC: null,
    fusionEnthalpyKJPerMol: null,
    solutionEnthalpyKJ: null,
    massGainPercent: null,
    hygroscopicity: null,
    crystallinityPercent: null,
    notes: [],
  };
  const liquefied = readEach(list, ctx, out);
  if (out.massGainPercent !== null || liquefied)
    out.hygroscopicity = hygroscopicityClass(out.massGainPercent ?? 0, liquefied);
  if (out.allSolubilities.length > 0) summariseSolubilities(out, ctx.temperatureK);
  return out;
}

type MeasurementContext = Parameters<typeof interpretMeasurements>[1];

/** Each measurement into its field (the latest of a kind wins); true when a mass gain says the salt liquefied. */
function readEach(
  list: readonly MeasurementInput[],
  ctx: MeasurementContext,
  out: InterpretedMeasurements,
): boolean {
  let liquefied = false;
  for (const m of list) {
    switch (m.kind) {
      case 'solubility':
        out.allSolubilities.push({
          formulaUnitsM: toFormulaUnitsM(
            m,
            ctx.saltMolarMassGPerMol,
            ctx.freeFormMolarMassGPerMol,
            ctx.drugPerSalt,
          ),
          ph: m.ph,
          temperatureK: m.temperatureK,
          medium: m.medium,
          solidForm: m.solidForm ?? null,
          index: out.allSolubilities.length,
        });
        break;
      case 'melting-point':
        if (m.value !== null) out.meltingPointC = m.value;
        break;
      case 'fusion-enthalpy':
        if (m.value !== null) out.fusionEnthalpyKJPerMol = m.value;
        break;
      case 'solution-enthalpy':
        if (m.value !== null) out.solutionEnthalpyKJ = m.value;
        break;
      case 'mass-gain-80rh':
        if (m.value !== null) out.massGainPercent = m.value;
        if (LIQUEFIED.test(m.text)) liquefied = true;
        break;
      case 'crystallinity':
        if (m.value !== null) out.crystallinityPercent = m.value;
        if (m.text) out.notes.push(`crystallinity: ${m.text}`);
        break;
      case 'note':
        if (m.text) out.notes.push(m.text);
        break;
    }
  }
  return liquefied;
}

/** The solubility nearest the screening temperature, and a van ’t Hoff fit when the data allow one. */
function summariseSolubilities(out: InterpretedMeasurements, T: number): void {
  out.solubility = out.allSolubilities.reduce((best, s) =>
    Math.abs((s.temperatureK ?? T) - T) < Math.abs((best.temperatureK ?? T) - T) ? s : best,
  );
  const withT = out.allSolubilities.filter((s) => s.temperatureK !== null);
  const temps = new Set(withT.map((s) => s.temperatureK));
  if (withT.length >= 3 && temps.size >= 2) {
    out.vantHoff = vantHoffFit(
      withT.map((s) => ({ temperatureK: s.temperatureK!, solubility: s.formulaUnitsM })),
    );
  } else if (withT.length > 0) {
    out.vantHoffNote = `van ’t Hoff fit needs at least three solubilities at two or more temperatures (${withT.length} ${withT.length === 1 ? 'solubility' : 'solubilities'} recorded, at ${temps.size} ${temps.size === 1 ? 'temperature' : 'temperatures'})`;
  }
}
