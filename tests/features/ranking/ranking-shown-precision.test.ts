import { describe, expect, it } from 'vitest';
import { rankCandidates, roundToUncertainty } from '@/chem';
import { displayRows, freeFormShown } from '@/features/ranking/ranking-rows';
import { screeningSettingsOf } from '@/screening-data/screening-settings';
import { demoAppScreening, demoCliOutput, demoProject } from './support/demo-app-cli';

// Issue 19: the Ranking's numbers read as the sheet and the CLI print them (precision from σ), and
// each origin mark follows what limits the number. The fictional demo (invented numbers) drives it.

async function rows() {
  const data = await demoAppScreening();
  const ranked = rankCandidates(data.screen.rows, screeningSettingsOf(demoProject).weights);
  return { data, shown: displayRows(data, ranked) };
}

describe('the Ranking’s shown numbers (issue 19)', () => {
  it('ΔpKa to the decimal place of the measured pKa’s 1σ 0.1: two decimals (was always one)', async () => {
    const { data, shown } = await rows();
    expect(data.screen.robustnessShared.drugPkaSigma).toBe(0.1);
    for (const r of shown) {
      // GUM §7.2.6 by hand: σ 0.1 → 0.10, two decimals; 7.8 − (−1.2) = 9.0 for mesylate → 9.00.
      expect(r.deltaPkaDecimals, r.label).toBe(2);
      expect(r.deltaPka, r.label).toBe(roundToUncertainty(r.row.deltaPka!, 0.1).value);
    }
  }, 60000);

  it('a D₀ the free form limits carries the free form’s mark, the same as the free-form row (was est. beside meas.)', async () => {
    const { data, shown } = await rows();
    const ff = freeFormShown(data, demoProject.compound.name, demoProject.compound.doseMg);
    // The demo's S₀ is entered as measured: the free-form row's D₀ is meas.
    expect(ff.worstDose?.origin).toBe('measured');
    const limitedByFreeForm = shown.filter((r) => r.worstDose?.solid === 'free-form');
    expect(limitedByFreeForm.length).toBeGreaterThan(0);
    for (const r of limitedByFreeForm)
      expect(r.worstDose?.origin, r.label).toBe(ff.worstDose?.origin);
    // Salt-limited numbers keep the K_sp's mark: estimated, no salt solubility measured in the demo.
    for (const r of shown.filter((x) => x.gastricDose?.solid === 'salt'))
      expect(r.gastricDose?.origin, r.label).toBe('estimated');
  }, 60000);

  it('the ±1σ ranges read as the CSVs print them, at two significant figures (the gastric range read 4.4–236)', async () => {
    const { shown } = await rows();
    const cli = (JSON.parse(await demoCliOutput('json')) as { rows: Record<string, string>[] })
      .rows;
    for (const r of shown) {
      const c = cli.find((x) => x.candidate === r.label)!;
      expect(c, r.label).toBeDefined();
      expect(r.worstDose?.range, r.label).toStrictEqual([
        Number(c.worst_dose_number_low),
        Number(c.worst_dose_number_high),
      ]);
      expect(r.gastricDose?.range, r.label).toStrictEqual([
        Number(c.gastric_dose_number_low),
        Number(c.gastric_dose_number_high),
      ]);
      expect(r.saltWater?.range, r.label).toStrictEqual([
        Number(c.salt_solubility_water_mg_per_ml_low),
        Number(c.salt_solubility_water_mg_per_ml_high),
      ]);
    }
  }, 60000);
});
