import type { CriterionKey } from '@/chem';

/** The ranking criteria as the workbench names them, with what a high score means. */
export const CRITERION_TEXT: Record<CriterionKey, { label: string; means: string }> = {
  saltFormation: { label: 'Salt formation (ΔpKa)', means: 'proton transfer likely (ΔpKa rule)' },
  solubility: {
    label: 'Dose dissolves, pH 1.2–6.8',
    means: 'dose number ≤ 1 at the worst pH (ICH M9)',
  },
  gastric: {
    label: 'Dose dissolves in gastric fluid',
    means: 'dose number ≤ 1 in chloride-containing gastric medium',
  },
  disproportionation: {
    label: 'Stays a salt in the tablet',
    means:
      'pH_max on the salt side of the microenvironment pH (stated, assumed, or the chosen excipients’)',
  },
  massCost: {
    label: 'Tablet mass',
    means: 'high active fraction: little counter-ion mass per dose',
  },
  acceptability: {
    label: 'Counter-ion class',
    means: 'class 1 counter-ion (physiological occurrence)',
  },
  hygroscopicity: {
    label: 'Moisture uptake (measured)',
    means: 'low mass gain at 80 % RH (Ph. Eur. 5.11)',
  },
};
