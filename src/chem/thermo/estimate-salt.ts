import { ChemInputError, type Estimate } from '../result';
import { hydrationEnthalpyKJ } from './models/hydration/hydration';
import {
  BORN_LANDE_SOURCES,
  BORN_MAYER_SOURCES,
  isStructureType,
} from './models/born-mayer/born-mayer';
import { KAPUSTINSKII_SOURCES } from './models/kapustinskii/kapustinskii';
import { VBT_SOURCES } from './models/vbt/vbt';
import {
  formulaUnitVolume,
  rawLattice,
  requireBalanced,
  requireIon,
  type RawLattice,
} from './lattice';
import type { LatticeMethod, SaltThermoRequest, SaltThermoResult } from './thermo.types';
import {
  latticeStats,
  publishedHydrationClosure,
  type LatticeVariant,
} from './validation/validation';
import {
  calibratedRelU,
  cellLabel,
  chargeClassOf,
  findLatticeFactor,
  SHIPPED_LATTICE_CALIBRATION,
} from './calibration/calibration';
import type { CalibratedVariant, LatticeCalibration } from './calibration/calibration.types';

/**
 * How the lattice enthalpy is calibrated. `calibrate` (default true) applies the shipped calibration
 * (calibration/calibration.data.ts); `false` gives the raw model. `calibration` replaces the shipped
 * coefficients — used by the leave-one-salt-out validation, which refits without each salt.
 */
export interface LatticeCalibrationOptions {
  calibrate?: boolean;
  calibration?: LatticeCalibration;
}

/** The result of {@link estimateSaltThermo}: the calibrated figures plus the raw lattice enthalpy beside them. */
export interface CalibratedSaltThermoResult extends SaltThermoResult {
  /** The lattice model's own figure before calibration, with the raw model's measured uncertainty. */
  rawLatticeEnthalpyKJ: Estimate;
  /** The factor applied (1 when not calibrated) and why. */
  latticeCalibration: { applied: boolean; factor: number; note: string };
}

/** The sign convention every result states. */
export const SIGN_CONVENTION =
  'ΔH_L is the lattice dissociation enthalpy, > 0 for MₚXq(s) → p Mᶻ⁺(g) + q Xᶻ⁻(g) (the lattice formation enthalpy is the same number with a minus sign); ΔH_hyd < 0 for one gaseous ion → aqueous ion, absolute scale of Marcus (ΔH_hyd(H⁺) = −1103 kJ/mol as implied by his Na⁺ value and the NBS tables); ΔH_sol = ΔH_L + p·ΔH_hyd,+ + q·ΔH_hyd,− at infinite dilution, 298.15 K, kJ/mol per formula unit.';

/** Where the calibration factors come from. */
const CALIBRATION_SOURCE =
  'calibration factor fitted on the bundled lattice reference salts (Born–Haber halides from the NBS tables of Wagman et al. 1982 and CRC/NIST ionisation energies and electron affinities; solution-cycle salts from NBS ΔfH° and Marcus hydration enthalpies) by calibration/fit-calibration.ts';

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
  return req.cation.shape === 'monatomic' &&
    req.anion.shape === 'monatomic' &&
    !req.cation.estimatedSize &&
    !req.anion.estimatedSize
    ? 'halides'
    : 'polyatomic';
}

