/**
 * The one representation of a loaded column. Numeric columns are typed arrays
 * from the start, read twice from the text: as the nearest doubles, and
 * exactly centred on their first value.
 */
export interface NumericColumn {
  readonly kind: 'number';
  readonly name: string;
  /** Parsed values; NaN where `missing[i] === 1`. */
  readonly values: Float64Array;
  /** 1 where the cell was empty or one of the dataset's missing markers. */
  readonly missing: Uint8Array;
  /** The first non-missing value (0 when there is none): the centre of `centred`. */
  readonly offset: number;
  /**
   * Cell minus the first non-missing cell, subtracted exactly in decimal and
   * then rounded once (NaN where missing). Shift-invariant statistics use it:
   * `1000000000000.4` has no exact double, its difference from
   * `1000000000000.3` does (`exactOffsetDifference`).
   */
  readonly centred: Float64Array;
}

export interface StringColumn {
  readonly kind: 'string';
  readonly name: string;
  /** Cell text; null where missing. */
  readonly values: ReadonlyArray<string | null>;
}

export type Column = NumericColumn | StringColumn;

export interface Dataset {
  /** Name from the front matter, or the relative path for inline `data:` paths. */
  readonly name: string;
  /** Path as written by the author (relative to the document). */
  readonly file: string;
  /** Absolute path on disk. */
  readonly absolutePath: string;
  /** sha256 of the file's bytes, hex. */
  readonly sha256: string;
  readonly rowCount: number;
  /** Columns in file order. */
  readonly columns: ReadonlyMap<string, Column>;
  /** Units per column, from the front matter. */
  readonly units: Readonly<Record<string, string>>;
  /** Names per column for sentences and axes, from the front matter. */
  readonly labels: Readonly<Record<string, string>>;
}

export function isNumericColumn(column: Column): column is NumericColumn {
  return column.kind === 'number';
}

export function isMissing(column: Column, row: number): boolean {
  return column.kind === 'number' ? column.missing[row] === 1 : column.values[row] === null;
}
