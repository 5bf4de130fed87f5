import { describe, expect, it } from 'vitest';
import {
  conversionBand,
  conversionProbability,
  disproportionationRisk,
  drugIon,
  EXCIPIENTS,
  excipientDisproportionation,
  excipientPhEstimate,
  excipientRisks,
  getCounterIon,
  normalCdf,
  probabilityPercentText,
  resolveExcipients,
  screenCompound,
  type ScreeningCandidate,
  type ScreeningCompound,
} from '@/chem';
import { ChemInputError } from '@/chem/result';

const byId = (id: string) => EXCIPIENTS.find((e) => e.id === id)!;

describe('normal CDF (Abramowitz & Stegun 7.1.26)', () => {
  it('matches the printed table of Φ (A&S Table 26.1) to 1e-6', () => {
    // A&S Table 26.1: Φ(1.00) = 0.841345, Φ(1.96) = 0.975002, Φ(2.50) = 0.993790.
    expect(normalCdf(0)).toBeCloseTo(0.5, 7);
    expect(normalCdf(1)).toBeCloseTo(0.841345, 6);
    expect(normalCdf(-1)).toBeCloseTo(1 - 0.841345, 6);
    expect(normalCdf(1.96)).toBeCloseTo(0.975002, 6);
    expect(normalCdf(2.5)).toBeCloseTo(0.99379, 6);
  });
});

describe('the bundled excipient table', () => {
  it('names a source for every row and keeps each pH range inside 0–14, low ≤ high', () => {
    expect(new Set(EXCIPIENTS.map((e) => e.id)).size).toBe(EXCIPIENTS.length);
    for (const e of EXCIPIENTS) {
      expect(e.source.length, e.id).toBeGreaterThan(10);
      expect(e.phLow, e.id).toBeGreaterThanOrEqual(0);
      expect(e.phHigh, e.id).toBeLessThanOrEqual(14);
      expect(e.phLow, e.id).toBeLessThanOrEqual(e.phHigh);
    }
  });

  it('reads a published range as a rectangular distribution (GUM §4.3.7: σ = width/√12)', () => {
    // Microcrystalline cellulose 5.0–7.5 (Handbook of Pharmaceutical Excipients): midpoint 6.25,
    // σ = 2.5/√12 = 0.72169 (hand computation).
    const mcc = excipientPhEstimate(byId('microcrystalline-cellulose'));
    expect(mcc.ph).toBeCloseTo(6.25, 10);
    expect(mcc.sigma).toBeCloseTo(0.72169, 5);
    // Sodium bicarbonate, one value 8.3 → 7.8–8.8 (±0.5, common practice): σ = 1/√12 = 0.288675.
    const bicarb = excipientPhEstimate(byId('sodium-bicarbonate'));
    expect(bicarb.phLow).toBeCloseTo(7.8, 10);
    expect(bicarb.phHigh).toBeCloseTo(8.8, 10);
    expect(bicarb.sigma).toBeCloseTo(0.288675, 6);
  });

  it('refuses an unknown excipient by its field and position', () => {
    expect(() => resolveExcipients(['mannitol', 'unobtainium'])).toThrow(ChemInputError);
    expect(() => resolveExcipients(['mannitol', 'unobtainium'])).toThrow(/excipients\.1/);
  });
});

