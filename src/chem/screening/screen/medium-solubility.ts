import { checkedSystem, pointAt, type ProfileOptions, type ProfileSalt } from '../ph-profile';
import {
  log10FreeFormSolubilityM,
  requirePh,
  SALT_LOG10_S_LIMITS,
  saltLog10FormulaUnitsRaw,
} from '../salt-equilibrium';
import type { ScreeningMedium } from '../settings';
import { log10ChargeFraction } from '../speciation';
import type { ScreenContext } from './screen-context';

/**
 * A salt's solubility in one medium of a screen: the value solubilityAtPh (ph-profile.ts) gives, with
 * the drug's side of the medium (its activity model, its fraction in the salt charge state and the
 * free form's solubility at the medium's pH) computed once per screen rather than once per salt.
 *
 * With ideal activities and none of the salt's counter-ion in the medium, the general solver
 * (salt-equilibrium.ts solveCheckedSalt) takes its closed form, and so does this file, with the same
 * operations in the same order (tests/chem/screening/screen/medium-solubility.test.ts compares both
 * with Object.is over random inputs). Every other case takes solubilityAtPh's own steps.
 */

/** The drug's side of one medium, the same for every salt of a screen. */
interface DrugInMedium {
  activity: ProfileOptions['activity'];
  /** Ideal activities: a salt whose counter-ion the medium lacks takes the closed form. */
  ideal: boolean;
  /** log₁₀ fraction of the drug in its salt charge state at the medium's pH. */
  laD: number;
  /** The free form's solubility at the medium's pH, mol/L. */
  freeM: number;
  /** The medium's own ions by id (its `ions` record's own entries), read for every salt. */
  ions: Map<string, number>;
}

/** The activity model in a medium: Davies takes the medium's own background ionic strength. */
export function mediumActivity(
  ctx: ScreenContext,
  m: Pick<ScreeningMedium, 'ionicStrengthM'>,
): ProfileOptions['activity'] {
  return ctx.activity?.model === 'davies'
    ? { ...ctx.activity, backgroundIonicStrengthM: m.ionicStrengthM }
    : ctx.activity;
}

type MediumOfScreen = Pick<ScreeningMedium, 'pH' | 'ionicStrengthM' | 'ions'>;

function drugInMedium(ctx: ScreenContext, m: MediumOfScreen): DrugInMedium {
  const activity = mediumActivity(ctx, m);
  // solubilityAtPh's checks for what is new here: the drug was checked by the context, the salt by the
  // row's profile; the pH of the medium is checked where it enters, as solubilityAtPh checks it
  requirePh(m.pH);
  const p = ctx.drugProtolyte;
  return {
    activity,
    ideal: activity === undefined || activity.model === 'ideal',
    laD: log10ChargeFraction(p, m.pH, ctx.drug.ionCharge),
    freeM: 10 ** log10FreeFormSolubilityM(p, ctx.log10IntrinsicM.value, m.pH),
    ions: new Map(Object.entries(m.ions)),
  };
}

/**
 * The drug's side of each medium of one screen: one entry, refilled when the screen (its context and
 * media list, by identity) changes; filled medium by medium as they are reached, so a failing medium
 * fails where the per-salt call failed.
 */
let cachedCtx: ScreenContext | null = null;
let cachedMedia: readonly unknown[] | null = null;
let cachedSides: (DrugInMedium | undefined)[] = [];

function drugSide(ctx: ScreenContext, media: readonly MediumOfScreen[], i: number): DrugInMedium {
  if (ctx !== cachedCtx || media !== cachedMedia) {
    cachedCtx = ctx;
    cachedMedia = media;
    cachedSides = new Array<DrugInMedium | undefined>(media.length);
  }
  return (cachedSides[i] ??= drugInMedium(ctx, media[i]!));
}

/** Names an object inherits from Object.prototype: `ions[id]` reads them when the record lacks id. */
const INHERITED = new Set(Object.getOwnPropertyNames(Object.prototype));

/**
 * The counter-ion `counterIonId` already in medium `i` of `media`, mol/L: `ions[counterIonId] ?? 0`
 * (a keyed read of a record by every salt's id is slow; the record's own entries are a Map per screen).
 */
export function commonIonIn(
  ctx: ScreenContext,
  media: readonly MediumOfScreen[],
  i: number,
  counterIonId: string,
): number {
  const own = drugSide(ctx, media, i).ions.get(counterIonId);
  if (own !== undefined && own !== null) return own;
  return INHERITED.has(counterIonId) ? (media[i]!.ions[counterIonId] ?? 0) : 0;
}

/** The point read from a medium; one object reused (the caller reads it before the next call). */
export interface MediumPoint {
  solubilityM: number;
  solid: 'salt' | 'free-form';
}
const point: MediumPoint = { solubilityM: 0, solid: 'free-form' };

/**
 * The salt's solubility (mol/L, total drug) and the solid in medium `i` of `media`, with `commonIonM`
 * of its counter-ion already there: solubilityAtPh's values. The salt must have passed the profile's
 * checks (checkProfileInput) for this drug, as every row's profile does before its media. The returned
 * object is reused by the next call.
 */
export function saltInMedium(
  ctx: ScreenContext,
  salt: ProfileSalt,
  media: readonly MediumOfScreen[],
  i: number,
  commonIonM: number,
): MediumPoint {
  const side = drugSide(ctx, media, i);
  const pH = media[i]!.pH;
  if (!side.ideal || commonIonM !== 0) {
    // solubilityAtPh's steps: the drug and the pH are checked already (context, drugSide)
    const o = { activity: side.activity, commonIonM };
    const p = ctx.drugProtolyte;
    const system = checkedSystem(p, ctx.drug.ionCharge, salt, o);
    const pt = pointAt(p, ctx.log10IntrinsicM.value, system, pH);
    point.solubilityM = pt.solubilityM;
    point.solid = pt.solid;
    return point;
  }
  // solveCheckedSalt without a common ion and with ideal activities (log₁₀ γ term 0), then pointAt
  const m = salt.drugPerSalt;
  const laX = log10ChargeFraction(salt.counterIon, pH, salt.counterIonCharge);
  const u = saltLog10FormulaUnitsRaw(m, salt.counterIonPerSalt, side.laD, laX, salt.log10Ksp);
  const free = side.freeM;
  point.solubilityM = free;
  point.solid = 'free-form';
  if (u > SALT_LOG10_S_LIMITS.max) return point; // the salt does not limit (`unbounded`)
  const saltM = m * 10 ** (u < SALT_LOG10_S_LIMITS.min ? SALT_LOG10_S_LIMITS.min : u);
  if (saltM < free) {
    point.solubilityM = saltM;
    point.solid = 'salt';
  }
  return point;
}
