import path from 'node:path';
import {buildReport} from '../../build-report.js';
import {parseBuildArguments} from '../build-arguments.js';
import type {CommandContext} from '../command.js';
import {printMessages} from '../print-messages.js';

export async function run({args, io, paint}: CommandContext): Promise<number> {
  const {report, options} = parseBuildArguments('build', args);
  const started = process.hrtime.bigint();
  const result = await buildReport(report, options);
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
