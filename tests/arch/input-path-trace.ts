/**
 * Follows ONE screenCompound call for the fictional demo compound (fixtures/demo/demorazine.json,
 * its six-ion shortlist, the command line's call: default settings, no pH profiles) through the
 * pure core and counts how often the input changes module. The counts are defined in DEVELOPERS.md
 * ("Following the screen's input"):
 *
 * - stops: calls into a function defined in another src/chem module than the caller (the first call,
 *   into screenCompound, counts as one);
 * - modules: distinct src/chem modules entered;
 * - returns: stops into a module entered earlier in the same trace (the input comes back to a module
 *   it had already left).
 *
 * How: every .ts file under src/chem is rewritten on the fly (TypeScript parser, text insertions) so
 * that each function body calls enter(<module>) first and exit() in a finally; esbuild bundles the
 * rewritten core with the command line's input preparation into a temporary module that is imported,
 * and the hooks count only while screenCompound runs. Nothing in src/ changes.
 *
 * Run: npx tsx tests/arch/input-path-trace.ts   (prints the figures as JSON)
 * Test: tests/arch/input-path.test.ts pins upper bounds.
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { build, type Plugin } from 'esbuild';
import ts from 'typescript';

const ROOT = resolve(import.meta.dirname, '..', '..');
const CHEM = join(ROOT, 'src', 'chem');

export interface InputPathCounts {
  stops: number;
  modules: number;
  returns: number;
  /** Distinct caller → callee module pairs among the stops (not pinned; loops do not change it). */
  pairs: number;
  /** Every module entered, in order of first entry (for reading, not pinned). */
  visited: string[];
  /** Stops per caller → callee module pair (for reading, not pinned). */
  edges: Map<string, number>;
}

/** The two phases of the screen's input: the candidates made from the library, then the screen. */
export interface InputPathTrace {
  /** candidatesFromLibrary for the demo's shortlist (ΔpKa, stoichiometry, the thermochemistry). */
  candidates: InputPathCounts;
  /** screenCompound on those candidates. */
  screen: InputPathCounts;
}

function newCounts(): InputPathCounts {
  return { stops: 0, modules: 0, returns: 0, pairs: 0, visited: [], edges: new Map() };
}

interface Insertion {
  pos: number;
  text: string;
  /** Depth of the function in the syntax tree: at one position, the inner text goes first. */
  depth: number;
  kind: 'open' | 'close';
}

type FunctionWithBody = ts.FunctionLikeDeclaration & { body: ts.ConciseBody };

function isTraceable(node: ts.Node): node is FunctionWithBody {
  if (!(
    ts.isFunctionDeclaration(node) ||
    ts.isFunctionExpression(node) ||
    ts.isArrowFunction(node) ||
    ts.isMethodDeclaration(node) ||
    ts.isGetAccessorDeclaration(node) ||
    ts.isSetAccessorDeclaration(node) ||
    ts.isConstructorDeclaration(node)
  ))
    return false;
  if (!node.body) return false;
  // async functions and generators leave and re-enter at each await/yield: not followed
  if (node.asteriskToken) return false;
  return !ts.getModifiers(node)?.some((m) => m.kind === ts.SyntaxKind.AsyncKeyword);
}

/** The source with every function body wrapped in enter(moduleId) … finally exit(). */
export function instrument(source: string, moduleId: string): string {
  const sf = ts.createSourceFile('x.ts', source, ts.ScriptTarget.ES2022, true);
  const ins: Insertion[] = [];
  const enter = `__trace.enter(${JSON.stringify(moduleId)});`;
  const visit = (node: ts.Node, depth: number) => {
    if (isTraceable(node)) {
      const body = node.body;
      if (ts.isBlock(body)) {
        ins.push({ pos: body.getStart(sf) + 1, text: `${enter} try {`, depth, kind: 'open' });
        ins.push({
          pos: body.getEnd() - 1,
          text: `} finally { __trace.exit(); }`,
          depth,
          kind: 'close',
        });
      } else {
        ins.push({
          pos: body.getStart(sf),
          text: `{ ${enter} try { return (`,
          depth,
          kind: 'open',
        });
        ins.push({
          pos: body.getEnd(),
          text: `); } finally { __trace.exit(); } }`,
          depth,
          kind: 'close',
        });
      }
    }
    ts.forEachChild(node, (child) => visit(child, depth + 1));
  };
  visit(sf, 0);
  // Apply from the end; at one position an opening of an outer function precedes an inner one and a
  // closing of an inner function precedes an outer one.
  ins.sort((a, b) => {
    if (a.pos !== b.pos) return b.pos - a.pos;
    if (a.kind !== b.kind) return a.kind === 'close' ? -1 : 1;
    return a.kind === 'open' ? b.depth - a.depth : a.depth - b.depth;
  });
  let out = source;
  for (const i of ins) out = out.slice(0, i.pos) + i.text + out.slice(i.pos);
  return `const __trace = globalThis.__saltsmithTrace;\n${out}`;
}

