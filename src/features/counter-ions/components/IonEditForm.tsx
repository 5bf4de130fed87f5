import { useState, type FormEvent } from 'react';
import type { AcceptabilityClass, CounterIonEdit, LibraryIon } from '@/chem';
import { customIonsRepo } from '@/persistence/custom-ions-repo';

const sameNumbers = (a: number[], b: number[]) =>
  a.length === b.length && a.every((x, i) => Math.abs(x - b[i]!) < 1e-9);

/** The bundled values an edit is compared with. */
type Base = Pick<LibraryIon, 'pKas' | 'acceptabilityClass' | 'tradeNote'>;

/**
 * Edit a bundled ion's pKa values, class or note for this project only. The bundled values stay in the
 * library and come back with "Restore bundled values".
 */
export function IonEditForm({ ion, projectId }: { ion: LibraryIon; projectId: string }) {
  const { base, pkas, setPkas, cls, setCls, note, setNote, error, status, save, restore } =
    useIonEdit(ion, projectId);
  const idp = `ion-edit-${ion.id}`;

  return (
    <form className="ion-edit" aria-label={`Edit ${ion.name} for this project`} onSubmit={save}>
      <h4>Your values for this project</h4>
      {ion.origin === 'edited' ? (
        <p className="ion-original">
          Bundled: pKa {base.pKas.map((p) => p.value.toFixed(2)).join(', ') || 'none'}; class{' '}
          {base.acceptabilityClass ?? 'none'}. Edited: {ion.editedFields.join(', ')}.
        </p>
      ) : null}
      <PKaField idp={idp} value={pkas} error={error} onChange={setPkas} />
      <div className="field">
        <label htmlFor={`${idp}-class`}>Acceptability class</label>
        <select id={`${idp}-class`} value={cls} onChange={(e) => setCls(e.target.value)}>
          <option value="">None</option>
          <option value="1">1</option>
          <option value="2">2</option>
          <option value="3">3</option>
        </select>
      </div>
      <div className="field">
        <label htmlFor={`${idp}-note`}>Note</label>
        <textarea
          id={`${idp}-note`}
          rows={2}
          value={note}
          onChange={(e) => setNote(e.target.value)}
        />
      </div>
      <div className="button-row">
        <button type="submit">Save for this project</button>
        {ion.origin === 'edited' ? (
          <button type="button" onClick={restore}>
            Restore bundled values
          </button>
        ) : null}
        {status ? (
          <span role="status" className="muted">
            {status}
          </span>
        ) : null}
      </div>
    </form>
  );
}

/** The edit the form starts from: what the stored edit changes against the bundled values. */
function startEditOf(ion: LibraryIon, base: Base): CounterIonEdit {
  return {
    ...(ion.origin === 'edited' &&
    !sameNumbers(
      ion.pKas.map((p) => p.value),
      base.pKas.map((p) => p.value),
    )
      ? { pKas: ion.pKas.map((p) => p.value) }
      : {}),
    ...(ion.acceptabilityClass !== base.acceptabilityClass
      ? { acceptabilityClass: ion.acceptabilityClass }
      : {}),
    ...(ion.tradeNote !== base.tradeNote ? { tradeNote: ion.tradeNote } : {}),
  };
}

/** The pKa values typed (−10 to 20, separated by commas), or null when one does not read. */
function readPKaList(text: string): number[] | null {
  const values = text
    .split(/[;\s]+|,\s*/)
    .map((s) => s.trim())
    .filter(Boolean)
    .map((t) => Number(t));
  return values.some((v) => !Number.isFinite(v) || v < -10 || v > 20) ? null : values;
}

/** Only the fields that differ from the bundled values. */
function editAgainstBundled(
  values: number[],
  cls: string,
  note: string,
  base: Base,
): CounterIonEdit {
  const edit: CounterIonEdit = {};
  const sorted = [...values].sort((a, b) => a - b);
  if (
    !sameNumbers(
      sorted,
      base.pKas.map((p) => p.value),
    )
  )
    edit.pKas = sorted;
  const clsValue = cls === '' ? null : (Number(cls) as AcceptabilityClass);
  if (clsValue !== base.acceptabilityClass) edit.acceptabilityClass = clsValue;
  if (note !== base.tradeNote) edit.tradeNote = note;
  return edit;
}

/**
 * The form's values, its save (only what differs from the bundled values is kept; an edit equal to
 * them is dropped) and the restore of the bundled values.
 */
function useIonEdit(ion: LibraryIon, projectId: string) {
  const base = ion.original ?? ion;
  const [pkas, setPkas] = useState(ion.pKas.map((p) => p.value).join(', '));
  const [cls, setCls] = useState<string>(
    ion.acceptabilityClass === null ? '' : String(ion.acceptabilityClass),
  );
  const [note, setNote] = useState(ion.tradeNote);
  const [error, setError] = useState<string | null>(null);
  /** The edit this form started from: only what differs from it is written (two tabs keep both). */
  const [startEdit] = useState<CounterIonEdit>(() => startEditOf(ion, base));
  const [status, setStatus] = useState<string | null>(null);

  const save = async (e: FormEvent) => {
    e.preventDefault();
    setStatus(null);
    const values = readPKaList(pkas);
    if (values === null) {
      setError('pKa values must be numbers from −10 to 20, separated by commas');
      return;
    }
    setError(null);
    const edit = editAgainstBundled(values, cls, note, base);
    if (Object.keys(edit).length === 0) {
      await customIonsRepo.restoreBundled(projectId, ion.id);
      setStatus('Same as the bundled values: nothing to keep as an edit.');
      return;
    }
    await customIonsRepo.saveEdit(projectId, ion.id, edit, startEdit);
    setStatus('Saved for this project. The bundled values are kept.');
  };

  const restore = async () => {
    await customIonsRepo.restoreBundled(projectId, ion.id);
    setPkas(base.pKas.map((p) => p.value).join(', '));
    setCls(base.acceptabilityClass === null ? '' : String(base.acceptabilityClass));
    setNote(base.tradeNote);
    setStatus('Bundled values restored.');
  };
  return { base, pkas, setPkas, cls, setCls, note, setNote, error, status, save, restore };
}

function PKaField({
  idp,
  value,
  error,
  onChange,
}: {
  idp: string;
  value: string;
  error: string | null;
  onChange: (value: string) => void;
}) {
  return (
    <div className="field">
      <label htmlFor={`${idp}-pkas`}>pKa values</label>
      <input
        id={`${idp}-pkas`}
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${idp}-error` : undefined}
        onChange={(e) => onChange(e.target.value)}
      />
      {error ? (
        <p className="field-error" id={`${idp}-error`} role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}
