import { kelvinToCelsius } from '../../units/temperature';
import type { MeasuredSolubility } from '../measurements';
import {
  log10KspFromValue,
  MEASURED_LOG10_S_SIGMA,
  phMaxWith,
  readBenchSolubilities,
} from './bench-solubility';
import { temperatureTransfer, type TemperatureTransfer } from './bench-temperature';
import {
  conflictFlag,
  conflictText,
  freeFormReadingReason,
  temperatureFlag,
  temperatureWords,
  usedReadingReason,
} from './bench-solubility-words';
import { saltWaterOf, type KspChoice } from './ksp-choice-parts';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import { measuredKspReason } from './screen-reasons';
import type { BenchSolubilityReading, BenchSolubilityUse, Reason } from './screen.types';

/** The value of a set nearest the screening temperature (unrecorded temperatures count as on it). */
function nearestInTemperature<T extends { temperatureC: number | null }>(
  list: readonly T[],
  temperatureC: number,
): T | undefined {
  const d = (r: T) => Math.abs((r.temperatureC ?? temperatureC) - temperatureC);
  return [...list].sort((a, b) => d(a) - d(b))[0];
}

/** The transfer of one value to the screening temperature, with the candidate's measured ΔH, if any. */
function transferOf(
  ctx: ScreenContext,
  p: PreparedCandidate,
  s: MeasuredSolubility,
): TemperatureTransfer {
  const st = p.cand.stoichiometry;
  const calorimetric =
    p.solutionEnthalpyOrigin === 'measured (calorimetry)' ? p.solutionEnthalpyKJ : null;
  return temperatureTransfer({
    fromK: s.temperatureK,
    toK: ctx.temperatureK,
    vantHoffKJ: p.measured?.vantHoff?.solutionEnthalpyKJ ?? null,
    calorimetricKJ: calorimetric,
    ionsPerFormula: st.drugPerSalt + st.counterIonPerSalt,
  });
}

/**
 * K_sp from the bench: every measured solubility is read (bench-solubility.ts); the salt-limited value
 * nearest the screening temperature gives K_sp (origin measured), else an undecided one with its σ
 * widened by the 1σ of the pH_max it could not be told from; free-form-limited values never give K_sp —
 * they are evidence on S₀ and the estimate stays. The value is carried to the screening temperature
 * (bench-temperature.ts), and a pH_max that ends below the pH the value was measured at is flagged.
 */
export function benchKspChoice(
  ctx: ScreenContext,
  p: PreparedCandidate,
  estimate: KspChoice,
): KspChoice {
  const all = p.measured!.allSolubilities;
  const readings = readBenchSolubilities(ctx, p, {
    log10Ksp: estimate.log10Ksp.value,
    // the estimate's whole spread: its per-salt part and the model's shared per-drug level
    saltLog10Sigma: Math.hypot(estimate.saltLog10Sigma, estimate.saltSharedLog10Sigma ?? 0),
    anchored: estimate.anchored,
    basis: 'estimate',
  });
  const screenC = kelvinToCelsius(ctx.temperatureK);
  const freeForm = nearestInTemperature(
    readings.filter((r) => r.limitedBy === 'free-form' && r.impliedS0 !== null),
    screenC,
  );
  const impliedS0 = freeForm
    ? { ...freeForm.impliedS0!, temperatureC: freeForm.temperatureC, ph: freeForm.ph! }
    : null;
  const used =
    nearestInTemperature(
      readings.filter((r) => r.limitedBy === 'salt'),
      screenC,
    ) ??
    nearestInTemperature(
      readings.filter((r) => r.limitedBy === 'unknown'),
      screenC,
    );
  const asSaltMg = (r: BenchSolubilityReading) =>
    all[r.index]!.formulaUnitsM * p.saltMolarMassGPerMol;
  const ffReasons = readings
    .filter((r) => r.limitedBy === 'free-form')
    .map((r) => freeFormReadingReason(r, asSaltMg(r)));
  if (!used) {
    return {
      ...estimate,
      reasons: [...estimate.reasons, ...ffReasons],
      benchSolubility: {
        limitedBy: 'free-form',
        readings,
        impliedS0,
        temperatureAdjusted: null,
        widenedBecause: [],
        conflict: null,
      },
    };
  }
  used.usedForKsp = true;
  return measuredChoice(ctx, p, estimate, all[used.index]!, used, {
    readings,
    impliedS0,
    ffReasons,
  });
}

