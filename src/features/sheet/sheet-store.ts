import { create } from 'zustand';

interface SheetState {
  /** True while the comparison sheet covers the workbench. */
  open: boolean;
  show: () => void;
  close: () => void;
}

/** Whether the comparison sheet is on screen (session state). */
export const useSheetStore = create<SheetState>()((set) => ({
  open: false,
  show: () => set({ open: true }),
  close: () => set({ open: false }),
}));
