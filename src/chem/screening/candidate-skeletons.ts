import { saltStoichiometryFromCharges } from '../compound/salt-stoichiometry';
import { getCounterIon } from '../library';
import type { CounterIon } from '../library/counter-ion.types';
import { saltLabel } from './salt-label';
import { counterIonProtolyte } from './screen/counter-ion-protolyte';
import type { ScreeningStoichiometry } from './screen/screen.types';
import type { Protolyte } from './speciation';

/**
 * What a library counter-ion contributes to a candidate for a drug ion of a given charge, whatever the
 * drug: its stoichiometries re-balanced for that charge, each with the candidate's id and label and the
 * counter-ion as a protolyte. The same for every compound of a batch with that drug-ion charge, so it
 * is built once per bundled ion and charge (bounded by the library's size times the few charges) and
 * never keyed on the compound. Ions that are not the bundled objects (in-house ions) are built afresh.
 */
export interface CandidateSkeleton {
  readonly id: string;
  readonly label: string;
  readonly st: LibraryStoichiometry;
  /** Frozen: shared by every candidate built from this skeleton. */
  readonly stoich: Readonly<ScreeningStoichiometry>;
  /** The counter-ion as a protolyte, or the error building it gave. */
  readonly protolyte: { ok: true; value: Protolyte } | { ok: false; error: unknown };
}

export type LibraryStoichiometry = CounterIon['stoichiometries'][number];

const skeletonMemo = new WeakMap<CounterIon, Map<number, readonly CandidateSkeleton[]>>();
/**
 * A bundled skeleton's (frozen) stoichiometry object carries, under this symbol (not enumerable: no
 * copy, key list or JSON shows it), the ion and skeleton it belongs to — read for every candidate of
 * every screen, a property is cheaper to find than a WeakMap entry.
 */
const SKELETON_OF = Symbol('candidate skeleton');
interface SkeletonTag {
  ion: CounterIon;
  skeleton: CandidateSkeleton;
}
type Tagged = { [SKELETON_OF]?: SkeletonTag };

/**
 * An ion's stoichiometries re-balanced for the drug ion's charge (at most 4 of either ion), each
 * charge once, with the candidate id and label.
 */
export function candidateSkeletons(
  ion: CounterIon,
  drugCharge: number,
  firstStoichiometryOnly: boolean,
): readonly CandidateSkeleton[] {
  if (getCounterIon(ion.id) !== ion)
    return buildSkeletons(ion, drugCharge, firstStoichiometryOnly, false);
  let byCharge = skeletonMemo.get(ion);
  if (!byCharge) skeletonMemo.set(ion, (byCharge = new Map()));
  const key = drugCharge * 2 + (firstStoichiometryOnly ? 1 : 0);
  let out = byCharge.get(key);
  if (!out) {
    out = Object.freeze(buildSkeletons(ion, drugCharge, firstStoichiometryOnly, true));
    byCharge.set(key, out);
  }
  return out;
}

function buildSkeletons(
  ion: CounterIon,
  drugCharge: number,
  firstStoichiometryOnly: boolean,
  tagged: boolean,
): CandidateSkeleton[] {
  const seen = new Set<string>();
  const list = firstStoichiometryOnly ? ion.stoichiometries.slice(0, 1) : ion.stoichiometries;
  const out: CandidateSkeleton[] = [];
  for (const st of list) {
    const { drugPerSalt: m, counterIonPerSalt: n } = saltStoichiometryFromCharges(
      drugCharge,
      st.ionCharge,
    );
    if (m > 4 || n > 4) continue;
    const key = `${m}:${n}:${st.ionCharge}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const own = m === st.drugPerSalt && n === st.counterIonPerSalt ? st.label : undefined;
    const label = saltLabel(ion.name, { label: own, drugPerSalt: m, counterIonPerSalt: n });
    const stoich: ScreeningStoichiometry = {
      label,
      drugPerSalt: m,
      counterIonPerSalt: n,
      ionCharge: st.ionCharge,
      ionMolarMassGPerMol: st.ionMolarMassGPerMol,
      pKaIndex: st.pKaIndex,
    };
    const id = `${ion.id}:${m}:${n}${ion.stoichiometries.length > 1 && seen.size > 1 ? `:${st.ionCharge}` : ''}`;
    const skeleton = { id, label, st, stoich, protolyte: protolyteOf(ion, stoich) };
    if (tagged) {
      const tag: SkeletonTag = { ion, skeleton };
      Object.defineProperty(stoich, SKELETON_OF, { value: tag, enumerable: false });
    }
    Object.freeze(stoich);
    out.push(skeleton);
  }
  return out;
}

function protolyteOf(
  ion: CounterIon,
  stoich: ScreeningStoichiometry,
): CandidateSkeleton['protolyte'] {
  try {
    const value = counterIonProtolyte(ion, stoich);
    Object.freeze(value.pKas);
    return { ok: true, value: Object.freeze(value) };
  } catch (error) {
    return { ok: false, error };
  }
}

/**
 * The counter-ion as a protolyte for a candidate: the skeleton's, when the candidate carries a
 * skeleton's stoichiometry object and the same ion object; else built (counterIonProtolyte).
 * Throws what counterIonProtolyte throws.
 */
export function candidateProtolyte(
  ion: CounterIon | Parameters<typeof counterIonProtolyte>[0],
  stoich: ScreeningStoichiometry,
): Protolyte {
  const hit = (stoich as Tagged)[SKELETON_OF];
  if (!hit || hit.ion !== ion) return counterIonProtolyte(ion, stoich);
  const p = hit.skeleton.protolyte;
  if (p.ok) return p.value;
  throw p.error;
}
