import {plainText} from '../interpret/symbol-marks.js';
import {renderSvg} from './render-svg.js';
import type {ChartDraft} from './chart-draft.js';
import {stetConfig} from './theme.js';
import {vlJson} from './vl-json.js';

/** A rendered chart: what the document and the `charts/` folder need. */
export interface RenderedChart {
  readonly svg: string;
  /** The text alternative (the SVG's `<desc>`). */
  readonly alt: string;
  /** The vega-lite spec with stet's theme folded in, as written to `.vl.json`. */
  readonly vlSpec: string;
}

/** Renders a draft; `idPrefix` keeps its element ids apart from other charts on the page. */
export async function renderDraft(draft: ChartDraft, idPrefix: string): Promise<RenderedChart> {
  // Chart text is plain: numbers formatted for sentences carry symbol marks (symbol-marks.ts).
  const title = plainText(draft.title);
  const description = plainText(draft.description);
  const rendered = await renderSvg(draft.spec, {title, description, idPrefix});
  // The written spec carries the theme, so restyling it starts from what the report shows.
  const {config, ...rest} = draft.spec as {config?: Record<string, unknown>};
  const themed = {...rest, config: mergeConfig(stetConfig as Record<string, unknown>, config ?? {})};
  return {svg: rendered.svg, alt: description, vlSpec: vlJson(themed)};
}

/** Deep merge of plain objects; `over` wins, arrays are replaced whole (vega-lite's own rule). */
function mergeConfig(base: Record<string, unknown>, over: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {...base};
  for (const [key, value] of Object.entries(over)) {
    const prior = out[key];
    out[key] = isPlain(prior) && isPlain(value) ? mergeConfig(prior, value) : value;
  }
  return out;
}

function isPlain(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}
