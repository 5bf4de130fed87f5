import { log10ChargeFraction } from '../speciation';
import { log10FreeFormSolubilityM, log10KspFromSaltSolubility } from '../salt-equilibrium';
import { log10KspFromFormulaUnits } from '../ksp-estimate';
import { numericalPhMax, type ProfileSalt } from '../ph-profile';
import { fastPathApplies, gridPhMax } from '../ph-grid-solubility';
import { kelvinToCelsius } from '../../units/temperature';
import type { MeasuredSolubility, SolidForm } from '../measurements';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import type { BenchSolubilityReading, LimitingSolid } from './screen.types';

/**
 * Which solid limited a measured solubility. A saturated solution is in equilibrium with one solid
 * (two only at pH_max). For a base whose salt is BH⁺X⁻ (1:1, no added counter-ion), below pH_max the
 * salt is the solid and S_total = √K_sp·(1 + 10^(pH − pKa)) (where [X⁻] ≈ [BH⁺]; the screen solves the
 * full mass balance, salt-equilibrium.ts); above it the free base is, and
 * S_total = S₀·(1 + 10^(pKa − pH)); an acid mirrors this (Kramer & Flynn 1972, J. Pharm. Sci. 61,
 * 1896; Bogardus & Blackwood 1979, J. Pharm. Sci. 68, 188; Serajuddin 2007, Adv. Drug Deliv. Rev. 59,
 * 603). A slurry ends at its own equilibrium pH, so a value measured above pH_max is the free form's
 * solubility: it says something about S₀ and nothing about the salt's K_sp.
 *
 * The decision, in order:
 * 1. the solid the lab found (XRPD of the residue), when stated, wins;
 * 2. the measured pH against the pH_max the rest of the evidence gives (this value left out): below
 *    pH_max − 1σ the salt, above pH_max + 1σ the free form;
 * 3. the value against the free form's own solubility at its pH, S₀/α₀(pH): if the free form were the
 *    solid its un-ionised part would equal S₀, so a value clearly below (by more than 1σ of S₀, pKa and
 *    the measurement) cannot be the free form's — the salt limits; a value clearly above it would leave
 *    the free base supersaturated were the salt the solid (its own pH_max would lie below the pH it was
 *    measured at) — read as the free form's, implying a higher S₀;
 * 4. otherwise undecided: used for K_sp with a widened σ, and said.
 * The 1σ margins are our choice (a decision needs the difference to exceed its own uncertainty).
 */
export const LIMITING_SOLID_MARGIN_SIGMA = 1;

/** Measured-solubility spread, decades (our assumption: ~±10 % in solubility, shake-flask repeatability). */
export const MEASURED_LOG10_S_SIGMA = 0.05;

/** The evidence a value is judged against: a K_sp from the rest of the data and its spread. */
export interface RestEvidence {
  log10Ksp: number;
  /** Spread of the salt's log₁₀ solubility beyond S₀'s, decades. */
  saltLog10Sigma: number;
  /** True when the salt's solubility moves with S₀ (then S₀'s spread cancels in pH_max). */
  anchored: boolean;
  basis: 'estimate' | 'measured';
}

/** The pure decision (steps 1–4 above) from the numbers it needs. */
export function decideLimitingSolid(i: {
  stated: SolidForm | null;
  ph: number | null;
  restPhMax: { value: number; sigma: number } | null;
  overFreeFormLog10: { value: number; sigma: number } | null;
}): { limitedBy: LimitingSolid; decidedBy: BenchSolubilityReading['decidedBy'] } {
  if (i.stated === 'salt' || i.stated === 'free-form')
    return { limitedBy: i.stated, decidedBy: 'user' };
  if (i.ph === null) return { limitedBy: 'unknown', decidedBy: 'no-ph' };
  const k = LIMITING_SOLID_MARGIN_SIGMA;
  const r = i.restPhMax;
  if (r && i.ph < r.value - k * r.sigma) return { limitedBy: 'salt', decidedBy: 'ph-max' };
  if (r && i.ph > r.value + k * r.sigma) return { limitedBy: 'free-form', decidedBy: 'ph-max' };
  const e = i.overFreeFormLog10;
  if (e && e.value < -k * e.sigma) return { limitedBy: 'salt', decidedBy: 'free-form-saturation' };
  if (e && e.value > k * e.sigma)
    return { limitedBy: 'free-form', decidedBy: 'free-form-saturation' };
  return { limitedBy: 'unknown', decidedBy: 'within-margin' };
}

/** The salt of a prepared candidate with a given K_sp, as the pH profile reads it. */
function saltWith(p: PreparedCandidate, log10Ksp: number): ProfileSalt {
  const st = p.cand.stoichiometry;
  return {
    counterIon: p.protolyte,
    counterIonCharge: st.ionCharge,
    drugPerSalt: st.drugPerSalt,
    counterIonPerSalt: st.counterIonPerSalt,
    log10Ksp,
  };
}

/** pH_max of the candidate's salt with this K_sp (the screen's own solver), or null when none is found. */
export function phMaxWith(
  ctx: ScreenContext,
  p: PreparedCandidate,
  log10Ksp: number,
): number | null {
  const salt = saltWith(p, log10Ksp);
  try {
    return fastPathApplies(ctx.grid)
      ? gridPhMax(ctx.grids, salt)
      : numericalPhMax(ctx.drug, ctx.log10IntrinsicM.value, salt, ctx.grid);
  } catch {
    return null;
  }
}

/** 1σ of the drug's pKa: the widest of its values' origins (as the screen's robustness draw). */
export function drugPkaSigma(ctx: ScreenContext): number {
  const byOrigin = ctx.settings.pkaSigmaByOrigin as Record<string, number>;
  return Math.max(...ctx.compound.pKas.map((k) => byOrigin[k.origin] ?? byOrigin.predicted!));
}

