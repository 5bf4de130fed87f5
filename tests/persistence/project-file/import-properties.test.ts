import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { getDb } from '@/persistence/db';
import { projectsRepo } from '@/persistence/projects-repo';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { ProjectFileError } from '@/persistence/project-file/errors';
import { parseProjectFileText } from '@/persistence/project-file/restore';
import { exportProjectText, importProjectText } from '@/persistence/import-project';
import {
  candidateRecordSchema,
  customIonRecordSchema,
  measurementRecordSchema,
  projectRecordSchema,
} from '@/persistence/records';
import { resetDbForTests } from '../../support/db';

// Issue 13: property tests over the project-file import. A valid exported file (the fictional demo
// compound; its numbers are invented and never expected values) is damaged at a random place with
// random JSON. Whatever the damage, reading it either gives a file that passes the schema or a
// ProjectFileError with a message — never another exception — and importing a refused file leaves the
// database exactly as it was, while an accepted one stores only records that pass the stored schemas.
const SEED = 20261202;

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

/** Every path to a value in a JSON document (objects and arrays included). */
function paths(v: Json, at: (string | number)[] = []): (string | number)[][] {
  const out: (string | number)[][] = [at];
  if (Array.isArray(v)) v.forEach((x, i) => out.push(...paths(x, [...at, i])));
  else if (v !== null && typeof v === 'object')
    for (const [k, x] of Object.entries(v)) out.push(...paths(x, [...at, k]));
  return out;
}

function replaceAt(doc: Json, path: (string | number)[], value: Json): Json {
  if (path.length === 0) return value;
  const copy = structuredClone(doc) as Record<string | number, Json>;
  let node = copy as Record<string | number, Json>;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, Json>;
  node[path[path.length - 1]!] = value;
  return copy as Json;
}

let valid: Json;
let allPaths: (string | number)[][];

beforeAll(async () => {
  await resetDbForTests();
  const p = await projectsRepo.create('Property source', DEMO_COMPOUND);
  await candidatesRepo.add(p.id, 'mesylate');
  await candidatesRepo.add(p.id, 'chloride');
  valid = JSON.parse(await exportProjectText(p.id)) as Json;
  allPaths = paths(valid);
});

const damaged = () =>
  fc
    .tuple(fc.nat(), fc.jsonValue({ maxDepth: 3 }))
    .map(([i, value]) => replaceAt(valid, allPaths[i % allPaths.length]!, value as Json));

describe('project-file import under random damage (fast-check, fixed seed)', () => {
  it('reading: a valid file or a ProjectFileError with a message, nothing else (3000 runs)', () => {
    fc.assert(
      fc.property(damaged(), (doc) => {
        try {
          const file = parseProjectFileText(JSON.stringify(doc));
          expect(file.format).toBe('saltsmith-project');
        } catch (err) {
          if (!(err instanceof ProjectFileError)) throw err;
          expect(err.message.length).toBeGreaterThan(0);
        }
      }),
      { seed: SEED, numRuns: 3000 },
    );
  });

  it('importing: a refused file leaves the database untouched; an accepted one stores only valid records (300 runs)', async () => {
    const db = getDb();
    const snapshot = async () =>
      JSON.stringify(
        await Promise.all(
          [db.projects, db.candidates, db.measurements, db.customIons].map((t) => t.toArray()),
        ),
      );
    await fc.assert(
      fc.asyncProperty(damaged(), async (doc) => {
        const before = await snapshot();
        try {
          await importProjectText(JSON.stringify(doc), { mode: 'new' });
        } catch (err) {
          if (!(err instanceof ProjectFileError)) throw err;
          expect(await snapshot()).toBe(before);
          return;
        }
        for (const r of await db.projects.toArray()) projectRecordSchema.parse(r);
        for (const r of await db.candidates.toArray()) candidateRecordSchema.parse(r);
        for (const r of await db.measurements.toArray()) measurementRecordSchema.parse(r);
        for (const r of await db.customIons.toArray()) customIonRecordSchema.parse(r);
      }),
      { seed: SEED, numRuns: 300 },
    );
  }, 120_000);
});
