import { beforeEach, describe, expect, it, vi } from 'vitest';
import { DEMO_COMPOUND } from '@/persistence/demo-project';

// Each "page" is a fresh copy of the modules (vi.resetModules), as after a reload: what one page
// left in flight is gone from memory, and only the localStorage copy remains.
async function newPage() {
  vi.resetModules();
  const repo = (await import('@/persistence/projects-repo')).projectsRepo;
  const edits = await import('@/persistence/unsaved-edits');
  const { nextStamp } = await import('@/persistence/field-stamps');
  /** A tracked write of compound fields, as projectsRepo.patchCompound makes it. */
  const compoundEdit = (projectId: string, changes: Record<string, unknown>) => ({
    kind: 'patch' as const,
    table: 'projects' as const,
    recordId: projectId,
    patch: Object.entries(changes).map(([k, value]) => ({ path: ['compound', k], value })),
    stamp: nextStamp(),
  });
  return { repo, compoundEdit, nextStamp, ...edits };
}

const never = () => new Promise<never>(() => undefined);

beforeEach(async () => {
  localStorage.clear();
  vi.resetModules();
  await (await import('../support/db')).resetDbForTests();
});

describe('edits in flight when the page goes away (issue 13)', () => {
  it('copies a write still in flight; the next start stores it', async () => {
    const first = await newPage();
    const p = await first.repo.create('P', DEMO_COMPOUND);
    // A write the page could not finish (the tab closed mid-transaction): it never settles.
    void first.trackWrite(first.compoundEdit(p.id, { meltingPointC: 150 }), never);
    expect(first.stashUnsavedEdits()).toBe(1);
    expect(localStorage.getItem(first.UNSAVED_EDITS_KEY)).toContain(
      '"path":["compound","meltingPointC"],"value":150',
    );

    const second = await newPage();
    await expect(second.repo.replayUnsavedEdits()).resolves.toBe(1);
    expect((await second.repo.get(p.id))!.compound.meltingPointC).toBe(150);
    expect(localStorage.getItem(second.UNSAVED_EDITS_KEY)).toBeNull();
  });

  it('drops the copy once the write completes, so a replay cannot undo a later edit', async () => {
    const first = await newPage();
    const p = await first.repo.create('P', DEMO_COMPOUND);
    const write = first.repo.patchCompound(p.id, { meltingPointC: 150 });
    expect(first.stashUnsavedEdits()).toBe(1);
    await write;
    expect(localStorage.getItem(first.UNSAVED_EDITS_KEY)).toBeNull();
    await first.repo.patchCompound(p.id, { meltingPointC: 160 });

    const second = await newPage();
    await expect(second.repo.replayUnsavedEdits()).resolves.toBe(0);
    expect((await second.repo.get(p.id))!.compound.meltingPointC).toBe(160);
  });

  it('keeps the copy of a write that aborts (a page being torn down sees its transactions abort)', async () => {
    const first = await newPage();
    const p = await first.repo.create('P', DEMO_COMPOUND);
    let abort: (e: Error) => void = () => undefined;
    const write = first.trackWrite(
      first.compoundEdit(p.id, { notes: 'typed last' }),
      () => new Promise<never>((_, reject) => (abort = reject)),
    );
    first.stashUnsavedEdits();
    abort(new Error('AbortError'));
    await expect(write).rejects.toThrow('AbortError');

    const second = await newPage();
    await expect(second.repo.replayUnsavedEdits()).resolves.toBe(1);
    expect((await second.repo.get(p.id))!.compound.notes).toBe('typed last');
  });

  it('runs a registered flush (a debounced slider) before the copy is taken', async () => {
    const first = await newPage();
    const p = await first.repo.create('P', DEMO_COMPOUND);
    first.flushBeforeLeaving(() => {
      void first.trackWrite(
        {
          kind: 'patch',
          table: 'projects',
          recordId: p.id,
          patch: [{ path: ['settings', 'extra', 'screening', 'x'], value: 1 }],
          stamp: first.nextStamp(),
        },
        never,
      );
    });
    expect(first.stashUnsavedEdits()).toBe(1);

    const second = await newPage();
    await second.repo.replayUnsavedEdits();
    expect((await second.repo.get(p.id))!.settings.extra.screening).toEqual({ x: 1 });
  });

  it('drops a copy that no longer validates instead of storing it', async () => {
    const first = await newPage();
    const p = await first.repo.create('P', DEMO_COMPOUND);
    void first.trackWrite(first.compoundEdit(p.id, { meltingPointC: 'hot' }), never);
    first.stashUnsavedEdits();

    const second = await newPage();
    await expect(second.repo.replayUnsavedEdits()).resolves.toBe(0);
    expect((await second.repo.get(p.id))!.compound.meltingPointC).toBe(DEMO_COMPOUND.meltingPointC);
    expect(localStorage.getItem(second.UNSAVED_EDITS_KEY)).toBeNull();
  });
});

describe('a replay never writes an old value over a newer one (issue 18)', () => {
  it('a copy whose write landed just before its page died loses to a later edit in another tab', async () => {
    // Tab A sets the melting point to 150 and is closed at once: the copy is taken, the write
    // commits, and the page dies before it can remove the copy (simulated by putting it back).
    const tabA = await newPage();
    const p = await tabA.repo.create('P', DEMO_COMPOUND);
    const write = tabA.repo.patchCompound(p.id, { meltingPointC: 150 });
    tabA.stashUnsavedEdits();
    const leftBehind = localStorage.getItem(tabA.UNSAVED_EDITS_KEY);
    expect(leftBehind).toContain('150');
    await write;
    localStorage.setItem(tabA.UNSAVED_EDITS_KEY, leftBehind!);

    // Tab B, still showing the old value, types 160 and it is stored.
    const tabB = await newPage();
    await tabB.repo.patchCompound(p.id, { meltingPointC: 160 });

    // A reload replays what tab A left behind: 160 stays.
    const reload = await newPage();
    await reload.repo.replayUnsavedEdits();
    expect((await reload.repo.get(p.id))!.compound.meltingPointC).toBe(160);
  });
});

describe('a replay after a project was replaced by an import', () => {
  it('does not write the old edit over the imported project', async () => {
    const tabA = await newPage();
    const p = await tabA.repo.create('P', DEMO_COMPOUND);
    void tabA.trackWrite(tabA.compoundEdit(p.id, { meltingPointC: 150 }), never);
    tabA.stashUnsavedEdits();
    const { exportProjectText, importProjectText } = await import('@/persistence/import-project');
    const text = (await exportProjectText(p.id)).replace(
      `"meltingPointC":${DEMO_COMPOUND.meltingPointC}`,
      '"meltingPointC":200',
    );
    expect(text).toContain('"meltingPointC":200');
    await importProjectText(text, { mode: 'replace', projectId: p.id });

    const reload = await newPage();
    await reload.repo.replayUnsavedEdits();
    expect((await reload.repo.get(p.id))!.compound.meltingPointC).toBe(200);
  });
});
