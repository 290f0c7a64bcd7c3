/**
 * Figure and table numbers, given in document order as blocks are
 * replaced: a block's chart is one figure, its results tables one table.
 * Cross-references (`{{fig:ID}}`, `{{tab:ID}}`) and the LaTeX labels read
 * the same numbers.
 */
export interface FloatNumbers {
  readonly figures: ReadonlyMap<string, number>;
  readonly tables: ReadonlyMap<string, number>;
}

export interface FloatCounter extends FloatNumbers {
  /** The number of block `id`'s figure (given on first call). */
  figure(id: string): number;
  table(id: string): number;
}

export function createFloatCounter(): FloatCounter {
  const figures = new Map<string, number>();
  const tables = new Map<string, number>();
  const next = (map: Map<string, number>, id: string) => {
    const known = map.get(id);
    if (known !== undefined) return known;
    map.set(id, map.size + 1);
    return map.size;
  };
  return {figures, tables, figure: (id) => next(figures, id), table: (id) => next(tables, id)};
}
