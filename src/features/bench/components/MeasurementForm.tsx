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

type TextKey = 'value' | 'medium' | 'ph' | 'temperatureC' | 'text';
type SetField = <K extends keyof MeasurementDraft>(key: K, value: MeasurementDraft[K]) => void;

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
  const form = useMeasurementDraft(projectId, candidateId, candidateLabel);
  const uid = useId();
  const { draft, errors, set } = form;
  const spec = MEASUREMENT_KINDS[draft.kind];
  const field = (key: TextKey, label: string, unit?: string, hint?: string) => (
    <DraftField
      uid={uid}
      field={key}
      value={draft[key]}
      error={errors[key]}
      set={set}
      label={label}
      unit={unit}
      hint={hint}
    />
  );

  return (
    <form
      className="bench-form"
      onSubmit={form.submit}
      noValidate
      aria-label={`New measurement for ${candidateLabel}`}
    >
      <div className="form-grid">
        <KindSelect uid={uid} kind={draft.kind} onChange={form.changeKind} />
        {spec.valueLabel ? field('value', spec.valueLabel, spec.unit, valueHint(draft.kind)) : null}
        {draft.kind === 'crystallinity' ? (
          <CrystallinitySelect uid={uid} value={draft.crystallinity} set={set} />
        ) : null}
        {spec.conditions.includes('medium') ? field('medium', 'Medium') : null}
        {spec.conditions.includes('ph')
          ? field('ph', 'pH at equilibrium', undefined, 'Measured in the saturated solution')
          : null}
        {spec.conditions.includes('temperatureC')
          ? field('temperatureC', 'Temperature', '°C')
          : null}
        {spec.conditions.includes('solidForm') ? (
          <SolidFormSelect uid={uid} value={draft.solidForm} set={set} />
        ) : null}
        {field('text', draft.kind === 'note' ? 'Note' : 'Notes (method, batch, observations)')}
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
          {form.status}
        </span>
      </div>
    </form>
  );
}

/** The hint under the value field, for the kinds whose sign or protocol needs saying. */
function valueHint(kind: MeasurementKind): string | undefined {
  if (kind === 'solution-enthalpy') return 'Positive when dissolving takes up heat (endothermic)';
  if (kind === 'mass-gain-80rh') return 'Mass gain after 24 h at 80 % RH (Ph. Eur. 5.11)';
  return undefined;
}

/**
 * The draft on screen, its field errors and the save: a draft that does not validate is not stored
 * (the marked fields say why); after a save the medium and temperature stay for the next entry.
 */
function useMeasurementDraft(projectId: string, candidateId: string, candidateLabel: string) {
  const [draft, setDraft] = useState<MeasurementDraft>(emptyDraft());
  const [errors, setErrors] = useState<MeasurementErrors>({});
  const [status, setStatus] = useState('');

  const set: SetField = (key, value) => {
    setDraft((d) => ({ ...d, [key]: value }));
    if (errors[key]) setErrors((e) => ({ ...e, [key]: undefined }));
  };
  const changeKind = (kind: MeasurementKind) => {
    setDraft(emptyDraft(kind));
    setErrors({});
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
      const spec = MEASUREMENT_KINDS[draft.kind];
      setStatus(`Saved: ${spec.label.toLowerCase()} for ${candidateLabel}.`);
      setDraft((d) => ({ ...emptyDraft(d.kind), medium: d.medium, temperatureC: d.temperatureC }));
      setErrors({});
    } catch (err) {
      setStatus(`Could not save: ${String(err)}`);
    }
  };
  return { draft, errors, status, set, changeKind, submit };
}

/** One text field of the draft (a text area for the notes), with its message or hint. */
function DraftField({
  uid,
  field,
  value,
  error,
  set,
  label,
  unit,
  hint,
}: {
  uid: string;
  field: TextKey;
  value: string;
  error: string | undefined;
  set: SetField;
  label: string;
  unit?: string | undefined;
  hint?: string | undefined;
}) {
  const id = `${uid}-${field}`;
  const describedById = describedBy(id, error, hint);
  return (
    <div className={`field${field === 'text' ? ' field-wide' : ''}`}>
      <label htmlFor={id}>
        {label}
        {unit ? <span className="unit"> ({unit})</span> : null}
      </label>
      {field === 'text' ? (
        <textarea
          id={id}
          rows={2}
          value={value}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedById}
          onChange={(e) => set('text', e.target.value)}
        />
      ) : (
        <input
          id={id}
          value={value}
          inputMode={field === 'medium' ? 'text' : 'decimal'}
          list={field === 'medium' ? `${uid}-media` : undefined}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedById}
          onChange={(e) => set(field, e.target.value)}
        />
      )}
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

function KindSelect({
  uid,
  kind,
  onChange,
}: {
  uid: string;
  kind: MeasurementKind;
  onChange: (kind: MeasurementKind) => void;
}) {
  return (
    <div className="field">
      <label htmlFor={`${uid}-kind`}>What was measured</label>
      <select
        id={`${uid}-kind`}
        value={kind}
        onChange={(e) => onChange(e.target.value as MeasurementKind)}
      >
        {Object.entries(MEASUREMENT_KINDS).map(([k, v]) => (
          <option key={k} value={k}>
            {v.label}
          </option>
        ))}
      </select>
    </div>
  );
}

function CrystallinitySelect({
  uid,
  value,
  set,
}: {
  uid: string;
  value: CrystallinityClass;
  set: SetField;
}) {
  return (
    <div className="field">
      <label htmlFor={`${uid}-cryst`}>Solid form</label>
      <select
        id={`${uid}-cryst`}
        value={value}
        onChange={(e) => set('crystallinity', e.target.value as CrystallinityClass)}
      >
        {CRYSTALLINITY_CLASSES.map((c) => (
          <option key={c} value={c}>
            {c}
          </option>
        ))}
      </select>
    </div>
  );
}

/** The solid the user saw at equilibrium (e.g. by XRPD), stated, not checked. */
function SolidFormSelect({
  uid,
  value,
  set,
}: {
  uid: string;
  value: MeasurementDraft['solidForm'];
  set: SetField;
}) {
  return (
    <div className="field">
      <label htmlFor={`${uid}-solid`}>Solid left at equilibrium</label>
      <select
        id={`${uid}-solid`}
        value={value}
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
  );
}
