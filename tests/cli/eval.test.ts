import { captureIo } from './support/capture-io';
import { describe, expect, it } from 'vitest';
import { main } from '@/cli/main';
import { evalRegistry } from '@/cli/commands/eval/registry';
import { registerBuiltInEvalKinds } from '@/cli/commands/eval/built-in-kinds';

// Loose shape of one answer line, read in the assertions below.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type EvalLine = Record<string, any>;

async function run(argv: string[], input: string) {
  const c = captureIo(input);
  const code = await main(argv, c.io);
  const out = c.out();
  return {
    code,
    lines:
      out.trim() === ''
        ? []
        : out
            .trim()
            .split('\n')
            .map((l) => JSON.parse(l) as EvalLine),
    err: c.err(),
  };
}

describe('saltsmith eval', () => {
  it('answers each JSON line in order with lattice, hydration and solution enthalpies, sources and the sign convention', async () => {
    const input = [
      '{"kind":"salt","id":"nacl","cation":"Na+","anion":"Cl-"}',
      '{"kind":"salt","id":"k2so4","cation":"potassium","anion":{"formula":"SO4","charge":-2}}',
      '{"kind":"salt","id":"caf2","cation":"Ca2+","anion":"F-","method":"born-mayer","structureType":"fluorite","formulaUnitVolumeNm3":0.04076}',
      '{"kind":"salt","id":"lib","cation":"sodium","anion":"mesylate"}',
    ].join('\n');
    const { code, lines } = await run(['eval'], input);
    expect(code).toBe(0);
    expect(lines.map((l) => l.id)).toEqual(['nacl', 'k2so4', 'caf2', 'lib']);
    const nacl = lines[0]!;
    expect(nacl.ok).toBe(true);
    expect(nacl.signConvention).toMatch(/dissociation/);
    for (const k of [
      'latticeEnthalpyKJ',
      'cationHydrationKJ',
      'anionHydrationKJ',
      'solutionEnthalpyKJ',
    ]) {
      expect(typeof nacl[k].value).toBe('number');
      expect(nacl[k].uncertainty).toBeGreaterThan(0);
      expect(nacl[k].sources.length).toBeGreaterThan(0);
      expect(typeof nacl[k].method).toBe('string');
    }
    // NaCl: Born–Haber 787 kJ/mol (Wagman 1982 ΔfH° + CRC IE/EA) within the stated 2σ.
    expect(Math.abs(nacl.latticeEnthalpyKJ.value - 787)).toBeLessThan(
      2 * nacl.latticeEnthalpyKJ.uncertainty,
    );
    expect(lines[1]!.cationsPerFormula).toBe(2);
    // {"formula":"SO4","charge":-2} is the bundled sulfate, with Marcus's published hydration enthalpy
    expect(lines[1]!.anion.id).toBe('sulfate');
    expect(lines[1]!.anionHydrationKJ.method).toBe('published');
    expect(lines[2]!.methodChosen).toBe('born-mayer');
    // CaF₂: Born–Haber 2635 kJ/mol (same sources) within 6 %.
    expect(Math.abs(lines[2]!.latticeEnthalpyKJ.value / 2635 - 1)).toBeLessThan(0.06);
    expect(lines[3]!.anion.sizeEstimated).toBe(true);
    expect(nacl.caution).toMatch(/does not establish a salt form/);
  });

  it('reports a bad line as a JSON error naming the problem, goes on, and exits 1', async () => {
    const input = [
      'not json',
      '{"kind":"salt","cation":"Na+","anion":"Xx-"}',
      '{"kind":"salt","cation":"Na+","anion":"Cl-","cationsPerFormula":2}',
      '{"kind":"salt","cation":{"smiles":"C1CC","charge":1},"anion":"Cl-"}',
      '{"kind":"salt","cation":{"formula":"Na","charge":0},"anion":"Cl-"}',
      '{"kind":"salt","cation":"Na+","anion":"Cl-","densityGPerCm3":-2}',
      '{"kind":"nope"}',
      '[1,2]',
      '',
      '{"kind":"salt","cation":"K+","anion":"Br-"}',
    ].join('\n');
    const { code, lines } = await run(['eval'], input);
    expect(code).toBe(1);
    expect(lines.length).toBe(9); // the blank line is skipped
    expect(lines.slice(0, 8).every((l) => l.ok === false)).toBe(true);
    expect(lines[0]!.error.type).toBe('json');
    expect(lines[1]!.error.field).toBe('anion');
    expect(lines[2]!.error.field).toBe('stoichiometry');
    expect(lines[3]!.error.field).toBe('cation.smiles'); // the structure check names the ion's field;
    expect(lines[4]!.error.message).toMatch(/charge/);
    expect(lines[5]!.error.field).toBe('densityGPerCm3');
    expect(lines[6]!.error.field).toBe('kind');
    expect(lines[8]!.ok).toBe(true);
    expect(lines[8]!.line).toBe(10);
  });

  it('has a registry of request kinds, filled explicitly with "salt" and "ph-solubility"', () => {
    registerBuiltInEvalKinds();
    expect(evalRegistry.list()).toContain('ph-solubility');
    expect(evalRegistry.list()).toContain('salt');
  });
});
