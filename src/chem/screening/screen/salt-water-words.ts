import type { SolubilityDriverId } from '../salt-solubility/estimate-salt-solubility';
import { fmt } from './screen-reasons';
import type { Reason, SaltWaterSolubility, ScreenFlag } from './screen.types';
import { basisShortWords, basisWords } from './salt-water-basis';

/**
 * The words for the salt's own solubility in water (the salt-solubility estimate): what drives it,
 * where it came from, and the "likely poorly soluble" flag it raises. Words only; the numbers come
 * from ksp-choice.ts.
 */

/** What each driver of the salt-solubility estimate is called in words. */
export const SOLUBILITY_DRIVER_WORDS: Record<SolubilityDriverId, string> = {
  'hydrophobic-counter-ion': 'hydrophobic counter-ion',
  'hydrophilic-counter-ion': 'hydrophilic counter-ion',
  'aromatic-counter-ion': 'aromatic counter-ion',
  'hydrogen-bonding-counter-ion': 'hydrogen-bonding counter-ion',
  'few-hydrogen-bonds': 'counter-ion with few hydrogen-bond groups',
  'large-counter-ion': 'large counter-ion',
  'small-counter-ion': 'small counter-ion',
  'inorganic-counter-ion': 'small inorganic counter-ion',
  'organic-counter-ion': 'organic counter-ion',
  'multivalent-counter-ion': 'doubly charged counter-ion',
  'endothermic-dissolution': 'more endothermic dissolution (ΔH_sol)',
  'exothermic-dissolution': 'less endothermic dissolution (ΔH_sol)',
  'high-melting-salt': 'high-melting salt',
  'low-melting-salt': 'low-melting salt',
  'divalent-cation': 'divalent cation (published calcium and strontium salts of acids)',
};

/** Where a salt's water solubility came from, as a short label (tables, CSV). */
export const SALT_WATER_ORIGIN_LABELS: Record<SaltWaterSolubility['origin'], string> = {
  model: 'model',
  'model+fusion': 'model + fusion data',
  measured: 'measured',
  anchor: 'anchor on S₀',
};

/** The drivers in words with their signed size, e.g. "hydrophobic counter-ion (−0.6)". */
export function driverWords(drivers: SaltWaterSolubility['drivers']): string {
  return drivers
    .map(
      (d) =>
        `${SOLUBILITY_DRIVER_WORDS[d.id]} (${d.decades > 0 ? '+' : '−'}${Math.abs(d.decades).toFixed(1)})`,
    )
    .join(', ');
}

/** The salt's own water solubility as a reason in words, naming what drives the estimate. */
export function saltWaterReason(s: SaltWaterSolubility): Reason {
  const drivers = s.drivers.length ? `; drivers, in decades: ${driverWords(s.drivers)}` : '';
  return {
    kind: s.origin === 'measured' ? 'measured' : 'note',
    criterion: 'solubility',
    text: `salt in water: ${fmt(s.mgPerMlAsSalt)} mg/mL as salt (${basisShortWords(s.basis)}, ±${s.log10DrugM.uncertainty.toFixed(1)} decades)${drivers}`,
  };
}

/**
 * "Likely poorly soluble" is about the salt itself: its own solubility in water (free-form
 * equivalents, its 1σ shown) against the highest dose in 250 mL — the ICH M9 volume.
 */
export function poorlySolubleFlag(s: SaltWaterSolubility, doseNumberInWater: number): ScreenFlag {
  const why = s.drivers.length
    ? ` (${s.drivers
        .slice(0, 2)
        .map((d) => SOLUBILITY_DRIVER_WORDS[d.id])
        .join(', ')})`
    : '';
  return {
    id: 'likely-poorly-soluble',
    text: `likely poorly soluble salt: ${fmt(s.mgPerMlAsFreeForm)} mg/mL in water as free form, D₀ ${fmt(doseNumberInWater)}${why}`,
    rule: `the salt's own solubility in water (${basisWords(s.basis)}) below the highest dose in 250 mL, the ICH M9 (2019) volume (D₀ > 1)`,
  };
}
