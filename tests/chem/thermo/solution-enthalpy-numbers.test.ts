import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  candidateSolutionEnthalpyKJ,
  COUNTER_IONS,
  drugThermoIon,
  estimateSaltThermo,
  getThermoIon,
  listThermoIonIds,
  organicIonFromFormula,
  solutionEnthalpyNumbersKJ,
  type Estimate,
  type SaltThermoRequest,
  type ThermoIon,
} from '@/chem';

/**
 * The numbers-first ΔH_sol (solution-enthalpy-numbers.ts) must give exactly what the full engine
 * gives: the reference here is estimateSaltThermo itself (method 'auto', shipped calibration), its
 * solutionEnthalpyKJ's value and 1σ compared with Object.is (same doubles, not "close"), its method
 * and sources compared as they are, and a request the engine refuses refused with the same message.
 * No outside figure is needed: the claim is identity with the engine, whose figures the other thermo
 * tests check against handbook values.
 */
type Outcome =
  { ok: Pick<Estimate, 'value' | 'uncertainty' | 'method' | 'sources'> } | { error: string };

function outcome(f: () => Estimate): Outcome {
  try {
    const e = f();
    return {
      ok: { value: e.value, uncertainty: e.uncertainty, method: e.method, sources: e.sources },
    };
  } catch (err) {
    return {
      error: err instanceof Error ? `${err.constructor.name}: ${err.message}` : String(err),
    };
  }
}

