import {isUserError} from '../user-error.js';
import {version} from '../version.js';
import {UsageError, type CliIo} from './command.js';
import {commands} from './commands/index.js';
import {ansiPaint, formatUserError, noPaint, type Paint} from './format-message.js';
import {helpText} from './help.js';

export type {CliIo} from './command.js';

/** Run stet with `argv` (without node and script); resolves to the exit code. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  const paint: Paint = io.colour ? ansiPaint : noPaint;
  const [first, ...args] = argv;
  if (first === undefined) return io.stderr(helpText()), 2;
  if (first === '--help' || first === '-h' || first === 'help') return io.stdout(helpText()), 0;
  if (first === '--version' || first === '-v') return io.stdout(`${version}\n`), 0;
  const command = commands.get(first);
  if (!command) return usage(io, `unknown command \`${first}\``);
  if (args.includes('--help') || args.includes('-h')) return io.stdout(helpText()), 0;
  try {
    return await (await command.load())({args, io, paint});
  } catch (error) {
    // node:util parseArgs reports unknown options with a `code` of ERR_PARSE_ARGS_*.
    if (error instanceof UsageError || String((error as {code?: unknown}).code).startsWith('ERR_PARSE_ARGS')) {
      return usage(io, (error as Error).message);
    }
    if (!isUserError(error)) throw error;
    io.stderr(`${formatUserError(error, args.find((arg) => !arg.startsWith('-')) ?? '', paint)}\n`);
    return 1;
  }
}

function usage(io: CliIo, message: string): number {
  io.stderr(`stet: ${message}\nRun \`stet --help\` for usage.\n`);
  return 2;
}
