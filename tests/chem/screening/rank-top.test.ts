import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rankCandidates, rankTop, type RankableRow, type ScreeningWeights } from '@/chem';

// rankTop (ranking.ts) keeps only the best N entries of a ranking for the batch with --top N. The
// reference is rankCandidates itself followed by slice(0, N): the same ids, ranks, scores, criterion
// scores and contributions, in the same order — ties keep input order and rows with an error come
// last. Criterion values are drawn from small sets so that ties are frequent (a workload only).

const criteria = fc.record({
  saltProbability: fc.constantFrom(null, 0, 0.5, 0.9, 1),
  log10WorstDoseNumber: fc.constantFrom(null, -1, 0, 0.7, 2.5),
  log10GastricDoseNumber: fc.constantFrom(null, -0.3, 0, 1, 3),
  phMaxMarginPh: fc.constantFrom(null, -2, 0, 0.4, 1.5),
  activeFraction: fc.constantFrom(0.4, 0.75, 0.9, 1),
  acceptabilityClass: fc.constantFrom(null, 1 as const, 2 as const, 3 as const),
  hygroscopicity: fc.constantFrom(null, 'non-hygroscopic' as const, 'deliquescent' as const),
});
const row = fc.record({ criteria, failed: fc.boolean() });
const weight = fc.constantFrom(0, 0.5, 1, 3.7);
const weights = fc.record({
  saltFormation: weight,
  solubility: weight,
  gastric: weight,
  disproportionation: weight,
  massCost: weight,
  acceptability: weight,
  hygroscopicity: weight,
});

describe('rankTop', () => {
  it('gives rankCandidates’ first N entries, with each entry’s row index', () => {
    fc.assert(
      fc.property(
        fc.array(row, { maxLength: 40 }),
        weights,
        fc.integer({ min: 0, max: 45 }),
        (drawn, w: ScreeningWeights, top) => {
          const rows: RankableRow[] = drawn.map((d, i) => ({
            id: `row-${i}`,
            criteria: d.criteria,
            error: d.failed ? 'fictional failure' : null,
          }));
          const expected = rankCandidates(rows, w).slice(0, top);
          const got = rankTop(rows, w, top);
          expect(got.map((g) => g.ranked)).toEqual(expected);
          for (const g of got) expect(rows[g.index]!.id).toBe(g.ranked.id);
        },
      ),
      { numRuns: 300, seed: 20 },
    );
  });
});
