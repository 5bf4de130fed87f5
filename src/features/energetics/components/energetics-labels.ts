import { candidateLabel } from '@/screening-data/candidate-label';
import type { ProjectScreening } from '@/screening-data/compute-screening';

/** A kJ/mol value rounded to a whole number, with a true minus sign. */
export const kj = (x: number) => x.toFixed(0).replace(/^-/, '−');

/** A candidate's display label, e.g. its counter-ion and stoichiometry. */
export function labelOf(data: ProjectScreening, id: string): string {
  const row = data.screen.rows.find((r) => r.id === id);
  if (!row) return data.ionNames[id] ?? id;
  return candidateLabel(
    {
      ionId: row.counterIonId,
      drugPerSalt: row.drugPerSalt,
      counterIonPerSalt: row.counterIonPerSalt,
    },
    data.ionNames[id],
  );
}

/** Drug ions per formula unit of a candidate's salt (1 when unknown). */
export function drugsPerFormula(data: ProjectScreening, id: string): number {
  return data.screen.rows.find((r) => r.id === id)?.drugPerSalt ?? 1;
}
