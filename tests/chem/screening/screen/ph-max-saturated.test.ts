import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { candidatesFromLibrary, COUNTER_IONS, drugIon, type ScreeningCompound } from '@/chem';
import { criterionScores } from '@/chem/screening/ranking';
import { saturatedMarginOver } from '@/chem/screening/screen/microenvironment';
import { isPrepared } from '@/chem/screening/screen/prepare-candidate';
import { refinedRowNumbers, rowNumbers } from '@/chem/screening/screen/row-numbers';
import { screenSetup } from '@/chem/screening/screen/screen-compound';
import { parseScreeningSettings } from '@/chem/screening/settings';

/**
 * A ranking's pass 1 (screenCompoundTop) leaves pH_max unrefined where the disproportionation score,
 * clamp01(0.5 + margin/2) with margin = ±(pH_max − micro-pH), is saturated over every crossing's
 * bracket. The reference is the full row's numbers (rowNumbers without `scoreOnly`, which always runs
 * Brent): every criterion score must be the same double (Object.is), and the refined numbers of a
 * written row the same as the full row's. Compounds are fictional (invented numbers, a workload only).
 */
const compoundArb = fc.record({
  kind: fc.constantFrom('base' as const, 'acid' as const),
  charge: fc.constantFrom(1, 2),
  pKa: fc.double({ min: 1, max: 11, noNaN: true }),
  s0: fc.double({ min: 1e-5, max: 5, noNaN: true }),
  microPh: fc.double({ min: 1, max: 11, noNaN: true }),
  excipients: fc.constantFrom([], [], [], ['microcrystalline-cellulose']),
  ions: fc.array(fc.nat(200), { minLength: 4, maxLength: 12 }),
});

type Drawn = typeof compoundArb extends fc.Arbitrary<infer T> ? T : never;

function setupOf(d: Drawn) {
  const ionCharge = d.kind === 'base' ? d.charge : -d.charge;
  const pKas = d.charge === 2 ? [d.pKa, d.pKa + 1.5] : [d.pKa];
  const compound: ScreeningCompound = {
    name: 'fictional test compound',
    kind: d.kind,
    pKas: pKas.map((value) => ({ value, origin: 'predicted' as const })),
    ionCharge,
    intrinsicSolubilityMgPerMl: d.s0,
    meltingPointC: null,
    logP: null,
    doseMg: 100,
  };
  const di = drugIon({ kind: d.kind, ionCharge, formula: 'C18H32N2O2' });
  const ions = [...new Set(d.ions.map((i) => COUNTER_IONS[i % COUNTER_IONS.length]!))];
  const drug = { kind: d.kind, ionCharge, pKas, thermo: di };
  const candidates = candidatesFromLibrary(ions, drug);
  const settings = parseScreeningSettings({
    microenvironmentPh: d.microPh,
    microenvironmentPhStated: true,
    excipients: d.excipients,
  });
  return screenSetup({ compound, drugIon: di, candidates, settings, profiles: 'none' });
}

describe('pass 1 with pH_max unrefined where its score saturates', () => {
  it('scores every criterion as the exact root does, and refines to the full row (fixed seed)', () => {
    let skipped = 0;
    let refined = 0;
    fc.assert(
      fc.property(compoundArb, (d) => {
        let setup;
        try {
          setup = setupOf(d);
        } catch {
          return; // a compound the screen refuses has no rows
        }
        for (const p of setup.prepared) {
          const ksp = setup.ksps.get(p.cand.id);
          if (!isPrepared(p) || !ksp) continue;
          const args = [setup.ctx, p, () => ksp, setup.media, setup.hcl, setup.shared] as const;
          const full = rowNumbers(...args);
          const fast = rowNumbers(...args, true);
          if (fast.phMaxRefined) refined++;
          else skipped++;
          const a = criterionScores(full.criteria);
          const b = criterionScores(fast.criteria);
          for (const k of Object.keys(a) as (keyof typeof a)[])
            expect(Object.is(b[k], a[k])).toBe(true);
          const written = refinedRowNumbers(setup.ctx, fast, setup.shared);
          expect(Object.is(written.phMax, full.phMax)).toBe(true);
          expect(written.criteria).toStrictEqual(full.criteria);
          expect(written.micro.disproportionation).toStrictEqual(full.micro.disproportionation);
          expect(written.micro.excipientRisks).toStrictEqual(full.micro.excipientRisks);
        }
      }),
      { seed: 20261203, numRuns: 80 },
    );
    // both branches were taken (a property over one branch only would prove nothing)
    expect(skipped).toBeGreaterThan(50);
    expect(refined).toBeGreaterThan(50);
  });

  it('calls a span saturated only when both ends are at least one pH unit on the same side', () => {
    const s = parseScreeningSettings({ microenvironmentPh: 5 });
    // hand computation: base margin = pH_max − 5, so [6, 9] gives ≥ 1 at both ends, score 1
    expect(saturatedMarginOver(s, 6, 9, 'base')).toBe(1);
    expect(saturatedMarginOver(s, 1, 4, 'base')).toBe(-4);
    expect(saturatedMarginOver(s, 5.75, 6, 'base')).toBeNull(); // 0.75 at lo: score 0.875
    expect(saturatedMarginOver(s, 3.5, 6.5, 'base')).toBeNull(); // straddles: any score
    // acid margin = 5 − pH_max: [1, 4] gives 4 and 1
    expect(saturatedMarginOver(s, 1, 4, 'acid')).toBe(4);
    expect(saturatedMarginOver(s, 4, 4.25, 'acid')).toBeNull();
    const withExcipient = parseScreeningSettings({
      microenvironmentPh: 5,
      excipients: ['microcrystalline-cellulose'],
    });
    expect(saturatedMarginOver(withExcipient, 8, 9, 'base')).toBeNull(); // a smooth probability
  });
});
