import { ChemInputError } from '../../result';
import { requireAscendingPkas, type Protolyte } from '../speciation';
import type { ScreeningCounterIon, ScreeningStoichiometry } from './screen.types';

/**
 * The counter-ion as a protolyte. The fully protonated charge follows from the stoichiometry's
 * limiting pKa index where the library gives it (anion: top = k + z + 1; cation: top = k + z),
 * else from the kind (an acid HₙX is neutral when fully protonated; a base with n sites is +n).
 */
export function counterIonProtolyte(
  ion: ScreeningCounterIon,
  st: ScreeningStoichiometry,
): Protolyte {
  const pKas = requireAscendingPkas(
    `${ion.id}.pKas`,
    ion.pKas.map((p) => p.value),
  );
  let top: number;
  if (pKas.length === 0) top = st.ionCharge;
  else if (st.pKaIndex !== undefined && st.pKaIndex !== null) {
    top = ion.kind === 'anion' ? st.pKaIndex + st.ionCharge + 1 : st.pKaIndex + st.ionCharge;
  } else top = ion.kind === 'anion' ? 0 : pKas.length;
  const idx = top - st.ionCharge;
  if (idx < 0 || idx > pKas.length) {
    throw new ChemInputError(
      `${ion.id}.stoichiometry`,
      `charge ${st.ionCharge} does not fit the ion's ${pKas.length} pKa value(s)`,
      'a charge state the pKa list can reach',
    );
  }
  return { pKas, mostProtonatedCharge: top };
}
