import { COULOMB_KJ_A_PER_MOL, STANDARD_TEMPERATURE_K } from '../../../constants/physical';
import {
  WATER_DPERMITTIVITY_DT_298K_PER_K,
  WATER_RELATIVE_PERMITTIVITY_298K,
} from '../../../constants/water';
import { THERMO_IONS } from '../../../data/thermo-ions';
import { ChemInputError, requireFiniteInRange } from '../../../result';
import { getThermoIon } from '../../ions';
import type { ThermoIon } from '../../thermo.types';
import { organicIonFromFormula } from '../ion-volume/ion-volume';

/** Relative permittivity of water at 298.15 K and its slope: one definition, in constants/water.ts (Archer & Wang 1990). */
const WATER_PERMITTIVITY = WATER_RELATIVE_PERMITTIVITY_298K;
const WATER_DPERMITTIVITY_DT_PER_K = WATER_DPERMITTIVITY_DT_298K_PER_K;

/**
 * Born enthalpy factor [1 − 1/ε_r − (T/ε_r²)(∂ε_r/∂T)] at temperature T (the permittivity data are for
 * 298.15 K; other temperatures within ±30 K use the same ε_r and slope — an approximation).
 */
export function bornEnthalpyFactor(temperatureK = STANDARD_TEMPERATURE_K): number {
  const t = requireFiniteInRange('temperatureK', temperatureK, 250, 400, 'K');
  return 1 - 1 / WATER_PERMITTIVITY - (t / WATER_PERMITTIVITY ** 2) * WATER_DPERMITTIVITY_DT_PER_K;
}

/**
 * Born hydration enthalpy, kJ/mol (< 0): ΔH_hyd = −(N_A e²/8πε₀)·z²/r_eff·[1 − 1/ε_r − (T/ε_r²)(∂ε_r/∂T)],
 * N_A e²/8πε₀ = 694.68 kJ·Å·mol⁻¹ (half the CODATA 2018 molar Coulomb constant), r_eff in Å.
 * Source: M. Born, Z. Phys. 1 (1920) 45 (free energy); enthalpy form by Gibbs–Helmholtz.
 */
export function bornHydrationEnthalpyKJ(
  charge: number,
  effectiveRadiusA: number,
  temperatureK = STANDARD_TEMPERATURE_K,
): number {
  const z = requireFiniteInRange('charge', charge, -4, 4);
  if (z === 0)
    throw new ChemInputError(
      'charge',
      'an ion needs a non-zero charge',
      'whole numbers −4…−1 or +1…+4',
    );
  const r = requireFiniteInRange('effectiveRadiusA', effectiveRadiusA, 0.3, 20, 'Å');
  return (-(COULOMB_KJ_A_PER_MOL / 2) * z * z * bornEnthalpyFactor(temperatureK)) / r;
}

/** The radius the Born model uses for an ion: Shannon crystal radius for monatomic ions, else its thermochemical radius. */
export function bornRadiusA(ion: ThermoIon): number | undefined {
  return ion.shape === 'monatomic'
    ? (ion.crystalRadiusA?.value ?? ion.radiusA?.value)
    : ion.radiusA?.value;
}

export interface HydrationFitRow {
  id: string;
  label: string;
  charge: number;
  radiusA: number;
  publishedKJ: number;
  fittedKJ: number;
  errorPercent: number;
  source: string;
}
export interface BornOffsetFit {
  /** Offset δ added to the radius of cations, Å. */
  cationOffsetA: number;
  /** Offset δ added to the radius of anions, Å. */
  anionOffsetA: number;
  /** RMS relative residual of the fit, cations and anions. */
  cationRmsFraction: number;
  anionRmsFraction: number;
  rows: HydrationFitRow[];
  /** Ions of estimated size (tetraalkylammonium, acetate from formula) checked but not fitted. */
  organicCheck: HydrationFitRow[];
  organicRmsFraction: number;
}

/** Minimise f on [a, b] by golden-section search (f unimodal). */
function goldenMin(f: (x: number) => number, a: number, b: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < 80; i++) {
    if (f1 < f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - g * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + g * (b - a);
      f2 = f(x2);
    }
  }
  return (a + b) / 2;
}

