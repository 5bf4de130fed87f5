import type { RobustnessShared } from '../screening/rank-robustness';
import { uncertaintiesOf } from '../screening/screen/row-uncertainty';
import type { ScreenRow } from '../screening/screen/screen.types';
import { roundLogNormal, roundToUncertainty, type RoundedRange } from './precision';
import type { RoundedToUncertainty } from './precision';

/**
 * A screened candidate's numbers at the precision of their 1σ, for every place that prints or exports
 * them (the Ranking, the sheet and its CSV, the command line), so one number reads the same
 * everywhere. The 1σ are those the rank-robustness draw uses (`uncertaintiesOf`): the drug's pKa σ for
 * ΔpKa, pH_max's linearised σ, and for a dose number or a solubility the log σ of the solid that
 * limits it (the salt's, or the free form's S₀ σ).
 */
export interface ShownRowNumbers {
  deltaPka: RoundedToUncertainty | null;
  phMax: RoundedToUncertainty | null;
  /** The salt's own solubility in water, mg/mL as salt. */
  saltWaterMgPerMl: RoundedRange | null;
  worstDoseNumber: RoundedRange | null;
  gastricDoseNumber: RoundedRange | null;
  /** ΔH_sol per drug ion, kJ/mol, with its 1σ; null when the core calls it not informative. */
  solutionEnthalpyKJPerMolDrugIon: RoundedToUncertainty | null;
}

type Shared = Pick<RobustnessShared, 'drugPkaSigma' | 'log10IntrinsicSigma'>;

export function shownRowNumbers(
  row: Pick<
    ScreenRow,
    | 'deltaPka'
    | 'phMax'
    | 'saltWaterSolubility'
    | 'worst'
    | 'gastric'
    | 'robustness'
    | 'solutionEnthalpyPerDrugIon'
  >,
  shared: Shared,
  /** uncertaintiesOf(row, shared), when the caller has it already (the same numbers). */
  u: ReturnType<typeof uncertaintiesOf> = uncertaintiesOf(row, shared),
): ShownRowNumbers {
  const logSigmaOf = (solid: 'salt' | 'free-form') =>
    solid === 'salt' ? u.saltLogSigma : u.freeLogSigma;
  const dose = (d: { doseNumber: number | null; solid: 'salt' | 'free-form' } | null) =>
    d && d.doseNumber !== null ? roundLogNormal(d.doseNumber, logSigmaOf(d.solid)) : null;
  const sw = row.saltWaterSolubility;
  const h = row.solutionEnthalpyPerDrugIon;
  return {
    deltaPka: row.deltaPka === null ? null : roundToUncertainty(row.deltaPka, shared.drugPkaSigma),
    phMax: row.phMax === null ? null : roundToUncertainty(row.phMax, u.phMaxSigma),
    saltWaterMgPerMl: sw ? roundLogNormal(sw.mgPerMlAsSalt, sw.log10DrugM.uncertainty) : null,
    worstDoseNumber: dose(row.worst),
    gastricDoseNumber: dose(row.gastric),
    solutionEnthalpyKJPerMolDrugIon:
      h && !h.notInformative
        ? roundToUncertainty(h.valueKJPerMolDrugIon, h.sigmaKJPerMolDrugIon ?? 0)
        : null,
  };
}
