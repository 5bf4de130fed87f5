import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  ChemInputError,
  estimateSaltThermo,
  findThermoIon,
  getThermoIon,
  listThermoIonIds,
  organicIonFromFormula,
  organicIonFromSmiles,
  type Estimate,
  type ThermoIon,
} from '@/chem';

const e = (value: number): Estimate => ({
  value,
  uncertainty: 0,
  method: 'test-input',
  sources: [],
});
const ion = (
  charge: number,
  radiusA: number,
  volumeNm3: number,
  shape: ThermoIon['shape'] = 'monatomic',
): ThermoIon => ({
  label: `test ion ${charge}`,
  charge,
  shape,
  radiusA: e(radiusA),
  crystalRadiusA: e(radiusA),
  volumeNm3: e(volumeNm3),
  sources: [],
});
const finiteEstimate = (x: Estimate) =>
  Number.isFinite(x.value) && Number.isFinite(x.uncertainty) && x.uncertainty >= 0;

/** Run f; it must either return or throw a ChemInputError. */
function typedOrOk<T>(f: () => T): T | ChemInputError {
  try {
    return f();
  } catch (err) {
    expect(err).toBeInstanceOf(ChemInputError);
    return err as ChemInputError;
  }
}

describe('physics (fast-check)', () => {
  const radius = fc.double({ min: 0.4, max: 5, noNaN: true });
  const grow = fc.double({ min: 0.01, max: 2, noNaN: true });

  it('Kapustinskii lattice enthalpy falls as either ion grows', () => {
    fc.assert(
      fc.property(radius, radius, grow, fc.boolean(), (rc, ra, dr, which) => {
        const base = estimateSaltThermo({
          cation: ion(1, rc, 0.01),
          anion: ion(-1, ra, 0.03),
          cationsPerFormula: 1,
          anionsPerFormula: 1,
          method: 'kapustinskii',
        });
        const bigger = estimateSaltThermo({
          cation: ion(1, which ? rc + dr : rc, 0.01),
          anion: ion(-1, which ? ra : ra + dr, 0.03),
          cationsPerFormula: 1,
          anionsPerFormula: 1,
          method: 'kapustinskii',
        });
        expect(bigger.latticeEnthalpyKJ.value).toBeLessThan(base.latticeEnthalpyKJ.value);
      }),
    );
  });

  it('VBT lattice enthalpy falls as the formula-unit volume grows', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.02, max: 3, noNaN: true }),
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        fc.constantFrom([1, -1, 1, 1], [2, -1, 1, 2], [1, -2, 2, 1], [2, -2, 1, 1]),
        (v, f, [zc, za, p, q]) => {
          const a = estimateSaltThermo({
            cation: ion(zc!, 1, 0.01),
            anion: ion(za!, 2, 0.03),
            cationsPerFormula: p!,
            anionsPerFormula: q!,
            method: 'vbt',
            formulaUnitVolumeNm3: v,
          });
          const b = estimateSaltThermo({
            cation: ion(zc!, 1, 0.01),
            anion: ion(za!, 2, 0.03),
            cationsPerFormula: p!,
            anionsPerFormula: q!,
            method: 'vbt',
            formulaUnitVolumeNm3: Math.min(10, v * f),
          });
          expect(b.latticeEnthalpyKJ.value).toBeLessThan(a.latticeEnthalpyKJ.value);
        },
      ),
    );
  });

  it('lattice enthalpy rises with charge at fixed size (Kapustinskii, VBT and Born–Mayer)', () => {
    fc.assert(
      fc.property(radius, radius, fc.double({ min: 0.03, max: 1, noNaN: true }), (rc, ra, v) => {
        for (const method of ['kapustinskii', 'vbt', 'born-mayer'] as const) {
          const extra =
            method === 'born-mayer'
              ? { structureType: 'rock-salt', formulaUnitVolumeNm3: v }
              : method === 'vbt'
                ? { formulaUnitVolumeNm3: v }
                : {};
          const one = estimateSaltThermo({
            cation: ion(1, rc, 0.01),
            anion: ion(-1, ra, 0.03),
            cationsPerFormula: 1,
            anionsPerFormula: 1,
            method,
            ...extra,
          });
          const two = estimateSaltThermo({
            cation: ion(2, rc, 0.01),
            anion: ion(-2, ra, 0.03),
            cationsPerFormula: 1,
            anionsPerFormula: 1,
            method,
            ...extra,
          });
          expect(two.latticeEnthalpyKJ.value).toBeGreaterThan(one.latticeEnthalpyKJ.value);
        }
      }),
    );
  });

  it('ΔH_sol always equals ΔH_L + Σν·ΔH_hyd for every pair of bundled ions (the cycle closes)', () => {
    const cations = listThermoIonIds()
      .map((id) => getThermoIon(id)!)
      .filter((i) => i.charge > 0);
    const anions = listThermoIonIds()
      .map((id) => getThermoIon(id)!)
      .filter((i) => i.charge < 0);
    for (const c of cations) {
      for (const a of anions) {
        const g = (x: number, y: number): number => (y === 0 ? x : g(y, x % y));
        const k = g(c.charge, -a.charge);
        const p = -a.charge / k;
        const q = c.charge / k;
        const r = estimateSaltThermo({
          cation: c,
          anion: a,
          cationsPerFormula: p,
          anionsPerFormula: q,
        });
        const sum =
          r.latticeEnthalpyKJ.value + p * r.cationHydrationKJ.value + q * r.anionHydrationKJ.value;
        expect(Math.abs(r.solutionEnthalpyKJ.value - sum)).toBeLessThan(
          1e-9 * r.latticeEnthalpyKJ.value,
        );
        for (const x of [
          r.latticeEnthalpyKJ,
          r.cationHydrationKJ,
          r.anionHydrationKJ,
          r.solutionEnthalpyKJ,
        ])
          expect(finiteEstimate(x)).toBe(true);
      }
    }
  });
});

