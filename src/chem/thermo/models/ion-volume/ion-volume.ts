import { ZHAO_ATOM_VOLUME_A3 } from '../../../data/thermo-elements';
import { PACKING_CALIBRATION_SALTS } from '../../../data/thermo-reference';
import { THERMO_IONS } from '../../../data/thermo-ions';
import { SRC } from '../../../data/thermo-sources';
import { ChemInputError, requireFiniteInRange, type Estimate } from '../../../result';
import type { ThermoIon } from '../../thermo.types';
import { formulaMolarMassGPerMol, molarMassGPerMol, parseFormula } from '../../../compound/formula';
import { AVOGADRO_PER_MOL } from '../../../constants/physical';

/** Bond-count and ring corrections of Zhao, Abraham & Zissimos 2003 (J. Org. Chem. 68, 7368, eq. 4), Å³. */
export const ZHAO_BOND_A3 = 5.92;
export const ZHAO_AROMATIC_RING_A3 = 14.7;
export const ZHAO_NONAROMATIC_RING_A3 = 3.8;

export interface RingCounts {
  aromatic: number;
  nonAromatic: number;
}

function requireRings(rings: RingCounts): RingCounts {
  if (!rings || typeof rings !== 'object') {
    throw new ChemInputError(
      'rings',
      'ring counts missing',
      '{ aromatic, nonAromatic }, whole numbers 0–50',
    );
  }
  const aromatic = requireFiniteInRange('rings.aromatic', rings.aromatic, 0, 50);
  const nonAromatic = requireFiniteInRange('rings.nonAromatic', rings.nonAromatic, 0, 50);
  if (!Number.isInteger(aromatic) || !Number.isInteger(nonAromatic)) {
    throw new ChemInputError('rings', 'ring counts must be whole numbers', 'whole numbers 0–50');
  }
  return { aromatic, nonAromatic };
}

/**
 * Van der Waals volume of a molecule or ion, Å³, by Zhao, Abraham & Zissimos (2003):
 * V_vdW = Σ atom volumes − 5.92·N_B − 14.7·R_A − 3.8·R_NR, N_B = N_atoms − 1 + R_A + R_NR.
 * Atoms: H B C N O F Si P S Cl Se Br I.
 */
export function vanDerWaalsVolumeA3(
  formula: string | Record<string, number>,
  rings: RingCounts,
): number {
  const counts = typeof formula === 'string' ? parseFormula(formula).elements : formula;
  const r = requireRings(rings);
  let sum = 0;
  let atoms = 0;
  for (const [el, n] of Object.entries(counts)) {
    const v = ZHAO_ATOM_VOLUME_A3[el];
    if (v === undefined) {
      throw new ChemInputError(
        'formula',
        `element ${el} has no van der Waals volume contribution`,
        'H, B, C, N, O, F, Si, P, S, Cl, Se, Br, I',
      );
    }
    sum += v * n;
    atoms += n;
  }
  const rings_ = r.aromatic + r.nonAromatic;
  if (rings_ > atoms)
    throw new ChemInputError(
      'rings',
      `${rings_} rings in ${atoms} atoms`,
      'fewer rings than atoms',
    );
  const bonds = atoms - 1 + rings_;
  const v =
    sum -
    ZHAO_BOND_A3 * bonds -
    ZHAO_AROMATIC_RING_A3 * r.aromatic -
    ZHAO_NONAROMATIC_RING_A3 * r.nonAromatic;
  if (!(v > 0))
    throw new ChemInputError(
      'formula',
      'formula and ring counts give a non-positive volume',
      'a plausible molecule',
    );
  return v;
}

/** Thermochemical radius from a volume: r = (3V/4π)^(1/3); V in nm³ → r in Å. */
export function radiusFromVolumeA(volumeNm3: number): number {
  const v = requireFiniteInRange('volumeNm3', volumeNm3, 1e-5, 20, 'nm³');
  return Math.cbrt((3 * v * 1000) / (4 * Math.PI));
}

export interface PackingCalibrationRow {
  id: string;
  name: string;
  vdwVolumeA3: number;
  /** Ion volume in the crystal implied by the density, nm³. */
  impliedVolumeNm3: number;
  /** V_vdW / implied volume. */
  packingCoefficient: number;
  /** Formula-unit volume measured vs predicted with the calibrated mean coefficient, %. */
  volumeErrorPercent: number;
  source: string;
}

export interface PackingCalibration {
  /** Mean packing coefficient over the calibration salts. */
  packingCoefficient: number;
  /** Sample standard deviation of the per-salt coefficients. */
  standardDeviation: number;
  /** RMS relative error of the predicted formula-unit volumes, fraction. */
  rmsVolumeErrorFraction: number;
  rows: PackingCalibrationRow[];
  method: string;
}

let calibrationCache: PackingCalibration | undefined;

/**
 * Calibrate the packing coefficient k (V_crystal = V_vdW / k) on salts of small organic ions with published
 * densities (fixtures/reference/thermo-reference.json, PACKING_CALIBRATION_SALTS): per salt, the organic ion's share of the
 * formula-unit volume is M/(ρN_A) minus the partner ions' Jenkins volumes; k = V_vdW / that share; the mean
 * is used. Kitaigorodskii's range for organic crystals is 0.65–0.77.
 */
