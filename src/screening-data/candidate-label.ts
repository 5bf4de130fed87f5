import type { CandidateRecord } from '@/persistence/records';

/** A counter-ion id as words: 'hydrogen-sulfate' → 'Hydrogen sulfate'. */
export function ionIdAsWords(ionId: string): string {
  const words = ionId.replace(/^ion_.*/, 'in-house ion').replace(/-/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** How a candidate is named on screen: the counter-ion and the salt's stoichiometry (drug:counter-ion). */
export function candidateLabel(
  c: Pick<CandidateRecord, 'ionId' | 'drugPerSalt' | 'counterIonPerSalt'>,
  ionName?: string,
): string {
  const name = ionName ?? ionIdAsWords(c.ionId);
  return `${name} (${c.drugPerSalt}:${c.counterIonPerSalt})`;
}
