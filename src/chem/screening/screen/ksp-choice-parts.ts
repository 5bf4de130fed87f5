import type { Estimate } from '../../result';
import type { PreparedCandidate } from './prepare-candidate';
import type { ScreenContext } from './screen-context';
import { saltSolubilityBasis, type BenchReadingFields } from './salt-water-basis';
import type { BenchSolubilityUse, Reason, SaltWaterSolubility, ScreenFlag } from './screen.types';

/** The K_sp a candidate is screened with, where it came from, and what is said about it. */
export interface KspChoice {
  log10Ksp: Estimate;
  kspOrigin: 'measured' | 'estimated';
  /**
   * Spread of the salt's own log₁₀ solubility beyond that of S₀, decades, drawn per candidate by the
   * rank robustness; for a model estimate its within-series part only.
   */
  saltLog10Sigma: number;
  /** The model estimate's level shared by every salt of the drug, decades (drawn once per drug); absent or 0 otherwise. */
  saltSharedLog10Sigma?: number;
  /** True when the salt's solubility is anchored on S₀ (so it moves with S₀ in the robustness draw). */
  anchored: boolean;
  reasons: Reason[];
  flags: ScreenFlag[];
  /** The salt's own solubility in water behind this K_sp. */
  saltWater: SaltWaterSolubility;
  /** How the candidate's measured solubilities were read (null without one). */
  benchSolubility: BenchSolubilityUse | null;
}

/** What a model estimate adds to the salt's water solubility (its σ split, the domain check). */
export type ModelSaltWaterFields = Required<
  Pick<SaltWaterSolubility, 'sharedLog10Sd' | 'withinLog10Sd' | 'outsideTrainingRange'>
>;

/**
 * The salt's water solubility in the three units the workbench shows (with a model estimate's own
 * fields after the others; one object literal each way, no spread: a row's words are built here).
 */
export function saltWaterOf(
  p: PreparedCandidate,
  ctx: ScreenContext,
  log10DrugM: Estimate,
  origin: SaltWaterSolubility['origin'],
  drivers: SaltWaterSolubility['drivers'],
  bench?: BenchReadingFields,
  model?: ModelSaltWaterFields,
): SaltWaterSolubility {
  const drugM = 10 ** log10DrugM.value;
  const anchorDecades = ctx.settings.saltAnchorLog10;
  const mgPerMlAsSalt = (drugM / p.cand.stoichiometry.drugPerSalt) * p.saltMolarMassGPerMol;
  const mgPerMlAsFreeForm = drugM * ctx.freeFormMolarMassGPerMol;
  const basis = saltSolubilityBasis({ origin, log10DrugM }, { anchorDecades, bench });
  if (!model) return { log10DrugM, mgPerMlAsSalt, mgPerMlAsFreeForm, origin, drivers, basis };
  return {
    log10DrugM,
    mgPerMlAsSalt,
    mgPerMlAsFreeForm,
    origin,
    drivers,
    basis,
    sharedLog10Sd: model.sharedLog10Sd,
    withinLog10Sd: model.withinLog10Sd,
    outsideTrainingRange: model.outsideTrainingRange,
  };
}
