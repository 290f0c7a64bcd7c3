/**
 * Renders a vega-lite spec to a standalone, accessible, reproducible SVG.
 *
 *   spec ─ vl.compile(theme, logger) ─ vega.parse ─ View(renderer none,
 *   loader that refuses everything) ─ toSVG ─ accessible root + prefixed ids
 *
 * Same spec, same bytes: text is measured with a fixed table
 * (text-metrics.ts), vega's process-wide clip/gradient counters are reset
 * before each render (vega/vega#2573), and nothing reads the clock.
 */
import * as vega from 'vega';
import * as vl from 'vega-lite';
import type {TopLevelSpec} from 'vega-lite';
import {installTextMetrics} from './text-metrics.js';
import {stetConfig} from './theme.js';

export interface RenderSvgOptions {
  /** Short accessible name of the chart; becomes the SVG `<title>`. */
  readonly title: string;
  /** Text alternative saying what the chart shows; becomes `<desc>`. */
  readonly description: string;
  /**
   * Prefix for every element id in the SVG, unique among the charts of one
   * page (e.g. the block id), so inlined charts never share an id. Must match
   * `[A-Za-z][A-Za-z0-9_-]*`.
   */
  readonly idPrefix: string;
}

export interface RenderedSvg {
  readonly svg: string;
  /** vega-lite and vega warnings, in the order they were raised. */
  readonly warnings: readonly string[];
}

/** The shape vega-util's logger has; vega and vega-lite accept any such object. */
interface CollectingLogger {
  level(_?: number): number | CollectingLogger;
  error(...args: unknown[]): CollectingLogger;
  warn(...args: unknown[]): CollectingLogger;
  info(...args: unknown[]): CollectingLogger;
  debug(...args: unknown[]): CollectingLogger;
}

function collectingLogger(warnings: string[], errors: string[]): CollectingLogger {
  const text = (args: unknown[]): string =>
    args.map((a) => (a instanceof Error ? a.message : String(a))).join(' ');
  let level = vega.Warn;
  const logger: CollectingLogger = {
    level(_?: number) {
      if (_ === undefined) return level;
      level = _;
      return logger;
    },
    error: (...args) => (errors.push(text(args)), logger),
    warn: (...args) => (warnings.push(text(args)), logger),
    info: () => logger,
    debug: () => logger,
  };
  return logger;
}

/**
 * Charts carry their data inline; a spec that asks for a URL or file is a
 * bug, never a feature. vega only logs a failed load as a warning, so the
 * refusals are also noted in `refused` for the renderer to throw on.
 */
function refusingLoader(refused: string[]): vega.Loader {
  const refuse = (uri: unknown): Promise<never> => {
    refused.push(String(uri));
    return Promise.reject(new Error(`stet charts use inline data only; refused to load ${String(uri)}`));
  };
  return {load: refuse, sanitize: refuse, http: refuse, file: refuse};
}

const idPrefixPattern = /^[A-Za-z][A-Za-z0-9_-]*$/;

/** Renders `spec` with stet's theme (the spec's own `config` wins where both set a value). */
export async function renderSvg(spec: TopLevelSpec, options: RenderSvgOptions): Promise<RenderedSvg> {
  if (!idPrefixPattern.test(options.idPrefix)) {
    throw new Error(`renderSvg: idPrefix must match ${String(idPrefixPattern)}, got ${JSON.stringify(options.idPrefix)}`);
  }
  const warnings: string[] = [];
  const errors: string[] = [];
  const refused: string[] = [];
  const logger = collectingLogger(warnings, errors);

  // 1. Compile to vega with the theme.
  installTextMetrics();
  const compiled = vl.compile(spec, {config: stetConfig, logger}).spec;

  // 2. Render with fresh def ids and no way to reach files or the network.
  vega.resetSVGDefIds();
  const view = new vega.View(vega.parse(compiled), {renderer: 'none', loader: refusingLoader(refused), logger});
  let raw: string;
  try {
    raw = await view.toSVG();
  } finally {
    view.finalize();
  }
  if (refused.length > 0) throw new Error(`renderSvg: the spec asks to load ${refused.join(', ')}; charts must carry their data inline`);
  if (errors.length > 0) throw new Error(`renderSvg: vega failed: ${errors.join('; ')}`);

  // 3. Make it accessible and safe to inline beside other charts.
  return {svg: makeAccessible(prefixIds(raw, options.idPrefix), options), warnings};
}

/** Rewrites `id`, `url(#…)` and `href="#…"` inside tags only; text content is left alone. */
export function prefixIds(svg: string, prefix: string): string {
  return svg.replace(/<[^>]+>/g, (tag) =>
    tag
      .replace(/(\sid=")([^"]*)"/g, `$1${prefix}-$2"`)
      .replace(/url\(#([^)]*)\)/g, `url(#${prefix}-$1)`)
      .replace(/(href=")#([^"]*)"/g, `$1#${prefix}-$2"`),
  );
}

/** Escapes text for XML content and attribute values. */
export function escapeXml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/**
 * Gives the root `role="img"`, named by a `<title>` and described by a `<desc>`
 * placed as its first children (SVG Accessibility API Mappings 1.0, §5.1; the
 * explicit aria references help screen readers that ignore `<title>` on
 * inline SVG). vega's own root ARIA attributes are dropped.
 */
function makeAccessible(svg: string, options: RenderSvgOptions): string {
  const root = /^<svg\b[^>]*>/.exec(svg);
  if (!root) throw new Error('renderSvg: vega output does not start with <svg>');
  const titleId = `${options.idPrefix}-title`;
  const descId = `${options.idPrefix}-desc`;
  const open = root[0]
    .replace(/\s(?:role|aria-[a-z]+)="[^"]*"/g, '')
    .replace(/>$/, ` role="img" aria-labelledby="${titleId}" aria-describedby="${descId}">`);
  const head =
    `<title id="${titleId}">${escapeXml(options.title)}</title>` +
    `<desc id="${descId}">${escapeXml(options.description)}</desc>`;
  return open + head + svg.slice(root[0].length);
}
