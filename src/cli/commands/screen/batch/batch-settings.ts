import { settingsFromFlags, type ScreenFlags } from '../screen-flags';
import type { BatchSettings } from './screen-one';

/** The settings every compound of a batch is screened with, from the same flags a single screen reads. */
export function settingsFromBatchFlags(flags: ScreenFlags): BatchSettings {
  return {
    settings: settingsFromFlags(flags),
    keepCocrystalBand: flags['keep-cocrystal-band'] === true,
    // The rank-robustness Monte Carlo costs ~40 ms a compound at 1000 draws, twenty times the screen
    // itself: a batch runs it only when --iterations asks for it (P(top 3) stays empty otherwise).
    iterations: flags.iterations ?? 0,
    seed: flags.seed ?? 1,
    top: flags.top,
    ions: flags.ions ?? null,
    outFormat: flags.format === 'jsonl' ? 'jsonl' : 'csv',
  };
}
