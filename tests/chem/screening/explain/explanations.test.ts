import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  drugIon,
  SALT_SOLUBILITY_FUSION_CHECK,
  getCounterIon,
  PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ,
  SALT_SOLUBILITY_MODEL,
  screenCompound,
  separationSummary,
  solubilityFactor25To37C,
  solutionEnthalpyShown,
  type ScreeningCandidate,
  type ScreenRow,
} from '@/chem';

// One source for every explanation: each text the screen writes about a salt's solubility is built
// from the basis the row carries. This screens one candidate of each origin and fails when a text
// names a model, an anchor, a ΔH_sol shift or a fusion step that the row (or, for the assumptions,
// the screen) did not use. Inputs describe a test base by the properties the models need.
const compound = {
  name: 'test base',
  kind: 'base' as const,
  pKas: [{ value: 8.0, origin: 'measured' as const }],
  ionCharge: 1,
  intrinsicSolubilityMgPerMl: 0.02,
  meltingPointC: null,
  logP: 2,
  doseMg: 100,
};
const di = drugIon({ kind: 'base', ionCharge: 1, formula: 'C17H20N2O2' });
const m = (kind: 'solubility' | 'melting-point', value: number, ph: number | null = null) => ({
  kind,
  value,
  unit: kind === 'solubility' ? 'mg/mL' : '°C',
  ph,
  temperatureK: 310.15,
  medium: 'water',
  text: '',
});
function cand(id: string, extra: Partial<ScreeningCandidate> = {}): ScreeningCandidate {
  const ion = getCounterIon(id)!;
  return {
    id,
    counterIon: ion,
    stoichiometry: ion.stoichiometries[0]!,
    measurements: [],
    ...extra,
  };
}
const mesylate = getCounterIon('mesylate')!;
const candidates: ScreeningCandidate[] = [
  cand('chloride'),
  cand('tosylate', { measurements: [m('melting-point', 230)] }),
  cand('maleate', { measurements: [m('solubility', 3, 3)] }),
  // An in-house ion without descriptors: the anchor path.
  {
    ...cand('mesylate'),
    id: 'in-house',
    counterIon: { ...mesylate, id: 'in-house-sulfonate', name: 'In-house sulfonate' },
    counterIonDescriptors: null,
  },
];
const res = screenCompound({ compound, drugIon: di, candidates });
const byOrigin = (o: string) => res.rows.find((r) => r.saltWaterSolubility?.origin === o)!;
// The tosylate's melting point is applied only when the fit script's check says it helps; otherwise
// the row is a model row whose melting data are shown beside the estimate, not applied.
const FUSION_APPLIES = SALT_SOLUBILITY_FUSION_CHECK.fusionCorrectionApplies;
const ORIGINS = FUSION_APPLIES
  ? ['model', 'model+fusion', 'measured', 'anchor']
  : ['model', 'measured', 'anchor'];
const tosylateRow = res.rows.find((r) => r.counterIonId === 'tosylate')!;

