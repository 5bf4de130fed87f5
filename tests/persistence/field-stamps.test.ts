import { describe, expect, it } from 'vitest';
import { applyFieldPatch } from '@/persistence/field-patch';
import {
  changesBetween,
  changesSetting,
  createStampClock,
  pointerOf,
} from '@/persistence/field-stamps';

describe('the stamp clock (hybrid logical clock)', () => {
  it('issues strictly increasing stamps, also within one millisecond and when the clock steps back', () => {
    const clock = createStampClock('aaaaaaaa');
    const stamps = [1000, 1000, 1005, 990, 990, 1006].map((t) => clock.next(t));
    for (let i = 1; i < stamps.length; i++) expect(stamps[i]! > stamps[i - 1]!).toBe(true);
  });

  it('stamps a write made after seeing another page’s stamp later than it, whatever its own clock says', () => {
    const a = createStampClock('aaaaaaaa');
    const b = createStampClock('bbbbbbbb');
    const fromA = a.next(5000);
    b.observe(fromA);
    expect(b.next(4000) > fromA).toBe(true);
  });
});

describe('field changes', () => {
  it('writes only the fields that differ, walking objects', () => {
    expect(
      changesBetween(['settings'], { a: 1, b: { c: 2, d: 3 } }, { a: 1, b: { c: 2, d: 4 } }),
    ).toEqual([{ path: ['settings', 'b', 'd'], value: 4 }]);
  });

  it('treats a list of objects with ids element by element, a removal included', () => {
    const m1 = { id: 'm1', pH: 1 };
    const m2 = { id: 'm2', pH: 2 };
    expect(changesBetween(['media'], [m1], [m1, m2])).toEqual([
      { path: ['media', '#m2'], value: m2 },
    ]);
    expect(changesBetween(['media'], [m1, m2], [m2])).toEqual([
      { path: ['media', '#m1'], removed: true },
    ]);
  });

  it('writes a block leaf by leaf', () => {
    expect(changesSetting(['s'], { w: { x: 1, y: 2 }, list: [1, 2] })).toEqual([
      { path: ['s', 'w', 'x'], value: 1 },
      { path: ['s', 'w', 'y'], value: 2 },
      { path: ['s', 'list'], value: [1, 2] },
    ]);
  });

  it('names paths as JSON Pointers (RFC 6901 escapes ~ and /)', () => {
    expect(pointerOf(['a/b', 'c~d'])).toBe('/a~1b/c~0d');
  });
});

describe('applying a stamped patch', () => {
  const clock = createStampClock('cccccccc');
  it('keeps the newer value of a field and drops the older write', () => {
    const older = clock.next(1);
    const newer = clock.next(2);
    let r: Record<string, unknown> = { compound: { mp: 184 } };
    r = applyFieldPatch(r, [{ path: ['compound', 'mp'], value: 160 }], newer).record;
    const late = applyFieldPatch(r, [{ path: ['compound', 'mp'], value: 150 }], older);
    expect(late.dropped).toBe(1);
    expect(late.record).toMatchObject({ compound: { mp: 160 } });
  });

  it('two tabs adding different media both keep theirs; a removed medium does not come back with an older write', () => {
    const t1 = clock.next(10);
    const t2 = clock.next(11);
    const t3 = clock.next(12);
    let r: Record<string, unknown> = { media: [] };
    r = applyFieldPatch(r, [{ path: ['media', '#b'], value: { id: 'b' } }], t2).record;
    r = applyFieldPatch(r, [{ path: ['media', '#a'], value: { id: 'a' } }], t1).record;
    expect(r.media).toEqual([{ id: 'b' }, { id: 'a' }]);
    r = applyFieldPatch(r, [{ path: ['media', '#a'], removed: true }], t3).record;
    r = applyFieldPatch(r, [{ path: ['media', '#a'], value: { id: 'a', pH: 3 } }], t2).record;
    expect(r.media).toEqual([{ id: 'b' }]);
  });

  it('refuses paths that reach a prototype or the stamps themselves', () => {
    const s = clock.next(20);
    expect(() => applyFieldPatch({}, [{ path: ['__proto__', 'x'], value: 1 }], s)).toThrow();
    expect(() => applyFieldPatch({}, [{ path: ['fieldStamps'], value: {} }], s)).toThrow();
  });

  it('a record created or imported later than a write (its floor) does not take that write', () => {
    const old = clock.next(30);
    const floor = clock.next(31);
    const out = applyFieldPatch({ a: 1, stampFloor: floor }, [{ path: ['a'], value: 2 }], old);
    expect(out.record.a).toBe(1);
  });
});
