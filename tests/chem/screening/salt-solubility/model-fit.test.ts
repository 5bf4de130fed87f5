import { readFileSync } from 'node:fs';
import * as OCL from 'openchemlib';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { COUNTER_IONS } from '@/chem';
import {
  computeLibraryDescriptors,
  renderLibraryDescriptorsModule,
} from '@/chem/screening/salt-solubility/library-descriptors';
import {
  fitAndValidateSaltSolubility,
  type SaltSolubilityBuild,
} from '@/chem/screening/salt-solubility/model-build';
import { renderModelDataModule } from '@/chem/screening/salt-solubility/model-render';
import type { CsvRecord } from '@/chem/screening/salt-solubility/training-rows';

/**
 * The shipped salt-solubility model is exactly what fixtures/reference/fit-salt-solubility.ts makes of
 * the published reference set, and its cross-validated figures stay at least as good as those
 * reported (bounds, so a worse model or worse data handling fails). Reference data: measured salt
 * solubilities of published series (pharmacopoeias and papers; each row's source in
 * fixtures/reference/salt-solubility.csv and salt-solubility.md). Every figure is leave-one-drug-out
 * with the ridge penalty chosen inside each fold — never the training fit.
 */
const read = (p: string) => readFileSync(new URL(`../../../../${p}`, import.meta.url), 'utf8');
const csv = (p: string) =>
  Papa.parse<CsvRecord>(read(p), { header: true, skipEmptyLines: true }).data;

let built: SaltSolubilityBuild;
beforeAll(() => {
  built = fitAndValidateSaltSolubility(
    OCL,
    csv('fixtures/reference/salt-solubility.csv'),
    csv('fixtures/reference/salt-solubility-drugs.csv'),
  );
}, 240_000);

describe('salt-solubility model: shipped = regenerated from the published set', () => {
  it('the coefficients module is byte for byte what the fit script writes', () => {
    expect(renderModelDataModule(built)).toBe(
      read('src/chem/screening/salt-solubility/salt-solubility-model.data.ts'),
    );
  });

  it('the cross-validation report is what the fit script writes', () => {
    expect(JSON.stringify(built.report, null, 2) + '\n').toBe(
      read('fixtures/reference/salt-solubility-cv.json'),
    );
  });

  it('the bundled ions’ descriptors are what openchemlib computes from their parents', () => {
    expect(renderLibraryDescriptorsModule(computeLibraryDescriptors(OCL, COUNTER_IONS))).toBe(
      read('src/chem/screening/salt-solubility/library-descriptors.data.ts'),
    );
  });

  it('holds out procaine and diclofenac (kept for an independent check) and uses every row it was given', () => {
    const drugs = built.report.drugs.map((d) => d.name.toLowerCase());
    expect(drugs.some((d) => d.includes('procaine') || d.includes('diclofenac'))).toBe(false);
    expect(built.report.excluded).toEqual([]);
    expect(built.report.summary.nSalts).toBeGreaterThanOrEqual(48);
  });
});

describe('salt-solubility model: leave-one-drug-out figures (bounds on what the README reports)', () => {
  const cv = () => built.report.selection;
  const baseline = () => built.report.variants.find((v) => v.id === 'no-descriptor')!.cv;

  it('the whole procedure (variant chosen inside each outer fold) beats the old anchor on the same folds', () => {
    expect(cv().rmse).toBeLessThan(cv().anchorRmse);
    expect(cv().meanSpearman).toBeGreaterThan(cv().anchorMeanSpearman + 0.3);
    expect(cv().leastSolubleHitRate).toBeGreaterThan(cv().anchorLeastSolubleHitRate);
  });

  it('the no-descriptor baseline is on the same folds and flat within a series (ρ 0, no least-soluble hit)', () => {
    expect(baseline().folds.map((f) => f.drugId)).toEqual(cv().folds.map((f) => f.drugId));
    expect(baseline().meanSpearman).toBe(0);
    expect(baseline().leastSolubleHitRate).toBe(0);
  });

  it('reported figures (README): RMSE ≤ 0.87 and within 0.02 of the baseline; ρ ≥ 0.40; least soluble among the two lowest in ≥ 4 of 5 series', () => {
    expect(cv().rmse).toBeLessThanOrEqual(0.87);
    expect(Math.abs(cv().rmse - baseline().rmse)).toBeLessThan(0.02);
    expect(cv().meanSpearman).toBeGreaterThanOrEqual(0.4);
    expect(
      cv().folds.filter((f) => f.n >= 3 && f.leastSolubleInLowestTwo).length,
    ).toBeGreaterThanOrEqual(4);
  });

  it('every estimate carries the nested procedure’s error as its 1σ, split so that shared² + within² = RMSE²', () => {
    const s = built.shipped.split;
    expect(built.shipped.cvRmseLog10).toBe(cv().rmse);
    expect(Math.hypot(s.sharedLog10Sd, s.withinLog10Sd)).toBeCloseTo(cv().rmse, 12);
    expect(s.sharedLog10Sd).toBeGreaterThan(0.3);
  });

  it('the variant is chosen inside every outer fold, by the rule, on that fold’s training drugs', () => {
    for (const f of cv().folds) expect(f.variant).toBeDefined();
  });
});
