import type {StyleName} from '../interpret/number-style.js';
import type {Alternative} from '../methods/types.js';
import type {Place} from '../user-error.js';

/**
 * A block after validation: defaults filled from the document, every key
 * checked. Later stages only ever see this form.
 */
export const chartKinds = ['auto', 'box', 'strip', 'histogram', 'qq', 'scatter', 'bar', 'none'] as const;
export type ChartKind = (typeof chartKinds)[number];
export const showParts = ['sentence', 'table', 'chart'] as const;
export type ShowPart = (typeof showParts)[number];

export interface BlockSpec {
  readonly id: string;
  /** Method id, or `describe`. */
  readonly method: string;
  /** Dataset name (front matter) or a path relative to the report. */
  readonly data: string;
  readonly where: {readonly source: string; readonly place: Place} | undefined;
  /** Outcome column; two columns for wide paired designs. */
  readonly y: string | readonly [string, string];
  readonly by: string | undefined;
  readonly levels: readonly string[] | undefined;
  /** Predictor column(s): one for correlation, one or more for regression. */
  readonly x: readonly string[] | undefined;
  readonly mu: number | undefined;
  /** The level of `y` counted as a success (proportion tests). */
  readonly success: string | undefined;
  /** Expected proportions per level of `y` (goodness of fit). */
  readonly expected: Readonly<Record<string, number>> | undefined;
  readonly posthoc: 'tukey' | 'games-howell' | 'dunn' | 'none' | undefined;
  /** Continuity correction of a 2x2 chi-square test. */
  readonly correction: 'yates' | 'none';
  /** Fit an intercept in linear regression. */
  readonly intercept: boolean;
  readonly alternative: Alternative;
  readonly alpha: number;
  readonly confidence: number;
  readonly family: string | undefined;
  readonly smallestEffect: number | undefined;
  readonly chart: ChartKind;
  readonly show: ReadonlySet<ShowPart>;
  readonly caption: string | undefined;
  /** Number conventions of the document (`style:`); default `science`. */
  readonly style?: StyleName;
  /** Where the block's fence starts. */
  readonly place: Place;
  /** Where each key was written, for errors found in later stages. */
  readonly keyPlaces: Readonly<Record<string, Place>>;
}

/** Report position of `key`, falling back to the block itself. */
export function placeOfKey(spec: BlockSpec, key: string): Place {
  return spec.keyPlaces[key] ?? spec.place;
}
