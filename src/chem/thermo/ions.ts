import { AVOGADRO_PER_MOL } from '../constants/physical';
import { THERMO_IONS, type SourcedValue, type ThermoIonRecord } from '../data/thermo-ions';
import { ANION_VOLUME_SALTS, ANION_VOLUME_SOURCE } from '../data/thermo-reference';
import type { Estimate } from '../result';
import { formulaMolarMassGPerMol, molarMassGPerMol, parseFormula } from '../compound/formula';
import { organicIonFromFormula, radiusFromVolumeA } from './models/ion-volume/ion-volume';
import type { ThermoIon } from './thermo.types';

/**
 * Which radii Kapustinskii's equation uses for metal ions. The validation compares Goldschmidt radii
 * (the CRC section's choice) with Shannon CN VI radii (Shannon 1976), each with K = 1214 and 1202.5, on
 * the 36 bundled Born–Haber halides. Measured 2026-12-01 (mean |error|): Shannon + 1214 3.7 %, Goldschmidt
 * + 1214 4.2 %, Shannon + 1202.5 4.5 %, Goldschmidt + 1202.5 5.1 %; all four underestimate (bias −3.6 to
 * −5.1 %). So the engine uses Shannon CN VI radii with the CRC constant K = 1214; a test asserts that this
 * pairing is still the best (tests/chem/thermo/validation.test.ts).
 */
export const KAPUSTINSKII_RADIUS_SET: 'goldschmidt' | 'shannon' = 'shannon';

/** Radius uncertainty attached to tabulated crystal radii, as a fraction (0.01 Å on ~1 Å, the tables' last digit) — common practice. */
const TABLE_RADIUS_REL_U = 0.01;
/** The same for thermochemical radii of polyatomic ions, which are fitted values — common practice (3 %). */
const THERMOCHEMICAL_RADIUS_REL_U = 0.03;
/**
 * Relative uncertainty attached to a tabulated Jenkins ion volume — common practice (5 %). It feeds the
 * quoted ion data only; lattice uncertainties come from the measured errors of the whole method.
 */
const ION_VOLUME_REL_U = 0.05;

const est = (v: SourcedValue, method: string, relU: number, absU = 0): Estimate => ({
  value: v.value,
  uncertainty: Math.max(Math.abs(v.value) * relU, absU),
  method,
  sources: [v.source],
});

let derivedVolumes: Map<string, Estimate> | undefined;

/**
 * Volumes of polyatomic anions with no Jenkins value at hand, derived from densities of their alkali salts:
 * V = (M/(ρN_A) − p·V₊)/q, averaged; uncertainty the spread between salts, at least 10 % (common practice
 * for ion-volume additivity; Jenkins et al. 1999 quote similar scatter).
 */
export function derivedAnionVolumes(): Map<string, Estimate> {
  if (derivedVolumes) return derivedVolumes;
  const map = new Map<string, Estimate>();
  for (const { anion, salts } of ANION_VOLUME_SALTS) {
    const vs = salts.map((s) => {
      const cat = THERMO_IONS.find((i) => i.id === s.cation)!;
      const vm =
        (molarMassGPerMol(parseFormula(s.formula).elements) /
          (s.densityGPerCm3 * AVOGADRO_PER_MOL)) *
        1e21;
      return (vm - s.p * cat.volumeNm3!.value) / s.q;
    });
    const mean = vs.reduce((a, b) => a + b, 0) / vs.length;
    const spread = vs.length > 1 ? Math.max(...vs) - Math.min(...vs) : 0;
    map.set(anion, {
      value: mean,
      uncertainty: Math.max(0.1 * mean, spread / 2),
      method: 'derived-from-density',
      sources: [`${ANION_VOLUME_SOURCE}: ${salts.map((s) => s.formula).join(', ')}`],
    });
  }
  derivedVolumes = map;
  return map;
}

