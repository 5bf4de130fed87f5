import { describe, expect, it } from 'vitest';
import {
  decideLimitingSolid,
  drugIon,
  getCounterIon,
  screenCompound,
  temperatureTransfer,
  type MeasurementInput,
  type ScreeningCandidate,
  type ScreeningCompound,
} from '@/chem';

// Test inputs: a weak base (pKa 7.8, S₀ 0.015 mg/mL, both stated as measured) described only by the
// properties the models need. Every expected value is a hand computation from the mass balances of
// Kramer & Flynn 1972 / Bogardus & Blackwood 1979 for a 1:1 salt of a fully ionised counter-ion with
// no added counter-ion (s = total drug dissolved, α₊ = 1/(1 + 10^(pH − pKa)), r = 10^(pKa − pH)):
//   salt the solid:      K_sp = [BH⁺][X⁻] = α₊·s·s
//   free form the solid: s = S₀·(1 + r)
//   at pH_max both hold: K_sp/S₀² = r·(1 + r)
// and the van ’t Hoff equation ln(S₂/S₁) = −(ΔH/R)(1/T₂ − 1/T₁), R = 0.008314462618 kJ/(mol·K).
const compound: ScreeningCompound & { formula: string } = {
  name: 'test base',
  kind: 'base',
  pKas: [{ value: 7.8, origin: 'measured' }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: 0.015,
  intrinsicSolubilityOrigin: 'measured',
  meltingPointC: null,
  logP: null,
  doseMg: 100,
  formula: 'C18H20ClN3O',
};
const di = drugIon({ kind: 'base', ionCharge: 1, formula: compound.formula });

const sol = (mgPerMlFreeForm: number, ph: number | null, extra: Partial<MeasurementInput> = {}) =>
  ({
    kind: 'solubility',
    value: mgPerMlFreeForm,
    unit: 'mg/mL free form',
    ph,
    temperatureK: 310.15,
    medium: 'water',
    text: '',
    ...extra,
  }) satisfies MeasurementInput;

function screenWith(ionId: string, measurements: MeasurementInput[], settings?: unknown) {
  const ion = getCounterIon(ionId)!;
  const cand: ScreeningCandidate = {
    id: ionId,
    counterIon: ion,
    stoichiometry: ion.stoichiometries[0]!,
    hydrateWater: 0,
    measurements,
  };
  return screenCompound({ compound, drugIon: di, candidates: [cand], settings }).rows[0]!;
}

// Hand computation, the besylate case: a value whose salt reading puts pH_max at 7.2, measured at
// pH 7.6. pH_max 7.2: r = 10^0.6 = 3.98107, K_sp/S₀² = 3.98107 × 4.98107 = 19.8300. At pH 7.6,
// α₊ = 1/(1 + 10^−0.2) = 0.613137, so s = √(19.8300/0.613137)·S₀ = 5.68699·S₀ = 0.0853049 mg/mL
// (free form). The free form alone gives S₀·(1 + 10^0.2) = 2.58489·S₀ there: the value is
// 5.68699/2.58489 = 2.20009× (log₁₀ 0.34244) above it.
const BESYLATE_PH76_MG = 0.0853049;

describe('which solid limits a measured solubility (decideLimitingSolid)', () => {
  it('the lab’s statement of the solid left wins over every number', () => {
    expect(
      decideLimitingSolid({
        stated: 'free-form',
        ph: 3,
        restPhMax: { value: 7, sigma: 0.1 },
        overFreeFormLog10: { value: -4, sigma: 0.1 },
      }),
    ).toEqual({ limitedBy: 'free-form', decidedBy: 'user' });
  });

  it('the pH against the rest of the evidence’s pH_max, with a 1σ margin', () => {
    // 7.6 > 7.2 + 1 × 0.15 = 7.35 → above pH_max: the free form
    expect(
      decideLimitingSolid({
        stated: null,
        ph: 7.6,
        restPhMax: { value: 7.2, sigma: 0.15 },
        overFreeFormLog10: null,
      }),
    ).toEqual({ limitedBy: 'free-form', decidedBy: 'ph-max' });
    // 5.0 < 7.2 − 0.9 = 6.3 → below pH_max: the salt
    expect(
      decideLimitingSolid({
        stated: 'unknown',
        ph: 5,
        restPhMax: { value: 7.2, sigma: 0.9 },
        overFreeFormLog10: null,
      }),
    ).toEqual({ limitedBy: 'salt', decidedBy: 'ph-max' });
  });

  it('within the pH_max margin, the value against the free form’s own solubility decides', () => {
    const base = { stated: null, ph: 7.6, restPhMax: { value: 7.2, sigma: 0.9 } } as const;
    // 0.4 > 1 × 0.15: above what the free form gives → read as the free form's
    expect(
      decideLimitingSolid({ ...base, overFreeFormLog10: { value: 0.4, sigma: 0.15 } }),
    ).toEqual({ limitedBy: 'free-form', decidedBy: 'free-form-saturation' });
    // −1.0 < −0.15: the free base is unsaturated, so the free form cannot be the solid
    expect(decideLimitingSolid({ ...base, overFreeFormLog10: { value: -1, sigma: 0.15 } })).toEqual(
      { limitedBy: 'salt', decidedBy: 'free-form-saturation' },
    );
    // |0.1| < 0.15 and 7.6 within 7.2 ± 0.9: undecided
    expect(
      decideLimitingSolid({ ...base, overFreeFormLog10: { value: 0.1, sigma: 0.15 } }),
    ).toEqual({ limitedBy: 'unknown', decidedBy: 'within-margin' });
    expect(
      decideLimitingSolid({ stated: null, ph: null, restPhMax: null, overFreeFormLog10: null }),
    ).toEqual({ limitedBy: 'unknown', decidedBy: 'no-ph' });
  });
});

describe('bench solubility in the screen', () => {
  it('a besylate value at pH 7.6 whose salt reading gives pH_max 7.2 is the free form’s: no K_sp, implied S₀', () => {
    const row = screenWith('besylate', [sol(BESYLATE_PH76_MG, 7.6)]);
    expect(row.kspOrigin).toBe('estimated');
    expect(row.saltWaterSolubility!.origin).not.toBe('measured');
    expect(row.benchSolubility!.limitedBy).toBe('free-form');
    expect(row.benchSolubility!.readings[0]!.usedForKsp).toBe(false);
    // implied S₀ = S_total / (1 + 10^(7.8 − 7.6)) = 0.0853049 / 2.58489 = 0.0330013 mg/mL
    expect(row.benchSolubility!.impliedS0!.mgPerMl).toBeCloseTo(0.0330013, 6);
    // the excess over the free form, log₁₀ 2.20009 = 0.34244, beyond its 1σ
    // √(0.1² (S₀) + (0.1 × 0.613137)² (pKa × ionised fraction) + 0.05² (value)) = 0.12751
    const r0 = row.benchSolubility!.readings[0]!;
    expect(r0.overFreeFormLog10!.value).toBeCloseTo(0.34244, 4);
    expect(r0.overFreeFormLog10!.sigma).toBeCloseTo(0.12751, 4);
    expect(row.reasons.some((r) => /limited by the free form/.test(r.text))).toBe(true);
  });

  it('against a value the lab marked salt-limited (pH_max 7.2 ± 0.15), a pH 7.6 value is free-form-limited', () => {
    // A: pH 5.0 with K_sp/S₀² = 19.8300 (pH_max 7.2): α₊ = 0.998418, s = √(19.8300/0.998418)·S₀
    //    = 4.45662·S₀ = 0.0668492 mg/mL.
    // B: pH 7.6 at the free form's own solubility, 2.58489 × 0.015 = 0.0387734 mg/mL.
    // σ(pH_max of A) = √(0.1² (pKa) + 0.05² (A) + 0.1² (S₀)) = 0.15; 7.6 > 7.2 + 0.15.
    const row = screenWith('besylate', [
      sol(0.0668492, 5, { solidForm: 'salt' }),
      sol(0.0387734, 7.6),
    ]);
    const [a, b] = row.benchSolubility!.readings;
    expect(a).toMatchObject({ limitedBy: 'salt', decidedBy: 'user', usedForKsp: true });
    expect(b).toMatchObject({ limitedBy: 'free-form', decidedBy: 'ph-max', usedForKsp: false });
    expect(b!.restPhMax!.value).toBeCloseTo(7.2, 2);
    expect(b!.restPhMax!.sigma).toBeCloseTo(0.15, 3);
    expect(row.kspOrigin).toBe('measured');
    expect(row.phMax!).toBeCloseTo(7.2, 2);
    expect(row.benchSolubility!.impliedS0!.mgPerMl).toBeCloseTo(0.015, 5);
    expect(row.benchSolubility!.conflict).toBeNull();
  });

  it('a value read as salt-limited (not stated) is the rest of the evidence for another value', () => {
    // A as above, without a statement: at pH 5 the free form alone dissolves S₀·(1 + 10^2.8) = 631.96·S₀,
    // and A is 4.45662·S₀ — log₁₀(4.45662/631.96) = −2.15, far below: the free form cannot be the solid.
    // B is then read against A's pH_max (7.2 ± 0.15), not against the estimate.
    const row = screenWith('besylate', [sol(0.0668492, 5), sol(0.0387734, 7.6)]);
    const [a, b] = row.benchSolubility!.readings;
    expect(a!.limitedBy).toBe('salt');
    expect(a!.overFreeFormLog10!.value).toBeCloseTo(-2.1516, 3);
    expect(b).toMatchObject({ limitedBy: 'free-form', decidedBy: 'ph-max' });
    expect(b!.restPhMax!.basis).toBe('measured');
    expect(b!.restPhMax!.value).toBeCloseTo(7.2, 2);
    expect(row.kspOrigin).toBe('measured');
  });

  it('a value the lab says was salt-limited but whose pH_max lies below its pH carries a visible conflict', () => {
    const row = screenWith('besylate', [sol(BESYLATE_PH76_MG, 7.6, { solidForm: 'salt' })]);
    expect(row.kspOrigin).toBe('measured');
    // its own K_sp/S₀² = 19.8300 gives pH_max 7.2 (above) < 7.6
    expect(row.phMax!).toBeCloseTo(7.2, 2);
    expect(row.flags.some((f) => f.id === 'bench-solid-conflict')).toBe(true);
    expect(row.benchSolubility!.conflict).toMatch(/below the pH the value was measured at/);
  });

  it('a salt-limited value at 25 °C in a 37 °C screen without ΔH_sol keeps its value, σ widened and flagged', () => {
    // pH 3, far below pH_max: the salt limits. σ = √(0.05² + (log₁₀3/12 K × 12 K)²) = √(0.05² + 0.47712²) = 0.47973
    const row = screenWith('mesylate', [sol(5, 3, { temperatureK: 298.15 })]);
    expect(row.saltWaterSolubility!.log10DrugM.uncertainty).toBeCloseTo(0.47973, 4);
    expect(row.benchSolubility!.limitedBy).toBe('salt');
    expect(row.saltWaterSolubility!.log10DrugM.value).toBeCloseTo(
      Math.log10(5 / di.freeFormMolarMassGPerMol),
      10,
    );
    expect(row.flags.some((f) => f.id === 'bench-temperature')).toBe(true);
    expect(row.benchSolubility!.widenedBecause.join(' ')).toMatch(/25 °C/);
  });

  it('with a calorimetric ΔH_sol the 25 °C value is carried to 37 °C by van ’t Hoff', () => {
    // ΔH_sol = +20 kJ/mol per formula unit, ν = 2: ln s moves by ΔH/(νR):
    // log₁₀(S₃₇/S₂₅) = −(10 / 0.008314462618)(1/310.15 − 1/298.15)/ln 10 = 0.067784
    const row = screenWith('mesylate', [
      sol(5, 3, { temperatureK: 298.15 }),
      { ...sol(0, null), kind: 'solution-enthalpy', value: 20, unit: 'kJ/mol' },
    ]);
    const expected = Math.log10(5 / di.freeFormMolarMassGPerMol) + 0.067784;
    expect(row.saltWaterSolubility!.log10DrugM.value).toBeCloseTo(expected, 5);
    expect(row.benchSolubility!.temperatureAdjusted).toMatchObject({ method: 'calorimetric' });
    expect(row.flags.some((f) => f.id === 'bench-temperature')).toBe(false);
  });
});

describe('temperatureTransfer (van ’t Hoff)', () => {
  it('a fitted apparent ΔH_sol carries ln S directly', () => {
    // ΔH_app = 15 kJ/mol: log₁₀ shift = −(15/0.008314462618)(1/310.15 − 1/298.15)/ln 10 = 0.101675
    const t = temperatureTransfer({
      fromK: 298.15,
      toK: 310.15,
      vantHoffKJ: { value: 15, uncertainty: 3, method: 'fit', sources: [] },
      calorimetricKJ: null,
      ionsPerFormula: 2,
    });
    expect(t.method).toBe('van-t-hoff-fit');
    expect(t.log10Shift).toBeCloseTo(0.101675, 5);
    expect(t.sigma).toBeCloseTo(0.101675 / 5, 5); // σ_ΔH 3 of 15 kJ/mol
  });

  it('within 2 K nothing is done; a missing temperature is taken as 25 °C and said', () => {
    expect(
      temperatureTransfer({
        fromK: 309,
        toK: 310.15,
        vantHoffKJ: null,
        calorimetricKJ: null,
        ionsPerFormula: 2,
      }).method,
    ).toBeNull();
    const t = temperatureTransfer({
      fromK: null,
      toK: 310.15,
      vantHoffKJ: null,
      calorimetricKJ: null,
      ionsPerFormula: 2,
    });
    expect(t).toMatchObject({ assumedTemperature: true, method: 'widened', fromK: 298.15 });
    expect(t.sigma).toBeCloseTo(0.47712, 4); // log₁₀ 3 for 12 K (common practice: 1.5–3× from 25 to 37 °C)
  });
});
