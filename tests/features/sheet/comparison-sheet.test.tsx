import { describe, expect, it, vi } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { ComparisonSheet } from '@/features/sheet/components/ComparisonSheet';
import { SheetView } from '@/features/sheet/components/SheetView';
import type { SheetModel } from '@/features/sheet/sheet.types';
import { CAUTION_LINES } from '@/components/Cautions';
import { formatValue } from '@/features/sheet/sheet-format';

const IMG = '<img src=x onerror=alert(1)>';
const HYPERLINK = '=HYPERLINK("http://x","y")';

/** Arbitrary test data around the fictional demo compound (not model results). */
function model(): SheetModel {
  return {
    projectName: `Project ${IMG}`,
    compound: {
      name: `Demorazine ${IMG}`,
      facts: [
        { label: 'pKa (base)', value: 7.8 },
        { label: 'Dose', value: 200, unit: 'mg' },
      ],
    },
    generatedAt: '2026-12-01T12:00:00.000Z',
    appVersion: '0.1.0',
    settings: [{ label: 'Gastric chloride', value: 0.12, unit: 'mol/L' }],
    weights: [{ label: 'Solubility', value: 2 }],
    columns: [
      { key: 'score', label: 'Score', unit: '0–1', kind: 'number', group: 'formation' },
      { key: 'phMax', label: 'pH_max', unit: null, kind: 'number', group: 'solubility' },
      { key: 'solH', label: 'ΔH_sol', unit: 'kJ/mol', kind: 'number', group: 'energetics' },
    ],
    rows: [
      {
        id: 'r1',
        rank: 1,
        label: HYPERLINK,
        cells: {
          score: { value: 0.8 },
          phMax: { value: 4.56, uncertainty: 0.31, origin: 'estimated' },
          solH: { value: 12.5, origin: 'measured' },
        },
        flags: ['disproportionation risk'],
        reasons: ['low mass cost'],
      },
      {
        id: 'r2',
        rank: 2,
        label: IMG,
        cells: {
          phMax: { value: null },
          solH: { value: -30, uncertainty: 40, origin: 'estimated' },
        },
        flags: [],
        reasons: [],
      },
    ],
    confidence: [
      {
        label: 'Kapustinskii, alkali halides',
        n: 20,
        meanAbsPercentError: 2.345,
        maxAbsPercentError: 6.1,
        signedBiasPercent: -1.2,
      },
    ],
    notes: ['Activities taken as concentrations.'],
    solubility: null,
    energyCycles: [],
  };
}

