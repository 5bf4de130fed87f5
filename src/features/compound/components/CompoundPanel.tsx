import { useEffect, useRef, useState, type ChangeEvent } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { projectsRepo } from '@/persistence/projects-repo';
import { FieldMessage, describedBy } from '@/components/FieldMessage';
import { reportStorageError } from '@/stores/storage-problem-store';
import {
  compoundFromDraft,
  draftFromCompound,
  type CompoundDraft,
  type FieldErrors,
} from '../compound-form-model';
import { useStructureCheck } from '../hooks/use-structure-check';
import { StructureCard } from './StructureCard';
import '../compound.css';

/** Autosave delay after the last keystroke, ms. */
const SAVE_DELAY_MS = 250;

interface FieldProps {
  id: keyof CompoundDraft;
  label: string;
  unit?: string;
  hint?: string;
  draft: CompoundDraft;
  errors: FieldErrors;
  onChange: (id: keyof CompoundDraft, value: string) => void;
  wide?: boolean;
  inputMode?: 'decimal' | 'text';
}

function Field({ id, label, unit, hint, draft, errors, onChange, wide, inputMode }: FieldProps) {
  const error = errors[id];
  const inputId = `compound-${id}`;
  return (
    <div className={`field${wide ? ' field-wide' : ''}`}>
      <label htmlFor={inputId}>
        {label}
        {unit ? <span className="unit"> ({unit})</span> : null}
      </label>
      <input
        id={inputId}
        name={id}
        value={draft[id]}
        inputMode={inputMode}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(inputId, error, hint)}
        onChange={(e: ChangeEvent<HTMLInputElement>) => onChange(id, e.target.value)}
      />
      <FieldMessage id={inputId} error={error} hint={hint} alert />
    </div>
  );
}

export type SaveState = 'saved' | 'pending' | 'invalid' | 'error';

/**
 * The compound definition, saved as the user types. An invalid draft is never stored: the last valid
 * compound stays in the database and the fields say what is wrong.
 */
