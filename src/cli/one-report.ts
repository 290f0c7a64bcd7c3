import {UsageError} from './command.js';

/** The single REPORT.md positional every command takes. */
export function oneReport(command: string, positionals: readonly string[]): string {
  const [report, ...extra] = positionals;
  if (report === undefined || extra.length > 0) {
    throw new UsageError(`\`stet ${command}\` takes exactly one report, e.g. \`stet ${command} report.md\``);
  }
  return report;
}
