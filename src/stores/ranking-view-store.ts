import { create } from 'zustand';

export type RankingSortKey =
  | 'rank'
  | 'name'
  | 'deltaPka'
  | 'saltWaterSolubility'
  | 'phMax'
  | 'worstDoseNumber'
  | 'gastricDoseNumber'
  | 'solutionEnthalpy'
  | 'activeFraction';

interface RankingViewState {
  sortKey: RankingSortKey;
  /** 'asc' puts the smallest value first. */
  sortDir: 'asc' | 'desc';
  /** Candidates drawn on the pH–solubility chart, by id; null = the current top three. */
  chartIds: string[] | null;
  /** Candidate whose energy picture is open in the Energetics area. */
  focusCandidateId: string | null;
  sortBy: (key: RankingSortKey) => void;
  toggleChart: (id: string, currentTop: string[]) => void;
  focus: (id: string | null) => void;
  /** Forget per-project choices (another project was opened). */
  resetForProject: () => void;
}

/** How the ranking is looked at (session state: sort order, charted and focused candidates). */
export const useRankingViewStore = create<RankingViewState>()((set) => ({
  sortKey: 'rank',
  sortDir: 'asc',
  chartIds: null,
  focusCandidateId: null,
  sortBy: (key) =>
    set((s) =>
      s.sortKey === key
        ? { sortDir: s.sortDir === 'asc' ? 'desc' : 'asc' }
        : { sortKey: key, sortDir: 'asc' },
    ),
  toggleChart: (id, currentTop) =>
    set((s) => {
      const now = s.chartIds ?? currentTop;
      return { chartIds: now.includes(id) ? now.filter((x) => x !== id) : [...now, id] };
    }),
  focus: (id) => set({ focusCandidateId: id }),
  resetForProject: () => set({ chartIds: null, focusCandidateId: null }),
}));
