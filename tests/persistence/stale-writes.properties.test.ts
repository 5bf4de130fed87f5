import fc from 'fast-check';
import { beforeEach, describe, expect, it } from 'vitest';
import { applyFieldPatch } from '@/persistence/field-patch';
import { createStampClock, type FieldChange, type FieldPath } from '@/persistence/field-stamps';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { projectsRepo } from '@/persistence/projects-repo';
import { writeFieldPatch } from '@/persistence/stamped-writes';
import { resetDbForTests } from '../support/db';

/**
 * Two writers (two tabs) write random fields at random times; each write is delivered in a random
 * order — late, twice (a replay of a write that had landed), or both. Whatever the order, the stored
 * value of every field must be the value of the newest write to it (the greatest stamp; the clock
 * tests in field-stamps.test.ts show a later write gets the greater stamp), and a field never
 * written keeps its first value.
 */

const SEED = 18_001;
const FIELDS: readonly FieldPath[] = [
  ['compound', 'meltingPointC'],
  ['compound', 'logP'],
  ['settings', 'gastricChlorideM'],
  ['settings', 'temperatureC'],
  ['settings', 'extra', 'screening', 'weights', 'solubility'],
  ['settings', 'extra', 'screening', 'weights', 'massCost'],
  ['settings', 'extra', 'screening', 'media', '#m1'],
  ['settings', 'extra', 'screening', 'media', '#m2'],
];

/** A valid value for field `f` from a random integer (or a removal for a list element). */
function changeFor(f: number, n: number): FieldChange {
  const path = FIELDS[f]!;
  const last = path[path.length - 1]!;
  if (last.startsWith('#')) {
    return n % 3 === 0
      ? { path, removed: true }
      : {
          path,
          value: {
            id: last.slice(1),
            label: `medium ${n}`,
            pH: n % 14,
            ions: {},
            ionicStrengthM: 0,
          },
        };
  }
  const values: Record<string, number> = {
    meltingPointC: 100 + (n % 400),
    logP: (n % 10) - 2,
    gastricChlorideM: (n % 50) / 10,
    temperatureC: n % 100,
    solubility: n % 10,
    massCost: (n % 20) / 2,
  };
  return { path, value: values[last] };
}

const writeArb = fc.record({
  writer: fc.integer({ min: 0, max: 1 }),
  /** Milliseconds since the writer's previous write; negative: its clock stepped back. */
  advanceMs: fc.integer({ min: -5, max: 20 }),
  fields: fc.uniqueArray(fc.integer({ min: 0, max: FIELDS.length - 1 }), {
    minLength: 1,
    maxLength: 4,
  }),
  n: fc.nat(1000),
});
/** Writes, and a delivery plan: each index is a delivery of that write (twice = replayed after landing). */
const scenarioArb = fc.array(writeArb, { minLength: 1, maxLength: 14 }).chain((writes) =>
  fc.record({
    writes: fc.constant(writes),
    deliveries: fc
      .array(fc.integer({ min: 0, max: writes.length - 1 }), {
        minLength: writes.length,
        maxLength: writes.length * 2,
      })
      .chain((extra) =>
        fc.shuffledSubarray([...writes.keys(), ...extra], {
          minLength: writes.length + extra.length,
        }),
      ),
  }),
);

type Stamped = { stamp: string; patch: FieldChange[] };

function stampWrites(
  writes: { writer: number; advanceMs: number; fields: number[]; n: number }[],
): Stamped[] {
  const clocks = [createStampClock('tabaaaaa'), createStampClock('tabbbbbb')];
  const times = [1_700_000_000_000, 1_700_000_000_000];
  return writes.map((w) => {
    times[w.writer] = times[w.writer]! + w.advanceMs;
    return {
      stamp: clocks[w.writer]!.next(times[w.writer]),
      patch: w.fields.map((f) => changeFor(f, w.n + f)),
    };
  });
}

/** The value at a path (`#id`: the list element with that id), or undefined. */
function valueAt(record: unknown, path: FieldPath): unknown {
  let node: unknown = record;
  for (const seg of path) {
    if (seg.startsWith('#')) {
      node = Array.isArray(node)
        ? node.find((e: { id: string }) => e.id === seg.slice(1))
        : undefined;
    } else {
      node = node && typeof node === 'object' ? (node as Record<string, unknown>)[seg] : undefined;
    }
  }
  return node;
}

/** What each field must hold after `delivered`: the newest delivered write to it, else its start. */
function expected(start: unknown, writes: Stamped[], delivered: Iterable<number>): unknown[] {
  const seen = [...new Set(delivered)];
  return FIELDS.map((path) => {
    let best: { stamp: string; change: FieldChange } | null = null;
    for (const i of seen) {
      const change = writes[i]!.patch.find(
        (c) => c.path === path || c.path.join('/') === path.join('/'),
      );
      if (change && (!best || writes[i]!.stamp > best.stamp))
        best = { stamp: writes[i]!.stamp, change };
    }
    if (!best) return valueAt(start, path);
    return 'removed' in best.change ? undefined : best.change.value;
  });
}

const startRecord = () => ({
  compound: { ...DEMO_COMPOUND },
  settings: {
    gastricChlorideM: 0.12,
    microenvironmentPh: 7,
    temperatureC: 37,
    extra: { screening: { weights: { solubility: 1, massCost: 0.5 }, media: [] } },
  },
});

describe('stale and new writes from two writers in any order (fast-check, fixed seed)', () => {
  it('the pure rule: every field holds its newest written value after every delivery (3000 runs)', () => {
    fc.assert(
      fc.property(scenarioArb, ({ writes, deliveries }) => {
        const stamped = stampWrites(writes);
        let record: ReturnType<typeof startRecord> & { fieldStamps?: Record<string, string> } =
          startRecord();
        const done: number[] = [];
        for (const i of deliveries) {
          record = applyFieldPatch(record, stamped[i]!.patch, stamped[i]!.stamp).record;
          done.push(i);
          expect(FIELDS.map((p) => valueAt(record, p))).toEqual(
            expected(startRecord(), stamped, done),
          );
        }
      }),
      { seed: SEED, numRuns: 3000 },
    );
  });

  describe('through IndexedDB (the same write the app and the replay use)', () => {
    beforeEach(async () => {
      await resetDbForTests();
    });

    it('every field holds its newest written value; the record stays valid (150 runs)', async () => {
      await fc.assert(
        fc.asyncProperty(scenarioArb, async ({ writes, deliveries }) => {
          await resetDbForTests();
          const p = await projectsRepo.create('P', DEMO_COMPOUND);
          const start = await projectsRepo.get(p.id);
          const stamped = stampWrites(writes);
          for (const i of deliveries)
            await writeFieldPatch('projects', p.id, stamped[i]!.patch, stamped[i]!.stamp);
          const stored = await projectsRepo.get(p.id);
          const want = expected(start, stamped, deliveries);
          FIELDS.forEach((path, k) => {
            const got = valueAt(stored, path);
            // A list element stored by the schema gains its defaults; compare what was written.
            if (want[k] && typeof want[k] === 'object')
              expect(got).toMatchObject(want[k] as object);
            else expect(got).toEqual(want[k]);
          });
        }),
        { seed: SEED, numRuns: 150 },
      );
    }, 120_000);
  });
});
