import {
  LATTICE_REFERENCE_SALTS,
  SOLUTION_REFERENCE_SALTS,
  type LatticeReferenceSalt,
} from '../../data/thermo-reference';
import { THERMO_IONS } from '../../data/thermo-ions';
import { getThermoIon, KAPUSTINSKII_RADIUS_SET } from '../ions';
import {
  KAPUSTINSKII_K_ALT_KJ_A_PER_MOL,
  KAPUSTINSKII_K_KJ_A_PER_MOL,
} from '../models/kapustinskii/kapustinskii';
import { fitBornOffsets } from '../models/hydration/hydration';
import { rawLattice } from '../lattice';
import type {
  LatticeMethod,
  ModelValidation,
  SaltThermoRequest,
  ValidationRow,
} from '../thermo.types';
import {
  referenceLatticeEnthalpyKJ,
  referenceSolutionEnthalpyKJ,
  referenceVolumeNm3,
} from './reference';

export type LatticeGroup = 'alkali-halide' | 'alkaline-earth-halide' | 'polyatomic';

/** Summarise rows into a {@link ModelValidation}. */
export function summarise(
  model: string,
  label: string,
  group: string,
  rows: ValidationRow[],
): ModelValidation {
  const n = rows.length;
  const abs = rows.map((r) => Math.abs(r.errorPercent));
  return {
    model,
    label,
    group,
    n,
    meanAbsPercentError: n ? abs.reduce((a, b) => a + b, 0) / n : 0,
    maxAbsPercentError: n ? Math.max(...abs) : 0,
    signedBiasPercent: n ? rows.reduce((a, r) => a + r.errorPercent, 0) / n : 0,
    rmsPercentError: n ? Math.sqrt(rows.reduce((a, r) => a + r.errorPercent ** 2, 0) / n) : 0,
    rows,
  };
}

function baseRequest(s: LatticeReferenceSalt): SaltThermoRequest {
  return {
    cation: getThermoIon(s.cation)!,
    anion: getThermoIon(s.anion)!,
    cationsPerFormula: s.p,
    anionsPerFormula: s.q,
  };
}

/** Structure type of a reference salt when its cell fixes r₀. */
function structureOf(s: LatticeReferenceSalt): string | undefined {
  return s.volume.kind === 'cell' ? s.volume.structure : undefined;
}

export type LatticeVariant =
  | 'kapustinskii'
  | 'kapustinskii-goldschmidt'
  | 'kapustinskii-goldschmidt-1202'
  | 'kapustinskii-shannon'
  | 'kapustinskii-shannon-1202'
  | 'born-mayer'
  | 'born-lande'
  | 'vbt'
  | 'vbt-ion-volumes';

export const LATTICE_VARIANT_LABELS: Record<LatticeVariant, string> = {
  kapustinskii: `Kapustinskii as the engine runs it (K = 1214, ${KAPUSTINSKII_RADIUS_SET === 'shannon' ? 'Shannon CN VI' : 'Goldschmidt'} + thermochemical radii)`,
  'kapustinskii-goldschmidt': 'Kapustinskii, K = 1214, Goldschmidt + thermochemical radii',
  'kapustinskii-goldschmidt-1202': 'Kapustinskii, K = 1202.5, Goldschmidt + thermochemical radii',
  'kapustinskii-shannon': 'Kapustinskii, K = 1214, Shannon CN VI + thermochemical radii',
  'kapustinskii-shannon-1202': 'Kapustinskii, K = 1202.5, Shannon CN VI + thermochemical radii',
  'born-mayer': 'Born–Mayer, r₀ from the measured cell',
  'born-lande': 'Born–Landé, r₀ from the measured cell',
  vbt: 'VBT, V_m from the measured cell or density',
  'vbt-ion-volumes': 'VBT, V_m as the sum of ion volumes',
};

/** One variant's estimate for one reference salt, or undefined if the variant does not apply. */
export function variantEstimateKJ(
  variant: LatticeVariant,
  s: LatticeReferenceSalt,
): number | undefined {
  const req = baseRequest(s);
  const tableRadii = (set: 'shannon' | 'goldschmidt') => {
    const c = THERMO_IONS.find((i) => i.id === s.cation)!;
    const a = THERMO_IONS.find((i) => i.id === s.anion)!;
    const pick = (r: typeof c, fallback: number | undefined) =>
      r.shape === 'monatomic'
        ? set === 'shannon'
          ? r.shannonRadiusA?.value
          : (r.goldschmidtRadiusA ?? r.shannonRadiusA)?.value
        : fallback;
    const rc = pick(c, req.cation.radiusA?.value);
    const ra = pick(a, req.anion.radiusA?.value);
    return rc !== undefined && ra !== undefined ? { cation: rc, anion: ra } : undefined;
  };
  const method: LatticeMethod = variant.startsWith('kapustinskii')
    ? 'kapustinskii'
    : variant.startsWith('vbt')
      ? 'vbt'
      : (variant as LatticeMethod);
  const k = variant.endsWith('1202')
    ? KAPUSTINSKII_K_ALT_KJ_A_PER_MOL
    : KAPUSTINSKII_K_KJ_A_PER_MOL;
  if (method === 'kapustinskii') {
    const set = variant.includes('shannon')
      ? 'shannon'
      : variant.includes('goldschmidt')
        ? 'goldschmidt'
        : undefined;
    const radii = set ? tableRadii(set) : undefined;
    if (set && !radii) return undefined;
    return rawLattice(req, 'kapustinskii', {
      kapustinskiiK: k,
      ...(radii ? { kapustinskiiRadii: radii } : {}),
    }).enthalpyKJ;
  }
  if (method === 'born-mayer' || method === 'born-lande') {
    const st = structureOf(s);
    if (!st) return undefined;
    if (
      method === 'born-lande' &&
      (req.cation.bornExponent === undefined || req.anion.bornExponent === undefined)
    )
      return undefined;
    return rawLattice(
      { ...req, structureType: st, formulaUnitVolumeNm3: referenceVolumeNm3(s) },
      method,
    ).enthalpyKJ;
  }
  if (variant === 'vbt')
    return rawLattice({ ...req, formulaUnitVolumeNm3: referenceVolumeNm3(s) }, 'vbt').enthalpyKJ;
  if (!req.cation.volumeNm3 || !req.anion.volumeNm3) return undefined;
  return rawLattice(req, 'vbt').enthalpyKJ;
}