function expectSame(req: SaltThermoRequest): Outcome {
  const ref = outcome(() => estimateSaltThermo({ ...req, method: 'auto' }).solutionEnthalpyKJ);
  const fast = outcome(() => solutionEnthalpyNumbersKJ(req));
  if ('ok' in ref && 'ok' in fast) {
    expect(
      Object.is(fast.ok.value, ref.ok.value),
      `value ${fast.ok.value} vs ${ref.ok.value}`,
    ).toBe(true);
    expect(Object.is(fast.ok.uncertainty, ref.ok.uncertainty)).toBe(true);
    expect(fast.ok.method).toBe(ref.ok.method);
    expect(fast.ok.sources).toEqual(ref.ok.sources);
  } else expect(fast).toEqual(ref);
  return ref;
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
const countsFor = (zc: number, za: number) => {
  const g = gcd(Math.abs(zc), Math.abs(za));
  return { cationsPerFormula: Math.abs(za) / g, anionsPerFormula: Math.abs(zc) / g };
};

/** A fictional organic drug ion from a random Hill formula (test input only). */
const drugIonArb = fc
  .record({
    c: fc.integer({ min: 4, max: 40 }),
    h: fc.integer({ min: 4, max: 60 }),
    n: fc.integer({ min: 0, max: 6 }),
    o: fc.integer({ min: 0, max: 8 }),
    charge: fc.constantFrom(1, 2, -1, -2),
    aromatic: fc.integer({ min: 0, max: 4 }),
    nonAromatic: fc.integer({ min: 0, max: 3 }),
  })
  .map((d) => ({
    formula: `C${d.c}H${d.h}${d.n ? `N${d.n}` : ''}${d.o ? `O${d.o}` : ''}`,
    charge: d.charge,
    rings: { aromatic: d.aromatic, nonAromatic: d.nonAromatic },
  }));

/** The counter-ion of a library stoichiometry, built as screening/thermo-link.ts builds it. */
function libraryIon(
  ion: (typeof COUNTER_IONS)[number],
  charge: number,
  formula: string,
): ThermoIon {
  const bundled = getThermoIon(ion.thermoId ?? ion.id);
  if (bundled && bundled.charge === charge) return bundled;
  return organicIonFromFormula(formula || ion.formula, charge, ion.rings, { label: ion.id });
}

describe('solutionEnthalpyNumbersKJ is estimateSaltThermo’s ΔH_sol, bit for bit', () => {
  it('every pair of bundled ions (halides, polyatomic ions, with and without a volume)', () => {
    const ions = listThermoIonIds().map((id) => getThermoIon(id)!);
    let ok = 0;
    for (const cation of ions.filter((i) => i.charge > 0))
      for (const anion of ions.filter((i) => i.charge < 0)) {
        const counts = countsFor(cation.charge, anion.charge);
        if ('ok' in expectSame({ cation, anion, ...counts })) ok++;
        expectSame({ cation, anion, ...counts, temperatureK: 310.15 });
      }
    expect(ok).toBeGreaterThan(50); // the comparison ran on real figures, not only on refusals
  });

  it('every library counter-ion and stoichiometry against random drug ions (the screen’s salts)', () => {
    let compared = 0;
    fc.assert(
      fc.property(drugIonArb, (d) => {
        let drug: ThermoIon;
        try {
          drug = drugThermoIon(d);
        } catch {
          return; // the screen has no ΔH_sol without a drug ion
        }
        for (const ion of COUNTER_IONS) {
          if ((ion.kind === 'anion') !== d.charge > 0) continue;
          for (const st of ion.stoichiometries) {
            const x = libraryIon(ion, st.ionCharge, st.ionFormula);
            const [cation, anion] = d.charge > 0 ? [drug, x] : [x, drug];
            const counts = countsFor(cation.charge, anion.charge);
            const ref = expectSame({ cation, anion, ...counts });
            // thermo-link's path (the batch's) gives the same Estimate numbers
            const link = candidateSolutionEnthalpyKJ(
              drug,
              { id: ion.id, thermoId: ion.thermoId, formula: st.ionFormula, rings: ion.rings },
              {
                drugPerSalt: d.charge > 0 ? counts.cationsPerFormula : counts.anionsPerFormula,
                counterIonPerSalt:
                  d.charge > 0 ? counts.anionsPerFormula : counts.cationsPerFormula,
                ionCharge: st.ionCharge,
                ionFormula: st.ionFormula,
              },
            ).solutionEnthalpyKJ;
            if (
              'ok' in ref &&
              Number.isFinite(ref.ok.value) &&
              Number.isFinite(ref.ok.uncertainty)
            ) {
              expect(Object.is(link!.value, ref.ok.value)).toBe(true);
              expect(Object.is(link!.uncertainty, ref.ok.uncertainty)).toBe(true);
              expect(link!.sources).toEqual(ref.ok.sources);
              compared++;
            } else expect(link).toBeNull();
          }
        }
      }),
      { numRuns: 60, seed: 20261203 },
    );
    expect(compared).toBeGreaterThan(1000);
  });

  it('requests with a volume, a density or a structure type, and ions missing sizes', () => {
    const seen = { ok: 0, refused: 0 };
    const e = (value: number, uncertainty = 0): Estimate => ({
      value,
      uncertainty,
      method: 'test-input',
      sources: [],
    });
    const ionArb = (sign: 1 | -1) =>
      fc.record({
        label: fc.constant(sign > 0 ? 'test cation' : 'test anion'),
        charge: fc.integer({ min: 1, max: 3 }).map((z) => sign * z),
        shape: fc.constantFrom('monatomic', 'linear', 'nonlinear' as const),
        radiusA: fc.option(
          fc.double({ min: 0.3, max: 6, noNaN: true }).map((r) => e(r, r * 0.05)),
          {
            nil: undefined,
          },
        ),
        volumeNm3: fc.option(
          fc.double({ min: 0.002, max: 1, noNaN: true }).map((v) => e(v, v * 0.1)),
          {
            nil: undefined,
          },
        ),
        estimatedSize: fc.option(fc.boolean(), { nil: undefined }),
        sources: fc.constant([] as string[]),
      });
    fc.assert(
      fc.property(
        ionArb(1),
        ionArb(-1),
        fc.option(fc.double({ min: 0.01, max: 2, noNaN: true }), { nil: undefined }),
        fc.option(fc.double({ min: 0.5, max: 6, noNaN: true }), { nil: undefined }),
        fc.option(fc.constantFrom('rock-salt', 'fluorite', 'caesium-chloride'), { nil: undefined }),
        (cation, anion, volume, density, structureType) => {
          const req: SaltThermoRequest = {
            cation: cation as ThermoIon,
            anion: anion as ThermoIon,
            ...countsFor(cation.charge, anion.charge),
            ...(volume !== undefined ? { formulaUnitVolumeNm3: volume } : {}),
            ...(density !== undefined ? { densityGPerCm3: density, molarMassGPerMol: 150 } : {}),
            ...(structureType ? { structureType } : {}),
          };
          seen['ok' in expectSame(req) ? 'ok' : 'refused']++;
        },
      ),
      { numRuns: 400, seed: 31 },
    );
    // both kinds ran: figures compared bit for bit, and refusals compared by their message
    expect(seen.ok).toBeGreaterThan(100);
    expect(seen.refused).toBeGreaterThan(10);
  });
});
