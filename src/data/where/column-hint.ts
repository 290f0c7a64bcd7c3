import type {Dataset, StringColumn} from '../column.js';
import {parseDecimal} from '../parse-decimal.js';

const PLAIN_NAME = /^[a-zA-Z_][a-zA-Z0-9_.]*$/;
const KEYWORDS = new Set(['and', 'or', 'not', 'in', 'true', 'false']);
const LISTED = 30;

/** A column name as it must be written in a where expression. */
export function writtenName(name: string): string {
  return PLAIN_NAME.test(name) && !KEYWORDS.has(name) ? name : `\`${name.replaceAll('`', '``')}\``;
}

/** Hint for an unknown column: the closest name, then the columns there are. */
export function unknownColumnHint(name: string, dataset: Dataset): string {
  const names = [...dataset.columns.keys()];
  const listed = names.slice(0, LISTED).map(writtenName).join(', ') + (names.length > LISTED ? ', …' : '');
  const close = closestName(name, names);
  const guess = close === undefined ? '' : `did you mean ${writtenName(close)}? `;
  return `${guess}columns of ${dataset.file}: ${listed}`;
}

/**
 * Why a column that looks numeric is text: its first cell that is not a
 * number. Undefined when no cell is a number (the column is plainly text).
 */
export function whyText(column: StringColumn): string | undefined {
  let firstNumber: number | undefined;
  let firstOther: number | undefined;
  let firstNotDot: number | undefined;
  for (const [row, cell] of column.values.entries()) {
    if (cell === null) continue;
    const text = cell.trim();
    const dot = parseDecimal(text, '.') !== undefined;
    const comma = parseDecimal(text, ',') !== undefined;
    if (dot || comma) firstNumber ??= row;
    if (!dot && !comma) firstOther ??= row;
    if (!dot) firstNotDot ??= row;
  }
  if (firstNumber === undefined) return undefined;
  const row = firstOther ?? firstNotDot;
  if (row === undefined) return 'it is text because the dataset declares it string';
  return `it is text because row ${row + 1} has ${JSON.stringify(column.values[row])}`;
}

/** Same name up to case and surrounding spaces, else within two edits; undefined if nothing is that close. */
function closestName(name: string, names: readonly string[]): string | undefined {
  const loose = (s: string): string => s.trim().toLowerCase();
  const same = names.find((n) => loose(n) === loose(name));
  if (same !== undefined) return same;
  let best: string | undefined;
  let bestDistance = 3;
  for (const candidate of names) {
    const d = editDistance(loose(name), loose(candidate));
    // Fewer edits than the name has characters: `x` is not a typo of `y`.
    if (d < bestDistance && d < name.length) [best, bestDistance] = [candidate, d];
  }
  return best;
}

/** Levenshtein distance, two rows (Wagner & Fischer 1974). */
function editDistance(a: string, b: string): number {
  let previous = Array.from({length: b.length + 1}, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const substitution = (previous[j - 1] ?? 0) + (a[i - 1] === b[j - 1] ? 0 : 1);
      current[j] = Math.min((previous[j] ?? 0) + 1, (current[j - 1] ?? 0) + 1, substitution);
    }
    previous = current;
  }
  return previous[b.length] ?? 0;
}
