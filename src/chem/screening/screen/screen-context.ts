import { ChemInputError, requireFiniteInRange, type Estimate } from '../../result';
import { GSE_UNCERTAINTY_LOG10, gseLog10IntrinsicSolubilityM } from '../intrinsic-solubility';
import type { SaltMassInput } from '../mass-cost';
import { drugGrids, type DrugGrids } from '../ph-grid-solubility';
import { drugProtolyte, type DrugAcidBase, type ProfileOptions } from '../ph-profile';
import { parseScreeningSettings, type ScreeningSettings } from '../settings';
import type { Protolyte } from '../speciation';
import { ichM9Plan, type IchM9PlanPoint } from './ich-m9-plan';
import type {
  FreeFormResult,
  ScreenCompoundInput,
  ScreeningCandidate,
  ScreeningCompound,
} from './screen.types';

/**
 * 1σ of an entered S₀ by its stated origin, decades. Measured: 0.1 (our assumption, shake-flask
 * repeatability). Literature: 0.3 (our assumption: wider than the ≈0.17 interlaboratory SD of log S₀
 * that Avdeef 2020, ADMET & DMPK 8, 29 reports — from memory — because a published value's solid form
 * and temperature are often not given). Predicted, or not stated: the General Solubility Equation's
 * σ (intrinsic-solubility.ts) — nothing says such a value is better than a prediction.
 */
export const S0_LOG10_SIGMA_BY_ORIGIN = {
  measured: 0.1,
  literature: 0.3,
  predicted: GSE_UNCERTAINTY_LOG10,
  'not-stated': GSE_UNCERTAINTY_LOG10,
} as const;

/**
 * What every step of the screen reads: the checked inputs and the quantities derived once from them
 * (the drug as a protolyte, S₀, the activity model and pH grid).
 */
export interface ScreenContext {
  settings: ScreeningSettings;
  compound: ScreeningCompound;
  drug: DrugAcidBase;
  drugProtolyte: Protolyte;
  freeFormMolarMassGPerMol: number;
  drugIonMolarMassGPerMol: number;
  doseMg: number | null;
  log10IntrinsicM: Estimate;
  intrinsicOrigin: FreeFormResult['intrinsicOrigin'];
  temperatureK: number;
  activity: ProfileOptions['activity'];
  grid: { phFrom: number; phTo: number; phStep: number; activity: ProfileOptions['activity'] };
  /** The drug's speciation and free-form solubility on the grid and the pH_max scan, computed once. */
  grids: DrugGrids;
  /** Whether rows and the free form carry their profile (ScreenCompoundInput.profiles). */
  profiles: 'full' | 'none';
  /** The ICH M9 pH series on the grid, with grid indices (dose-numbers.ts). */
  ichM9Plan: readonly IchM9PlanPoint[];
}

/**
 * Intrinsic solubility S₀ of the free form: the entered value with the σ of its stated origin (not
 * stated when absent), else the General Solubility Equation.
 */
export function intrinsicSolubility(
  c: ScreeningCompound,
  freeFormMolarMassGPerMol: number,
): { est: Estimate; origin: FreeFormResult['intrinsicOrigin'] } {
  if (c.intrinsicSolubilityMgPerMl !== null) {
    const s = c.intrinsicSolubilityMgPerMl;
    if (!(Number.isFinite(s) && s > 0)) {
      throw new ChemInputError(
        'intrinsicSolubilityMgPerMl',
        `must be greater than zero, got ${s}`,
        'S₀ > 0 mg/mL',
      );
    }
    const origin = c.intrinsicSolubilityOrigin ?? 'not-stated';
    return {
      origin,
      est: {
        value: Math.log10(s / freeFormMolarMassGPerMol),
        uncertainty: S0_LOG10_SIGMA_BY_ORIGIN[origin],
        method: origin === 'measured' ? 'measured' : `entered S₀ (${origin.replace('-', ' ')})`,
        sources: [
          origin === 'measured'
            ? 'measured intrinsic solubility (user data)'
            : `intrinsic solubility entered by the user, origin ${origin.replace('-', ' ')}`,
        ],
      },
    };
  }
  if (c.meltingPointC !== null && c.logP !== null) {
    return {
      origin: 'general-solubility-equation',
      est: gseLog10IntrinsicSolubilityM(c.meltingPointC, c.logP),
    };
  }
  throw new ChemInputError(
    'intrinsicSolubilityMgPerMl',
    'no intrinsic solubility and no melting point with log P',
    'S₀ in mg/mL, or melting point (°C) and log P for the General Solubility Equation',
  );
}