/** The structured record of a van ’t Hoff transfer (null when the value was not carried). */
function adjustedRecord(
  t: TemperatureTransfer,
  screenC: number,
): BenchSolubilityUse['temperatureAdjusted'] {
  if (t.method !== 'van-t-hoff-fit' && t.method !== 'calorimetric') return null;
  return {
    fromC: kelvinToCelsius(t.fromK),
    toC: screenC,
    method: t.method,
    solutionEnthalpyKJ: t.apparentEnthalpyKJ!,
    log10Shift: t.log10Shift,
  };
}

/** The 1σ a value behind K_sp carries: measurement, undecided solid, temperature; and why it was widened. */
function widenedSigma(
  used: BenchSolubilityReading,
  estimate: KspChoice,
  t: TemperatureTransfer,
  tWords: string | null,
): { sigma: number; widenedBecause: string[] } {
  const widenedBecause: string[] = [];
  let undecidedSigma = 0;
  if (used.limitedBy === 'unknown') {
    undecidedSigma = used.restPhMax?.sigma ?? estimate.saltWater.log10DrugM.uncertainty;
    widenedBecause.push(
      `which solid limited it is undecided: ±${undecidedSigma.toFixed(2)} decades (the 1σ of the pH_max it was judged against)`,
    );
  }
  if (t.method === 'widened' && tWords) widenedBecause.push(tWords);
  return { sigma: Math.hypot(MEASURED_LOG10_S_SIGMA, undecidedSigma, t.sigma), widenedBecause };
}

/** The K_sp choice resting on one measured value (salt-limited or undecided). */
function measuredChoice(
  ctx: ScreenContext,
  p: PreparedCandidate,
  estimate: KspChoice,
  s: MeasuredSolubility,
  used: BenchSolubilityReading,
  found: Pick<BenchSolubilityUse, 'readings' | 'impliedS0'> & { ffReasons: Reason[] },
): KspChoice {
  const screenC = kelvinToCelsius(ctx.temperatureK);
  const st = p.cand.stoichiometry;
  const t = transferOf(ctx, p, s);
  const formulaUnitsM = s.formulaUnitsM * 10 ** t.log10Shift;
  const logK = log10KspFromValue(ctx, p, s.ph, formulaUnitsM);
  const tWords = temperatureWords(t);
  const { sigma, widenedBecause } = widenedSigma(used, estimate, t, tWords);
  const n = st.drugPerSalt + st.counterIonPerSalt;
  const phMax = phMaxWith(ctx, p, logK);
  const conflict =
    s.ph !== null && phMax !== null && phMax < s.ph ? conflictText(phMax, s.ph) : null;
  const notes = [
    s.ph === null
      ? 'pH of the saturated solution not recorded: ions taken as fully ionised'
      : `from the solubility at pH ${s.ph}`,
    used.limitedBy === 'salt'
      ? 'read as limited by the salt'
      : 'which solid limited it is undecided: σ widened',
    ...(tWords ? [tWords] : []),
    ...(conflict ? [conflict] : []),
  ];
  const source = ['measured salt solubility (user data)'];
  return {
    log10Ksp: {
      value: logK,
      uncertainty: n * sigma,
      method: 'measured-salt-solubility',
      sources: source,
      notes,
    },
    kspOrigin: 'measured',
    saltLog10Sigma: sigma,
    anchored: false,
    reasons: [
      measuredKspReason(formulaUnitsM * p.saltMolarMassGPerMol),
      usedReadingReason(used, sigma),
      ...found.ffReasons,
    ],
    flags: [
      ...(t.method === 'widened' ? [temperatureFlag(t)] : []),
      ...(conflict ? [conflictFlag(conflict)] : []),
    ],
    saltWater: saltWaterOf(
      p,
      ctx,
      {
        value: Math.log10(formulaUnitsM * st.drugPerSalt),
        uncertainty: sigma,
        method: 'measured-salt-solubility',
        sources: source,
        notes,
      },
      'measured',
      [],
      {
        limitedBy: used.limitedBy,
        impliedS0MgPerMl: found.impliedS0?.mgPerMl ?? null,
        temperatureAdjustment: tWords ?? null,
      },
    ),
    benchSolubility: {
      limitedBy: used.limitedBy,
      readings: found.readings,
      impliedS0: found.impliedS0,
      temperatureAdjusted: adjustedRecord(t, screenC),
      widenedBecause,
      conflict,
    },
  };
}
