import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { csvCell, csvField } from '@/cli/commands/screen/batch/screen-one';
import { safeCsvCell } from '@/chem';

// The batch's CSV cell skips the formula guard for texts that start with plain printable ASCII; the
// reference is the guard itself (OWASP "CSV Injection" rules, src/chem/report/csv-cell-guard.ts)
// followed by papaparse-style quoting: the two must write every value alike.
describe('batch CSV cell', () => {
  const reference = (v: unknown) => csvField(safeCsvCell(v));
  const texts = fc.oneof(
    fc.string(),
    fc.string({ unit: 'grapheme' }),
    fc.constantFrom(
      '=1+1',
      '+x',
      '-2',
      '@a',
      ' =x',
      '\u200B=x',
      '\u2212x',
      '\tx',
      'a"b',
      'a,b',
      ' a',
      'a ',
    ),
  );
  it('writes every text as the guard and the quoting do', () => {
    fc.assert(
      fc.property(fc.tuple(fc.string({ maxLength: 3 }), texts), ([head, tail]) => {
        const v = head + tail;
        expect(csvCell(v)).toBe(reference(v));
      }),
      { numRuns: 3000 },
    );
  });
  it('writes numbers, booleans and empty values as before', () => {
    for (const v of [0, -1.5, 1e-7, true, false, '', null, undefined])
      expect(csvCell(v)).toBe(v === '' ? '' : typeof v === 'number' ? String(v) : reference(v));
  });
});
