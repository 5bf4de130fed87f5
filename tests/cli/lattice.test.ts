import { captureIo } from './support/capture-io';
import { describe, expect, it } from 'vitest';
import { main } from '@/cli/main';

async function run(argv: string[]) {
  const c = captureIo();
  const code = await main(argv, c.io);
  return { code, out: c.out(), err: c.err() };
}

describe('saltsmith lattice', () => {
  it('answers one salt by ion symbols, human-readable, with the sign convention and a caution', async () => {
    const { code, out } = await run(['lattice', '--cation', 'Na+', '--anion', 'Cl-']);
    expect(code).toBe(0);
    expect(out).toMatch(/ΔH_L \(dissociation, > 0\)\s+\d+ ± \d+ kJ\/mol/);
    expect(out).toMatch(/ΔH_sol/);
    expect(out).toMatch(/Screening estimate/);
  });

  it('accepts ids, a method and --json; works out the 1:2 stoichiometry', async () => {
    const { code, out } = await run([
      'lattice',
      '--cation',
      'calcium',
      '--anion',
      'chloride',
      '--method',
      'kapustinskii',
      '--json',
    ]);
    expect(code).toBe(0);
    const j = JSON.parse(out);
    expect(j.anionsPerFormula).toBe(2);
    expect(j.methodChosen).toBe('kapustinskii');
    // CaCl₂: Born–Haber 2255 kJ/mol (Wagman 1982 ΔfH° + CRC IE/EA) within 8 %.
    expect(Math.abs(j.latticeEnthalpyKJ.value / 2255 - 1)).toBeLessThan(0.08);
  });

  it('--method kapustinskii names its calibrated figure "kapustinskii (calibrated)" and shows the bare model beside it', async () => {
    const { code, out } = await run([
      'lattice',
      '--cation',
      'Na+',
      '--anion',
      'Cl-',
      '--method',
      'kapustinskii',
      '--json',
    ]);
    expect(code).toBe(0);
    const j = JSON.parse(out);
    expect(j.latticeCalibration.applied).toBe(true);
    expect(j.latticeEnthalpyKJ.method).toBe('kapustinskii (calibrated)');
    expect(j.rawLatticeEnthalpyKJ.method).toBe('kapustinskii');
    // Bare model, hand computation with Shannon 1976 CN VI radii (Na⁺ 1.02, Cl⁻ 1.81 Å):
    // 1214·2/2.83·(1 − 0.345/2.83) − RT = 753.36 − 2.48 = 750.88 kJ/mol.
    expect(j.rawLatticeEnthalpyKJ.value).toBeCloseTo(750.88, 1);
    expect(j.latticeEnthalpyKJ.value).toBeCloseTo(
      j.latticeCalibration.factor * j.rawLatticeEnthalpyKJ.value,
      6,
    );
    const text = await run([
      'lattice',
      '--cation',
      'Na+',
      '--anion',
      'Cl-',
      '--method',
      'kapustinskii',
    ]);
    expect(text.out).toMatch(
      /ΔH_L \(dissociation, > 0\)\s+\d+ ± \d+ kJ\/mol \[kapustinskii \(calibrated\)\]/,
    );
    expect(text.out).toMatch(/ΔH_L before calibration\s+751 ± \d+ kJ\/mol \[kapustinskii\]/);
  });

  it('runs Born–Mayer with --structure and --volume (CaF₂)', async () => {
    // V_m = a³/4 with a = 5.463 Å (Wyckoff 1963); Born–Haber 2635 kJ/mol (Wagman 1982 ΔfH° + CRC IE/EA).
    const { code, out } = await run([
      'lattice',
      '--cation',
      'Ca2+',
      '--anion',
      'F-',
      '--method',
      'born-mayer',
      '--structure',
      'fluorite',
      '--volume',
      String(5.463 ** 3 / 4 / 1000),
      '--json',
    ]);
    expect(code).toBe(0);
    const j = JSON.parse(out);
    expect(j.methodChosen).toBe('born-mayer');
    expect(Math.abs(j.latticeEnthalpyKJ.value / 2635 - 1)).toBeLessThan(0.06);
  });

  it('rejects unknown ions and methods with usage errors, and bad numbers with a field name', async () => {
    expect((await run(['lattice', '--cation', 'Qq+', '--anion', 'Cl-'])).code).toBe(2);
    expect(
      (await run(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--method', 'magic'])).code,
    ).toBe(2);
    const bad = await run(['lattice', '--cation', 'Na+', '--anion', 'Cl-', '--density', 'heavy']);
    expect(bad.code).toBe(1);
    expect(bad.err).toMatch(/density/);
    const swapped = await run(['lattice', '--cation', 'Cl-', '--anion', 'Na+']);
    expect(swapped.code).toBe(1);
    expect(swapped.err).toMatch(/cation/);
  });
});
