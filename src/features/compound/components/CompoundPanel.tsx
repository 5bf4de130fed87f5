import { useEffect, useRef, useState } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { projectsRepo } from '@/persistence/projects-repo';
import { flushBeforeLeaving } from '@/persistence/unsaved-edits';
import { reportStorageError, useStorageProblemStore } from '@/stores/storage-problem-store';
import type { Compound } from '@/chem';
import {
  DRAFT_KEYS,
  changesFor,
  compoundFromDraft,
  draftFromCompound,
  sameFieldValue,
  type CompoundDraft,
  type FieldErrors,
} from '../compound-form-model';
import { useStructureCheck } from '../hooks/use-structure-check';
import { StructureCard } from './StructureCard';
import { Field, SaveBadge, type SaveState } from './CompoundFields';
import '../compound.css';

/**
 * Autosave delay after the last keystroke, ms: a word typed is one write, not one per letter. A
 * waiting save is started at once when the area is left or the page is hidden or goes away.
 */
const SAVE_DELAY_MS = 250;

/**
 * The compound definition, saved as the user types. An invalid draft is never stored: the last valid
 * compound stays in the database and the fields say what is wrong.
 *
 * Durability (README, "Using the workbench"): a valid edit is written shortly after the last
 * keystroke, and at once when the page is hidden, reloaded or closed; a write still in flight then is
 * kept aside and finished on the next start (persistence/unsaved-edits.ts). Only a changed SMILES
 * waits for its structure check; the other fields are written meanwhile. Writes are
 * field-level: only the fields edited here are laid over the stored compound, and fields another tab
 * changed are taken over on screen unless they are being edited here.
 */
