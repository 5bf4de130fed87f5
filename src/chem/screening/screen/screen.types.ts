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
  pKas: readonly { value: number; origin: 'measured' | 'literature' | 'predicted' }[];
  ionCharge: number;
  intrinsicSolubilityMgPerMl: number | null;
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
    | 'estimated-ksp';
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
  /** What the number rests on, as data: every explanation of it is written from this (salt-water-basis.ts). */
  basis: SaltSolubilityBasis;
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
  intrinsicOrigin: 'measured' | 'general-solubility-equation';
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
