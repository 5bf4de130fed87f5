import { describe, expect, it } from 'vitest';
import {
  crossValidateByDrug,
  crossValidateWith,
  fixedVariantProcedure,
  lodoPredictions,
} from '@/chem/screening/salt-solubility/cross-validation';
import type { SaltSolubilityTrainingRow } from '@/chem/screening/salt-solubility/fit-salt-solubility';
import { splitResiduals } from '@/chem/screening/salt-solubility/model-evidence';
import { SALT_SOLUBILITY_FEATURES } from '@/chem/screening/salt-solubility/salt-solubility-features';
import {
  applyVariantRule,
  BASELINE_VARIANT,
  beats,
  selectionProcedure,
  type VariantId,
} from '@/chem/screening/salt-solubility/variant-choice';

// Made-up test INPUTS (not expected values): six drugs with three salts each; the counter-ion's heavy
// atoms lower log S by 0.1 per atom, each drug has its own level. The assertions are about the
// procedure (folds, leakage, the baseline's closed form), computed by hand where a number is checked.
function row(drug: number, salt: number, measured: number): SaltSolubilityTrainingRow {
  const heavy = 1 + 3 * salt;
  return {
    drugId: `d${drug}`,
    label: `d${drug} · s${salt}`,
    input: {
      drug: { kind: 'base', log10IntrinsicM: -4 - drug * 0.3, logP: 2 + drug * 0.2 },
      counterIon: {
        logPParent: salt - 1,
        polarSurfaceAreaA2: 20,
        hBondDonors: salt,
        hBondAcceptors: 1,
        aromaticRings: salt === 2 ? 1 : 0,
        heavyAtoms: heavy,
        inorganic: salt === 0,
        charge: -1,
      },
      drugPerSalt: 1,
      counterIonPerSalt: 1,
    },
    log10DrugM: measured,
    anchorLog10DrugM: -2 - drug * 0.3,
  };
}
const truth = (d: number, s: number) => -4 - d * 0.3 + 2 + 0.2 * ((d * 7) % 3) - 0.1 * (1 + 3 * s);
const rows: SaltSolubilityTrainingRow[] = [];
for (let d = 0; d < 6; d++) for (let s = 0; s < 3; s++) rows.push(row(d, s, truth(d, s)));

describe('leave-one-drug-out cross-validation', () => {
  it('predicts every salt exactly once, by a fold that held its whole drug out', () => {
    const seen: string[] = [];
    const cv = crossValidateWith(rows, (train, test) => {
      const held = new Set(test.map((r) => r.drugId));
      expect(held.size).toBe(1);
      expect(train.some((r) => held.has(r.drugId))).toBe(false);
      seen.push(...test.map((r) => r.label));
      return { predicted: test.map(() => 0), lambda: 1 };
    });
    expect(seen.sort()).toEqual(rows.map((r) => r.label).sort());
    expect(cv.nSalts).toBe(18);
    expect(cv.nDrugs).toBe(6);
    expect(cv.nRankedSeries).toBe(6);
  });

  it('the no-descriptor baseline is log₁₀ S₀ + the mean series offset of the OTHER drugs (closed form, by hand)', () => {
    const cv = crossValidateByDrug(rows, [], [1], BASELINE_VARIANT.kind);
    for (const f of cv.folds) {
      const others = [...new Set(rows.map((r) => r.drugId))].filter((d) => d !== f.drugId);
      const offsets = others.map((d) => {
        const g = rows.filter((r) => r.drugId === d);
        return g.reduce((s, r) => s + r.log10DrugM - r.input.drug.log10IntrinsicM, 0) / g.length;
      });
      const level = offsets.reduce((a, b) => a + b, 0) / offsets.length;
      const s0 = rows.find((r) => r.drugId === f.drugId)!.input.drug.log10IntrinsicM;
      for (const p of f.predicted) expect(p).toBeCloseTo(s0 + level, 12);
    }
    expect(cv.meanSpearman).toBe(0); // flat within every series
  });

  it('LEAKAGE: changing a held-out drug’s measured values leaves its own held-out predictions unchanged (every procedure, the fully nested selection included)', () => {
    const changed = rows.map((r) =>
      r.drugId === 'd2'
        ? { ...r, log10DrugM: r.log10DrugM + 3 * (r.input.counterIon.heavyAtoms % 2 ? 1 : -1) }
        : r,
    );
    const procedures = [
      fixedVariantProcedure([], 'within-series', () => 1),
      fixedVariantProcedure(SALT_SOLUBILITY_FEATURES, 'pooled', () => 1),
      fixedVariantProcedure(SALT_SOLUBILITY_FEATURES, 'within-series', () => 3),
      selectionProcedure,
    ];
    for (const proc of procedures) {
      const before = lodoPredictions(rows, proc).find((f) => f.drugId === 'd2')!.fold.predicted;
      const after = lodoPredictions(changed, proc).find((f) => f.drugId === 'd2')!.fold.predicted;
      expect(after).toEqual(before);
      // …while the other drugs' predictions do see the change (the test can fail the other way)
      const other = (set: SaltSolubilityTrainingRow[]) =>
        lodoPredictions(set, proc).find((f) => f.drugId === 'd0')!.fold.predicted;
      expect(other(changed)).not.toEqual(other(rows));
    }
  }, 60_000);

  it('the nested selection records the variant it chose inside each outer fold', () => {
    const cv = crossValidateWith(rows, selectionProcedure);
    for (const f of cv.folds) expect(f.variant).toMatch(/^(no-descriptor|pooled|within-series)/);
  }, 60_000);
});

