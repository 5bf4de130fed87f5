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

/** The assumptions a screen is read with, after those of the free-form profile. */
export function screenAssumptions(temperatureC: number, checksHydrochloride: boolean): string[] {
  return [
    `temperature ${temperatureC.toFixed(0)} °C for the estimates; pKa values at 25 °C`,
    'K_sp without a measured salt solubility is an estimate (salt-limited solubility ~10² × S₀, shifted by relative ΔH_sol); treat its pH_max and dose numbers as screening figures',
    'dose numbers use the equilibrium solubility of the less soluble solid at each pH, in free-form equivalents, 250 mL (ICH M9); transient supersaturation from a dissolving salt is not modelled',
    checksHydrochloride
      ? 'in gastric medium a base’s salts are also checked against conversion to the hydrochloride (with its own K_sp and the medium’s chloride)'
      : 'in gastric medium only the candidate’s own counter-ion is counted as a common ion (no 1:1 hydrochloride in the screen to check conversion against)',
  ];
}
