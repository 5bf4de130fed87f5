import type { Estimate } from '../result';
import { getThermoIon, organicIonFromFormula, solutionEnthalpyNumbersKJ } from '../thermo';
import type { ThermoIon } from '../thermo';

/**
 * The enthalpy of solution ΔH_sol of each candidate salt from the thermochemistry engine (Hess cycle:
 * lattice enthalpy + hydration enthalpies), used by the K_sp estimate only *relative* to the other
 * candidates of the same drug ion (ksp-estimate.ts). Errors (an ion the engine cannot size) give null,
 * so the candidate falls back to the anchor-only estimate and says so.
 */
export interface ThermoDrugIon {
  /** Hill formula of the drug ion (protonated base or deprotonated acid). */
  formula: string;
  charge: number;
  rings: { aromatic: number; nonAromatic: number };
}

export interface ThermoCounterIon {
  id: string;
  thermoId?: string;
  formula: string;
  rings: { aromatic: number; nonAromatic: number };
}

/** The drug ion as the thermochemistry engine sees it (additive volume estimate). Build once per screen. */
export function drugThermoIon(d: ThermoDrugIon): ThermoIon {
  return organicIonFromFormula(d.formula, d.charge, d.rings, { label: 'drug ion' });
}

/**
 * Counter-ions built from their formula, memoised: the same for every drug, so a batch builds each
 * once. Keyed by everything the build reads; bounded; the objects are frozen so no caller can change
 * what the next one gets.
 */
const COUNTER_ION_MEMO_LIMIT = 512;
const counterIonMemo = new Map<string, ThermoIon>();

function counterThermoIon(c: ThermoCounterIon, ionCharge: number, ionFormula: string): ThermoIon {
  const bundled = getThermoIon(c.thermoId ?? c.id);
  if (bundled && bundled.charge === ionCharge) return bundled;
  const formula = ionFormula || c.formula;
  const key = `${c.thermoId ?? ''}|${c.id}|${ionCharge}|${formula}|${c.rings.aromatic}|${c.rings.nonAromatic}`;
  let ion = counterIonMemo.get(key);
  if (!ion) {
    ion = Object.freeze(organicIonFromFormula(formula, ionCharge, c.rings, { label: c.id }));
    if (counterIonMemo.size >= COUNTER_ION_MEMO_LIMIT) counterIonMemo.clear();
    counterIonMemo.set(key, ion);
  }
  return ion;
}

/**
 * ΔH_sol per formula unit (kJ/mol) of D_m X_n — value, 1σ, method and sources as estimateSaltThermo
 * with `method: 'auto'` gives them, without the cycle's notes — or null with the reason the engine gave.
 */
export function candidateSolutionEnthalpyKJ(
  drug: ThermoDrugIon | ThermoIon,
  counterIon: ThermoCounterIon,
  stoichiometry: {
    drugPerSalt: number;
    counterIonPerSalt: number;
    ionCharge: number;
    ionFormula?: string;
  },
): { solutionEnthalpyKJ: Estimate | null; reason: string | null } {
  try {
    const d = 'shape' in drug ? drug : drugThermoIon(drug);
    const x = counterThermoIon(
      counterIon,
      stoichiometry.ionCharge,
      stoichiometry.ionFormula ?? counterIon.formula,
    );
    const drugIsCation = drug.charge > 0;
    // the value, 1σ and sources of estimateSaltThermo(…, method 'auto').solutionEnthalpyKJ, without
    // the cycle's notes (a screen reads the numbers; the Energetics area runs estimateSaltThermo)
    const e = solutionEnthalpyNumbersKJ({
      cation: drugIsCation ? d : x,
      anion: drugIsCation ? x : d,
      cationsPerFormula: drugIsCation ? stoichiometry.drugPerSalt : stoichiometry.counterIonPerSalt,
      anionsPerFormula: drugIsCation ? stoichiometry.counterIonPerSalt : stoichiometry.drugPerSalt,
    });
    if (!Number.isFinite(e.value) || !Number.isFinite(e.uncertainty))
      return { solutionEnthalpyKJ: null, reason: 'the thermochemistry gave no finite ΔH_sol' };
    return { solutionEnthalpyKJ: e, reason: null };
  } catch (err) {
    return { solutionEnthalpyKJ: null, reason: err instanceof Error ? err.message : String(err) };
  }
}