describe('the variant rule and the σ split', () => {
  it('a richer model must beat the simpler one by the margin: ρ +0.05 at RMSE ≤ +0.02, or RMSE −0.02 at ρ no lower', () => {
    expect(beats({ rmse: 0.86, meanSpearman: 0.46 }, { rmse: 0.861, meanSpearman: 0 })).toBe(true);
    expect(beats({ rmse: 0.85, meanSpearman: 0.03 }, { rmse: 0.861, meanSpearman: 0 })).toBe(false);
    expect(beats({ rmse: 0.9, meanSpearman: 0.5 }, { rmse: 0.861, meanSpearman: 0 })).toBe(false);
    const figs = new Map<VariantId, { rmse: number; meanSpearman: number }>([
      ['no-descriptor', { rmse: 0.86, meanSpearman: 0 }],
      ['pooled', { rmse: 0.93, meanSpearman: 0.35 }],
      ['pooled+thermo', { rmse: 0.85, meanSpearman: 0.18 }],
      ['within-series', { rmse: 0.86, meanSpearman: 0.46 }],
      ['within-series+thermo', { rmse: 0.86, meanSpearman: 0.35 }],
    ]);
    expect(applyVariantRule(figs)).toBe('within-series');
    figs.set('within-series', { rmse: 0.9, meanSpearman: 0.02 });
    figs.set('within-series+thermo', { rmse: 0.9, meanSpearman: 0.02 });
    figs.set('pooled', { rmse: 0.95, meanSpearman: 0.01 });
    expect(applyVariantRule(figs)).toBe('no-descriptor');
  });

  it('splits residuals by hand: two drugs, residuals (1, 3) and (−2, 0) → within² = (1+1+1+1)/2 = 2, shared² = RMSE² − 2', () => {
    const fold = (drugId: string, e: number[]) => ({
      drugId,
      n: e.length,
      labels: e.map((_, i) => `${drugId}${i}`),
      measured: e.map(() => 0),
      predicted: e,
      anchor: e,
      rmse: 0,
      anchorRmse: 0,
      spearman: 0,
      anchorSpearman: 0,
      leastSolubleInLowestTwo: false,
      anchorLeastSolubleInLowestTwo: false,
      lambda: 1,
    });
    const rmse = Math.sqrt((1 + 9 + 4 + 0) / 4);
    const s = splitResiduals({
      folds: [fold('a', [1, 3]), fold('b', [-2, 0])],
      rmse,
    } as never);
    expect(s.withinLog10Sd).toBeCloseTo(Math.sqrt(2), 12);
    expect(s.sharedLog10Sd).toBeCloseTo(Math.sqrt(rmse ** 2 - 2), 12);
    expect(s.withinDof).toBe(2);
  });
});
