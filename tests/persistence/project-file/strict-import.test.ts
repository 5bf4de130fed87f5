import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { candidatesRepo } from '@/persistence/candidates-repo';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { exportProjectText, importProjectText } from '@/persistence/import-project';
import { ProjectFileError } from '@/persistence/project-file/errors';
import { parseProjectFile } from '@/persistence/project-file/restore';
import { projectsRepo } from '@/persistence/projects-repo';
import { resetDbForTests } from '../../support/db';

// Issue 18: a project file is read by the one strict JSON reader and checked against the forms'
// rules. The source file is an export of the fictional demo compound (invented numbers, never an
// expected value); each case below changes one thing and must be refused with the field named.
const SEED = 20261203;
type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
/** A parsed file being edited by a test (shape checked by the reader under test, not here). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Loose = any;

let text: string;
let doc: Record<string, Json>;
beforeAll(async () => {
  await resetDbForTests();
  const p = await projectsRepo.create('Strict source', DEMO_COMPOUND);
  await candidatesRepo.add(p.id, 'mesylate');
  await candidatesRepo.add(p.id, 'chloride');
  text = await exportProjectText(p.id);
  doc = JSON.parse(text) as Record<string, Json>;
});

const refusal = (input: string | Uint8Array): ProjectFileError => {
  try {
    parseProjectFile(input);
  } catch (err) {
    if (err instanceof ProjectFileError) return err;
    throw err;
  }
  throw new Error('the file was accepted');
};
const edit = (f: (d: Loose) => void): string => {
  const copy = structuredClone(doc);
  f(copy);
  return JSON.stringify(copy);
};

describe('a project file that breaks a rule of the forms is refused, the field named', () => {
  it('reads its own export', () => {
    expect(parseProjectFile(new TextEncoder().encode(text)).candidates).toHaveLength(2);
  });

  it('"doseMg" given twice', () => {
    const twice = text.replace('"doseMg":', '"doseMg":1,"doseMg":');
    const err = refusal(twice);
    expect(err.message).toMatch(/same field twice at project\.compound\.doseMg/);
  });

  it('invalid UTF-8 (a lone continuation byte in the name)', () => {
    const bytes = new TextEncoder().encode(text);
    const at = text.indexOf('Strict source') + 3;
    bytes[at] = 0x80;
    expect(refusal(bytes).message).toMatch(/not valid UTF-8/);
  });

  it('a 1,000-deep array in the settings', () => {
    let deep: Json = 1;
    for (let i = 0; i < 1000; i++) deep = [deep];
    const err = refusal(edit((d) => (d.project.settings.extra.deep = deep)));
    expect(err.message).toMatch(/nested deeper than 32 levels/);
  });

  it('a dose of 1e-320 mg', () => {
    const err = refusal(edit((d) => (d.project.compound.doseMg = 1e-320)));
    expect(err.details.join(' ')).toMatch(/project\.compound\.doseMg/);
  });

  it('"not a date" as a date', () => {
    const err = refusal(edit((d) => (d.candidates[0].addedAt = 'not a date')));
    expect(err.details.join(' ')).toMatch(/candidates\.0\.addedAt/);
    expect(refusal(edit((d) => (d.createdAt = '2026-13-45T00:00:00Z'))).details.join(' ')).toMatch(
      /createdAt/,
    );
  });

  it('a chloride 2:1 and a mesylate 4:4 (not salt forms of the library)', () => {
    const chloride = (d: Loose) => d.candidates.find((c: Loose) => c.ionId === 'chloride');
    const mesylate = (d: Loose) => d.candidates.find((c: Loose) => c.ionId === 'mesylate');
    expect(refusal(edit((d) => (chloride(d).drugPerSalt = 2))).message).toMatch(
      /2:1 is not a salt form of "chloride"/,
    );
    const err = refusal(
      edit((d) => {
        mesylate(d).drugPerSalt = 4;
        mesylate(d).counterIonPerSalt = 4;
      }),
    );
    expect(err.message).toMatch(/4:4 is not a salt form of "mesylate"/);
  });

  it('the same counter-ion twice', () => {
    const err = refusal(
      edit((d) => d.candidates.push({ ...d.candidates[0], id: 'another', order: 9 })),
    );
    expect(err.message).toMatch(/"mesylate" is already shortlisted/);
  });

  it('a name with a right-to-left override (refused, not changed)', () => {
    const err = refusal(edit((d) => (d.project.name = 'Salt \u202Egnp.exe')));
    expect(err.message).toMatch(/project\.name: contains a hidden text-direction control/);
  });
});

describe('the structure check on import', () => {
  it.each(['C1CC((((', 'CCN.Cl', 'CN1CCN(CC1)c1ccc(cc1)C('])(
    'refuses the SMILES %s, the field named',
    async (smiles) => {
      const bad = edit((d) => (d.project.compound.smiles = smiles));
      await expect(importProjectText(bad, { mode: 'new' })).rejects.toThrow(
        /project\.compound\.smiles/,
      );
    },
  );
});

describe('random damage to a project file (fast-check, fixed seed)', () => {
  it('byte-level damage: a valid file or a ProjectFileError; damaged UTF-8 is always refused (3000 runs)', () => {
    const bytes = new TextEncoder().encode(text);
    const op = fc.oneof(
      fc.record({
        kind: fc.constant('set' as const),
        at: fc.nat(),
        byte: fc.integer({ min: 0, max: 255 }),
      }),
      fc.record({
        kind: fc.constant('cut' as const),
        at: fc.nat(),
        len: fc.integer({ min: 1, max: 40 }),
      }),
      fc.record({
        kind: fc.constant('insert' as const),
        at: fc.nat(),
        add: fc.uint8Array({ minLength: 1, maxLength: 8 }),
      }),
      fc.record({ kind: fc.constant('truncate' as const), at: fc.nat() }),
    );
    let refused = 0;
    let badUtf8 = 0;
    fc.assert(
      fc.property(fc.array(op, { minLength: 1, maxLength: 4 }), (ops) => {
        let b = Array.from(bytes);
        for (const o of ops) {
          const at = o.at % (b.length + 1);
          if (o.kind === 'set') b[at % b.length] = o.byte;
          else if (o.kind === 'cut') b.splice(at, o.len);
          else if (o.kind === 'insert') b.splice(at, 0, ...o.add);
          else b = b.slice(0, at);
        }
        const damaged = Uint8Array.from(b);
        let utf8ok = true;
        try {
          new TextDecoder('utf-8', { fatal: true }).decode(damaged);
        } catch {
          utf8ok = false;
          badUtf8++;
        }
        try {
          parseProjectFile(damaged);
          expect(utf8ok).toBe(true);
        } catch (err) {
          if (!(err instanceof ProjectFileError)) throw err;
          expect(err.message.length).toBeGreaterThan(0);
          refused++;
        }
      }),
      { seed: SEED, numRuns: 3000 },
    );
    expect(refused).toBeGreaterThan(0);
    expect(badUtf8).toBeGreaterThan(0);
    console.info(`byte damage: 3000 runs, ${refused} refused, ${badUtf8} with invalid UTF-8`);
  });

  it('a key given twice anywhere is refused, the key path named (1000 runs)', () => {
    // Every object in the file, by path, with its keys.
    const objects: { path: string[]; keys: string[] }[] = [];
    const walk = (v: Json, path: string[]) => {
      if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, String(i)]));
      else if (v && typeof v === 'object') {
        if (Object.keys(v).length) objects.push({ path, keys: Object.keys(v) });
        for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
      }
    };
    walk(doc, []);
    fc.assert(
      fc.property(fc.nat(), fc.nat(), fc.jsonValue({ maxDepth: 2 }), (i, j, value) => {
        const target = objects[i % objects.length]!;
        const key = target.keys[j % target.keys.length]!;
        const copy = structuredClone(doc) as Loose;
        let node = copy;
        for (const seg of target.path) node = node[seg];
        node['\u0000DUP'] = value;
        const twice = JSON.stringify(copy).replace('"\\u0000DUP"', JSON.stringify(key));
        const err = refusal(twice);
        expect(err.message).toContain('same field twice');
        expect(err.message).toContain([...target.path, key].join('.'));
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });
});
