import path from 'node:path';
import {parseArgs} from 'node:util';
import {checkReport} from '../../check/check-report.js';
import type {CommandContext} from '../command.js';
import {oneReport} from '../one-report.js';
import {printMessages} from '../print-messages.js';

export async function run({args, io, paint}: CommandContext): Promise<number> {
  const {values, positionals} = parseArgs({
    args: [...args],
    allowPositionals: true,
    options: {out: {type: 'string'}, 'allow-outside': {type: 'boolean'}},
  });
  const report = oneReport('check', positionals);
  const result = await checkReport(report, {out: values.out, allowOutside: values['allow-outside']});
  const shown = (subject: string) => (path.isAbsolute(subject) ? path.relative(process.cwd(), subject) : subject);
  // Only errors: warnings (lint, assumptions) belong to `build` and `lint`; check answers one question.
  if (!printMessages(result.messages.filter((message) => message.fatal), io, paint)) {
    io.stderr('the report does not build, so its output cannot be current.\n');
    return 1;
  }
  const where = path.relative(process.cwd(), result.outDir) || '.';
  if (result.fresh) {
    io.stdout(`${where} is up to date with ${report}${result.compiled ? ' (recompiled to compare; rebuild to refresh the build record)' : ''}.\n`);
    return 0;
  }
  io.stderr(`${paint.error('stale')}: ${where} does not match ${report} and its data:\n`);
  for (const finding of result.findings) io.stderr(`  ${shown(finding.subject)}: ${finding.reason}\n`);
  io.stderr(`Run \`stet build ${report}\` to bring it up to date.\n`);
  return 1;
}
