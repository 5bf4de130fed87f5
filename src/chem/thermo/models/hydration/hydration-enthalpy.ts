/**
 * The hydration enthalpy of one ion as the solution cycle takes it (published value, else the fitted
 * Born model of hydration.ts), numbers first: {@link hydrationNumbersKJ} gives the value, 1σ, method
 * and sources; {@link hydrationEnthalpyKJ} adds the notes that say how they were found. The screen's
 * ΔH_sol reads the numbers only (solution-enthalpy-numbers.ts).
 */
import { SRC } from '../../../data/thermo-sources';
import { ChemInputError, type Estimate } from '../../../result';
import type { ThermoIon } from '../../thermo.types';
import { bornHydrationEnthalpyKJ, bornRadiusA, fitBornOffsets } from './hydration';

/**
 * Relative uncertainty floor for published hydration enthalpies of polyatomic ions, which the halide
 * closure test cannot check — common practice, not a measured figure.
 */
export const POLYATOMIC_PUBLISHED_REL_U = 0.03;

/** Uncertainty of a published single-ion value: the closure of the solution cycle (`publishedHydrationClosure`). */
export const PUBLISHED_HYDRATION_SOURCES = [SRC.marcusHydration];

/** The Born estimate's sources: the model, its radius pattern, the water data, the fitted offsets. */
const BORN_HYDRATION_SOURCES: readonly string[] = [
  SRC.born1920,
  SRC.latimer1939,
  SRC.waterDielectric,
  `offsets fitted on ${SRC.marcusHydration}`,
];

export interface HydrationOptions {
  temperatureK?: number;
  forceBorn?: boolean;
  perIonPublishedUncertaintyKJ?: number;
}

/** The figures of one ion's hydration enthalpy, and what its notes are written from. */
interface HydrationNumbers {
  value: number;
  uncertainty: number;
  method: 'published' | 'born-fitted';
  sources: readonly string[];
  /** Published: the closure share and the polyatomic floor, kJ/mol. */
  closureKJ: number;
  polyFloorKJ: number;
  /** Born: the fitted radius offset, Å. */
  offsetA: number;
}

function hydrationFigures(ion: ThermoIon, opts: HydrationOptions): HydrationNumbers {
  const z = ion.charge;
  if (!Number.isInteger(z) || z === 0 || Math.abs(z) > 4)
    throw new ChemInputError(
      'charge',
      `charge ${z} is not a non-zero whole number`,
      'whole numbers −4…−1 or +1…+4',
    );
  if (ion.hydrationEnthalpyKJ && !opts.forceBorn) {
    const pub = ion.hydrationEnthalpyKJ;
    const closure = (opts.perIonPublishedUncertaintyKJ ?? 0) * Math.abs(z);
    const polyFloor =
      ion.shape === 'monatomic' ? 0 : POLYATOMIC_PUBLISHED_REL_U * Math.abs(pub.value);
    return {
      value: pub.value,
      uncertainty: Math.max(pub.uncertainty, closure, polyFloor),
      method: 'published',
      sources: pub.sources,
      closureKJ: closure,
      polyFloorKJ: polyFloor,
      offsetA: 0,
    };
  }
  const r = bornRadiusA(ion);
  if (r === undefined)
    throw new ChemInputError(
      'ion',
      `${ion.label} has no radius or volume for the Born model`,
      'an ion with a radius, volume, formula or SMILES',
    );
  const fit = fitBornOffsets();
  const delta = z > 0 ? fit.cationOffsetA : fit.anionOffsetA;
  const value = bornHydrationEnthalpyKJ(z, r + delta, opts.temperatureK);
  const fitRel = z > 0 ? fit.cationRmsFraction : fit.anionRmsFraction;
  const radiusRel =
    ion.radiusA && ion.shape !== 'monatomic' ? ion.radiusA.uncertainty / (r + delta) : 0;
  const modelRel = ion.estimatedSize ? Math.max(fitRel, fit.organicRmsFraction) : fitRel;
  const rel = Math.sqrt(modelRel ** 2 + radiusRel ** 2);
  return {
    value,
    uncertainty: Math.abs(value) * rel,
    method: 'born-fitted',
    sources: BORN_HYDRATION_SOURCES,
    closureKJ: 0,
    polyFloorKJ: 0,
    offsetA: delta,
  };
}

/**
 * {@link hydrationEnthalpyKJ}'s value, 1σ, method and sources (the same doubles, the same errors)
 * without its notes. The sources array is shared: read it, do not change it.
 */
export function hydrationNumbersKJ(
  ion: ThermoIon,
  opts: HydrationOptions = {},
): Pick<Estimate, 'value' | 'uncertainty' | 'method'> & { sources: readonly string[] } {
  return hydrationFigures(ion, opts);
}

/**
 * Hydration enthalpy of one ion, kJ/mol (< 0): the published value where the ion has one; otherwise the
 * Born enthalpy with the fitted effective-radius offset. Uncertainty: for published values, the per-ion
 * share of the measured closure of the solution cycle (`perIonPublishedUncertaintyKJ`); for the Born
 * estimate, the fit's RMS relative residual for that charge sign, or — for ions whose size is itself an
 * estimate (organic ions) — the larger of that and the RMS error on the organic check ions, plus the radius's
 * own uncertainty carried through the 1/r dependence.
 */
export function hydrationEnthalpyKJ(ion: ThermoIon, opts: HydrationOptions = {}): Estimate {
  const n = hydrationFigures(ion, opts);
  const z = ion.charge;
  const notes: string[] = [];
  if (n.method === 'published') {
    notes.push(
      'absolute scale of Marcus (ΔH_hyd(H⁺) = −1103 kJ/mol as implied by his Na⁺ value and the NBS tables); sums over a neutral salt do not depend on it',
    );
    if (n.closureKJ > 0)
      notes.push(
        `uncertainty at least ${n.closureKJ.toFixed(1)} kJ/mol: the RMS closure of the solution cycle on the bundled halides, per ion`,
      );
    if (n.polyFloorKJ > 0)
      notes.push(
        `polyatomic ion: at least ${(POLYATOMIC_PUBLISHED_REL_U * 100).toFixed(0)} % (common practice; the halide closure does not test it)`,
      );
  } else {
    notes.push(
      `r_eff = r + ${n.offsetA.toFixed(2)} Å (offset fitted on published ${z > 0 ? 'cations' : 'anions'})`,
    );
    if (ion.estimatedSize) {
      notes.push(
        'organic ion: the Born term misses cavity and hydrophobic-hydration terms; uncertainty widened to the error measured on tetraalkylammonium and acetate ions',
      );
    }
  }
  return {
    value: n.value,
    uncertainty: n.uncertainty,
    method: n.method,
    // a published ion's own list, as before; the Born list copied, so no caller shares it
    sources: n.method === 'published' ? (n.sources as string[]) : [...n.sources],
    notes,
  };
}
