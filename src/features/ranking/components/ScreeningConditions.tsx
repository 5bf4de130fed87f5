import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { memo, useId } from 'react';
import type { ScreeningSettings } from '@/chem';
import type { ProjectRecord } from '@/persistence/records';
import {
  CONDITION_FIELDS,
  type ConditionsDraft,
  type ConditionsErrors,
} from '../settings-form-model';
import { useConditionsDraft, type ConditionsSaveState } from '../hooks/use-conditions-draft';

const HINTS: Partial<Record<keyof ConditionsDraft, string>> = {
  gastricChlorideM: 'Default 0.12 M: simulated gastric fluid (USP, composition from memory)',
  microenvironmentPh:
    'Local pH in the dose form. Leave empty while unknown: 7 is then assumed and said; chosen excipients replace it',
  temperatureC: '37 °C per ICH M9',
  stableSaltMin: 'Common practice: 2–3 (Stahl & Wermuth 2002)',
  cocrystalBelow: 'Cruz-Cabeza 2012: −1',
  saltAbove: 'Cruz-Cabeza 2012: 4',
};

type NumberKey = Exclude<keyof ConditionsDraft, 'activityModel'>;

/** One numeric condition: label with unit, the typed text, its error or hint. */
function ConditionField({
  uid,
  k,
  value,
  error,
  onChange,
}: {
  uid: string;
  k: NumberKey;
  value: string;
  error: ConditionsErrors[NumberKey];
  onChange: (key: keyof ConditionsDraft, value: string) => void;
}) {
  const id = `${uid}-${k}`;
  const spec = CONDITION_FIELDS[k];
  const hint = HINTS[k];
  return (
    <div className="field">
      <label htmlFor={id}>
        {spec.label}
        {spec.unit ? <span className="unit"> ({spec.unit})</span> : null}
      </label>
      <input
        id={id}
        inputMode="decimal"
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        onChange={(e) => onChange(k, e.target.value)}
      />
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

/** The folded panel's one line: the conditions in force and whether they are saved. */
function ConditionsSummary({
  project,
  settings,
  state,
}: {
  project: ProjectRecord;
  settings: ScreeningSettings;
  state: ConditionsSaveState;
}) {
  return (
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
  );
}

const NUMBER_FIELDS: readonly NumberKey[] = [
  'gastricPh',
  'gastricChlorideM',
  'microenvironmentPh',
  'temperatureC',
  'stableSaltMin',
  'cocrystalBelow',
  'saltAbove',
];

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
  const { draft, errors, state, change } = useConditionsDraft(project, settings);
  const uid = useId();
  return (
    <details className="panel conditions" open={state === 'invalid' ? true : undefined}>
      <ConditionsSummary project={project} settings={settings} state={state} />
      <form
        className="form-grid"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Screening conditions"
      >
        {NUMBER_FIELDS.map((k) => (
          <ConditionField
            key={k}
            uid={uid}
            k={k}
            value={draft[k]}
            error={errors[k]}
            onChange={change}
          />
        ))}
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
