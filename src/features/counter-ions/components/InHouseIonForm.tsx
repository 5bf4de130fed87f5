import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { useState, type FormEvent } from 'react';
import {
  ChemInputError,
  buildCustomCounterIon,
  parseFormula,
  parseStructure,
  sameElements,
  type AcceptabilityClass,
} from '@/chem';
import { customIonsRepo } from '@/persistence/custom-ions-repo';

interface Draft {
  name: string;
  kind: 'anion' | 'cation';
  formula: string;
  charge: string;
  pKas: string;
  pKaSource: string;
  acceptabilityClass: string;
  ionSmiles: string;
  tradeNote: string;
}

const EMPTY: Draft = {
  name: '',
  kind: 'anion',
  formula: '',
  charge: '-1',
  pKas: '',
  pKaSource: '',
  acceptabilityClass: '',
  ionSmiles: '',
  tradeNote: '',
};

type Errors = Partial<Record<keyof Draft, string>>;

/**
 * Add an in-house counter-ion, available to every project. Validated with the library's zod schema;
 * the molar mass is computed from the formula; a SMILES, when given, must match the formula and
 * supplies the ring counts.
 */
export function InHouseIonForm() {
  const [draft, setDraft] = useState<Draft>(EMPTY);
  const [errors, setErrors] = useState<Errors>({});
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const set = (k: keyof Draft, v: string) => setDraft((d) => ({ ...d, [k]: v }));

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    setStatus(null);
    const errs: Errors = {};
    const charge = Number(draft.charge.replace('−', '-').replace('+', ''));
    if (!Number.isInteger(charge)) errs.charge = 'Charge must be a whole number';
    const pkTexts = draft.pKas
      .split(/[;\s]+|,\s*/)
      .map((s) => s.trim())
      .filter(Boolean);
    const pKas = pkTexts.map((t) => Number(t.replace('−', '-')));
    if (pKas.some((v) => !Number.isFinite(v)))
      errs.pKas = 'pKa values must be numbers, separated by commas';
    if (Object.keys(errs).length) {
      setErrors(errs);
      return;
    }
    setBusy(true);
    try {
      let rings = { aromatic: 0, nonAromatic: 0 };
      if (draft.ionSmiles.trim()) {
        let s;
        try {
          s = await parseStructure(draft.ionSmiles);
        } catch (err) {
          setErrors({
            ionSmiles:
              err instanceof ChemInputError
                ? err.message.replace(/^smiles: /, '')
                : 'Cannot read this SMILES',
          });
          return;
        }
        let typed;
        try {
          typed = parseFormula(draft.formula, 'formula').elements;
        } catch (err) {
          setErrors({
            formula:
              err instanceof Error
                ? err.message.replace(/^formula: /, '')
                : 'Cannot read this formula',
          });
          return;
        }
        if (!sameElements(typed, s.elements)) {
          setErrors({ formula: `The formula differs from the SMILES (${s.formula})` });
          return;
        }
        if (s.netCharge !== charge) {
          setErrors({ charge: `The SMILES carries charge ${s.netCharge}` });
          return;
        }
        rings = s.rings;
      }
      const ion = buildCustomCounterIon(
        {
          name: draft.name,
          kind: draft.kind,
          formula: draft.formula,
          charge,
          ionSmiles: draft.ionSmiles,
          pKas,
          pKaSource: draft.pKaSource,
          acceptabilityClass:
            draft.acceptabilityClass === ''
              ? null
              : (Number(draft.acceptabilityClass) as AcceptabilityClass),
          tradeNote: draft.tradeNote,
          aromaticRings: rings.aromatic,
          nonAromaticRings: rings.nonAromatic,
        },
        customIonsRepo.newInHouseId(),
      );
      await customIonsRepo.saveInHouse(ion);
      setErrors({});
      setDraft({ ...EMPTY, kind: draft.kind, charge: draft.kind === 'anion' ? '-1' : '1' });
      setStatus(
        `Saved “${ion.name}” (${ion.molarMassGPerMol.toFixed(2)} g/mol) as an in-house ion for every project.`,
      );
    } catch (err) {
      if (err instanceof ChemInputError) {
        const key = (err.field in EMPTY ? err.field : 'name') as keyof Draft;
        setErrors({ [key]: err.message.replace(/^[^:]+: /, '') });
      } else {
        setErrors({ name: err instanceof Error ? err.message : 'Could not save the ion' });
      }
    } finally {
      setBusy(false);
    }
  };

  const field = (k: keyof Draft, label: string, hint?: string, wide = false) => {
    const id = `inhouse-${k}`;
    return (
      <div className={`field${wide ? ' field-wide' : ''}`}>
        <label htmlFor={id}>{label}</label>
        <input
          id={id}
          value={draft[k]}
          aria-invalid={errors[k] ? true : undefined}
          aria-describedby={describedBy(id, errors[k], hint)}
          onChange={(e) => set(k, e.target.value)}
        />
        <FieldMessage id={id} error={errors[k]} hint={hint} alert />
      </div>
    );
  };

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
