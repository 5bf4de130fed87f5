/**
 * Why the batch with `--top N` does not prune candidates by an upper bound on their score (prints only;
 * not part of `npm test`). For each generated fictional compound (tests/cli/batch/generated-compounds.mjs:
 * invented numbers, a workload only), screened against its ions with default settings, it counts the
 * candidates whose score could still reach the N-th best score when the criteria that need the salt's
 * pH–solubility work (worst-pH and gastric dose numbers, the pH_max margin) are replaced by
 * (a) their maximum score 1 (0.5 without a dose: the fixed score of an unknown dose number), and
 * (b) the best value any candidate of that compound reached (an oracle no cheap bound can beat).
 * Each such candidate would need its full numbers anyway; DEVELOPERS.md quotes the counts.
 *
 *   npx tsx --tsconfig tsconfig.json tests/bench/top-n-bound.ts [compounds=400] [top=3]
 */
import { criterionScores, rankCandidates, screenCompound, weightedScore } from '@/chem';
import { prepareScreen } from '@/cli/commands/screen/screen-input';
import {
  checkHeader,
  COLUMN_NAMES,
  csvCells,
  specFromRow,
} from '@/cli/commands/screen/batch/batch-row';
import { BATCH_HEADER, generatedCompoundLines } from '../cli/batch/generated-compounds.mjs';

const n = Number(process.argv[2] ?? 400);
const top = Number(process.argv[3] ?? 3);
const header = checkHeader(BATCH_HEADER.split(','));
const EXPENSIVE = ['solubility', 'gastric', 'disproportionation'] as const;

async function main() {
  let compounds = 0;
  let candidates = 0;
  let reachMax = 0;
  let reachOracle = 0;
  for (const line of generatedCompoundLines(n)) {
    const cells = csvCells(line);
    const raw = Object.fromEntries(header.map((h, i) => [h, cells[i] ?? '']));
    const { spec } = specFromRow(raw, 'not-stated');
    const p = await prepareScreen(spec, {
      settings: {},
      keepCocrystalBand: false,
      names: COLUMN_NAMES,
    });
    const res = screenCompound({ ...p, profiles: 'none' });
    const ranked = rankCandidates(res.rows, p.settings.weights);
    const scored = ranked.filter((r) => r.score !== null);
    if (scored.length <= top) continue;
    const nth = scored[top - 1]!.score!;
    const scores = res.rows.filter((r) => !r.error).map((r) => criterionScores(r.criteria));
    const best = Object.fromEntries(
      EXPENSIVE.map((k) => [k, Math.max(...scores.map((s) => s[k]))]),
    ) as Record<(typeof EXPENSIVE)[number], number>;
    const noDose = spec.doseMg === null ? 0.5 : 1;
    for (const s of scores) {
      candidates++;
      const a = { ...s, solubility: noDose, gastric: noDose, disproportionation: 1 };
      if (weightedScore(a, p.settings.weights) >= nth) reachMax++;
      if (weightedScore({ ...s, ...best }, p.settings.weights) >= nth) reachOracle++;
    }
    compounds++;
  }
  const per = (x: number) => (x / compounds).toFixed(1);
  console.log(
    `${compounds} compounds, ${per(candidates)} candidates each; could reach the top ${top}: ` +
      `${per(reachMax)} with the three criteria at their maximum, ${per(reachOracle)} with each compound's best values`,
  );
}
void main();
