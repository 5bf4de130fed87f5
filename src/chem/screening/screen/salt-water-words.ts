import {
  saltWaterEstimateOf,
  type SaltSolubilityOptions,
  type SaltWaterNumbers,
  type SolubilityDriverId,
} from '../salt-solubility/estimate-salt-solubility';
import type { SaltSolubilityInput } from '../salt-solubility/salt-solubility-features';
import { estimatedKspFlag, fmt, measuredEnthalpyReason } from './screen-reasons';
import type { Reason, SaltWaterSolubility, ScreenFlag } from './screen.types';
import { basisShortWords, basisWords } from './salt-water-basis';
import { saltWaterOf } from './ksp-choice-parts';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';

/**
 * The words for the salt's own solubility in water (the salt-solubility estimate): what drives it,
 * where it came from, and the "likely poorly soluble" flag it raises; and the words of an estimated
 * K_sp, which ksp-choice.ts asks for only when a row is built. Words only; the numbers come from
 * ksp-choice.ts.
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

/** The words of a model estimate: the estimate with its words, the salt's water solubility, reasons, flag. */
export function modelWords(
  ctx: ScreenContext,
  p: PreparedCandidate,
  input: SaltSolubilityInput,
  opts: SaltSolubilityOptions,
  num: SaltWaterNumbers,
  sources: string[],
): ChoiceWords & { kspNotes: string[] } {
  const est = saltWaterEstimateOf(input, opts, num, sources);
  const kspNotes = ['ESTIMATE — no salt solubility measured', ...(est.log10DrugM.notes ?? [])];
  const saltWater = saltWaterOf(p, ctx, est.log10DrugM, est.origin, est.drivers, undefined, {
    sharedLog10Sd: est.sharedLog10Sd,
    withinLog10Sd: est.withinLog10Sd,
    outsideTrainingRange: est.domain.outside,
  });
  // Melting data that the check did not let shift the estimate are shown beside it, not applied.
  if (est.fusion && !est.fusion.applied) saltWater.basis.fusion = 'shown';
  // The estimate's remarks (outside the training range, divalent cation, melting data) as reasons.
  const remarks: Reason[] = est.remarks.map((text) => ({
    kind: 'note',
    criterion: 'solubility',
    text,
  }));
  const words = estimatedChoiceWords(est.log10DrugM.uncertainty, saltWater, [
    ...remarks,
    ...enthalpyReasons(p),
  ]);
  return { kspNotes, reasons: words.reasons, flags: words.flags, saltWater };
}

/** What an estimated K_sp says about itself: the salt's water solubility, the reasons, the flag. */
export interface ChoiceWords {
  reasons: Reason[];
  flags: ScreenFlag[];
  saltWater: SaltWaterSolubility;
}

/** An estimate's words: its water solubility as a reason, the other reasons, the "estimated" flag. */
export function estimatedChoiceWords(
  sigma: number,
  saltWater: SaltWaterSolubility,
  otherReasons: Reason[],
): ChoiceWords {
  return {
    reasons: [saltWaterReason(saltWater), ...otherReasons],
    flags: [estimatedKspFlag(sigma, saltWater.basis)],
    saltWater,
  };
}

/** A measured ΔH_sol used in place of the estimate, as a reason of the estimated K_sp. */
export function enthalpyReasons(p: PreparedCandidate): Reason[] {
  const origin = p.solutionEnthalpyOrigin;
  return origin?.startsWith('measured') ? [measuredEnthalpyReason(origin)] : [];
}
