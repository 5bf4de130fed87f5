/**
 * ΔH_sol of a salt, numbers first: the value, its 1σ, the method ('hess-law') and the sources that
 * `estimateSaltThermo` (estimate-salt.ts) gives for a request with `method: 'auto'` and the shipped
 * calibration — by the same operations in the same order, so the same doubles, and with the same
 * errors — without the words (each lattice method's notes, the method-choice reason, the cycle's
 * notes) nobody reads when the value only feeds a screen's row. The screen's library candidates take
 * it (screening/thermo-link.ts); the Energetics area and `saltsmith lattice` keep the full result of
 * estimateSaltThermo, which stays the reference (tests/chem/thermo/solution-enthalpy-numbers.test.ts
 * compares both with Object.is).
 */
import type { Estimate } from '../result';
import {
  chargeClassOf,
  findLatticeFactor,
  SHIPPED_LATTICE_CALIBRATION,
} from './calibration/calibration';
import type {
  CalibratedVariant,
  ChargeClass,
  LatticeFactor,
} from './calibration/calibration.types';
import { uniqueInOrder } from './hess-law-assembly';
import { rawLatticeNumbersOf } from './lattice';
import { CALIBRATION_SOURCE } from './lattice-estimate';
import { checkSaltRequest, type CheckedSaltRequest } from './lattice-inputs';
import { applicableMethods, noLatticeMethod } from './lattice-method-choice';
import {
  groupOf,
  METHOD_SOURCES,
  modelRelFraction,
  sizeRelU,
  variantOf,
  type ReferenceGroup,
} from './lattice-uncertainty';
import { hydrationNumbersKJ } from './models/hydration/hydration-enthalpy';
import type { LatticeMethod, SaltThermoRequest } from './thermo.types';
import { publishedHydrationClosure } from './validation/validation';

/** One lattice method's calibrated figure, as latticeEnthalpyEstimate's `estimate` has it. */
interface LatticeNumbers {
  value: number;
  uncertainty: number;
  sources: readonly string[];
  /** uncertainty / value: what `auto` ranks the methods by. */
  rel: number;
}

/** The calibrated figure's sources per method ([...METHOD_SOURCES[m], CALIBRATION_SOURCE]), made once. */
const CALIBRATED_SOURCES = new Map<LatticeMethod, readonly string[]>();
function calibratedSources(method: LatticeMethod): readonly string[] {
  let s = CALIBRATED_SOURCES.get(method);
  if (!s) CALIBRATED_SOURCES.set(method, (s = [...METHOD_SOURCES[method], CALIBRATION_SOURCE]));
  return s;
}

/** findLatticeFactor on the shipped calibration, memoised per cell (variant × charge class × group). */
const SHIPPED_FACTOR_CELLS: Partial<
  Record<
    CalibratedVariant,
    Partial<Record<ChargeClass, Partial<Record<ReferenceGroup, LatticeFactor | null>>>>
  >
> = {};
function shippedFactor(
  variant: CalibratedVariant,
  cls: ChargeClass,
  group: ReferenceGroup,
): LatticeFactor | undefined {
  const byClass = (SHIPPED_FACTOR_CELLS[variant] ??= {});
  const byGroup = (byClass[cls] ??= {});
  let f = byGroup[group];
  if (f === undefined) {
    f = findLatticeFactor(SHIPPED_LATTICE_CALIBRATION, variant, cls, group) ?? null;
    byGroup[group] = f;
  }
  return f ?? undefined;
}

/** latticeEnthalpyEstimate(c, method)'s value, 1σ and sources (shipped calibration), same doubles. */
function latticeNumbers(
  c: CheckedSaltRequest,
  method: LatticeMethod,
  group: ReferenceGroup,
): LatticeNumbers {
  const { req } = c;
  const raw = rawLatticeNumbersOf(c, method);
  const variant = variantOf(raw) as CalibratedVariant;
  const cls = chargeClassOf(req.cation.charge, req.anion.charge);
  const f = shippedFactor(variant, cls, group);
  if (!f) {
    // the raw estimate (rawEstimate in lattice-uncertainty.ts). Where a factor applies it is not
    // needed: the validation behind it (computed once per thread, ~40 ms) is then never built; it
    // cannot fail for a known variant (latticeStats falls back to the variant's 'all' figures)
    const rawRel = Math.hypot(modelRelFraction(variantOf(raw), group), sizeRelU(raw, req));
    const uncertainty = raw.enthalpyKJ * rawRel;
    const value = raw.enthalpyKJ;
    return { value, uncertainty, sources: METHOD_SOURCES[method], rel: uncertainty / value };
  }
  const rel = Math.hypot(f.crossValidated.rmsPercent / 100, sizeRelU(raw, req));
  const value = f.factor * raw.enthalpyKJ;
  const uncertainty = value * rel;
  return { value, uncertainty, sources: calibratedSources(method), rel: uncertainty / value };
}

