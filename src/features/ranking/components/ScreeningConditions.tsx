import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { memo, useEffect, useId, useRef, useState } from 'react';
import type { ScreeningSettings } from '@/chem';
import { projectsRepo } from '@/persistence/projects-repo';
import { flushBeforeLeaving } from '@/persistence/unsaved-edits';
import type { ProjectRecord } from '@/persistence/records';
import { SCREENING_SETTINGS_KEY } from '@/screening-data/screening-settings';
import {
  CONDITION_FIELDS,
  conditionsDraftOf,
  conditionsFromDraft,
  conditionsSettingsShape,
  type ConditionsDraft,
  type ConditionsErrors,
} from '../settings-form-model';

const SAVE_DELAY_MS = 300;

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

const HINTS: Partial<Record<keyof ConditionsDraft, string>> = {
  gastricChlorideM: 'Default 0.12 M: simulated gastric fluid (USP, composition from memory)',
  microenvironmentPh:
    'Local pH in the dose form. Leave empty while unknown: 7 is then assumed and said; chosen excipients replace it',
  temperatureC: '37 °C per ICH M9',
  stableSaltMin: 'Common practice: 2–3 (Stahl & Wermuth 2002)',
  cocrystalBelow: 'Cruz-Cabeza 2012: −1',
  saltAbove: 'Cruz-Cabeza 2012: 4',
};

/**
 * Media and rule settings of the screen, saved with the project as they are typed. Memoised: a weight
 * movement re-renders the area, not this form.
 */
export const ScreeningConditions = memo(function ScreeningConditionsView({
  project,
  settings,
}: {
  project: ProjectRecord;
  settings: ScreeningSettings;
}) {
  const [draft, setDraft] = useState<ConditionsDraft>(() =>
    conditionsDraftOf(project.settings, settings),
  );
  const [errors, setErrors] = useState<ConditionsErrors>({});
  const [state, setState] = useState<'saved' | 'pending' | 'invalid'>('saved');
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const uid = useId();
  /** The values as last stored or taken over: a field whose draft differs from it was edited here. */
  const base = useRef<ConditionsDraft>(draft);
  const draftRef = useRef(draft);
  draftRef.current = draft;

  useEffect(() => {
    const stored = conditionsDraftOf(project.settings, settings);
    base.current = stored;
    setDraft(stored);
    setErrors({});
    setState('saved');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [project.id]);

  // A field changed elsewhere (another tab) is taken over unless it is being edited here.
  const storedKey = JSON.stringify(conditionsDraftOf(project.settings, settings));
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
  }, [storedKey]);
  const pending = useRef<(() => void) | null>(null);
  // Closing the area must not lose an edit still waiting for its save: save it now.
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      pending.current?.();
    },
    [],
  );
  // The page being hidden, reloaded or closed starts the waiting save at once (unsaved-edits.ts).
  useEffect(
    () =>
      flushBeforeLeaving(() => {
        if (timer.current) clearTimeout(timer.current);
        timer.current = null;
        pending.current?.();
      }),
    [],
  );

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
      // Write only the fields edited here (they differ from `base`), each stamped: a field another
      // tab changed meanwhile is left as stored (persistence/field-stamps.ts). Read at save time, so
      // a field taken over from another tab since the keystroke is not written back.
      const shown = draftRef.current;
      const now = conditionsFromDraft(shown, project.settings, settings);
      const from = conditionsFromDraft(base.current, project.settings, settings);
      if (!now.ok) return;
      const before = from.ok ? conditionsSettingsShape(from, SCREENING_SETTINGS_KEY) : undefined;
      base.current = shown;
      void projectsRepo
        .changeSettings(project.id, before, conditionsSettingsShape(now, SCREENING_SETTINGS_KEY))
        .then(() => setState('saved'));
    };
    pending.current = save;
    timer.current = setTimeout(save, SAVE_DELAY_MS);
  };

  const field = (key: Exclude<keyof ConditionsDraft, 'activityModel'>) => {
    const id = `${uid}-${key}`;
    const spec = CONDITION_FIELDS[key];
    const error = errors[key];
    const hint = HINTS[key];
    return (
      <div className="field" key={key}>
        <label htmlFor={id}>
          {spec.label}
          {spec.unit ? <span className="unit"> ({spec.unit})</span> : null}
        </label>
        <input
          id={id}
          inputMode="decimal"
          value={draft[key]}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, error, hint)}
          onChange={(e) => change(key, e.target.value)}
        />
        <FieldMessage id={id} error={error} hint={hint} />
      </div>
    );
  };

  return (
    <details className="panel conditions" open={state === 'invalid' ? true : undefined}>
      <summary>
        <span className="conditions-title">Screening conditions</span>{' '}
        <span className="muted">
          gastric pH {settings.gastricPh}, Cl⁻ {project.settings.gastricChlorideM} M ·
          microenvironment pH{' '}
          {settings.excipients.length > 0
            ? 'from the chosen excipients'
            : settings.microenvironmentPhStated
              ? project.settings.microenvironmentPh
              : `not stated (assumed ${project.settings.microenvironmentPh})`}{' '}
          · {project.settings.temperatureC} °C
        </span>{' '}
        <span className={`save-badge save-${state}`} role="status" aria-live="polite">
          {state === 'saved'
            ? 'Saved'
            : state === 'pending'
              ? 'Saving…'
              : 'Not saved: fix the marked field'}
        </span>
      </summary>
      <form
        className="form-grid"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Screening conditions"
      >
        {field('gastricPh')}
        {field('gastricChlorideM')}
        {field('microenvironmentPh')}
        {field('temperatureC')}
        {field('stableSaltMin')}
        {field('cocrystalBelow')}
        {field('saltAbove')}
        <div className="field">
          <label htmlFor={`${uid}-activity`}>Activities</label>
          <select
            id={`${uid}-activity`}
            value={draft.activityModel}
            onChange={(e) => change('activityModel', e.target.value)}
          >
            <option value="ideal">Ideal (activity = concentration)</option>
            <option value="davies">Davies correction</option>
          </select>
        </div>
      </form>
    </details>
  );
});
