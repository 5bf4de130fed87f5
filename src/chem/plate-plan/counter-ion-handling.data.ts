/**
 * How a counter-ion's parent acid or base goes into a well: weighed in as a solid (the default), measured
 * by volume as a neat liquid (needs its density), or only as a stock solution (a gas, or a substance
 * sold and handled as a solution). And where the parent is known to dissolve poorly in a solvent, the
 * solubility, so the plan can warn. Every value names its source; "from memory" marks values recalled
 * rather than read in this session.
 */

/** Densities of neat liquid acids and bases: CRC Handbook — from memory. */
export const SRC_CRC_DENSITY =
  'CRC Handbook of Chemistry and Physics (97th ed., 2016), "Physical Constants of Organic Compounds" / "Physical Constants of Inorganic Compounds", density — from memory';

/** Physical state at room temperature (gas, or handled as a solution): CRC Handbook — from memory. */
export const SRC_CRC_STATE =
  'CRC Handbook of Chemistry and Physics (97th ed., 2016), physical constants (melting and boiling points) — from memory; dosing it as a solution is common practice';

/** Aqueous solubilities of organic acids: CRC Handbook "Aqueous Solubility of Organic Compounds" — from memory. */
export const SRC_CRC_AQ_SOLUBILITY =
  'CRC Handbook of Chemistry and Physics (97th ed., 2016), "Aqueous Solubility of Organic Compounds" — from memory';

/** Qualitative solubility statements of the pharmacopoeias (e.g. "practically insoluble in ethanol") — from memory. */
export const SRC_PH_EUR_SOLUBILITY =
  'European Pharmacopoeia monograph, "Characters" (solubility statement) — from memory';

export type ParentForm = 'solid' | 'liquid' | 'stock-only';

export interface ParentHandling {
  /** Counter-ion library id. */
  ionId: string;
  form: Exclude<ParentForm, 'solid'>;
  /** Density of the neat liquid, g/mL (liquid parents only). */
  densityGPerMl: number | null;
  densityTemperatureC: number | null;
  /** Why it is dosed this way, in a few words. */
  note: string;
  source: string;
}

const liquid = (ionId: string, rho: number, t: number, note: string): ParentHandling => ({
  ionId,
  form: 'liquid',
  densityGPerMl: rho,
  densityTemperatureC: t,
  note,
  source: SRC_CRC_DENSITY,
});
const stockOnly = (ionId: string, note: string): ParentHandling => ({
  ionId,
  form: 'stock-only',
  densityGPerMl: null,
  densityTemperatureC: null,
  note,
  source: SRC_CRC_STATE,
});

/** Parents that are not weighed in as solids. Every other parent is weighed in. */
export const PARENT_HANDLING: readonly ParentHandling[] = Object.freeze([
  liquid('mesylate', 1.481, 25, 'methanesulfonic acid, a corrosive liquid'),
  liquid('esylate', 1.35, 25, 'ethanesulfonic acid, a corrosive liquid'),
  liquid('acetate', 1.049, 20, 'glacial acetic acid'),
  liquid('sulfate', 1.83, 20, 'sulfuric acid (neat, about 98 %), strongly corrosive'),
  liquid('hydrogen-sulfate', 1.83, 20, 'sulfuric acid (neat, about 98 %), strongly corrosive'),
  liquid('nitrate', 1.51, 20, 'nitric acid (neat), strongly corrosive and oxidising'),
  liquid('diethylamine', 0.707, 20, 'diethylamine, a volatile liquid'),
  liquid('ethanolamine', 1.018, 20, '2-aminoethanol, a liquid'),
  stockOnly('chloride', 'hydrogen chloride is a gas: dose hydrochloric acid or a solution'),
  stockOnly('bromide', 'hydrogen bromide is a gas: dose hydrobromic acid or a solution'),
  stockOnly('iodide', 'hydrogen iodide is a gas: dose hydriodic acid or a solution'),
  stockOnly('fluoride', 'hydrogen fluoride boils at about 20 °C: dose a solution'),
  stockOnly('perchlorate', 'perchloric acid is handled as its aqueous solution'),
  stockOnly('carbonate', 'carbonic acid exists only in solution'),
  stockOnly('ammonium', 'ammonia is a gas: dose a solution'),
  stockOnly('choline', 'choline hydroxide is handled as a solution'),
  stockOnly('tetramethylammonium', 'tetramethylammonium hydroxide is handled as a solution'),
  stockOnly('tetraethylammonium', 'tetraethylammonium hydroxide is handled as a solution'),
]);

const handlingById = new Map(PARENT_HANDLING.map((h) => [h.ionId, h]));

/** How a counter-ion's parent is dosed; undefined means weighed in as a solid. */
export function parentHandling(ionId: string): ParentHandling | undefined {
  return handlingById.get(ionId);
}

export interface ParentSolubility {
  ionId: string;
  solventId: string;
  /** Solubility of the parent in g/L (= mg/mL), or null where only "practically insoluble" is known. */
  solubilityGPerL: number | null;
  temperatureC: number | null;
  /** What the source says, in words. */
  statement: string;
  source: string;
}

const aq = (ionId: string, gPerL: number, t: number, name: string): ParentSolubility => ({
  ionId,
  solventId: 'water',
  solubilityGPerL: gPerL,
  temperatureC: t,
  statement: `${name} dissolves to about ${gPerL} g/L in water at ${t} °C`,
  source: SRC_CRC_AQ_SOLUBILITY,
});
const insoluble = (ionId: string, solventId: string, statement: string): ParentSolubility => ({
  ionId,
  solventId,
  solubilityGPerL: null,
  temperatureC: null,
  statement,
  source: SRC_PH_EUR_SOLUBILITY,
});

/** Parents known to dissolve poorly in a solvent (the plan warns when a well needs more than this). */
export const PARENT_SOLUBILITIES: readonly ParentSolubility[] = Object.freeze([
  aq('fumarate', 6.3, 25, 'fumaric acid'),
  aq('benzoate', 3.4, 25, 'benzoic acid'),
  aq('salicylate', 2.2, 25, 'salicylic acid'),
  aq('adipate', 24, 25, 'adipic acid'),
  aq('hippurate', 3.75, 20, 'hippuric acid'),
  aq('aspartate', 5.4, 25, 'L-aspartic acid'),
  aq('glutamate', 8.6, 25, 'L-glutamic acid'),
  insoluble('fumarate', 'heptane', 'fumaric acid is practically insoluble in heptane'),
  insoluble('fumarate', 'toluene', 'fumaric acid is practically insoluble in toluene'),
  insoluble('aspartate', 'ethanol', 'L-aspartic acid is practically insoluble in ethanol'),
  insoluble('glutamate', 'ethanol', 'L-glutamic acid is practically insoluble in ethanol'),
  insoluble('lysine', 'ethanol', 'L-lysine is practically insoluble in ethanol'),
  insoluble('arginine', 'ethanol', 'L-arginine is very slightly soluble in ethanol'),
]);

/** The known poor solubility of a counter-ion's parent in a solvent, or undefined. */
export function parentSolubility(ionId: string, solventId: string): ParentSolubility | undefined {
  return PARENT_SOLUBILITIES.find((s) => s.ionId === ionId && s.solventId === solventId);
}
