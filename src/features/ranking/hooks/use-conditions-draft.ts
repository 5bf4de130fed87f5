import { useEffect, useRef, useState, type MutableRefObject } from 'react';
import type { ScreeningSettings } from '@/chem';
import { projectsRepo } from '@/persistence/projects-repo';
import { flushBeforeLeaving } from '@/persistence/unsaved-edits';
import type { ProjectRecord } from '@/persistence/records';
import { SCREENING_SETTINGS_KEY } from '@/screening-data/screening-settings';
import {
  conditionsDraftOf,
  conditionsFromDraft,
  conditionsSettingsShape,
  type ConditionsDraft,
  type ConditionsErrors,
} from '../settings-form-model';

const SAVE_DELAY_MS = 300;

export type ConditionsSaveState = 'saved' | 'pending' | 'invalid';

/** The fields of `stored` to take into the base: those not being edited here (shown equals base). */
function diffTaken(
  base: ConditionsDraft,
  shown: ConditionsDraft,
  stored: ConditionsDraft,
): Partial<ConditionsDraft> {
  const out: Partial<ConditionsDraft> = {};
  for (const key of Object.keys(stored) as (keyof ConditionsDraft)[]) {
    if (shown[key] === base[key]) (out as Record<string, string>)[key] = stored[key];
  }
  return out;
}

/** A field changed elsewhere (another tab) is taken over unless it is being edited here. */
function useTakeOverStored(
  storedKey: string,
  draftRef: MutableRefObject<ConditionsDraft>,
  base: MutableRefObject<ConditionsDraft>,
  setDraft: (d: ConditionsDraft) => void,
) {
  useEffect(() => {
    const stored = JSON.parse(storedKey) as ConditionsDraft;
    const shown = draftRef.current;
    const next = { ...shown };
    let changed = false;
    for (const key of Object.keys(stored) as (keyof ConditionsDraft)[]) {
      if (shown[key] !== base.current[key] || shown[key] === stored[key]) continue;
      (next as Record<string, string>)[key] = stored[key];
      changed = true;
    }
    base.current = { ...base.current, ...diffTaken(base.current, shown, stored) };
    if (changed) setDraft(next);
  }, [storedKey]); // eslint-disable-line react-hooks/exhaustive-deps
}

/**
 * A save still waiting when the area closes, or when the page is hidden, reloaded or closed
 * (persistence/unsaved-edits.ts), is started at once.
 */
function useSaveBeforeLeaving(
  timer: MutableRefObject<ReturnType<typeof setTimeout> | null>,
  pending: MutableRefObject<(() => void) | null>,
) {
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      pending.current?.();
    },
    [timer, pending],
  );
  useEffect(
    () =>
      flushBeforeLeaving(() => {
        if (timer.current) clearTimeout(timer.current);
        timer.current = null;
        pending.current?.();
      }),
    [timer, pending],
  );
}

/**
 * Write only the fields edited here (they differ from `base`), each stamped: a field another tab
 * changed meanwhile is left as stored (persistence/field-stamps.ts). Read at save time, so a field
 * taken over from another tab since the keystroke is not written back.
 */
function saveEdited(
  project: ProjectRecord,
  settings: ScreeningSettings,
  shown: ConditionsDraft,
  base: MutableRefObject<ConditionsDraft>,
): Promise<void> | undefined {
  const now = conditionsFromDraft(shown, project.settings, settings);
  const from = conditionsFromDraft(base.current, project.settings, settings);
  if (!now.ok) return undefined;
  const before = from.ok ? conditionsSettingsShape(from, SCREENING_SETTINGS_KEY) : undefined;
  base.current = shown;
  return projectsRepo.changeSettings(
    project.id,
    before,
    conditionsSettingsShape(now, SCREENING_SETTINGS_KEY),
  );
}

/**
 * The screening conditions as typed: the draft, its errors and save state, and `change` (checks the
 * draft, saves it a moment after the last keystroke). Another tab's change of a field not being
 * edited here is taken over; a new project starts from its stored values.
 */
export function useConditionsDraft(project: ProjectRecord, settings: ScreeningSettings) {
  const [draft, setDraft] = useState<ConditionsDraft>(() =>
    conditionsDraftOf(project.settings, settings),
  );
  const [errors, setErrors] = useState<ConditionsErrors>({});
  const [state, setState] = useState<ConditionsSaveState>('saved');
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  /** The values as last stored or taken over: a field whose draft differs from it was edited here. */
  const base = useRef<ConditionsDraft>(draft);
  const draftRef = useRef(draft);
  draftRef.current = draft;
  const pending = useRef<(() => void) | null>(null);

  useEffect(() => {
    const stored = conditionsDraftOf(project.settings, settings);
    base.current = stored;
    setDraft(stored);
    setErrors({});
    setState('saved');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [project.id]);
  useTakeOverStored(
    JSON.stringify(conditionsDraftOf(project.settings, settings)),
    draftRef,
    base,
    setDraft,
  );
  useSaveBeforeLeaving(timer, pending);

  const change = (key: keyof ConditionsDraft, value: string) => {
    const next = { ...draftRef.current, [key]: value } as ConditionsDraft;
    draftRef.current = next;
    setDraft(next);
    const r = conditionsFromDraft(next, project.settings, settings);
    if (timer.current) clearTimeout(timer.current);
    pending.current = null;
    if (!r.ok) {
      setErrors(r.errors);
      setState('invalid');
      return;
    }
    setErrors({});
    setState('pending');
    const save = () => {
      pending.current = null;
      void saveEdited(project, settings, draftRef.current, base)?.then(() => setState('saved'));
    };
    pending.current = save;
    timer.current = setTimeout(save, SAVE_DELAY_MS);
  };
  return { draft, errors, state, change };
}
