import { basisWords, type SaltSolubilityBasis } from './salt-water-basis';

/**
 * The notes attached to a chosen K_sp and the assumptions a screen is read with: words only, built
 * from numbers the steps computed (see screen-reasons.ts for the reasons and flags of each row).
 */

export function measuredKspNotes(
  ph: number | null,
  measuredAtC: number | null,
  screenedAtC: number,
): string[] {
  const notes = [
    ph === null
      ? 'pH of the saturated solution not recorded: ions taken as fully ionised'
      : `from the solubility at pH ${ph}`,
    'assumes the salt (not the free form) was the solid at equilibrium',
  ];
  if (measuredAtC !== null) {
    notes.push(
      `measured at ${measuredAtC.toFixed(0)} °C, screening at ${screenedAtC.toFixed(0)} °C`,
    );
  }
  return notes;
}

/**
 * One line per distinct basis the screen's salt solubilities rest on, written from the bases the rows
 * actually carry (salt-water-basis.ts): a model, anchor or fusion step no row used is never named.
 */
export function saltSolubilityAssumptions(bases: readonly SaltSolubilityBasis[]): string[] {
  const lines = new Map<string, string>();
  for (const b of bases) {
    const words = basisWords(b);
    if (lines.has(words)) continue;
    lines.set(
      words,
      b.origin === 'measured'
        ? `salt solubility where measured: ${words}`
        : `salt solubility without a measurement (K_sp, pH_max and dose numbers follow from it; screening figures): ${words}`,
    );
  }
  return [...lines.values()];
}

/** The assumptions a screen is read with, after those of the free-form profile. */
export function screenAssumptions(
  temperatureC: number,
  checksHydrochloride: boolean,
  bases: readonly SaltSolubilityBasis[] = [],
): string[] {
  return [
    `temperature ${temperatureC.toFixed(0)} °C for the estimates; pKa values at 25 °C`,
    ...saltSolubilityAssumptions(bases),
    'dose numbers use the equilibrium solubility of the less soluble solid at each pH, in free-form equivalents, 250 mL (ICH M9); transient supersaturation from a dissolving salt is not modelled',
    checksHydrochloride
      ? 'in gastric medium a base’s salts are also checked against conversion to the hydrochloride (with its own K_sp and the medium’s chloride)'
      : 'in gastric medium only the candidate’s own counter-ion is counted as a common ion (no 1:1 hydrochloride in the screen to check conversion against)',
  ];
}