function instrumentChem(): Plugin {
  return {
    name: 'trace-chem',
    setup(b) {
      b.onResolve({ filter: /^@\/chem$/ }, () => ({ path: join(CHEM, 'index.ts') }));
      b.onResolve({ filter: /^@\/cli\// }, (a) => ({
        path: join(ROOT, 'src', `${a.path.slice(2)}.ts`),
      }));
      b.onLoad({ filter: /[\\/]src[\\/]chem[\\/].*\.ts$/ }, (a) => {
        const id = relative(ROOT, a.path).split('\\').join('/');
        return { contents: instrument(readFileSync(a.path, 'utf8'), id), loader: 'ts' };
      });
    },
  };
}

const ENTRY = `
import { readFileSync } from 'node:fs';
import { candidatesFromLibrary, getCounterIon, screenCompound } from '@/chem';
import { prepareScreen, FLAG_NAMES } from '@/cli/commands/screen/screen-input';
export async function run(demoPath) {
  const demo = JSON.parse(readFileSync(demoPath, 'utf8'));
  const prepared = await prepareScreen(
    {
      name: demo.name, smiles: demo.smiles, formula: demo.formula, kind: demo.kind, pKas: demo.pKas,
      ionCharge: demo.ionCharge, intrinsicSolubilityMgPerMl: demo.intrinsicSolubilityMgPerMl,
      intrinsicSolubilityOrigin: demo.intrinsicSolubilityOrigin, meltingPointC: demo.meltingPointC,
      logP: demo.logP, doseMg: demo.doseMg, ions: demo.shortlist,
    },
    { settings: {}, keepCocrystalBand: false, names: FLAG_NAMES },
  );
  const t = globalThis.__saltsmithTrace;
  const di = prepared.drugIon;
  const ions = demo.shortlist.map((id) => getCounterIon(id));
  t.phase = 'candidates';
  const candidates = candidatesFromLibrary(
    ions,
    {
      kind: demo.kind, ionCharge: demo.ionCharge, pKas: demo.pKas.map((p) => p.value),
      thermo: { formula: di.formula, charge: di.charge, rings: di.rings },
    },
    { skipped: [], keepCocrystalBand: false, bands: prepared.settings.deltaPkaBands },
  );
  t.phase = 'screen';
  const result = screenCompound({
    compound: prepared.compound, drugIon: di, candidates, settings: prepared.settings,
    profiles: 'none',
  });
  t.phase = null;
  return { result, same: JSON.stringify(candidates) === JSON.stringify(prepared.candidates) };
}
`;

/** Trace the demo's candidates and one screenCompound call and return the counts of each phase. */
export async function traceDemoScreen(): Promise<InputPathTrace> {
  // inside node_modules so that the bundle's bare imports (zod, openchemlib) resolve
  const cache = join(ROOT, 'node_modules', '.cache');
  mkdirSync(cache, { recursive: true });
  const dir = mkdtempSync(join(cache, 'saltsmith-trace-'));
  try {
    const entry = join(dir, 'entry.ts');
    writeFileSync(entry, ENTRY);
    const outfile = join(dir, 'bundle.mjs');
    await build({
      entryPoints: [entry],
      bundle: true,
      platform: 'node',
      format: 'esm',
      outfile,
      packages: 'external',
      absWorkingDir: ROOT,
      logLevel: 'error',
      plugins: [instrumentChem()],
    });
    const stack: string[] = [];
    const trace: InputPathTrace = { candidates: newCounts(), screen: newCounts() };
    const tracer = {
      phase: null as keyof InputPathTrace | null,
      enter(m: string) {
        const caller = stack[stack.length - 1];
        stack.push(m);
        if (tracer.phase === null || m === caller) return;
        const c = trace[tracer.phase];
        c.stops++;
        const edge = `${caller ?? '(caller)'} → ${m}`;
        c.edges.set(edge, (c.edges.get(edge) ?? 0) + 1);
        if (c.visited.includes(m)) c.returns++;
        else c.visited.push(m);
      },
      exit() {
        stack.pop();
      },
    };
    (globalThis as Record<string, unknown>).__saltsmithTrace = tracer;
    const mod = (await import(pathToFileURL(outfile).href)) as {
      run: (p: string) => Promise<{ result: { rows: unknown[] }; same: boolean }>;
    };
    const out = await mod.run(join(ROOT, 'fixtures', 'demo', 'demorazine.json'));
    if (!out.same) throw new Error('the traced candidates differ from the command line’s');
    if (out.result.rows.length < 6)
      throw new Error(`the demo screen gave ${out.result.rows.length} rows`);
    for (const c of Object.values(trace)) {
      c.modules = c.visited.length;
      c.pairs = c.edges.size;
    }
    return trace;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(import.meta.filename)) {
  const t = await traceDemoScreen();
  for (const [phase, c] of Object.entries(t)) {
    const { stops, modules, returns, pairs } = c;
    console.log(phase, JSON.stringify({ stops, modules, returns, pairs }));
    if (process.argv.includes('--modules')) console.log(c.visited.join('\n'));
    if (process.argv.includes('--edges'))
      for (const [e, n] of [...c.edges].sort((a, b) => b[1] - a[1])) console.log(n, e);
  }
}
