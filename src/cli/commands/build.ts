import path from 'node:path';
import {parseArgs} from 'node:util';
import {buildReport} from '../../build-report.js';
import {defaultFormats, outputFormats, type OutputFormat} from '../../compile-report.js';
import {UsageError, type CommandContext} from '../command.js';
import {printMessages} from '../print-messages.js';
import {oneReport} from '../one-report.js';

export async function run({args, io, paint}: CommandContext): Promise<number> {
  const {values, positionals} = parseArgs({
    args: [...args],
    allowPositionals: true,
    options: {
      out: {type: 'string'},
      to: {type: 'string'},
      template: {type: 'string'},
      'allow-html': {type: 'boolean'},
      'allow-outside': {type: 'boolean'},
    },
  });
  const report = oneReport('build', positionals);
  const started = process.hrtime.bigint();
  const result = await buildReport(report, {
    out: values.out,
    allowOutside: values['allow-outside'],
    template: values.template,
    allowHtml: values['allow-html'],
    formats: values.to === undefined ? defaultFormats : parseFormats(values.to),
  });
  if (!printMessages(result.messages, io, paint)) {
    io.stderr('nothing was written.\n');
    return 1;
  }
  const milliseconds = Number(process.hrtime.bigint() - started) / 1e6;
  const html = result.written.find((file) => file.endsWith('.html'));
  io.stdout(`Built ${path.relative(process.cwd(), result.outDir) || '.'} (${result.written.length} files) in ${Math.round(milliseconds)} ms.\n`);
  if (html) io.stdout(`Report: ${path.relative(process.cwd(), html)}\n`);
  return 0;
}

/** `--to md,html,tex` → the set; an unknown format is a usage error. */
export function parseFormats(list: string): Set<OutputFormat> {
  const formats = new Set<OutputFormat>();
  for (const item of list.split(',').map((part) => part.trim()).filter(Boolean)) {
    if (!(outputFormats as readonly string[]).includes(item)) {
      throw new UsageError(`unknown format \`${item}\` in --to (formats: ${outputFormats.join(', ')})`);
    }
    formats.add(item as OutputFormat);
  }
  if (formats.size === 0) throw new UsageError('--to needs at least one format, e.g. --to html,tex');
  return formats;
}
