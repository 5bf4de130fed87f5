import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { memo, useEffect, useId, useRef, useState } from 'react';
import type { ScreeningSettings } from '@/chem';
import { projectsRepo } from '@/persistence/projects-repo';
import type { ProjectRecord } from '@/persistence/records';
import { SCREENING_SETTINGS_KEY } from '@/screening-data/screening-settings';
import {
  CONDITION_FIELDS,
  conditionsDraftOf,
  conditionsFromDraft,
  type ConditionsDraft,
  type ConditionsErrors,
} from '../settings-form-model';

const SAVE_DELAY_MS = 300;

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

  useEffect(() => {
    setDraft(conditionsDraftOf(project.settings, settings));
    setErrors({});
    setState('saved');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [project.id]);
  const pending = useRef<(() => void) | null>(null);
  // Closing the area must not lose an edit still waiting for its save: save it now.
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      pending.current?.();
    },
    [],
  );

  const change = (key: keyof ConditionsDraft, value: string) => {
    const next = { ...draft, [key]: value } as ConditionsDraft;
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
      void (async () => {
        // Write only the fields this form owns, on top of what is stored now (weights may have moved).
        const current = await projectsRepo.get(project.id);
        if (!current) return;
        const stored = current.settings.extra[SCREENING_SETTINGS_KEY];
        const block = {
          ...(stored && typeof stored === 'object' ? stored : {}),
          gastricPh: r.screening.gastricPh,
          activityModel: r.screening.activityModel,
          deltaPkaBands: r.screening.deltaPkaBands,
        };
        await projectsRepo.updateSettings(project.id, {
          ...current.settings,
          gastricChlorideM: r.projectSettings.gastricChlorideM,
          microenvironmentPh: r.projectSettings.microenvironmentPh,
          microenvironmentPhStated: r.projectSettings.microenvironmentPhStated,
          temperatureC: r.projectSettings.temperatureC,
          extra: { ...current.settings.extra, [SCREENING_SETTINGS_KEY]: block },
        });
        setState('saved');
      })();
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
