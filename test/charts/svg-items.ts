/**
 * Test-only readers of rendered chart SVG: the drawn items of a named
 * vega-lite layer, and the ids of the document.
 */

/** Items of the named layer (dashes become underscores): one `<path>` or `<line>` (rules) each, or `<text>`. */
export function items(svg: string, layer: string, tag: 'path|line' | 'text' = 'path|line'): string[] {
  layer = layer.replace(/-/g, '_');
  const groups = [...svg.matchAll(new RegExp(`<g class="mark-[a-z]+ role-mark ${layer}_marks"[^>]*?(/?)>(.*?)</g>`, 'g'))];
  // An empty layer is a self-closed <g/>: it has no items.
  return groups.flatMap((g) => (g[1] ? [] : [...(g[2] ?? '').matchAll(new RegExp(`<(?:${tag}) [^>]*>`, 'g'))].map((m) => m[0])));
}

/** Every `id="…"` in the SVG. */
export function ids(svg: string): string[] {
  return [...svg.matchAll(/\sid="([^"]*)"/g)].map((m) => m[1] ?? '');
}

/** The layer's data rows as the spec carries them (for checking drawn numbers). */
export function layerValues(spec: unknown, layer: string): Record<string, unknown>[] {
  const found: Record<string, unknown>[][] = [];
  const walk = (node: unknown, inherited: unknown): void => {
    if (!node || typeof node !== 'object') return;
    const n = node as {name?: string; data?: {values?: Record<string, unknown>[]}; layer?: unknown[]; hconcat?: unknown[]};
    const data = n.data?.values ?? inherited;
    if (n.name === layer) found.push(data as Record<string, unknown>[]);
    for (const child of [...(n.layer ?? []), ...(n.hconcat ?? [])]) walk(child, data);
  };
  walk(spec, undefined);
  if (found.length !== 1) throw new Error(`layerValues: ${found.length} layers named ${layer}`);
  return found[0]!;
}
