import { create } from 'zustand';

/** The areas of the workbench, in the order a formulator works through them. */
export const AREAS = [
  { id: 'compound', label: 'Compound' },
  { id: 'counter-ions', label: 'Counter-ions' },
  { id: 'ranking', label: 'Ranking' },
  { id: 'energetics', label: 'Energetics' },
  { id: 'salt-screen', label: 'Salt screen' },
  { id: 'bench', label: 'Bench data' },
  { id: 'model-check', label: 'Model check' },
  { id: 'projects', label: 'Projects' },
] as const;
export type AreaId = (typeof AREAS)[number]['id'];

const isArea = (s: string): s is AreaId => AREAS.some((a) => a.id === s);

/** Ids used by earlier builds, so that old bookmarks still open the right area. */
const FORMER_IDS: Record<string, AreaId> = { library: 'counter-ions', confidence: 'model-check' };

/** Read the area from the URL hash (`#/ranking`), falling back to the compound area. */
export function areaFromHash(hash: string): AreaId {
  const id = hash.replace(/^#\/?/, '').split('/')[0] ?? '';
  return isArea(id) ? id : (FORMER_IDS[id] ?? 'compound');
}

interface NavigationState {
  area: AreaId;
  projectId: string | null;
  goTo: (area: AreaId) => void;
  openProject: (projectId: string | null) => void;
}

/** Which area and which project are on screen (session state; the URL hash mirrors the area). */
export const useNavigationStore = create<NavigationState>()((set) => ({
  area: typeof window === 'undefined' ? 'compound' : areaFromHash(window.location.hash),
  projectId: null,
  goTo: (area) => {
    if (typeof window !== 'undefined' && window.location.hash !== `#/${area}`) {
      window.history.replaceState(null, '', `#/${area}`);
    }
    set({ area });
  },
  openProject: (projectId) => set({ projectId }),
}));
