import { describeFailure } from '../../../define-command';
import { prepareScreen, type CompoundSpec } from '../screen-input';
import { runScreen, type ScreenTableRow } from '../screen-table';
import { COLUMN_NAMES } from './batch-row';

/** The settings shared by every compound of a batch (the same as one `screen` takes from its flags). */
export interface BatchSettings {
  settings: Record<string, unknown>;
  keepCocrystalBand: boolean;
  iterations: number;
  seed: number;
  top?: number | undefined;
  /** --ions, used for rows without their own list. */
  ions: string[] | null;
}

export type ScreenOneResult = { ok: true; rows: ScreenTableRow[]; skipped: number } | { ok: false; error: string };

/** Screen one compound of a batch with the same core and settings as a single `screen`. */
export async function screenOne(spec: CompoundSpec, s: BatchSettings): Promise<ScreenOneResult> {
  try {
    const prepared = await prepareScreen(
      { ...spec, ions: spec.ions ?? s.ions },
      { settings: s.settings, keepCocrystalBand: s.keepCocrystalBand, names: COLUMN_NAMES },
    );
    const { table } = runScreen(prepared, { iterations: s.iterations, seed: s.seed, top: s.top });
    return { ok: true, rows: table, skipped: prepared.skipped.length };
  } catch (err) {
    return { ok: false, error: describeFailure(err).message };
  }
}
