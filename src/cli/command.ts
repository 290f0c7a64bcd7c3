import type {Paint} from './format-message.js';

/** Where the CLI writes; injected so tests run it in-process. */
export interface CliIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  /** Whether stderr is a terminal that wants colour. */
  readonly colour: boolean;
}

/** What every command receives: its own arguments (after the command name). */
export interface CommandContext {
  readonly args: readonly string[];
  readonly io: CliIo;
  readonly paint: Paint;
}

/** One `stet COMMAND`; each lives in `cli/commands/COMMAND.ts`. */
export interface Command {
  /** One line for `stet --help`, e.g. `build REPORT.md [--out DIR]`. */
  readonly usage: string;
  readonly summary: string;
  /** Loads the command's module (`cli/commands/NAME.ts`) and gives its `run`. */
  readonly load: () => Promise<CommandRun>;
}

/** Resolves to the exit code: 0 success, 1 the report is wrong (or stale), 2 usage. */
export type CommandRun = (context: CommandContext) => Promise<number>;

/** A usage error: printed with a pointer to --help, exit code 2. */
export class UsageError extends Error {}
