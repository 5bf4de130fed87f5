import { useMemo, useState } from 'react';
import { screeningWeightsSchema, validationReport, type ModelValidation } from '@/chem';

const defaultWeights = screeningWeightsSchema.parse({});
import { useProjectScreening } from '@/screening-data/use-screening';
import { ROBUSTNESS_SEED, useRobustness } from '@/screening-data/use-robustness';
import type { ProjectRecord } from '@/persistence/records';
import { buildSheetModel } from '../build-sheet-model';
import type { SheetModel } from '../sheet.types';

export interface SheetModelState {
  status: 'loading' | 'ready' | 'error';
  model?: SheetModel;
  error?: string;
}

/**
 * The comparison sheet of a project: the workbench's screening (the same hook the Ranking area
 * uses), ranked with the project's weights, plus the engine's model check. The date is fixed when
 * the sheet opens.
 */
export function useSheetModel(project: ProjectRecord | undefined): SheetModelState {
  const screening = useProjectScreening(project);
  const [generatedAt] = useState(() => new Date().toISOString());
  const screen = screening.result?.screen;
  const robustRows = useMemo(
    () => screen?.rows.filter((r) => !r.error).map((r) => r.robustness),
    [screen],
  );
  const robustness = useRobustness(
    robustRows,
    screening.result?.settings.weights ?? defaultWeights,
    screen?.robustnessShared,
  );
  const validation = useMemo<ModelValidation[]>(() => {
    try {
      return validationReport();
    } catch {
      return [];
    }
  }, []);
  return useMemo<SheetModelState>(() => {
    if (!project) return { status: 'loading' };
    if (screening.status === 'error') return { status: 'error', error: screening.error };
    if (!screening.result) return { status: 'loading' };
    // Wait for the rank robustness (a few seconds in its worker); a failed run leaves the column empty.
    if (robustness.status === 'running' || (robustness.status === 'idle' && robustRows?.length))
      return { status: 'loading' };
    try {
      const model = buildSheetModel({
        project,
        screening: screening.result,
        validation,
        generatedAt,
        appVersion: __APP_VERSION__,
        robustness:
          robustness.status === 'done' && robustness.results
            ? {
                results: robustness.results,
                iterations: robustness.iterations ?? 0,
                seed: ROBUSTNESS_SEED,
              }
            : null,
      });
      return { status: screening.status === 'ready' ? 'ready' : 'loading', model };
    } catch (err) {
      return { status: 'error', error: err instanceof Error ? err.message : String(err) };
    }
  }, [
    project,
    screening.status,
    screening.result,
    screening.error,
    validation,
    generatedAt,
    robustness,
    robustRows,
  ]);
}