describe('P(conversion) of a salt beside an excipient', () => {
  it('is Φ of the pH gap over the combined σ (hand computation)', () => {
    // Base, pH_max 6.0 ± 0.4; excipient 6.0–7.0 → 6.5 ± 0.288675.
    // s = √(0.16 + 0.083333) = 0.493288; z = 0.5 / 0.493288 = 1.01361;
    // A&S Table 26.1: Φ(1.01) = 0.84375, Φ(1.02) = 0.84614 → Φ(1.01361) ≈ 0.84461.
    expect(conversionProbability(6.0, 0.4, 6.5, 0.288675, 'base')).toBeCloseTo(0.84461, 4);
    // An acid converts below pH_max: the mirror image, 1 − 0.84461.
    expect(conversionProbability(6.0, 0.4, 6.5, 0.288675, 'acid')).toBeCloseTo(0.15539, 4);
  });

  it('is a step when neither pH is uncertain', () => {
    expect(conversionProbability(5, 0, 6, 0, 'base')).toBe(1);
    expect(conversionProbability(5, 0, 4, 0, 'base')).toBe(0);
    expect(conversionProbability(5, 0, 5, 0, 'base')).toBe(0.5);
  });

  it('never shows a normal tail as 0 % or 100 %', () => {
    expect(probabilityPercentText(0.9996)).toBe('>99 %');
    expect(probabilityPercentText(3.4e-5)).toBe('<1 %');
    expect(probabilityPercentText(0.84461)).toBe('84 %');
  });

  it('bands P into words at 0.1 and 0.5 (our own limits)', () => {
    expect(conversionBand(0.09)).toBe('unlikely');
    expect(conversionBand(0.1)).toBe('possible');
    expect(conversionBand(0.5)).toBe('likely');
  });

  it('flags a base salt whose pH_max lies below an excipient’s pH (magnesium stearate)', () => {
    // pH_max = pKa + log₁₀(S₀/√K_sp) = 8 + log₁₀(10⁻⁵/10⁻¹·⁵) = 4.5 (Bogardus & Blackwood 1979,
    // hand computation for pKa 8, S₀ 10⁻⁵ M, K_sp 10⁻³). Magnesium stearate 8–10 → 9.0 ± 0.57735;
    // z = 4.5/√(0.25 + 0.33333) = 5.89 → P ≈ 1 (Φ(5.89) > 0.999999).
    const risks = excipientRisks(
      4.5,
      0.5,
      resolveExcipients(['citric-acid', 'magnesium-stearate']),
      'base',
    );
    // Citric acid 2.2 → 1.7–2.7, 2.2 ± 0.288675: z = (2.2 − 4.5)/0.57735 = −3.98 → P ≈ 3.4e-5.
    expect(risks[0]!.probability!).toBeCloseTo(3.4e-5, 5);
    expect(risks[0]!.band).toBe('unlikely');
    expect(risks[1]!.probability!).toBeGreaterThan(0.999999);
    const d = excipientDisproportionation(4.5, 0.5, risks, 'base');
    expect(d.risk).toBe('high');
    expect(d.worstExcipientId).toBe('magnesium-stearate');
    // Margin scored: pH_max − the excipient's midpoint = 4.5 − 9.0 = −4.5.
    expect(d.marginPh).toBeCloseTo(-4.5, 10);
    expect(d.reason).toMatch(/likely to convert.*Magnesium stearate/);
    // With the acidifier alone the same salt stays on its side.
    const acidOnly = excipientDisproportionation(4.5, 0.5, risks.slice(0, 1), 'base');
    expect(acidOnly.risk).toBe('low');
  });
});

describe('microenvironment pH not stated', () => {
  it('says under which pH the salt would convert instead of claiming it will', () => {
    const d = disproportionationRisk(5.3, 7, 'base', 'assumed');
    expect(d.risk).toBe('high'); // the score still sees the assumed pH, as the assumptions say
    expect(d.basis).toBe('assumed');
    expect(d.thresholdPh).toBe(5.3);
    expect(d.reason).toMatch(/would convert to the free form above pH 5\.3/);
    expect(d.reason).toMatch(/not stated, assumed 7\.0/);
    expect(d.reason).not.toMatch(/^may convert/);
    // Hand count of the table's midpoints above 5.3: all but lactose (5.25), stearic acid (5.25),
    // colloidal silicon dioxide (4.5), povidone (4.0), copovidone (5.0), citric and tartaric acid (2.2).
    expect(d.reason).toMatch(/20 of 27 bundled excipients have a slurry pH above it/);
    // A stated pH keeps the firm wording.
    expect(disproportionationRisk(5.3, 7, 'base').reason).toMatch(/^may convert/);
  });
});

describe('the screen with excipients chosen', () => {
  const compound: ScreeningCompound = {
    name: 'test base',
    kind: 'base',
    pKas: [{ value: 8.0, origin: 'measured' }],
    ionCharge: 1,
    intrinsicSolubilityMgPerMl: 0.02,
    meltingPointC: null,
    logP: null,
    doseMg: 100,
  };
  const di = drugIon({ kind: 'base', ionCharge: 1, formula: 'C17H20N2O2' });
  const cand = (id: string): ScreeningCandidate => {
    const ion = getCounterIon(id)!;
    return {
      id,
      counterIon: ion,
      stoichiometry: ion.stoichiometries[0]!,
      hydrateWater: 0,
      measurements: [],
    };
  };

  it('replaces the single pH: each row carries its matrix row and the worst excipient decides', () => {
    const screen = (excipients: string[]) =>
      screenCompound({
        compound,
        drugIon: di,
        candidates: [cand('chloride'), cand('mesylate')],
        settings: { excipients },
      });
    const withStearate = screen(['citric-acid', 'magnesium-stearate']);
    for (const row of withStearate.rows) {
      expect(row.excipientRisks.map((r) => r.excipientId)).toEqual([
        'citric-acid',
        'magnesium-stearate',
      ]);
      // Every salt of this base has pH_max below 8 (pKa 8), so the stearate (8–10) is beyond it.
      expect(row.phMax!).toBeLessThan(8);
      expect(row.disproportionation!.basis).toBe('excipients');
      expect(row.disproportionation!.worstExcipientId).toBe('magnesium-stearate');
      expect(row.flags.some((f) => f.id === 'disproportionation')).toBe(true);
    }
    expect(withStearate.assumptions.join(' ')).toMatch(/chosen excipients \(Citric acid/);
    const acidOnly = screen(['citric-acid']);
    for (const row of acidOnly.rows) {
      expect(row.disproportionation!.risk).toBe('low');
      expect(row.flags.some((f) => f.id === 'disproportionation')).toBe(false);
    }
  });
});
