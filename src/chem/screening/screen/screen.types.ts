import type { Estimate } from '../../result';
import type { SaltFormationVerdict } from '../delta-pka';
import type { DisproportionationResult } from '../disproportionation';
import type { ExcipientRisk } from '../excipients/excipient-risk';
import type { InterpretedMeasurements, MeasurementInput } from '../measurements';
import type { RobustnessRow, RobustnessShared } from '../rank-robustness';
import type { CriterionInputs } from '../ranking';
import type { ScreeningSettings } from '../settings';
import type { CounterIonDescriptors } from '../salt-solubility/counter-ion-descriptors';
import type { SolubilityDriver } from '../salt-solubility/estimate-salt-solubility';
import type { SaltSolubilityBasis } from './salt-water-basis';
import type { SolutionEnthalpyShown } from './solution-enthalpy-shown';

/**
 * The shapes the screen reads and returns. Inputs are structural subsets of the library's CounterIon,
 * the compound schema and the stored measurement records, so the core imports no app code.
 */

export interface ScreeningCompound {
  name: string;
  kind: 'base' | 'acid';
  pKas: readonly {
    value: number;
    origin: 'measured' | 'literature' | 'predicted' | 'not-stated';
  }[];
  ionCharge: number;
  intrinsicSolubilityMgPerMl: number | null;
  /** Where the entered S₀ comes from; absent or null: not stated (screened with the predicted σ). */
  intrinsicSolubilityOrigin?: 'measured' | 'literature' | 'predicted' | 'not-stated' | null;
  meltingPointC: number | null;
  logP: number | null;
  doseMg: number | null;
}

export interface ScreeningDrugIon {
  molarMassGPerMol: number;
  freeFormMolarMassGPerMol: number;
}

export interface ScreeningCounterIon {
  id: string;
  name: string;
  kind: 'anion' | 'cation';
  charge: number;
  molarMassGPerMol: number;
  pKas: readonly { value: number; source?: string }[];
  acceptabilityClass: 1 | 2 | 3 | null;
  classSource?: string;
}

export interface ScreeningStoichiometry {
  label?: string;
  drugPerSalt: number;
  counterIonPerSalt: number;
  /** Charge of the counter-ion in this salt. */
  ionCharge: number;
  /** Molar mass of the counter-ion in this charge state, g/mol (defaults to the ion's usual one). */
  ionMolarMassGPerMol?: number;
  pKaIndex?: number | null;
}

export interface ScreeningCandidate {
  id: string;
  counterIon: ScreeningCounterIon;
  stoichiometry: ScreeningStoichiometry;
  hydrateWater?: number;
  measurements?: readonly MeasurementInput[];
  /** ΔH_sol per formula unit from the thermochemistry engine (thermo-link.ts), if computed. */
  solutionEnthalpyKJ?: Estimate | null;
  /**
   * Computed descriptors of the counter-ion's parent (salt-solubility model). Bundled ions need none:
   * the screen looks theirs up; an in-house ion without them falls back to the anchor estimate.
   */
  counterIonDescriptors?: CounterIonDescriptors | null;
}

export interface ScreenCompoundInput {
  compound: ScreeningCompound;
  drugIon: ScreeningDrugIon;
  candidates: readonly ScreeningCandidate[];
  /** Partial settings; defaults fill the rest (settings.ts). */
  settings?: unknown;
  /**
   * 'full' (default): every row and the free form carry their pH–solubility profile for a chart.
   * 'none': the profiles are left empty (a ranking, a table or a batch needs none) and `doseNumbers`
   * keeps only the ICH M9 pH values (1.2, 4.5, 6.8) and the worst point; every other number is the
   * same, pH_max and the worst point included (found without the profile, ph-grid-solubility.ts).
   */
  profiles?: 'full' | 'none';
}

export type ReasonKind = 'keeps' | 'drops' | 'watch' | 'measured' | 'note';
export interface Reason {
  kind: ReasonKind;
  criterion: string;
  text: string;
}