/** What a text must not say unless the basis used it. */
const MENTIONS = {
  anchor: /anchor|10² × S₀|× S₀/i,
  fittedModel: /ridge|published salts/i,
  solutionEnthalpyShift:
    /relative ΔH_sol|thermochemical shift|shifted by .*ΔH_sol|moved by .*ΔH_sol|with a relative ΔH_sol term/i,
  fusion: /Schröder|melting data|fusion data/i,
};
/** What a row whose melting data were only shown must not say: that they moved the estimate. */
const FUSION_APPLIED_WORDS = /shifted by the ideal solubility|\+ your melting data|, applied \(/i;
function used(row: ScreenRow): Record<keyof typeof MENTIONS, boolean> {
  const b = row.saltWaterSolubility!.basis;
  return {
    anchor: b.origin === 'anchor',
    fittedModel: b.model !== null,
    solutionEnthalpyShift: !!(b.model?.usesSolutionEnthalpy || b.anchor?.solutionEnthalpyShift),
    fusion: b.fusion === 'applied' || b.fusion === 'shown',
  };
}
const textsOf = (row: ScreenRow) => [
  ...row.reasons.filter((r) => r.criterion === 'solubility').map((r) => r.text),
  ...row.flags.flatMap((f) => [f.text, f.rule]),
];

describe('explanations follow the model the screen used', () => {
  it('the screen produced one row of each origin it can produce (model+fusion only where the check applies it)', () => {
    for (const o of ORIGINS) expect(byOrigin(o)).toBeDefined();
    expect(tosylateRow.saltWaterSolubility!.origin).toBe(FUSION_APPLIES ? 'model+fusion' : 'model');
  });

  it('melting data not applied are shown as such: named, and never said to have moved the estimate', () => {
    if (FUSION_APPLIES) return;
    const sw = tosylateRow.saltWaterSolubility!;
    expect(sw.basis.fusion).toBe('shown');
    const texts = textsOf(tosylateRow);
    expect(texts.join('\n')).toMatch(/NOT applied/);
    for (const t of texts) expect(t).not.toMatch(FUSION_APPLIED_WORDS);
  });

  for (const origin of ORIGINS) {
    it(`a ${origin} row's reasons and flag rules mention only what its basis used`, () => {
      const row = byOrigin(origin);
      const u = used(row);
      for (const t of textsOf(row)) {
        for (const [k, re] of Object.entries(MENTIONS)) {
          if (!u[k as keyof typeof MENTIONS] && k !== 'anchor')
            expect(t, `${k} in "${t}"`).not.toMatch(re);
          // "anchor" words: also forbidden in every non-anchor row (the old text said "anchored 10²×").
          if (k === 'anchor' && !u.anchor) expect(t, `anchor in "${t}"`).not.toMatch(re);
        }
      }
    });
  }

  it('the estimated-K_sp rule of a model row names the fitted model and its data, not an anchor', () => {
    const rule = byOrigin('model').flags.find((f) => f.id === 'estimated-ksp')!.rule;
    expect(rule).toMatch(/ridge regression/);
    expect(rule).toContain(`${SALT_SOLUBILITY_MODEL.nSalts} published salts`);
    expect(rule).not.toMatch(/anchor/);
  });

  it('the assumptions name each basis some row used, and no other', () => {
    const all = res.assumptions.join('\n');
    const rows = res.rows.filter((r) => r.saltWaterSolubility);
    for (const [k, re] of Object.entries(MENTIONS)) {
      // An assumption is a method the screen applied: melting data only shown do not count.
      const anyUsed = rows.some((r) =>
        k === 'fusion'
          ? r.saltWaterSolubility!.basis.fusion === 'applied'
          : used(r)[k as keyof typeof MENTIONS],
      );
      if (anyUsed) expect(all, k).toMatch(re);
      else expect(all, k).not.toMatch(re);
    }
  });

  it('without an anchor row, no assumption mentions the anchor (screen of library ions only)', () => {
    const r = screenCompound({
      compound,
      drugIon: di,
      candidates: [cand('chloride'), cand('mesylate')],
    });
    expect(r.assumptions.join('\n')).not.toMatch(MENTIONS.anchor);
  });

  it("README's salt-solubility paragraph says ΔH_sol is not used exactly when the shipped model has no ΔH_sol term", () => {
    const readme = readFileSync('README.md', 'utf8');
    const start = readme.indexOf("### How a salt's own solubility is estimated");
    const section = readme.slice(start, readme.indexOf('\n## ', start));
    expect(start).toBeGreaterThan(0);
    const usesDh = SALT_SOLUBILITY_MODEL.featureNames.includes('thermoShiftDecades' as never);
    expect(/ΔH_sol[^.]*not used/.test(section)).toBe(!usesDh);
    expect(section).toMatch(/ridge regression/);
    expect(section).not.toMatch(/anchored 10²|relative thermochemical shift/);
  });
});

describe('ΔH_sol per drug ion and "not informative"', () => {
  it('a hemisulfate’s −321 ± 108 kJ/mol per formula unit is −160.5 ± 54 per drug ion, outside ±70 → not informative', () => {
    const s = solutionEnthalpyShown(
      { value: -321, uncertainty: 108, method: 'x', sources: [] },
      2,
      null,
    )!;
    expect(s.valueKJPerMolDrugIon).toBe(-160.5);
    expect(s.sigmaKJPerMolDrugIon).toBe(54);
    expect(s.notInformative).toMatch(/less soluble at 37 °C/);
  });

  it('−124 kJ/mol per drug ion: van ’t Hoff factor exp(−124/R·(1/298.15 − 1/310.15)) = 0.1444, 6.9× less soluble', () => {
    // By hand: 1/298.15 − 1/310.15 = 1.29772e-4 K⁻¹; 124/0.0083144626 = 14913.7 K; product 1.93539.
    expect(solubilityFactor25To37C(-124)).toBeCloseTo(0.14438, 4);
    const s = solutionEnthalpyShown(
      { value: -124, uncertainty: 45, method: 'x', sources: [] },
      1,
      null,
    )!;
    expect(s.notInformative).toMatch(/7× less soluble/);
  });

  it('the plausibility bound is R·ln 3 / (1/298.15 − 1/310.15) = 70.38 kJ/mol (a threefold change, by hand)', () => {
    // 0.0083144626 × 1.0986123 / 1.29772e-4 = 70.39
    expect(PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ).toBeCloseTo(70.39, 1);
  });

  it('a 1σ larger than the value is not informative; −30 ± 10 is shown; a measured −90 is shown', () => {
    expect(
      solutionEnthalpyShown({ value: -20, uncertainty: 30, method: 'x', sources: [] }, 1, null)!
        .notInformative,
    ).toMatch(/exceeds/);
    expect(
      solutionEnthalpyShown({ value: -30, uncertainty: 10, method: 'x', sources: [] }, 1, null)!
        .notInformative,
    ).toBeNull();
    expect(
      solutionEnthalpyShown(
        { value: -90, uncertainty: 2, method: 'x', sources: [] },
        1,
        'measured (calorimetry)',
      )!.notInformative,
    ).toBeNull();
  });

  it('every screen row carries ΔH_sol per drug ion = per formula unit ÷ drug ions', () => {
    const hcl = res.rows.find((r) => r.counterIonId === 'chloride')!;
    const perFu = { value: -40, uncertainty: 20, method: 'x', sources: [] };
    const r = screenCompound({
      compound,
      drugIon: di,
      candidates: [cand('sulfate', { solutionEnthalpyKJ: perFu }), cand('chloride')],
    });
    const sulfate = r.rows[0]!;
    expect(sulfate.solutionEnthalpyPerDrugIon!.valueKJPerMolDrugIon).toBe(
      -40 / sulfate.drugPerSalt,
    );
    expect(hcl.solutionEnthalpyPerDrugIon).toBeNull(); // no thermochemistry was passed for it
  });
});

describe('the separation line says what the screen shares across salts', () => {
  it('names the gastric conversion when every salt converts to the hydrochloride, and the assumed micro-pH', () => {
    const r = screenCompound({
      compound,
      drugIon: di,
      candidates: ['chloride', 'mesylate', 'tosylate', 'besylate'].map((id) => cand(id)),
      settings: { microenvironmentPh: 7 },
    });
    const s = separationSummary(r, r.settings.weights)!;
    expect(s.headline).toMatch(/^The order rests on|^No criterion separates/);
    const allConvert = r.rows
      .filter((x) => x.counterIonId !== 'chloride')
      .every((x) => x.gastric?.convertsTo);
    const gastric = s.criteria.find((c) => c.key === 'gastric')!;
    expect(allConvert && gastric.verdict === 'same-for-all').toBe(true);
    expect(s.details.join(' ')).toMatch(/every salt converts to the hydrochloride/);
    const high = r.rows.filter((x) => x.disproportionation?.risk === 'high').length;
    // At the assumed pH 7 every salt of this pKa-8 base sits above its pH_max (the case of issue 16).
    expect(high * 2).toBeGreaterThanOrEqual(r.rows.length);
    expect(s.details.join(' ')).toMatch(
      new RegExp(
        `stands on ${high} of ${r.rows.length} salts at the microenvironment pH 7 assumed`,
      ),
    );
  });
});
