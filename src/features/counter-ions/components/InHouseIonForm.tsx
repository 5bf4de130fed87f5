import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { useState, type FormEvent } from 'react';
import { buildCustomCounterIon } from '@/chem';
import { customIonsRepo } from '@/persistence/custom-ions-repo';
import {
  EMPTY_IN_HOUSE_DRAFT as EMPTY,
  customIonInput,
  errorsOfFailedSave,
  readChargeAndPKas,
  ringsFromSmiles,
  type InHouseDraft as Draft,
  type InHouseErrors as Errors,
} from '../in-house-ion-draft';

/**
 * Add an in-house counter-ion, available to every project. Validated with the library's zod schema;
 * the molar mass is computed from the formula; a SMILES, when given, must match the formula and
 * supplies the ring counts.
 */
export function InHouseIonForm() {
  const { draft, setDraft, errors, status, busy, set, submit } = useInHouseIonDraft();
  const field = (k: keyof Draft, label: string, hint?: string, wide = false) => (
    <InHouseField
      field={k}
      value={draft[k]}
      error={errors[k]}
      label={label}
      hint={hint}
      wide={wide}
      onChange={(v) => set(k, v)}
    />
  );

  return (
    <details className="inhouse-box">
      <summary>Add an in-house counter-ion</summary>
      <form className="form-grid" aria-label="In-house counter-ion" onSubmit={submit} noValidate>
        {field('name', 'Ion name')}
        <div className="field">
          <label htmlFor="inhouse-kind">Kind</label>
          <select
            id="inhouse-kind"
            value={draft.kind}
            onChange={(e) => {
              const kind = e.target.value as Draft['kind'];
              setDraft((d) => ({ ...d, kind, charge: kind === 'anion' ? '-1' : '1' }));
            }}
          >
            <option value="anion">Anion (for basic drugs)</option>
            <option value="cation">Cation (for acidic drugs)</option>
          </select>
        </div>
        {field('formula', 'Ion formula', 'Hill or any order, without the charge, e.g. C7H7O3S')}
        {field('charge', 'Ion charge', 'e.g. -1, -2, +1')}
        {field(
          'pKas',
          'pKa values of the parent',
          '25 °C, water; parent acid, or conjugate acid of the base; commas between values',
        )}
        {field('pKaSource', 'Source of the pKa values', 'e.g. in-house measurement, report no.')}
        <div className="field">
          <label htmlFor="inhouse-class">Acceptability class</label>
          <select
            id="inhouse-class"
            value={draft.acceptabilityClass}
            onChange={(e) => set('acceptabilityClass', e.target.value)}
          >
            <option value="">None</option>
            <option value="1">1</option>
            <option value="2">2</option>
            <option value="3">3</option>
          </select>
        </div>
        {field(
          'ionSmiles',
          'Ion SMILES (optional)',
          'checked against the formula; gives the ring counts',
          true,
        )}
        {field('tradeNote', 'Note', undefined, true)}
        <div className="button-row field-wide">
          <button type="submit" className="primary" disabled={busy}>
            Save in-house ion
          </button>
          {status ? (
            <span role="status" className="muted">
              {status}
            </span>
          ) : null}
        </div>
      </form>
    </details>
  );
}

/**
 * The draft, its messages and its save: the charge and pKa values must read, a SMILES must match
 * the formula and charge (it gives the ring counts), then the core builds the ion and it is stored
 * for every project; the form keeps the kind for the next ion.
 */
function useInHouseIonDraft() {
  const [draft, setDraft] = useState<Draft>(EMPTY);
  const [errors, setErrors] = useState<Errors>({});
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const set = (k: keyof Draft, v: string) => setDraft((d) => ({ ...d, [k]: v }));

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    setStatus(null);
    const read = readChargeAndPKas(draft);
    if (!read.ok) {
      setErrors(read.errors);
      return;
    }
    setBusy(true);
    try {
      const checked = await ringsFromSmiles(draft, read.charge);
      if (!checked.ok) {
        setErrors(checked.errors);
        return;
      }
      const ion = buildCustomCounterIon(
        customIonInput(draft, read.charge, read.pKas, checked.rings),
        customIonsRepo.newInHouseId(),
      );
      await customIonsRepo.saveInHouse(ion);
      setErrors({});
      setDraft({ ...EMPTY, kind: draft.kind, charge: draft.kind === 'anion' ? '-1' : '1' });
      setStatus(
        `Saved “${ion.name}” (${ion.molarMassGPerMol.toFixed(2)} g/mol) as an in-house ion for every project.`,
      );
    } catch (err) {
      setErrors(errorsOfFailedSave(err));
    } finally {
      setBusy(false);
    }
  };
  return { draft, setDraft, errors, status, busy, set, submit };
}

/** One text field of the in-house ion form, with its message (announced) or hint. */
function InHouseField({
  field: k,
  value,
  error,
  label,
  hint,
  wide,
  onChange,
}: {
  field: keyof Draft;
  value: string;
  error: string | undefined;
  label: string;
  hint: string | undefined;
  wide: boolean;
  onChange: (value: string) => void;
}) {
  const id = `inhouse-${k}`;
  return (
    <div className={`field${wide ? ' field-wide' : ''}`}>
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        onChange={(e) => onChange(e.target.value)}
      />
      <FieldMessage id={id} error={error} hint={hint} alert />
    </div>
  );
}
