import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { validationReport } from '@/chem';
import { ModelCheckArea } from '@/features/model-check/components/ModelCheckArea';

describe('Model check area', () => {
  it('lists every model of the engine’s validation report with its n and errors', () => {
    const report = validationReport();
    render(<ModelCheckArea />);
    const table = screen.getByRole('table', { name: /Validation of each model/ });
    const body = within(table).getAllByRole('row').slice(1);
    expect(body).toHaveLength(report.length);
    const first = report[0]!;
    const row = body[0]!;
    expect(
      within(row).getByText(`${first.meanAbsPercentError.toFixed(1)} %`, { selector: 'td' }),
    ).toBeInTheDocument();
    expect(within(row).getByText(String(first.n), { selector: 'td' })).toBeInTheDocument();
    // the chart has one labelled figure with the same number of model/group pairs
    expect(
      screen.getByRole('img', {
        name: new RegExp(`${report.length} model/set pairs in the table`),
      }),
    ).toBeInTheDocument();
  });

  it('opens the reference values of a model, each with its source', async () => {
    const user = userEvent.setup();
    const report = validationReport();
    render(<ModelCheckArea />);
    const buttons = screen.getAllByRole('button', { name: /Show \d+ values/ });
    await user.click(buttons[0]!);
    const inner = screen.getByRole('table', { name: /Reference values for/ });
    expect(within(inner).getAllByRole('row')).toHaveLength(report[0]!.rows.length + 1);
    expect(
      within(inner).getAllByText(report[0]!.rows[0]!.source, { selector: 'td' }).length,
    ).toBeGreaterThan(0);
  });
});

describe('Model check: the salt-solubility evidence leads, with the no-descriptor baseline beside every variant (issues 10, 16)', () => {
  it('shows the nested procedure and every variant with the baseline’s figures beside them, and one parity plot per series', async () => {
    const { SALT_SOLUBILITY_VARIANTS, SALT_SOLUBILITY_SERIES, SALT_SOLUBILITY_SELECTION } =
      await import('@/chem');
    render(<ModelCheckArea />);
    const table = screen.getByRole('table', { name: /Leave-one-drug-out figures/ });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(SALT_SOLUBILITY_VARIANTS.length + 1);
    const inUse = rows.find((r) => /In use/.test(r.textContent ?? ''))!;
    const sel = SALT_SOLUBILITY_SELECTION;
    expect(within(inUse).getByText(sel.rmse!.toFixed(3))).toBeInTheDocument();
    expect(within(inUse).getByText(sel.baselineRmse!.toFixed(3))).toBeInTheDocument();
    for (const r of rows) {
      // the baseline's RMSE stands in every row (same folds)
      expect(within(r).getAllByText(sel.baselineRmse!.toFixed(3)).length).toBeGreaterThan(0);
    }
    const plots = screen.getAllByRole('img', { name: /salts, ρ/ });
    expect(plots).toHaveLength(SALT_SOLUBILITY_SERIES.filter((s) => s.salts.length >= 3).length);
  });

  it('says in words what the descriptors add, the σ split, the fusion check and the divalent-cation evidence', async () => {
    const { descriptorGainWords, sigmaSplitWords, fusionCheckWords, divalentCationWords } =
      await import('@/chem');
    render(<ModelCheckArea />);
    for (const words of [
      descriptorGainWords(),
      sigmaSplitWords(),
      fusionCheckWords(),
      divalentCationWords(),
    ])
      expect(screen.getByText(words)).toBeInTheDocument();
  });

  it('leads with the salt-solubility evidence; the lattice models sit under a disclosure after it', () => {
    const { container } = render(<ModelCheckArea />);
    const salt = screen.getByRole('heading', { name: /Salt solubility in water/ });
    const details = container.querySelector('details')!;
    expect(details).not.toBeNull();
    expect(salt.compareDocumentPosition(details) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(details.open).toBe(false);
  });
});

describe('Model check: the engine check, folded at the end (issue 19)', () => {
  it('keeps the NaCl/KBr lattice enthalpies folded after the salt-solubility evidence, beside their Born–Haber values', async () => {
    const user = userEvent.setup();
    const { container } = render(<ModelCheckArea />);
    const fold = container.querySelector('details.engine-check') as HTMLDetailsElement;
    expect(fold).not.toBeNull();
    expect(fold.open).toBe(false);
    // It comes after every other section: the evidence the ranking rests on reads first.
    const sections = Array.from(container.querySelectorAll('.confidence-area > *'));
    expect(sections[sections.length - 1]).toBe(fold);
    await user.click(within(fold).getByText(/Engine check/));
    expect(fold.open).toBe(true);
    const table = within(fold).getByRole('table', { name: /Engine check/ });
    const nacl = within(table).getByRole('rowheader', { name: 'NaCl' }).closest('tr')!;
    const cells = within(nacl).getAllByRole('cell');
    // Born–Haber ΔH_L(NaCl) = 787 kJ/mol (CRC Handbook, "Lattice energies" table); Kapustinskii's
    // equation is good to a few per cent on alkali halides (Kapustinskii 1956), so the engine's figure
    // shown beside it must fall within 5 % of it.
    const bornHaber = Number(cells[3]!.textContent);
    expect(Math.abs(bornHaber - 787)).toBeLessThanOrEqual(3);
    const estimate = Number(cells[2]!.textContent!.split('±')[0]);
    expect(Math.abs(estimate - 787) / 787).toBeLessThan(0.05);
  });
});
