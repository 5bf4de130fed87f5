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
  renderModelDataModule,
  type SaltSolubilityBuild,
} from '@/chem/screening/salt-solubility/model-build';
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
}, 60_000);

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

describe('salt-solubility model: leave-one-drug-out figures (bounds on what the closing note reports)', () => {
  const shippedCv = () => built.report.variants.find((v) => v.id === built.shipped.id)!.cv;

  it('beats today’s anchor on the same folds: lower RMSE, higher within-series ρ, more least-soluble hits', () => {
    const cv = shippedCv();
    expect(cv.rmse).toBeLessThan(cv.anchorRmse);
    expect(cv.meanSpearman).toBeGreaterThan(cv.anchorMeanSpearman + 0.3);
    expect(cv.leastSolubleHitRate).toBeGreaterThan(cv.anchorLeastSolubleHitRate);
  });

  it('reported figures: RMSE ≤ 0.90 log units, mean within-series ρ ≥ 0.40, least-soluble salt among the two lowest in ≥ 80 % of series', () => {
    const cv = shippedCv();
    expect(cv.rmse).toBeLessThanOrEqual(0.9);
    expect(cv.meanSpearman).toBeGreaterThanOrEqual(0.4);
    expect(cv.leastSolubleHitRate).toBeGreaterThanOrEqual(0.8);
  });

  it('every estimate carries the cross-validated error as its 1σ, not the training fit', () => {
    expect(built.shipped.cvRmseLog10).toBe(shippedCv().rmse);
  });
});