export interface ScreenFlag {
  id:
    | 'likely-poorly-soluble'
    | 'salt-poorly-soluble'
    | 'disproportionation'
    | 'cocrystal-risk'
    | 'estimated-ksp'
    | 'bench-temperature'
    | 'bench-solid-conflict';
  text: string;
  /** The rule that raised it, with its source. */
  rule: string;
}

export interface DoseNumberAt {
  pH: number;
  solubilityMgPerMl: number;
  doseNumber: number | null;
  solid: 'salt' | 'free-form';
}

export interface MediumResult {
  id: string;
  label: string;
  pH: number;
  commonIonM: number;
  solubilityMgPerMl: number;
  doseNumber: number | null;
  solid: 'salt' | 'free-form';
  /**
   * Set when another salt, less soluble in this medium, would form and limit solubility — for a base in
   * gastric chloride, the hydrochloride (its label). Null otherwise.
   */
  convertsTo: string | null;
}

/**
 * The salt's own solubility in pure water at the screening temperature — the number K_sp, pH_max and
 * every dose number of an unmeasured salt rest on.
 */
export interface SaltWaterSolubility {
  /** log₁₀ of the drug's molar solubility from the salt, mol/L of drug; 1σ in decades. */
  log10DrugM: Estimate;
  /** The same as mg/mL of salt (with its water of crystallisation) and as mg/mL of free form. */
  mgPerMlAsSalt: number;
  mgPerMlAsFreeForm: number;
  /**
   * Where it comes from: the calibrated model, the model with the bench's fusion data, the lab's
   * measurement, or the common-practice anchor on S₀ when the counter-ion has no descriptors.
   */
  origin: 'model' | 'model+fusion' | 'measured' | 'anchor';
  /** Counter-ion properties that moved the model's estimate, largest first (empty when measured). */
  drivers: SolubilityDriver[];
  /**
   * The model estimate's 1σ split (decades): a level shared by every salt of the drug, and this
   * salt's own part (widened outside the training range); absent for measured and anchored values.
   */
  sharedLog10Sd?: number;
  withinLog10Sd?: number;
  /** Counter-ion descriptors outside the model's training range, in words (empty or absent inside it). */
  outsideTrainingRange?: string[];
  /** What the number rests on, as data: every explanation of it is written from this (salt-water-basis.ts). */
  basis: SaltSolubilityBasis;
}

/** Which solid limited a measured solubility (bench-solubility.ts): the salt, the free form, or undecided. */
export type LimitingSolid = 'salt' | 'free-form' | 'unknown';

/** How one measured solubility of a candidate was read. */
export interface BenchSolubilityReading {
  /** Position among the candidate's solubility measurements, in input order. */
  index: number;
  limitedBy: LimitingSolid;
  /**
   * What decided: the lab's statement of the solid left ('user'); the measured pH against the pH_max
   * the rest of the evidence gives ('ph-max'); the value against the free form's own solubility at its
   * pH ('free-form-saturation'); nothing ('no-ph': the equilibrium pH was not recorded;
   * 'within-margin': neither test is beyond its 1σ margin).
   */
  decidedBy: 'user' | 'ph-max' | 'free-form-saturation' | 'no-ph' | 'within-margin';
  ph: number | null;
  temperatureC: number | null;
  /** pH_max that the rest of the evidence gives (this value left out), ±1σ; null if none found. */
  restPhMax: { value: number; sigma: number; basis: 'estimate' | 'measured' } | null;
  /**
   * log₁₀ of the measured total drug over the free form's solubility at the measured pH (S₀ and pKa
   * of the compound), ±1σ: ≈ 0 when the free form is saturated, clearly < 0 when it cannot be the solid.
   */
  overFreeFormLog10: { value: number; sigma: number } | null;
  /** S₀ the value implies if the free form limited it (null without a pH). */
  impliedS0: { mgPerMl: number; log10M: number } | null;
  /** True for the value K_sp rests on. */
  usedForKsp: boolean;
}

