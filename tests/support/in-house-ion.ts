import { buildCustomCounterIon, type CounterIon } from '@/chem';

/**
 * A valid in-house anion for tests, built the way the in-house form builds one. The numbers are
 * test inputs (an invented lab ion), not reference data.
 */
export function inHouseIon(id: string, name = 'In-house sulfonate', pKa = -1.5): CounterIon {
  return buildCustomCounterIon(
    {
      name,
      kind: 'anion',
      formula: 'C3H7O3S',
      charge: -1,
      ionSmiles: '',
      pKas: [pKa],
      pKaSource: 'test entry',
      acceptabilityClass: null,
      tradeNote: '',
      aromaticRings: 0,
      nonAromaticRings: 0,
    },
    id,
  );
}

/** The same ion as a plain record payload (what IndexedDB and project files hold). */
export const inHouseIonPayload = (
  id: string,
  name?: string,
  pKa?: number,
): Record<string, unknown> =>
  JSON.parse(JSON.stringify(inHouseIon(id, name, pKa))) as Record<string, unknown>;
