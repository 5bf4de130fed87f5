import { ChemInputError, type Estimate } from '../result';
import { hydrationEnthalpyKJ } from './models/hydration/hydration';
import { BORN_LANDE_SOURCES, BORN_MAYER_SOURCES, isStructureType } from './models/born-mayer/born-mayer';
import { KAPUSTINSKII_SOURCES } from './models/kapustinskii/kapustinskii';
import { VBT_SOURCES } from './models/vbt/vbt';
import { formulaUnitVolume, rawLattice, requireBalanced, requireIon, type RawLattice } from './lattice';
import type { LatticeMethod, SaltThermoRequest, SaltThermoResult } from './thermo.types';
import { latticeStats, publishedHydrationClosure, type LatticeVariant } from './validation/validation';

/** The sign convention every result states. */
export const SIGN_CONVENTION =
  'ΔH_L is the lattice dissociation enthalpy, > 0 for MₚXq(s) → p Mᶻ⁺(g) + q Xᶻ⁻(g) (the lattice formation enthalpy is the same number with a minus sign); ΔH_hyd < 0 for one gaseous ion → aqueous ion, absolute scale of Marcus (ΔH_hyd(H⁺) = −1103 kJ/mol as implied by his Na⁺ value and the NBS tables); ΔH_sol = ΔH_L + p·ΔH_hyd,+ + q·ΔH_hyd,− at infinite dilution, 298.15 K, kJ/mol per formula unit.';

const METHOD_SOURCES: Record<LatticeMethod, string[]> = {
  kapustinskii: KAPUSTINSKII_SOURCES,
  'born-mayer': BORN_MAYER_SOURCES,
  'born-lande': BORN_LANDE_SOURCES,
  vbt: VBT_SOURCES,
};

/** Which validation variant measures the error of a raw lattice computation. */
function variantOf(raw: RawLattice): LatticeVariant {
  if (raw.method === 'vbt') return raw.volumeFrom === 'ion-volumes' ? 'vbt-ion-volumes' : 'vbt';
  return raw.method;
}

function groupOf(req: SaltThermoRequest): 'halides' | 'polyatomic' {
  return req.cation.shape === 'monatomic' && req.anion.shape === 'monatomic' && !req.cation.estimatedSize && !req.anion.estimatedSize ? 'halides' : 'polyatomic';
}

/** Relative model error (RMS over the matching reference group) of a raw computation, fraction. */
function modelRelU(raw: RawLattice, group: 'halides' | 'polyatomic'): { rel: number; basis: string } {
  const variant = variantOf(raw);
  let stats;
  try {
    stats = latticeStats(variant, group);
  } catch {
    stats = latticeStats(variant, 'all');
  }
  return { rel: stats.rmsPercentError / 100, basis: `RMS error ${stats.rmsPercentError.toFixed(1)} % of ${stats.label} on ${stats.n} reference salts (${stats.group})` };
}

