/**
 * Citation strings used by the counter-ion library rows. A value recalled rather than read in this
 * session says "from memory"; a value read from a public table names the page and the day it was read.
 */

/** Read 2026-12-01: secondary compilation of pK values at 25 °C with literature references per row. */
export const SRC_AQION =
  'aqion, "Organic Acids and Salts" table, pK at 25 °C compiled from the literature (https://www.aqion.de/sd/178, read 2026-12-01)';

/** Read 2026-12-01: table of polyprotic acid ionization constants at 25 °C. */
export const SRC_FROMM =
  'J. R. Fromm, "Ionization Constants of Aqueous Polyprotic Acids" (http://www.3rd1000.com/chem301/p00406.htm, read 2026-12-01)';

/** Read 2026-12-01: NBS potentiometric pK of benzoic acid in water at 25.0 °C. */
export const SRC_NBS_BENZOIC =
  'J. Res. Natl. Bur. Stand. 71A (1967) 379–384, Table 1: benzoic acid in water at 25.0 °C, pK 4.210 (https://pmc.ncbi.nlm.nih.gov/articles/PMC6624721/table/T1, read 2026-12-01)';

export const SRC_CRC_ORGANIC =
  'CRC Handbook of Chemistry and Physics, 97th ed. (W. M. Haynes, ed., 2016), "Dissociation Constants of Organic Acids and Bases", 25 °C (from memory)';

export const SRC_CRC_INORGANIC =
  'CRC Handbook of Chemistry and Physics, 97th ed. (2016), "Dissociation Constants of Inorganic Acids and Bases", 25 °C (from memory)';

export const SRC_CRC_AMINO =
  'CRC Handbook of Chemistry and Physics, 97th ed. (2016), "Properties of Amino Acids", pKa at 25 °C (from memory)';

export const SRC_STRONG_ACID =
  'strong acid: commonly quoted approximate aqueous pKa (from memory); only its order of magnitude matters for ΔpKa';

export const SRC_SALTS_HANDBOOK_PKA =
  'P. H. Stahl, C. G. Wermuth (eds.), Handbook of Pharmaceutical Salts (2002), monographs of salt-forming acids and bases (from memory)';

export const SRC_PKW =
  'conjugate acid of the hydroxide: water, pKw = 14.00 at 25 °C (CRC Handbook, "Ion Product of Water Substance"; from memory) — the salt is made from the metal or quaternary hydroxide';

export const SRC_TRIS =
  'R. G. Bates, H. B. Hetzer, J. Phys. Chem. 65 (1961) 667, tris(hydroxymethyl)aminomethane at 25 °C (from memory)';

export const SRC_STAHL_CLASS =
  'P. H. Stahl, C. G. Wermuth (eds.), Handbook of Pharmaceutical Salts: Properties, Selection, and Use, Wiley-VCH/VHCA, 2002, classification of salt formers into three classes (from memory — check against the handbook)';

export const SRC_NOT_CLASSIFIED =
  'no class recalled from the handbook (from memory); a project may set one';

export const SRC_SMILES =
  'structure drawn for this library (constitution of the usual ion; stereocentres not encoded); checked against the formula with openchemlib in tests';

export const SRC_FORMULA =
  'Hill formula of the ion; tests/chem/library check it against openchemlib applied to the ion SMILES';

export const SRC_TRADE_MEMORY = 'note of the trade from memory (general pre-formulation experience; not a measurement)';

export const SRC_SERAJUDDIN_2007 =
  'A. T. M. Serajuddin, Adv. Drug Deliv. Rev. 59 (2007) 603–616 (common-ion effect of gastric chloride)';
