import { kelvinToCelsius } from '../../units/temperature';
import { SCREENING_CAUTIONS } from '../../report/cautions';
import { chooseKsp, chooseKspNumbers, kspWithWords, type KspChoice } from './ksp-choice';
import {
  hydrochlorideReference,
  screeningMedia,
  type HydrochlorideReference,
  type ScreenMedium,
} from './media';
import {
  isPrepared,
  prepareCandidate,
  referenceSolutionEnthalpyPerDrugKJ,
  type PreparedOrError,
} from './prepare-candidate';
import type { RobustnessShared } from '../rank-robustness';
import type { RowNumbers } from './row-numbers';
import { freeFormGastric, screenFreeForm } from './free-form';
import { screenContext, type ScreenContext } from './screen-context';
import { rowLabel } from './screen-reasons';
import { screenAssumptions } from './screen-notes';
import { microenvironmentAssumption } from './microenvironment';
import { candidateRow, errorRow } from './screen-row';
import type { ScreenCompoundInput, ScreenResult, ScreenRow } from './screen.types';

/**
 * screenCompound: the expensive, once-per-input step of the screen. For every candidate salt it
 * computes ΔpKa and the salt-formation verdict, mass cost, K_sp (measured or estimated, labelled),
 * the pH–solubility profile (pH 1–8 by default) with pH_max, dose numbers across pH 1.2–6.8 (ICH M9)
 * and in gastric medium with its chloride (common-ion effect), disproportionation risk, measured
 * overrides, a "likely poorly soluble" flag with its rule, and reasons in words. The cheap weighting
 * step is rankCandidates (ranking.ts); rank robustness is rankRobustness (rank-robustness.ts).
 *
 * The steps, in order: the context (screen-context.ts), the free form (free-form.ts), each candidate
 * prepared (prepare-candidate.ts), its K_sp chosen (ksp-choice.ts), the hydrochloride other salts may
 * convert to (media.ts), then one row per candidate (screen-row.ts); the words are in screen-reasons.ts.
 *
 * Throws ChemInputError for bad compound data; a bad candidate gets a row with `error`.
 */
export function screenCompound(input: ScreenCompoundInput): ScreenResult {
  const setup = screenSetup(input);
  const { ctx, media, hcl, shared, freeForm } = setup;
  const rows: ScreenRow[] = setup.prepared.map((p) => screenRowOf(setup, p));
  return {
    compoundName: ctx.compound.name,
    drugKind: ctx.compound.kind,
    settings: ctx.settings,
    freeForm: { ...freeForm.result, gastric: freeFormGastric(ctx, media[0], hcl) },
    rows,
    robustnessShared: shared,
    assumptions: [
      ...freeForm.profile.assumptions,
      ...screenAssumptions(
        kelvinToCelsius(ctx.temperatureK),
        hcl !== null,
        rows.flatMap((r) => (r.saltWaterSolubility ? [r.saltWaterSolubility.basis] : [])),
      ),
      microenvironmentAssumption(ctx.settings),
    ],
    cautions: SCREENING_CAUTIONS,
  };
}

/** What every row of a screen shares: the context, the media, the prepared candidates, their K_sp. */
export interface ScreenSetup {
  ctx: ScreenContext;
  media: ScreenMedium[];
  prepared: PreparedOrError[];
  refPerDrugKJ: number | null;
  ksps: Map<string, KspChoice>;
  hcl: HydrochlorideReference | null;
  shared: RobustnessShared;
  freeForm: ReturnType<typeof screenFreeForm>;
}

/**
 * The steps before the rows: the context, each candidate prepared, the reference ΔH_sol, each K_sp
 * (a failure is left to the row, which reports it when it recomputes) and the hydrochloride. A K_sp
 * here is its numbers; its words are written when a row is built (screenRowOf).
 */
export function screenSetup(input: ScreenCompoundInput): ScreenSetup {
  const ctx = screenContext(input);
  const { settings, compound: c } = ctx;
  const drugPkaSigma = Math.max(...c.pKas.map((p) => settings.pkaSigmaByOrigin[p.origin]));
  const media = screeningMedia(settings);
  const freeForm = screenFreeForm(ctx);
  const prepared = input.candidates.map((cand) => prepareCandidate(ctx, cand));
  const refPerDrugKJ = referenceSolutionEnthalpyPerDrugKJ(prepared);
  const ksps = new Map<string, KspChoice>();
  for (const p of prepared) {
    if (!isPrepared(p)) continue;
    try {
      ksps.set(p.cand.id, chooseKspNumbers(ctx, p, refPerDrugKJ));
    } catch {
      /* the row reports the error when it recomputes */
    }
  }
  const hcl = hydrochlorideReference(ctx, prepared, ksps);
  const shared = {
    drugKind: c.kind,
    drugPkaSigma,
    log10IntrinsicSigma: ctx.log10IntrinsicM.uncertainty,
    bands: settings.deltaPkaBands,
  };
  return { ctx, media, prepared, refPerDrugKJ, ksps, hcl, shared, freeForm };
}

/**
 * One candidate's row: its error, or its numbers and words (a failing step becomes the error). The
 * row reads its K_sp with the words written (kspWithWords), also from numbers computed before.
 */
export function screenRowOf(s: ScreenSetup, p: PreparedOrError, numbers?: RowNumbers): ScreenRow {
  const label = rowLabel(p.cand.counterIon.name, p.cand.stoichiometry);
  if (!isPrepared(p)) return errorRow(p.cand, label, p.error);
  try {
    const setupKsp = s.ksps.get(p.cand.id);
    const kspOf = () => (setupKsp ? kspWithWords(setupKsp) : chooseKsp(s.ctx, p, s.refPerDrugKJ));
    const n = numbers && { ...numbers, ksp: kspWithWords(numbers.ksp) };
    return candidateRow(s.ctx, p, label, kspOf, s.media, s.hcl, s.shared, n);
  } catch (err) {
    return errorRow(p.cand, label, err instanceof Error ? err.message : String(err));
  }
}
