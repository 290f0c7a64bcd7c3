import {UserError} from '../user-error.js';
import type {Column, NumericColumn, StringColumn} from './column.js';
import type {DatasetOptions} from './dataset-options.js';
import {exactOffsetDifference, parseDecimal} from './parse-decimal.js';
import type {CsvTable, RawColumn} from './read-csv.js';

type TypeOptions = Pick<DatasetOptions, 'file' | 'decimal' | 'missing' | 'types'>;

/**
 * Give every column its type. A column is numeric when each non-missing cell
 * is a decimal number under the dataset's decimal mark (surrounding spaces of
 * unquoted cells ignored); `types` forces a column either way, and a cell that
 * does not fit a forced `number` is an error at that cell. A column with no
 * non-missing cell is numeric (nothing contradicts it).
 */
export function inferTypes(table: CsvTable, options: TypeOptions): Column[] {
  const names = table.columns.map((c) => c.name);
  for (const name of Object.keys(options.types)) {
    if (!names.includes(name)) {
      throw new UserError(`types names a column "${name}" that ${options.file} does not have`, {
        ruleId: 'unknown-column',
        file: options.file,
        hint: `columns of ${options.file}: ${names.map((n) => JSON.stringify(n)).join(', ')}`,
      });
    }
  }
  const missing = new Set(options.missing);
  return table.columns.map((raw, k) => {
    const declared = Object.hasOwn(options.types, raw.name) ? options.types[raw.name] : undefined;
    if (declared === 'string') return toStringColumn(raw, missing);
    const numeric = toNumericColumn(raw, missing, options.decimal);
    if (numeric.kind === 'number') return numeric;
    if (declared === 'number') throw notANumber(raw, numeric.row, k, table, options);
    return toStringColumn(raw, missing);
  });
}

/** The text compared with missing markers and parsed as a number. */
function cellText(raw: RawColumn, row: number): string {
  const text = raw.cells[row] ?? '';
  return raw.quoted[row] === 1 ? text : text.trim();
}

function toNumericColumn(
  raw: RawColumn,
  missingMarkers: ReadonlySet<string>,
  decimal: '.' | ',',
): NumericColumn | {kind: 'failed'; row: number} {
  const n = raw.cells.length;
  const values = new Float64Array(n);
  const centred = new Float64Array(n);
  const missing = new Uint8Array(n);
  let offsetText: string | undefined;
  for (let row = 0; row < n; row++) {
    const text = cellText(raw, row);
    if (missingMarkers.has(text)) {
      values[row] = Number.NaN;
      centred[row] = Number.NaN;
      missing[row] = 1;
      continue;
    }
    const value = parseDecimal(text, decimal);
    if (value === undefined) return {kind: 'failed', row};
    values[row] = value;
    // Centred on the first value in exact decimal arithmetic (issue 3, "Numerical care").
    offsetText ??= text;
    centred[row] = exactOffsetDifference(text, offsetText, decimal);
  }
  const offset = offsetText === undefined ? 0 : parseDecimal(offsetText, decimal)!;
  return {kind: 'number', name: raw.name, values, missing, offset, centred};
}

function toStringColumn(raw: RawColumn, missingMarkers: ReadonlySet<string>): StringColumn {
  const values = raw.cells.map((text, row) => (missingMarkers.has(cellText(raw, row)) ? null : text));
  return {kind: 'string', name: raw.name, values};
}

function notANumber(raw: RawColumn, row: number, column: number, table: CsvTable, options: TypeOptions): UserError {
  const text = raw.cells[row] ?? '';
  const other = options.decimal === '.' ? ',' : '.';
  const hint =
    parseDecimal(cellText(raw, row), other) !== undefined
      ? `this reads as a number with decimal mark "${other}": set decimal: "${other}" for this dataset, or correct the cell`
      : `correct the cell, or add ${JSON.stringify(text)} to the dataset's missing markers if it means "no value"`;
  return new UserError(`column "${raw.name}" is declared number but row ${row + 1} has ${JSON.stringify(text)}`, {
    ruleId: 'data-not-a-number',
    file: options.file,
    place: table.locate(row, column),
    hint,
  });
}