export function packingCalibration(): PackingCalibration {
  if (calibrationCache) return calibrationCache;
  const pre = PACKING_CALIBRATION_SALTS.map((s) => {
    const partner = THERMO_IONS.find((i) => i.id === s.partner)!;
    const vPartner = partner.volumeNm3!.value;
    const organicCounts = parseFormula(s.organicFormula).elements;
    const saltMass =
      s.organicPerFormula * molarMassGPerMol(organicCounts) +
      s.partnerPerFormula * formulaMolarMassGPerMol(partner.formula);
    const vm = (saltMass / (s.densityGPerCm3 * AVOGADRO_PER_MOL)) * 1e21;
    const implied = (vm - s.partnerPerFormula * vPartner) / s.organicPerFormula;
    const vdw = vanDerWaalsVolumeA3(organicCounts, s.rings);
    return { s, vm, vPartner, implied, vdw, k: vdw / 1000 / implied };
  });
  const ks = pre.map((r) => r.k);
  const mean = ks.reduce((a, b) => a + b, 0) / ks.length;
  const sd = Math.sqrt(ks.reduce((a, b) => a + (b - mean) ** 2, 0) / (ks.length - 1));
  const rows = pre.map((r) => {
    const predictedVm =
      r.s.organicPerFormula * (r.vdw / 1000 / mean) + r.s.partnerPerFormula * r.vPartner;
    return {
      id: r.s.id,
      name: r.s.name,
      vdwVolumeA3: r.vdw,
      impliedVolumeNm3: r.implied,
      packingCoefficient: r.k,
      volumeErrorPercent: (predictedVm / r.vm - 1) * 100,
      source: r.s.source,
    };
  });
  const rms = Math.sqrt(
    rows.reduce((a, r) => a + (r.volumeErrorPercent / 100) ** 2, 0) / rows.length,
  );
  calibrationCache = {
    packingCoefficient: mean,
    standardDeviation: sd,
    rmsVolumeErrorFraction: rms,
    rows,
    method: `mean of V_vdW/V_ion over ${rows.length} salts of small organic ions with published densities`,
  };
  return calibrationCache;
}

function formatLabel(formula: string, charge: number): string {
  const mag = Math.abs(charge);
  return `${formula}${mag === 1 ? '' : mag}${charge > 0 ? '+' : '-'}`;
}

/**
 * An ion built from its molecular formula, charge and ring counts: Zhao–Abraham–Zissimos van der Waals
 * volume ÷ packing coefficient (calibrated, {@link packingCalibration}, unless given) → volume in the crystal,
 * and the thermochemical radius r = (3V/4π)^(1/3). The volume's uncertainty is the calibration's RMS
 * relative error of formula-unit volumes, scaled to the ion's share (a conservative reading).
 */
export function organicIonFromFormula(
  formula: string,
  charge: number,
  rings: RingCounts,
  opts: { packingCoefficient?: number; label?: string; id?: string } = {},
): ThermoIon {
  const z = requireFiniteInRange('charge', charge, -4, 4);
  if (z === 0 || !Number.isInteger(z))
    throw new ChemInputError(
      'charge',
      `charge ${charge} is not a non-zero whole number`,
      'whole numbers −4…−1 or +1…+4',
    );
  const counts = parseFormula(formula).elements;
  const vdw = vanDerWaalsVolumeA3(counts, rings);
  const cal = packingCalibration();
  const k =
    opts.packingCoefficient === undefined
      ? cal.packingCoefficient
      : requireFiniteInRange('packingCoefficient', opts.packingCoefficient, 0.4, 0.95);
  const vNm3 = vdw / 1000 / k;
  const relU = Math.max(cal.rmsVolumeErrorFraction, cal.standardDeviation / cal.packingCoefficient);
  const atoms = Object.values(counts).reduce((a, b) => a + b, 0);
  const volume: Estimate = {
    value: vNm3,
    uncertainty: relU * vNm3,
    method: 'zhao-vdw/packing',
    sources: [
      SRC.zhao2003,
      SRC.bondi1964,
      `packing coefficient ${k.toFixed(3)} (${opts.packingCoefficient === undefined ? cal.method : 'user-set'})`,
      SRC.kitaigorodskii,
    ],
  };
  const r = radiusFromVolumeA(vNm3);
  const radius: Estimate = {
    value: r,
    uncertainty: (r * relU) / 3,
    method: 'radius-from-volume',
    sources: ['r = (3V/4π)^(1/3) (H. D. B. Jenkins et al., Inorg. Chem. 38 (1999) 3609)'],
  };
  return {
    ...(opts.id ? { id: opts.id } : {}),
    label: opts.label ?? formatLabel(formula, z),
    charge: z,
    shape: atoms === 1 ? 'monatomic' : atoms === 2 ? 'linear' : 'nonlinear',
    radiusA: radius,
    volumeNm3: volume,
    formula,
    molarMassGPerMol: molarMassGPerMol(counts),
    estimatedSize: true,
    sources: volume.sources,
  };
}
