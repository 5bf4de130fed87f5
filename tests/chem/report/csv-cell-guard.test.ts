import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CSV_FORMULA_TRIGGERS, isFormulaLike, neutralizeCsvText, safeCsvCell } from '@/chem';

/**
 * The CSV cell guard against OWASP "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection):
 * cells beginning with =, +, -, @, tab or carriage return are formulas to a spreadsheet and must reach
 * the file with a leading single quote. The look-alikes and leading invisible characters are our
 * hardening (see src/chem/report/csv-cell-guard.ts).
 */
const SEED = 20261202;
const RUNS = 3000;

const LOOK_THROUGH_CHARS = [
  ' ',
  '\u00A0',
  '\n',
  '\u200B',
  '\u200C',
  '\u200D',
  '\u200E',
  '\u200F',
  '\u2060',
  '\uFEFF',
  '\u202E',
];

describe('CSV cell guard', () => {
  it.each([
    ['OWASP =', '=1+1'],
    ['OWASP +', '+1'],
    ['OWASP -', '-1+2'],
    ['OWASP @', '@SUM(A1)'],
    ['OWASP tab', '\t=1'],
    ['OWASP carriage return', '\r=1'],
    ['HYPERLINK payload', '=HYPERLINK("http://example.invalid","x")'],
    ['U+2212 minus', '\u22121'],
    ['full-width equals U+FF1D', '\uFF1D1+1'],
    ['full-width plus U+FF0B', '\uFF0B1'],
    ['full-width hyphen-minus U+FF0D', '\uFF0D1'],
    ['full-width at U+FF20', '\uFF20SUM(A1)'],
    ['small equals U+FE66', '\uFE661+1'],
    ['small plus U+FE62', '\uFE621'],
    ['small hyphen-minus U+FE63', '\uFE631'],
    ['small at U+FE6B', '\uFE6BSUM(A1)'],
    ['zero-width space before =', '\u200B=1+1'],
    ['zero-width joiner before +', '\u200D+1'],
    ['left-to-right mark before -', '\u200E-1'],
    ['right-to-left mark before @', '\u200F@x'],
    ['word joiner before =', '\u2060=1'],
    ['byte-order mark before =', '\uFEFF=1'],
    ['spaces before =', '  =1+1'],
    ['no-break space before @', '\u00A0@x'],
    ['space before carriage return', ' \r=1'],
  ])('neutralises %s', (_name, text) => {
    expect(isFormulaLike(text)).toBe(true);
    expect(neutralizeCsvText(text)).toBe(`'${text}`);
  });

  it('leaves ordinary text, numbers and empty cells alone', () => {
    for (const t of [
      '',
      'Mesylate',
      'salt expected',
      '1:1',
      'a=b',
      "'quoted",
      ' plain',
      '3-methyl',
      '\u200Bplain',
    ]) {
      expect(neutralizeCsvText(t)).toBe(t);
    }
    expect(safeCsvCell(-3.2)).toBe(-3.2);
    expect(safeCsvCell(null)).toBe(null);
    expect(safeCsvCell('=1')).toBe("'=1");
  });

  it('never lets a cell reach the file that a spreadsheet would read as a formula (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (s) => {
        const out = neutralizeCsvText(s);
        expect(out === s || out === `'${s}`).toBe(true);
        expect(isFormulaLike(out)).toBe(false);
        expect(CSV_FORMULA_TRIGGERS.includes(out[0] ?? '')).toBe(false);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('catches every trigger behind any run of leading white space and format characters (property)', () => {
    const prefix = fc
      .array(fc.constantFrom(...LOOK_THROUGH_CHARS), { maxLength: 6 })
      .map((a) => a.join(''));
    fc.assert(
      fc.property(
        prefix,
        fc.constantFrom(...CSV_FORMULA_TRIGGERS),
        fc.string({ unit: 'binary' }),
        (p, t, rest) => {
          const text = `${p}${t}${rest}`;
          expect(neutralizeCsvText(text)).toBe(`'${text}`);
        },
      ),
      { seed: SEED, numRuns: RUNS },
    );
  });
});
