import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { captureIo } from './support/capture-io';
import { TEST_COMPOUND_ARGS } from './support/test-compound';
import { screenCommand } from '@/cli/commands/screen/screen-command';

async function run(args: string[]) {
  const c = captureIo();
  const code = await screenCommand.run(args, c.io);
  return { code, out: c.out(), err: c.err() };
}

function table(out: string) {
  const lines = out.trim().split('\n');
  return Papa.parse<Record<string, string>>(lines.filter((l) => !l.startsWith('#')).join('\n'), {
    header: true,
  });
}

describe('saltsmith screen --excipients', () => {
  it('adds the worst excipient and P(conversion) as the last columns, the others in place', async () => {
    const plain = await run([...TEST_COMPOUND_ARGS, '--ions', 'chloride,mesylate']);
    const withEx = await run([
      ...TEST_COMPOUND_ARGS,
      '--ions',
      'chloride,mesylate',
      '--excipients',
      'citric-acid,magnesium-stearate',
    ]);
    expect(withEx.code).toBe(0);
    const a = table(plain.out);
    const b = table(withEx.out);
    const headA = a.meta.fields!;
    const headB = b.meta.fields!;
    expect(headB.slice(0, headA.length - 3)).toEqual(headA.slice(0, headA.length - 3));
    expect(headB.slice(-3)).toEqual([
      'worst_excipient',
      'worst_excipient_p_conversion',
      'worst_excipient_risk',
    ]);
    for (const r of b.data) {
      // The test base's salts all have pH_max below its pKa, far below magnesium stearate's 8–10
      // (so P rounds to 1 or just under), and far above citric acid's 2.2.
      expect(Number(r.ph_max)).toBeLessThan(7);
      expect(r.worst_excipient).toBe('magnesium-stearate');
      expect(Number(r.worst_excipient_p_conversion)).toBeGreaterThan(0.9);
      expect(r.worst_excipient_risk).toBe('likely');
      expect(r.disproportionation).toBe('high');
    }
    for (const r of a.data) expect(r.worst_excipient).toBe('');
  });

  it('refuses an unknown excipient with the accepted ids (exit 1)', async () => {
    const r = await run([
      ...TEST_COMPOUND_ARGS,
      '--ions',
      'chloride',
      '--excipients',
      'unobtainium',
    ]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--excipients\.0: "unobtainium" is not a bundled excipient/);
    expect(r.err).toMatch(/magnesium-stearate/);
  });

  it('takes a microenvironment pH given on the command line as stated, not assumed', async () => {
    const stated = table(
      (await run([...TEST_COMPOUND_ARGS, '--ions', 'chloride', '--micro-ph', '7'])).out,
    );
    const assumed = table((await run([...TEST_COMPOUND_ARGS, '--ions', 'chloride'])).out);
    expect(stated.data[0]!.reasons).toMatch(/microenvironment pH 7\.0\)/);
    expect(stated.data[0]!.reasons).not.toMatch(/not stated/);
    expect(assumed.data[0]!.reasons).toMatch(/not stated, assumed 7\.0/);
  });
});
