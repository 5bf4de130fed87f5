import { writeLine, type CliCommand, type CliIo } from './io';
import { COMMAND_USAGE, type CommandName } from './command-usage';
import { describeFailure } from './define-command';
import { HELP_CAUTION } from './output/cautions';

/**
 * The commands of `saltsmith`, each loaded only when it runs (a `lattice` start does not load the
 * screening code, papaparse or the eval schemas). Add a command: its text in command-usage.ts, its
 * module under commands/, one line here. Nothing registers itself on import: the `eval` request kinds
 * are registered here, explicitly, before `eval` runs.
 */
const LOADERS: Record<CommandName, () => Promise<CliCommand>> = {
  lattice: async () => (await import('./commands/lattice')).latticeCommand,
  ions: async () => (await import('./commands/ions')).ionsCommand,
  eval: async () => {
    const { registerBuiltInEvalKinds } = await import('./commands/eval/built-in-kinds');
    registerBuiltInEvalKinds();
    return (await import('./commands/eval/eval-command')).evalCommand;
  },
  screen: async () => (await import('./commands/screen/screen-command')).screenCommand,
  plan: async () => (await import('./commands/plan/plan-command')).planCommand,
  serve: async () => (await import('./serve/serve-command')).serveCommand,
};

const isCommand = (name: string): name is CommandName =>
  Object.prototype.hasOwnProperty.call(LOADERS, name);

function help(io: CliIo) {
  writeLine(io.stdout, 'saltsmith — salt-selection workbench, command line\n');
  for (const [name, c] of Object.entries(COMMAND_USAGE)) {
    writeLine(io.stdout, `  ${name.padEnd(10)} ${c.summary}\n  ${''.padEnd(10)} ${c.usage}`);
  }
  writeLine(
    io.stdout,
    '\nExit status: 0 done, 1 an input was refused (the message names it), 2 the command line cannot be read.',
  );
  writeLine(io.stdout, `\n${HELP_CAUTION}`);
}

/** Run one command line; returns the exit status (0 ok, 1 some input failed, 2 usage error). */
export async function main(argv: string[], io: CliIo): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    help(io);
    return name ? 0 : 2;
  }
  if (!isCommand(name)) {
    writeLine(
      io.stderr,
      `saltsmith: unknown command '${name.slice(0, 40)}'. Commands: ${Object.keys(LOADERS).join(', ')}`,
    );
    return 2;
  }
  try {
    const cmd = await LOADERS[name]();
    return await cmd.run(rest, io);
  } catch (err) {
    const f = describeFailure(err);
    writeLine(io.stderr, `saltsmith ${name}: ${f.message}`);
    return f.code;
  }
}
