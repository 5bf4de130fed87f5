import { ChemInputError, requireFiniteInRange, type Estimate } from '../result';
import { saltDeltaPka, saltFormationVerdict, type SaltFormationVerdict } from './delta-pka';
import { disproportionationRisk, type DisproportionationResult } from './disproportionation';
import { doseNumber, ICH_M9_PH_RANGE, ICH_M9_VOLUME_ML } from './dose-number';
import { gseLog10IntrinsicSolubilityM } from './intrinsic-solubility';
import { estimateKsp, log10KspFromFormulaUnits } from './ksp-estimate';
import { activeFraction, saltMassPerDoseMg, saltMolarMassGPerMol } from './mass-cost';
import { interpretMeasurements, type InterpretedMeasurements, type MeasurementInput } from './measurements';
import { drugProtolyte, phSolubilityProfile, solubilityAtPh, type DrugAcidBase, type PhProfile, type ProfileOptions, type ProfileSalt } from './ph-profile';
import type { CriterionInputs } from './ranking';
import type { RobustnessRow, RobustnessShared } from './rank-robustness';
import { log10KspFromSaltSolubility } from './salt-equilibrium';
import { parseScreeningSettings, type ScreeningMedium, type ScreeningSettings } from './settings';
import { requireAscendingPkas, type Protolyte } from './speciation';

/**
 * screenCompound: the expensive, once-per-input step of the screen. For every candidate salt it
 * computes ΔpKa and the salt-formation verdict, mass cost, K_sp (measured or estimated, labelled),
 * the pH–solubility profile (pH 1–8 by default) with pH_max, dose numbers across pH 1.2–6.8 (ICH M9)
 * and in gastric medium with its chloride (common-ion effect), disproportionation risk, measured
 * overrides, a "likely poorly soluble" flag with its rule, and reasons in words. The cheap weighting
 * step is rankCandidates (ranking.ts); rank robustness is rankRobustness (rank-robustness.ts).
 *
 * Inputs are structural subsets of the library's CounterIon, the compound schema and the stored
 * measurement records, so the core imports no app code.
 */

/** Sodium in USP simulated gastric fluid: 2.0 g/L NaCl → 0.034 mol/L (composition from memory of the USP text). */
export const GASTRIC_SODIUM_M = 2.0 / 58.44;

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
}

export interface ScreenCompoundInput {
  compound: ScreeningCompound;
  drugIon: ScreeningDrugIon;
  candidates: readonly ScreeningCandidate[];
  /** Partial settings; defaults fill the rest (settings.ts). */
  settings?: unknown;
}

export type ReasonKind = 'keeps' | 'drops' | 'watch' | 'measured' | 'note';
export interface Reason {
  kind: ReasonKind;
  criterion: string;
  text: string;
}

export interface ScreenFlag {
  id: 'likely-poorly-soluble' | 'salt-poorly-soluble' | 'disproportionation' | 'cocrystal-risk' | 'estimated-ksp';
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
  flags: ScreenFlag[];
}

