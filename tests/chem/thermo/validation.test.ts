import { describe, expect, it } from 'vitest';
import {
  fitBornOffsets,
  kapustinskiiVariants,
  KAPUSTINSKII_RADIUS_SET,
  validationReport,
} from '@/chem';
import type { ModelValidation } from '@/chem';

/**
 * The bounds issue 3 sets, asserted on the measured figures. Reference values (every row names its source,
 * see fixtures/reference/*.csv):
 * - lattice enthalpies of 36 alkali and alkaline-earth halides from the Born–Haber cycle with ΔfH° of
 *   Wagman et al. 1982 (NBS tables) and CRC/NIST ionisation energies and electron affinities;
 * - 23 salts of polyatomic ions from the solution cycle (NBS ΔfH° and Marcus 1987 hydration enthalpies);
 * - 24 single-ion hydration enthalpies of Marcus 1987 / 1994.
 */
const report = validationReport();
const get = (model: string, group: string): ModelValidation => {
  const m = report.find((r) => r.model === model && r.group === group);
  if (!m) throw new Error(`missing ${model}/${group}`);
  return m;
};

describe('validation report: sizes of the reference sets', () => {
  it('has at least 25 salts with experimental lattice enthalpies, 20 ions with hydration enthalpies, 15 solution enthalpies', () => {
    expect(get('kapustinskii', 'all').n).toBeGreaterThanOrEqual(25);
    expect(get('born-fitted', 'all-published').n).toBeGreaterThanOrEqual(20);
    expect(get('solution-hess', 'solution').n).toBeGreaterThanOrEqual(15);
  });

  it('every row carries a source and a finite error', () => {
    for (const m of report) {
      for (const r of m.rows) {
        expect(r.source.length).toBeGreaterThan(10);
        expect(Number.isFinite(r.errorPercent)).toBe(true);
      }
    }
  });
});

describe('lattice models against the Born–Haber halides and the polyatomic salts (bounds of issue 3)', () => {
  it.each(['kapustinskii', 'vbt'])(
    '%s: mean |error| ≤ 5 % on alkali + alkaline-earth halides',
    (model) => {
      // Reference: Born–Haber lattice enthalpies from Wagman et al. 1982 (NBS) + CRC ionisation energies/electron affinities.
      expect(get(model, 'halides').meanAbsPercentError).toBeLessThanOrEqual(5);
    },
  );
  it.each(['kapustinskii', 'vbt'])(
    '%s: mean |error| ≤ 8 % on salts of polyatomic ions',
    (model) => {
      // Reference: solution cycle, NBS ΔfH° (Wagman et al. 1982) and Marcus 1987 hydration enthalpies.
      expect(get(model, 'polyatomic').meanAbsPercentError).toBeLessThanOrEqual(8);
    },
  );
  it('Born–Mayer and Born–Landé with measured cells are within 6 % on the halides with a cubic cell', () => {
    // Reference: as above; cells from Wyckoff, Crystal Structures (1963).
    expect(get('born-mayer', 'halides').meanAbsPercentError).toBeLessThanOrEqual(6);
    expect(get('born-lande', 'halides').meanAbsPercentError).toBeLessThanOrEqual(6);
  });
  it('the radius set and constant chosen for Kapustinskii are the better pair on the halides', () => {
    const v = kapustinskiiVariants();
    const halides = v.filter((m) => m.group === 'halides');
    expect(halides.length).toBe(4);
    const chosen = halides.find((m) => m.model === `kapustinskii-${KAPUSTINSKII_RADIUS_SET}`)!;
    for (const other of halides)
      expect(chosen.meanAbsPercentError).toBeLessThanOrEqual(other.meanAbsPercentError + 1e-9);
    // the two radius sets really differ (otherwise the comparison would prove nothing)
    expect(get('kapustinskii-goldschmidt', 'halides').meanAbsPercentError).not.toBeCloseTo(
      get('kapustinskii-shannon', 'halides').meanAbsPercentError,
      2,
    );
    // the engine runs the chosen pairing
    expect(get('kapustinskii', 'halides').meanAbsPercentError).toBeCloseTo(
      chosen.meanAbsPercentError,
      10,
    );
    // K = 1214 (CRC form) beats 1202.5 with either radius set.
    expect(get('kapustinskii-goldschmidt', 'halides').meanAbsPercentError).toBeLessThan(
      get('kapustinskii-goldschmidt-1202', 'halides').meanAbsPercentError,
    );
    expect(get('kapustinskii-shannon', 'halides').meanAbsPercentError).toBeLessThan(
      get('kapustinskii-shannon-1202', 'halides').meanAbsPercentError,
    );
  });
});

