import {
  counterIonEditSchema,
  counterIonSchema,
  EDIT_SOURCE,
  type CounterIonEdit,
} from './counter-ion.schema';
import type { CounterIon, LibraryIon } from './counter-ion.types';

/** A stored in-house ion or per-project edit, as the persistence layer hands it over (plain data). */
export interface StoredIonRecord {
  id: string;
  projectId: string | null;
  overridesIonId: string | null;
  ion: Record<string, unknown>;
}

/** Apply a per-project edit to a bundled ion; the original is kept on the result. */
export function applyCounterIonEdit(
  base: CounterIon,
  edit: CounterIonEdit,
  recordId?: string,
): LibraryIon {
  const valid = counterIonEditSchema.parse(edit);
  const editedFields: string[] = [];
  const next: CounterIon = { ...base, sources: { ...base.sources } };
  if (valid.pKas !== undefined) {
    next.pKas = [...valid.pKas]
      .sort((a, b) => a - b)
      .map((value) => ({ value, source: EDIT_SOURCE }));
    // Keep each stoichiometry's limiting-pKa index inside the edited list.
    next.stoichiometries = base.stoichiometries.map((s) => ({
      ...s,
      pKaIndex: next.pKas.length === 0 ? null : Math.min(s.pKaIndex ?? 0, next.pKas.length - 1),
    }));
    next.sources.pKas = EDIT_SOURCE;
    editedFields.push('pKas');
  }
  if (valid.acceptabilityClass !== undefined) {
    next.acceptabilityClass = valid.acceptabilityClass;
    next.classSource = EDIT_SOURCE;
    next.sources.acceptabilityClass = EDIT_SOURCE;
    editedFields.push('acceptabilityClass');
  }
  if (valid.tradeNote !== undefined) {
    next.tradeNote = valid.tradeNote;
    next.sources.tradeNote = EDIT_SOURCE;
    editedFields.push('tradeNote');
  }
  return {
    ...next,
    origin: editedFields.length ? 'edited' : 'bundled',
    editedFields,
    ...(editedFields.length ? { original: base } : {}),
    ...(recordId ? { recordId } : {}),
  };
}

/**
 * The library a project sees: bundled ions (with this project's edits applied) followed by in-house
 * ions available to every project or to this one. Records that fail validation are skipped and
 * reported in `rejected` (never shown half-valid).
 */
export function mergeLibrary(
  bundled: readonly CounterIon[],
  records: readonly StoredIonRecord[],
  projectId: string | null,
): { ions: LibraryIon[]; rejected: { recordId: string; reason: string }[] } {
  const rejected: { recordId: string; reason: string }[] = [];
  const edits = new Map<string, StoredIonRecord>();
  const inHouse: LibraryIon[] = [];
  const bundledIds = new Set(bundled.map((b) => b.id));
  for (const r of records) {
    if (r.overridesIonId) {
      if (r.projectId === projectId) edits.set(r.overridesIonId, r);
      continue;
    }
    if (r.projectId !== null && r.projectId !== projectId) continue;
    const parsed = counterIonSchema.safeParse(r.ion);
    if (!parsed.success) {
      rejected.push({ recordId: r.id, reason: parsed.error.issues[0]?.message ?? 'invalid' });
      continue;
    }
    // An in-house ion never replaces a bundled ion or another in-house ion (only an explicit
    // per-project edit changes a bundled ion): a record whose library id is taken is left out.
    if (bundledIds.has(parsed.data.id) || inHouse.some((i) => i.id === parsed.data.id)) {
      rejected.push({
        recordId: r.id,
        reason: `its id "${parsed.data.id}" belongs to another library ion`,
      });
      continue;
    }
    inHouse.push({
      ...(parsed.data as CounterIon),
      origin: 'in-house',
      editedFields: [],
      recordId: r.id,
    });
  }
  const ions: LibraryIon[] = bundled.map((b) => {
    const edit = edits.get(b.id);
    if (!edit) return { ...b, origin: 'bundled', editedFields: [] };
    const parsed = counterIonEditSchema.safeParse(edit.ion);
    if (!parsed.success) {
      rejected.push({
        recordId: edit.id,
        reason: parsed.error.issues[0]?.message ?? 'invalid edit',
      });
      return { ...b, origin: 'bundled', editedFields: [] };
    }
    return applyCounterIonEdit(b, parsed.data, edit.id);
  });
  return { ions: [...ions, ...inHouse], rejected };
}
