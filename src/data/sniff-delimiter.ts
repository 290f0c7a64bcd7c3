/**
 * Guess the field delimiter of a delimited text file.
 *
 * csv-parse has no reliable detection (a list of delimiters means "split on
 * any of them", which silently mis-splits `;` files with decimal commas), so
 * we count each candidate outside quoted text on the header line and the next
 * few records, as spreadsheet importers do (common practice, no source):
 * a candidate that occurs on the header and the same number of times on every
 * sampled record wins; among several, the one giving more fields wins; ties go
 * to the order of CANDIDATES. With decimal `,` the comma is never chosen.
 */
export const CANDIDATES = [',', '\t', ';', '|'] as const;

/** Records sampled after the header; enough to see ragged rows, cheap on big files. */
const SAMPLE_RECORDS = 20;
/** Stop scanning after this many characters even if records are very long. */
const SAMPLE_CHARS = 1 << 16;

export interface SniffResult {
  readonly delimiter: string;
  /** False when no candidate gave the same field count on every sampled record. */
  readonly consistent: boolean;
}

export function sniffDelimiter(text: string, decimal: '.' | ','): SniffResult {
  const candidates = CANDIDATES.filter((c) => !(decimal === ',' && c === ','));
  const counts = countPerRecord(text, candidates);
  const header = counts[0];
  const fallback = candidates[0] ?? ',';
  if (header === undefined) return {delimiter: fallback, consistent: true};

  let best: {delimiter: string; fields: number; consistent: boolean} | undefined;
  for (const [i, candidate] of candidates.entries()) {
    const onHeader = header[i] ?? 0;
    if (onHeader === 0) continue;
    const consistent = counts.every((record) => record[i] === onHeader);
    const better =
      best === undefined ||
      (consistent && !best.consistent) ||
      (consistent === best.consistent && onHeader > best.fields);
    if (better) best = {delimiter: candidate, fields: onHeader, consistent};
  }
  // No candidate on the header: a one-column file, where the choice is moot.
  return best === undefined
    ? {delimiter: fallback, consistent: true}
    : {delimiter: best.delimiter, consistent: best.consistent};
}

/** Occurrences of each candidate outside quotes, per non-empty record. */
function countPerRecord(text: string, candidates: readonly string[]): number[][] {
  const records: number[][] = [];
  let current = candidates.map(() => 0);
  let inQuotes = false;
  let recordHasText = false;
  const end = Math.min(text.length, SAMPLE_CHARS);
  for (let i = 0; i < end && records.length <= SAMPLE_RECORDS; i++) {
    const ch = text[i] as string;
    if (ch === '"') inQuotes = !inQuotes; // `""` toggles twice: still inside
    if (inQuotes) {
      recordHasText = true;
      continue;
    }
    if (ch === '\n' || ch === '\r') {
      if (recordHasText) records.push(current);
      current = candidates.map(() => 0);
      recordHasText = false;
      continue;
    }
    recordHasText = true;
    const k = candidates.indexOf(ch);
    if (k >= 0) current[k] = (current[k] ?? 0) + 1;
  }
  // A last record without a line break counts only if the sample ended with the text.
  if (recordHasText && !inQuotes && end === text.length && records.length <= SAMPLE_RECORDS) {
    records.push(current);
  }
  return records;
}