describe('bad input gives a typed ChemInputError, never NaN/Infinity (fast-check)', () => {
  const anyNumber = fc.oneof(
    fc.double(),
    fc.integer({ min: -10, max: 10 }),
    fc.constant(0),
    fc.constant(Number.NaN),
    fc.constant(Infinity),
    fc.constant(-1e30),
  );
  it('random charges, radii, volumes, densities, counts and methods', () => {
    fc.assert(
      fc.property(
        anyNumber,
        anyNumber,
        anyNumber,
        anyNumber,
        anyNumber,
        anyNumber,
        fc.integer({ min: -2, max: 8 }),
        fc.integer({ min: -2, max: 8 }),
        fc.option(anyNumber),
        fc.option(anyNumber),
        fc.constantFrom('auto', 'kapustinskii', 'vbt', 'born-mayer', 'born-lande', 'nonsense'),
        fc.option(fc.constantFrom('rock-salt', 'fluorite', 'wurtzite', 'garbage')),
        (zc, za, rc, ra, vc, va, p, q, v, rho, method, st) => {
          const out = typedOrOk(() =>
            estimateSaltThermo({
              cation: ion(zc, rc, vc),
              anion: ion(za, ra, va),
              cationsPerFormula: p,
              anionsPerFormula: q,
              method: method as 'auto',
              ...(st ? { structureType: st } : {}),
              ...(v !== null ? { formulaUnitVolumeNm3: v } : {}),
              ...(rho !== null ? { densityGPerCm3: rho, molarMassGPerMol: 100 } : {}),
            }),
          );
          if (!(out instanceof ChemInputError)) {
            for (const x of [
              out.latticeEnthalpyKJ,
              out.cationHydrationKJ,
              out.anionHydrationKJ,
              out.solutionEnthalpyKJ,
            ])
              expect(finiteEstimate(x)).toBe(true);
            expect(out.latticeEnthalpyKJ.value).toBeGreaterThan(0);
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  it('random formulas and ring counts', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string({ maxLength: 20 }),
          fc.stringMatching(/^[A-Z][a-z]?\d{0,3}([A-Z][a-z]?\d{0,3}){0,4}$/),
        ),
        fc.integer({ min: -5, max: 5 }),
        fc.integer({ min: -1, max: 60 }),
        fc.integer({ min: -1, max: 60 }),
        (f, z, ra, rn) => {
          const out = typedOrOk(() =>
            organicIonFromFormula(f, z, { aromatic: ra, nonAromatic: rn }),
          );
          if (!(out instanceof ChemInputError)) {
            expect(Number.isFinite(out.radiusA!.value) && out.radiusA!.value > 0).toBe(true);
            expect(Number.isFinite(out.volumeNm3!.value)).toBe(true);
          }
        },
      ),
      { numRuns: 400 },
    );
  });

  it('unknown ion names are undefined, not an exception', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 12 }), (s) => {
        const hit = findThermoIon(s);
        if (hit) expect(Number.isInteger(hit.charge)).toBe(true);
      }),
    );
  });

  it('random SMILES strings', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          fc.string({ maxLength: 15 }),
          fc.constantFrom('C1CC', 'C(C', 'CC)', '[Xx]', 'c1cccc1', 'C==C', ''),
        ),
        fc.integer({ min: -3, max: 3 }),
        async (s, z) => {
          try {
            const out = await organicIonFromSmiles(s, z);
            expect(Number.isFinite(out.volumeNm3!.value)).toBe(true);
          } catch (err) {
            expect(err).toBeInstanceOf(ChemInputError);
          }
        },
      ),
      { numRuns: 150 },
    );
  });
});
