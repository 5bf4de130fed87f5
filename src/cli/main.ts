import { writeLine, type CliCommand, type CliIo } from './io';
import { latticeCommand } from './commands/lattice';
import { ionsCommand } from './commands/ions';
import { evalCommand } from './commands/eval/eval-command';
import { registerBuiltInEvalKinds } from './commands/eval/built-in-kinds';
import { screenCommand } from './commands/screen/screen-command';
import { serveCommand } from './serve/serve-command';
import { describeFailure } from './define-command';
import { HELP_CAUTION } from './output/cautions';

/**
 * The commands of `saltsmith`. Add one line per command; each lives in commands/<name>/ or its own
 * folder. Nothing registers itself on import: the `eval` request kinds are added here, once.
 */
const COMMANDS: Record<string, CliCommand> = {
  lattice: latticeCommand,
  ions: ionsCommand,
  eval: evalCommand,
  screen: screenCommand,
  serve: serveCommand,
};

function help(io: CliIo) {
  writeLine(io.stdout, 'saltsmith — salt-selection workbench, command line\n');
  for (const [name, c] of Object.entries(COMMANDS)) {
    writeLine(io.stdout, `  ${name.padEnd(10)} ${c.summary}\n  ${''.padEnd(10)} ${c.usage}`);
  }
  writeLine(io.stdout, '\nExit status: 0 done, 1 an input was refused (the message names it), 2 the command line cannot be read.');
  writeLine(io.stdout, `\n${HELP_CAUTION}`);
}

/** Run one command line; returns the exit status (0 ok, 1 some input failed, 2 usage error). */
export async function main(argv: string[], io: CliIo): Promise<number> {
  registerBuiltInEvalKinds();
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    help(io);
    return name ? 0 : 2;
  }
  const cmd = Object.prototype.hasOwnProperty.call(COMMANDS, name) ? COMMANDS[name] : undefined;
  if (!cmd) {
    writeLine(io.stderr, `saltsmith: unknown command '${name.slice(0, 40)}'. Commands: ${Object.keys(COMMANDS).join(', ')}`);
    return 2;
  }
  try {
    return await cmd.run(rest, io);
  } catch (err) {
    const f = describeFailure(err);
    writeLine(io.stderr, `saltsmith ${name}: ${f.message}`);
    return f.code;
  }
}
