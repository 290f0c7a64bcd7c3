import type {CsvError} from 'csv-parse';
import {UserError, type Place} from '../user-error.js';
import type {ReadCsvOptions} from './read-csv.js';

/** The fields of csv-parse's errors we read; it copies its parser state onto the error. */
interface CsvErrorState {
  /** 0-based index of the record being parsed, the header being record 0. */
  records?: number;
  /** 0-based index of the field being parsed. */
  column?: number | string;
  /** Line where the problem was noticed (1-based). */
  lines?: number;
  /** The fields of the offending record (length errors). */
  record?: string[];
  /** The field's text so far (quote errors). */
  field?: string;
}

/**
 * Turn a csv-parse error into a `UserError` at the offending cell, worded for
 * an author who edits the file by hand. Codes as thrown by csv-parse 7.0.3
 * (measured in shared/research/library-pitfalls.md §6).
 */
export function csvUserError(
  error: CsvError,
  options: ReadCsvOptions,
  expectedFields: number,
  locate: (record: number, field: number) => Place,
): UserError {
  const {file, delimiter, delimiterSource} = options;
  const state = error as unknown as CsvErrorState;
  const record = state.records ?? 0;
  const field = typeof state.column === 'number' ? state.column : 0;
  const shown = delimiter === '\t' ? 'tab' : JSON.stringify(delimiter);

  switch (error.code) {
    case 'CSV_RECORD_INCONSISTENT_FIELDS_LENGTH': {
      const got = state.record?.length ?? 0;
      const guessed = delimiterSource !== 'declared';
      return new UserError(`row ${record} has ${got} ${got === 1 ? 'field' : 'fields'} but the header has ${expectedFields}`, {
        ruleId: 'csv-field-count',
        file,
        // First extra field, or the end of a short row.
        place: locate(record, Math.min(got, expectedFields)),
        hint: guessed
          ? `fields were split at ${shown} (${delimiterSource === 'sniffed' ? 'guessed from the first lines' : 'from the file extension'}); if that is wrong, declare the delimiter of this dataset in the front matter, otherwise quote fields that contain ${shown}`
          : `quote fields that contain ${shown}, and give every row as many fields as the header`,
      });
    }
    case 'CSV_QUOTE_NOT_CLOSED':
      return new UserError('a quoted field opened here is never closed', {
        ruleId: 'csv-unclosed-quote',
        file,
        place: locate(record, field),
        hint: 'close the quote; inside a quoted field write a quote as two quotes ("")',
      });
    case 'INVALID_OPENING_QUOTE': {
      const start = locate(record, field);
      const before = state.field ?? '';
      const onlySpace = before.trim() === '';
      return new UserError('a quote in the middle of an unquoted field', {
        ruleId: 'csv-stray-quote',
        file,
        place: {line: start.line, column: start.column + before.length},
        hint: onlySpace
          ? `remove the space between ${shown} and the opening quote`
          : 'quote the whole field and double the quotes inside it, e.g. "5 ft 10"""',
      });
    }
    case 'CSV_INVALID_CLOSING_QUOTE':
      return new UserError('text follows the closing quote of a quoted field', {
        ruleId: 'csv-stray-quote',
        file,
        place: locate(record, field),
        hint: 'a quoted field ends at its closing quote; inside it, write a quote as two quotes ("")',
      });
    default:
      return new UserError(`cannot read ${file}: ${error.message}`, {
        ruleId: 'csv-malformed',
        file,
        place: {line: state.lines ?? 1, column: 1},
      });
  }
}