let fitCache: BornOffsetFit | undefined;

/** Ions fitted: bundled ions with a published ΔH_hyd and a tabulated (not estimated) size. */
function fitSet(): { ion: ThermoIon; published: number; r: number; source: string }[] {
  return THERMO_IONS.flatMap((rec) => {
    const ion = getThermoIon(rec.id)!;
    const r = bornRadiusA(ion);
    if (!ion.hydrationEnthalpyKJ || r === undefined || ion.estimatedSize) return [];
    if (rec.id === 'tetramethylammonium') return []; // kept for the organic check
    return [
      { ion, published: ion.hydrationEnthalpyKJ.value, r, source: rec.hydrationEnthalpyKJ!.source },
    ];
  });
}

/**
 * Fit the effective-radius offsets δ₊ and δ₋ (r_eff = r + δ) of the Born enthalpy to the bundled published
 * hydration enthalpies (Marcus 1987), separately for cations and anions, by least squares on relative error —
 * the approach of Latimer, Pitzer & Slansky 1939 (who used +0.85 Å and +0.10 Å on Pauling radii).
 * Then check the fitted model on organic ions whose size is estimated from their formula (tetramethyl- and
 * tetraethylammonium, acetate), whose published values were not used in the fit.
 */
export function fitBornOffsets(): BornOffsetFit {
  if (fitCache) return fitCache;
  const set = fitSet();
  const fitSign = (sign: 1 | -1) => {
    const sub = set.filter((s) => Math.sign(s.ion.charge) === sign);
    const sse = (d: number) =>
      sub.reduce(
        (a, s) => a + (bornHydrationEnthalpyKJ(s.ion.charge, s.r + d) / s.published - 1) ** 2,
        0,
      );
    const delta = goldenMin(sse, -0.25, 2);
    const rows = sub.map((s) => {
      const fitted = bornHydrationEnthalpyKJ(s.ion.charge, s.r + delta);
      return {
        id: s.ion.id!,
        label: s.ion.label,
        charge: s.ion.charge,
        radiusA: s.r,
        publishedKJ: s.published,
        fittedKJ: fitted,
        errorPercent: (fitted / s.published - 1) * 100,
        source: s.source,
      };
    });
    const rms = Math.sqrt(rows.reduce((a, r) => a + (r.errorPercent / 100) ** 2, 0) / rows.length);
    return { delta, rows, rms };
  };
  const c = fitSign(1);
  const a = fitSign(-1);
  const organicIons: { id: string; ion: ThermoIon; published: number; source: string }[] = [
    ['tetramethylammonium', 'C4H12N', 1],
    ['tetraethylammonium', 'C8H20N', 1],
    ['acetate', 'C2H3O2', -1],
  ].map(([id, formula, z]) => {
    const rec = THERMO_IONS.find((i) => i.id === id)!;
    return {
      id: id as string,
      ion: organicIonFromFormula(formula as string, z as number, { aromatic: 0, nonAromatic: 0 }),
      published: rec.hydrationEnthalpyKJ!.value,
      source: rec.hydrationEnthalpyKJ!.source,
    };
  });
  const organicCheck = organicIons.map((o) => {
    const r = o.ion.radiusA!.value;
    const fitted = bornHydrationEnthalpyKJ(
      o.ion.charge,
      r + (o.ion.charge > 0 ? c.delta : a.delta),
    );
    return {
      id: o.id,
      label: `${o.ion.label} (size from formula)`,
      charge: o.ion.charge,
      radiusA: r,
      publishedKJ: o.published,
      fittedKJ: fitted,
      errorPercent: (fitted / o.published - 1) * 100,
      source: o.source,
    };
  });
  const organicRms = Math.sqrt(
    organicCheck.reduce((s, r) => s + (r.errorPercent / 100) ** 2, 0) / organicCheck.length,
  );
  fitCache = {
    cationOffsetA: c.delta,
    anionOffsetA: a.delta,
    cationRmsFraction: c.rms,
    anionRmsFraction: a.rms,
    rows: [...c.rows, ...a.rows],
    organicCheck,
    organicRmsFraction: organicRms,
  };
  return fitCache;
}
