import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import fc from 'fast-check';
import { CSV_FORMULA_TRIGGERS as FORMULA_TRIGGERS, isFormulaLike, neutralizeCsvText } from '@/chem';
import { csvHeader, csvNumber, sheetCsvFileName, sheetToCsv } from '@/features/sheet/sheet-csv';
import type { SheetModel } from '@/features/sheet/sheet.types';
import { CAUTION_LINES } from '@/components/Cautions';

const HYPERLINK = '=HYPERLINK("http://x","y")';

/** A small sheet (the demo compound is fictional; the numbers are arbitrary test data, not results). */
function model(label = 'Demorazine mesylate (1:1)'): SheetModel {
  return {
    projectName: 'Screen A',
    compound: { name: 'Demorazine (fictional)', facts: [] },
    generatedAt: '2026-12-01T12:00:00.000Z',
    appVersion: '0.1.0',
    settings: [],
    weights: [],
    columns: [
      { key: 'dpka', label: 'ΔpKa', unit: null, kind: 'number', group: 'formation' },
      { key: 'solH', label: 'ΔH_sol', unit: 'kJ/mol', kind: 'number', group: 'energetics' },
      { key: 'verdict', label: 'Verdict', unit: null, kind: 'text', group: 'formation' },
    ],
    rows: [
      {
        id: 'a',
        rank: 1,
        label,
        cells: {
          dpka: { value: 9.7, uncertainty: 0.3, origin: 'input' },
          solH: { value: -12.345678901, uncertainty: 25, origin: 'estimated' },
          verdict: { value: 'salt expected' },
        },
        flags: ['-low pH_max'],
        reasons: ['large ΔpKa', 'light counter-ion, "cheap"'],
        worstExcipient: {
          name: 'Magnesium stearate',
          probability: 0.987654321,
          words: 'conversion likely',
        },
      },
      {
        id: 'b',
        rank: 2,
        label: 'Demorazine chloride (1:1)',
        cells: {
          dpka: { value: 0.1 + 0.2, origin: 'input' },
          solH: { value: null },
          verdict: { value: null },
        },
        flags: [],
        reasons: [],
      },
    ],
    confidence: [],
    notes: [],
    solubility: null,
    energyCycles: [],
  };
}

function parse(csv: string): unknown[][] {
  const out = Papa.parse<unknown[]>(csv, {
    dynamicTyping: true,
    skipEmptyLines: false,
    delimiter: ',',
    newline: '\r\n',
  });
  expect(out.errors).toEqual([]);
  return out.data;
}

describe('formula neutralisation (OWASP "CSV Injection")', () => {
  // OWASP CSV Injection: cells beginning with =, +, -, @, tab (0x09) or carriage return (0x0D).
  it.each(['=1+1', '+1', '-1+2', '@SUM(A1)', '\t=1', '\r=1', HYPERLINK])(
    'prefixes a single quote to %j',
    (text) => {
      expect(neutralizeCsvText(text)).toBe(`'${text}`);
    },
  );

  it('also catches U+2212 minus, full-width forms and leading spaces before a trigger (our hardening)', () => {
    for (const t of [
      '\u2212 1',
      '\uFF1D1',
      '\uFF0B1',
      '\uFF0D1',
      '\uFF201',
      '  =1+1',
      '\u00A0@x',
    ]) {
      expect(isFormulaLike(t)).toBe(true);
    }
  });

  it('leaves ordinary text alone', () => {
    for (const t of [
      '',
      'Mesylate',
      'salt expected',
      '1:1',
      'a=b',
      "'quoted",
      ' plain',
      '3-methyl',
    ]) {
      expect(neutralizeCsvText(t)).toBe(t);
    }
  });

  it('never lets any text reach the file starting with a trigger (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (s) => {
        const out = neutralizeCsvText(s);
        expect(FORMULA_TRIGGERS.includes(out[0] ?? '')).toBe(false);
        expect(out === s || out === `'${s}`).toBe(true);
      }),
    );
  });
});