let latticeCache: Map<string, ModelValidation> | undefined;
let closureCache: ReturnType<typeof computeClosure> | undefined;

/** Validation of every lattice variant per group ('alkali-halide', 'alkaline-earth-halide', 'halides' = both, 'polyatomic', 'all'). */
export function latticeValidation(): Map<string, ModelValidation> {
  if (latticeCache) return latticeCache;
  const refs = LATTICE_REFERENCE_SALTS.map((s) => ({ s, ref: referenceLatticeEnthalpyKJ(s) }));
  const map = new Map<string, ModelValidation>();
  for (const variant of Object.keys(LATTICE_VARIANT_LABELS) as LatticeVariant[]) {
    const rows: (ValidationRow & { g: LatticeGroup })[] = refs.flatMap(({ s, ref }) => {
      const e = variantEstimateKJ(variant, s);
      if (e === undefined) return [];
      return [
        {
          id: s.id,
          label: s.formula,
          group: s.group,
          g: s.group,
          referenceKJ: ref.value,
          estimateKJ: e,
          errorPercent: (e / ref.value - 1) * 100,
          source: ref.source,
        },
      ];
    });
    const groups: [string, (g: LatticeGroup) => boolean][] = [
      ['alkali-halide', (g) => g === 'alkali-halide'],
      ['alkaline-earth-halide', (g) => g === 'alkaline-earth-halide'],
      ['halides', (g) => g !== 'polyatomic'],
      ['polyatomic', (g) => g === 'polyatomic'],
      ['all', () => true],
    ];
    for (const [name, pred] of groups) {
      const sub = rows.filter((r) => pred(r.g)).map(({ g: _g, ...r }) => r);
      if (sub.length)
        map.set(
          `${variant}/${name}`,
          summarise(variant, LATTICE_VARIANT_LABELS[variant], name, sub),
        );
    }
  }
  latticeCache = map;
  return map;
}

/** Fetch one lattice validation summary; throws if absent (a programming error). */
export function latticeStats(variant: LatticeVariant, group: string): ModelValidation {
  const v = latticeValidation().get(`${variant}/${group}`);
  if (!v) throw new Error(`no validation for ${variant}/${group}`);
  return v;
}

/** The fitted Born hydration model against the published values (fit set, and the organic check set). */
export function hydrationValidation(): ModelValidation[] {
  const fit = fitBornOffsets();
  const toRow = (r: (typeof fit.rows)[number], group: string): ValidationRow => ({
    id: r.id,
    label: r.label,
    group,
    referenceKJ: r.publishedKJ,
    estimateKJ: r.fittedKJ,
    errorPercent: r.errorPercent,
    source: r.source,
  });
  const cat = fit.rows.filter((r) => r.charge > 0).map((r) => toRow(r, 'cations'));
  const an = fit.rows.filter((r) => r.charge < 0).map((r) => toRow(r, 'anions'));
  return [
    summarise(
      'born-fitted',
      `Born, r + ${fit.cationOffsetA.toFixed(3)} Å (cations), r + ${fit.anionOffsetA.toFixed(3)} Å (anions)`,
      'all-published',
      [...cat, ...an],
    ),
    summarise('born-fitted', 'Born, fitted offsets: cations', 'cations', cat),
    summarise('born-fitted', 'Born, fitted offsets: anions', 'anions', an),
    summarise(
      'born-fitted',
      'Born, fitted offsets, organic ions sized from their formula (not fitted)',
      'organic-check',
      fit.organicCheck.map((r) => toRow(r, 'organic-check')),
    ),
  ];
}

/** Closure of the solution cycle on the Born–Haber halides: ΔH_sol(NBS) − ΔH_L(Born–Haber) − Σν·ΔH_hyd(Marcus), kJ/mol. */
export function publishedHydrationClosure(): {
  rmsKJ: number;
  perIonKJ: number;
  rows: { formula: string; closureKJ: number }[];
} {
  closureCache ??= computeClosure();
  return closureCache;
}

function computeClosure(): {
  rmsKJ: number;
  perIonKJ: number;
  rows: { formula: string; closureKJ: number }[];
} {
  const rows = LATTICE_REFERENCE_SALTS.filter((s) => s.route === 'born-haber').map((s) => {
    const h = (id: string) => THERMO_IONS.find((i) => i.id === id)!.hydrationEnthalpyKJ!.value;
    const closure =
      referenceSolutionEnthalpyKJ(s) -
      referenceLatticeEnthalpyKJ(s).value -
      s.p * h(s.cation) -
      s.q * h(s.anion);
    return { formula: s.formula, closureKJ: closure, ions: s.p + s.q };
  });
  const rms = Math.sqrt(rows.reduce((a, r) => a + r.closureKJ ** 2, 0) / rows.length);
  const meanIons = rows.reduce((a, r) => a + r.ions, 0) / rows.length;
  return {
    rmsKJ: rms,
    perIonKJ: rms / Math.sqrt(meanIons),
    rows: rows.map(({ formula, closureKJ }) => ({ formula, closureKJ })),
  };
}

export { SOLUTION_REFERENCE_SALTS };