describe('fitted Born hydration against Marcus 1987', () => {
  it('mean |error| ≤ 10 % on the ions with published values', () => {
    // Reference: Y. Marcus, J. Chem. Soc. Faraday Trans. 87 (1991) 2995.
    expect(get('born-fitted', 'all-published').meanAbsPercentError).toBeLessThanOrEqual(10);
  });
  it('fits offsets of the size Latimer, Pitzer & Slansky found (cations ≈ +0.85 Å, anions ≈ +0.1 Å on Pauling radii)', () => {
    // Latimer, Pitzer & Slansky 1939, J. Chem. Phys. 7, 108: our radii (Shannon) differ from Pauling's, so only the pattern is checked.
    const f = fitBornOffsets();
    expect(f.cationOffsetA).toBeGreaterThan(0.4);
    expect(f.cationOffsetA).toBeLessThan(1.1);
    expect(Math.abs(f.anionOffsetA)).toBeLessThan(0.35);
    expect(f.cationOffsetA).toBeGreaterThan(f.anionOffsetA + 0.3);
  });
  it('organic ions sized from their formula are worse, and the report says so', () => {
    // Reference: Marcus 1994 (tetraalkylammonium), Marcus 1987 (acetate) — not used in the fit.
    const org = get('born-fitted', 'organic-check');
    expect(org.n).toBe(3);
    expect(org.meanAbsPercentError).toBeGreaterThan(
      get('born-fitted', 'all-published').meanAbsPercentError,
    );
  });
});

describe('ΔH_sol by Hess’s law against the NBS tables', () => {
  it('the stated ±2σ band covers at least 90 % of the reference salts', () => {
    // Reference: ΔH_sol from ΔfH° of solid and aqueous ions, Wagman et al. 1982.
    const s = get('solution-hess', 'solution') as ModelValidation & {
      coverage2Sigma: number;
      meanAbsErrorKJ: number;
    };
    expect(s.coverage2Sigma).toBeGreaterThanOrEqual(0.9);
    // A small difference of large numbers: tens of kJ/mol on average — shown, not hidden.
    expect(s.meanAbsErrorKJ).toBeGreaterThan(5);
  });
});

describe('ΔH_sol by Hess’s law: raw vs calibrated lattice, leave-one-salt-out (issue 10)', () => {
  // Reference ΔH_sol: Σν·ΔfH°(ion, aq) − ΔfH°(salt, s) from the NBS tables (Wagman et al. 1982, J. Phys.
  // Chem. Ref. Data 11 Suppl. 2), checked against the CRC Handbook tables (fixtures/reference/
  // solution-enthalpies.csv). Calibrated figures: each salt predicted by a calibration refitted without it.
  type S = ModelValidation & {
    signedBiasKJ: number;
    meanAbsErrorKJ: number;
    rmsErrorKJ: number;
    shareWithin20KJ: number;
    coverage2Sigma: number;
    calibrated: boolean;
    crossValidated: boolean;
  };
  const raw = get('solution-hess', 'solution') as S;
  const cal = get('solution-hess-calibrated', 'solution') as S;
  const calSingly = get('solution-hess-calibrated', 'solution-singly-charged') as S;
  const rawSingly = get('solution-hess', 'solution-singly-charged') as S;

  it('both sections cover the same 60 salts and say what they are', () => {
    expect(raw.n).toBe(60);
    expect(cal.n).toBe(60);
    expect(raw.calibrated).toBe(false);
    expect(cal.calibrated && cal.crossValidated).toBe(true);
    expect(cal.rows.map((r) => r.id)).toEqual(raw.rows.map((r) => r.id));
    expect(cal.rows.every((r) => r.source.includes('NBS'))).toBe(true);
  });

  it('the raw engine carries the measured bias (about −42 kJ/mol) and few salts within ±20 kJ/mol', () => {
    expect(raw.signedBiasKJ).toBeLessThan(-35);
    expect(raw.shareWithin20KJ).toBeLessThan(0.35);
  });

  it('calibrated, cross-validated: smaller bias, MAE and RMSE, and a larger share within ±20 kJ/mol', () => {
    // measured: bias −18.0, MAE 32.6, RMSE 67.1 kJ/mol, 70.0 % within ±20 (raw: −41.7, 49.2, 74.8, 26.7 %)
    expect(Math.abs(cal.signedBiasKJ)).toBeLessThan(Math.abs(raw.signedBiasKJ));
    expect(Math.abs(cal.signedBiasKJ)).toBeLessThan(21);
    expect(cal.meanAbsErrorKJ).toBeLessThan(35);
    expect(cal.rmsErrorKJ).toBeLessThan(70);
    expect(cal.rmsErrorKJ).toBeLessThan(raw.rmsErrorKJ);
    expect(cal.shareWithin20KJ).toBeGreaterThanOrEqual(0.67);
    expect(cal.shareWithin20KJ).toBeGreaterThan(raw.shareWithin20KJ + 0.4);
  });

  it('salts of singly charged ions reach the 80 % goal; the stated ±2σ band still covers ≥ 88 % of all salts', () => {
    // measured: 88.6 % within ±20 kJ/mol (raw 14.3 %); ±2σ coverage 91.7 % (raw 96.7 %)
    expect(calSingly.shareWithin20KJ).toBeGreaterThanOrEqual(0.85);
    expect(calSingly.shareWithin20KJ).toBeGreaterThan(rawSingly.shareWithin20KJ);
    expect(cal.coverage2Sigma).toBeGreaterThanOrEqual(0.88);
  });
});
