import {Readable} from 'node:stream';
import {CsvError, parse} from 'csv-parse';
import {parse as parseSync} from 'csv-parse/sync';
import {UserError, type Place} from '../user-error.js';
import {csvUserError} from './csv-user-error.js';
import {locateCell} from './locate-cell.js';
import type {DelimiterSource} from './resolve-delimiter.js';

/** One column as read: cell texts exactly as in the file (quotes removed), untyped. */
export interface RawColumn {
  readonly name: string;
  readonly cells: readonly string[];
  /** 1 where the cell was quoted; quoted text is never trimmed. */
  readonly quoted: Uint8Array;
}

export interface CsvTable {
  readonly columns: readonly RawColumn[];
  readonly rowCount: number;
  /** Editor position of data row `row` (0-based, header excluded), field `column` (0-based). */
  locate(row: number, column: number): Place;
}

export interface ReadCsvOptions {
  /** Path as the author wrote it; errors name this file. */
  readonly file: string;
  readonly delimiter: string;
  /** Where the delimiter came from; a guessed one is worth mentioning in hints. */
  readonly delimiterSource: DelimiterSource;
}

/**
 * Parse delimited text with a header row (RFC 4180 quoting, CRLF/LF/CR line
 * breaks, empty lines skipped). Rows are folded into columns as csv-parse
 * emits them, so feeding a file stream instead of one string is a change to
 * this function only (error positions would then re-read the file).
 * Malformed input becomes a `UserError` at the offending cell of the file.
 *
 * `text` must already be decoded and without a byte order mark (see
 * `decodeText`); `bom: true` stays on as a second guard (adaltas/node-csv-parse#284).
 */
export async function readCsv(text: string, options: ReadCsvOptions): Promise<CsvTable> {
  const {file, delimiter} = options;
  const locate = (record: number, field: number): Place => locateCell(text, delimiter, record, field);
  let names: string[] | undefined;
  let cells: string[][] = [];
  // Row indices of quoted cells per column: usually none, so kept sparse.
  let quotedRows: number[][] = [];
  let rowCount = 0;

  const parser = parse({
    ...parseOptions(delimiter),
    // `raw` tells quoted cells apart; csv-parse's `cast` could too, but made
    // parsing 15 times slower (measured: 1e5 rows, 4.5 s against 0.3 s).
    raw: true,
  });
  Readable.from(chunksOf(text)).pipe(parser);
  try {
    // Folding here rather than in csv-parse's `on_record` hook, which doubled
    // the parse time (measured: 1e6 rows, 5.7 s against 2.6 s).
    for await (const entry of parser) {
      // With `raw: true` csv-parse emits {record, raw}; its types do not say so.
      const {record, raw} = entry as unknown as {record: string[]; raw: string};
      if (names === undefined) {
        names = checkHeader(record, file, locate);
        cells = names.map(() => []);
        quotedRows = names.map(() => []);
        continue;
      }
      const quoted = raw.includes('"') ? quotedFields(raw, delimiter, record.length) : undefined;
      for (let k = 0; k < record.length; k++) {
        cells[k]?.push(record[k] as string);
        if (quoted?.[k]) quotedRows[k]?.push(rowCount);
      }
      rowCount += 1;
    }
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    // The parser runs ahead of this loop, so the header may not have been
    // seen yet; read it alone. A bad header is the first thing to fix.
    const header = names ?? readHeader(text, options, locate);
    throw csvUserError(error, options, header.length, locate);
  }

  if (names === undefined) {
    throw new UserError(`${file} has no header row`, {
      ruleId: 'data-empty',
      file,
      hint: 'the first line of a data file names its columns, e.g. supplier,strength',
    });
  }
  const columns = names.map((name, k): RawColumn => {
    const quoted = new Uint8Array(rowCount);
    for (const row of quotedRows[k] ?? []) quoted[row] = 1;
    return {name, cells: cells[k] ?? [], quoted};
  });
  return {columns, rowCount, locate: (row, column) => locate(row + 1, column)};
}

/** The header record alone, checked; for error reports only. */
function readHeader(text: string, options: ReadCsvOptions, locate: (record: number, field: number) => Place): string[] {
  let header: string[];
  try {
    header = parseSync(text, {...parseOptions(options.delimiter), to: 1})[0] ?? [];
  } catch (error) {
    if (error instanceof CsvError) throw csvUserError(error, options, 0, locate);
    throw error;
  }
  return checkHeader(header, options.file, locate);
}

function parseOptions(delimiter: string) {
  return {
    bom: true,
    delimiter,
    quote: '"',
    escape: '"',
    // All three, so that a file with mixed line endings still parses, and
    // exactly the breaks locateCell counts.
    record_delimiter: ['\r\n', '\n', '\r'],
    skip_empty_lines: true,
  };
}

/** Feed the parser in pieces, as a file stream would, never splitting a surrogate pair. */
function* chunksOf(text: string, size = 1 << 16): Generator<string> {
  let start = 0;
  while (start < text.length) {
    let end = Math.min(start + size, text.length);
    const code = text.charCodeAt(end);
    if (end < text.length && code >= 0xdc00 && code <= 0xdfff) end += 1;
    yield text.slice(start, end);
    start = end;
  }
}

/**
 * Which fields of a parsed record were quoted, from its raw text. The record
 * parsed without error, so a quote opens a field exactly when it is the
 * field's first character. csv-parse's `raw` may start with the line breaks
 * of skipped empty lines.
 */
function quotedFields(raw: string, delimiter: string, count: number): boolean[] {
  const flags: boolean[] = [];
  let i = 0;
  while (raw[i] === '\r' || raw[i] === '\n') i += 1;
  for (let k = 0; k < count; k++) {
    flags[k] = raw[i] === '"';
    if (flags[k]) {
      i += 1;
      for (;;) {
        const close = raw.indexOf('"', i);
        if (close < 0) return flags;
        i = close + 1;
        if (raw[i] !== '"') break;
        i += 1; // a doubled quote inside the field
      }
    }
    const next = raw.indexOf(delimiter, i);
    if (next < 0) break;
    i = next + delimiter.length;
  }
  return flags;
}

function checkHeader(record: string[], file: string, locate: (record: number, field: number) => Place): string[] {
  const seen = new Map<string, number>();
  for (const [k, name] of record.entries()) {
    if (name.trim() === '') {
      const trailing = k === record.length - 1 && k > 0;
      throw new UserError(`column ${k + 1} of the header has no name`, {
        ruleId: 'csv-header-empty',
        file,
        place: locate(0, k),
        hint: trailing
          ? 'a delimiter at the end of every line makes an extra, unnamed column: remove it, or name the column'
          : 'give every column a name in the first line of the file',
      });
    }
    const first = seen.get(name);
    if (first !== undefined) {
      throw new UserError(`column name ${JSON.stringify(name)} appears twice in the header (columns ${first + 1} and ${k + 1})`, {
        ruleId: 'csv-header-duplicate',
        file,
        place: locate(0, k),
        hint: 'rename one of the two columns; blocks refer to columns by name',
      });
    }
    seen.set(name, k);
  }
  return record;
}
