import {parseArgs} from 'node:util';
import type {VFileMessage} from 'vfile-message';
import {compileReport} from '../../compile-report.js';
import {lintSource} from '../../lint/lint-report.js';
import {UsageError, type CommandContext} from '../command.js';
import {formatMessage} from '../format-message.js';
import {oneReport} from '../one-report.js';
import {printMessages} from '../print-messages.js';

export async function run({args, io, paint}: CommandContext): Promise<number> {
  const {values, positionals} = parseArgs({
    args: [...args],
    allowPositionals: true,
    options: {format: {type: 'string', default: 'text'}, 'allow-outside': {type: 'boolean'}},
  });
  if (values.format !== 'text' && values.format !== 'json') {
    throw new UsageError(`unknown --format \`${values.format}\` (formats: text, json)`);
  }
  const report = oneReport('lint', positionals);
  // Compiled in memory for the results the rules compare against; nothing is written.
  const compiled = await compileReport(report, {allowOutside: values['allow-outside'], formats: new Set()});
  const findings = compiled.messages.filter((message) => message.source === lintSource);
  const others = compiled.messages.filter((message) => message.source !== lintSource);
  if (others.some((message) => message.fatal)) {
    printMessages(others, io, paint);
    io.stderr('the report has errors, so it could not be linted.\n');
    return 1;
  }
  for (const message of others) io.stderr(`${formatMessage(message, paint)}\n`);
  if (values.format === 'json') io.stdout(`${JSON.stringify(findings.map(toJson), null, 2)}\n`);
  else {
    for (const message of findings) io.stdout(`${formatMessage(message, paint)}\n`);
    io.stdout(`${summary(findings)}\n`);
  }
  return findings.some((message) => message.fatal) ? 1 : 0;
}

function toJson(message: VFileMessage) {
  return {
    file: message.file,
    line: message.line ?? 1,
    column: message.column ?? 1,
    endLine: message.place && 'end' in message.place ? message.place.end.line : (message.line ?? 1),
    endColumn: message.place && 'end' in message.place ? message.place.end.column : (message.column ?? 1),
    severity: message.fatal ? 'error' : 'warning',
    rule: message.ruleId ?? null,
    message: message.reason,
    suggestion: message.note ?? null,
  };
}

function summary(findings: readonly VFileMessage[]): string {
  const errors = findings.filter((message) => message.fatal).length;
  const warnings = findings.length - errors;
  if (findings.length === 0) return 'No lint findings.';
  const count = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return `${count(errors, 'error')}, ${count(warnings, 'warning')}.`;
}
