import { useEffect, useRef, useState } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { projectsRepo } from '@/persistence/projects-repo';
import { flushBeforeLeaving } from '@/persistence/unsaved-edits';
import { reportStorageError } from '@/stores/storage-problem-store';
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
import type { SaveState } from '../components/CompoundFields';
import type { useStructureCheck } from './use-structure-check';

/**
 * Autosave delay after the last keystroke, ms: a word typed is one write, not one per letter. A
 * waiting save is started at once when the area is left or the page is hidden or goes away.
 */
const SAVE_DELAY_MS = 250;

/**
 * The compound draft on screen and its autosave. An invalid draft is never stored: the last valid
 * compound stays in the database and the fields say what is wrong.
 *
 * Durability (README, "Using the workbench"): a valid edit is written shortly after the last
 * keystroke, and at once when the page is hidden, reloaded or closed; a write still in flight then is
 * kept aside and finished on the next start (persistence/unsaved-edits.ts). Only a changed SMILES
 * waits for its structure check; the other fields are written meanwhile. Writes are
 * field-level: only the fields edited here are laid over the stored compound, and fields another tab
 * changed are taken over on screen unless they are being edited here.
 */
export function useCompoundAutosave(
  project: ProjectRecord,
  structure: ReturnType<typeof useStructureCheck>,
) {
  const [draft, setDraftState] = useState<CompoundDraft>(() => draftFromCompound(project.compound));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [saveState, setSaveState] = useState<SaveState>('saved');
  const projectId = project.id;
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

  return { draft, errors, saveState, change, applyComputedLogP };
}
