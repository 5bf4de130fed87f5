import { ATOMIC_WEIGHTS_SOURCE } from '../compound/atomic-weights';
import { hillFormula, molarMassGPerMol, parseFormula, withHydrogens } from '../compound/formula';
import type { AcceptabilityClass, CounterIon, SourcedPka } from './counter-ion.types';
import { SRC_FORMULA, SRC_SMILES } from './sources';

/**
 * One row of the library as a reviewer reads it. Molar masses, formulas of other charge states and
 * the per-field source record are derived from it by {@link buildCounterIon}, so no mass is typed by hand.
 */
export interface CounterIonRow extends Pick<
  CounterIon,
  'id' | 'name' | 'synonyms' | 'kind' | 'formula' | 'charge' | 'ionSmiles'
> {
  /** [aromatic, non-aromatic] ring counts of the ion. */
  rings: [number, number];
  parent: { name: string; formula: string; smiles: string };
  pKas: SourcedPka[];
  /**
   * [label, drugPerSalt, counterIonPerSalt, ionCharge, pKaIndex]. Other charge states of a protic ion
   * differ from `formula` by whole protons (anions lose, cations gain one H per extra charge).
   */
  stoichiometries: [string, number, number, number, number | null][];
  acceptabilityClass: AcceptabilityClass | null;
  classSource: string;
  thermoId?: string;
  tradeNote: string;
  tradeNoteSource: string;
  /** Bundled as a reference for the thermochemistry models only (not a pharmaceutical counter-ion). */
  referenceOnly?: boolean;
  /** True for ions whose other charge states are not reached by adding or removing protons (metals, quaternary). */
  fixedCharge?: boolean;
}

/** Derive a full {@link CounterIon} from a data row: masses from standard atomic weights, formulas per charge state. */
export function buildCounterIon(row: CounterIonRow): CounterIon {
  const ion = parseFormula(row.formula, `${row.id}.formula`);
  const parent = parseFormula(row.parent.formula, `${row.id}.parent.formula`);
  const stoichiometries = row.stoichiometries.map(
    ([label, drugPerSalt, counterIonPerSalt, ionCharge, pKaIndex]) => {
      const elements =
        row.fixedCharge || ionCharge === row.charge
          ? ion.elements
          : withHydrogens(ion.elements, ionCharge - row.charge, `${row.id}.stoichiometries`);
      return {
        label,
        drugPerSalt,
        counterIonPerSalt,
        ionCharge,
        ionFormula: hillFormula(elements),
        ionMolarMassGPerMol: round4(molarMassGPerMol(elements)),
        pKaIndex,
      };
    },
  );
  const pKaSources = [...new Set(row.pKas.map((p) => p.source))];
  return {
    id: row.id,
    name: row.name,
    synonyms: row.synonyms,
    kind: row.kind,
    formula: ion.hill,
    charge: row.charge,
    ionSmiles: row.ionSmiles,
    rings: { aromatic: row.rings[0], nonAromatic: row.rings[1] },
    molarMassGPerMol: round4(molarMassGPerMol(ion.elements)),
    parent: {
      name: row.parent.name,
      formula: parent.hill,
      smiles: row.parent.smiles,
      molarMassGPerMol: round4(molarMassGPerMol(parent.elements)),
    },
    pKas: [...row.pKas].sort((a, b) => a.value - b.value),
    stoichiometries,
    acceptabilityClass: row.acceptabilityClass,
    classSource: row.classSource,
    ...(row.thermoId ? { thermoId: row.thermoId } : {}),
    ...(row.referenceOnly ? { referenceOnly: true } : {}),
    tradeNote: row.tradeNote,
    sources: {
      formula: SRC_FORMULA,
      ionSmiles: SRC_SMILES,
      molarMassGPerMol: ATOMIC_WEIGHTS_SOURCE,
      pKas: pKaSources.length ? pKaSources.join('; ') : 'no pKa value could be sourced',
      acceptabilityClass: row.classSource,
      tradeNote: row.tradeNoteSource,
    },
  };
}

const round4 = (x: number) => Math.round(x * 1e4) / 1e4;