/** log₁₀ K_sp read from a solubility as if the salt were the solid, at its pH (or fully ionised). */
export function log10KspFromValue(
  ctx: ScreenContext,
  p: PreparedCandidate,
  ph: number | null,
  formulaUnitsM: number,
): number {
  const st = p.cand.stoichiometry;
  if (ph === null)
    return log10KspFromFormulaUnits(
      Math.log10(formulaUnitsM),
      st.drugPerSalt,
      st.counterIonPerSalt,
    );
  return log10KspFromSaltSolubility({
    drug: ctx.drugProtolyte,
    drugIonCharge: ctx.compound.ionCharge,
    drugPerSalt: st.drugPerSalt,
    counterIon: p.protolyte,
    counterIonCharge: st.ionCharge,
    counterIonPerSalt: st.counterIonPerSalt,
    pH: ph,
    formulaUnitsM,
  });
}

/**
 * The free form's side of a value measured at a pH: how far the total drug dissolved lies above the
 * free form's solubility there (log₁₀, ±1σ from S₀, the pKa weighted by the ionised fraction, and the
 * measurement), and the S₀ it implies if the free form was the solid: S₀ = S_total·α₀(pH), i.e.
 * S_total/(1 + 10^(pKa − pH)) for a monoprotic base (Serajuddin 2007).
 */
export function freeFormSide(
  ctx: ScreenContext,
  p: PreparedCandidate,
  s: MeasuredSolubility,
): {
  over: { value: number; sigma: number };
  impliedS0: { mgPerMl: number; log10M: number };
} | null {
  if (s.ph === null) return null;
  const log10DrugM = Math.log10(s.formulaUnitsM * p.cand.stoichiometry.drugPerSalt);
  const log10Alpha0 = log10ChargeFraction(ctx.drugProtolyte, s.ph, 0);
  const ionised = 1 - 10 ** log10Alpha0;
  const sigma = Math.hypot(
    ctx.log10IntrinsicM.uncertainty,
    drugPkaSigma(ctx) * ionised,
    MEASURED_LOG10_S_SIGMA,
  );
  const log10S0 = log10DrugM + log10Alpha0;
  return {
    over: {
      value:
        log10DrugM - log10FreeFormSolubilityM(ctx.drugProtolyte, ctx.log10IntrinsicM.value, s.ph),
      sigma,
    },
    impliedS0: { log10M: log10S0, mgPerMl: 10 ** log10S0 * ctx.freeFormMolarMassGPerMol },
  };
}

/** pH_max of the rest of the evidence with its 1σ (as the rank-robustness draw linearises it). */
function restPhMaxOf(
  ctx: ScreenContext,
  p: PreparedCandidate,
  rest: RestEvidence,
): BenchSolubilityReading['restPhMax'] {
  const value = phMaxWith(ctx, p, rest.log10Ksp);
  if (value === null) return null;
  const s0 = rest.anchored ? 0 : ctx.log10IntrinsicM.uncertainty;
  const sigma = Math.hypot(drugPkaSigma(ctx), rest.saltLog10Sigma, s0);
  return { value, sigma, basis: rest.basis };
}

/** One value read against one body of other evidence. */
function readOne(
  ctx: ScreenContext,
  p: PreparedCandidate,
  s: MeasuredSolubility,
  rest: RestEvidence,
): BenchSolubilityReading {
  const restPhMax = restPhMaxOf(ctx, p, rest);
  const ff = freeFormSide(ctx, p, s);
  const d = decideLimitingSolid({
    stated: s.solidForm,
    ph: s.ph,
    restPhMax,
    overFreeFormLog10: ff?.over ?? null,
  });
  return {
    index: s.index,
    ...d,
    ph: s.ph,
    temperatureC: s.temperatureK === null ? null : kelvinToCelsius(s.temperatureK),
    restPhMax,
    overFreeFormLog10: ff?.over ?? null,
    impliedS0: ff?.impliedS0 ?? null,
    usedForKsp: false,
  };
}

/**
 * Read every measured solubility of a candidate, in two passes. First each value is read against the
 * estimate made without any measured solubility (or against a value the lab stated was salt-limited).
 * Then each is read again against the rest of the evidence: another value of the same salt read as
 * salt-limited in the first pass (nearest the screening temperature), if there is one, else the
 * estimate — never against itself.
 */
export function readBenchSolubilities(
  ctx: ScreenContext,
  p: PreparedCandidate,
  estimate: RestEvidence,
): BenchSolubilityReading[] {
  const all = p.measured?.allSolubilities ?? [];
  const T = ctx.temperatureK;
  const dT = (s: MeasuredSolubility) => Math.abs((s.temperatureK ?? T) - T);
  const restFrom = (s: MeasuredSolubility, saltLimited: (o: MeasuredSolubility) => boolean) => {
    const other = all.filter((o) => o !== s && saltLimited(o)).sort((a, b) => dT(a) - dT(b))[0];
    return other
      ? {
          log10Ksp: log10KspFromValue(ctx, p, other.ph, other.formulaUnitsM),
          saltLog10Sigma: MEASURED_LOG10_S_SIGMA,
          anchored: false,
          basis: 'measured' as const,
        }
      : estimate;
  };
  const first = all.map((s) =>
    readOne(
      ctx,
      p,
      s,
      restFrom(s, (o) => o.solidForm === 'salt'),
    ),
  );
  const salt = new Set(first.filter((r) => r.limitedBy === 'salt').map((r) => r.index));
  return all.map((s) =>
    readOne(
      ctx,
      p,
      s,
      restFrom(s, (o) => salt.has(o.index)),
    ),
  );
}