/** Extra relative uncertainty from ion sizes that are themselves estimates (organic ions). */
function sizeRelU(raw: RawLattice, req: SaltThermoRequest): number {
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

/** Lattice enthalpy with calibrated uncertainty, by a named method. */
export function latticeEnthalpyEstimate(req: SaltThermoRequest, method: LatticeMethod): { estimate: Estimate; raw: RawLattice } {
  const raw = rawLattice(req, method);
  const m = modelRelU(raw, groupOf(req));
  const s = sizeRelU(raw, req);
  const rel = Math.hypot(m.rel, s);
  const notes = [raw.detail, `uncertainty: ${m.basis}${s ? `, plus ${(s * 100).toFixed(1)} % from the estimated ion size` : ''}`];
  if (raw.distanceFrom === 'radii') notes.push('r₀ from the sum of six-coordinate radii, not a measured cell');
  return {
    raw,
    estimate: { value: raw.enthalpyKJ, uncertainty: raw.enthalpyKJ * rel, method, sources: METHOD_SOURCES[method], notes },
  };
}

/** The methods that can run on a request, in order of preference for ties. */
function applicableMethods(req: SaltThermoRequest, p: number, q: number): LatticeMethod[] {
  const out: LatticeMethod[] = [];
  const vol = (() => {
    try {
      return formulaUnitVolume(req, p, q);
    } catch {
      return undefined;
    }
  })();
  if (vol) out.push('vbt');
  if (req.cation.radiusA && req.anion.radiusA) out.push('kapustinskii');
  if (req.structureType && isStructureType(req.structureType) && vol && vol.from !== 'ion-volumes') out.push('born-mayer');
  return out;
}

/**
 * Lattice, hydration and solution enthalpies of a salt M_pX_q, each with a calibrated uncertainty.
 *
 * `method: 'auto'` (the default) runs every method the inputs allow — VBT when a formula-unit volume, a
 * density or both ions' volumes are known; Kapustinskii when both ions have radii; Born–Mayer when a cubic
 * structure type and a measured volume are given — and picks the one with the lowest RMS error on the
 * bundled reference salts of the same kind (monatomic-ion halides vs salts with a polyatomic ion), saying so.
 *
 * ΔH_sol is a small difference of large numbers: its uncertainty, from the lattice and hydration
 * uncertainties in quadrature (treated as independent — a conservative choice, as part of the model errors
 * cancel between salts of one drug ion), is usually larger than its value. Compare counter-ions for one
 * drug ion rather than reading one absolute ΔH_sol.
 */
export function estimateSaltThermo(req: SaltThermoRequest): SaltThermoResult {
  if (!req || typeof req !== 'object') throw new ChemInputError('request', 'missing request', 'an object with cation, anion, cationsPerFormula, anionsPerFormula');
  requireIon(req.cation, 'cation', 1);
  requireIon(req.anion, 'anion', -1);
  const { p, q } = requireBalanced(req);
  const requested = req.method ?? 'auto';
  let chosen: { estimate: Estimate; raw: RawLattice };
  let reason: string;
  if (requested === 'auto') {
    const methods = applicableMethods(req, p, q);
    if (methods.length === 0) {
      throw new ChemInputError('cation/anion', 'no lattice method applies: give ions with radii or volumes, or a formula-unit volume or density', 'bundled ions, formula or SMILES ions, formulaUnitVolumeNm3 or densityGPerCm3');
    }
    const group = groupOf(req);
    const errors: unknown[] = [];
    const ranked = methods
      .flatMap((m) => {
        try {
          const r = latticeEnthalpyEstimate(req, m);
          return [{ m, r, rel: r.estimate.uncertainty / r.estimate.value }];
        } catch (err) {
          errors.push(err);
          return [];
        }
      })
      .sort((a, b) => a.rel - b.rel);
    const best = ranked[0];
    if (!best) throw errors[0];
    chosen = best.r;
    reason = `auto: ${best.m} has the lowest calibrated uncertainty (${(best.rel * 100).toFixed(1)} %) among the methods these inputs allow (${ranked.map((r) => `${r.m} ${(r.rel * 100).toFixed(1)} %`).join(', ')}), measured on the bundled ${group === 'halides' ? 'monatomic-ion' : 'polyatomic-ion'} reference salts`;
  } else {
    if (!['kapustinskii', 'born-mayer', 'born-lande', 'vbt'].includes(requested)) {
      throw new ChemInputError('method', `unknown method ${String(requested)}`, 'auto, kapustinskii, born-mayer, born-lande, vbt');
    }
    chosen = latticeEnthalpyEstimate(req, requested);
    reason = `requested: ${requested}`;
  }
  const perIon = publishedHydrationClosure().perIonKJ;
  const t = req.temperatureK !== undefined ? { temperatureK: req.temperatureK } : {};
  const hc = hydrationEnthalpyKJ(req.cation, { ...t, perIonPublishedUncertaintyKJ: perIon });
  const ha = hydrationEnthalpyKJ(req.anion, { ...t, perIonPublishedUncertaintyKJ: perIon });
  const lat = chosen.estimate;
  const solValue = lat.value + p * hc.value + q * ha.value;
  const solU = Math.sqrt(lat.uncertainty ** 2 + (p * hc.uncertainty) ** 2 + (q * ha.uncertainty) ** 2);
  const solution: Estimate = {
    value: solValue,
    uncertainty: solU,
    method: 'hess-law',
    sources: [...new Set([...lat.sources, ...hc.sources, ...ha.sources])],
    notes: [
      `ΔH_sol = ΔH_L + ${p}·ΔH_hyd(${req.cation.label}) + ${q}·ΔH_hyd(${req.anion.label}): a small difference of large numbers (${lat.value.toFixed(0)} vs ${(-(p * hc.value + q * ha.value)).toFixed(0)} kJ/mol)`,
      'uncertainties combined in quadrature as if independent; differences between counter-ions for one drug ion are better determined than this absolute value',
    ],
  };
  const result: SaltThermoResult = {
    latticeEnthalpyKJ: lat,
    cationHydrationKJ: hc,
    anionHydrationKJ: ha,
    solutionEnthalpyKJ: solution,
    methodChosen: chosen.raw.method,
    methodReason: reason,
    signConvention: SIGN_CONVENTION,
  };
  if (chosen.raw.volumeNm3 !== undefined) {
    result.formulaUnitVolumeNm3 = {
      value: chosen.raw.volumeNm3,
      uncertainty: chosen.raw.volumeNm3 * (chosen.raw.volumeRelU ?? 0),
      method: chosen.raw.volumeFrom ?? 'given',
      sources: [],
    };
  }
  return result;
}
