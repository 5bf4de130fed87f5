import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  checkProfileInput,
  drugProtolyte,
  type DrugAcidBase,
  type ProfileOptions,
} from '@/chem/screening/ph-profile';
import { checkSaltSystem, requirePh, type SaltSystem } from '@/chem/screening/salt-equilibrium';
import { requireAscendingPkas } from '@/chem/screening/speciation';
import { ChemInputError, requireFiniteInRange } from '@/chem/result';

// Issue 20: drugProtolyte, checkSaltSystem, checkProfileInput and requirePh skip their checks when an
// input plainly passes them (the checks build messages as they go, and a screen asks again and again).
// The reference here is each check written out as it was before (the sequence of requireFiniteInRange /
// requireAscendingPkas calls and explicit throws): over random, often invalid inputs both must return
// the same value or throw the same error (field and message). The inputs are random, not a compound.

type Outcome = { ok: unknown } | { error: string };
const outcome = (f: () => unknown): Outcome => {
  try {
    return { ok: f() };
  } catch (e) {
    return { error: e instanceof Error ? `${e.name}: ${e.message}` : String(e) };
  }
};

function drugProtolyteBefore(d: DrugAcidBase) {
  requireAscendingPkas('pKas', d.pKas);
  if (d.pKas.length < 1) throw new ChemInputError('pKas', 'no pKa given', 'one to four pKa values');
  const sign = d.kind === 'base' ? 1 : -1;
  if (
    !Number.isInteger(d.ionCharge) ||
    d.ionCharge * sign < 1 ||
    Math.abs(d.ionCharge) > d.pKas.length
  ) {
    throw new ChemInputError(
      'ionCharge',
      `${d.ionCharge} does not fit a ${d.kind} with ${d.pKas.length} pKa value(s)`,
      `${d.kind === 'base' ? '+1' : '−1'} up to ${sign * d.pKas.length}`,
    );
  }
  return { pKas: d.pKas, mostProtonatedCharge: d.kind === 'base' ? d.pKas.length : 0 };
}

function checkSaltSystemBefore(i: SaltSystem) {
  for (const [f, v] of [
    ['drugPerSalt', i.drugPerSalt],
    ['counterIonPerSalt', i.counterIonPerSalt],
  ] as const) {
    if (!Number.isInteger(v) || v < 1 || v > 4)
      throw new ChemInputError(f, `${v} is not allowed`, 'an integer from 1 to 4');
  }
  if (i.drugPerSalt * i.drugIonCharge + i.counterIonPerSalt * i.counterIonCharge !== 0) {
    throw new ChemInputError(
      'stoichiometry',
      `${i.drugPerSalt}×(${i.drugIonCharge}) + ${i.counterIonPerSalt}×(${i.counterIonCharge}) is not neutral`,
      'drug and counter-ion charges that balance in the formula unit',
    );
  }
  requireFiniteInRange('log10Ksp', i.log10Ksp, -200, 20);
  requireFiniteInRange('commonIonConcentration', i.commonIonM ?? 0, 0, 20, 'mol/L');
  if (i.activity?.model === 'davies')
    requireFiniteInRange(
      'backgroundIonicStrength',
      i.activity.backgroundIonicStrengthM,
      0,
      5,
      'mol/L',
    );
  return i;
}

function checkProfileHeadBefore(log10IntrinsicM: number, o: ProfileOptions) {
  const from = requireFiniteInRange('phFrom', o.phFrom ?? 1, 0, 14);
  const to = requireFiniteInRange('phTo', o.phTo ?? 8, 0, 14);
  const step = requireFiniteInRange('phStep', o.phStep ?? 0.1, 0.001, 14);
  if (!(to >= from))
    throw new ChemInputError('phTo', `${to} is below phFrom ${from}`, 'phTo ≥ phFrom');
  requireFiniteInRange('log10IntrinsicSolubility', log10IntrinsicM, -20, 2, 'log₁₀ mol/L');
  return { from, to, step };
}