function recordToIon(r: ThermoIonRecord): ThermoIon {
  const sources = new Set<string>();
  const crystal = r.shannonRadiusA
    ? est(r.shannonRadiusA, 'shannon-cn6', TABLE_RADIUS_REL_U)
    : undefined;
  let radius: Estimate | undefined;
  if (r.shape === 'monatomic') {
    const src =
      KAPUSTINSKII_RADIUS_SET === 'goldschmidt'
        ? (r.goldschmidtRadiusA ?? r.shannonRadiusA)
        : r.shannonRadiusA;
    if (src)
      radius = est(
        src,
        KAPUSTINSKII_RADIUS_SET === 'goldschmidt' && r.goldschmidtRadiusA
          ? 'goldschmidt'
          : 'shannon-cn6',
        TABLE_RADIUS_REL_U,
      );
  } else if (r.thermochemicalRadiusA) {
    radius = est(r.thermochemicalRadiusA, 'thermochemical-radius', THERMOCHEMICAL_RADIUS_REL_U);
  }
  let volume: Estimate | undefined = r.volumeNm3
    ? est(r.volumeNm3, 'jenkins-volume', ION_VOLUME_REL_U)
    : derivedAnionVolumes().get(r.id);
  let estimatedSize = false;
  if (!radius && volume) {
    const rv = radiusFromVolumeA(volume.value);
    radius = {
      value: rv,
      uncertainty: (rv * volume.uncertainty) / volume.value / 3,
      method: 'radius-from-volume',
      sources: volume.sources,
    };
  }
  if (!radius && !volume && r.shape !== 'monatomic') {
    // No published size: estimate from the formula like a drug ion (e.g. tetraethylammonium).
    const guess = organicIonFromFormula(r.formula, r.charge, { aromatic: 0, nonAromatic: 0 });
    radius = guess.radiusA;
    volume = guess.volumeNm3;
    estimatedSize = true;
  }
  const hyd = r.hydrationEnthalpyKJ ? est(r.hydrationEnthalpyKJ, 'published', 0, 0) : undefined;
  for (const e of [radius, crystal, volume, hyd]) e?.sources.forEach((s) => sources.add(s));
  return {
    id: r.id,
    label: r.label,
    charge: r.charge,
    shape: r.shape,
    ...(radius ? { radiusA: radius } : {}),
    ...(crystal ? { crystalRadiusA: crystal } : {}),
    ...(volume ? { volumeNm3: volume } : {}),
    ...(hyd ? { hydrationEnthalpyKJ: hyd } : {}),
    ...(r.bornExponent ? { bornExponent: r.bornExponent } : {}),
    formula: r.formula,
    molarMassGPerMol: formulaMolarMassGPerMol(r.formula),
    ...(estimatedSize ? { estimatedSize } : {}),
    sources: [...sources],
  };
}

const cache = new Map<string, ThermoIon>();

/**
 * The bundled records by id (the first of an id, as a search from the start finds it), made once: an
 * id that is not bundled (most library counter-ions, asked for each salt of a screen) is one lookup
 * instead of a search through the whole table.
 */
let recordsById: Map<string, (typeof THERMO_IONS)[number]> | undefined;
function recordById(id: string): (typeof THERMO_IONS)[number] | undefined {
  if (!recordsById) {
    recordsById = new Map();
    for (const r of THERMO_IONS) if (!recordsById.has(r.id)) recordsById.set(r.id, r);
  }
  return recordsById.get(id);
}

/** A bundled reference ion by its shared id (`sodium`, `sulfate`, …) or undefined. */
export function getThermoIon(id: string): ThermoIon | undefined {
  const hit = cache.get(id);
  if (hit) return hit;
  const r = recordById(id);
  if (!r) return undefined;
  const ion = recordToIon(r);
  cache.set(id, ion);
  return ion;
}

/** Ids of every bundled ion. */
export function listThermoIonIds(): string[] {
  return THERMO_IONS.map((i) => i.id);
}

/** Find a bundled ion by id or by a typed symbol (`Na+`, `SO4 2-`, `SO4--`), case-sensitive for symbols. */
export function findThermoIon(idOrSymbol: string): ThermoIon | undefined {
  const byId = getThermoIon(idOrSymbol.trim().toLowerCase());
  if (byId) return byId;
  const key = idOrSymbol.replace(/\s+/g, '');
  const r = THERMO_IONS.find((i) => i.symbols.includes(key));
  return r ? getThermoIon(r.id) : undefined;
}

/**
 * The bundled ion with this formula (same element counts, charge written or not) and charge, if any — so a
 * request that spells out `SO4` with charge −2 gets the published sizes and hydration enthalpy of sulfate
 * rather than an additive estimate.
 */
export function findThermoIonByFormula(formula: string, charge: number): ThermoIon | undefined {
  let counts: Record<string, number>;
  try {
    counts = parseFormula(formula).elements;
  } catch {
    return undefined;
  }
  const key = (c: Record<string, number>) =>
    Object.entries(c)
      .sort(([a], [b]) => a.localeCompare(b))
      .map(([e, n]) => `${e}${n}`)
      .join('');
  const want = key(counts);
  const r = THERMO_IONS.find(
    (i) => i.charge === charge && key(parseFormula(i.formula).elements) === want,
  );
  return r ? getThermoIon(r.id) : undefined;
}
