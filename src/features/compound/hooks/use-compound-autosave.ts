import { useEffect, useRef, useState, type RefObject } from 'react';
import type { ProjectRecord } from '@/persistence/records';
import { flushBeforeLeaving } from '@/persistence/unsaved-edits';
import type { Compound } from '@/chem';
import {
  DRAFT_KEYS,
  compoundFromDraft,
  draftFromCompound,
  sameFieldValue,
  type CompoundDraft,
  type FieldErrors,
} from '../compound-form-model';
import type { SaveState } from '../components/CompoundFields';
import type { useStructureCheck } from './use-structure-check';
import { saveDraft, type AutosaveContext } from './compound-autosave-steps';

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
 * waits for its structure check; the other fields are written meanwhile (compound-autosave-steps.ts).
 * Writes are field-level: only the fields edited here are laid over the stored compound, and fields
 * another tab changed are taken over on screen unless they are being edited here.
 */
export function useCompoundAutosave(
  project: ProjectRecord,
  structure: ReturnType<typeof useStructureCheck>,
) {
  const { ctx, draft, errors, saveState } = useAutosaveState(project);
  /** Starts the waiting save at once (set by useDebouncedSave, once the save exists). */
  const flushRef = useRef<() => void>(() => undefined);
  useProjectSwitch(project, ctx, flushRef);
  useStoredCompoundShown(project.compound, ctx);
  const saver = useDebouncedSave(() => saveDraft(ctx, structure), flushRef);

  const edit = (changes: Partial<CompoundDraft>, delayMs = SAVE_DELAY_MS) => {
    const next = { ...ctx.draftRef.current, ...changes } as CompoundDraft;
    ctx.setDraft(next);
    ctx.editSeq.current++;
    for (const key of Object.keys(changes) as (keyof CompoundDraft)[])
      ctx.edited.current.set(key, ctx.editSeq.current);
    const result = compoundFromDraft(next, ctx.storedRef.current);
    saver.cancel();
    if (!result.ok) {
      ctx.setErrors(result.errors);
      ctx.setSaveState('invalid');
      return;
    }
    ctx.setErrors({});
    ctx.setSaveState('pending');
    saver.schedule(delayMs);
  };

  const change = (id: keyof CompoundDraft, value: string) => edit({ [id]: value });
  const applyComputedLogP = (value: number) =>
    edit({ logP: String(value), logPOrigin: 'computed' }, 0);

  return { draft, errors, saveState, change, applyComputedLogP };
}

/** The draft, errors and save state on screen, and the refs the autosave's steps share. */
function useAutosaveState(project: ProjectRecord) {
  const [draft, setDraftState] = useState<CompoundDraft>(() => draftFromCompound(project.compound));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [saveState, setSaveState] = useState<SaveState>('saved');
  /** The latest draft (event handlers and async saves read it, never a stale render's copy). */
  const draftRef = useRef(draft);
  /** The latest stored compound seen. */
  const storedRef = useRef<Compound>(project.compound);
  storedRef.current = project.compound;
  /** Fields edited here and not yet stored, with the edit number of their last change. */
  const edited = useRef(new Map<keyof CompoundDraft, number>());
  const editSeq = useRef(0);
  const inFlight = useRef(0);
  /** The project the draft on screen belongs to (saves go there, even during a switch). */
  const draftProject = useRef(project.id);
  const setDraft = (next: CompoundDraft) => {
    draftRef.current = next;
    setDraftState(next);
  };
  const ctx: AutosaveContext = {
    draftRef,
    storedRef,
    edited,
    editSeq,
    inFlight,
    draftProject,
    setDraft,
    setErrors,
    setSaveState,
  };
  return { ctx, draft, errors, saveState };
}

/** A different project opened: save what waits for the previous one, then start from the stored compound. */
function useProjectSwitch(
  project: ProjectRecord,
  ctx: AutosaveContext,
  flushRef: RefObject<() => void>,
) {
  const projectId = project.id;
  useEffect(() => {
    if (ctx.draftProject.current === projectId) return;
    flushRef.current();
    ctx.draftProject.current = projectId;
    ctx.edited.current.clear();
    ctx.setDraft(draftFromCompound(project.compound));
    ctx.setErrors({});
    ctx.setSaveState('saved');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [projectId]);
}

/**
 * The stored compound changed (this tab's own write, or another tab's): show the stored value of
 * every field that is not being edited here.
 */
function useStoredCompoundShown(compound: Compound, ctx: AutosaveContext) {
  useEffect(() => {
    const stored = draftFromCompound(compound);
    const current = ctx.draftRef.current;
    let next: CompoundDraft | null = null;
    for (const key of DRAFT_KEYS) {
      if (ctx.edited.current.has(key) || sameFieldValue(key, current[key], stored[key])) continue;
      next ??= { ...current };
      (next as unknown as Record<string, string>)[key] = stored[key];
    }
    if (next) ctx.setDraft(next);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [compound]);
}

/**
 * A save started after a delay; the waiting save starts at once (flush) when the area is left or
 * the page is hidden, reloaded or closed (its write is then tracked until IndexedDB confirms it).
 */
function useDebouncedSave(save: () => Promise<void>, flushRef: RefObject<() => void>) {
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const saveRef = useRef(save);
  saveRef.current = save;
  flushRef.current = () => {
    if (!timer.current) return;
    clearTimeout(timer.current);
    timer.current = null;
    void saveRef.current();
  };
  useEffect(() => {
    const stop = flushBeforeLeaving(() => flushRef.current());
    return () => {
      stop();
      flushRef.current();
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
  const cancel = () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
  };
  const schedule = (delayMs: number) => {
    timer.current = setTimeout(() => {
      timer.current = null;
      void saveRef.current();
    }, delayMs);
  };
  return { cancel, schedule };
}
