import { GAS_CONSTANT_KJ_PER_MOL_K } from '../../constants/physical';
import type { Estimate } from '../../result';
import { celsiusToKelvin } from '../../units/temperature';

/**
 * Carrying a measured solubility to the screening temperature. With an apparent enthalpy of solution
 * the van ’t Hoff equation gives ln(S₂/S₁) = −(ΔH_sol,app/R)·(1/T₂ − 1/T₁) (e.g. Grant, Mehdizadeh,
 * Chow & Fairbrother 1984, Int. J. Pharm. 18, 25). A van ’t Hoff fit of ln S on 1/T (van-t-hoff.ts)
 * gives ΔH_sol,app directly. A calorimetric ΔH_sol per formula unit belongs to K_sp = (m·s)^m·(n·s)^n,
 * so for an ideal solution ln s moves by ΔH_sol/(ν·R) with ν = m + n ions per formula unit (the same
 * van ’t Hoff equation written for K_sp). R: CODATA 2018 (constants/physical.ts).
 *
 * Without either, the value is kept and its σ widened: drug salts commonly change 1.5–3× in solubility
 * between 25 and 37 °C (common practice), so the unknown change is taken as log₁₀ 3 per 12 K.
 */
export const UNCORRECTED_LOG10_PER_K = Math.log10(3) / 12;

/** A value this close to the screening temperature, K, is used as it is (our choice). */
export const TEMPERATURE_TOLERANCE_K = 2;

/** Temperature taken for a solubility recorded without one, °C (the usual laboratory temperature; common practice). */
export const UNRECORDED_TEMPERATURE_C = 25;

export interface TemperatureTransfer {
  /** log₁₀(S at the screening temperature / S measured). */
  log10Shift: number;
  /** 1σ the transfer adds, decades. */
  sigma: number;
  /** 'van-t-hoff-fit' or 'calorimetric' when an enthalpy carried the value; 'widened' without one; null when none was needed. */
  method: 'van-t-hoff-fit' | 'calorimetric' | 'widened' | null;
  /** The apparent ΔH_sol used for ln s, kJ/mol (null unless carried). */
  apparentEnthalpyKJ: number | null;
  fromK: number;
  toK: number;
  /** True when the measurement had no temperature and was taken at 25 °C. */
  assumedTemperature: boolean;
}

/**
 * The transfer of one solubility from `fromK` (null: not recorded) to `toK`. The fit wins over the
 * calorimetric value: it was measured on the solubility itself.
 */
export function temperatureTransfer(i: {
  fromK: number | null;
  toK: number;
  vantHoffKJ: Estimate | null;
  calorimetricKJ: Estimate | null;
  ionsPerFormula: number;
}): TemperatureTransfer {
  const fromK = i.fromK ?? celsiusToKelvin(UNRECORDED_TEMPERATURE_C);
  const base = {
    fromK,
    toK: i.toK,
    assumedTemperature: i.fromK === null,
  };
  if (Math.abs(fromK - i.toK) <= TEMPERATURE_TOLERANCE_K)
    return { ...base, log10Shift: 0, sigma: 0, method: null, apparentEnthalpyKJ: null };
  const inv = 1 / i.toK - 1 / fromK;
  const perKJ = -inv / (GAS_CONSTANT_KJ_PER_MOL_K * Math.LN10);
  if (i.vantHoffKJ || i.calorimetricKJ) {
    const fit = i.vantHoffKJ !== null;
    const dH = fit ? i.vantHoffKJ! : i.calorimetricKJ!;
    const per = fit ? 1 : i.ionsPerFormula;
    return {
      ...base,
      log10Shift: (perKJ * dH.value) / per,
      sigma: Math.abs((perKJ * dH.uncertainty) / per),
      method: fit ? 'van-t-hoff-fit' : 'calorimetric',
      apparentEnthalpyKJ: dH.value / per,
    };
  }
  return {
    ...base,
    log10Shift: 0,
    sigma: UNCORRECTED_LOG10_PER_K * Math.abs(fromK - i.toK),
    method: 'widened',
    apparentEnthalpyKJ: null,
  };
}