/** Relative model error (RMS over the matching reference group) of a raw computation, fraction. */
function modelRelU(
  raw: RawLattice,
  group: 'halides' | 'polyatomic',
): { rel: number; basis: string } {
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

/** The raw model's estimate: its value, and its RMS error on the matching reference group as uncertainty. */
function rawEstimate(req: SaltThermoRequest, raw: RawLattice, method: LatticeMethod): Estimate {
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

/**
 * Lattice enthalpy by a named method with its measured uncertainty: calibrated by default (factor per
 * method and charge class, uncertainty = the leave-one-salt-out RMS error of the calibrated model on the
 * reference salts of the same kind), raw with `calibrate: false` or where no factor exists. `rawEstimate`
 * is always the uncalibrated figure.
 */
export function latticeEnthalpyEstimate(
  req: SaltThermoRequest,
  method: LatticeMethod,
  opts: LatticeCalibrationOptions = {},
): {
  estimate: Estimate;
  raw: RawLattice;
  rawEstimate: Estimate;
  factor: number;
  calibrationNote: string;
} {
  const raw = rawLattice(req, method);
  const rawEst = rawEstimate(req, raw, method);
  if (opts.calibrate === false) {
    return {
      estimate: rawEst,
      raw,
      rawEstimate: rawEst,
      factor: 1,
      calibrationNote: 'not calibrated (calibrate: false): the raw model',
    };
  }
  const cal = opts.calibration ?? SHIPPED_LATTICE_CALIBRATION;
  const variant = variantOf(raw) as CalibratedVariant;
  const cls = chargeClassOf(req.cation.charge, req.anion.charge);
  const group = groupOf(req);
  const f = findLatticeFactor(cal, variant, cls, group);
  if (!f) {
    const kind = group === 'halides' ? 'monatomic-ion' : 'polyatomic-ion';
    const w = cal.withheld.find(
      (x) => x.variant === variant && x.chargeClass === cls && x.group === group,
    );
    const why = w
      ? `on the ${cellLabel(w)} the calibrated ${variant} did no better than the raw one, leave-one-salt-out (RMS ${w.crossValidated.rmsPercent.toFixed(1)} % vs ${w.raw.rmsPercent.toFixed(1)} %)`
      : `fewer than ${cal.minSalts} ${cls} ${kind} reference salts for ${variant}`;
    const note = `not calibrated: ${why}; the raw model and its raw uncertainty`;
    return {
      estimate: { ...rawEst, notes: [note, ...(rawEst.notes ?? [])] },
      raw,
      rawEstimate: rawEst,
      factor: 1,
      calibrationNote: note,
    };
  }
  const u = calibratedRelU(f);
  const s = sizeRelU(raw, req);
  const rel = Math.hypot(u.rel, s);
  const value = f.factor * raw.enthalpyKJ;
  const note = `calibrated: raw ${raw.enthalpyKJ.toFixed(1)} kJ/mol × ${f.factor.toFixed(4)} (median ratio reference/model over ${cellLabel(f)})`;
  const notes = [
    note,
    raw.detail,
    `uncertainty: ${u.basis}${s ? `, plus ${(s * 100).toFixed(1)} % from the estimated ion size` : ''}`,
  ];
  if (raw.distanceFrom === 'radii')
    notes.push('r₀ from the sum of six-coordinate radii, not a measured cell');
  return {
    raw,
    rawEstimate: rawEst,
    factor: f.factor,
    calibrationNote: note,
    estimate: {
      value,
      uncertainty: value * rel,
      method,
      sources: [...METHOD_SOURCES[method], CALIBRATION_SOURCE],
      notes,
    },
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
  if (req.structureType && isStructureType(req.structureType) && vol && vol.from !== 'ion-volumes')
    out.push('born-mayer');
  return out;
}

/**
 * Lattice, hydration and solution enthalpies of a salt M_pX_q, each with a measured uncertainty.
 *
 * The lattice enthalpy is calibrated by default (calibration/calibration.ts: one factor per method and
 * charge class, fitted on the bundled reference salts, its uncertainty the leave-one-salt-out RMS error);
 * the raw model's figure stays in `rawLatticeEnthalpyKJ` and in the notes. `calibrate: false` returns the
 * raw model throughout.
 *
 * `method: 'auto'` (the default) runs every method the inputs allow — VBT when a formula-unit volume, a
 * density or both ions' volumes are known; Kapustinskii when both ions have radii; Born–Mayer when a cubic
 * structure type and a measured volume are given — and picks the one with the lowest relative uncertainty
 * (the cross-validated error of the calibrated model, or the raw model's RMS error with `calibrate: false`)
 * on the bundled reference salts of the same kind, saying so.
 *
 * ΔH_sol is a small difference of large numbers: its uncertainty, from the lattice and hydration
 * uncertainties in quadrature (treated as independent — a conservative choice, as part of the model errors
 * cancel between salts of one drug ion), is usually larger than its value. Compare counter-ions for one
 * drug ion rather than reading one absolute ΔH_sol.
 */
export function estimateSaltThermo(
  req: SaltThermoRequest & LatticeCalibrationOptions,
): CalibratedSaltThermoResult {
  if (!req || typeof req !== 'object')
    throw new ChemInputError(
      'request',
      'missing request',
      'an object with cation, anion, cationsPerFormula, anionsPerFormula',
    );
  requireIon(req.cation, 'cation', 1);
  requireIon(req.anion, 'anion', -1);
  const { p, q } = requireBalanced(req);
  const requested = req.method ?? 'auto';
  const calOpts: LatticeCalibrationOptions = {
    ...(req.calibrate === false ? { calibrate: false } : {}),
    ...(req.calibration ? { calibration: req.calibration } : {}),
  };
  let chosen: ReturnType<typeof latticeEnthalpyEstimate>;
  let reason: string;
  if (requested === 'auto') {
    const methods = applicableMethods(req, p, q);
    if (methods.length === 0) {
      throw new ChemInputError(
        'cation/anion',
        'no lattice method applies: give ions with radii or volumes, or a formula-unit volume or density',
        'bundled ions, formula or SMILES ions, formulaUnitVolumeNm3 or densityGPerCm3',
      );
    }
    const group = groupOf(req);
    const errors: unknown[] = [];
    const ranked = methods
      .flatMap((m) => {
        try {
          const r = latticeEnthalpyEstimate(req, m, calOpts);
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
    reason = `auto: ${best.m} has the lowest ${calOpts.calibrate === false ? 'measured' : 'stated (cross-validated where calibrated)'} uncertainty (${(best.rel * 100).toFixed(1)} %) among the methods these inputs allow (${ranked.map((r) => `${r.m} ${(r.rel * 100).toFixed(1)} %`).join(', ')}), measured on the bundled ${group === 'halides' ? 'monatomic-ion' : 'polyatomic-ion'} reference salts`;
  } else {
    if (!['kapustinskii', 'born-mayer', 'born-lande', 'vbt'].includes(requested)) {
      throw new ChemInputError(
        'method',
        `unknown method ${String(requested)}`,
        'auto, kapustinskii, born-mayer, born-lande, vbt',
      );
    }
    chosen = latticeEnthalpyEstimate(req, requested, calOpts);
    reason = `requested: ${requested}`;
  }
  const perIon = publishedHydrationClosure().perIonKJ;
  const t = req.temperatureK !== undefined ? { temperatureK: req.temperatureK } : {};
  const hc = hydrationEnthalpyKJ(req.cation, { ...t, perIonPublishedUncertaintyKJ: perIon });
  const ha = hydrationEnthalpyKJ(req.anion, { ...t, perIonPublishedUncertaintyKJ: perIon });
  const lat = chosen.estimate;
  const solValue = lat.value + p * hc.value + q * ha.value;
  const solU = Math.sqrt(
    lat.uncertainty ** 2 + (p * hc.uncertainty) ** 2 + (q * ha.uncertainty) ** 2,
  );
  const solution: Estimate = {
    value: solValue,
    uncertainty: solU,
    method: 'hess-law',
    sources: [...new Set([...lat.sources, ...hc.sources, ...ha.sources])],
    notes: [
      `ΔH_sol = ΔH_L + ${p}·ΔH_hyd(${req.cation.label}) + ${q}·ΔH_hyd(${req.anion.label}): a small difference of large numbers (${lat.value.toFixed(0)} vs ${(-(p * hc.value + q * ha.value)).toFixed(0)} kJ/mol)`,
      'uncertainties combined in quadrature as if independent; differences between counter-ions for one drug ion are better determined than this absolute value',
      chosen.factor !== 1
        ? `ΔH_L ${chosen.calibrationNote}; uncalibrated ΔH_sol would be ${(chosen.raw.enthalpyKJ + p * hc.value + q * ha.value).toFixed(1)} kJ/mol`
        : `ΔH_L ${chosen.calibrationNote}`,
    ],
  };
  const result: CalibratedSaltThermoResult = {
    latticeEnthalpyKJ: lat,
    rawLatticeEnthalpyKJ: chosen.rawEstimate,
    latticeCalibration: {
      applied: chosen.factor !== 1,
      factor: chosen.factor,
      note: chosen.calibrationNote,
    },
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
