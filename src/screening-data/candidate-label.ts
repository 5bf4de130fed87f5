import { getCounterIon, saltLabel } from '@/chem';
import type { CandidateRecord } from '@/persistence/records';

/** A counter-ion id as words: 'hydrogen-sulfate' → 'Hydrogen sulfate'. */
export function ionIdAsWords(ionId: string): string {
  const words = ionId.replace(/^ion_.*/, 'in-house ion').replace(/-/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/**
 * How a candidate is named on screen: the salt's trade name and its stoichiometry (drug:counter-ion),
 * e.g. 'hydrochloride (1:1)' — the core's one salt vocabulary (saltLabel), the same the CLI writes.
 */
export function candidateLabel(
  c: Pick<CandidateRecord, 'ionId' | 'drugPerSalt' | 'counterIonPerSalt'>,
  ionName?: string,
): string {
  const bundled = getCounterIon(c.ionId);
  const name = ionName ?? bundled?.name ?? ionIdAsWords(c.ionId);
  return saltLabel(name, c, bundled?.stoichiometries ?? []);
}
