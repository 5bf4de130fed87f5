/**
 * Common tablet and capsule excipients with the pH of their aqueous slurry or solution — the usual proxy
 * for the microenvironment an excipient gives a salt in a solid dose form (Serajuddin 2007, Adv. Drug
 * Deliv. Rev. 59, 603; Guerrieri & Taylor 2009, Pharm. Res. 26, 2015; Merritt, Viswanath & Stephenson
 * 2013, Pharm. Res. 30, 203; John, Xu, Lupton & Harmon 2013, Pharm. Res. 30, 1628, on magnesium
 * stearate).
 *
 * Each row: the lowest and highest pH its source gives and how it was measured. A single published
 * value is widened to ±0.5 pH (`SINGLE_VALUE_HALF_WIDTH_PH`, common practice: slurry pH moves by about
 * that much between lots and slurry strengths). Values marked "from memory" were recalled, not read
 * from the source at the time of writing — check them against your own copy or measure your lot.
 */
export type ExcipientRole =
  'filler' | 'disintegrant' | 'lubricant' | 'glidant' | 'binder' | 'acidifier' | 'alkaliser';

export interface ExcipientRecord {
  /** kebab-case id, stable: stored with projects and accepted by `saltsmith screen --excipients`. */
  id: string;
  name: string;
  role: ExcipientRole;
  /** Lowest and highest pH of the aqueous slurry/solution (equal when one value is published). */
  phLow: number;
  phHigh: number;
  /** How the pH was measured (concentration, medium), as the source states it. */
  measuredAs: string;
  /** Where the value comes from. */
  source: string;
}

/** Half-width given to a single published pH value (common practice, see the file comment). */
export const SINGLE_VALUE_HALF_WIDTH_PH = 0.5;

const HPE =
  'Handbook of Pharmaceutical Excipients, 6th ed. (Rowe, Sheskey & Quinn 2009), monograph "Typical properties: pH" — from memory';
const STEARATE =
  'from memory: aqueous slurries of magnesium stearate are reported alkaline (about pH 8–10) in studies of excipient-induced disproportionation (John et al. 2013, Pharm. Res. 30, 1628); not in the Handbook monograph';