describe('comparison sheet', () => {
  it('shows compound, date, version, settings, weights, units, uncertainties, origin marks and cautions', () => {
    render(<ComparisonSheet model={model()} />);
    expect(screen.getByTestId('sheet-compound')).toHaveTextContent(`Demorazine ${IMG}`);
    expect(screen.getByText(/Saltsmith 0\.1\.0/)).toHaveTextContent('1 December 2026');
    expect(screen.getByRole('table', { name: 'Screening settings' })).toHaveTextContent(
      'Gastric chloride0.12 mol/L',
    );
    expect(screen.getByRole('table', { name: 'Ranking weights' })).toHaveTextContent('Solubility2');
    expect(screen.getByRole('columnheader', { name: /^ΔH_sol ?\(kJ\/mol\)$/ })).toBeInTheDocument();
    const solubility = screen.getByRole('table', { name: /^Solubility across/ });
    const energetics = screen.getByRole('table', { name: /^Enthalpies/ });
    const formation = screen.getByRole('table', { name: /^Salt formation/ });
    const rowOf = (table: HTMLElement, name: string) =>
      within(table).getByRole('rowheader', { name }).closest('tr') as HTMLElement;
    const first = rowOf(solubility, HYPERLINK);
    expect(within(first).getByText(/4\.56 ± 0\.31/)).toBeInTheDocument();
    expect(within(first).getByTitle('model estimate')).toBeInTheDocument();
    expect(
      within(rowOf(energetics, HYPERLINK)).getByTitle('measured on the bench'),
    ).toBeInTheDocument();
    expect(rowOf(formation, HYPERLINK)).toHaveTextContent('disproportionation risk');
    expect(first.querySelector('[data-col="phMax"]')?.getAttribute('data-value')).toBe('4.56');
    // Every candidate appears in every table, in rank order.
    for (const t of [formation, solubility, energetics]) {
      expect(
        within(t)
          .getAllByRole('rowheader')
          .map((h) => h.textContent),
      ).toEqual([HYPERLINK, IMG]);
    }
    expect(screen.getByText('low mass cost')).toBeInTheDocument();
    const cautions = screen.getByTestId('sheet-cautions');
    for (const line of CAUTION_LINES) expect(cautions).toHaveTextContent(line);
    expect(screen.getByRole('complementary', { name: 'Cautions' })).toHaveTextContent(
      'Screening estimates only.',
    );
  });

  it('opens with the decision: the ranked candidates come before the compound and settings they rest on (issue 19)', () => {
    render(<ComparisonSheet model={model()} />);
    const ranking = screen.getByRole('heading', { name: 'Ranked candidates' });
    const settings = screen.getByRole('region', { name: 'Compound and settings' });
    // The one-line caution stays above both; the full cautions close the sheet.
    const caution = screen.getByRole('complementary', { name: 'Cautions' });
    expect(
      caution.compareDocumentPosition(ranking) & Node.DOCUMENT_POSITION_FOLLOWING,
    ).toBeTruthy();
    expect(
      ranking.compareDocumentPosition(settings) & Node.DOCUMENT_POSITION_FOLLOWING,
    ).toBeTruthy();
  });

  it('renders hostile names as inert text (no element is created from them)', () => {
    const { container } = render(<ComparisonSheet model={model()} />);
    expect(container.querySelector('img')).toBeNull();
    expect(screen.getAllByRole('rowheader', { name: IMG })).toHaveLength(3);
  });

  it('offers print and CSV download, and closes on Escape', async () => {
    const print = vi.spyOn(window, 'print').mockImplementation(() => undefined);
    const onClose = vi.fn();
    render(<SheetView model={model()} onClose={onClose} />);
    expect(document.title).toContain('salt comparison 2026-12-01');
    await userEvent.click(screen.getByRole('button', { name: 'Print or save as PDF' }));
    expect(print).toHaveBeenCalledTimes(1);
    await userEvent.keyboard('{Escape}');
    expect(onClose).toHaveBeenCalled();
    print.mockRestore();
  });

  it('prints the blocks other areas add below the sheet (the salt screen’s outcomes)', () => {
    render(
      <SheetView model={model()} onClose={() => undefined} extra={<p>screen outcomes block</p>} />,
    );
    expect(screen.getByText('screen outcomes block').closest('.sheet-overlay')).not.toBeNull();
  });

  it('formats a value to the uncertainty (at most two significant digits in the uncertainty, JCGM 100:2008 §7.2.6)', () => {
    expect(formatValue(-12.3456, 25)).toBe('\u221212 ± 25');
    expect(formatValue(4.5612, 0.31)).toBe('4.56 ± 0.31');
    expect(formatValue(0.000012346)).toBe('1.235e-5');
    expect(formatValue(123.456)).toBe('123.5');
  });
});

describe('comparison sheet: the free form and what separates the candidates', () => {
  const extras = (): SheetModel => ({
    ...model(),
    freeForm: {
      id: 'free-form',
      rank: null,
      label: 'Demorazine free base (no salt; read against, not ranked)',
      cells: {},
      flags: ['free form likely poorly soluble'],
      reasons: [],
    },
    separation: {
      headline:
        'The order rests on tablet mass; the salts’ solubilities in water are not separable.',
      details: ['Same for every candidate: gastric D₀.'],
    },
  });

  it('prints the separation line above the tables and the free form as the first row of each table', () => {
    const { container } = render(<ComparisonSheet model={extras()} />);
    expect(screen.getByText(/The order rests on tablet mass/)).toBeTruthy();
    const tables = container.querySelectorAll('table.sheet-ranking');
    expect(tables.length).toBeGreaterThan(0);
    for (const t of tables) {
      const first = t.querySelector('tbody tr')!;
      expect(first.classList.contains('sheet-free-form')).toBe(true);
      expect(first.textContent).toMatch(/free base \(no salt; read against, not ranked\)/);
    }
    // Above the tables in document order.
    const line = screen.getByText(/The order rests on tablet mass/);
    expect(
      line.compareDocumentPosition(tables[0]!) & Node.DOCUMENT_POSITION_FOLLOWING,
    ).toBeTruthy();
  });
});
