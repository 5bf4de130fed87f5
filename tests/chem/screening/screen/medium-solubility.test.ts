import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drugProtolyte, solubilityAtPh, type ProfileSalt } from '@/chem/screening/ph-profile';
import { commonIonIn, saltInMedium } from '@/chem/screening/screen/medium-solubility';
import type { ScreenContext } from '@/chem/screening/screen/screen-context';

// Issue 20: a salt's solubility in each medium of a screen is read by saltInMedium, which takes the
// drug's side of the medium once per screen and, with ideal activities and no counter-ion in the
// medium, the general solver's closed form. The reference is the general entry itself
// (ph-profile.ts solubilityAtPh → solveCheckedSalt), so the expected value does not come from the code
// under test; every number must be the same double (Object.is), the solid the same. The drugs, salts
// and media are fictional, drawn at random (invented numbers, a workload only).

const ascending = (min: number, max: number) =>
  fc
    .array(fc.double({ min, max, noNaN: true }), { minLength: 1, maxLength: 3 })
    .map((xs) => [...xs].sort((a, b) => a - b))
    .filter((xs) => xs.every((x, k) => k === 0 || x > xs[k - 1]!));

const system = fc
  .record({
    kind: fc.constantFrom('base' as const, 'acid' as const),
    drugPKas: ascending(-1, 13),
    ionPKas: ascending(-3, 15),
    drugChargePick: fc.nat(),
    ionChargePick: fc.nat(),
    log10IntrinsicM: fc.double({ min: -12, max: 1.5, noNaN: true }),
    // to −200 and above +6 on the log₁₀ s scale: the clamp and the `unbounded` branch are reached
    log10Ksp: fc.oneof(
      fc.double({ min: -40, max: 20, noNaN: true }),
      fc.double({ min: -200, max: -150, noNaN: true }),
    ),
    pHs: fc.array(fc.double({ min: 0, max: 14, noNaN: true }), { minLength: 1, maxLength: 4 }),
    davies: fc.boolean(),
    commonIonM: fc.constantFrom(0, 0, 0, 0.01, 0.1),
  })
  .map((r) => {
    const zD = 1 + (r.drugChargePick % r.drugPKas.length);
    const zX = 1 + (r.ionChargePick % r.ionPKas.length);
    const gcd = zD === zX ? zD : zD % 2 === 0 && zX % 2 === 0 ? 2 : 1;
    const base = r.kind === 'base';
    const salt: ProfileSalt = {
      // a base's salt takes an acid's anion (neutral when fully protonated), an acid's a cation
      counterIon: { pKas: r.ionPKas, mostProtonatedCharge: base ? 0 : r.ionPKas.length },
      counterIonCharge: base ? -zX : zX,
      drugPerSalt: zX / gcd,
      counterIonPerSalt: zD / gcd,
      log10Ksp: r.log10Ksp,
    };
    const drug = { kind: r.kind, pKas: r.drugPKas, ionCharge: base ? zD : -zD };
    return { ...r, drug, salt };
  });

/** The parts of a screen's context saltInMedium reads. */
function toCtxInput(r: {
  drug: { kind: 'base' | 'acid'; pKas: number[]; ionCharge: number };
  log10IntrinsicM: number;
  davies: boolean;
}) {
  const activity = r.davies
    ? { model: 'davies' as const, backgroundIonicStrengthM: 0.1, temperatureK: 310.15 }
    : { model: 'ideal' as const };
  return {
    drug: r.drug,
    drugProtolyte: drugProtolyte(r.drug),
    log10IntrinsicM: { value: r.log10IntrinsicM },
    activity,
  } as unknown as ScreenContext;
}

