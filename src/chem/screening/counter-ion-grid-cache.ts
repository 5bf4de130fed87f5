import { log10ChargeFraction, type Protolyte } from './speciation';

/**
 * Counter-ion speciation per pH list, memoised across compounds by the ion's numbers (pKa values,
 * charges, grid), found through a numeric hash and an exact comparison: no key string is built per
 * call (this is asked twice per candidate). Bounded so that a long batch of custom ions cannot grow it.
 */
interface IonEntry {
  pKas: readonly number[];
  top: number;
  charge: number;
  gridKey: string;
  v: Float64Array;
  next: IonEntry | undefined;
}
const ION_CACHE_LIMIT = 512;
const ionCache = new Map<number, IonEntry>();
let ionCacheSize = 0;

function ionHash(p: Protolyte, charge: number, gridKey: string): number {
  // the key's length tells the usual two lists apart (the profile grid's and the pH_max scan's)
  let h = Math.imul(Math.imul(p.mostProtonatedCharge, 31) + charge, 31) + gridKey.length;
  for (let k = 0; k < p.pKas.length; k++) h = (Math.imul(h, 31) + Math.round(p.pKas[k]! * 1e6)) | 0;
  return h & 0x3fffffff; // a small integer key: the map's fast path
}

function sameIon(e: IonEntry, p: Protolyte, charge: number, gridKey: string): boolean {
  if (e.top !== p.mostProtonatedCharge || e.charge !== charge || e.gridKey !== gridKey)
    return false;
  if (e.pKas.length !== p.pKas.length) return false;
  for (let k = 0; k < e.pKas.length; k++) if (e.pKas[k] !== p.pKas[k]) return false;
  return true;
}

export function chargeFractionsOn(
  p: Protolyte,
  charge: number,
  phs: readonly number[],
  gridKey: string,
): Float64Array {
  const h = ionHash(p, charge, gridKey);
  const first = ionCache.get(h);
  for (let e = first; e; e = e.next) if (sameIon(e, p, charge, gridKey)) return e.v;
  const v = Float64Array.from(phs, (pH) => log10ChargeFraction(p, pH, charge));
  if (ionCacheSize >= ION_CACHE_LIMIT) {
    ionCache.clear();
    ionCacheSize = 0;
  }
  const pKas = [...p.pKas];
  const next = ionCache.get(h);
  ionCache.set(h, { pKas, top: p.mostProtonatedCharge, charge, gridKey, v, next });
  ionCacheSize++;
  return v;
}
