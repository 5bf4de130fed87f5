import type { Dispatch, RefObject, SetStateAction } from 'react';
import { projectsRepo } from '@/persistence/projects-repo';
import { reportStorageError } from '@/stores/storage-problem-store';
import type { Compound } from '@/chem';
import {
  changesFor,
  compoundFromDraft,
  type CompoundDraft,
  type FieldErrors,
} from '../compound-form-model';
import type { SaveState } from '../components/CompoundFields';
import type { useStructureCheck } from './use-structure-check';

type Ref<T> = RefObject<T>;
type StructureCheck = ReturnType<typeof useStructureCheck>;

/**
 * What the autosave's steps share: the latest draft and stored compound (never a stale render's
 * copy), the fields edited here and not yet stored with the edit number of their last change, the
 * writes in flight, and the project the draft on screen belongs to.
 */
export interface AutosaveContext {
  draftRef: Ref<CompoundDraft>;
  storedRef: Ref<Compound>;
  edited: Ref<Map<keyof CompoundDraft, number>>;
  editSeq: Ref<number>;
  inFlight: Ref<number>;
  draftProject: Ref<string>;
  setDraft: (next: CompoundDraft) => void;
  setErrors: Dispatch<SetStateAction<FieldErrors>>;
  setSaveState: (state: SaveState) => void;
}

/** 'saved' once nothing is in flight and nothing edited waits. */
export function settle(ctx: AutosaveContext): void {
  if (ctx.inFlight.current === 0 && ctx.edited.current.size === 0) ctx.setSaveState('saved');
}

/** Write the given fields now; they stop counting as edited once stored (unless edited again). */
export function writeFields(
  ctx: AutosaveContext,
  changes: Partial<Compound>,
  keys: readonly (keyof CompoundDraft)[],
): void {
  const upTo = ctx.editSeq.current;
  const target = ctx.draftProject.current;
  ctx.inFlight.current++;
  ctx.setSaveState('pending');
  projectsRepo
    .patchCompound(target, changes)
    .then(() => {
      ctx.inFlight.current--;
      for (const key of keys) {
        if ((ctx.edited.current.get(key) ?? 0) <= upTo) ctx.edited.current.delete(key);
      }
      settle(ctx);
    })
    .catch((err: unknown) => {
      ctx.inFlight.current--;
      // Say why (quota full, database closed) in the shared banner; the last saved values stay.
      reportStorageError(err);
      ctx.setSaveState('error');
    });
}

/**
 * Save the draft on screen: an invalid draft is never stored (the fields say what is wrong); only a
 * changed SMILES waits for its structure check, the other edited fields are written meanwhile.
 */
export async function saveDraft(ctx: AutosaveContext, structure: StructureCheck): Promise<void> {
  const result = compoundFromDraft(ctx.draftRef.current, ctx.storedRef.current);
  if (!result.ok) {
    ctx.setErrors(result.errors);
    ctx.setSaveState('invalid');
    return;
  }
  ctx.setErrors({});
  const keys = [...ctx.edited.current.keys()];
  if (keys.length === 0) return settle(ctx);
  const compound = result.compound;
  const smiles = compound.smiles;
  const stored = ctx.storedRef.current;
  // A changed SMILES must parse before it is stored; a bad one keeps the old structure. The stored
  // SMILES was accepted before; only a changed one needs openchemlib's verdict.
  const needsCheck =
    keys.includes('smiles') &&
    smiles !== '' &&
    smiles !== stored.smiles &&
    smiles !== structure.good?.smiles;
  if (!needsCheck) {
    if (keys.includes('smiles') && smiles === '' && structure.good) void structure.check('');
    writeFields(ctx, changesFor(compound, keys), keys);
    return;
  }
  const others = keys.filter((k) => k !== 'smiles');
  if (others.length) writeFields(ctx, changesFor(compound, others), others);
  ctx.setSaveState('pending');
  await saveCheckedSmiles(ctx, structure, smiles);
}

/** Check a changed SMILES, then store it (and the formula that follows it) if it parses. */
async function saveCheckedSmiles(
  ctx: AutosaveContext,
  structure: StructureCheck,
  smiles: string,
): Promise<void> {
  const previousFormula = structure.good?.parsed.formula;
  const checked = await structure.check(smiles);
  if (checked.ok === 'stale') return;
  if (checked.ok === false) {
    ctx.setErrors((e) => ({ ...e, smiles: checked.message }));
    ctx.setSaveState('invalid');
    return;
  }
  const changes: Partial<Compound> = { smiles };
  // The formula follows a new structure unless the user typed a different one themselves.
  const parsed = checked.structure?.parsed;
  const formula = ctx.storedRef.current.formula;
  if (
    parsed &&
    parsed.netCharge === 0 &&
    (formula === '' || formula === previousFormula) &&
    !ctx.edited.current.has('formula')
  ) {
    changes.formula = parsed.formula;
    const shown = ctx.draftRef.current;
    if (shown.smiles.trim() === smiles) ctx.setDraft({ ...shown, formula: parsed.formula });
  }
  writeFields(ctx, changes, ['smiles']);
}
