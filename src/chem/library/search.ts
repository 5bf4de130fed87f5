import type { AcceptabilityClass, CounterIon, Stoichiometry } from './counter-ion.types';

/** The compound data ΔpKa needs: acid or base, its pKa values, and the charge of its salt-forming ion. */
export interface PkaPartner {
  kind: 'base' | 'acid';
  pKas: { value: number }[];
  ionCharge: number;
}

export interface DeltaPka {
  /** ΔpKa = pKa(protonated base) − pKa(acid), in pKa units. */
  deltaPka: number;
  /** The drug pKa used (for a base, the conjugate acid's). */
  drugPka: number;
  /** The counter-ion pKa used (for a cation, its conjugate acid's). */
  ionPka: number;
  stoichiometry: Stoichiometry;
}

/**
 * ΔpKa between a compound and a counter-ion for one stoichiometry (default: the ion's first).
 * ΔpKa = pKa(protonated base) − pKa(acid) (Stahl & Wermuth 2002): for a basic drug,
 * pKa(BH⁺) − pKa(counter-acid); for an acidic drug, pKa(conjugate acid of the counter-base) − pKa(drug).
 * For a drug ion of charge ±n the n-th strongest site is used (the last proton to move limits the salt);
 * the counter-ion side uses the stoichiometry's limiting pKa. Returns null when the pair cannot form a
 * salt (base with cation, acid with anion) or when a needed pKa is missing.
 */
export function counterIonDeltaPka(
  compound: PkaPartner,
  ion: CounterIon,
  stoichiometry: Stoichiometry | undefined = ion.stoichiometries[0],
): DeltaPka | null {
  if (!stoichiometry) return null;
  if ((compound.kind === 'base') !== (ion.kind === 'anion')) return null;
  const values = compound.pKas.map((p) => p.value).filter(Number.isFinite);
  if (values.length === 0 || stoichiometry.pKaIndex === null) return null;
  const n = Math.max(1, Math.abs(compound.ionCharge));
  const ordered =
    compound.kind === 'base'
      ? [...values].sort((a, b) => b - a)
      : [...values].sort((a, b) => a - b);
  const drugPka = ordered[Math.min(n, ordered.length) - 1]!;
  const ionPka = ion.pKas[stoichiometry.pKaIndex]?.value;
  if (ionPka === undefined) return null;
  const deltaPka = compound.kind === 'base' ? drugPka - ionPka : ionPka - drugPka;
  return { deltaPka, drugPka, ionPka, stoichiometry };
}

/** `drugPerSalt:counterIonPerSalt`, e.g. "2:1" for a hemisulfate. */
export const stoichiometryKey = (s: Pick<Stoichiometry, 'drugPerSalt' | 'counterIonPerSalt'>) =>
  `${s.drugPerSalt}:${s.counterIonPerSalt}`;

export interface CounterIonFilters {
  kind?: 'anion' | 'cation';
  /** Acceptability classes to keep; 'none' keeps unclassified ions. Empty or absent keeps all. */
  classes?: (AcceptabilityClass | 'none')[];
  /** Keep ions that occur with this charge in any listed stoichiometry. */
  charge?: number;
  /** Keep ions with a stoichiometry of this key ("1:1", "2:1", "1:2", "3:1"). */
  stoichiometry?: string;
  /** False hides ions bundled only as thermochemistry references (default: shown). */
  includeReferenceIons?: boolean;
  /** With `partner`: keep ions whose best ΔpKa (over their stoichiometries) is at least this. */
  minDeltaPka?: number;
  /** The compound ΔpKa is computed against; also drops ions of the wrong kind for it when `pairedOnly`. */
  partner?: PkaPartner;
  pairedOnly?: boolean;
}

const norm = (s: string) =>
  s
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[\s\-_,′'()]+/g, '');

/** Best (largest) ΔpKa of an ion over its stoichiometries, or null. */
export function bestDeltaPka(partner: PkaPartner, ion: CounterIon): DeltaPka | null {
  let best: DeltaPka | null = null;
  for (const s of ion.stoichiometries) {
    const d = counterIonDeltaPka(partner, ion, s);
    if (d && (!best || d.deltaPka > best.deltaPka)) best = d;
  }
  return best;
}

/**
 * Search the library by name, synonym, id or formula (ion or parent), then apply the filters.
 * Matches are ordered: exact name/id/synonym/formula, then prefix, then substring; ties keep library order.
 */
export function searchCounterIons<T extends CounterIon>(
  ions: readonly T[],
  query: string,
  filters: CounterIonFilters = {},
): T[] {
  const q = norm(query ?? '');
  const scored: { ion: T; score: number; i: number }[] = [];
  ions.forEach((ion, i) => {
    const score = q === '' ? 0 : matchScore(ion, q);
    if (score < 0) return;
    if (!passes(ion, filters)) return;
    scored.push({ ion, score, i });
  });
  return scored.sort((a, b) => a.score - b.score || a.i - b.i).map((s) => s.ion);
}

function matchScore(ion: CounterIon, q: string): number {
  const names = [ion.name, ion.id, ...ion.synonyms, ion.parent.name].map(norm);
  const formulas = [
    ion.formula,
    ion.parent.formula,
    ...ion.stoichiometries.map((s) => s.ionFormula),
  ].map(norm);
  if (names.includes(q) || formulas.includes(q)) return 0;
  if (names.some((n) => n.startsWith(q))) return 1;
  if (formulas.some((f) => f.startsWith(q))) return 2;
  if (names.some((n) => n.includes(q))) return 3;
  if (formulas.some((f) => f.includes(q))) return 4;
  return -1;
}

function passes(ion: CounterIon, f: CounterIonFilters): boolean {
  if (f.kind && ion.kind !== f.kind) return false;
  if (f.includeReferenceIons === false && ion.referenceOnly) return false;
  if (f.classes && f.classes.length > 0) {
    const cls = ion.acceptabilityClass ?? 'none';
    if (!f.classes.includes(cls)) return false;
  }
  if (
    f.charge !== undefined &&
    f.charge !== 0 &&
    !ion.stoichiometries.some((s) => s.ionCharge === f.charge)
  )
    return false;
  if (f.stoichiometry && !ion.stoichiometries.some((s) => stoichiometryKey(s) === f.stoichiometry))
    return false;
  if (f.partner) {
    const paired = (f.partner.kind === 'base') === (ion.kind === 'anion');
    if (f.pairedOnly && !paired) return false;
    if (f.minDeltaPka !== undefined) {
      const d = bestDeltaPka(f.partner, ion);
      if (!d || d.deltaPka < f.minDeltaPka) return false;
    }
  }
  return true;
}
