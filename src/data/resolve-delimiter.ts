import {extname} from 'node:path';
import {UserError} from '../user-error.js';
import {normalizeDelimiter} from './dataset-options.js';
import {sniffDelimiter} from './sniff-delimiter.js';

/** Where the delimiter came from; error hints differ (a guess can be overridden). */
export type DelimiterSource = 'declared' | 'extension' | 'sniffed';

export interface ResolvedDelimiter {
  readonly delimiter: string;
  readonly source: DelimiterSource;
}

/**
 * The delimiter of a dataset (contract §2: declared, else from the
 * extension, else sniffed). Two refinements keep the extension from silently
 * producing a one-column table: a `.csv` with decimal `,` is sniffed
 * (spreadsheets in comma-decimal locales write `;` into `.csv` files), and a
 * `.csv` with decimal `.` keeps the comma unless the sniffer settles on
 * another delimiter that splits every sampled record alike (it prefers the
 * comma on a tie, so this only happens when the comma fits worse).
 */
export function resolveDelimiter(
  file: string,
  text: string,
  declared: string | undefined,
  decimal: '.' | ',',
): ResolvedDelimiter {
  if (declared !== undefined) {
    const delimiter = normalizeDelimiter(declared);
    if (delimiter === undefined) {
      throw new UserError(`delimiter ${JSON.stringify(declared)} of ${file} is not a single character`, {
        ruleId: 'invalid-delimiter',
        file,
        hint: 'write one character, e.g. delimiter: ";" or delimiter: "\\t" (a tab); "tab", "comma", "semicolon" and "pipe" are accepted too',
      });
    }
    if (delimiter === ',' && decimal === ',') {
      throw new UserError(`${file} declares both delimiter and decimal mark as ","`, {
        ruleId: 'invalid-delimiter',
        file,
        hint: 'files with decimal commas usually separate fields with ";": set delimiter: ";"',
      });
    }
    return {delimiter, source: 'declared'};
  }
  const extension = extname(file).toLowerCase();
  if (extension === '.tsv' || extension === '.tab') return {delimiter: '\t', source: 'extension'};
  const sniffed = sniffDelimiter(text, decimal);
  if (extension === '.csv' && decimal === '.' && !(sniffed.consistent && sniffed.delimiter !== ',')) {
    return {delimiter: ',', source: 'extension'};
  }
  return {delimiter: sniffed.delimiter, source: 'sniffed'};
}

