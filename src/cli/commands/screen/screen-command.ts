import { ChemInputError } from '@/chem';
import { defineCommand } from '../../define-command';
import { helpRequested } from '../../args/help';
import { COMMAND_USAGE } from '../../command-usage';
import { parseFlags } from '../../args/parse-flags';
import { writeFileAtomic } from '../../output/atomic-write';
import { checkRunFiles } from '../../output/output-target';
import { readJsonFile } from '../../input/read-json-file';
import { writeLine, writeText, type CliCommand } from '../../io';
import { runBatch } from './batch/run-batch';
import {
  refuseContradictions,
  SCREEN_FLAGS,
  SCREEN_USAGE,
  settingsFromFlags,
  type ScreenFlags,
} from './screen-flags';
import {
  compoundFileSchema,
  FLAG_NAMES,
  prepareScreen,
  type CompoundFile,
  type CompoundSpec,
} from './screen-input';
import { runScreen } from './screen-table';
import { measureNextEntries } from './screen-measure-next';
import { screenCsv, screenJson } from './screen-writers';

/**
 * `saltsmith screen`: screen a compound against counter-ions and write the ranked table as CSV or
 * JSON (pH_max, dose numbers at pH 1.2 and 6.8, gastric dose number, flags, reasons, top-three
 * probability from the seeded Monte Carlo) with the cautions; or, with --batch, a whole list.
 */

/** The compound from flags, each flag over the --input file's value. */
export function specFromFlags(flags: ScreenFlags, file: CompoundFile): CompoundSpec {
  const origin = flags['pka-origin'] ?? 'not-stated';
  const kind = flags.kind ?? file.kind ?? 'base';
  const pKas = flags.pka
    ? flags.pka.map((value) => ({ value, origin }))
    : (file.pKas ?? []).map((p) => (typeof p === 'number' ? { value: p, origin } : p));
  return {
    name: flags.name ?? file.name ?? 'compound',
    smiles: flags.smiles ?? (flags.formula === undefined ? (file.smiles ?? '') : ''),
    formula: flags.formula ?? (flags.smiles === undefined ? (file.formula ?? '') : ''),
    kind,
    pKas,
    ionCharge: flags.charge ?? file.ionCharge ?? null,
    intrinsicSolubilityMgPerMl: flags.s0 ?? file.intrinsicSolubilityMgPerMl ?? null,
    intrinsicSolubilityOrigin:
      flags['s0-origin'] ??
      (flags.s0 === undefined ? (file.intrinsicSolubilityOrigin ?? null) : null),
    meltingPointC: flags.mp ?? file.meltingPointC ?? null,
    logP: flags.logp ?? file.logP ?? null,
    doseMg: flags.dose ?? file.doseMg ?? null,
    ions: flags.ions ?? file.ions ?? null,
  };
}

async function readCompoundFile(path: string): Promise<CompoundFile> {
  // Size-capped before reading, then the core's strict JSON reader (read-json-file.ts).
  const json = await readJsonFile(path, { flag: '--input' });
  const r = compoundFileSchema.safeParse(json);
  if (!r.success) {
    const i = r.error.issues[0]!;
    throw new ChemInputError(
      `--input ${i.path.join('.') || '(file)'}`,
      i.message,
      'the compound fields of saltsmith screen --help',
    );
  }
  return r.data;
}

export const screenCommand: CliCommand = defineCommand('screen', {
  summary: COMMAND_USAGE.screen.summary,
  usage: SCREEN_USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, SCREEN_FLAGS);
    if (helpRequested(flags, io, SCREEN_USAGE)) return 0;
    refuseContradictions(flags);
    if (flags.batch !== undefined) return runBatch(flags, io);
    // The output is checked before the work: never the --input file, a folder or a device.
    const [out] = await checkRunFiles({
      inputs: [{ flag: '--input', path: flags.input }],
      outputs: [{ flag: '--out', path: flags.out }],
    });
    const file = flags.input !== undefined ? await readCompoundFile(flags.input) : {};
    const prepared = await prepareScreen(specFromFlags(flags, file), {
      settings: settingsFromFlags(flags, file.settings),
      keepCocrystalBand: flags['keep-cocrystal-band'] === true,
      names: FLAG_NAMES,
      customIons: 'customIons' in file ? file.customIons : [],
      bench: 'bench' in file ? file.bench : {},
    });
    const iterations = flags.iterations ?? 1000;
    const seed = flags.seed ?? 1;
    const { res, table } = runScreen(prepared, { iterations, seed, top: flags.top });
    const text =
      flags.format === 'json'
        ? screenJson(
            res,
            table,
            prepared.skipped,
            { iterations, seed },
            measureNextEntries(res, prepared.settings.weights, { iterations, seed }),
          )
        : screenCsv(table, prepared.skipped, res);
    if (out !== undefined) {
      await writeFileAtomic(out, text + '\n');
      writeLine(io.stderr, `wrote ${table.length} candidates to ${flags.out}`);
    } else await writeText(io.stdout, text + '\n');
    return 0;
  },
});
