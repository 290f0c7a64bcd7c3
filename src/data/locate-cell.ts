import type {Place} from '../user-error.js';

/**
 * The editor position (1-based line, 1-based column in UTF-16 code units) of
 * a field in delimited text, for error messages only.
 *
 * csv-parse reports the line where it *noticed* a problem, which is off after
 * fields with embedded line breaks (a quoted CRLF counts twice), and it has no
 * column. Errors are rare, so we rescan the text instead of tracking positions
 * for every cell. Records are counted as csv-parse counts them with
 * `skip_empty_lines`: the header is record 0 and empty lines are not records.
 *
 * `text` must be the text csv-parse saw, without a byte order mark. A field
 * past the end of its record gives the position just after the record's last
 * character, where the missing delimiter would go.
 */
export function locateCell(text: string, delimiter: string, record: number, field: number): Place {
  let line = 1;
  let lineStart = 0;
  let recordIndex = 0;
  let fieldIndex = 0;
  let inQuotes = false;
  let atRecordStart = true;
  let fieldStart = 0;
  const here = (i: number): Place => ({line, column: i - lineStart + 1});

  let i = 0;
  while (i < text.length) {
    const breakLength = lineBreakAt(text, i);
    if (atRecordStart && breakLength > 0) {
      // An empty line: csv-parse skips it without counting a record.
      i += breakLength;
      line += 1;
      lineStart = i;
      continue;
    }
    if (atRecordStart) {
      atRecordStart = false;
      fieldStart = i;
      if (recordIndex === record && field === 0) return here(i);
    }
    const ch = text[i];
    if (inQuotes) {
      if (ch === '"') {
        const escaped = text[i + 1] === '"';
        i += escaped ? 2 : 1;
        inQuotes = escaped;
      } else if (breakLength > 0) {
        i += breakLength;
        line += 1;
        lineStart = i;
      } else {
        i += 1;
      }
    } else if (text.startsWith(delimiter, i)) {
      i += delimiter.length;
      fieldIndex += 1;
      fieldStart = i;
      if (recordIndex === record && fieldIndex === field) return here(i);
    } else if (breakLength > 0) {
      if (recordIndex === record) return here(i);
      i += breakLength;
      line += 1;
      lineStart = i;
      recordIndex += 1;
      fieldIndex = 0;
      atRecordStart = true;
    } else {
      // RFC 4180: a quote opens a quoted field only as its first character.
      if (ch === '"' && i === fieldStart) inQuotes = true;
      i += 1;
    }
  }
  return here(text.length);
}

/** Length of the line break at `i` (CRLF, LF or a lone CR), 0 if none. */
function lineBreakAt(text: string, i: number): number {
  const ch = text[i];
  if (ch === '\n') return 1;
  if (ch === '\r') return text[i + 1] === '\n' ? 2 : 1;
  return 0;
}
