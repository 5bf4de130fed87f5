import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { drugIon, getCounterIon, screenCompound, type ScreeningCandidate } from '@/chem';
import { sheetExcipientMatrix, sheetWorstExcipient } from '@/features/sheet/sheet-excipients';
import { SheetExcipients } from '@/features/sheet/components/SheetExcipients';

// A made-up base (pKa 8): its salts' pH_max lie below 8, below magnesium stearate's 8–10 and far
// above citric acid's 2.2 — the expected words follow from those published ranges, not from the inputs.
const cand = (id: string): ScreeningCandidate => {
  const ion = getCounterIon(id)!;
  return {
    id,
    counterIon: ion,
    stoichiometry: ion.stoichiometries[0]!,
    hydrateWater: 0,
    measurements: [],
  };
};
const screen0 = screenCompound({
  compound: {
    name: 'test base',
    kind: 'base',
    pKas: [{ value: 8, origin: 'measured' }],
    ionCharge: 1,
    intrinsicSolubilityMgPerMl: 0.02,
    meltingPointC: null,
    logP: null,
    doseMg: 100,
  },
  drugIon: drugIon({ kind: 'base', ionCharge: 1, formula: 'C17H20N2O2' }),
  candidates: [cand('chloride'), cand('mesylate')],
  settings: { excipients: ['magnesium-stearate', 'citric-acid'] },
});

describe('the sheet’s excipient section', () => {
  it('is absent without excipients and lists the grid in table order with sources when chosen', () => {
    expect(sheetExcipientMatrix([], screen0.rows, (r) => r.label)).toBeNull();
    const m = sheetExcipientMatrix(
      ['magnesium-stearate', 'citric-acid'],
      screen0.rows,
      (r) => r.label,
    )!;
    // Table order (acidifiers after lubricants in excipients.data.ts), whatever the order chosen.
    expect(m.excipients.map((e) => e.id)).toEqual(['magnesium-stearate', 'citric-acid']);
    expect(m.excipients[1]!.phText).toBe('2.2 (±0.5)');
    render(<SheetExcipients matrix={m} />);
    const table = screen.getByRole('table');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    for (const r of rows) {
      const cells = within(r).getAllByRole('cell');
      expect(cells[0]).toHaveTextContent('conversion likely');
      expect(cells[1]).toHaveTextContent('conversion unlikely');
    }
    expect(
      screen.getByText(/Magnesium stearate: pH 8.0–10.0, aqueous slurry. Source: from memory/),
    ).toBeInTheDocument();
    expect(screen.getByText(/share of the blend/)).toBeInTheDocument();
    expect(sheetWorstExcipient(screen0.rows[0]!)).toMatchObject({
      name: 'Magnesium stearate',
      words: 'conversion likely',
    });
  });
});
