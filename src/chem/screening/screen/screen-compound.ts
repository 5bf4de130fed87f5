import { kelvinToCelsius } from '../../units/temperature';
import { SCREENING_CAUTIONS } from '../../report/cautions';
import { chooseKsp, type KspChoice } from './ksp-choice';
import { hydrochlorideReference, screeningMedia } from './media';
import {
  isPrepared,
  prepareCandidate,
  referenceSolutionEnthalpyPerDrugKJ,
} from './prepare-candidate';
import { freeFormGastric, screenFreeForm } from './free-form';
import { screenContext } from './screen-context';
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
      ksps.set(p.cand.id, chooseKsp(ctx, p, refPerDrugKJ));
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

  const rows: ScreenRow[] = prepared.map((p) => {
    const label = rowLabel(p.cand.counterIon.name, p.cand.stoichiometry);
    if (!isPrepared(p)) return errorRow(p.cand, label, p.error);
    try {
      const kspOf = () => ksps.get(p.cand.id) ?? chooseKsp(ctx, p, refPerDrugKJ);
      return candidateRow(ctx, p, label, kspOf, media, hcl, shared);
    } catch (err) {
      return errorRow(p.cand, label, err instanceof Error ? err.message : String(err));
    }
  });

  return {
    compoundName: c.name,
    drugKind: c.kind,
    settings,
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
      microenvironmentAssumption(settings),
    ],
    cautions: SCREENING_CAUTIONS,
  };
}