describe('saltInMedium gives solubilityAtPh’s numbers', () => {
  it('bit for bit, every branch (closed form, common ion, Davies)', () => {
    fc.assert(
      fc.property(system, (r) => {
        const ctx = toCtxInput(r);
        const media = r.pHs.map((pH, k) => ({ pH, ionicStrengthM: 0.05 * (k + 1), ions: {} }));
        media.forEach((m, i) => {
          const activity =
            ctx.activity?.model === 'davies'
              ? { ...ctx.activity, backgroundIonicStrengthM: m.ionicStrengthM }
              : ctx.activity;
          const ref = solubilityAtPh(r.drug, r.log10IntrinsicM, r.salt, m.pH, {
            activity,
            commonIonM: r.commonIonM,
          });
          const got = saltInMedium(ctx, r.salt, media, i, r.commonIonM);
          expect(Object.is(got.solubilityM, ref.solubilityM)).toBe(true);
          expect(got.solid).toBe(ref.solid);
        });
      }),
      { numRuns: 3000 },
    );
  });

  it('reaches both solids and the unbounded salt in the closed form', () => {
    // hand-chosen fictional 1:1 base salt (pKa 9, counter-ion pKa −6, S₀ 10⁻⁴ M, K_sp 10⁻⁴):
    // below pH_max the salt limits, far above it the free form; with K_sp 10²⁰ the salt never limits
    const drug = { kind: 'base' as const, pKas: [9], ionCharge: 1 };
    const ctx = toCtxInput({ drug, log10IntrinsicM: -4, davies: false });
    const salt: ProfileSalt = {
      counterIon: { pKas: [-6], mostProtonatedCharge: 0 },
      counterIonCharge: -1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -4,
    };
    const media = [
      { pH: 2, ionicStrengthM: 0, ions: {} },
      { pH: 12, ionicStrengthM: 0, ions: {} },
    ];
    // pH 2: S_free = 10⁻⁴·(1 + 10⁷) ≫ √K_sp = 10⁻² M, so the salt limits at ~0.01 M
    const low = saltInMedium(ctx, salt, media, 0, 0);
    expect(low.solid).toBe('salt');
    expect(low.solubilityM).toBeCloseTo(0.01, 6);
    expect(saltInMedium(ctx, salt, media, 1, 0).solid).toBe('free-form');
    const unbounded = saltInMedium(ctx, { ...salt, log10Ksp: 20 }, media, 0, 0);
    expect(unbounded.solid).toBe('free-form');
  });

  it('refuses a medium pH outside 0–14 as solubilityAtPh does, every time it is asked', () => {
    const drug = { kind: 'base' as const, pKas: [7], ionCharge: 1 };
    const ctx = toCtxInput({ drug, log10IntrinsicM: -4, davies: false });
    const salt: ProfileSalt = {
      counterIon: { pKas: [-6], mostProtonatedCharge: 0 },
      counterIonCharge: -1,
      drugPerSalt: 1,
      counterIonPerSalt: 1,
      log10Ksp: -4,
    };
    const media = [{ pH: 15, ionicStrengthM: 0, ions: {} }];
    const ref = () => solubilityAtPh(drug, -4, salt, 15);
    expect(ref).toThrow();
    const message = (() => {
      try {
        ref();
      } catch (e) {
        return (e as Error).message;
      }
    })();
    for (let k = 0; k < 2; k++) expect(() => saltInMedium(ctx, salt, media, 0, 0)).toThrow(message);
  });
});

describe('commonIonIn reads a medium’s ion record as `ions[id] ?? 0` does', () => {
  it('for own, missing and inherited names alike', () => {
    const ctx = toCtxInput({
      drug: { kind: 'base', pKas: [7], ionCharge: 1 },
      log10IntrinsicM: -4,
      davies: false,
    });
    const ids = ['chloride', 'sodium', 'mesylate', 'constructor', 'toString', 'valueOf', 'x'];
    fc.assert(
      fc.property(
        fc.dictionary(
          fc.constantFrom('chloride', 'sodium', 'mesylate', 'toString'),
          fc.double({ min: 0, max: 20, noNaN: true }),
        ),
        fc.constantFrom(...ids),
        (ions, id) => {
          const media = [{ pH: 3, ionicStrengthM: 0, ions }];
          expect(Object.is(commonIonIn(ctx, media, 0, id), ions[id] ?? 0)).toBe(true);
        },
      ),
    );
  });
});
