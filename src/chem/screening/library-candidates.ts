import type { CounterIon } from '../library/counter-ion.types';
import type { ThermoIon } from '../thermo';
import { DEFAULT_DELTA_PKA_BANDS, saltDeltaPka, type DeltaPkaBands } from './delta-pka';
import { drugProtolyte } from './ph-profile';
import {
  candidateSkeletons,
  type CandidateSkeleton,
  type LibraryStoichiometry,
} from './candidate-skeletons';
import type { ScreeningCandidate, ScreeningStoichiometry } from './screen/screen.types';
import type { Estimate } from '../result';
import type { Protolyte } from './speciation';
import { candidateSolutionEnthalpyKJ, drugThermoIon, type ThermoDrugIon } from './thermo-link';

/**
 * Candidates for a screen from library counter-ions: every listed stoichiometry of an ion of the
 * opposite charge, re-balanced for the drug ion's charge (a dibasic drug takes two chlorides), with
 * the thermochemistry engine's ΔH_sol attached when the drug ion's formula is known.
 * When the drug's pKa values are given, stoichiometries whose ΔpKa falls in the cocrystal band
 * (Cruz-Cabeza 2012: < −1 by default) are left out and listed in `skipped` (unless `keepCocrystalBand`).
 */
export function candidatesFromLibrary(
  ions: readonly CounterIon[],
  drug: LibraryDrug,
  opts: {
    firstStoichiometryOnly?: boolean;
    keepCocrystalBand?: boolean;
    bands?: DeltaPkaBands;
    skipped?: { id: string; label: string; deltaPka: number }[];
    /**
     * When given, ΔH_sol is not computed here: each candidate's computation is put in this map under
     * its id, to run only if asked for (a batch writing its best rows only, screen-top.ts); the
     * candidates then carry `solutionEnthalpyKJ: null`.
     */
    solutionEnthalpyLater?: Map<string, () => Estimate | null>;
  } = {},
): ScreeningCandidate[] {
  const bands = opts.bands ?? DEFAULT_DELTA_PKA_BANDS;
  const drugP =
    drug.pKas && drug.pKas.length > 0
      ? drugProtolyte({ kind: drug.kind, pKas: drug.pKas, ionCharge: drug.ionCharge })
      : null;
  const want = drug.kind === 'base' ? 'anion' : 'cation';
  const dIon = drugThermoIonOrNull(drug.thermo);
  const out: ScreeningCandidate[] = [];
  for (const ion of ions) {
    if (ion.kind !== want) continue;
    for (const sk of candidateSkeletons(
      ion,
      drug.ionCharge,
      opts.firstStoichiometryOnly === true,
    )) {
      const { id, label, st, stoich } = sk;
      if (drugP && !opts.keepCocrystalBand) {
        const d = deltaPkaOrNull(drugP, drug.ionCharge, sk);
        if (d !== null && d < bands.cocrystalBelow) {
          opts.skipped?.push({ id, label, deltaPka: d });
          continue;
        }
      }
      const thermo = () => (dIon ? solutionEnthalpyOf(dIon, ion, st, stoich) : null);
      if (opts.solutionEnthalpyLater) opts.solutionEnthalpyLater.set(id, thermo);
      out.push({
        id,
        counterIon: ion,
        stoichiometry: stoich,
        hydrateWater: 0,
        measurements: [],
        solutionEnthalpyKJ: opts.solutionEnthalpyLater ? null : thermo(),
      });
    }
  }
  return out;
}

/** The drug as candidatesFromLibrary reads it. */
export interface LibraryDrug {
  kind: 'base' | 'acid';
  ionCharge: number;
  pKas?: readonly number[];
  thermo?: ThermoDrugIon | null;
}

/** The drug ion for the thermochemistry engine, or null when it has none or it cannot be built. */
function drugThermoIonOrNull(thermo: ThermoDrugIon | null | undefined): ThermoIon | null {
  if (!thermo) return null;
  try {
    return drugThermoIon(thermo);
  } catch {
    return null;
  }
}

/** ΔpKa of the salt, or null when it cannot be formed from the pKa values. */
function deltaPkaOrNull(
  drugP: Protolyte,
  drugCharge: number,
  sk: CandidateSkeleton,
): number | null {
  if (!sk.protolyte.ok) return null;
  try {
    return saltDeltaPka(drugP, drugCharge, sk.protolyte.value, sk.stoich.ionCharge);
  } catch {
    return null;
  }
}

/** The thermochemistry engine's ΔH_sol of one salt, per formula unit. */
function solutionEnthalpyOf(
  dIon: ThermoIon,
  ion: CounterIon,
  st: LibraryStoichiometry,
  stoich: ScreeningStoichiometry,
): Estimate | null {
  return candidateSolutionEnthalpyKJ(
    dIon,
    { id: ion.id, thermoId: ion.thermoId, formula: st.ionFormula, rings: ion.rings },
    {
      drugPerSalt: stoich.drugPerSalt,
      counterIonPerSalt: stoich.counterIonPerSalt,
      ionCharge: st.ionCharge,
      ionFormula: st.ionFormula,
    },
  ).solutionEnthalpyKJ;
}
