import { parseArgs } from 'node:util';
import { EXIT, USAGE, UsageError, type CliIo } from './io';
import { reviewCommand } from './commands/review';
import { schemaCommand } from './commands/schema';
import { demoCommand } from './commands/demo';
import { newCommand } from './commands/new';

type Command = (args: string[], io: CliIo) => Promise<number>;

const COMMANDS: Record<string, Command> = {
  review: reviewCommand,
  schema: schemaCommand,
  demo: demoCommand,
  new: newCommand,
  sign: async (args, io) => (await import('./commands/sign')).signCommand(args, io),
  verify: async (args, io) => (await import('./commands/verify')).verifyCommand(args, io),
  diff: async (args, io) => (await import('./commands/diff')).diffCommand(args, io),
  ehl: async (args, io) => (await import('./commands/ehl')).ehlCommand(args, io),
  fleet: async (args, io) => (await import('./commands/fleet')).fleetCommand(args, io),
};

/** Register a command (the record commands live in their own module). */
export function registerCommand(name: string, command: Command): void {
  COMMANDS[name] = command;
}

export async function runCli(argv: string[], io: CliIo): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    io.out(USAGE);
    return name ? EXIT.ok : EXIT.usage;
  }
  if (name === '--version') {
    const { ENGINE_VERSION } = await import('../engine/version');
    io.out(`${ENGINE_VERSION}\n`);
    return EXIT.ok;
  }
  // Own keys only: `constructor`, `__proto__`, `toString` … are unknown commands, not Object's methods.
  const command = Object.hasOwn(COMMANDS, name) ? COMMANDS[name] : undefined;
  if (!command) {
    io.err(`flankfilm: unknown command ${JSON.stringify(name.slice(0, 40))}\n${USAGE}`); // JSON quoting: no control character reaches the terminal
    return EXIT.usage;
  }
  try {
    return await command(rest, io);
  } catch (e) {
    if (e instanceof UsageError || (e as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
      io.err(`flankfilm ${name}: ${(e as Error).message}\n${USAGE}`);
      return EXIT.usage;
    }
    throw e;
  }
}

export { parseArgs };