/** Every limit the checks use, each with values just inside and just outside it. */
const LIMITS = [-200, -20, -10, 0, 0.001, 1, 2, 4, 5, 8, 14, 20];
const nearLimits = LIMITS.flatMap((x) => [x, x - 1e-9, x + 1e-9, x - 0.5, x + 0.5]);
const edgy = fc.oneof(
  fc.constantFrom(...nearLimits),
  fc.double({ min: -250, max: 30 }),
  fc.constantFrom(-0, NaN, Infinity, -Infinity),
  fc.integer({ min: -3, max: 6 }),
);
const weird = fc.oneof(
  edgy,
  fc.constantFrom('5' as unknown as number, undefined as unknown as number),
);
/** Mostly whole counts near the allowed 1–4, so that most systems are neutral and reach every check. */
const count = fc.oneof(
  { arbitrary: fc.integer({ min: 0, max: 5 }), weight: 3 },
  { arbitrary: edgy, weight: 1 },
);

describe('the input checks skip only what would pass', () => {
  it('drugProtolyte', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('base' as const, 'acid' as const),
        fc.oneof(
          fc.array(weird, { maxLength: 4 }),
          fc
            .array(fc.constantFrom(...nearLimits), { maxLength: 4 })
            .map((xs) => [...xs].sort((a, b) => a - b)),
        ),
        fc.oneof(fc.integer({ min: -5, max: 5 }), edgy),
        (kind, pKas, ionCharge) => {
          const d = { kind, pKas, ionCharge };
          expect(outcome(() => drugProtolyte(d))).toStrictEqual(
            outcome(() => drugProtolyteBefore(d)),
          );
        },
      ),
      { numRuns: 5000 },
    );
  });

  it('checkSaltSystem', () => {
    const protolyte = { pKas: [4], mostProtonatedCharge: 0 };
    fc.assert(
      fc.property(
        fc.record({
          drugPerSalt: count,
          counterIonPerSalt: count,
          drugIonCharge: fc.integer({ min: 1, max: 2 }),
          counterIonCharge: fc.integer({ min: -2, max: -1 }),
          log10Ksp: weird,
          commonIonM: fc.option(weird, { nil: undefined }),
          davies: fc.option(weird, { nil: undefined }),
        }),
        (r) => {
          const i: SaltSystem = {
            drug: protolyte,
            counterIon: protolyte,
            drugPerSalt: r.drugPerSalt,
            counterIonPerSalt: r.counterIonPerSalt,
            drugIonCharge: r.drugIonCharge,
            counterIonCharge: r.counterIonCharge,
            log10Ksp: r.log10Ksp,
            commonIonM: r.commonIonM,
            activity:
              r.davies === undefined
                ? { model: 'ideal' }
                : { model: 'davies', backgroundIonicStrengthM: r.davies, temperatureK: 298.15 },
          };
          expect(outcome(() => checkSaltSystem(i))).toStrictEqual(
            outcome(() => checkSaltSystemBefore(i)),
          );
        },
      ),
      { numRuns: 5000 },
    );
  });

  it('checkProfileInput (grid and S₀; drug and salt as above) and requirePh', () => {
    const drug: DrugAcidBase = { kind: 'base', pKas: [7], ionCharge: 1 };
    fc.assert(
      fc.property(
        fc.option(edgy, { nil: undefined }),
        fc.option(edgy, { nil: undefined }),
        fc.option(edgy, { nil: undefined }),
        weird,
        (phFrom, phTo, phStep, logS0) => {
          const o = { phFrom, phTo, phStep };
          const got = outcome(() => {
            const r = checkProfileInput(drug, logS0, null, o);
            return { from: r.from, to: r.to, step: r.step };
          });
          expect(got).toStrictEqual(outcome(() => checkProfileHeadBefore(logS0, o)));
          expect(outcome(() => requirePh(logS0))).toStrictEqual(
            outcome(() => requireFiniteInRange('pH', logS0, 0, 14)),
          );
        },
      ),
      { numRuns: 5000 },
    );
  });
});

describe('requireFiniteInRange words its refusal as before', () => {
  it('names the field, the value and the accepted range (written out here)', () => {
    expect(() => requireFiniteInRange('commonIonConcentration', 21, 0, 20, 'mol/L')).toThrow(
      'commonIonConcentration: 21 is out of range (accepted: a finite number from 0 to 20 mol/L)',
    );
    expect(() => requireFiniteInRange('pH', NaN, 0, 14)).toThrow(
      'pH: expected a number, got NaN (accepted: a finite number from 0 to 14)',
    );
    expect(requireFiniteInRange('pH', 14, 0, 14)).toBe(14);
  });
});
