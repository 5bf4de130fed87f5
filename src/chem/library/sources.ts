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

/**
 * Read 2026-12-01: the CRC Handbook table "Dissociation Constants of Organic Acids and Bases" (compounds in
 * Hill order; columns Mol. form., Name, Step, t/°C, pKa; ref. 7 of that edition is the Merck Index 12th ed.,
 * 1996), in the row-by-row copy eladnoor/milo-lab data/thermodynamics/pKa.csv (commit d6af94c6);
 * its opening rows match the copy of the same table at https://docslib.org/download/1794433. Where the
 * table gives a temperature other than 25 °C the row's source says so.
 */
export const SRC_CRC_ORGANIC_READ =
  'CRC Handbook of Chemistry and Physics, "Dissociation Constants of Organic Acids and Bases" (edition citing the Merck Index 12th ed.), transcribed in github.com/eladnoor/milo-lab data/thermodynamics/pKa.csv (commit d6af94c6), read 2026-12-01';

/** Read 2026-12-01: CRC inorganic dissociation-constant table (after Perrin 1982), 86th ed. pages 8-40/8-41. */
export const SRC_CRC_INORGANIC_READ =
  'CRC Handbook of Chemistry and Physics, 86th ed. (2005), "Dissociation Constants of Inorganic Acids and Bases" (after Perrin 1982), pp. 8-40–8-41, read 2026-12-01 at https://zanotowane.pl/1032/8428 and https://paperzz.com/doc/8836464';

/** Read 2026-12-01: NIST SRD 46 values as tabulated in a textbook appendix (I = 0, 25 °C). */
export const SRC_NIST46_HARRIS =
  'D. C. Harris, Quantitative Chemical Analysis, 8th ed. (2010), App. G p. AP11 (NIST SRD 46, μ = 0, 25 °C), read 2026-12-01 at https://docslib.org/download/598516';

/** Read 2026-12-01: thermodynamic (I → 0) protonation constant of gluconate at 25 °C, abstract. */
export const SRC_GLUCONIC_TALANTA =
  'Talanta 45 (1998) 1007–1014, potentiometric study of D-gluconic acid/δ-lactone in NaClO4 at 25 °C: thermodynamic log β⁰(H⁺ + G⁻ ⇌ HG) = 3.92 ± 0.10 (abstract, https://www.pubmed.gov/18967090/, read 2026-12-01); other published values run from 3.3 (I = 0.1 M, NMR) to 3.74, lactonisation makes the constant hard to pin down';

export const SRC_CRC_ORGANIC =
  'CRC Handbook of Chemistry and Physics, 97th ed. (W. M. Haynes, ed., 2016), "Dissociation Constants of Organic Acids and Bases", 25 °C (from memory)';

export const SRC_CRC_INORGANIC =
  'CRC Handbook of Chemistry and Physics, 97th ed. (2016), "Dissociation Constants of Inorganic Acids and Bases", 25 °C (from memory)';

export const SRC_STRONG_ACID =
  'strong acid: commonly quoted approximate aqueous pKa (from memory); only its order of magnitude matters for ΔpKa';

export const SRC_SALTS_HANDBOOK_PKA =
  'P. H. Stahl, C. G. Wermuth (eds.), Handbook of Pharmaceutical Salts (2002), monographs of salt-forming acids and bases (from memory)';

/**
 * Water as the conjugate acid of the hydroxide, pKa(H2O) = pKw = 13.995 at 25 °C, read 2026-12-01 in the
 * CRC inorganic table (last row, "Water H2O 25 13.995").
 */
export const SRC_PKW =
  'conjugate acid of the hydroxide: water, pKa = pKw = 13.995 at 25 °C, CRC Handbook "Dissociation Constants of Inorganic Acids and Bases", row "Water H2O 25 13.995" (read 2026-12-01 in a copy of that CRC page, scribd document 427856487) — the salt is made from the metal or quaternary hydroxide';

export const SRC_TRIS =
  'R. G. Bates, H. B. Hetzer, J. Phys. Chem. 65 (1961) 667, tris(hydroxymethyl)aminomethane at 25 °C (from memory)';

export const SRC_STAHL_CLASS =
  'P. H. Stahl, C. G. Wermuth (eds.), Handbook of Pharmaceutical Salts: Properties, Selection, and Use, Wiley-VCH/VHCA, 2002, classification of salt formers into three classes (from memory — no published copy of the class lists could be read on 2026-12-01; check against the handbook)';

export const SRC_NOT_CLASSIFIED =
  'no class recalled from the handbook (from memory); a project may set one';

export const SRC_SMILES =
  'structure drawn for this library (constitution of the usual ion; stereocentres not encoded); checked against the formula with openchemlib in tests';

export const SRC_FORMULA =
  'Hill formula of the ion; tests/chem/library check it against openchemlib applied to the ion SMILES';

export const SRC_TRADE_MEMORY =
  'note of the trade from memory (general pre-formulation experience; not a measurement)';

export const SRC_SERAJUDDIN_2007 =
  'A. T. M. Serajuddin, Adv. Drug Deliv. Rev. 59 (2007) 603–616 (common-ion effect of gastric chloride)';