/**
 * The `auto` choice (chooseLatticeEstimate): every applicable method's figure, the lowest relative
 * uncertainty kept — ranked as the same stable sort ranks them, so ties and NaN fall as they do there;
 * when every method fails, the first error.
 */
function autoLattice(c: CheckedSaltRequest): LatticeNumbers {
  const methods = applicableMethods(c);
  if (methods.length === 0) throw noLatticeMethod();
  const group = groupOf(c.req);
  let firstError: unknown;
  let failed = false;
  const ranked: LatticeNumbers[] = [];
  for (const m of methods) {
    try {
      ranked.push(latticeNumbers(c, m, group));
    } catch (err) {
      if (!failed) firstError = err;
      failed = true;
    }
  }
  if (ranked.length === 0) throw firstError;
  // two methods (VBT and Kapustinskii, a screen's usual pair): the sort's first element without the
  // sort — the second only when it compares lower, as a stable sort keeps it (NaN keeps the order)
  if (ranked.length === 2) return ranked[1]!.rel - ranked[0]!.rel < 0 ? ranked[1]! : ranked[0]!;
  if (ranked.length > 1) ranked.sort((a, b) => a.rel - b.rel);
  return ranked[0]!;
}

/**
 * One ion's hydration numbers at 298.15 K, memoised per ion record in a WeakMap (bounded by the ions
 * alive: a screen's counter-ions are shared records, its drug ion serves every salt of one compound);
 * at another temperature, computed each time (the published values' closure share is the one fixed
 * figure of publishedHydrationClosure). Failures are not kept: they are thrown again.
 */
type HydrationFigures = ReturnType<typeof hydrationNumbersKJ>;
const HYDRATION_AT_298K = new WeakMap<object, HydrationFigures>();
function hydrationOf(
  ion: SaltThermoRequest['cation'],
  opts: { temperatureK?: number; perIonPublishedUncertaintyKJ: number },
): HydrationFigures {
  if (opts.temperatureK !== undefined) return hydrationNumbersKJ(ion, opts);
  let h = HYDRATION_AT_298K.get(ion);
  if (h === undefined) {
    h = hydrationNumbersKJ(ion, opts);
    HYDRATION_AT_298K.set(ion, h);
  }
  return h;
}

/**
 * ΔH_sol = ΔH_L + p·ΔH_hyd,+ + q·ΔH_hyd,− of M_pX_q (kJ/mol per formula unit) with its 1σ, as
 * `estimateSaltThermo({ ...req, method: 'auto' }).solutionEnthalpyKJ` gives them (same doubles, same
 * sources, same errors), without its notes.
 */
export function solutionEnthalpyNumbersKJ(req: Omit<SaltThermoRequest, 'method'>): Estimate {
  const c = checkSaltRequest(req);
  const lat = autoLattice(c);
  const { p, q } = c;
  const perIonPublishedUncertaintyKJ = publishedHydrationClosure().perIonKJ;
  const hydrationOpts =
    req.temperatureK !== undefined
      ? { temperatureK: req.temperatureK, perIonPublishedUncertaintyKJ }
      : { perIonPublishedUncertaintyKJ };
  const hc = hydrationOf(req.cation, hydrationOpts);
  const ha = hydrationOf(req.anion, hydrationOpts);
  return {
    value: lat.value + p * hc.value + q * ha.value,
    uncertainty: Math.sqrt(
      lat.uncertainty ** 2 + (p * hc.uncertainty) ** 2 + (q * ha.uncertainty) ** 2,
    ),
    method: 'hess-law',
    sources: uniqueInOrder(lat.sources, hc.sources, ha.sources),
  };
}
