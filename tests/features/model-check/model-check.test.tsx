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

describe('Model check: the salt-solubility model on drugs it never saw (issue 10)', () => {
  it('shows the leave-one-drug-out figures of every variant with the anchor’s beside them, and one parity plot per series', async () => {
    const { SALT_SOLUBILITY_VARIANTS, SALT_SOLUBILITY_SERIES, SALT_SOLUBILITY_MODEL } =
      await import('@/chem');
    render(<ModelCheckArea />);
    const table = screen.getByRole('table', { name: /Leave-one-drug-out figures/ });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(SALT_SOLUBILITY_VARIANTS.length);
    const inUse = rows.find((r) => /in use/.test(r.textContent ?? ''))!;
    const shipped = SALT_SOLUBILITY_VARIANTS.find((v) => v.id === SALT_SOLUBILITY_MODEL.id)!;
    expect(within(inUse).getByText(shipped.rmse!.toFixed(2))).toBeInTheDocument();
    expect(within(inUse).getByText(shipped.anchorRmse!.toFixed(2))).toBeInTheDocument();
    const plots = screen.getAllByRole('img', { name: /salts, ρ/ });
    expect(plots).toHaveLength(SALT_SOLUBILITY_SERIES.filter((s) => s.salts.length >= 3).length);
  });
});