export function CompoundPanel({ project }: { project: ProjectRecord }) {
  const [draft, setDraftState] = useState<CompoundDraft>(() => draftFromCompound(project.compound));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [saveState, setSaveState] = useState<SaveState>('saved');
  const projectId = project.id;
  const structure = useStructureCheck(project.compound.smiles);
  // A lost database connection outranks this panel's own state (the banner says why).
  const connectionLost = useStorageProblemStore((s) => s.connectionLost !== null);

  /** The latest draft (event handlers and async saves read it, never a stale render's copy). */
  const draftRef = useRef(draft);
  /** The latest stored compound seen. */
  const storedRef = useRef(project.compound);
  storedRef.current = project.compound;
  /** Fields edited here and not yet stored, with the edit number of their last change. */
  const edited = useRef(new Map<keyof CompoundDraft, number>());
  const editSeq = useRef(0);
  const inFlight = useRef(0);

  const setDraft = (next: CompoundDraft) => {
    draftRef.current = next;
    setDraftState(next);
  };

  /** Starts the waiting save at once (set below, once `save` exists). */
  const flushRef = useRef<() => void>(() => undefined);
  /** The project the draft on screen belongs to (saves go there, even during a switch). */
  const draftProject = useRef(projectId);

  // A different project opened: save what waits for the previous one, then start from the stored compound.
  useEffect(() => {
    if (draftProject.current === projectId) return;
    flushRef.current();
    draftProject.current = projectId;
    edited.current.clear();
    setDraft(draftFromCompound(project.compound));
    setErrors({});
    setSaveState('saved');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [projectId]);

  // The stored compound changed (this tab's own write, or another tab's): show the stored value of
  // every field that is not being edited here.
  useEffect(() => {
    const stored = draftFromCompound(project.compound);
    const current = draftRef.current;
    let next: CompoundDraft | null = null;
    for (const key of DRAFT_KEYS) {
      if (edited.current.has(key) || sameFieldValue(key, current[key], stored[key])) continue;
      next ??= { ...current };
      (next as unknown as Record<string, string>)[key] = stored[key];
    }
    if (next) setDraft(next);
  }, [project.compound]);

  const settle = () => {
    if (inFlight.current === 0 && edited.current.size === 0) setSaveState('saved');
  };

  /** Write the given fields now; they stop counting as edited once stored (unless edited again). */
  const write = (changes: Partial<Compound>, keys: readonly (keyof CompoundDraft)[]) => {
    const upTo = editSeq.current;
    const target = draftProject.current;
    inFlight.current++;
    setSaveState('pending');
    projectsRepo
      .patchCompound(target, changes)
      .then(() => {
        inFlight.current--;
        for (const key of keys) {
          if ((edited.current.get(key) ?? 0) <= upTo) edited.current.delete(key);
        }
        settle();
      })
      .catch((err: unknown) => {
        inFlight.current--;
        // Say why (quota full, database closed) in the shared banner; the last saved values stay.
        reportStorageError(err);
        setSaveState('error');
      });
  };

  const save = async () => {
    const result = compoundFromDraft(draftRef.current, storedRef.current);
    if (!result.ok) {
      setErrors(result.errors);
      setSaveState('invalid');
      return;
    }
    setErrors({});
    const keys = [...edited.current.keys()];
    if (keys.length === 0) return settle();
    const compound = result.compound;
    const smiles = compound.smiles;
    const stored = storedRef.current;
    // A changed SMILES must parse before it is stored; a bad one keeps the old structure. The stored
    // SMILES was accepted before; only a changed one needs openchemlib's verdict.
    const needsCheck =
      keys.includes('smiles') &&
      smiles !== '' &&
      smiles !== stored.smiles &&
      smiles !== structure.good?.smiles;
    if (!needsCheck) {
      if (keys.includes('smiles') && smiles === '' && structure.good) void structure.check('');
      write(changesFor(compound, keys), keys);
      return;
    }
    const others = keys.filter((k) => k !== 'smiles');
    if (others.length) write(changesFor(compound, others), others);
    setSaveState('pending');
    const previousFormula = structure.good?.parsed.formula;
    const checked = await structure.check(smiles);
    if (checked.ok === 'stale') return;
    if (checked.ok === false) {
      setErrors((e) => ({ ...e, smiles: checked.message }));
      setSaveState('invalid');
      return;
    }
    const changes: Partial<Compound> = { smiles };
    // The formula follows a new structure unless the user typed a different one themselves.
    const parsed = checked.structure?.parsed;
    const formula = storedRef.current.formula;
    if (
      parsed &&
      parsed.netCharge === 0 &&
      (formula === '' || formula === previousFormula) &&
      !edited.current.has('formula')
    ) {
      changes.formula = parsed.formula;
      const shown = draftRef.current;
      if (shown.smiles.trim() === smiles) setDraft({ ...shown, formula: parsed.formula });
    }
    write(changes, ['smiles']);
  };

  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const saveRef = useRef(save);
  saveRef.current = save;
  /** Start the waiting save now (its write is then tracked until IndexedDB confirms it). */
  const flush = () => {
    if (!timer.current) return;
    clearTimeout(timer.current);
    timer.current = null;
    void saveRef.current();
  };
  flushRef.current = flush;
  // Leaving the area, or the page being hidden, reloaded or closed, saves at once.
  useEffect(() => {
    const stop = flushBeforeLeaving(() => flushRef.current());
    return () => {
      stop();
      flushRef.current();
    };
  }, []);

  const edit = (changes: Partial<CompoundDraft>, delayMs = SAVE_DELAY_MS) => {
    const next = { ...draftRef.current, ...changes } as CompoundDraft;
    setDraft(next);
    editSeq.current++;
    for (const key of Object.keys(changes) as (keyof CompoundDraft)[])
      edited.current.set(key, editSeq.current);
    const result = compoundFromDraft(next, storedRef.current);
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (!result.ok) {
      setErrors(result.errors);
      setSaveState('invalid');
      return;
    }
    setErrors({});
    setSaveState('pending');
    timer.current = setTimeout(() => {
      timer.current = null;
      void saveRef.current();
    }, delayMs);
  };

  const change = (id: keyof CompoundDraft, value: string) => edit({ [id]: value });
  const applyComputedLogP = (value: number) =>
    edit({ logP: String(value), logPOrigin: 'computed' }, 0);

  const common = { draft, errors, onChange: change };
  return (
    <section aria-labelledby="compound-title" className="panel">
      <header className="panel-head">
        <h2 id="compound-title">Compound</h2>
        <SaveBadge state={connectionLost ? 'lost' : saveState} />
      </header>
      {project.isDemo ? (
        <p className="demo-banner" role="note">
          Demo project: <strong>Demorazine is fictional</strong> and every number in it is invented
          for demonstration. Create a project for your own compound under Projects.
        </p>
      ) : null}
      <form
        className="form-grid"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Compound definition"
      >
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
        <Field
          id="smiles"
          label="Structure (SMILES)"
          wide
          hint="Neutral free form, OpenSMILES"
          {...common}
        />
        <Field
          id="formula"
          label="Molecular formula"
          hint="Neutral free form, e.g. C18H20ClN3O"
          {...common}
        />
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
        <Field
          id="ionCharge"
          label="Charge of the salt-forming ion"
          hint="e.g. +1, or +2 for a dibasic drug"
          {...common}
        />
        <Field
          id="intrinsicSolubilityMgPerMl"
          label="Intrinsic solubility S₀"
          unit="mg/mL"
          inputMode="decimal"
          {...common}
        />
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
        <Field
          id="doseMg"
          label="Highest single dose"
          unit="mg, as free form"
          inputMode="decimal"
          {...common}
        />
        <Field
          id="densityGPerCm3"
          label="Density of the free form"
          unit="g/cm³, measured"
          inputMode="decimal"
          {...common}
        />
        <Field
          id="cellVolumeA3"
          label="Unit-cell volume"
          unit="Å³, free-form crystal"
          inputMode="decimal"
          {...common}
        />
        <Field
          id="formulaUnitsPerCell"
          label="Molecules per cell (Z)"
          inputMode="decimal"
          {...common}
        />
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
