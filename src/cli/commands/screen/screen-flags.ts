import { celsiusToKelvin, resolveExcipients } from '@/chem';
import { usageError } from '../../args/cli-error';
import { COMMAND_USAGE } from '../../command-usage';
import { refuseTogether, type ParsedFlags } from '../../args/parse-flags';

/** The flags of `saltsmith screen` (one compound, or a list with --batch), with their accepted ranges. */

export const SCREEN_USAGE = COMMAND_USAGE.screen.usage;

/** Flags that describe one compound; with --batch they come from the file instead. */
export const COMPOUND_FLAGS = [
  'smiles',
  'formula',
  'name',
  'kind',
  'charge',
  'pka',
  's0',
  'mp',
  'logp',
  'dose',
  'input',
] as const;

export const SCREEN_FLAGS = {
  help: { type: 'switch' },
  // the compound
  input: { type: 'string', maxLength: 4096 },
  name: { type: 'string', maxLength: 120 },
  smiles: { type: 'string', maxLength: 2000 },
  formula: { type: 'string', maxLength: 200 },
  kind: { type: 'enum', values: ['base', 'acid'] },
  charge: { type: 'number', min: -3, max: 3, integer: true, unit: '(charge of the drug ion)' },
  pka: { type: 'number-list', minItems: 1, maxItems: 4, min: -10, max: 20 },
  'pka-origin': { type: 'enum', values: ['measured', 'literature', 'predicted', 'not-stated'] },
  s0: { type: 'number', min: 1e-9, max: 1e4, unit: 'mg/mL' },
  's0-origin': { type: 'enum', values: ['measured', 'literature', 'predicted', 'not-stated'] },
  mp: { type: 'number', min: -100, max: 600, unit: '°C' },
  logp: { type: 'number', min: -10, max: 15 },
  dose: { type: 'number', min: 1e-6, max: 1e5, unit: 'mg' },
  // the candidates and settings
  ions: { type: 'string-list', minItems: 1, maxItems: 200, maxLength: 80 },
  'keep-cocrystal-band': { type: 'switch' },
  'gastric-chloride': { type: 'number', min: 0, max: 5, unit: 'mol/L' },
  'micro-ph': { type: 'number', min: 0, max: 14 },
  excipients: { type: 'string-list', minItems: 1, maxItems: 40, maxLength: 60 },
  'temperature-c': { type: 'number', min: 0, max: 100, unit: '°C' },
  iterations: { type: 'number', min: 1, max: 100000, integer: true },
  seed: { type: 'number', min: 0, max: 4294967295, integer: true },
  // the output
  format: { type: 'enum', values: ['csv', 'json', 'jsonl'] },
  out: { type: 'string', maxLength: 4096 },
  top: { type: 'number', min: 1, max: 1000, integer: true },
  // batch
  batch: { type: 'string', maxLength: 4096 },
  jobs: { type: 'number', min: 1, max: 64, integer: true },
  errors: { type: 'string', maxLength: 4096 },
} as const;

export type ScreenFlags = ParsedFlags<typeof SCREEN_FLAGS>;

/** Refuse combinations that cannot all be honoured (exit status 2). */
export function refuseContradictions(flags: ScreenFlags): void {
  refuseTogether(
    flags,
    'smiles',
    'formula',
    'give the structure or the formula; the formula follows from the structure',
  );
  if (flags.charge !== undefined) {
    if (flags.charge === 0)
      throw usageError('--charge', 'the drug ion cannot be neutral', '±1, ±2 or ±3');
    const kind = flags.kind ?? 'base';
    if ((kind === 'base') !== flags.charge > 0) {
      throw usageError(
        '--charge',
        `${flags.charge} contradicts --kind ${kind} (a base forms a cation, an acid an anion)`,
      );
    }
  }
  if (flags.ions) {
    const seen = new Set<string>();
    for (const id of flags.ions.map((x) => x.toLowerCase())) {
      if (seen.has(id))
        throw usageError('--ions', `"${id}" is given twice`, 'each counter-ion once');
      seen.add(id);
    }
  }
  if (flags.batch !== undefined) {
    for (const f of COMPOUND_FLAGS) {
      if (flags[f] !== undefined)
        throw usageError(
          `--${f}`,
          'cannot be combined with --batch: each compound comes from the batch file',
        );
    }
    if (flags.format === 'json')
      throw usageError(
        '--format',
        'json is one document; a batch writes csv or jsonl (one JSON line per row)',
      );
  } else {
    for (const f of ['jobs', 'errors'] as const) {
      if (flags[f] !== undefined) throw usageError(`--${f}`, 'only applies with --batch');
    }
    if (flags.format === 'jsonl')
      throw usageError('--format', 'jsonl is for --batch; one compound writes csv or json');
  }
}

/** Screening settings given by flags, over `base` (the settings of an --input file). */
export function settingsFromFlags(
  flags: ScreenFlags,
  base: Record<string, unknown> = {},
): Record<string, unknown> {
  const s: Record<string, unknown> = { ...base };
  if (flags['gastric-chloride'] !== undefined) s.gastricChlorideM = flags['gastric-chloride'];
  if (flags['micro-ph'] !== undefined) s.microenvironmentPh = flags['micro-ph'];
  // A microenvironment pH given on the command line or in the file is stated, not assumed.
  if (s.microenvironmentPh !== undefined && s.microenvironmentPhStated === undefined)
    s.microenvironmentPhStated = true;
  if (flags.excipients !== undefined) {
    const ids = flags.excipients.map((x) => x.toLowerCase());
    resolveExcipients(ids, '--excipients'); // an unknown id is refused by name (exit 1)
    if (new Set(ids).size !== ids.length)
      throw usageError('--excipients', 'an excipient is given twice', 'each excipient once');
    s.excipients = ids;
  }
  if (flags['temperature-c'] !== undefined)
    s.temperatureK = celsiusToKelvin(flags['temperature-c']);
  return s;
}
