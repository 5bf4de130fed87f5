import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import {
  DEFAULT_DELTA_PKA_BANDS,
  hygroscopicityClass,
  ICH_M9_PH_RANGE,
  ICH_M9_VOLUME_ML,
  log10FreeFormSolubilityM,
  PH_EUR_HYGROSCOPICITY_LIMITS_PERCENT,
  saltFormationVerdict,
  solubilityClass,
  type Protolyte,
} from '@/chem/screening';

const csv = (name: string) =>
  Papa.parse<Record<string, string>>(
    readFileSync(new URL(`../../../fixtures/screening/${name}`, import.meta.url), 'utf8'),
    { header: true, skipEmptyLines: true },
  ).data;

describe('published pH–solubility examples (fixtures/screening/ph-solubility-published-examples.csv)', () => {
  it.each(csv('ph-solubility-published-examples.csv'))(
    '$compound: log S = log S₀ + log 2 at each pKa-midpoint, log S₀ on the neutral plateau ($source)',
    (row) => {
      const pKas = [Number(row.pka_1), ...(row.pka_2 ? [Number(row.pka_2)] : [])];
      const top = row.kind === 'base' ? 1 : row.kind === 'acid' ? 0 : 1;
      const p: Protolyte = { pKas, mostProtonatedCharge: top };
      const logS0 = Number(row.log10_intrinsic_solubility_M);
      if (pKas.length === 1) {
        expect(log10FreeFormSolubilityM(p, logS0, pKas[0]!)).toBeCloseTo(logS0 + Math.log10(2), 10);
        const neutralPh = row.kind === 'base' ? pKas[0]! + 6 : pKas[0]! - 6;
        expect(Math.abs(log10FreeFormSolubilityM(p, logS0, neutralPh) - logS0)).toBeLessThan(1e-5);
      } else {
        // Ampholyte (Avdeef eq. 6.7): the minimum of the U-shaped curve lies at (pKa1 + pKa2)/2.
        const mid = (pKas[0]! + pKas[1]!) / 2;
        const at = (pH: number) => log10FreeFormSolubilityM(p, logS0, pH);
        expect(at(mid)).toBeLessThan(at(mid - 0.1));
        expect(at(mid)).toBeLessThan(at(mid + 0.1));
      }
    },
  );
});

describe('standard limits (fixtures/screening/standard-limits.csv) match the code', () => {
  const v = Object.fromEntries(
    csv('standard-limits.csv').map((r) => [r.quantity, Number(r.value)]),
  );
  it('ICH M9 (2019): 250 mL, pH 1.2–6.8, D₀ ≤ 1', () => {
    expect(ICH_M9_VOLUME_ML).toBe(v.ich_m9_volume);
    expect(ICH_M9_PH_RANGE).toStrictEqual([v.ich_m9_ph_low, v.ich_m9_ph_high]);
    const dose = 100;
    const atLimit = dose / v.ich_m9_volume! / v.ich_m9_dose_number_max!;
    expect(solubilityClass(dose, [{ pH: 6.8, solubilityMgPerMl: atLimit }]).solubilityClass).toBe(
      'high',
    );
    expect(
      solubilityClass(dose, [{ pH: 6.8, solubilityMgPerMl: atLimit * (1 - 1e-12) }])
        .solubilityClass,
    ).toBe('low');
  });
  it('Ph. Eur. 5.11: classes change exactly at 0.2, 2 and 15 %', () => {
    expect(PH_EUR_HYGROSCOPICITY_LIMITS_PERCENT).toStrictEqual({
      slightly: v.ph_eur_slightly_hygroscopic_min,
      hygroscopic: v.ph_eur_hygroscopic_min,
      very: v.ph_eur_very_hygroscopic_min,
    });
    expect(hygroscopicityClass(v.ph_eur_very_hygroscopic_min!)).toBe('very hygroscopic');
    expect(hygroscopicityClass(v.ph_eur_very_hygroscopic_min! - 1e-9)).toBe('hygroscopic');
    expect(hygroscopicityClass(v.ph_eur_hygroscopic_min!)).toBe('hygroscopic');
    expect(hygroscopicityClass(v.ph_eur_slightly_hygroscopic_min!)).toBe('slightly hygroscopic');
    expect(hygroscopicityClass(v.ph_eur_slightly_hygroscopic_min! - 1e-9)).toBe('non-hygroscopic');
  });
  it('Cruz-Cabeza 2012 bands are the defaults', () => {
    expect(DEFAULT_DELTA_PKA_BANDS.cocrystalBelow).toBe(v.delta_pka_cocrystal_below);
    expect(DEFAULT_DELTA_PKA_BANDS.saltAbove).toBe(v.delta_pka_salt_above);
    expect(saltFormationVerdict(v.delta_pka_salt_above! + 1e-9).band).toBe('salt');
  });
});
