import { describe, expect, it } from 'vitest';
import {
  candidatesFromLibrary,
  COUNTER_IONS,
  SALT_SOLUBILITY_MODEL,
  parseScreeningSettings,
  drugIon,
  estimateKsp,
  getCounterIon,
  rankCandidates,
  rankRobustness,
  screenCompound,
  solubilityAtPh,
  counterIonProtolyte,
  type ScreeningCandidate,
  type ScreeningCompound,
} from '@/chem';
import { ChemInputError } from '@/chem/result';

// Test inputs: a weak base described only by the properties the models need. The expected values
// below are identities of the models (round trips, common-ion direction, sorting), never these inputs.
const compound: ScreeningCompound & { formula: string } = {
  name: 'test base',
  kind: 'base',
  pKas: [{ value: 8.0, origin: 'measured' }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: 0.02,
  meltingPointC: null,
  logP: null,
  doseMg: 100,
  formula: 'C17H20N2O2',
};
const di = drugIon({ kind: 'base', ionCharge: 1, formula: compound.formula });

function candidate(id: string, extra: Partial<ScreeningCandidate> = {}): ScreeningCandidate {
  const ion = getCounterIon(id)!;
  const st = ion.stoichiometries[0]!;
  return { id, counterIon: ion, stoichiometry: st, hydrateWater: 0, measurements: [], ...extra };
}

function allNumbers(x: unknown, out: number[] = []): number[] {
  if (typeof x === 'number') out.push(x);
  else if (Array.isArray(x)) x.forEach((v) => allNumbers(v, out));
  else if (x && typeof x === 'object') Object.values(x).forEach((v) => allNumbers(v, out));
  return out;
}

describe('screenCompound', () => {
  it('screens the whole bundled library without a NaN or infinity anywhere', () => {
    const cands = candidatesFromLibrary(COUNTER_IONS, {
      kind: 'base',
      ionCharge: 1,
      thermo: { formula: di.formula, charge: 1, rings: { aromatic: 2, nonAromatic: 0 } },
    });
    expect(cands.length).toBeGreaterThan(20);
    const r = screenCompound({ compound, drugIon: di, candidates: cands });
    const nums = allNumbers(r);
    expect(nums.every((n) => Number.isFinite(n))).toBe(true);
    expect(r.rows.filter((row) => row.error === null).length).toBeGreaterThan(20);
    expect(r.cautions[0]).toMatch(/do not establish a salt form/);
  });

  it('a measured salt solubility overrides the estimate and is reproduced at its pH (round trip)', () => {
    const measured = {
      kind: 'solubility' as const,
      value: 5,
      unit: 'mg/mL',
      ph: 3,
      temperatureK: 310.15,
      medium: 'buffer',
      text: '',
    };
    const r = screenCompound({
      compound,
      drugIon: di,
      candidates: [candidate('mesylate', { measurements: [measured] })],
    });
    const row = r.rows[0]!;
    expect(row.kspOrigin).toBe('measured');
    expect(
      row.reasons.some((x) => x.kind === 'measured' && /overrides the estimate/.test(x.text)),
    ).toBe(true);
    // At pH 3 the salt limits; total drug dissolved (free-form mg/mL) = measured salt mg/mL × M(free)/M(salt).
    const ion = getCounterIon('mesylate')!;
    const st = ion.stoichiometries[0]!;
    const p = solubilityAtPh(
      { kind: 'base', pKas: [8], ionCharge: 1 },
      r.freeForm.log10IntrinsicM.value,
      {
        counterIon: counterIonProtolyte(ion, st),
        counterIonCharge: st.ionCharge,
        drugPerSalt: 1,
        counterIonPerSalt: 1,
        log10Ksp: row.log10Ksp!.value,
      },
      3,
    );
    expect(p.solid).toBe('salt');
    expect(p.solubilityM).toBeCloseTo(5 / row.saltMolarMassGPerMol, 10);
  });

  it('flags a salt poorly soluble in itself only when its own (salt-branch) solubility cannot carry the dose', () => {
    // Dose 100 mg in 250 mL needs 0.4 mg/mL (ICH M9 (2019) volume). A measured 0.05 mg/mL salt falls
    // below it where the salt is the solid; a measured 20 mg/mL salt does not.
    const at = (mg: number) => ({
      kind: 'solubility' as const,
      value: mg,
      unit: 'mg/mL',
      ph: 3,
      temperatureK: 310.15,
      medium: 'buffer',
      text: '',
    });
    const r = screenCompound({
      compound,
      drugIon: di,
      candidates: [
        candidate('mesylate', { measurements: [at(0.05)] }),
        candidate('chloride', { measurements: [at(20)] }),
      ],
    });
    const flagged = (id: string) =>
      r.rows.find((row) => row.id === id)!.flags.some((f) => f.id === 'salt-poorly-soluble');
    expect(flagged('mesylate')).toBe(true);
    expect(flagged('chloride')).toBe(false);
    // The flag cites a pH inside the ICH M9 (2019) window, pH 1.2–6.8, where dose numbers are judged,
    // to the grid's 0.1 pH unit (not "pH 3.40").
    const flag = r.rows
      .find((row) => row.id === 'mesylate')!
      .flags.find((f) => f.id === 'salt-poorly-soluble')!;
    expect(flag.text).toMatch(/at pH \d+\.\d where/);
    const cited = Number(/at pH ([\d.]+)/.exec(flag.text)![1]);
    expect(cited).toBeGreaterThanOrEqual(1.2);
    expect(cited).toBeLessThanOrEqual(6.8);
  });

  it('an unmeasured K_sp is labelled an estimate with its spread', () => {
    const r = screenCompound({ compound, drugIon: di, candidates: [candidate('mesylate')] });
    const row = r.rows[0]!;
    expect(row.kspOrigin).toBe('estimated');
    expect(row.log10Ksp!.notes!.join(' ')).toMatch(/ESTIMATE/);
    // The spread is at least the salt-solubility model's leave-one-drug-out error, per ion of the
    // 1:1 formula unit (never the training fit).
    expect(row.log10Ksp!.uncertainty).toBeGreaterThanOrEqual(
      2 * SALT_SOLUBILITY_MODEL.cvRmseLog10! - 1e-9,
    );
    expect(row.saltWaterSolubility!.origin).toBe('model');
    expect(row.flags.some((f) => f.id === 'estimated-ksp')).toBe(true);
  });

  it('gastric chloride lowers the hydrochloride’s solubility at pH 1.2 (common-ion effect; Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603)', () => {
    const r = screenCompound({ compound, drugIon: di, candidates: [candidate('chloride')] });
    const row = r.rows[0]!;
    const noChloride = row.doseNumbers.find((d) => d.pH === 1.2)!;
    expect(row.gastric!.commonIonM).toBeCloseTo(0.12, 12);
    expect(row.gastric!.solubilityMgPerMl).toBeLessThan(noChloride.solubilityMgPerMl);
    const none = screenCompound({
      compound,
      drugIon: di,
      candidates: [candidate('chloride')],
      settings: { gastricChlorideM: 0 },
    });
    expect(none.rows[0]!.gastric!.solubilityMgPerMl).toBeCloseTo(noChloride.solubilityMgPerMl, 9);
  });

  it('in gastric chloride a more soluble salt of a base is limited by the hydrochloride (conversion; Serajuddin 2007)', () => {
    const sol = (v: number) => [
      {
        kind: 'solubility' as const,
        value: v,
        unit: 'mg/mL',
        ph: null,
        temperatureK: 310.15,
        medium: 'water',
        text: '',
      },
    ];
    const r = screenCompound({
      compound,
      drugIon: di,
      candidates: [
        candidate('chloride', { measurements: sol(1) }),
        candidate('mesylate', { measurements: sol(100) }),
      ],
    });
    const [hcl, mes] = r.rows;
    expect(mes!.gastric!.convertsTo).toMatch(/hydrochloride/);
    expect(mes!.gastric!.solubilityMgPerMl).toBeCloseTo(hcl!.gastric!.solubilityMgPerMl, 9);
    expect(hcl!.gastric!.convertsTo).toBeNull();
    expect(
      mes!.reasons.some(
        (x) =>
          x.criterion === 'gastric' && /convert to the less soluble hydrochloride/.test(x.text),
      ),
    ).toBe(true);
  });

  it('measured mass gain at 80 % RH sets the Ph. Eur. class and says it was measured', () => {
    const m = {
      kind: 'mass-gain-80rh' as const,
      value: 3.1,
      unit: '%',
      ph: null,
      temperatureK: 298.15,
      medium: '',
      text: '',
    };
    const row = screenCompound({
      compound,
      drugIon: di,
      candidates: [candidate('mesylate', { measurements: [m] })],
    }).rows[0]!;
    expect(row.criteria.hygroscopicity).toBe('hygroscopic');
    expect(row.reasons.some((x) => x.kind === 'measured' && /Ph\. Eur\. 5\.11/.test(x.text))).toBe(
      true,
    );
  });

  it('three solubilities at three temperatures give a van ’t Hoff ΔH beside the prediction', () => {
    const ms = [298.15, 310.15, 318.15].map((t, i) => ({
      kind: 'solubility' as const,
      value: [2, 3, 4][i]!,
      unit: 'mg/mL',
      ph: null,
      temperatureK: t,
      medium: 'water',
      text: '',
    }));
    const row = screenCompound({
      compound,
      drugIon: di,
      candidates: [candidate('mesylate', { measurements: ms })],
    }).rows[0]!;
    expect(row.measured!.vantHoff).not.toBeNull();
    expect(row.measured!.vantHoff!.solutionEnthalpyKJ.value).toBeGreaterThan(0);
  });

  it('bad compound input is a ChemInputError; a bad candidate becomes a row with an error', () => {
    expect(() =>
      screenCompound({
        compound: {
          ...compound,
          pKas: [
            { value: 9, origin: 'measured' },
            { value: 3, origin: 'measured' },
          ],
        },
        drugIon: di,
        candidates: [],
      }),
    ).toThrow(ChemInputError);
    expect(() =>
      screenCompound({ compound: { ...compound, doseMg: 0 }, drugIon: di, candidates: [] }),
    ).toThrow(ChemInputError);
    expect(() =>
      screenCompound({ compound, drugIon: di, candidates: [], settings: { temperatureK: -5 } }),
    ).toThrow(/settings\.temperatureK/);
    expect(() =>
      screenCompound({
        compound,
        drugIon: di,
        candidates: [],
        settings: { microenvironmentPh: 15 },
      }),
    ).toThrow(ChemInputError);
    expect(() =>
      screenCompound({
        compound: { ...compound, intrinsicSolubilityMgPerMl: null },
        drugIon: di,
        candidates: [],
      }),
    ).toThrow(/melting point/);
    const bad = candidate('mesylate');
    bad.counterIon = { ...bad.counterIon, pKas: [{ value: 3 }, { value: 1 }] };
    const r = screenCompound({ compound, drugIon: di, candidates: [bad, candidate('chloride')] });
    expect(r.rows[0]!.error).toMatch(/out of order/);
    expect(rankCandidates(r.rows, parseScreeningSettings({}).weights).at(-1)!.rank).toBeNull();
  });

  it('uses the General Solubility Equation when S₀ is not measured, and says so', () => {
    const r = screenCompound({
      compound: { ...compound, intrinsicSolubilityMgPerMl: null, meltingPointC: 150, logP: 3 },
      drugIon: di,
      candidates: [],
    });
    expect(r.freeForm.intrinsicOrigin).toBe('general-solubility-equation');
    expect(r.freeForm.log10IntrinsicM.value).toBeCloseTo(0.5 - 1.25 - 3, 12); // Jain & Yalkowsky 2001 eq. 1
  });
});

describe('rankCandidates (cheap weighting step)', () => {
  const r = screenCompound({
    compound,
    drugIon: di,
    candidates: ['chloride', 'mesylate', 'tosylate', 'sulfate', 'maleate', 'napsylate'].map((id) =>
      candidate(id),
    ),
  });
  it('with only the mass-cost weight, the order is the order of active fraction', () => {
    const w = {
      saltFormation: 0,
      solubility: 0,
      gastric: 0,
      disproportionation: 0,
      massCost: 1,
      acceptability: 0,
      hygroscopicity: 0,
    };
    const ranked = rankCandidates(r.rows, w);
    const fractions = ranked.map((x) => r.rows.find((row) => row.id === x.id)!.activeFraction);
    expect([...fractions].sort((a, b) => b - a)).toStrictEqual(fractions);
  });
  it('contributions add up to the score', () => {
    for (const x of rankCandidates(r.rows, parseScreeningSettings({}).weights)) {
      const sum = Object.values(x.contributions).reduce((a, b) => a + b, 0);
      expect(sum).toBeCloseTo(x.score!, 12);
    }
  });
});

describe('rankRobustness (Monte Carlo)', () => {
  const r = screenCompound({
    compound,
    drugIon: di,
    candidates: ['chloride', 'mesylate', 'tosylate', 'sulfate', 'maleate', 'napsylate'].map((id) =>
      candidate(id),
    ),
  });
  const w = parseScreeningSettings({}).weights;
  const rows = r.rows.map((x) => x.robustness);
  it('is reproducible with a fixed seed', () => {
    const a = rankRobustness(rows, w, r.robustnessShared, { iterations: 300, seed: 11 });
    const b = rankRobustness(rows, w, r.robustnessShared, { iterations: 300, seed: 11 });
    expect(a).toStrictEqual(b);
  });
  it('top-three probabilities add up to three', () => {
    const a = rankRobustness(rows, w, r.robustnessShared, { iterations: 300, seed: 3 });
    expect(a.reduce((s, x) => s + x.pTop3, 0)).toBeCloseTo(3, 9);
  });
  it('without uncertainty the deterministic top three stay there every time', () => {
    const fixed = rows.map((x) => ({ ...x, saltLog10Sigma: 0, saltSharedLog10Sigma: 0 }));
    const a = rankRobustness(
      fixed,
      w,
      { ...r.robustnessShared, drugPkaSigma: 0, log10IntrinsicSigma: 0 },
      { iterations: 50, seed: 1 },
    );
    const top = rankCandidates(r.rows, w)
      .slice(0, 3)
      .map((x) => x.id);
    for (const x of a) expect(x.pTop3).toBe(top.includes(x.id) ? 1 : 0);
  });
});

describe('estimateKsp', () => {
  it('anchor only: salt-limited solubility 10² × S₀ and K_sp = s² for 1:1', () => {
    const k = estimateKsp({
      log10IntrinsicM: { value: -5, uncertainty: 0.1, method: 'measured', sources: [] },
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      temperatureK: 310.15,
    });
    expect(k.log10SaltLimitedDrugM.value).toBeCloseTo(-3, 12);
    expect(k.log10Ksp.value).toBeCloseTo(-6, 12);
  });
  it('normal–normal update: a thermochemical shift as uncertain as the anchor moves the estimate half-way', () => {
    const perDecade = 8.314462618e-3 * 310.15 * Math.LN10;
    const k = estimateKsp({
      log10IntrinsicM: { value: -5, uncertainty: 0, method: 'measured', sources: [] },
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      temperatureK: 310.15,
      solutionEnthalpyKJ: {
        value: -2 * perDecade * 2,
        uncertainty: 2 * perDecade,
        method: 'test',
        sources: [],
      },
      referenceSolutionEnthalpyPerDrugKJ: 0,
    });
    expect(k.rawThermoShiftDecades).toBeCloseTo(2, 9);
    expect(k.thermoShiftDecades).toBeCloseTo(1, 9);
    expect(k.log10SaltLimitedDrugM.uncertainty).toBeCloseTo(Math.SQRT1_2, 9);
  });
});
