/**
 * The raw (uncalibrated) lattice model's uncertainty: the RMS error of the method on the bundled
 * reference salts of the same kind, plus the share that comes from ion sizes that are themselves
 * estimates.
 */
import type { Estimate } from '../result';
import { BORN_LANDE_SOURCES, BORN_MAYER_SOURCES } from './models/born-mayer/born-mayer';
import { KAPUSTINSKII_SOURCES } from './models/kapustinskii/kapustinskii';
import { VBT_SOURCES } from './models/vbt/vbt';
import type { RawLattice, RawLatticeNumbers } from './lattice';
import type { LatticeMethod, SaltThermoRequest } from './thermo.types';
import { latticeStats, type LatticeVariant } from './validation/validation';

/** The kind of reference salt a request resembles, which picks the error figure that applies. */
export type ReferenceGroup = 'halides' | 'polyatomic';

/** The published sources behind each lattice method. */
export const METHOD_SOURCES: Record<LatticeMethod, string[]> = {
  kapustinskii: KAPUSTINSKII_SOURCES,
  'born-mayer': BORN_MAYER_SOURCES,
  'born-lande': BORN_LANDE_SOURCES,
  vbt: VBT_SOURCES,
};

/** Which validation variant measures the error of a raw lattice computation. */
export function variantOf(raw: RawLatticeNumbers): LatticeVariant {
  if (raw.method === 'vbt') return raw.volumeFrom === 'ion-volumes' ? 'vbt-ion-volumes' : 'vbt';
  return raw.method;
}

/** Monatomic ions of tabulated size compare with the halides; anything else with the polyatomic salts. */
export function groupOf(req: SaltThermoRequest): ReferenceGroup {
  return req.cation.shape === 'monatomic' &&
    req.anion.shape === 'monatomic' &&
    !req.cation.estimatedSize &&
    !req.anion.estimatedSize
    ? 'halides'
    : 'polyatomic';
}

/** Relative model error (RMS over the matching reference group) of a raw computation, fraction. */
function modelRelU(raw: RawLattice, group: ReferenceGroup): { rel: number; basis: string } {
  const variant = variantOf(raw);
  let stats;
  try {
    stats = latticeStats(variant, group);
  } catch {
    stats = latticeStats(variant, 'all');
  }
  return {
    rel: stats.rmsPercentError / 100,
    basis: `RMS error ${stats.rmsPercentError.toFixed(1)} % of ${stats.label} on ${stats.n} reference salts (${stats.group})`,
  };
}

/** modelRelFraction's figures, filled on first use. */
const MODEL_REL_MEMO: Partial<Record<LatticeVariant, Partial<Record<ReferenceGroup, number>>>> = {};

/**
 * {@link modelRelU}'s fraction alone, memoised per variant and group (the validation figures are fixed
 * once computed): the numbers-first ΔH_sol (solution-enthalpy-numbers.ts) reads it for every method tried.
 */
export function modelRelFraction(variant: LatticeVariant, group: ReferenceGroup): number {
  const byGroup = (MODEL_REL_MEMO[variant] ??= {});
  let rel = byGroup[group];
  if (rel === undefined) {
    let stats;
    try {
      stats = latticeStats(variant, group);
    } catch {
      stats = latticeStats(variant, 'all');
    }
    rel = stats.rmsPercentError / 100;
    byGroup[group] = rel;
  }
  return rel;
}

/** Extra relative uncertainty from ion sizes that are themselves estimates (organic ions). */
export function sizeRelU(raw: RawLatticeNumbers, req: SaltThermoRequest): number {
  const { cation: c, anion: a } = req;
  if (!c.estimatedSize && !a.estimatedSize) return 0;
  if (raw.method === 'vbt' && raw.volumeFrom === 'ion-volumes') return (raw.volumeRelU ?? 0) / 3;
  if (raw.method === 'kapustinskii') {
    const rc = c.radiusA!;
    const ra = a.radiusA!;
    return Math.hypot(rc.uncertainty, ra.uncertainty) / (rc.value + ra.value);
  }
  return 0;
}

/** The raw model's estimate: its value, and its RMS error on the matching reference group as uncertainty. */
export function rawEstimate(
  req: SaltThermoRequest,
  raw: RawLattice,
  method: LatticeMethod,
): Estimate {
  const m = modelRelU(raw, groupOf(req));
  const s = sizeRelU(raw, req);
  const rel = Math.hypot(m.rel, s);
  const notes = [
    raw.detail,
    `uncertainty: ${m.basis}${s ? `, plus ${(s * 100).toFixed(1)} % from the estimated ion size` : ''}`,
  ];
  if (raw.distanceFrom === 'radii')
    notes.push('r₀ from the sum of six-coordinate radii, not a measured cell');
  return {
    value: raw.enthalpyKJ,
    uncertainty: raw.enthalpyKJ * rel,
    method,
    sources: METHOD_SOURCES[method],
    notes,
  };
}
