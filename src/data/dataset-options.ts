/**
 * The normalized options of one dataset (contract §2). The front-matter
 * parser turns what the author wrote (a bare path, or the long form) into this
 * shape; the data stage only ever sees the normalized form.
 */
export interface DatasetOptions {
  /** Path as written by the author, relative to the document. */
  file: string;
  /**
   * One character. Default (undefined): `\t` for `.tsv`/`.tab`, `,` for
   * `.csv` (unless `decimal` is `,` or the header has no comma), else sniffed
   * from the first lines; see `resolveDelimiter`.
   */
  delimiter?: string;
  /** Decimal mark of numeric cells. Default `.`. */
  decimal: '.' | ',';
  /** Cell texts that mean "missing", compared after trimming unquoted cells. Default `["", "NA"]`. */
  missing: string[];
  /** Per-column type overrides; other columns are inferred. Default `{}`. */
  types: Record<string, 'number' | 'string'>;
  /** Per-column units, shown beside estimates. Default `{}`. */
  units: Record<string, string>;
  /** Per-column names for sentences and axes (`strength_mpa: compressive strength`). Default `{}`. */
  labels: Record<string, string>;
}

export const DEFAULT_MISSING: readonly string[] = Object.freeze(['', 'NA']);

export function defaultDatasetOptions(file: string): DatasetOptions {
  return {file, decimal: '.', missing: [...DEFAULT_MISSING], types: {}, units: {}, labels: {}};
}

/**
 * Spellings of a delimiter an author may reasonably write in YAML: a single
 * character, the two characters `\t` (single-quoted YAML keeps the backslash),
 * or a name. Returns undefined for anything else, so the caller can report it.
 */
export function normalizeDelimiter(written: string): string | undefined {
  const named = new Map([
    ['\\t', '\t'], ['tab', '\t'], ['comma', ','], ['semicolon', ';'], ['pipe', '|'], ['space', ' '],
  ]);
  const alias = named.get(written.toLowerCase());
  if (alias !== undefined) return alias;
  if ([...written].length !== 1 || written === '"' || written === '\n' || written === '\r') return undefined;
  return written;
}
