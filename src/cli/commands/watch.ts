import path from 'node:path';
import {isUserError} from '../../user-error.js';
import {defaultPort, serveOut, type OutServer} from '../../serve/serve-out.js';
import {rebuildSummary} from '../../watch/rebuild-summary.js';
import {watchReport, type BuildOutcome} from '../../watch/watch-report.js';
import {UsageError, type CliIo, type CommandContext} from '../command.js';
import {formatMessage, formatUserError, noPaint, type Paint} from '../format-message.js';
import {parseBuildArguments} from '../build-arguments.js';
import {printMessages} from '../print-messages.js';

export async function run({args, io, paint}: CommandContext): Promise<number> {
  const {rest, serve} = takeServe(args);
  const {report, options} = parseBuildArguments('watch', rest);
  const name = path.basename(report, path.extname(report));
  let server: OutServer | undefined;
  const session = await watchReport(report, {
    ...options,
    onBuild: (outcome) => announce(outcome, io, paint, report, server),
  });
  if (serve !== undefined) {
    try {
      server = await serveOut(session.outDir, `${name}.html`, serve);
    } catch (error) {
      await session.close();
      throw new UsageError(`cannot serve on port ${serve}: ${(error as Error).message}`);
    }
  }
  io.stdout(`Watching ${path.relative(process.cwd(), report) || report}, its data and templates (Ctrl-C to stop)\n`);
  if (server) io.stdout(`Serving ${server.url}\n`);
  await new Promise<void>((resolve) => process.once('SIGINT', () => resolve()));
  await Promise.all([session.close(), server?.close()]);
  io.stdout('Stopped watching.\n');
  return 0;
}

/** Print one build's outcome and tell served pages. */
function announce(outcome: BuildOutcome, io: CliIo, paint: Paint, report: string, server: OutServer | undefined): void {
  if (outcome.ok) {
    printMessages(outcome.compiled.messages, io, paint);
    io.stdout(rebuildSummary(outcome.report, new Date(), paint.error));
    server?.rebuilt([...new Set([...outcome.report.changed.map((c) => c.block), ...outcome.report.added])]);
    return;
  }
  const text = failureText(outcome, report, noPaint);
  if (outcome.error !== undefined && !isUserError(outcome.error)) io.stderr(`${text}\n`);
  else if (outcome.messages.length) printMessages(outcome.messages, io, paint);
  else io.stderr(`${failureText(outcome, report, paint)}\n`);
  io.stderr('the last good output stays; waiting for the next change.\n');
  server?.failed(text);
}

function failureText(outcome: Extract<BuildOutcome, {ok: false}>, report: string, paint: Paint): string {
  if (outcome.messages.length) return outcome.messages.filter((m) => m.fatal).map((m) => formatMessage(m, paint)).join('\n');
  const error = outcome.error;
  if (isUserError(error)) return formatUserError(error, report, paint);
  return `internal error: ${error instanceof Error ? error.message : String(error)}`;
}

/**
 * `--serve`, `--serve PORT` or `--serve=PORT` (node:util's parseArgs has
 * no optional values). Returns the other arguments and the port, if any.
 */
export function takeServe(args: readonly string[]): {rest: string[]; serve: number | undefined} {
  const rest: string[] = [];
  let serve: number | undefined;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    const inline = /^--serve=(.*)$/.exec(arg);
    if (inline) {
      serve = port(inline[1]!);
    } else if (arg === '--serve') {
      const next = args[i + 1];
      serve = next !== undefined && /^\d+$/.test(next) ? (i++, port(next)) : defaultPort;
    } else {
      rest.push(arg);
    }
  }
  return {rest, serve};
}

function port(text: string): number {
  const value = Number(text);
  if (!/^\d+$/.test(text) || value > 65535) throw new UsageError(`--serve takes a port from 0 to 65535 (0: any free port), not \`${text}\``);
  return value;
}
