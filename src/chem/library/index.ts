/**
 * The counter-ion library: bundled data (every value sourced), its zod schemas, search and filters,
 * ΔpKa against a compound, and the merge of in-house ions and per-project edits.
 */
import { buildCounterIon } from './build-counter-ion';
import { COUNTER_ION_ROWS } from './counter-ions.data';
import type { CounterIon } from './counter-ion.types';

export type * from './counter-ion.types';
export type { CounterIonRow } from './build-counter-ion';
export { buildCounterIon } from './build-counter-ion';
export { COUNTER_ION_ROWS } from './counter-ions.data';
export * from './counter-ion.schema';
export * from './search';
export * from './merge-library';
export * as librarySources from './sources';

/** Every bundled counter-ion, built once from {@link COUNTER_ION_ROWS}. */
export const COUNTER_IONS: readonly CounterIon[] = Object.freeze(
  COUNTER_ION_ROWS.map(buildCounterIon),
);

const byId = new Map(COUNTER_IONS.map((ion) => [ion.id, ion]));

/** A bundled counter-ion by id ('mesylate'), or undefined. */
export function getCounterIon(id: string): CounterIon | undefined {
  return byId.get(id);
}
