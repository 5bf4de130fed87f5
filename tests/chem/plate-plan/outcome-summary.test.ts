import { describe, expect, it } from 'vitest';
import { summariseOutcomes, type WellOutcome } from '@/chem';

const o = (outcome: WellOutcome['outcome'], meltingPointC: number | null = null): WellOutcome => ({
  outcome,
  meltingPointC,
  note: '',
});
const wells = [
  { well: 'A1', counterIonId: 'mesylate' },
  { well: 'A2', counterIonId: 'mesylate' },
  { well: 'A3', counterIonId: 'fumarate' },
  { well: 'A4', counterIonId: 'fumarate' },
];

describe('outcome summary per counter-ion', () => {
  it('counts wells recorded and crystalline hits, and picks the best form by merit then melting point', () => {
    const [mes, fum] = summariseOutcomes(wells, {
      A1: o('crystalline-solid', 180),
      A2: o('new-crystalline-form', 150),
      A3: o('oil-or-gum'),
    });
    expect(mes).toMatchObject({
      counterIonId: 'mesylate',
      wells: 2,
      recorded: 2,
      crystallineHits: 2,
    });
    expect(mes!.best).toEqual({ well: 'A2', outcome: 'new-crystalline-form', meltingPointC: 150 });
    expect(mes!.noCrystallineSaltYet).toBe(false);
    // fumarate: one of two wells recorded, no hit yet, but not every well recorded: not flagged
    expect(fum).toMatchObject({ recorded: 1, crystallineHits: 0, noCrystallineSaltYet: false });
  });

  it('flags "no crystalline salt yet" once every well of an ion is recorded without a crystalline hit', () => {
    const [, fum] = summariseOutcomes(wells, { A3: o('oil-or-gum'), A4: o('amorphous-solid') });
    expect(fum).toMatchObject({ recorded: 2, crystallineHits: 0, noCrystallineSaltYet: true });
    expect(fum!.best!.outcome).toBe('amorphous-solid');
  });

  it('between two crystalline solids the higher melting point is the best', () => {
    const [mes] = summariseOutcomes(wells, {
      A1: o('crystalline-solid', 160),
      A2: o('crystalline-solid', 201),
    });
    expect(mes!.best!.well).toBe('A2');
  });
});
