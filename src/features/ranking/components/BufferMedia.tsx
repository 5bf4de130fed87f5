import { memo, useId, useState } from 'react';
import { COUNTER_IONS, type ScreeningMedium } from '@/chem';
import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { projectsRepo } from '@/persistence/projects-repo';
import { SCREENING_SETTINGS_KEY } from '@/screening-data/screening-settings';
import type { ProjectRecord } from '@/persistence/records';
import type { DisplayRow } from '../ranking-rows';
import { MediaTable } from './MediaTable';
import {
  BIORELEVANT_NOT_MODELLED,
  bufferFromDraft,
  EMPTY_BUFFER,
  presetChoices,
  presetComposition,
  type BufferDraft,
  type BufferErrors,
} from '../buffer-media-model';

/** Counter-ions a buffer is commonly made of are any library ion; reference-only ions are left out. */
const ION_CHOICES = COUNTER_IONS.filter((i) => !i.referenceOnly).map((i) => ({
  id: i.id,
  name: i.name,
}));

/**
 * Store the change from the list shown (`before`) to `after`: media are stored one by one (keyed by
 * id, persistence/field-stamps.ts), so a medium another tab added or removed meanwhile is kept.
 */
async function saveMedia(
  projectId: string,
  before: readonly ScreeningMedium[],
  after: readonly ScreeningMedium[],
): Promise<void> {
  const shape = (media: readonly ScreeningMedium[]) => ({
    extra: { [SCREENING_SETTINGS_KEY]: { media } },
  });
  await projectsRepo.changeSettings(projectId, shape(before), shape(after));
}

/** A text field of the new medium: label with unit, the typed text, its error or hint. */
function BufferInput({
  uid,
  k,
  label,
  unit,
  hint,
  draft,
  errors,
  onChange,
}: {
  uid: string;
  k: Exclude<keyof BufferDraft, 'ionId'>;
  label: string;
  unit?: string;
  hint?: string;
  draft: BufferDraft;
  errors: BufferErrors;
  onChange: (key: keyof BufferDraft, value: string) => void;
}) {
  const id = `${uid}-${k}`;
  return (
    <div className="field">
      <label htmlFor={id}>
        {label}
        {unit ? <span className="unit"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        value={draft[k]}
        inputMode={k === 'label' ? 'text' : 'decimal'}
        aria-invalid={errors[k] ? true : undefined}
        aria-describedby={describedBy(id, errors[k], hint)}
        onChange={(ev) => onChange(k, ev.target.value)}
      />
      <FieldMessage id={id} error={errors[k]} hint={hint} />
    </div>
  );
}

/** The counter-ion the new medium contains. */
function IonSelect(props: {
  id: string;
  value: string;
  error: BufferErrors['ionId'];
  onChange: (value: string) => void;
}) {
  const { id, value, error, onChange } = props;
  return (
    <div className="field">
      <label htmlFor={id}>Counter-ion in it</label>
      <select
        id={id}
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error)}
        onChange={(ev) => onChange(ev.target.value)}
      >
        <option value="">Choose…</option>
        {ION_CHOICES.map((i) => (
          <option key={i.id} value={i.id}>
            {i.name}
          </option>
        ))}
      </select>
      <FieldMessage id={id} error={error} />
    </div>
  );
}

/** The form of a new medium: checked when sent, stored by `onAdd`, emptied once stored. */
function AddMediumForm({
  media,
  busy,
  onAdd,
}: {
  media: readonly ScreeningMedium[];
  busy: boolean;
  onAdd: (medium: ScreeningMedium) => Promise<void>;
}) {
  const uid = useId();
  const [draft, setDraft] = useState<BufferDraft>(EMPTY_BUFFER);
  const [errors, setErrors] = useState<BufferErrors>({});
  const set = (key: keyof BufferDraft, value: string) => setDraft((d) => ({ ...d, [key]: value }));
  const add = async (e: React.FormEvent) => {
    e.preventDefault();
    const r = bufferFromDraft(draft, media);
    if (!r.ok) {
      setErrors(r.errors);
      return;
    }
    setErrors({});
    await onAdd(r.medium);
    setDraft(EMPTY_BUFFER);
  };
  const field = { uid, draft, errors, onChange: set };
  return (
    <form className="form-grid" onSubmit={add} noValidate aria-label="Add a dissolution medium">
      <BufferInput {...field} k="label" label="Medium name" hint="e.g. phosphate buffer pH 6.8" />
      <BufferInput {...field} k="pH" label="pH" />
      <IonSelect
        id={`${uid}-ionId`}
        value={draft.ionId}
        error={errors.ionId}
        onChange={(v) => set('ionId', v)}
      />
      <BufferInput {...field} k="concentrationM" label="Its concentration" unit="mol/L" />
      <BufferInput
        {...field}
        k="ionicStrengthM"
        label="Ionic strength"
        unit="mol/L"
        hint="Optional; for the Davies option"
      />
      <div className="field">
        <button type="submit" disabled={busy}>
          Add medium
        </button>
      </div>
    </form>
  );
}