interface KspChoice {
  log10Ksp: Estimate;
  kspOrigin: 'measured' | 'estimated';
  saltSigma: number;
  anchored: boolean;
  reasons: Reason[];
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

/** The cautions a ranking is read with (SCIENCE brief §6; the app shows the same in Cautions.tsx). */
export const SCREENING_CAUTIONS = [
  'Estimates here screen candidates; they do not establish a salt form.',
  'Crystallinity, polymorphs, hydrates, chemical stability, hygroscopicity and toxicology need experiments.',
  'Counter-ion acceptability follows the regulatory guidance in force for the product.',
  'Strong acids and bases used in salt formation are corrosive: handle them under your lab’s safety rules and the substance’s safety data sheet.',
];

const ICH_POINTS = [1.2, 4.5, 6.8];
/** Measured-solubility spread carried into K_sp, decades per ion (our assumption: ~±10 % in solubility). */
const MEASURED_LOG10_S_SIGMA = 0.05;
/** Measured S₀ spread, decades (our assumption, shake-flask repeatability). */
const MEASURED_S0_SIGMA = 0.1;

const fmt = (x: number) => (x >= 100 ? x.toFixed(0) : x >= 1 ? x.toPrecision(3) : x.toPrecision(2));

/**
 * The counter-ion as a protolyte. The fully protonated charge follows from the stoichiometry's
 * limiting pKa index where the library gives it (anion: top = k + z + 1; cation: top = k + z),
 * else from the kind (an acid HₙX is neutral when fully protonated; a base with n sites is +n).
 */
export function counterIonProtolyte(ion: ScreeningCounterIon, st: ScreeningStoichiometry): Protolyte {
  const pKas = requireAscendingPkas(`${ion.id}.pKas`, ion.pKas.map((p) => p.value));
  let top: number;
  if (pKas.length === 0) top = st.ionCharge;
  else if (st.pKaIndex !== undefined && st.pKaIndex !== null) top = ion.kind === 'anion' ? st.pKaIndex + st.ionCharge + 1 : st.pKaIndex + st.ionCharge;
  else top = ion.kind === 'anion' ? 0 : pKas.length;
  const idx = top - st.ionCharge;
  if (idx < 0 || idx > pKas.length) {
    throw new ChemInputError(`${ion.id}.stoichiometry`, `charge ${st.ionCharge} does not fit the ion's ${pKas.length} pKa value(s)`, 'a charge state the pKa list can reach');
  }
  return { pKas, mostProtonatedCharge: top };
}

function intrinsicSolubility(c: ScreeningCompound, freeM: number): { est: Estimate; origin: FreeFormResult['intrinsicOrigin'] } {
  if (c.intrinsicSolubilityMgPerMl !== null) {
    const s = c.intrinsicSolubilityMgPerMl;
    if (!(Number.isFinite(s) && s > 0)) throw new ChemInputError('intrinsicSolubilityMgPerMl', `must be greater than zero, got ${s}`, 'S₀ > 0 mg/mL');
    return {
      origin: 'measured',
      est: { value: Math.log10(s / freeM), uncertainty: MEASURED_S0_SIGMA, method: 'measured', sources: ['measured intrinsic solubility (user data)'] },
    };
  }
  if (c.meltingPointC !== null && c.logP !== null) return { origin: 'general-solubility-equation', est: gseLog10IntrinsicSolubilityM(c.meltingPointC, c.logP) };
  throw new ChemInputError('intrinsicSolubilityMgPerMl', 'no intrinsic solubility and no melting point with log P', 'S₀ in mg/mL, or melting point (°C) and log P for the General Solubility Equation');
}

function median(xs: number[]): number | null {
  if (xs.length === 0) return null;
  const s = [...xs].sort((a, b) => a - b);
  const k = Math.floor(s.length / 2);
  return s.length % 2 ? s[k]! : (s[k - 1]! + s[k]!) / 2;
}

function mediaFor(settings: ScreeningSettings): (ScreeningMedium & { gastric: boolean })[] {
  const gastric: ScreeningMedium & { gastric: boolean } = {
    id: 'gastric',
    label: `gastric medium (pH ${settings.gastricPh}, ${settings.gastricChlorideM} M chloride)`,
    pH: settings.gastricPh,
    ions: { chloride: settings.gastricChlorideM, sodium: GASTRIC_SODIUM_M },
    ionicStrengthM: settings.gastricChlorideM,
    gastric: true,
  };
  return [gastric, ...settings.media.map((m) => ({ ...m, gastric: false }))];
}

/** Run the screen. Throws ChemInputError for bad compound data; a bad candidate gets a row with `error`. */
export function screenCompound(input: ScreenCompoundInput): ScreenResult {
  const settings = parseScreeningSettings(input.settings);
  const c = input.compound;
  const drug: DrugAcidBase = { kind: c.kind, pKas: c.pKas.map((p) => p.value), ionCharge: c.ionCharge };
  const drugP = drugProtolyte(drug);
  const freeM = requireFiniteInRange('freeFormMolarMassGPerMol', input.drugIon.freeFormMolarMassGPerMol, 1, 1e5, 'g/mol');
  requireFiniteInRange('drugIonMolarMassGPerMol', input.drugIon.molarMassGPerMol, 1, 1e5, 'g/mol');
  const dose = c.doseMg;
  if (dose !== null && !(Number.isFinite(dose) && dose > 0)) throw new ChemInputError('doseMg', `must be greater than zero, got ${dose}`, 'a dose > 0 mg');
  const { est: logS0, origin: s0Origin } = intrinsicSolubility(c, freeM);
  const T = settings.temperatureK;
  const activity: ProfileOptions['activity'] =
    settings.activityModel === 'davies' ? { model: 'davies', backgroundIonicStrengthM: settings.backgroundIonicStrengthM, temperatureK: T } : { model: 'ideal' };
  const grid = { phFrom: settings.phGrid.from, phTo: settings.phGrid.to, phStep: settings.phGrid.step, activity };
  const toMg = (m: number) => m * freeM;
  const drugPkaSigma = Math.max(...c.pKas.map((p) => settings.pkaSigmaByOrigin[p.origin]));
  const media = mediaFor(settings);
  /** The masses of one candidate's salt (stoichiometry and hydrate water included), for mass cost and K_sp. */
  const massInput = (cand: ScreeningCandidate) => ({
    freeFormMolarMassGPerMol: freeM,
    drugIonMolarMassGPerMol: input.drugIon.molarMassGPerMol,
    counterIonMolarMassGPerMol: cand.stoichiometry.ionMolarMassGPerMol ?? cand.counterIon.molarMassGPerMol,
    drugPerSalt: cand.stoichiometry.drugPerSalt,
    counterIonPerSalt: cand.stoichiometry.counterIonPerSalt,
    hydrateWater: cand.hydrateWater ?? 0,
  });

  const dnAt = (salt: ProfileSalt | null, pH: number, commonIonM = 0): DoseNumberAt => {
    const p = solubilityAtPh(drug, logS0.value, salt, pH, { activity, commonIonM });
    const mg = toMg(p.solubilityM);
    return { pH, solubilityMgPerMl: mg, doseNumber: dose === null ? null : doseNumber(dose, mg), solid: p.solid };
  };
  const ichGrid = (profile: PhProfile): number[] => {
    const ph = new Set<number>(ICH_POINTS);
    for (const p of profile.points) if (p.pH >= ICH_M9_PH_RANGE[0] - 1e-9 && p.pH <= ICH_M9_PH_RANGE[1] + 1e-9) ph.add(p.pH);
    return [...ph].sort((a, b) => a - b);
  };
  const worstOf = (list: DoseNumberAt[]) => list.reduce((a, b) => (b.solubilityMgPerMl < a.solubilityMgPerMl ? b : a));

  // Free form.
  const freeProfile = phSolubilityProfile(drug, logS0.value, null, grid);
  const freeDoses = ichGrid(freeProfile).map((pH) => dnAt(null, pH));
  const freeWorst = worstOf(freeDoses);
  const freeFlags: ScreenFlag[] = [];
  if (freeWorst.doseNumber !== null && freeWorst.doseNumber > 1) {
    freeFlags.push({
      id: 'likely-poorly-soluble',
      text: `likely poorly soluble: D₀ ${fmt(freeWorst.doseNumber)} at pH ${freeWorst.pH}`,
      rule: 'ICH M9 (2019) §2.1.1: the highest dose must dissolve in ≤ 250 mL over pH 1.2–6.8 (D₀ ≤ 1)',
    });
  }
  const freeForm: FreeFormResult = {
    log10IntrinsicM: logS0,
    intrinsicOrigin: s0Origin,
    profile: freeProfile.points.map((p) => ({ pH: p.pH, solubilityMgPerMl: toMg(p.solubilityM) })),
    doseNumbers: freeDoses,
    worst: freeWorst,
    solubilityClass: freeWorst.doseNumber === null ? null : freeWorst.doseNumber <= 1 ? 'high' : 'low',
    flags: freeFlags,
  };

  // Measurements first (they override ΔH_sol before the reference median is taken).
  type Prepared = { cand: ScreeningCandidate; protolyte: Protolyte; saltM: number; measured: InterpretedMeasurements | null; dH: Estimate | null; dHOrigin: string | null };
  const prepared: (Prepared | { cand: ScreeningCandidate; error: string })[] = input.candidates.map((cand) => {
    try {
      const st = cand.stoichiometry;
      const protolyte = counterIonProtolyte(cand.counterIon, st);
      const saltM = saltMolarMassGPerMol(massInput(cand));
      const measured = cand.measurements?.length
        ? interpretMeasurements(cand.measurements, { saltMolarMassGPerMol: saltM, freeFormMolarMassGPerMol: freeM, drugPerSalt: st.drugPerSalt, temperatureK: T })
        : null;
      let dH: Estimate | null = cand.solutionEnthalpyKJ ?? null;
      let dHOrigin: string | null = dH ? 'thermochemistry estimate' : null;
      if (measured?.solutionEnthalpyKJ !== null && measured?.solutionEnthalpyKJ !== undefined) {
        dH = { value: measured.solutionEnthalpyKJ, uncertainty: 2, method: 'measured-calorimetric', sources: ['measured ΔH_sol (user data; σ 2 kJ/mol assumed)'] };
        dHOrigin = 'measured (calorimetry)';
      } else if (measured?.vantHoff) {
        dH = measured.vantHoff.solutionEnthalpyKJ;
        dHOrigin = 'measured (van ’t Hoff fit)';
      }
      return { cand, protolyte, saltM, measured, dH, dHOrigin };
    } catch (err) {
      return { cand, error: err instanceof Error ? err.message : String(err) };
    }
  });
  const refPerDrug = median(
    prepared.flatMap((p) => ('error' in p || !p.dH ? [] : [p.dH.value / p.cand.stoichiometry.drugPerSalt])),
  );

  /** K_sp of one prepared candidate: measured when a salt solubility exists, else the labelled estimate. */
  function kspOf(p: Prepared): KspChoice {
    const { cand, protolyte, saltM, measured, dH, dHOrigin } = p;
    const st = cand.stoichiometry;
    let log10Ksp: Estimate;
    let kspOrigin: 'measured' | 'estimated';
    let saltSigma: number;
    let anchored: boolean;
    const reasons: Reason[] = [];
    const flags: ScreenFlag[] = [];
    const ms = measured?.solubility ?? null;
    if (ms) {
      const logK =
        ms.ph === null
          ? log10KspFromFormulaUnits(Math.log10(ms.formulaUnitsM), st.drugPerSalt, st.counterIonPerSalt)
          : log10KspFromSaltSolubility({
              drug: drugP,
              drugIonCharge: c.ionCharge,
              drugPerSalt: st.drugPerSalt,
              counterIon: protolyte,
              counterIonCharge: st.ionCharge,
              counterIonPerSalt: st.counterIonPerSalt,
              pH: ms.ph,
              formulaUnitsM: ms.formulaUnitsM,
            });
      const n = st.drugPerSalt + st.counterIonPerSalt;
      const notes = [
        ms.ph === null ? 'pH of the saturated solution not recorded: ions taken as fully ionised' : `from the solubility at pH ${ms.ph}`,
        'assumes the salt (not the free form) was the solid at equilibrium',
      ];
      if (ms.temperatureK !== null && Math.abs(ms.temperatureK - T) > 2) notes.push(`measured at ${(ms.temperatureK - 273.15).toFixed(0)} °C, screening at ${(T - 273.15).toFixed(0)} °C`);
      log10Ksp = { value: logK, uncertainty: n * MEASURED_LOG10_S_SIGMA, method: 'measured-salt-solubility', sources: ['measured salt solubility (user data)'], notes };
      kspOrigin = 'measured';
      saltSigma = MEASURED_LOG10_S_SIGMA;
      anchored = false;
      reasons.push({ kind: 'measured', criterion: 'solubility', text: `K_sp from the measured salt solubility (${fmt(ms.formulaUnitsM * saltM)} mg/mL as salt) — overrides the estimate` });
    } else {
      const k = estimateKsp({
        log10IntrinsicM: logS0,
        drugPerSalt: st.drugPerSalt,
        counterIonPerSalt: st.counterIonPerSalt,
        solutionEnthalpyKJ: dH,
        referenceSolutionEnthalpyPerDrugKJ: refPerDrug,
        temperatureK: T,
        anchorLog10: settings.saltAnchorLog10,
      });
      log10Ksp = k.log10Ksp;
      if (dHOrigin) log10Ksp.notes = [...(log10Ksp.notes ?? []), `ΔH_sol: ${dHOrigin}`];
      kspOrigin = 'estimated';
      saltSigma = Math.sqrt(Math.max(0, k.log10SaltLimitedDrugM.uncertainty ** 2 - logS0.uncertainty ** 2));
      anchored = true;
      flags.push({
        id: 'estimated-ksp',
        text: `K_sp estimated (±${k.log10SaltLimitedDrugM.uncertainty.toFixed(1)} decades in salt solubility), not measured`,
        rule: 'Saltsmith K_sp estimate: salt-limited solubility anchored 10²× above S₀ (common practice) with a relative thermochemical shift',
      });
      if (dHOrigin?.startsWith('measured')) reasons.push({ kind: 'measured', criterion: 'solubility', text: `ΔH_sol ${dHOrigin} used in place of the thermochemistry estimate` });
    }

    return { log10Ksp, kspOrigin, saltSigma, anchored, reasons, flags };
  }

  const ksps = new Map<string, KspChoice>();
  for (const p of prepared) if (!('error' in p)) {
    try {
      ksps.set(p.cand.id, kspOf(p));
    } catch {
      /* the row reports the error when it recomputes */
    }
  }
  // For a base, gastric chloride can turn any salt into the hydrochloride when that is less soluble
  // (Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603, on the common-ion effect in gastric fluid).
  // Checked when a 1:1 hydrochloride is among the candidates, with its own (measured or estimated) K_sp.
  const hcl = c.kind === 'base' && c.ionCharge === 1
    ? prepared.find((p): p is Prepared => !('error' in p) && p.cand.counterIon.id === 'chloride' && p.cand.stoichiometry.ionCharge === -1 && ksps.has(p.cand.id))
    : undefined;
  const hclSalt: ProfileSalt | null = hcl
    ? { counterIon: hcl.protolyte, counterIonCharge: -1, drugPerSalt: hcl.cand.stoichiometry.drugPerSalt, counterIonPerSalt: hcl.cand.stoichiometry.counterIonPerSalt, log10Ksp: ksps.get(hcl.cand.id)!.log10Ksp.value }
    : null;

  const rows: ScreenRow[] = prepared.map((p) => {
    const cand = p.cand;
    const st = cand.stoichiometry;
    const label = st.label ? st.label : `${cand.counterIon.name.toLowerCase()} (${st.drugPerSalt}:${st.counterIonPerSalt})`;
    if ('error' in p) return errorRow(cand, label, p.error);
    try {
      return candidateRow(p, label);
    } catch (err) {
      return errorRow(cand, label, err instanceof Error ? err.message : String(err));
    }
  });

  function candidateRow(p: Prepared, label: string): ScreenRow {
    const { cand, protolyte, saltM, measured } = p;
    const st = cand.stoichiometry;
    /** The salt's trade name without its ratio, e.g. 'hydrochloride', for the reasons in words. */
    const name = label.replace(/\s*\([^)]*\)\s*$/, '') || cand.counterIon.name.toLowerCase();
    const reasons: Reason[] = [];
    const flags: ScreenFlag[] = [];

    // Salt formation.
    const dpKa = saltDeltaPka(drugP, c.ionCharge, protolyte, st.ionCharge);
    const verdict = dpKa === null ? null : saltFormationVerdict(dpKa, settings.deltaPkaBands);
    const drugLink = drugP.pKas[drugP.mostProtonatedCharge - c.ionCharge + (c.kind === 'base' ? 0 : -1)];
    const each = drugLink === undefined ? [] : protolyte.pKas.map((x) => (c.kind === 'base' ? drugLink - x : x - drugLink));
    if (verdict) {
      reasons.push({ kind: verdict.band === 'cocrystal' ? 'drops' : verdict.band === 'salt' ? 'keeps' : 'watch', criterion: 'saltFormation', text: verdict.reason });
      if (!verdict.meetsStableSaltRule) {
        reasons.push({ kind: 'watch', criterion: 'saltFormation', text: `ΔpKa below the common-practice minimum of ${settings.deltaPkaBands.stableSaltMin} for a stable salt` });
      }
      if (verdict.band === 'cocrystal') flags.push({ id: 'cocrystal-risk', text: `ΔpKa ${dpKa!.toFixed(1)}: a cocrystal is more likely than a salt`, rule: 'Cruz-Cabeza 2012, CrystEngComm 14, 6362: ΔpKa < −1' });
    } else {
      reasons.push({ kind: 'note', criterion: 'saltFormation', text: 'ΔpKa rule not applicable (no transferable proton on one side, e.g. a quaternary ion)' });
    }

    // Mass cost.
    const f = activeFraction(massInput(cand));
    const massPerDose = dose === null ? null : saltMassPerDoseMg(dose, f);
    if (f < 0.7) reasons.push({ kind: 'watch', criterion: 'massCost', text: `heavy counter-ion: active fraction ${(f * 100).toFixed(0)} %${massPerDose ? `, ${fmt(massPerDose)} mg of salt per dose` : ''}` });

    // K_sp (computed once per candidate before the rows, see kspOf).
    const k = ksps.get(cand.id) ?? kspOf(p);
    const { log10Ksp, kspOrigin, saltSigma, anchored } = k;
    reasons.push(...k.reasons);
    flags.push(...k.flags);

    // Profile and pH_max.
    const salt: ProfileSalt = {
      counterIon: protolyte,
      counterIonCharge: st.ionCharge,
      drugPerSalt: st.drugPerSalt,
      counterIonPerSalt: st.counterIonPerSalt,
      log10Ksp: log10Ksp.value,
    };
    const profile = phSolubilityProfile(drug, logS0.value, salt, grid);
    const doses = ichGrid(profile).map((pH) => dnAt(salt, pH));
    const worst = worstOf(doses);
    const cls = worst.doseNumber === null ? null : worst.doseNumber <= 1 ? 'high' : 'low';
    if (worst.doseNumber !== null) {
      if (worst.doseNumber > 1) {
        reasons.push({ kind: 'drops', criterion: 'solubility', text: `drops: ${name}'s solubility at pH ${worst.pH} (${fmt(worst.solubilityMgPerMl)} mg/mL, ${worst.solid === 'salt' ? 'salt' : 'free form'} limits) falls below the dose (D₀ ${fmt(worst.doseNumber)})` });
        flags.push({
          id: 'likely-poorly-soluble',
          text: `likely poorly soluble: D₀ ${fmt(worst.doseNumber)} at pH ${worst.pH}`,
          rule: 'ICH M9 (2019) §2.1.1: the highest dose must dissolve in ≤ 250 mL over pH 1.2–6.8 (D₀ ≤ 1)',
        });
      } else {
        reasons.push({ kind: 'keeps', criterion: 'solubility', text: `keeps: the dose dissolves in ≤ ${ICH_M9_VOLUME_ML} mL from pH 1.2 to 6.8 (worst D₀ ${fmt(worst.doseNumber)} at pH ${worst.pH})` });
      }
    } else {
      reasons.push({ kind: 'note', criterion: 'solubility', text: 'no dose given: dose numbers not computed' });
    }

    // The salt's own solubility, where the salt is the solid (below pH_max): a salt that cannot carry the
    // dose even there is poorly soluble in itself — unlike the free-form limit above pH_max, which every
    // salt of this drug shares and so does not tell one salt from another.
    const saltBranch = profile.points.filter((pt) => pt.solid === 'salt');
    if (dose !== null && saltBranch.length > 0) {
      const lowest = saltBranch.reduce((a, b) => (b.solubilityM < a.solubilityM ? b : a));
      const mg = toMg(lowest.solubilityM);
      const d0 = doseNumber(dose, mg);
      if (d0 > 1) {
        flags.push({
          id: 'salt-poorly-soluble',
          text: `salt poorly soluble in itself: ${fmt(mg)} mg/mL at pH ${fmt(lowest.pH)} where the salt is the solid (D₀ ${fmt(d0)})`,
          rule: 'salt-limited solubility below the highest dose in 250 mL (the ICH M9 (2019) volume) on the salt branch, below pH_max — a screening rule of our own (common practice)',
        });
      }
    }

    // Media: gastric (chloride, sodium) and user buffers, with the common-ion effect.
    const mediaResults: MediumResult[] = media.map((m) => {
      const commonIonM = m.ions[cand.counterIon.id] ?? 0;
      const mActivity: ProfileOptions['activity'] = activity?.model === 'davies' ? { ...activity, backgroundIonicStrengthM: m.ionicStrengthM } : activity;
      const pt = solubilityAtPh(drug, logS0.value, salt, m.pH, { activity: mActivity, commonIonM });
      let solM = pt.solubilityM;
      let convertsTo: string | null = null;
      const chlorideM = m.ions.chloride ?? 0;
      if (hclSalt && hcl && hcl.cand.id !== cand.id && cand.counterIon.id !== 'chloride' && chlorideM > 0) {
        const h = solubilityAtPh(drug, logS0.value, hclSalt, m.pH, { activity: mActivity, commonIonM: chlorideM });
        if (h.solid === 'salt' && h.solubilityM < solM) {
          solM = h.solubilityM;
          convertsTo = hcl.cand.stoichiometry.label ?? 'hydrochloride';
        }
      }
      const mg = toMg(solM);
      return { id: m.id, label: m.label, pH: m.pH, commonIonM, solubilityMgPerMl: mg, doseNumber: dose === null ? null : doseNumber(dose, mg), solid: convertsTo ? 'salt' : pt.solid, convertsTo };
    });
    const gastric = mediaResults[0] ?? null;
    if (gastric && gastric.doseNumber !== null) {
      const ci = gastric.commonIonM > 0 ? ` (common ion: ${gastric.commonIonM.toFixed(3)} M ${cand.counterIon.id})` : '';
      if (gastric.convertsTo) {
        reasons.push({
          kind: gastric.doseNumber > 1 ? 'drops' : 'watch',
          criterion: 'gastric',
          text: `${gastric.doseNumber > 1 ? 'drops' : 'watch'}: in gastric chloride ${name} can convert to the less soluble ${gastric.convertsTo.replace(/\s*\([^)]*\)\s*$/, '')} (D₀ ${fmt(gastric.doseNumber)})`,
        });
      } else if (gastric.doseNumber > 1) {
        reasons.push({ kind: 'drops', criterion: 'gastric', text: `drops: ${name}'s solubility in gastric medium${ci} falls below the dose (D₀ ${fmt(gastric.doseNumber)})` });
      } else if (gastric.commonIonM > 0) {
        reasons.push({ kind: 'keeps', criterion: 'gastric', text: `keeps: dose dissolves in gastric medium despite the common ion${ci}` });
      }
    }

    // Disproportionation.
    const disp = disproportionationRisk(profile.phMax, settings.microenvironmentPh, c.kind);
    reasons.push({ kind: disp.risk === 'high' ? 'drops' : disp.risk === 'low' ? 'keeps' : 'watch', criterion: 'disproportionation', text: `${disp.risk === 'high' ? 'drops' : disp.risk === 'low' ? 'keeps' : 'watch'}: ${disp.reason}` });
    if (disp.risk === 'high' || disp.risk === 'watch') {
      flags.push({ id: 'disproportionation', text: disp.reason, rule: 'Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603: conversion to the free form beyond pH_max' });
    }

    // Acceptability and measured solid-state data.
    const ac = cand.counterIon.acceptabilityClass;
    reasons.push({ kind: ac === 1 ? 'keeps' : ac === 3 ? 'watch' : 'note', criterion: 'acceptability', text: ac ? `acceptability class ${ac}${cand.counterIon.classSource ? ` (${cand.counterIon.classSource})` : ''}` : 'no acceptability class recorded' });
    if (measured?.hygroscopicity) {
      reasons.push({ kind: 'measured', criterion: 'hygroscopicity', text: `measured: ${measured.hygroscopicity} (Ph. Eur. 5.11${measured.massGainPercent !== null ? `, +${measured.massGainPercent} % at 80 % RH` : ''})` });
    }
    if (measured?.meltingPointC !== null && measured?.meltingPointC !== undefined) reasons.push({ kind: 'measured', criterion: 'note', text: `measured melting point ${measured.meltingPointC} °C` });
    if (measured?.crystallinityPercent !== null && measured?.crystallinityPercent !== undefined) reasons.push({ kind: 'measured', criterion: 'note', text: `measured crystallinity ${measured.crystallinityPercent} %` });
    if (measured?.vantHoff) {
      const v = measured.vantHoff.solutionEnthalpyKJ;
      reasons.push({ kind: 'measured', criterion: 'note', text: `van ’t Hoff: ΔH_sol,app ${v.value.toFixed(1)} ± ${v.uncertainty.toFixed(1)} kJ/mol${cand.solutionEnthalpyKJ ? ` (predicted ${cand.solutionEnthalpyKJ.value.toFixed(0)} ± ${cand.solutionEnthalpyKJ.uncertainty.toFixed(0)} kJ/mol)` : ''}` });
    } else if (measured?.vantHoffNote) reasons.push({ kind: 'note', criterion: 'note', text: measured.vantHoffNote });

    const margin = disp.marginPh;
    const criteria: CriterionInputs = {
      saltProbability: verdict?.saltProbability ?? null,
      log10WorstDoseNumber: worst.doseNumber === null ? null : Math.log10(worst.doseNumber),
      log10GastricDoseNumber: gastric?.doseNumber == null ? null : Math.log10(gastric.doseNumber),
      phMaxMarginPh: margin,
      activeFraction: f,
      acceptabilityClass: ac,
      hygroscopicity: measured?.hygroscopicity ?? null,
    };
    return {
      id: cand.id,
      label,
      counterIonId: cand.counterIon.id,
      counterIonName: cand.counterIon.name,
      drugPerSalt: st.drugPerSalt,
      counterIonPerSalt: st.counterIonPerSalt,
      hydrateWater: cand.hydrateWater ?? 0,
      error: null,
      deltaPka: dpKa,
      deltaPkaEach: each,
      saltFormation: verdict,
      saltMolarMassGPerMol: saltM,
      activeFraction: f,
      saltMassPerDoseMg: massPerDose,
      log10Ksp,
      kspOrigin,
      phMax: profile.phMax,
      profile: profile.points.map((q) => ({ pH: q.pH, solubilityMgPerMl: toMg(q.solubilityM), solid: q.solid })),
      doseNumbers: doses,
      worst,
      solubilityClass: cls,
      gastric,
      media: mediaResults,
      disproportionation: disp,
      measured,
      flags,
      reasons,
      criteria,
      robustness: {
        id: cand.id,
        criteria,
        error: null,
        deltaPka: dpKa,
        worstSolid: worst.solid,
        gastricSolid: gastric?.solid ?? null,
        saltLog10Sigma: saltSigma,
        saltAnchoredOnIntrinsic: anchored,
      },
    };
  }

