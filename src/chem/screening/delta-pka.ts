import { requireFiniteInRange } from '../result';
import { linkingPka, type Protolyte } from './speciation';

/**
 * The ΔpKa rule for salt formation: ΔpKa = pKa(protonated base) − pKa(acid).
 *
 * - Common practice asks ΔpKa ≥ 2–3 for a stable salt (Stahl & Wermuth, "Handbook of Pharmaceutical
 *   Salts", 2002; Bastin, Bowker & Slater 2000, Org. Process Res. Dev. 4, 427).
 * - Cruz-Cabeza 2012 (CrystEngComm 14, 6362), from ~6 500 acid–base crystal structures: ΔpKa < −1
 *   almost always a neutral cocrystal, ΔpKa > 4 almost always a salt, and in between the share of
 *   salts rises roughly linearly — by about 17 % per pKa unit, P(salt) ≈ 17·ΔpKa + 28 % (the
 *   coefficients are from memory of that paper). The bands are settings, not constants.
 */
export interface DeltaPkaBands {
  /** Below this ΔpKa: expect a cocrystal (Cruz-Cabeza 2012: −1). */
  cocrystalBelow: number;
  /** Above this ΔpKa: expect a salt (Cruz-Cabeza 2012: 4). */
  saltAbove: number;
  /** Minimum ΔpKa for a stable salt by common practice (2–3; default 2). */
  stableSaltMin: number;
}

export const DEFAULT_DELTA_PKA_BANDS: DeltaPkaBands = {
  cocrystalBelow: -1,
  saltAbove: 4,
  stableSaltMin: 2,
};

/** ΔpKa = pKa(protonated base) − pKa(acid). */
export function deltaPka(pKaProtonatedBase: number, pKaAcid: number): number {
  requireFiniteInRange('pKaProtonatedBase', pKaProtonatedBase, -10, 20);
  requireFiniteInRange('pKaAcid', pKaAcid, -10, 20);
  return pKaProtonatedBase - pKaAcid;
}

export type SaltFormationBand = 'salt' | 'uncertain' | 'cocrystal';

export interface SaltFormationVerdict {
  deltaPka: number;
  band: SaltFormationBand;
  /** Probability of proton transfer in the crystal, 0–1 (Cruz-Cabeza 2012 linear trend, clamped). */
  saltProbability: number;
  /** True when ΔpKa meets the common-practice minimum for a stable salt. */
  meetsStableSaltRule: boolean;
  reason: string;
}

/**
 * Probability of a salt for a ΔpKa: the linear trend 17·ΔpKa + 28 % (Cruz-Cabeza 2012, coefficients
 * from memory) clamped to 0–1, at least 95 % above the salt band and at most 5 % below the cocrystal
 * band ("almost always"). Allocation-free, for the Monte Carlo.
 */
export function saltProbabilityFor(
  dpKa: number,
  bands: DeltaPkaBands = DEFAULT_DELTA_PKA_BANDS,
): number {
  const linear = (17 * dpKa + 28) / 100;
  const clamped = linear < 0 ? 0 : linear > 1 ? 1 : linear;
  if (dpKa > bands.saltAbove) return Math.max(clamped, 0.95);
  if (dpKa < bands.cocrystalBelow) return Math.min(clamped, 0.05);
  return clamped;
}

/** The verdict for one ΔpKa, with the bands named in words. */
export function saltFormationVerdict(
  dpKa: number,
  bands: DeltaPkaBands = DEFAULT_DELTA_PKA_BANDS,
): SaltFormationVerdict {
  requireFiniteInRange('deltaPka', dpKa, -30, 30);
  const band: SaltFormationBand =
    dpKa > bands.saltAbove ? 'salt' : dpKa < bands.cocrystalBelow ? 'cocrystal' : 'uncertain';
  const saltProbability = saltProbabilityFor(dpKa, bands);
  const meets = dpKa >= bands.stableSaltMin;
  const d = dpKa.toFixed(1);
  const reason =
    band === 'salt'
      ? `ΔpKa ${d} > ${bands.saltAbove}: proton transfer expected (salt)`
      : band === 'cocrystal'
        ? `ΔpKa ${d} < ${bands.cocrystalBelow}: a cocrystal or no complex is more likely than a salt`
        : `ΔpKa ${d} lies between ${bands.cocrystalBelow} and ${bands.saltAbove}: salt or cocrystal, about ${Math.round(saltProbability * 100)} % salts in published structures`;
  return { deltaPka: dpKa, band, saltProbability, meetsStableSaltRule: meets, reason };
}

/**
 * ΔpKa for a drug ion and a counter-ion in their salt charge states: the base side gives the pKa of
 * the proton it accepts, the acid side the pKa of the proton it gives up. Returns null when one side
 * has no such proton (e.g. a quaternary ammonium counter-ion, which needs no proton transfer).
 */
export function saltDeltaPka(
  drug: Protolyte,
  drugIonCharge: number,
  counterIon: Protolyte,
  counterIonCharge: number,
): number | null {
  const drugIsBase = drugIonCharge > 0;
  const drugPka = drugIsBase
    ? linkingPka(drug, drugIonCharge - 1)
    : linkingPka(drug, drugIonCharge);
  const ionPka = drugIsBase
    ? linkingPka(counterIon, counterIonCharge)
    : linkingPka(counterIon, counterIonCharge - 1);
  if (drugPka === undefined || ionPka === undefined) return null;
  return drugIsBase ? drugPka - ionPka : ionPka - drugPka;
}

/** ΔpKa against every pKa of the counter-ion (for display: which protons the drug can take or give). */
export function deltaPkaAgainstEach(
  drugPka: number,
  counterIonPkas: readonly number[],
  drugIsBase: boolean,
): number[] {
  return counterIonPkas.map((p) => (drugIsBase ? deltaPka(drugPka, p) : deltaPka(p, drugPka)));
}