describe('comparison CSV', () => {
  it('starts with a header that carries units, then one row per candidate', () => {
    const rows = parse(sheetToCsv(model()));
    expect(rows[0]).toEqual([
      'Rank',
      'Candidate',
      'ΔpKa',
      'ΔpKa uncertainty (1 sigma)',
      'ΔpKa origin',
      'ΔH_sol (kJ/mol)',
      'ΔH_sol uncertainty (1 sigma) (kJ/mol)',
      'ΔH_sol origin',
      'Verdict',
      'Flags',
      'Reasons',
      // added at the end so the earlier columns keep their places
      'Worst excipient',
      'Worst excipient P(conversion) (0-1)',
      'Worst excipient risk',
    ]);
    expect(csvHeader(model().columns)).toHaveLength(14);
    expect(rows[1]).toEqual([
      1,
      'Demorazine mesylate (1:1)',
      9.7,
      0.3,
      'input',
      // Precision follows the 1σ (roundToUncertainty): σ 25 starts with a 2, so two significant
      // figures → whole units, and the value to the same place: −12.345678901 → −12 (by hand).
      -12,
      25,
      'estimated',
      'salt expected',
      "'-low pH_max",
      'large ΔpKa; light counter-ion, "cheap"',
      'Magnesium stearate',
      0.987654, // 6 significant digits
      'conversion likely',
    ]);
    // Float noise is rounded away (6 significant digits); missing values are empty cells.
    expect(rows[2]).toEqual([
      2,
      'Demorazine chloride (1:1)',
      0.3,
      null,
      'input',
      null,
      null,
      null,
      null,
      null,
      null,
      null,
      null,
      null,
    ]);
  });

  it('writes numbers bare and text quoted, with CRLF line ends (RFC 4180 §2)', () => {
    const csv = sheetToCsv(model());
    const lines = csv.split('\r\n');
    expect(lines[1]?.startsWith('1,"Demorazine mesylate (1:1)",9.7,0.3,"input",-12,25,')).toBe(
      true,
    );
    // RFC 4180 §2 rule 7: a double quote inside a quoted field is doubled.
    expect(lines[1]).toContain('"large ΔpKa; light counter-ion, ""cheap"""');
    expect(csv.includes('\n') && !/[^\r]\n/.test(csv)).toBe(true);
  });

  it('neutralises a hostile candidate name and keeps it readable', () => {
    const csv = sheetToCsv(model(HYPERLINK));
    expect(csv).toContain(`"'=HYPERLINK(""http://x"",""y"")"`);
    const rows = parse(csv);
    expect(rows[1]?.[1]).toBe(`'${HYPERLINK}`);
  });

  it('ends with the origin legend and every caution, after an empty line', () => {
    const rows = parse(sheetToCsv(model()));
    const blank = rows.findIndex((r) => r.length === 1 && r[0] === null);
    expect(blank).toBe(3);
    const footer = rows.slice(blank + 1).map((r) => r[0]);
    expect(footer[0]).toMatch(/^Comparison of Demorazine \(fictional\).*Saltsmith 0\.1\.0/);
    for (const line of CAUTION_LINES) expect(footer).toContain(`Caution: ${line}`);
  });

  it('refuses to write a non-finite number', () => {
    expect(() => csvNumber(Number.NaN)).toThrow(RangeError);
    expect(csvNumber(-0.000123456789)).toBe(-0.000123457);
  });

  it('names the file after the project and date', () => {
    expect(sheetCsvFileName('=cmd|"/c calc"!A1', '2026-12-01T00:00:00Z')).toBe(
      'cmd-c-calc-A1-comparison-2026-12-01.csv',
    );
  });
});

describe('comparison CSV: the free form and what separates the candidates', () => {
  const withExtras = (): SheetModel => ({
    ...model(),
    freeForm: {
      id: 'free-form',
      rank: null,
      label: 'Demorazine free base (no salt; read against, not ranked)',
      cells: { dpka: { value: null }, solH: { value: null }, verdict: { value: null } },
      flags: [],
      reasons: [],
    },
    separation: {
      headline: 'The order rests on tablet mass.',
      details: ['Same for every candidate: gastric D₀.'],
    },
    notes: ['salt solubility without a measurement: model estimate'],
  });

  it('writes the free form as the first row, unranked, before the ranked candidates', () => {
    const rows = parse(sheetToCsv(withExtras()));
    expect(rows[1]![0]).toBeNull();
    expect(rows[1]![1]).toBe('Demorazine free base (no salt; read against, not ranked)');
    expect(rows[2]![0]).toBe(1);
  });

  it('carries the separation line, its details and the notes after the table, before the cautions', () => {
    const csv = sheetToCsv(withExtras());
    const sep = csv.indexOf('What separates the candidates: The order rests on tablet mass.');
    expect(sep).toBeGreaterThan(0);
    expect(csv).toContain('Same for every candidate: gastric D₀.');
    expect(csv).toContain('Note: salt solubility without a measurement: model estimate');
    expect(csv.indexOf(CAUTION_LINES[0]!)).toBeGreaterThan(sep);
  });
});
