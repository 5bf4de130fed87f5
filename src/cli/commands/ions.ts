import { COUNTER_IONS, formatIonFormula, searchCounterIons, type CounterIon } from '@/chem';
import { parseFlags, writeLine, type CliCommand } from '../io';

/** File tag and version of `saltsmith ions --json` (also the format of fixtures/library/counter-ions.json). */
export const IONS_JSON_FORMAT = 'saltsmith-counter-ion-library';
export const IONS_JSON_VERSION = 1;

/** The JSON document `saltsmith ions --json` prints: every field of every ion, with its sources. */
export function ionsJsonDocument(ions: readonly CounterIon[]) {
  return {
    format: IONS_JSON_FORMAT,
    version: IONS_JSON_VERSION,
    note:
      'Bundled counter-ion library. Every value names its source; "from memory" marks values recalled rather than read from the source. Molar masses are computed from IUPAC 2021 standard atomic weights. Screening data only: experiments and the regulatory guidance in force decide.',
    count: ions.length,
    ions,
  };
}

const pad = (s: string, n: number) => (s.length > n ? s.slice(0, n - 1) + '…' : s.padEnd(n));

function charges(ion: CounterIon): string {
  const set = [...new Set(ion.stoichiometries.map((s) => s.ionCharge))].sort((a, b) => Math.abs(a) - Math.abs(b));
  return set.map((c) => (c > 0 ? `+${c}` : `${c}`)).join(', ');
}

/**
 * `saltsmith ions [--search text] [--kind anion|cation] [--json]`: the bundled counter-ion library, the
 * same data the app bundles.
 */
export const ionsCommand: CliCommand = {
  summary: 'the counter-ion library: name, formula, charge, pKa values, class',
  usage: 'saltsmith ions [--search <text>] [--kind anion|cation] [--json]',
  run: async (args, io) => {
    const { flags, positional } = parseFlags(args, ['json']);
    if (positional.length > 0) {
      writeLine(io.stderr, `unexpected argument '${positional[0]}'. Usage: ${ionsCommand.usage}`);
      return 2;
    }
    const kind = flags.kind;
    if (kind !== undefined && kind !== 'anion' && kind !== 'cation') {
      writeLine(io.stderr, `--kind must be anion or cation, got '${String(kind)}'`);
      return 2;
    }
    const query = typeof flags.search === 'string' ? flags.search : '';
    const ions = searchCounterIons(COUNTER_IONS, query, kind ? { kind } : {});
    if (flags.json) {
      writeLine(io.stdout, JSON.stringify(ionsJsonDocument(ions), null, 2));
      return 0;
    }
    if (ions.length === 0) {
      writeLine(io.stderr, `no counter-ion matches '${query}'`);
      return 1;
    }
    writeLine(
      io.stdout,
      `${pad('name', 22)} ${pad('formula', 16)} ${pad('charge', 10)} ${pad('pKa (25 °C, water)', 24)} ${pad('class', 5)} ${'M (g/mol)'.padStart(9)}`,
    );
    for (const ion of ions) {
      const pkas = ion.pKas.length ? ion.pKas.map((p) => p.value.toFixed(2)).join(', ') : 'not sourced';
      writeLine(
        io.stdout,
        `${pad(ion.referenceOnly ? `${ion.name} (ref.)` : ion.name, 22)} ${pad(formatIonFormula(ion.formula, ion.charge), 16)} ${pad(charges(ion), 10)} ${pad(pkas, 24)} ${pad(
          ion.acceptabilityClass === null ? '–' : String(ion.acceptabilityClass),
          5,
        )} ${ion.molarMassGPerMol.toFixed(2).padStart(9)}`,
      );
    }
    writeLine(
      io.stdout,
      `\n${ions.length} ion(s). (ref.) = reference ion for the thermochemistry models, not used in medicines. ` +
        'pKa: parent acid, or conjugate acid of the parent base. Class: Stahl & Wermuth 2002 (from memory). ' +
        'Every value has its source in `saltsmith ions --json`.',
    );
    return 0;
  },
};
