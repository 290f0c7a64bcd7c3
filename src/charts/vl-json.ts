/**
 * A vega-lite spec as the text of `charts/ID.vl.json`: two-space JSON with
 * every object's keys sorted, so the same chart is the same file whatever
 * order the code built it in, and a diff shows only what changed.
 */
export function vlJson(spec: unknown): string {
  return `${JSON.stringify(sortKeys(spec), null, 2)}\n`;
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value === null || typeof value !== 'object') return value;
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return Object.fromEntries(entries.map(([k, v]) => [k, sortKeys(v)]));
}
