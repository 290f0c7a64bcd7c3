import {appendFile, mkdir, readFile} from 'node:fs/promises';
import path from 'node:path';

/**
 * The ledger: `.stet/ledger.jsonl` beside the report, append-only, one line
 * per distinct (report, block, specification, dataset) a build evaluated.
 * It exists so that a report can disclose how many specifications of a
 * comparison were tried before the one it shows. Only builds write it.
 */
export interface LedgerEntry {
  /** ISO 8601 time of the build that first evaluated this line's key. */
  readonly time: string;
  /** The report's file name, so reports sharing a folder keep apart. */
  readonly report: string;
  readonly block: string;
  /** `specificationHash` of the declared block. */
  readonly spec: string;
  /** sha256 of the block's data file. */
  readonly data: string;
  readonly p: number | null;
  readonly decision: string | null;
}

export interface Ledger {
  readonly entries: readonly LedgerEntry[];
  /** One per line that could not be read (skipped, never fatal). */
  readonly warnings: readonly string[];
}

export function ledgerPath(reportDir: string): string {
  return path.join(reportDir, '.stet', 'ledger.jsonl');
}

/**
 * Read the ledger; a missing file is an empty ledger, a corrupt line a
 * warning. Two builds at once may both append the same key: harmless, as
 * everything read from the ledger counts distinct specifications.
 */
export async function readLedger(reportDir: string): Promise<Ledger> {
  let text: string;
  try {
    text = await readFile(ledgerPath(reportDir), 'utf8');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return {entries: [], warnings: []};
    throw error;
  }
  const entries: LedgerEntry[] = [];
  const warnings: string[] = [];
  text.split('\n').forEach((line, index) => {
    if (line.trim() === '') return;
    const entry = parseEntry(line);
    if (entry) entries.push(entry);
    else warnings.push(`.stet/ledger.jsonl line ${index + 1} is not a ledger entry; it was skipped`);
  });
  return {entries, warnings};
}

function parseEntry(line: string): LedgerEntry | undefined {
  let value: unknown;
  try {
    value = JSON.parse(line);
  } catch {
    return undefined;
  }
  if (!value || typeof value !== 'object') return undefined;
  const record = value as Record<string, unknown>;
  const text = ['time', 'report', 'block', 'spec', 'data'] as const;
  if (!text.every((key) => typeof record[key] === 'string')) return undefined;
  return record as unknown as LedgerEntry;
}

/** A block's lines in the ledger, oldest first (for the appendix). */
export function entriesOf(ledger: Ledger, report: string, block: string): LedgerEntry[] {
  return ledger.entries.filter((entry) => entry.report === report && entry.block === block);
}

/** Distinct specifications of a block: those in the ledger and the current one. */
export function countSpecifications(ledger: Ledger, report: string, block: string, currentSpec: string): number {
  return new Set([currentSpec, ...entriesOf(ledger, report, block).map((entry) => entry.spec)]).size;
}

/**
 * Append the entries whose (report, block, spec, data) key is new. One
 * `appendFile` of whole lines: concurrent builds interleave lines, never bytes
 * within a line (O_APPEND on a local file system).
 * @returns The entries appended.
 */
export async function appendLedger(reportDir: string, ledger: Ledger, candidates: readonly LedgerEntry[]): Promise<LedgerEntry[]> {
  const key = (e: LedgerEntry) => `${e.report}\u0000${e.block}\u0000${e.spec}\u0000${e.data}`;
  const seen = new Set(ledger.entries.map(key));
  const fresh = candidates.filter((entry) => !seen.has(key(entry)) && (seen.add(key(entry)), true));
  if (fresh.length === 0) return [];
  await mkdir(path.dirname(ledgerPath(reportDir)), {recursive: true});
  const lines = fresh.map((entry) => JSON.stringify(entry)).join('\n');
  // A line cut short (a crash, a hand edit) must not swallow the next one.
  const previous = await readFile(ledgerPath(reportDir), 'utf8').catch(() => '');
  const separator = previous === '' || previous.endsWith('\n') ? '' : '\n';
  await appendFile(ledgerPath(reportDir), `${separator}${lines}\n`);
  return fresh;
}