export function CompoundPanel({ project }: { project: ProjectRecord }) {
  const [draft, setDraft] = useState<CompoundDraft>(() => draftFromCompound(project.compound));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [saveState, setSaveState] = useState<SaveState>('saved');
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const projectId = project.id;
  const structure = useStructureCheck(project.compound.smiles);

  // A different project opened: start from its stored compound.
  useEffect(() => {
    setDraft(draftFromCompound(project.compound));
    setErrors({});
    setSaveState('saved');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [projectId]);

  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
  }, []);

  const change = (id: keyof CompoundDraft, value: string) => {
    const next = { ...draft, [id]: value } as CompoundDraft;
    setDraft(next);
    const result = compoundFromDraft(next, project.compound);
    if (timer.current) clearTimeout(timer.current);
    if (!result.ok) {
      setErrors(result.errors);
      setSaveState('invalid');
      return;
    }
    setErrors({});
    setSaveState('pending');
    timer.current = setTimeout(() => {
      void (async () => {
        // A changed SMILES must parse before anything is stored; a bad one keeps the old compound.
        const smiles = result.compound.smiles;
        let compound = result.compound;
        // The stored SMILES was accepted before; only a changed one needs openchemlib's verdict.
        if (smiles !== '' && smiles !== project.compound.smiles && smiles !== structure.good?.smiles) {
          const previousFormula = structure.good?.parsed.formula;
          const checked = await structure.check(smiles);
          if (checked.ok === 'stale') return;
          if (checked.ok === false) {
            setErrors((e) => ({ ...e, smiles: checked.message }));
            setSaveState('invalid');
            return;
          }
          // The formula follows a new structure unless the user typed a different one themselves.
          const parsed = checked.structure?.parsed;
          if (parsed && parsed.netCharge === 0 && (compound.formula === '' || compound.formula === previousFormula)) {
            compound = { ...compound, formula: parsed.formula };
            setDraft((d) => (d.smiles.trim() === smiles ? { ...d, formula: parsed.formula } : d));
          }
        } else if (smiles === '' && structure.good) {
          await structure.check('');
        }
        try {
          await projectsRepo.updateCompound(projectId, compound);
          setSaveState('saved');
        } catch (err) {
          reportStorageError(err);
          setSaveState('error');
        }
      })();
    }, SAVE_DELAY_MS);
  };

  const applyComputedLogP = (value: number) => {
    const next = { ...draft, logP: String(value), logPOrigin: 'computed' as const };
    setDraft(next);
    const result = compoundFromDraft(next, project.compound);
    if (!result.ok) {
      setErrors(result.errors);
      setSaveState('invalid');
      return;
    }
    setSaveState('pending');
    projectsRepo
      .updateCompound(projectId, result.compound)
      .then(() => setSaveState('saved'))
      .catch((err: unknown) => {
        // Say why (quota full, database blocked) in the shared banner; the last saved values stay.
        reportStorageError(err);
        setSaveState('error');
      });
  };

  const common = { draft, errors, onChange: change };
  return (
    <section aria-labelledby="compound-title" className="panel">
      <header className="panel-head">
        <h2 id="compound-title">Compound</h2>
        <SaveBadge state={saveState} />
      </header>
      {project.isDemo ? (
        <p className="demo-banner" role="note">
          Demo project: <strong>Demorazine is fictional</strong> and every number in it is invented for
          demonstration. Create a project for your own compound under Projects.
        </p>
      ) : null}
      <form className="form-grid" onSubmit={(e) => e.preventDefault()} aria-label="Compound definition">
        <Field id="name" label="Name" {...common} />
        <div className="field">
          <label htmlFor="compound-kind">Ionisable as</label>
          <select
            id="compound-kind"
            value={draft.kind}
            onChange={(e) => change('kind', e.target.value)}
          >
            <option value="base">Weak base (forms a cation)</option>
            <option value="acid">Weak acid (forms an anion)</option>
          </select>
        </div>
        <Field id="smiles" label="Structure (SMILES)" wide hint="Neutral free form, OpenSMILES" {...common} />
        <Field id="formula" label="Molecular formula" hint="Neutral free form, e.g. C18H20ClN3O" {...common} />
        <Field
          id="pKas"
          label={draft.kind === 'base' ? 'pKa of the conjugate acid(s)' : 'pKa(s)'}
          hint="25 °C, water; several values separated by commas"
          {...common}
        />
        <div className="field">
          <label htmlFor="compound-pKaOrigin">pKa origin</label>
          <select
            id="compound-pKaOrigin"
            value={draft.pKaOrigin}
            onChange={(e) => change('pKaOrigin', e.target.value)}
          >
            <option value="measured">Measured</option>
            <option value="literature">Literature</option>
            <option value="predicted">Predicted</option>
          </select>
        </div>
        <Field id="ionCharge" label="Charge of the salt-forming ion" hint="e.g. +1, or +2 for a dibasic drug" {...common} />
        <Field id="intrinsicSolubilityMgPerMl" label="Intrinsic solubility S₀" unit="mg/mL" inputMode="decimal" {...common} />
        <Field id="meltingPointC" label="Melting point" unit="°C" inputMode="decimal" {...common} />
        <Field id="logP" label="log P" unit="octanol/water" inputMode="decimal" {...common} />
        <div className="field">
          <label htmlFor="compound-logPOrigin">log P origin</label>
          <select
            id="compound-logPOrigin"
            value={draft.logPOrigin}
            onChange={(e) => change('logPOrigin', e.target.value)}
          >
            <option value="">Not given</option>
            <option value="measured">Measured</option>
            <option value="literature">Literature</option>
            <option value="computed">Computed (openchemlib)</option>
          </select>
        </div>
        <Field id="doseMg" label="Highest single dose" unit="mg, as free form" inputMode="decimal" {...common} />
        <Field id="densityGPerCm3" label="Density of the free form" unit="g/cm³, measured" inputMode="decimal" {...common} />
        <Field id="cellVolumeA3" label="Unit-cell volume" unit="Å³, free-form crystal" inputMode="decimal" {...common} />
        <Field id="formulaUnitsPerCell" label="Molecules per cell (Z)" inputMode="decimal" {...common} />
        <Field id="notes" label="Notes" wide {...common} />
      </form>
      <StructureCard
        compound={project.compound}
        structure={structure.good}
        status={structure.status}
        onUseLogP={applyComputedLogP}
      />
    </section>
  );
}

function SaveBadge({ state }: { state: SaveState }) {
  const text: Record<SaveState, string> = {
    saved: 'All changes saved',
    pending: 'Saving…',
    invalid: 'Not saved: fix the marked field',
    error: 'Could not save — your last saved values are kept',
  };
  return (
    <span className={`save-badge save-${state}`} role="status" aria-live="polite">
      {text[state]}
    </span>
  );
}
