import type { BenchSolubilityReading, Reason, ScreenFlag } from './screen.types';
import type { TemperatureTransfer } from './bench-temperature';

/**
 * The minimal words for how a measured solubility was read (bench-solubility.ts). The structured
 * record (ScreenRow.benchSolubility) carries every number; fuller phrasing belongs to the explanation
 * modules.
 */

const fmt = (x: number) => (x >= 100 ? x.toFixed(0) : x >= 1 ? x.toPrecision(3) : x.toPrecision(2));
const c = (k: number) => `${(k - 273.15).toFixed(0)} °C`;

/** Why the reading came out as it did, in a clause. */
export function whyRead(r: BenchSolubilityReading): string {
  const m = r.restPhMax;
  const pm = m
    ? `pH_max ≈ ${m.value.toFixed(1)} ± ${m.sigma.toFixed(1)} from the ${m.basis === 'measured' ? 'salt-limited value you marked' : 'estimate'}`
    : '';
  switch (r.decidedBy) {
    case 'user':
      return 'the solid left was stated';
    case 'no-ph':
      return 'the equilibrium pH was not recorded';
    case 'ph-max':
      return `pH ${r.ph} is ${r.limitedBy === 'salt' ? 'below' : 'above'} ${pm}`;
    case 'free-form-saturation':
      return r.limitedBy === 'salt'
        ? `the value is ${fmt(10 ** -r.overFreeFormLog10!.value)}× below what the free form gives at pH ${r.ph}, so the free form cannot be the solid`
        : `the value is ${fmt(10 ** r.overFreeFormLog10!.value)}× above what the free form gives at pH ${r.ph} (from S₀): read as the salt’s, its pH_max would lie below the pH it was measured at`;
    case 'within-margin':
      return `pH ${r.ph} is within 1σ of ${pm || 'pH_max'}, and the value lies within 1σ of the free form’s solubility there`;
  }
}

/** A value read as the free form's: evidence on S₀, not on the salt. */
export function freeFormReadingReason(r: BenchSolubilityReading, mgPerMlAsSalt: number): Reason {
  const s0 = r.impliedS0 ? `; it implies S₀ ≈ ${fmt(r.impliedS0.mgPerMl)} mg/mL` : '';
  return {
    kind: 'measured',
    criterion: 'solubility',
    text: `measured ${fmt(mgPerMlAsSalt)} mg/mL at pH ${r.ph ?? '?'} is limited by the free form (${whyRead(r)})${s0} — evidence on S₀, not on the salt; K_sp stays estimated`,
  };
}

/** The value K_sp rests on, how its solid was read, and any widening. */
export function usedReadingReason(r: BenchSolubilityReading, sigma: number): Reason {
  return {
    kind: 'measured',
    criterion: 'solubility',
    text:
      r.limitedBy === 'salt'
        ? `the salt limits the measured value (${whyRead(r)})`
        : `which solid limited the measured value is undecided (${whyRead(r)}); used for K_sp with ±${sigma.toFixed(2)} decades`,
  };
}

/** The note of a K_sp carried or widened for temperature. */
export function temperatureWords(t: TemperatureTransfer): string | null {
  const from = t.assumedTemperature
    ? `a temperature not recorded (taken as ${c(t.fromK)})`
    : c(t.fromK);
  if (t.method === null) return t.assumedTemperature ? `measured at ${from}` : null;
  if (t.method === 'widened')
    return `measured at ${from}, used at ${c(t.toK)} without an enthalpy of solution: σ widened by ${t.sigma.toFixed(2)} decades (salts commonly change 1.5–3× between 25 and 37 °C)`;
  const basis =
    t.method === 'van-t-hoff-fit' ? 'your van ’t Hoff fit' : 'your calorimetric ΔH_sol per ion';
  return `carried from ${from} to ${c(t.toK)} by van ’t Hoff with ΔH_sol,app ${t.apparentEnthalpyKJ!.toFixed(1)} kJ/mol (${basis}): ×${fmt(10 ** t.log10Shift)}`;
}

export function temperatureFlag(t: TemperatureTransfer): ScreenFlag {
  return {
    id: 'bench-temperature',
    text: `measured solubility at ${c(t.fromK)} used at ${c(t.toK)} without an enthalpy of solution (±${t.sigma.toFixed(2)} decades added)`,
    rule: 'no ΔH_sol to carry it: salts commonly change 1.5–3× in solubility between 25 and 37 °C (common practice); record a calorimetric ΔH_sol or solubilities at three temperatures',
  };
}

/** The resulting pH_max lies below the pH of the value it rests on. */
export function conflictText(phMax: number, ph: number): string {
  return `pH_max ${phMax.toFixed(2)} lies below the pH the value was measured at (${ph}): read as the salt’s, the value would leave the free base supersaturated — check the solid left (e.g. XRPD) and S₀`;
}

export function conflictFlag(text: string): ScreenFlag {
  return {
    id: 'bench-solid-conflict',
    text,
    rule: 'below pH_max the salt is the solid, above it the free form (Bogardus & Blackwood 1979; Serajuddin 2007)',
  };
}
