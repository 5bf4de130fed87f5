import Papa from 'papaparse';
import {
  PLATE_FILL_ORDER,
  PLATE_PLAN_EXPORT_CAUTIONS,
  pickListRows,
  SOLVENTS,
  type PlatePlan,
} from '@/chem';
import { defineCommand } from '../../define-command';
import { helpRequested } from '../../args/help';
import { usageError } from '../../args/cli-error';
import { COMMAND_USAGE } from '../../command-usage';
import { parseFlags, refuseTogether } from '../../args/parse-flags';
import { writeFileAtomic } from '../../output/atomic-write';
import { checkRunFiles } from '../../output/output-target';
import { writeLine, writeText, type CliCommand } from '../../io';
import { safeRow } from '../screen/screen-writers';
import { planFromFile, readPlanFile } from './plan-input';

/**
 * `saltsmith plan`: a salt-screen plate plan from a plan file — one row per well with the drug, the
 * counter-ion's parent (mg, and µL for a neat liquid or a stock solution) and the solvent — as CSV or
 * JSON, with the plan's notes and the cautions; or, with --solvents, the bundled solvent table.
 */
const { summary: SUMMARY, usage: USAGE } = COMMAND_USAGE.plan;

export const PLAN_FLAGS = {
  help: { type: 'switch' },
  input: { type: 'string', maxLength: 4096 },
  solvents: { type: 'switch' },
  format: { type: 'enum', values: ['csv', 'json'] },
  out: { type: 'string', maxLength: 4096 },
} as const;

/** The solvent table in the command line's field names (units in the names). */
export function solventRows() {
  return SOLVENTS.map((s) => ({
    id: s.id,
    name: s.name,
    ich_q3c_class: s.ichQ3cClass,
    ich_pde_mg_per_day: s.ichPdeMgPerDay,
    ich_concentration_limit_ppm: s.ichConcentrationLimitPpm,
    boiling_point_c: s.boilingPointC,
    dielectric_constant: s.dielectricConstant,
    dielectric_temperature_c: s.dielectricTemperatureC,
    water_miscibility: s.waterMiscibility,
    density_g_per_ml: s.densityGPerMl,
    density_temperature_c: s.densityTemperatureC,
    source_physical: s.sources.physical,
    source_ich: s.sources.ich,
  }));
}

export function planJson(name: string, plan: PlatePlan): string {
  const doc = {
    format: 'saltsmith-plate-plan',
    version: 1,
    compound: name,
    plate: plan.plate,
    fillOrder: PLATE_FILL_ORDER,
    units: {
      api_mg: 'mg',
      api_mmol: 'mmol',
      counter_ion_ul: 'µL (neat liquid or stock)',
      solvent_ul: 'µL',
    },
    rows: pickListRows(plan),
    emptyWells: plan.emptyWells,
    notes: plan.notes,
    cautions: PLATE_PLAN_EXPORT_CAUTIONS,
  };
  return JSON.stringify(doc, null, 2);
}

export function planCsv(plan: PlatePlan): string {
  const csv = Papa.unparse(
    pickListRows(plan).map((r) => safeRow({ ...r })),
    { newline: '\n' },
  );
  const lines = [PLATE_FILL_ORDER, ...plan.notes, ...PLATE_PLAN_EXPORT_CAUTIONS];
  return `${csv}\n${lines.map((l) => `# ${l}`).join('\n')}`;
}

export const planCommand: CliCommand = defineCommand('plan', {
  summary: SUMMARY,
  usage: USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, PLAN_FLAGS);
    if (helpRequested(flags, io, USAGE)) return 0;
    refuseTogether(
      flags,
      'solvents',
      'input',
      'one lists the solvent table, the other builds a plan',
    );
    const [out] = await checkRunFiles({
      inputs: [{ flag: '--input', path: flags.input }],
      outputs: [{ flag: '--out', path: flags.out }],
    });
    let text: string;
    let what: string;
    if (flags.solvents) {
      const rows = solventRows();
      text =
        flags.format === 'json'
          ? JSON.stringify(rows, null, 2)
          : Papa.unparse(rows.map(safeRow), { newline: '\n' });
      what = `${rows.length} solvents`;
    } else {
      if (flags.input === undefined)
        throw usageError('--input', 'is needed (or --solvents)', 'a plan.json file');
      const { name, plan } = await planFromFile(await readPlanFile(flags.input));
      text = flags.format === 'json' ? planJson(name, plan) : planCsv(plan);
      what = `${plan.wells.length} wells`;
    }
    if (out !== undefined) {
      await writeFileAtomic(out, text + '\n');
      writeLine(io.stderr, `wrote ${what} to ${flags.out}`);
    } else await writeText(io.stdout, text + '\n');
    return 0;
  },
});