  return {
    compoundName: c.name,
    drugKind: c.kind,
    settings,
    freeForm,
    rows,
    robustnessShared: { drugKind: c.kind, drugPkaSigma, log10IntrinsicSigma: logS0.uncertainty, bands: settings.deltaPkaBands },
    assumptions: [
      ...freeProfile.assumptions,
      `temperature ${(T - 273.15).toFixed(0)} °C for the estimates; pKa values at 25 °C`,
      'K_sp without a measured salt solubility is an estimate (salt-limited solubility ~10² × S₀, shifted by relative ΔH_sol); treat its pH_max and dose numbers as screening figures',
      'dose numbers use the equilibrium solubility of the less soluble solid at each pH, in free-form equivalents, 250 mL (ICH M9); transient supersaturation from a dissolving salt is not modelled',
      hclSalt
        ? 'in gastric medium a base’s salts are also checked against conversion to the hydrochloride (with its own K_sp and the medium’s chloride)'
        : 'in gastric medium only the candidate’s own counter-ion is counted as a common ion (no 1:1 hydrochloride in the screen to check conversion against)',
    ],
    cautions: SCREENING_CAUTIONS,
  };
}

function errorRow(cand: ScreeningCandidate, label: string, error: string): ScreenRow {
  const criteria: CriterionInputs = {
    saltProbability: null,
    log10WorstDoseNumber: null,
    log10GastricDoseNumber: null,
    phMaxMarginPh: null,
    activeFraction: 0,
    acceptabilityClass: null,
    hygroscopicity: null,
  };
  return {
    id: cand.id,
    label,
    counterIonId: cand.counterIon.id,
    counterIonName: cand.counterIon.name,
    drugPerSalt: cand.stoichiometry.drugPerSalt,
    counterIonPerSalt: cand.stoichiometry.counterIonPerSalt,
    hydrateWater: cand.hydrateWater ?? 0,
    error,
    deltaPka: null,
    deltaPkaEach: [],
    saltFormation: null,
    saltMolarMassGPerMol: 0,
    activeFraction: 0,
    saltMassPerDoseMg: null,
    log10Ksp: null,
    kspOrigin: null,
    phMax: null,
    profile: [],
    doseNumbers: [],
    worst: null,
    solubilityClass: null,
    gastric: null,
    media: [],
    disproportionation: null,
    measured: null,
    flags: [],
    reasons: [{ kind: 'note', criterion: 'input', text: `not screened: ${error}` }],
    criteria,
    robustness: { id: cand.id, criteria, error, deltaPka: null, worstSolid: null, gastricSolid: null, saltLog10Sigma: 0, saltAnchoredOnIntrinsic: false },
  };
}
