import type { Estimate } from '../../result';
import { rankCandidates, rankTop, type RankableRow, type RankedRow } from '../ranking';
import { SALT_SOLUBILITY_MODEL } from '../salt-solubility/salt-solubility-model.data';
import { LIBRARY_COUNTER_ION_DESCRIPTORS } from '../salt-solubility/library-descriptors.data';
import type { ScreeningSettings } from '../settings';
import type { RobustnessShared } from '../rank-robustness';
import { isPrepared, prepareCandidate } from './prepare-candidate';
import { refinedRowNumbers, rowNumbers, type RowNumbers } from './row-numbers';
import { freeFormGastric } from './free-form';
import { screenCompound, screenRowOf, screenSetup, type ScreenSetup } from './screen-compound';
import { NO_CRITERIA } from './screen-row';
import type { ScreenCompoundInput, ScreeningCandidate, ScreenRow } from './screen.types';

/**
 * The N best rows of a screen, exactly as `screenCompound` followed by `rankCandidates` and the first N
 * would give them, for a caller that writes only those (the batch with `--top N`, without the
 * rank-robustness Monte Carlo, which needs every row). Two passes:
 *
 * 1. the numbers of every candidate (row-numbers.ts: K_sp, pH_max, dose numbers, media,
 *    microenvironment — the same function the full row calls), ranked by the same `rankCandidates`;
 * 2. the words, reasons, flags and ΔH_sol per drug ion of the N rows that are written only, on the
 *    numbers of pass 1.
 *
 * ΔH_sol is left out of pass 1 when no ranked number can depend on it (`solutionEnthalpyRanks`): the
 * shipped salt-solubility model has no ΔH_sol predictor, every candidate has counter-ion descriptors (so
 * no anchor estimate shifts by the relative ΔH_sol) and none carries measurements. The rows written are
 * then given their ΔH_sol and words on pass 1's numbers (which the ΔH_sol cannot move then); if a row
 * fails only in its words, the whole screen is run the full way and ranked.
 * tests/chem/screening/screen/screen-top.test.ts compares both ways field by field.
 */
export interface ScreenTopOptions {
  top: number;
  /** Each candidate's ΔH_sol computed on demand (candidatesFromLibrary's `solutionEnthalpyLater`). */
  solutionEnthalpyLater?: ReadonlyMap<string, () => Estimate | null>;
}

export interface ScreenTopResult {
  settings: ScreeningSettings;
  /** The ranking's first N entries (rank, score, criterion scores), best first. */
  ranked: RankedRow[];
  /** The row of each ranked entry, in the same order. */
  rows: ScreenRow[];
  /** What the rank-robustness draw and the shown precision share (as ScreenResult carries it). */
  robustnessShared: RobustnessShared;
}

/** Whether a candidate's ΔH_sol can move a ranked number (see screenCompoundTop). */
export function solutionEnthalpyRanks(candidates: readonly ScreeningCandidate[]): boolean {
  const predictors: readonly string[] = SALT_SOLUBILITY_MODEL.featureNames;
  if (predictors.includes('thermoShiftDecades')) return true;
  return candidates.some(
    (c) =>
      (c.measurements?.length ?? 0) > 0 ||
      !(c.counterIonDescriptors ?? LIBRARY_COUNTER_ION_DESCRIPTORS[c.counterIon.id]),
  );
}

const withLater = (
  c: ScreeningCandidate,
  later: ReadonlyMap<string, () => Estimate | null> | undefined,
): ScreeningCandidate => {
  const f = later?.get(c.id);
  return f ? { ...c, solutionEnthalpyKJ: f() } : c;
};

/** Pass 1: every candidate's numbers (by the candidate's index), and the ranking they give. */
function rankByNumbers(setup: ScreenSetup, top: number) {
  const numbers: (RowNumbers | undefined)[] = new Array(setup.prepared.length);
  const rankable: RankableRow[] = setup.prepared.map((p, i) => {
    if (!isPrepared(p)) return { id: p.cand.id, criteria: NO_CRITERIA, error: p.error };
    try {
      const kspOf = () => setup.ksps.get(p.cand.id) ?? chooseAgain();
      // scores only: pH_max may be left unrefined where its score is saturated (row-numbers.ts)
      const n = rowNumbers(setup.ctx, p, kspOf, setup.media, setup.hcl, setup.shared, true);
      numbers[i] = n;
      return { id: p.cand.id, criteria: n.criteria, error: null };
    } catch (err) {
      return { id: p.cand.id, criteria: NO_CRITERIA, error: String(err) || 'failed' };
    }
  });
  return { ranked: rankTop(rankable, setup.ctx.settings.weights, top), numbers };
}

/** K_sp that failed in the setup fails again (the row turns it into its error). */
function chooseAgain(): never {
  throw new Error('K_sp could not be chosen');
}

/** The N best rows of a screen, exactly as the full screen ranks them (see above). */
export function screenCompoundTop(
  input: ScreenCompoundInput,
  opts: ScreenTopOptions,
): ScreenTopResult {
  const later = opts.solutionEnthalpyLater;
  const defer = later !== undefined && !solutionEnthalpyRanks(input.candidates);
  const candidates = defer ? input.candidates : input.candidates.map((c) => withLater(c, later));
  const setup = screenSetup({ ...input, candidates });
  freeFormGastric(setup.ctx, setup.media[0], setup.hcl); // fails where the full screen fails
  const { ranked, numbers } = rankByNumbers(setup, opts.top);
  const rows: ScreenRow[] = [];
  for (const { index } of ranked) {
    const p = setup.prepared[index]!;
    const pass1 = numbers[index];
    // a written row reads pH_max (its words, columns, σ): refined now if pass 1 left it
    const n = pass1 && refinedRowNumbers(setup.ctx, pass1, setup.shared);
    if (!defer || !n || !isPrepared(p)) {
      const row = screenRowOf(setup, p, n);
      if ((row.error === null) !== (n !== undefined)) return fullScreenTop(input, opts.top, later);
      rows.push(row);
      continue;
    }
    // ΔH_sol now, for a written row: prepared again with it, its numbers those of pass 1 (when
    // `defer` holds no number reads ΔH_sol, see above); its words and ΔH_sol per drug ion are new.
    const row = screenRowOf(setup, prepareCandidate(setup.ctx, withLater(p.cand, later)), n);
    if (row.error !== null) return fullScreenTop(input, opts.top, later);
    rows.push(row);
  }
  return {
    settings: setup.ctx.settings,
    ranked: ranked.map((r) => r.ranked),
    rows,
    robustnessShared: setup.shared,
  };
}

/** The full screen, ranked, its first N: the way back when the shortcut's check fails. */
function fullScreenTop(
  input: ScreenCompoundInput,
  top: number,
  later: ReadonlyMap<string, () => Estimate | null> | undefined,
): ScreenTopResult {
  const res = screenCompound({
    ...input,
    candidates: input.candidates.map((c) => withLater(c, later)),
  });
  const ranked = rankCandidates(res.rows, res.settings.weights).slice(0, top);
  const byId = new Map(res.rows.map((r) => [r.id, r]));
  return {
    settings: res.settings,
    ranked,
    rows: ranked.map((k) => byId.get(k.id)!),
    robustnessShared: res.robustnessShared,
  };
}
