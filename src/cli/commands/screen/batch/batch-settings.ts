import { settingsFromFlags, type ScreenFlags } from '../screen-flags';
import type { BatchSettings } from './screen-one';

/** The settings every compound of a batch is screened with, from the same flags a single screen reads. */
export function settingsFromBatchFlags(flags: ScreenFlags): BatchSettings {
  return {
    settings: settingsFromFlags(flags),
    keepCocrystalBand: flags['keep-cocrystal-band'] === true,
    iterations: flags.iterations ?? 1000,
    seed: flags.seed ?? 1,
    top: flags.top,
    ions: flags.ions ?? null,
  };
}
