import { writeLine, type CliCommand, type CliIo } from './io';
import { latticeCommand } from './commands/lattice';
import { ionsCommand } from './commands/ions';
import { evalCommand } from './commands/eval';
import { screenCommand } from './commands/screen';

/**
 * The commands of `saltsmith`. Add one line per command; each lives in commands/<name>.ts.
 */
const COMMANDS: Record<string, CliCommand> = {
  lattice: latticeCommand,
  ions: ionsCommand,
  eval: evalCommand,
  screen: screenCommand,
};

const CAUTION =
  'Screening estimates only: they do not establish a salt form. Experiments, the regulatory guidance in force and your lab’s safety rules decide.';

function help(io: CliIo) {
  writeLine(io.stdout, 'saltsmith — salt-selection workbench, command line\n');
  for (const [name, c] of Object.entries(COMMANDS)) {
    writeLine(io.stdout, `  ${name.padEnd(10)} ${c.summary}\n  ${''.padEnd(10)} ${c.usage}`);
  }
  writeLine(io.stdout, `\n${CAUTION}`);
}

/** Run one command line; returns the exit status (0 ok, 1 some input failed, 2 usage error). */
export async function main(argv: string[], io: CliIo): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    help(io);
    return name ? 0 : 2;
  }
  const cmd = COMMANDS[name];
  if (!cmd) {
    writeLine(io.stderr, `saltsmith: unknown command '${name}'. Commands: ${Object.keys(COMMANDS).join(', ')}`);
    return 2;
  }
  try {
    return await cmd.run(rest, io);
  } catch (err) {
    writeLine(io.stderr, `saltsmith ${name}: ${err instanceof Error ? err.message : String(err)}`);
    return 2;
  }
}
