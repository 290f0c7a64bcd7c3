import type {BlockResult} from '../compute/block-result.js';

/**
 * `tables/ID.csv`: every number of a block's result as one tidy long table,
 * for further work in a spreadsheet or another statistics program.
 *
 * Columns (always these, in this order):
 *   block, section, item, level, other_level, quantity, value
 *
 * - `section`: group · test · estimate · effect · sensitivity · posthoc ·
 *   assumption · rows · detail (method-specific numbers: ANOVA table,
 *   coefficients, observed counts, …, `quantity` holding their JSON path;
 *   a coefficient's term in `item`, its path without the index).
 * - `value` is always a number, unrounded: JavaScript's shortest text that
 *   reads back to the same double (the JSON's number exactly); `Inf`/`-Inf`
 *   for the open bound of a one-sided interval; empty where JSON has null.
 *   Words (method, decision, sentence) live in `NAME.results.json`.
 * - RFC 4180: comma separated, CRLF line ends, a header row, fields with a
 *   comma, quote or line break quoted with quotes doubled.
 */
export const csvColumns = ['block', 'section', 'item', 'level', 'other_level', 'quantity', 'value'] as const;

type Row = readonly [section: string, item: string, level: string, otherLevel: string, quantity: string, value: number | null];

/** Fields the tidy sections already cover; anything else is a `detail`. */
const covered = new Set([
  'method', 'title', 'data', 'n', 'groups', 'statistic', 'df', 'p', 'p_adjusted', 'alpha', 'alternative', 'decision',
  'estimate', 'effect', 'sensitivity', 'smallest_effect', 'family', 'assumptions', 'posthoc', 'variant', 'auto',
  'sentence', 'warnings', 'rows',
]);

export function tableCsv(id: string, result: BlockResult): string {
  const rows: Row[] = [];
  const add = (section: string, item: string, level: string, other: string, quantity: string, value: number | null | undefined) => {
    if (value !== undefined) rows.push([section, item, level, other, quantity, value]);
  };
  add('rows', '', '', '', 'n', result.n);
  for (const [level, g] of Object.entries(result.groups)) {
    for (const [quantity, value] of Object.entries(g)) add('group', '', level, '', quantity, value as number);
  }
  if (result.statistic) add('test', result.statistic.name, '', '', 'statistic', result.statistic.value);
  if (typeof result.df === 'number') add('test', '', '', '', 'df', result.df);
  else if (result.df) result.df.forEach((df, i) => add('test', '', '', '', `df${i + 1}`, df));
  add('test', '', '', '', 'p', result.p);
  if (result.p !== undefined) add('test', result.family?.adjust ?? '', '', '', 'p_adjusted', result.p_adjusted ?? null);
  add('test', '', '', '', 'alpha', result.alpha);
  if (result.smallest_effect != null) add('test', '', '', '', 'smallest_effect', result.smallest_effect);
  if (result.estimate) {
    const {name, value, ci, level} = result.estimate;
    interval('estimate', name, value, ci, add);
    add('estimate', name, '', '', 'level', level);
  }
  if (result.effect) interval('effect', result.effect.name, result.effect.value, result.effect.ci, add);
  for (const [quantity, value] of Object.entries(result.sensitivity ?? {})) add('sensitivity', '', '', '', quantity, value);
  for (const c of result.posthoc ?? []) {
    add('posthoc', '', c.a, c.b, 'estimate', c.estimate);
    add('posthoc', '', c.a, c.b, 'ci_lower', c.ci?.[0] ?? null);
    add('posthoc', '', c.a, c.b, 'ci_upper', c.ci?.[1] ?? null);
    add('posthoc', '', c.a, c.b, 'statistic', c.statistic);
    add('posthoc', '', c.a, c.b, 'p_adjusted', c.p_adjusted);
  }
  for (const a of result.assumptions) {
    add('assumption', a.check, a.group ?? '', '', 'statistic', a.statistic);
    add('assumption', a.check, a.group ?? '', '', 'p', a.p);
  }
  for (const [quantity, value] of Object.entries(result.rows)) add('rows', '', '', '', quantity, value);
  for (const [key, value] of Object.entries(result)) {
    if (covered.has(key)) continue;
    if (Array.isArray(value) && value.every(isTerm)) {
      // Regression coefficients: one row per term and number, named by the term.
      for (const row of value) numericLeaves(row, key, (quantity, v) => add('detail', row.term, '', '', quantity, v));
    } else {
      numericLeaves(value, key, (quantity, v) => add('detail', '', '', '', quantity, v));
    }
  }
  const lines = [csvColumns, ...rows.map(([section, item, level, other, quantity, value]) => [id, section, item, level, other, quantity, csvNumber(value)])];
  return lines.map((line) => line.map(csvField).join(',')).join('\r\n') + '\r\n';
}

function interval(
  section: string,
  name: string,
  value: number,
  ci: readonly [number, number] | null,
  add: (section: string, item: string, level: string, other: string, quantity: string, value: number | null) => void,
): void {
  add(section, name, '', '', 'value', value);
  add(section, name, '', '', 'ci_lower', ci?.[0] ?? null);
  add(section, name, '', '', 'ci_upper', ci?.[1] ?? null);
}

function isTerm(value: unknown): value is {term: string} {
  return value !== null && typeof value === 'object' && typeof (value as {term?: unknown}).term === 'string';
}

/** Every number under `value`, with its dotted JSON path (`anova_table.between.ss`). */
function numericLeaves(value: unknown, path: string, emit: (path: string, value: number) => void): void {
  if (typeof value === 'number') emit(path, value);
  else if (Array.isArray(value)) value.forEach((item, i) => numericLeaves(item, `${path}.${i}`, emit));
  else if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) numericLeaves(item, `${path}.${key}`, emit);
  }
}

/** Shortest round-trip text of a double; R and pandas read `Inf`, `-Inf` and `NaN`. */
export function csvNumber(value: number | null): string {
  if (value === null) return '';
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? 'Inf' : '-Inf';
  return String(value);
}

/** RFC 4180 §2.6–2.7: quote a field holding a comma, quote or line break. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}