/**
 * The ICH M9 series of a grid's pH list, frozen, once per list: drugGrids hands every screen on the
 * same grid settings the same frozen list, so a batch builds the series once, not per compound (a
 * WeakMap on the list: nothing kept once no screen holds it).
 */
const PLAN_BY_PHS = new WeakMap<readonly number[], readonly IchM9PlanPoint[]>();

function planOf(phs: readonly number[]): readonly IchM9PlanPoint[] {
  let plan = PLAN_BY_PHS.get(phs);
  if (plan === undefined) {
    plan = Object.freeze(ichM9Plan(phs).map((p) => Object.freeze(p)));
    PLAN_BY_PHS.set(phs, plan);
  }
  return plan;
}

/** Check the compound-level inputs and derive what every step shares. Throws ChemInputError. */
export function screenContext(input: ScreenCompoundInput): ScreenContext {
  const settings = parseScreeningSettings(input.settings);
  const c = input.compound;
  const drug: DrugAcidBase = {
    kind: c.kind,
    pKas: c.pKas.map((p) => p.value),
    ionCharge: c.ionCharge,
  };
  const drugP = drugProtolyte(drug);
  const freeFormMolarMassGPerMol = requireFiniteInRange(
    'freeFormMolarMassGPerMol',
    input.drugIon.freeFormMolarMassGPerMol,
    1,
    1e5,
    'g/mol',
  );
  const drugIonMolarMassGPerMol = requireFiniteInRange(
    'drugIonMolarMassGPerMol',
    input.drugIon.molarMassGPerMol,
    1,
    1e5,
    'g/mol',
  );
  const dose = c.doseMg;
  if (dose !== null && !(Number.isFinite(dose) && dose > 0)) {
    throw new ChemInputError('doseMg', `must be greater than zero, got ${dose}`, 'a dose > 0 mg');
  }
  const { est, origin } = intrinsicSolubility(c, freeFormMolarMassGPerMol);
  const temperatureK = settings.temperatureK;
  const activity: ProfileOptions['activity'] =
    settings.activityModel === 'davies'
      ? {
          model: 'davies',
          backgroundIonicStrengthM: settings.backgroundIonicStrengthM,
          temperatureK,
        }
      : { model: 'ideal' };
  const g = settings.phGrid;
  const grid = { phFrom: g.from, phTo: g.to, phStep: g.step, activity };
  const grids = drugGrids(drugP, c.ionCharge, est.value, grid);
  return {
    settings,
    compound: c,
    drug,
    drugProtolyte: drugP,
    freeFormMolarMassGPerMol,
    drugIonMolarMassGPerMol,
    doseMg: dose,
    log10IntrinsicM: est,
    intrinsicOrigin: origin,
    temperatureK,
    activity,
    grid,
    grids,
    profiles: input.profiles ?? 'full',
    ichM9Plan: planOf(grids.profile.phs),
  };
}

/** A solubility in mol/L of drug as mg/mL of free-form equivalents. */
export function freeFormMgPerMl(ctx: ScreenContext, solubilityM: number): number {
  return solubilityM * ctx.freeFormMolarMassGPerMol;
}

/** The masses of one candidate's salt (stoichiometry and hydrate water included), for mass cost and K_sp. */
export function saltMassInput(ctx: ScreenContext, cand: ScreeningCandidate): SaltMassInput {
  return {
    freeFormMolarMassGPerMol: ctx.freeFormMolarMassGPerMol,
    drugIonMolarMassGPerMol: ctx.drugIonMolarMassGPerMol,
    counterIonMolarMassGPerMol:
      cand.stoichiometry.ionMolarMassGPerMol ?? cand.counterIon.molarMassGPerMol,
    drugPerSalt: cand.stoichiometry.drugPerSalt,
    counterIonPerSalt: cand.stoichiometry.counterIonPerSalt,
    hydrateWater: cand.hydrateWater ?? 0,
  };
}