/** The media defined so far, each with its remove button. */
function MediaList(props: { media: readonly ScreeningMedium[]; onRemove: (id: string) => void }) {
  return (
    <ul className="buffer-list">
      {props.media.map((m) => (
        <li key={m.id}>
          {m.label} (pH {m.pH}){' '}
          <button
            type="button"
            onClick={() => props.onRemove(m.id)}
            aria-label={`Remove medium ${m.label}`}
          >
            Remove
          </button>
        </li>
      ))}
    </ul>
  );
}

/**
 * Dissolution media of the user's own (buffers with a counter-ion in them): defined here, applied by
 * the screen as a common ion to the salts of that counter-ion, and shown per candidate as solubility
 * and dose number (ICH M9: highest dose in 250 mL).
 */
export const BufferMedia = memo(function BufferMediaView({
  project,
  media,
  rows,
}: {
  project: ProjectRecord;
  media: readonly ScreeningMedium[];
  rows: readonly DisplayRow[];
}) {
  const uid = useId();
  const [busy, setBusy] = useState(false);
  const addMedium = async (medium: ScreeningMedium) => {
    setBusy(true);
    try {
      await saveMedia(project.id, media, [...media, medium]);
    } finally {
      setBusy(false);
    }
  };
  const remove = (id: string) =>
    void saveMedia(
      project.id,
      media,
      media.filter((m) => m.id !== id),
    );
  return (
    <section className="panel buffer-media" aria-labelledby={`${uid}-title`}>
      <h2 id={`${uid}-title`}>Your dissolution media</h2>
      <p className="muted">
        A buffer you use in the lab, with the counter-ion it contains: salts of that counter-ion see
        it as a common ion. Solubility is in free-form equivalents; D₀ = (dose / 250 mL) /
        solubility (ICH M9). Estimates unless the salt’s solubility was measured.
      </p>
      {media.length > 0 ? <MediaTable media={media} rows={rows} /> : null}
      {media.length > 0 ? <MediaList media={media} onRemove={remove} /> : null}
      <BiorelevantPresets media={media} busy={busy} onAdd={(m) => void addMedium(m)} />
      <AddMediumForm media={media} busy={busy} onAdd={addMedium} />
    </section>
  );
});

/** The biorelevant media as one-click presets, each with its composition, source and what is not modelled. */
function BiorelevantPresets({
  media,
  busy,
  onAdd,
}: {
  media: readonly ScreeningMedium[];
  busy: boolean;
  onAdd: (m: ScreeningMedium) => void;
}) {
  const uid = useId();
  const presets = presetChoices(media);
  return (
    <div className="biorelevant-presets" role="group" aria-labelledby={`${uid}-presets`}>
      <h3 id={`${uid}-presets`}>Biorelevant media</h3>
      <ul className="preset-list">
        {presets.map(({ preset, medium, added }) => (
          <li key={preset.id}>
            <button
              type="button"
              disabled={busy || added}
              onClick={() => onAdd(medium)}
              aria-label={`Add ${preset.label} (pH ${preset.pH})`}
            >
              {added ? `${preset.label} added` : `Add ${preset.label}`}
            </button>{' '}
            <span className="muted">
              pH {preset.pH}: {presetComposition(preset)} — {preset.source}
            </span>
          </li>
        ))}
      </ul>
      <p className="muted">{BIORELEVANT_NOT_MODELLED}</p>
    </div>
  );
}
