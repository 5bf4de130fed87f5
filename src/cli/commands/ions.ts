import { defineCommand } from '../define-command';
import { COUNTER_IONS, formatIonFormula, searchCounterIons, type CounterIon } from '@/chem';
import { helpRequested } from '../args/help';
import { COMMAND_USAGE } from '../command-usage';
import { parseFlags } from '../args/parse-flags';
import { writeText, type CliCommand } from '../io';

/** File tag and version of `saltsmith ions --json` (also the format of fixtures/library/counter-ions.json). */
export const IONS_JSON_FORMAT = 'saltsmith-counter-ion-library';
export const IONS_JSON_VERSION = 1;

/** The JSON document `saltsmith ions --json` prints: every field of every ion, with its sources. */
export function ionsJsonDocument(ions: readonly CounterIon[]) {
  return {
    format: IONS_JSON_FORMAT,
    version: IONS_JSON_VERSION,
    note: 'Bundled counter-ion library. Every value names its source; "from memory" marks values recalled rather than read from the source. Molar masses are computed from IUPAC 2021 standard atomic weights. Screening data only: experiments and the regulatory guidance in force decide.',
    count: ions.length,
    ions,
  };
}

const pad = (s: string, n: number) => (s.length > n ? s.slice(0, n - 1) + '…' : s.padEnd(n));

function charges(ion: CounterIon): string {
  const set = [...new Set(ion.stoichiometries.map((s) => s.ionCharge))].sort(
    (a, b) => Math.abs(a) - Math.abs(b),
  );
  return set.map((c) => (c > 0 ? `+${c}` : `${c}`)).join(', ');
}

/**
 * `saltsmith ions [--search text] [--kind anion|cation] [--json]`: the bundled counter-ion library, the
 * same data the app bundles.
 */
const { summary: SUMMARY, usage: USAGE } = COMMAND_USAGE.ions;

/** The flags of `saltsmith ions`. */
export const IONS_FLAGS = {
  help: { type: 'switch' },
  json: { type: 'switch' },
  search: { type: 'string', maxLength: 200 },
  kind: { type: 'enum', values: ['anion', 'cation'] },
} as const;

export const ionsCommand: CliCommand = defineCommand('ions', {
  summary: SUMMARY,
  usage: USAGE,
  run: async (args, io) => {
    const flags = parseFlags(args, IONS_FLAGS);
    if (helpRequested(flags, io, USAGE)) return 0;
    const query = flags.search ?? '';
    const kind = flags.kind as 'anion' | 'cation' | undefined;
    const ions = searchCounterIons(COUNTER_IONS, query, kind ? { kind } : {});
    if (flags.json) {
      await writeText(io.stdout, JSON.stringify(ionsJsonDocument(ions), null, 2) + '\n');
      return 0;
    }
    if (ions.length === 0) {
      io.stderr.write(`no counter-ion matches '${query}'\n`);
      return 1;
    }
    await writeText(
      io.stdout,
      `${pad('name', 22)} ${pad('formula', 16)} ${pad('charge', 10)} ${pad('pKa (25 °C, water)', 24)} ${pad('class', 5)} ${'M (g/mol)'.padStart(9)}\n`,
    );
    for (const ion of ions) {
      const pkas = ion.pKas.length
        ? ion.pKas.map((p) => p.value.toFixed(2)).join(', ')
        : 'not sourced';
      const cls = ion.acceptabilityClass === null ? '–' : String(ion.acceptabilityClass);
      const name = ion.referenceOnly ? `${ion.name} (ref.)` : ion.name;
      await writeText(
        io.stdout,
        `${pad(name, 22)} ${pad(formatIonFormula(ion.formula, ion.charge), 16)} ${pad(charges(ion), 10)} ${pad(pkas, 24)} ${pad(cls, 5)} ${ion.molarMassGPerMol.toFixed(2).padStart(9)}\n`,
      );
    }
    await writeText(
      io.stdout,
      `\n${ions.length} ion(s). (ref.) = reference ion for the thermochemistry models, not used in medicines. ` +
        'pKa: parent acid, or conjugate acid of the parent base. Class: Stahl & Wermuth 2002 (from memory). ' +
        'Every value has its source in `saltsmith ions --json`.\n',
    );
    return 0;
  },
});
