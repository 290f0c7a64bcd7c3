import type {TopLevelSpec} from 'vega-lite';
import {formatFixed, recordedDecimals} from '../interpret/format-number.js';
import {chartWords} from '../interpret/wording.js';

/** A chart before rendering: its vega-lite spec and its accessible name and description. */
export interface ChartDraft {
  readonly spec: TopLevelSpec;
  /** Short name; the SVG `<title>`. */
  readonly title: string;
  /** What the chart shows, with its numbers; the SVG `<desc>` and the image's alt text. */
  readonly description: string;
}

/** An axis title with its units: `Compressive strength (MPa)`. */
export function withUnits(title: string, units: string | undefined): string {
  return units ? `${title} (${units})` : title;
}

/** A number with its units, as a screen reader should hear it: `31.2 MPa`. */
export function quantity(value: number, decimals: number, units: string | undefined): string {
  return units ? `${formatFixed(value, decimals)} ${units}` : formatFixed(value, decimals);
}

/** Decimals for summaries of recorded values: one more than the data carry, at most 4. */
export function summaryDecimals(values: ArrayLike<number>): number {
  return Math.min(4, recordedDecimals(values) + 1);
}

/** `95%` from 0.95, without float noise (0.9 → `90%`, 0.999 → `99.9%`). */
export function levelText(confidence: number): string {
  return `${Number((confidence * 100).toPrecision(6))}%`;
}

/** `95% CI 30.1 to 32.3`; an infinite bound (one-sided interval) is said as such. */
export function intervalText(ci: readonly [number, number], decimals: number, confidence: number): string {
  const [lo, hi] = ci;
  const level = levelText(confidence);
  if (lo === -Infinity) return chartWords.upperBound(level, formatFixed(hi, decimals));
  if (hi === Infinity) return chartWords.lowerBound(level, formatFixed(lo, decimals));
  return chartWords.interval(level, formatFixed(lo, decimals), formatFixed(hi, decimals));
}
