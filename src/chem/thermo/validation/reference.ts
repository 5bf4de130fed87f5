import { AVOGADRO_PER_MOL } from '../../constants/physical';
import {
  AQUEOUS_ION_FORMATION_KJ,
  ATOM_FORMATION_KJ,
  CYCLE_DATA_SOURCE,
  ELECTRON_AFFINITY_KJ,
  IONISATION_ENERGY_SUM_KJ,
  LATTICE_REFERENCE_SALTS,
  REFERENCE_SALT_SOURCES,
  SOLID_FORMATION_KJ,
  type LatticeReferenceSalt,
} from '../../data/thermo-reference';
import { THERMO_IONS } from '../../data/thermo-ions';
import { SRC } from '../../data/thermo-sources';
import { formulaMolarMassGPerMol as molarMassGPerMol } from '../../compound/formula';
import { bornHaberCycle } from '../models/cycle/cycle';

const hydration = (id: string): number => {
  const v = THERMO_IONS.find((i) => i.id === id)?.hydrationEnthalpyKJ?.value;
  if (v === undefined) throw new Error(`reference data: no published hydration enthalpy for ${id}`);
  return v;
};

/** Enthalpy of solution at infinite dilution from NBS ΔfH°: Σν·ΔfH°(ion, aq) − ΔfH°(salt, s), kJ/mol. */
export function referenceSolutionEnthalpyKJ(s: {
  formula: string;
  cation: string;
  anion: string;
  p: number;
  q: number;
}): number {
  const solid = SOLID_FORMATION_KJ[s.formula];
  const c = AQUEOUS_ION_FORMATION_KJ[s.cation];
  const a = AQUEOUS_ION_FORMATION_KJ[s.anion];
  if (solid === undefined || c === undefined || a === undefined)
    throw new Error(`reference data: missing ΔfH° for ${s.formula}`);
  return s.p * c + s.q * a - solid;
}
export const SOLUTION_REFERENCE_SOURCE = `Hess's law from ΔfH° of the solid and the aqueous ions, ${SRC.nbs1982} — per-species check status in fixtures/reference/formation-enthalpies.csv (checked values name their copy; the rest are from memory)`;

/** Reference lattice dissociation enthalpy of a reference salt, kJ/mol, with its source. */
export function referenceLatticeEnthalpyKJ(s: LatticeReferenceSalt): {
  value: number;
  source: string;
} {
  if (s.route === 'born-haber') {
    const m = s.metal!;
    const x = s.halogen!;
    const sol = bornHaberCycle({
      salt: s.formula,
      metalCount: s.p,
      nonMetalCount: s.q,
      formationEnthalpyKJ: SOLID_FORMATION_KJ[s.formula]!,
      metalAtomisationKJ: ATOM_FORMATION_KJ[m]!,
      ionisationEnergySumKJ: IONISATION_ENERGY_SUM_KJ[m]!,
      nonMetalAtomisationKJ: ATOM_FORMATION_KJ[x]!,
      electronGainKJ: -ELECTRON_AFFINITY_KJ[x]!,
      latticeEnthalpyKJ: null,
      source: CYCLE_DATA_SOURCE,
    });
    // The unknown step is "ions → solid", i.e. −ΔH_L.
    return { value: -sol.unknown!.value, source: REFERENCE_SALT_SOURCES.bornHaber };
  }
  const dsol = referenceSolutionEnthalpyKJ(s);
  return {
    value: dsol - s.p * hydration(s.cation) - s.q * hydration(s.anion),
    source: REFERENCE_SALT_SOURCES.solutionCycle,
  };
}

/** Formula-unit volume of a reference salt, nm³, from its cell or its density. */
export function referenceVolumeNm3(s: LatticeReferenceSalt): number {
  const v = s.volume;
  if (v.kind === 'cell') {
    const cell = v.edgeA ** 3;
    const z = v.structure === 'caesium-chloride' ? 1 : 4;
    return cell / z / 1000;
  }
  if (v.kind === 'cell-volume') return v.cellVolumeA3 / v.z / 1000;
  return (molarMassGPerMol(s.formula) / (v.densityGPerCm3 * AVOGADRO_PER_MOL)) * 1e21;
}

export { LATTICE_REFERENCE_SALTS };
