import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { useId, useState, type FormEvent } from 'react';
import { projectsRepo } from '@/persistence/projects-repo';
import {
  EMPTY_NEW_PROJECT,
  newProjectFromDraft,
  type NewProjectDraft,
  type NewProjectErrors,
} from '../new-project-model';

/** The draft, its field errors and the save: a project is created only from a draft that checks. */
function useNewProjectDraft(onCreated: (projectId: string) => void) {
  const [draft, setDraft] = useState<NewProjectDraft>(EMPTY_NEW_PROJECT);
  const [errors, setErrors] = useState<NewProjectErrors>({});
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);

  const set = (key: keyof NewProjectDraft, value: string) => {
    setDraft((d) => {
      const next = { ...d, [key]: value } as NewProjectDraft;
      if (key === 'kind') next.ionCharge = value === 'acid' ? '-1' : '1';
      return next;
    });
    if (errors[key]) setErrors((e) => ({ ...e, [key]: undefined }));
  };

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const result = newProjectFromDraft(draft);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setBusy(true);
    setFailure(null);
    try {
      const project = await projectsRepo.create(result.name, result.compound);
      setDraft(EMPTY_NEW_PROJECT);
      setErrors({});
      onCreated(project.id);
    } catch (err) {
      setFailure(`The project could not be saved: ${String(err)}`);
    } finally {
      setBusy(false);
    }
  };

  return { draft, errors, busy, failure, set, submit };
}

/** One text field of the draft with its label, hint and error. */
function DraftField({
  uid,
  field,
  label,
  hint,
  wide = false,
  value,
  error,
  onChange,
}: {
  uid: string;
  field: keyof NewProjectDraft;
  label: string;
  hint?: string;
  wide?: boolean;
  value: string;
  error: string | undefined;
  onChange: (value: string) => void;
}) {
  const id = `${uid}-${field}`;
  return (
    <div className={`field${wide ? ' field-wide' : ''}`}>
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        name={field}
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        onChange={(ev) => onChange(ev.target.value)}
      />
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

/** Create a project from a name, a structure (SMILES or formula), acid/base and one pKa. */
export function NewProjectForm({ onCreated }: { onCreated: (projectId: string) => void }) {
  const { draft, errors, busy, failure, set, submit } = useNewProjectDraft(onCreated);
  const uid = useId();
  const field = (key: keyof NewProjectDraft, label: string, hint?: string, wide = false) => (
    <DraftField
      uid={uid}
      field={key}
      label={label}
      hint={hint}
      wide={wide}
      value={draft[key]}
      error={errors[key]}
      onChange={(v) => set(key, v)}
    />
  );

  return (
    <form
      className="panel new-project"
      aria-labelledby={`${uid}-title`}
      onSubmit={submit}
      noValidate
    >
      <h2 id={`${uid}-title`}>Start a project</h2>
      <div className="form-grid">
        {field('name', 'Project name')}
        <div className="field">
          <label htmlFor={`${uid}-kind`}>Ionisable as</label>
          <select
            id={`${uid}-kind`}
            value={draft.kind}
            onChange={(ev) => set('kind', ev.target.value)}
          >
            <option value="base">Base (forms a cation)</option>
            <option value="acid">Acid (forms an anion)</option>
          </select>
        </div>
        {field(
          'smiles',
          'Structure (SMILES)',
          'Neutral free form; or give the formula instead',
          true,
        )}
        {field('formula', 'Molecular formula', 'Optional when a SMILES is given, e.g. C18H20ClN3O')}
        {field(
          'pKa',
          draft.kind === 'base' ? 'pKa of the conjugate acid' : 'pKa',
          '25 °C, water; more values in the Compound area',
        )}
        {field(
          'ionCharge',
          'Charge of the salt-forming ion',
          draft.kind === 'base' ? '+1, +2 or +3' : '−1, −2 or −3',
        )}
      </div>
      {failure ? (
        <p className="field-error" role="alert">
          {failure}
        </p>
      ) : null}
      <div className="button-row">
        <button type="submit" className="primary" disabled={busy}>
          {busy ? 'Creating…' : 'Create project'}
        </button>
      </div>
    </form>
  );
}
