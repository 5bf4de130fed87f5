import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  COUNTER_IONS,
  estimateSaltWaterSolubility,
  LIBRARY_COUNTER_ION_DESCRIPTORS,
  SALT_SOLUBILITY_DIVALENT_CATIONS,
  SALT_SOLUBILITY_FUSION_CHECK,
  SALT_SOLUBILITY_MODEL,
  SALT_SOLUBILITY_SELECTION,
} from '@/chem';

/**
 * The README's paragraph on the salt's own solubility states the figures the fit script generates
 * (salt-solubility-model.data.ts), not older ones: regenerate the model and this test says which
 * sentence to update.
 */
const readme = readFileSync(new URL('../../../../README.md', import.meta.url), 'utf8');
const start = readme.indexOf("### How a salt's own solubility is estimated");
const section = readme.slice(start, readme.indexOf('## Command line', start)).replace(/\s+/g, ' ');
const minus = (x: number, d: number) => `${x < 0 ? '−' : ''}${Math.abs(x).toFixed(d)}`;

describe('README: the salt-solubility claims follow the generated figures', () => {
  const s = SALT_SOLUBILITY_SELECTION;
  it('states the nested RMSE, the no-descriptor baseline and the anchor on the same folds', () => {
    expect(section).toContain(`${s.nSalts} salts of ${s.nDrugs} drugs`);
    expect(section).toContain(`misses by **${s.rmse!.toFixed(3)}**`);
    expect(section).toContain(`misses by **${s.baselineRmse!.toFixed(3)}**`);
    expect(section).toContain(`anchor by ${s.anchorRmse!.toFixed(3)}`);
  });

  it('says what the descriptors add: ρ and the least-soluble count beside the baseline’s', () => {
    expect(section).toContain(`Spearman ρ of ${s.meanSpearman!.toFixed(2)}`);
    expect(section).toContain(`ρ ${s.baselineMeanSpearman!.toFixed(0)}`);
    expect(section).toContain(
      `in ${s.leastSolubleHits} of ${s.nRankedSeries} series (baseline ${s.baselineLeastSolubleHits}, anchor ${s.anchorLeastSolubleHits})`,
    );
    const noGain = Math.abs(s.rmse! - s.baselineRmse!) < 0.02;
    expect(section.includes('do not measurably lower the error')).toBe(noGain);
    expect(section).not.toMatch(/knows/);
  });

  it('states the σ split, the fusion check and the divalent-cation offset as generated', () => {
    const m = SALT_SOLUBILITY_MODEL;
    expect(section).toContain(
      `${m.sharedLog10Sd!.toFixed(2)} is a level shared by every salt of one drug and ${m.withinLog10Sd!.toFixed(2)} differs salt by salt`,
    );
    const f = SALT_SOLUBILITY_FUSION_CHECK;
    expect(section).toContain(`the ${f.nSalts} published salts with a melting point`);
    expect(section).toContain(
      `RMSE ${f.rmseWith!.toFixed(2)} against ${f.rmseWithout!.toFixed(2)}`,
    );
    expect(section).toContain(`makes ${f.nWorsened} of the ${f.nSalts} salts worse`);
    expect(section.includes('**not applied**')).toBe(!f.fusionCorrectionApplies);
    const d = SALT_SOLUBILITY_DIVALENT_CATIONS;
    expect(section).toContain(`(${minus(d.offsetDecades!, 2)} decades) is applied`);
    expect(d.offsetApplies).toBe(true);
    expect(section).toContain(`widened by ${d.extraWithinLog10Sd!.toFixed(2)} decades`);
  });

  it('counts the library ions outside the training range as the README says', () => {
    const ids = Object.keys(LIBRARY_COUNTER_ION_DESCRIPTORS);
    const outside = ids.filter((id) => {
      const acid = COUNTER_IONS.find((i) => i.id === id)!.kind === 'cation';
      const e = estimateSaltWaterSolubility({
        drug: { kind: acid ? 'acid' : 'base', log10IntrinsicM: -4, logP: 2 },
        counterIon: { ...LIBRARY_COUNTER_ION_DESCRIPTORS[id]!, charge: acid ? 1 : -1 },
        drugPerSalt: 1,
        counterIonPerSalt: 1,
      });
      return e.domain.sigmaFactor > 1;
    });
    expect(section).toContain(`${outside.length} of the library's ${ids.length} ions`);
    expect(outside).toEqual(expect.arrayContaining(['napsylate', 'benzathine']));
  });
});