export const EXCIPIENTS: readonly ExcipientRecord[] = [
  // fillers (diluents)
  {
    id: 'microcrystalline-cellulose',
    name: 'Microcrystalline cellulose',
    role: 'filler',
    phLow: 5.0,
    phHigh: 7.5,
    measuredAs: 'supernatant of an aqueous dispersion',
    source: HPE,
  },
  {
    id: 'lactose-monohydrate',
    name: 'Lactose monohydrate',
    role: 'filler',
    phLow: 4.0,
    phHigh: 6.5,
    measuredAs: '10% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'mannitol',
    name: 'Mannitol',
    role: 'filler',
    phLow: 4.0,
    phHigh: 7.0,
    measuredAs: '10% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'dibasic-calcium-phosphate-anhydrous',
    name: 'Dibasic calcium phosphate, anhydrous',
    role: 'filler',
    phLow: 7.3,
    phHigh: 7.3,
    measuredAs: '20% aqueous slurry',
    source: HPE,
  },
  {
    id: 'dibasic-calcium-phosphate-dihydrate',
    name: 'Dibasic calcium phosphate dihydrate',
    role: 'filler',
    phLow: 7.4,
    phHigh: 7.4,
    measuredAs: '20% aqueous slurry',
    source: HPE,
  },
  {
    id: 'starch-maize',
    name: 'Starch (maize)',
    role: 'filler',
    phLow: 4.0,
    phHigh: 7.0,
    measuredAs: 'aqueous dispersion (pharmacopoeial limit)',
    source: 'USP–NF monograph Corn Starch, pH limit — from memory',
  },
  {
    id: 'pregelatinized-starch',
    name: 'Pregelatinized starch',
    role: 'filler',
    phLow: 4.5,
    phHigh: 7.0,
    measuredAs: '10% w/v aqueous dispersion',
    source: HPE,
  },
  {
    id: 'calcium-carbonate',
    name: 'Calcium carbonate',
    role: 'filler',
    phLow: 9.0,
    phHigh: 9.0,
    measuredAs: 'aqueous dispersion',
    source: HPE,
  },
  // disintegrants
  {
    id: 'croscarmellose-sodium',
    name: 'Croscarmellose sodium',
    role: 'disintegrant',
    phLow: 5.0,
    phHigh: 7.0,
    measuredAs: '1% w/v aqueous dispersion',
    source: HPE,
  },
  {
    id: 'sodium-starch-glycolate',
    name: 'Sodium starch glycolate (type A)',
    role: 'disintegrant',
    phLow: 5.5,
    phHigh: 7.5,
    measuredAs: '3.3% w/v aqueous dispersion',
    source: HPE,
  },
  {
    id: 'crospovidone',
    name: 'Crospovidone',
    role: 'disintegrant',
    phLow: 5.0,
    phHigh: 8.0,
    measuredAs: '1% w/v aqueous slurry',
    source: HPE,
  },
  // lubricants and glidants
  {
    id: 'magnesium-stearate',
    name: 'Magnesium stearate',
    role: 'lubricant',
    phLow: 8.0,
    phHigh: 10.0,
    measuredAs: 'aqueous slurry',
    source: STEARATE,
  },
  {
    id: 'sodium-stearyl-fumarate',
    name: 'Sodium stearyl fumarate',
    role: 'lubricant',
    phLow: 6.5,
    phHigh: 8.5,
    measuredAs: 'aqueous slurry',
    source:
      'from memory, uncertain (no monograph value recalled): about neutral to weakly alkaline; measure your lot',
  },
  {
    id: 'stearic-acid',
    name: 'Stearic acid',
    role: 'lubricant',
    phLow: 4.5,
    phHigh: 6.0,
    measuredAs: 'aqueous slurry (practically insoluble)',
    source: 'from memory, uncertain (no monograph value recalled): weakly acidic; measure your lot',
  },
  {
    id: 'talc',
    name: 'Talc',
    role: 'glidant',
    phLow: 7.0,
    phHigh: 10.0,
    measuredAs: '20% w/v aqueous dispersion',
    source: HPE,
  },
  {
    id: 'colloidal-silicon-dioxide',
    name: 'Colloidal silicon dioxide',
    role: 'glidant',
    phLow: 3.5,
    phHigh: 5.5,
    measuredAs: '4% w/v aqueous dispersion',
    source: HPE,
  },
  // binders
  {
    id: 'povidone-k30',
    name: 'Povidone (K ≤ 30)',
    role: 'binder',
    phLow: 3.0,
    phHigh: 5.0,
    measuredAs: '5% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'copovidone',
    name: 'Copovidone',
    role: 'binder',
    phLow: 3.0,
    phHigh: 7.0,
    measuredAs: '10% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'hypromellose',
    name: 'Hypromellose (HPMC)',
    role: 'binder',
    phLow: 5.0,
    phHigh: 8.0,
    measuredAs: '2% w/w aqueous solution',
    source: HPE,
  },
  {
    id: 'hydroxypropyl-cellulose',
    name: 'Hydroxypropyl cellulose',
    role: 'binder',
    phLow: 5.0,
    phHigh: 8.5,
    measuredAs: '1% w/v aqueous solution',
    source: HPE,
  },
  // acidifiers, buffers and alkalisers
  {
    id: 'citric-acid',
    name: 'Citric acid, anhydrous',
    role: 'acidifier',
    phLow: 2.2,
    phHigh: 2.2,
    measuredAs: '1% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'tartaric-acid',
    name: 'Tartaric acid',
    role: 'acidifier',
    phLow: 2.2,
    phHigh: 2.2,
    measuredAs: '1.5% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'sodium-citrate-dihydrate',
    name: 'Sodium citrate dihydrate',
    role: 'alkaliser',
    phLow: 7.0,
    phHigh: 9.0,
    measuredAs: '5% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'sodium-bicarbonate',
    name: 'Sodium bicarbonate',
    role: 'alkaliser',
    phLow: 8.3,
    phHigh: 8.3,
    measuredAs: 'freshly prepared 0.1 M aqueous solution, 25 °C',
    source: HPE,
  },
  {
    id: 'sodium-carbonate',
    name: 'Sodium carbonate',
    role: 'alkaliser',
    phLow: 11.4,
    phHigh: 11.4,
    measuredAs: '1% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'meglumine',
    name: 'Meglumine',
    role: 'alkaliser',
    phLow: 10.5,
    phHigh: 10.5,
    measuredAs: '1% w/v aqueous solution',
    source: HPE,
  },
  {
    id: 'magnesium-oxide',
    name: 'Magnesium oxide',
    role: 'alkaliser',
    phLow: 10.3,
    phHigh: 10.3,
    measuredAs: 'saturated aqueous slurry',
    source: HPE,
  },
];
