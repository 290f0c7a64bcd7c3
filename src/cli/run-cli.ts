import path from 'node:path';
import {parseArgs} from 'node:util';
import {buildReport} from '../build-report.js';
import {isUserError} from '../user-error.js';
import {version} from '../version.js';
import {ansiPaint, formatMessage, formatUserError, noPaint, type Paint} from './format-message.js';
import {helpText} from './help.js';

/** Where the CLI writes; injected so tests run it in-process. */
export interface CliIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  /** Whether stderr is a terminal that wants colour. */
  readonly colour: boolean;
}

/** Run stet with `argv` (without node and script); resolves to the exit code. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  const paint: Paint = io.colour ? ansiPaint : noPaint;
  let parsed;
  try {
    parsed = parseArgs({
      args: [...argv],
      allowPositionals: true,
      options: {
        out: {type: 'string'},
        'allow-outside': {type: 'boolean'},
        help: {type: 'boolean', short: 'h'},
        version: {type: 'boolean', short: 'v'},
      },
    });
  } catch (error) {
    io.stderr(`stet: ${(error as Error).message}\nRun \`stet --help\` for usage.\n`);
    return 2;
  }
  const {values, positionals} = parsed;
  if (values.help) return io.stdout(helpText), 0;
  if (values.version) return io.stdout(`${version}\n`), 0;
  const [command, report, ...extra] = positionals;
  if (command !== 'build') {
    io.stderr(command === undefined ? helpText : `stet: unknown command \`${command}\`\nRun \`stet --help\` for usage.\n`);
    return 2;
  }
  if (report === undefined || extra.length > 0) {
    io.stderr('stet: `stet build` takes exactly one report, e.g. `stet build report.md`\n');
    return 2;
  }
  try {
    const started = process.hrtime.bigint();
    const result = await buildReport(report, {out: values.out, allowOutside: values['allow-outside']});
    for (const message of result.messages) io.stderr(`${formatMessage(message, paint)}\n`);
    if (!result.ok) {
      const errors = result.messages.filter((m) => m.fatal).length;
      io.stderr(`${paint.error(`${errors} error${errors === 1 ? '' : 's'}`)}; nothing was written.\n`);
      return 1;
    }
    const milliseconds = Number(process.hrtime.bigint() - started) / 1e6;
    const html = result.written.find((file) => file.endsWith('.html'));
    io.stdout(`Built ${path.relative(process.cwd(), result.outDir) || '.'} (${result.written.length} files) in ${Math.round(milliseconds)} ms.\n`);
    if (html) io.stdout(`Report: ${path.relative(process.cwd(), html)}\n`);
    return 0;
  } catch (error) {
    if (!isUserError(error)) throw error;
    io.stderr(`${formatUserError(error, report, paint)}\n`);
    return 1;
  }
}
