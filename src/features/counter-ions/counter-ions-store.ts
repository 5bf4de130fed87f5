import { create } from 'zustand';
import type { AcceptabilityClass } from '@/chem';

export type KindFilter = 'paired' | 'anion' | 'cation' | 'all';
export type ClassFilter = AcceptabilityClass | 'none';

interface CounterIonsViewState {
  query: string;
  kind: KindFilter;
  classes: ClassFilter[];
  /** 0 for any charge. */
  charge: number;
  /** '' for any stoichiometry, else "drug:counter-ion". */
  stoichiometry: string;
  /** Minimum ΔpKa as typed ('' for no limit). */
  minDeltaPka: string;
  /** Show the ions bundled only as thermochemistry references. */
  showReference: boolean;
  /** The row whose details are open. */
  openId: string | null;
  setQuery: (query: string) => void;
  setKind: (kind: KindFilter) => void;
  toggleClass: (c: ClassFilter) => void;
  setCharge: (charge: number) => void;
  setStoichiometry: (s: string) => void;
  setMinDeltaPka: (text: string) => void;
  toggleOpen: (id: string) => void;
  setShowReference: (show: boolean) => void;
  reset: () => void;
}

const initial = {
  query: '',
  kind: 'paired' as KindFilter,
  classes: [] as ClassFilter[],
  charge: 0,
  stoichiometry: '',
  minDeltaPka: '',
  showReference: false,
  openId: null as string | null,
};

/** Session state of the Counter-ions area: the search text, the filters and the open row. */
export const useCounterIonsViewStore = create<CounterIonsViewState>()((set) => ({
  ...initial,
  setQuery: (query) => set({ query }),
  setKind: (kind) => set({ kind }),
  toggleClass: (c) =>
    set((s) => ({
      classes: s.classes.includes(c) ? s.classes.filter((x) => x !== c) : [...s.classes, c],
    })),
  setCharge: (charge) => set({ charge }),
  setStoichiometry: (stoichiometry) => set({ stoichiometry }),
  setMinDeltaPka: (minDeltaPka) => set({ minDeltaPka }),
  toggleOpen: (id) => set((s) => ({ openId: s.openId === id ? null : id })),
  setShowReference: (showReference) => set({ showReference }),
  reset: () => set(initial),
}));
