import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { useId, useState, type FormEvent } from 'react';
import { measurementsRepo } from '@/persistence/measurements-repo';
import type { MeasurementKind } from '@/persistence/records';
import {
  CRYSTALLINITY_CLASSES,
  MEASUREMENT_KINDS,
  SOLID_FORM_CHOICES,
  emptyDraft,
  measurementFromDraft,
  type CrystallinityClass,
  type MeasurementDraft,
  type MeasurementErrors,
} from '../bench-form-model';

/** Common media, offered as suggestions; any text is accepted. */
const MEDIA = [
  'water',
  '0.1 M HCl',
  'simulated gastric fluid (pH 1.2)',
  'acetate buffer pH 4.5',
  'phosphate buffer pH 6.8',
  'FaSSIF',
  'FeSSIF',
];

/** Enter one measurement for one candidate; validated field by field before anything is stored. */
export function MeasurementForm({
  projectId,
  candidateId,
  candidateLabel,
}: {
  projectId: string;
  candidateId: string;
  candidateLabel: string;
}) {
  const [draft, setDraft] = useState<MeasurementDraft>(emptyDraft());
  const [errors, setErrors] = useState<MeasurementErrors>({});
  const [status, setStatus] = useState('');
  const uid = useId();
  const spec = MEASUREMENT_KINDS[draft.kind];

  const set = <K extends keyof MeasurementDraft>(key: K, value: MeasurementDraft[K]) => {
    setDraft((d) => ({ ...d, [key]: value }));
    if (errors[key]) setErrors((e) => ({ ...e, [key]: undefined }));
  };

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const r = measurementFromDraft(draft, { projectId, candidateId });
    if (!r.ok) {
      setErrors(r.errors);
      setStatus('Not saved: fix the marked fields.');
      return;
    }
    try {
      await measurementsRepo.add(r.measurement);
      setStatus(`Saved: ${spec.label.toLowerCase()} for ${candidateLabel}.`);
      setDraft((d) => ({ ...emptyDraft(d.kind), medium: d.medium, temperatureC: d.temperatureC }));
      setErrors({});
    } catch (err) {
      setStatus(`Could not save: ${String(err)}`);
    }
  };

  const input = (
    key: 'value' | 'medium' | 'ph' | 'temperatureC' | 'text',
    label: string,
    unit?: string,
    hint?: string,
  ) => {
    const id = `${uid}-${key}`;
    const error = errors[key];
    const describedById = describedBy(id, error, hint);
    return (
      <div className={`field${key === 'text' ? ' field-wide' : ''}`}>
        <label htmlFor={id}>
          {label}
          {unit ? <span className="unit"> ({unit})</span> : null}
        </label>
        {key === 'text' ? (
          <textarea
            id={id}
            rows={2}
            value={draft.text}
            aria-invalid={error ? true : undefined}
            aria-describedby={describedById}
            onChange={(e) => set('text', e.target.value)}
          />
        ) : (
          <input
            id={id}
            value={draft[key]}
            inputMode={key === 'medium' ? 'text' : 'decimal'}
            list={key === 'medium' ? `${uid}-media` : undefined}
            aria-invalid={error ? true : undefined}
            aria-describedby={describedById}
            onChange={(e) => set(key, e.target.value)}
          />
        )}
        <FieldMessage id={id} error={error} hint={hint} />
      </div>
    );
  };

  return (
    <form
      className="bench-form"
      onSubmit={submit}
      noValidate
      aria-label={`New measurement for ${candidateLabel}`}
    >
      <div className="form-grid">
        <div className="field">
          <label htmlFor={`${uid}-kind`}>What was measured</label>
          <select
            id={`${uid}-kind`}
            value={draft.kind}
            onChange={(e) => {
              setDraft(emptyDraft(e.target.value as MeasurementKind));
              setErrors({});
            }}
          >
            {Object.entries(MEASUREMENT_KINDS).map(([k, v]) => (
              <option key={k} value={k}>
                {v.label}
              </option>
            ))}
          </select>
        </div>
        {spec.valueLabel
          ? input(
              'value',
              spec.valueLabel,
              spec.unit,
              draft.kind === 'solution-enthalpy'
                ? 'Positive when dissolving takes up heat (endothermic)'
                : draft.kind === 'mass-gain-80rh'
                  ? 'Mass gain after 24 h at 80 % RH (Ph. Eur. 5.11)'
                  : undefined,
            )
          : null}
        {draft.kind === 'crystallinity' ? (
          <div className="field">
            <label htmlFor={`${uid}-cryst`}>Solid form</label>
            <select
              id={`${uid}-cryst`}
              value={draft.crystallinity}
              onChange={(e) => set('crystallinity', e.target.value as CrystallinityClass)}
            >
              {CRYSTALLINITY_CLASSES.map((c) => (
                <option key={c} value={c}>
                  {c}
                </option>
              ))}
            </select>
          </div>
        ) : null}
        {spec.conditions.includes('medium') ? input('medium', 'Medium') : null}
        {spec.conditions.includes('ph')
          ? input('ph', 'pH at equilibrium', undefined, 'Measured in the saturated solution')
          : null}
        {spec.conditions.includes('temperatureC')
          ? input('temperatureC', 'Temperature', '°C')
          : null}
        {spec.conditions.includes('solidForm') ? (
          <div className="field">
            <label htmlFor={`${uid}-solid`}>Solid left at equilibrium</label>
            <select
              id={`${uid}-solid`}
              value={draft.solidForm}
              aria-describedby={`${uid}-solid-hint`}
              onChange={(e) => set('solidForm', e.target.value as MeasurementDraft['solidForm'])}
            >
              {SOLID_FORM_CHOICES.map((c) => (
                <option key={c.value} value={c.value}>
                  {c.label}
                </option>
              ))}
            </select>
            <p id={`${uid}-solid-hint`} className="field-hint">
              E.g. by XRPD of the residue. Not checked: the workbench reads it from the pH.
            </p>
          </div>
        ) : null}
        {input('text', draft.kind === 'note' ? 'Note' : 'Notes (method, batch, observations)')}
      </div>
      <datalist id={`${uid}-media`}>
        {MEDIA.map((m) => (
          <option key={m} value={m} />
        ))}
      </datalist>
      <div className="button-row">
        <button type="submit" className="primary">
          Save measurement
        </button>
        <span role="status" aria-live="polite" className="muted">
          {status}
        </span>
      </div>
    </form>
  );
}