/**
 * What a candidate's measured solubilities were taken for: the structured record wt/explain and the
 * bench area phrase. Null on a row without a measured solubility.
 */
export interface BenchSolubilityUse {
  /** Solid behind the value K_sp rests on ('salt' or 'unknown'); 'free-form' when none is used. */
  limitedBy: LimitingSolid;
  readings: BenchSolubilityReading[];
  /** S₀ implied by the free-form-limited value nearest the screening temperature (null if none). */
  impliedS0: { mgPerMl: number; log10M: number; temperatureC: number | null; ph: number } | null;
  /** The van ’t Hoff transfer of the value behind K_sp to the screening temperature, when made. */
  temperatureAdjusted: {
    fromC: number;
    toC: number;
    method: 'van-t-hoff-fit' | 'calorimetric';
    solutionEnthalpyKJ: number;
    log10Shift: number;
  } | null;
  /** Why the 1σ of the value behind K_sp was widened, in words (empty when it was not). */
  widenedBecause: string[];
  /** Set when the resulting pH_max lies below the pH the value was measured at. */
  conflict: string | null;
}

export interface ScreenRow {
  id: string;
  label: string;
  counterIonId: string;
  counterIonName: string;
  drugPerSalt: number;
  counterIonPerSalt: number;
  hydrateWater: number;
  error: string | null;
  deltaPka: number | null;
  deltaPkaEach: number[];
  saltFormation: SaltFormationVerdict | null;
  saltMolarMassGPerMol: number;
  activeFraction: number;
  saltMassPerDoseMg: number | null;
  /** The salt's own solubility in pure water (null for a row that could not be screened). */
  saltWaterSolubility: SaltWaterSolubility | null;
  /** log₁₀ K_sp with uncertainty (decades); method says measured or estimate. */
  log10Ksp: Estimate | null;
  kspOrigin: 'measured' | 'estimated' | null;
  /** How the measured solubilities were read (null without one). */
  benchSolubility: BenchSolubilityUse | null;
  phMax: number | null;
  /** Profile in mg/mL of free-form equivalents (pH 1–8 by default). */
  profile: { pH: number; solubilityMgPerMl: number; solid: 'salt' | 'free-form' }[];
  doseNumbers: DoseNumberAt[];
  worst: DoseNumberAt | null;
  solubilityClass: 'high' | 'low' | null;
  gastric: MediumResult | null;
  media: MediumResult[];
  disproportionation: DisproportionationResult | null;
  /** The salt against each chosen excipient (the salt × excipient matrix row); empty without any. */
  excipientRisks: ExcipientRisk[];
  /** ΔH_sol per drug ion as every area shows it, with its plausibility verdict (null without one). */
  solutionEnthalpyPerDrugIon: SolutionEnthalpyShown | null;
  measured: InterpretedMeasurements | null;
  flags: ScreenFlag[];
  reasons: Reason[];
  /** Inputs of the cheap ranking step. */
  criteria: CriterionInputs;
  /** Inputs of the rank-robustness draw. */
  robustness: RobustnessRow;
}

export interface FreeFormResult {
  log10IntrinsicM: Estimate;
  /** The stated origin of an entered S₀, or the General Solubility Equation when none was entered. */
  intrinsicOrigin:
    'measured' | 'literature' | 'predicted' | 'not-stated' | 'general-solubility-equation';
  profile: { pH: number; solubilityMgPerMl: number }[];
  doseNumbers: DoseNumberAt[];
  worst: DoseNumberAt | null;
  solubilityClass: 'high' | 'low' | null;
  /** The free form in the gastric medium (the hydrochloride may limit it, as for every salt). */
  gastric: MediumResult | null;
  flags: ScreenFlag[];
}

export interface ScreenResult {
  compoundName: string;
  drugKind: 'base' | 'acid';
  settings: ScreeningSettings;
  freeForm: FreeFormResult;
  rows: ScreenRow[];
  robustnessShared: RobustnessShared;
  assumptions: string[];
  cautions: string[];
}
