/**
 * Types of the counter-ion library. Every number carries its source (a citation, or "from memory",
 * or "common practice") in the ion's `sources` record or beside the value itself.
 */

/** Acceptability class of a counter-ion (Stahl & Wermuth 2002): 1 unrestricted, 2 low toxicity, 3 special purpose. */
export type AcceptabilityClass = 1 | 2 | 3;

/** One pKa of the parent acid, or of the conjugate acid of the parent base, in water at 25 °C. */
export interface SourcedPka {
  value: number;
  source: string;
}

/**
 * A salt stoichiometry the ion is used in, written for a singly charged drug ion unless the label says
 * otherwise: drug ions per salt formula unit, counter-ions per formula unit, and the charge the
 * counter-ion carries in that salt.
 */
export interface Stoichiometry {
  /** Trade name of the salt form, e.g. "hemisulfate (2:1)". */
  label: string;
  drugPerSalt: number;
  counterIonPerSalt: number;
  /** Charge of the counter-ion in this salt, e.g. −2 for sulfate in a hemisulfate. */
  ionCharge: number;
  /** Hill formula of the counter-ion in this charge state. */
  ionFormula: string;
  /** Molar mass of the counter-ion in this charge state, g/mol (computed from standard atomic weights). */
  ionMolarMassGPerMol: number;
  /**
   * Index into `pKas` of the limiting proton transfer for this salt: for an anion, the highest acid
   * pKa the acid must give up; for a cation, the conjugate-acid pKa of the last proton taken up.
   * Null when the ion has no tabulated pKa.
   */
  pKaIndex: number | null;
}

export interface CounterIon {
  /** Lowercase kebab-case id shared with the thermochemistry data ('chloride', 'tromethamine'). */
  id: string;
  name: string;
  synonyms: string[];
  kind: 'anion' | 'cation';
  /** Hill formula of the ion in its usual charge state (charge given separately). */
  formula: string;
  /** Usual charge state. */
  charge: number;
  /** OpenSMILES of the ion in its usual charge state. */
  ionSmiles: string;
  /** Ring counts of the ion (smallest set of smallest rings), for the additive volume estimate. */
  rings: { aromatic: number; nonAromatic: number };
  /** Molar mass of the ion in its usual charge state, g/mol. */
  molarMassGPerMol: number;
  /** The acid or base the salt is made from. */
  parent: { name: string; formula: string; smiles: string; molarMassGPerMol: number };
  /** pKa values of the parent acid, or of the conjugate acid(s) of the parent base, 25 °C, water; ascending. */
  pKas: SourcedPka[];
  stoichiometries: Stoichiometry[];
  acceptabilityClass: AcceptabilityClass | null;
  classSource: string;
  /** Id of the matching ion in the thermochemistry data, when bundled there. */
  thermoId?: string;
  /** True for ions bundled only as references for the lattice and hydration models, not used in medicines. */
  referenceOnly?: boolean;
  /** Short note of the trade (hygroscopicity tendency, known problems), with its basis in `sources.tradeNote`. */
  tradeNote: string;
  /** Source of each field: formula, smiles, molarMass, pKas, class, tradeNote, … */
  sources: Record<string, string>;
}

/** Where a library entry comes from, as the app shows it. */
export type CounterIonOrigin = 'bundled' | 'in-house' | 'edited';

/** A counter-ion as the app lists it: bundled, in-house, or bundled with per-project edits. */
export interface LibraryIon extends CounterIon {
  origin: CounterIonOrigin;
  /** Names of the fields the user edited for this project (empty unless origin is 'edited'). */
  editedFields: string[];
  /** The bundled entry before the user's edits (only when origin is 'edited'). */
  original?: CounterIon;
  /** Id of the stored record behind an in-house ion or an edit. */
  recordId?: string;
}
