import type { ScreeningMedium } from '../settings';

/**
 * The standard biorelevant dissolution media as one-click presets, with their published pH and
 * composition (mmol/L). Compositions are from memory of the cited papers unless marked otherwise; the
 * FaSSGF and FaSSIF (v1) surfactant levels, pH and osmolality were checked against secondary tables
 * reproducing them when this file was written.
 *
 * - FaSSGF: Vertzoni, Dressman, Butler, Hempenstall & Reppas 2005, Eur. J. Pharm. Biopharm. 60, 413.
 * - FaSSIF, FeSSIF (version 1): Galia, Nicolaides, Hörter, Löbenberg, Reppas & Dressman 1998, Pharm.
 *   Res. 15, 698 (first made with KH₂PO₄/KCl); the sodium-salt recipe as tabulated by Jantratid,
 *   Janssen, Reppas & Dressman 2008, Pharm. Res. 25, 1663, is used here.
 * - FaSSIF-V2, FeSSIF-V2: Jantratid et al. 2008 (maleate buffer; FeSSIF-V2 adds glyceryl monooleate
 *   5 mM and sodium oleate 0.8 mM).
 *
 * What the workbench applies: the pH, and the ions it models as common ions — chloride (NaCl, and HCl
 * in FaSSGF), the buffer anion (phosphate, acetate or maleate, all protonation states) for salts of
 * that counter-ion, and sodium for the sodium salts of acids. What it does NOT model: solubilisation
 * by the bile salt (sodium taurocholate) and lecithin micelles, the lipids of FeSSIF-V2 and pepsin —
 * a weak base's or acid's solubility in these media is usually higher than the workbench's number.
 */
export interface BiorelevantMediumRecord {
  id: string;
  label: string;
  pH: number;
  /** Buffer species and its total concentration, mmol/L. */
  buffer: { species: 'phosphate' | 'acetate' | 'maleate' | 'none'; mM: number };
  sodiumChlorideMM: number;
  /** NaOH added to set the pH (its sodium counts), mmol/L; HCl for FaSSGF. */
  sodiumHydroxideMM: number;
  hydrochloricAcidMM: number;
  sodiumTaurocholateMM: number;
  lecithinMM: number;
  /** Osmolality, mOsm/kg, as published. */
  osmolalityMOsmPerKg: number;
  /** Other components, in words (lipids, enzymes). */
  other: string;
  source: string;
}

/** [H⁺] at pH 1.6 taken as 10^−1.6 mol/L (activity = concentration, our approximation): 25.1 mM HCl. */
const FASSGF_HCL_MM = 1000 * 10 ** -1.6;

export const BIORELEVANT_MEDIA: readonly BiorelevantMediumRecord[] = [
  {
    id: 'fassgf',
    label: 'FaSSGF',
    pH: 1.6,
    buffer: { species: 'none', mM: 0 },
    sodiumChlorideMM: 34.2,
    sodiumHydroxideMM: 0,
    hydrochloricAcidMM: FASSGF_HCL_MM,
    sodiumTaurocholateMM: 0.08,
    lecithinMM: 0.02,
    osmolalityMOsmPerKg: 120.7,
    other: 'pepsin 0.1 mg/mL',
    source:
      'Vertzoni et al. 2005, Eur. J. Pharm. Biopharm. 60, 413 (NaCl, taurocholate, lecithin and pH as reproduced in Table I of a 2022 AAPS PharmSciTech paper, doi 10.1208/s12249-022-02256-2; osmolality from memory)',
  },
  {
    id: 'fassif-v1',
    label: 'FaSSIF',
    pH: 6.5,
    buffer: { species: 'phosphate', mM: 28.65 },
    sodiumChlorideMM: 105.85,
    sodiumHydroxideMM: 8.7,
    hydrochloricAcidMM: 0,
    sodiumTaurocholateMM: 3,
    lecithinMM: 0.75,
    osmolalityMOsmPerKg: 270,
    other: '',
    source:
      'Galia et al. 1998, Pharm. Res. 15, 698; sodium recipe of Jantratid et al. 2008, Pharm. Res. 25, 1663 — buffer, NaCl and NaOH from memory',
  },
  {
    id: 'fessif-v1',
    label: 'FeSSIF',
    pH: 5.0,
    buffer: { species: 'acetate', mM: 144.05 },
    sodiumChlorideMM: 203.18,
    sodiumHydroxideMM: 101.0,
    hydrochloricAcidMM: 0,
    sodiumTaurocholateMM: 15,
    lecithinMM: 3.75,
    osmolalityMOsmPerKg: 635,
    other: '',
    source:
      'Galia et al. 1998, Pharm. Res. 15, 698; sodium recipe of Jantratid et al. 2008, Pharm. Res. 25, 1663 — from memory',
  },
  {
    id: 'fassif-v2',
    label: 'FaSSIF-V2',
    pH: 6.5,
    buffer: { species: 'maleate', mM: 19.12 },
    sodiumChlorideMM: 68.62,
    sodiumHydroxideMM: 34.8,
    hydrochloricAcidMM: 0,
    sodiumTaurocholateMM: 3,
    lecithinMM: 0.2,
    osmolalityMOsmPerKg: 180,
    other: '',
    source: 'Jantratid et al. 2008, Pharm. Res. 25, 1663 — from memory',
  },
  {
    id: 'fessif-v2',
    label: 'FeSSIF-V2',
    pH: 5.8,
    buffer: { species: 'maleate', mM: 55.02 },
    sodiumChlorideMM: 125.5,
    sodiumHydroxideMM: 81.65,
    hydrochloricAcidMM: 0,
    sodiumTaurocholateMM: 10,
    lecithinMM: 2,
    osmolalityMOsmPerKg: 390,
    other: 'glyceryl monooleate 5 mM, sodium oleate 0.8 mM',
    source: 'Jantratid et al. 2008, Pharm. Res. 25, 1663 — from memory',
  },
];

/** Library ids the buffer species reaches: every phosphate form of the library for phosphate. */
const BUFFER_IONS: Record<BiorelevantMediumRecord['buffer']['species'], string[]> = {
  phosphate: ['phosphate', 'hydrogen-phosphate', 'dihydrogen-phosphate'],
  acetate: ['acetate'],
  maleate: ['maleate'],
  none: [],
};

/**
 * The preset as a screening medium: its pH, the common ions the workbench models (mol/L) and an
 * ionic strength for the Davies option taken as the larger of the sodium and chloride concentrations — every ion counted as
 * monovalent (our approximation; it ignores HPO₄²⁻ and maleate²⁻).
 */
export function biorelevantMedium(preset: BiorelevantMediumRecord): ScreeningMedium {
  const sodiumMM =
    preset.sodiumChlorideMM +
    preset.sodiumHydroxideMM +
    preset.sodiumTaurocholateMM +
    (preset.buffer.species === 'phosphate' ? preset.buffer.mM : 0) +
    (preset.other.includes('sodium oleate') ? 0.8 : 0);
  const chlorideMM = preset.sodiumChlorideMM + preset.hydrochloricAcidMM;
  const ions: Record<string, number> = { chloride: chlorideMM / 1000, sodium: sodiumMM / 1000 };
  for (const id of BUFFER_IONS[preset.buffer.species]) ions[id] = preset.buffer.mM / 1000;
  return {
    id: `preset-${preset.id}`,
    label: preset.label,
    pH: preset.pH,
    ions,
    ionicStrengthM: Math.min(5, Math.max(sodiumMM, chlorideMM) / 1000),
  };
}
