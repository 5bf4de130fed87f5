import { memo, useId, useState } from 'react';
import { COUNTER_IONS, type ScreeningMedium } from '@/chem';
import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { projectsRepo } from '@/persistence/projects-repo';
import { SCREENING_SETTINGS_KEY } from '@/screening-data/screening-settings';
import type { ProjectRecord } from '@/persistence/records';
import type { DisplayRow } from '../ranking-rows';
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

const fmt = (x: number) => (x >= 100 ? x.toFixed(0) : x >= 1 ? x.toFixed(2) : x.toPrecision(2));

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
  const [draft, setDraft] = useState<BufferDraft>(EMPTY_BUFFER);
  const [errors, setErrors] = useState<BufferErrors>({});
  const [busy, setBusy] = useState(false);

  const set = (key: keyof BufferDraft, value: string) => setDraft((d) => ({ ...d, [key]: value }));
  const add = async (e: React.FormEvent) => {
    e.preventDefault();
    const r = bufferFromDraft(draft, media);
    if (!r.ok) {
      setErrors(r.errors);
      return;
    }
    setErrors({});
    setBusy(true);
    try {
      await saveMedia(project.id, media, [...media, r.medium]);
      setDraft(EMPTY_BUFFER);
    } finally {
      setBusy(false);
    }
  };
  const addPreset = async (medium: ScreeningMedium) => {
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

  const input = (
    key: Exclude<keyof BufferDraft, 'ionId'>,
    label: string,
    unit?: string,
    hint?: string,
  ) => {
    const id = `${uid}-${key}`;
    return (
      <div className="field">
        <label htmlFor={id}>
          {label}
          {unit ? <span className="unit"> ({unit})</span> : null}
        </label>
        <input
          id={id}
          value={draft[key]}
          inputMode={key === 'label' ? 'text' : 'decimal'}
          aria-invalid={errors[key] ? true : undefined}
          aria-describedby={describedBy(id, errors[key], hint)}
          onChange={(ev) => set(key, ev.target.value)}
        />
        <FieldMessage id={id} error={errors[key]} hint={hint} />
      </div>
    );
  };
  const ionFieldId = `${uid}-ionId`;

  return (
    <section className="panel buffer-media" aria-labelledby={`${uid}-title`}>
      <h2 id={`${uid}-title`}>Your dissolution media</h2>
      <p className="muted">
        A buffer you use in the lab, with the counter-ion it contains: salts of that counter-ion see
        it as a common ion. Solubility is in free-form equivalents; D₀ = (dose / 250 mL) /
        solubility (ICH M9). Estimates unless the salt’s solubility was measured.
      </p>
      {media.length > 0 ? (
        <div className="table-scroll">
          <table className="data-table" aria-label="Solubility in your media">
            <thead>
              <tr>
                <th scope="col">Candidate</th>
                {media.map((m) => (
                  <th scope="col" key={m.id}>
                    {m.label}
                    <br />
                    <span className="unit">
                      pH {m.pH};{' '}
                      {m.id.startsWith('preset-')
                        ? 'biorelevant, micelles not modelled'
                        : Object.entries(m.ions)
                            .map(([ion, c]) => `${ion} ${c} M`)
                            .join(', ')}{' '}
                      — mg/mL (D₀)
                    </span>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.id}>
                  <th scope="row">{r.label}</th>
                  {media.map((m) => {
                    const res = r.row.media.find((x) => x.id === m.id);
                    return (
                      <td key={m.id}>
                        {res ? (
                          <>
                            {fmt(res.solubilityMgPerMl)}
                            {res.doseNumber !== null ? ` (${fmt(res.doseNumber)})` : ''}
                            {res.convertsTo ? (
                              <span className="muted"> → {res.convertsTo}</span>
                            ) : null}
                          </>
                        ) : (
                          '—'
                        )}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {media.length > 0 ? (
        <ul className="buffer-list">
          {media.map((m) => (
            <li key={m.id}>
              {m.label} (pH {m.pH}){' '}
              <button
                type="button"
                onClick={() => remove(m.id)}
                aria-label={`Remove medium ${m.label}`}
              >
                Remove
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      <BiorelevantPresets media={media} busy={busy} onAdd={(m) => void addPreset(m)} />
      <form className="form-grid" onSubmit={add} noValidate aria-label="Add a dissolution medium">
        {input('label', 'Medium name', undefined, 'e.g. phosphate buffer pH 6.8')}
        {input('pH', 'pH')}
        <div className="field">
          <label htmlFor={ionFieldId}>Counter-ion in it</label>
          <select
            id={ionFieldId}
            value={draft.ionId}
            aria-invalid={errors.ionId ? true : undefined}
            aria-describedby={describedBy(ionFieldId, errors.ionId)}
            onChange={(ev) => set('ionId', ev.target.value)}
          >
            <option value="">Choose…</option>
            {ION_CHOICES.map((i) => (
              <option key={i.id} value={i.id}>
                {i.name}
              </option>
            ))}
          </select>
          <FieldMessage id={ionFieldId} error={errors.ionId} />
        </div>
        {input('concentrationM', 'Its concentration', 'mol/L')}
        {input('ionicStrengthM', 'Ionic strength', 'mol/L', 'Optional; for the Davies option')}
        <div className="field">
          <button type="submit" disabled={busy}>
            Add medium
          </button>
        </div>
      </form>
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
