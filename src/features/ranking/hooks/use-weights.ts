import { useCallback, useEffect, useRef, useState } from 'react';
import { screeningWeightsSchema, type ScreeningWeights } from '@/chem';
import { projectsRepo } from '@/persistence/projects-repo';
import { flushBeforeLeaving } from '@/persistence/unsaved-edits';
import type { ProjectRecord } from '@/persistence/records';
import { SCREENING_SETTINGS_KEY, screeningSettingsOf } from '@/screening-data/screening-settings';

/** Save this long after the last slider movement, ms. */
const SAVE_DELAY_MS = 400;

/**
 * The ranking weights: local while a slider moves (the ranking follows at once), saved with the
 * project shortly after it stops. A change from another tab is taken over when nothing is pending.
 */
export function useWeights(project: ProjectRecord): {
  weights: ScreeningWeights;
  setWeights: (w: ScreeningWeights) => void;
  saving: boolean;
} {
  const stored = screeningSettingsOf(project).weights;
  const storedKey = JSON.stringify(stored);
  const [weights, setLocal] = useState<ScreeningWeights>(stored);
  const [saving, setSaving] = useState(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const projectRef = useRef(project);
  projectRef.current = project;
  /** The weights as last stored or taken over: a save writes only the weights that differ from it. */
  const base = useRef<ScreeningWeights>(stored);

  useEffect(() => {
    const fresh = JSON.parse(storedKey) as ScreeningWeights;
    // Another tab's move of a slider not being moved here is taken over at once.
    // The same values keep the same object: the ranking, robustness and "Measure next" restart on a
    // new object (this effect runs on opening too, and a restart cost a whole second run).
    if (!timer.current) {
      base.current = fresh;
      setLocal((w) => (JSON.stringify(w) === storedKey ? w : fresh));
    }
  }, [storedKey, project.id]);

  const pending = useRef<(() => void) | null>(null);

  // Leaving the area (unmount) must not lose a change that is still waiting to be saved: save it now.
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
      pending.current?.();
    },
    [],
  );

  // The page being reloaded or closed starts the waiting save at once (persistence/unsaved-edits.ts).
  useEffect(
    () =>
      flushBeforeLeaving(() => {
        if (!timer.current) return;
        clearTimeout(timer.current);
        timer.current = null;
        pending.current?.();
      }),
    [],
  );

  const setWeights = useCallback((w: ScreeningWeights) => {
    const valid = screeningWeightsSchema.parse(w);
    setLocal(valid);
    setSaving(true);
    if (timer.current) clearTimeout(timer.current);
    const save = () => {
      pending.current = null;
      const p = projectRef.current;
      // Only the sliders moved here are written, each stamped (persistence/field-stamps.ts): a slider
      // moved in another tab meanwhile keeps its value.
      const shape = (ws: ScreeningWeights) => ({
        extra: { [SCREENING_SETTINGS_KEY]: { weights: ws } },
      });
      const before = base.current;
      base.current = valid;
      void projectsRepo
        .changeSettings(p.id, shape(before), shape(valid))
        .finally(() => setSaving(false));
    };
    pending.current = save;
    timer.current = setTimeout(() => {
      timer.current = null;
      save();
    }, SAVE_DELAY_MS);
  }, []);

  return { weights, setWeights, saving };
}
