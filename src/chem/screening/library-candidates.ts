import { saltStoichiometryFromCharges } from '../compound/salt-stoichiometry';
import type { CounterIon } from '../library/counter-ion.types';
import type { ThermoIon } from '../thermo';
import { DEFAULT_DELTA_PKA_BANDS, saltDeltaPka, type DeltaPkaBands } from './delta-pka';
import { drugProtolyte } from './ph-profile';
import { saltLabel } from './salt-label';
import { counterIonProtolyte } from './screen/counter-ion-protolyte';
import type { ScreeningCandidate } from './screen/screen.types';
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
  drug: {
    kind: 'base' | 'acid';
    ionCharge: number;
    pKas?: readonly number[];
    thermo?: ThermoDrugIon | null;
  },
  opts: {
    firstStoichiometryOnly?: boolean;
    keepCocrystalBand?: boolean;
    bands?: DeltaPkaBands;
    skipped?: { id: string; label: string; deltaPka: number }[];
  } = {},
): ScreeningCandidate[] {
  const bands = opts.bands ?? DEFAULT_DELTA_PKA_BANDS;
  const drugP =
    drug.pKas && drug.pKas.length > 0
      ? drugProtolyte({ kind: drug.kind, pKas: drug.pKas, ionCharge: drug.ionCharge })
      : null;
  const want = drug.kind === 'base' ? 'anion' : 'cation';
  let dIon: ThermoIon | null = null;
  if (drug.thermo) {
    try {
      dIon = drugThermoIon(drug.thermo);
    } catch {
      dIon = null;
    }
  }
  const out: ScreeningCandidate[] = [];
  for (const ion of ions) {
    if (ion.kind !== want) continue;
    const seen = new Set<string>();
    const list = opts.firstStoichiometryOnly
      ? ion.stoichiometries.slice(0, 1)
      : ion.stoichiometries;
    for (const st of list) {
      const { drugPerSalt: m, counterIonPerSalt: n } = saltStoichiometryFromCharges(
        drug.ionCharge,
        st.ionCharge,
      );
      if (m > 4 || n > 4) continue;
      const key = `${m}:${n}:${st.ionCharge}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const own = m === st.drugPerSalt && n === st.counterIonPerSalt ? st.label : undefined;
      const label = saltLabel(ion.name, { label: own, drugPerSalt: m, counterIonPerSalt: n });
      const stoich = {
        label,
        drugPerSalt: m,
        counterIonPerSalt: n,
        ionCharge: st.ionCharge,
        ionMolarMassGPerMol: st.ionMolarMassGPerMol,
        pKaIndex: st.pKaIndex,
      };
      const id = `${ion.id}:${m}:${n}${ion.stoichiometries.length > 1 && seen.size > 1 ? `:${st.ionCharge}` : ''}`;
      if (drugP && !opts.keepCocrystalBand) {
        let d: number | null = null;
        try {
          d = saltDeltaPka(drugP, drug.ionCharge, counterIonProtolyte(ion, stoich), st.ionCharge);
        } catch {
          d = null;
        }
        if (d !== null && d < bands.cocrystalBelow) {
          opts.skipped?.push({ id, label, deltaPka: d });
          continue;
        }
      }
      const thermo = dIon
        ? candidateSolutionEnthalpyKJ(
            dIon,
            { id: ion.id, thermoId: ion.thermoId, formula: st.ionFormula, rings: ion.rings },
            {
              drugPerSalt: m,
              counterIonPerSalt: n,
              ionCharge: st.ionCharge,
              ionFormula: st.ionFormula,
            },
          ).solutionEnthalpyKJ
        : null;
      out.push({
        id,
        counterIon: ion,
        stoichiometry: stoich,
        hydrateWater: 0,
        measurements: [],
        solutionEnthalpyKJ: thermo,
      });
    }
  }
  return out;
}
