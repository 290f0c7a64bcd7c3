/**
 * The interface every statistical method implements, and the result record
 * every method returns (contract §6). Adding a method is one file exporting a
 * `MethodDefinition` plus its registration in `registry.ts`.
 */
export type Alternative = 'two-sided' | 'greater' | 'less';

/** How a method reads its data; the design stage prepares each shape. */
export type DesignKind = Design['kind'];

/** Numeric outcome, one group per level (or a single group `all`). */
export interface Sample {
  readonly label: string;
  readonly values: Float64Array;
  /**
   * Row-aligned with `values`: each value minus the column's first value,
   * subtracted exactly in decimal before rounding (`NumericColumn.centred`).
   * Shift-invariant statistics (SD, sums of squares) read it to keep digits
   * that rounding the text to doubles would lose; absent when the sample
   * was not read from decimal text (paired differences, tests).
   */
  readonly centred?: Float64Array;
}

export interface OneSampleDesign {
  readonly kind: 'one-sample';
  readonly sample: Sample;
}

export interface PairedDesign {
  readonly kind: 'paired';
  /** Condition measured first (`y[0]`) and second (`y[1]`), row-aligned. */
  readonly first: Sample;
  readonly second: Sample;
}

export interface TwoGroupDesign {
  readonly kind: 'two-group';
  /** Reference group (first level); estimates are `second - first`. */
  readonly first: Sample;
  readonly second: Sample;
}

export interface DescribeDesign {
  readonly kind: 'none';
  readonly samples: readonly Sample[];
}

/** Two or more independent groups of a numeric outcome, in level order. */
export interface KGroupDesign {
  readonly kind: 'k-group';
  readonly samples: readonly Sample[];
}

/**
 * A two-way table of counts: `counts[i][j]` rows with `y` at `rows[i]` and
 * `by` at `columns[j]`. Levels are in declared (or sorted) order.
 */
export interface ContingencyDesign {
  readonly kind: 'contingency';
  readonly rows: readonly string[];
  readonly columns: readonly string[];
  readonly counts: readonly (readonly number[])[];
  /** `success:` as declared (a level of `y`), for proportion tests. */
  readonly success: string | undefined;
}

/**
 * Paired categorical outcomes (McNemar): `table[i][j]` counts subjects at
 * `levels[i]` on the first measurement and `levels[j]` on the second.
 */
export interface PairedCategoricalDesign {
  readonly kind: 'paired-categorical';
  readonly first: string;
  readonly second: string;
  readonly levels: readonly [string, string];
  readonly table: readonly [readonly [number, number], readonly [number, number]];
}

/** Counts of one categorical column and, for goodness of fit, expected proportions. */
export interface CountsDesign {
  readonly kind: 'counts';
  readonly levels: readonly string[];
  readonly counts: readonly number[];
  /** Expected proportions per level (sum 1); undefined means equal. */
  readonly expected: readonly number[] | undefined;
}

/** Successes out of trials for one proportion. */
export interface ProportionDesign {
  readonly kind: 'proportion';
  readonly successes: number;
  readonly trials: number;
  /** The level of `y` counted as a success. */
  readonly success: string;
}

/** Numeric pairs (correlation) or predictors and an outcome (regression), row-aligned. */
export interface BivariateDesign {
  readonly kind: 'bivariate';
  /** One predictor for correlation; one or more for regression. */
  readonly x: readonly Sample[];
  readonly y: Sample;
}

export type Design =
  | OneSampleDesign
  | PairedDesign
  | TwoGroupDesign
  | DescribeDesign
  | KGroupDesign
  | ContingencyDesign
  | PairedCategoricalDesign
  | CountsDesign
  | ProportionDesign
  | BivariateDesign;

export interface MethodOptions {
  readonly alternative: Alternative;
  /** Confidence level of every interval, e.g. 0.95. */
  readonly confidence: number;
  readonly alpha: number;
  /** Null value (one-sample tests); 0 for differences. */
  readonly mu: number;
  /** Smallest effect of interest, in the outcome's units. */
  readonly smallestEffect: number | undefined;
  /** k-group tests: the post-hoc comparisons to run (`none` = skip). */
  readonly posthoc: 'tukey' | 'games-howell' | 'dunn' | 'none' | undefined;
  /** chi-square on a 2x2 table: `yates` applies Yates' continuity correction. */
  readonly correction: 'yates' | 'none';
  /** linear regression: fit an intercept (default true). */
  readonly intercept: boolean;
}

export interface Statistic {
  readonly name: string;
  readonly value: number;
}

export interface Estimate {
  /** What is estimated, e.g. `difference in means (B - A)`. */
  readonly name: string;
  readonly value: number;
  /** Interval at `level`; one bound is infinite for one-sided alternatives. */
  readonly ci: readonly [number, number];
  readonly level: number;
  readonly units?: string;
  /** k-group tests: the two groups the estimate compares, `[reference, other]` (estimate = other − reference). */
  readonly pair?: readonly [string, string];
}

export interface EffectSize {
  /** Stable id, e.g. `hedges-g`. */
  readonly name: string;
  readonly value: number;
  /** Null only where no deterministic interval is established (ε² of Kruskal–Wallis). */
  readonly ci: readonly [number, number] | null;
  /** What the difference was divided by, in words. */
  readonly standardizer?: string;
}

export interface Sensitivity {
  /** Power to detect the declared smallest effect at the block's alpha and n. */
  readonly power_at_smallest_effect: number | null;
  /** Smallest effect (outcome units) detectable with 80% power. */
  readonly min_detectable_effect_80: number;
}

export interface AssumptionCheck {
  readonly check: string;
  readonly group?: string;
  readonly statistic: number;
  readonly p: number;
}

/** One pairwise comparison after a k-group test. */
export interface PosthocComparison {
  readonly a: string;
  readonly b: string;
  /** Estimate of `b - a` (difference in means, or in mean ranks for Dunn). */
  readonly estimate: number;
  /** Simultaneous interval at the block's confidence; null where the method has none (Dunn). */
  readonly ci: readonly [number, number] | null;
  readonly statistic: number;
  readonly p_adjusted: number;
}

/**
 * A caveat a method attaches to its result. Methods return facts, not prose:
 * every phrase lives in `interpret/wording.ts` (`methodNote`).
 */
export type MethodNote =
  /** Group SDs differ by more than 2× under a test that assumes equal spreads. */
  | {readonly kind: 'spread-ratio'; readonly larger: string; readonly smaller: string; readonly ratio: number; readonly alternative: string}
  /** Expected counts below 5 (Cochran 1954); `alternative` is a method id, or absent: combine sparse levels. */
  | {readonly kind: 'small-expected'; readonly below: number; readonly cells: number; readonly smallest: number; readonly alternative?: string}
  /** Groups under 5 observations, where a chi-square approximation is rough. */
  | {readonly kind: 'small-groups'; readonly groups: readonly string[]}
  /** No interval for the estimate reaches the confidence level: its bounds are infinite. */
  | {readonly kind: 'unattainable-interval'; readonly confidence: number; readonly estimate: 'shift' | 'simultaneous shift' | 'median difference'; readonly pairs?: number; readonly between?: readonly [string, string]}
  /** Ties forced the normal approximation where the exact distribution would apply. */
  | {readonly kind: 'ties-approximation'; readonly tied: 'values' | 'differences' | 'zero differences'}
  /** Pairs whose difference equals mu, dropped from the test. */
  | {readonly kind: 'dropped-zeros'; readonly zeros: number; readonly pairs: number; readonly second: string; readonly first: string; readonly mu: number; readonly wilcoxon: boolean}
  /** Fewer than 5 successes or failures expected under the null. */
  | {readonly kind: 'few-expected'; readonly trials: number; readonly mu: number; readonly alternative: string}
  /** Groups with SD 0. */
  | {readonly kind: 'constant-groups'; readonly groups: readonly string[]}
  /** The smallest effect would take the second proportion outside [0, 1]. */
  | {readonly kind: 'smallest-effect-out-of-range'; readonly smallest: number; readonly bound: 0 | 1; readonly baseline: number}
  /** No attainable difference reaches 80% power. */
  | {readonly kind: 'no-sensitivity'; readonly baseline: number; readonly n1: number; readonly n2: number};

/** What a method computes; the block stage adds alpha, decision and words. */
export interface MethodOutcome {
  readonly statistic: Statistic;
  /** A number, `[df1, df2]` for F tests, or null. */
  readonly df: number | readonly [number, number] | null;
  readonly p: number;
  /** Absent only for diagnostics whose question has no estimate (normality). */
  readonly estimate?: Estimate;
  readonly effect?: EffectSize;
  readonly sensitivity?: Sensitivity;
  readonly assumptions?: readonly AssumptionCheck[];
  /** Caveats as data; `interpret/wording.ts` words them for sentences and JSON. */
  readonly warnings?: readonly MethodNote[];
  /** Which computation was used, in words: `exact`, `normal approximation with continuity correction`. */
  readonly variant?: string;
  readonly posthoc?: readonly PosthocComparison[];
  /**
   * Method-specific fields written at the top level of the block's JSON
   * (contract §6): `coefficients`, `r_squared`, `residual_sd`,
   * `anova_table`, `expected`, `observed`, …
   */
  readonly details?: Readonly<Record<string, unknown>>;
}

/**
 * The kind of question a method answers; it picks the family of sentence
 * templates (contract §7) the interpretation uses.
 */
export type Question = 'difference' | 'association' | 'independence' | 'proportion' | 'fit' | 'equivalence' | 'diagnostic';

export interface MethodDefinition<D extends Design = Design> {
  /** Method id as written in a block (`welch-t`). */
  readonly id: string;
  /** Name used in sentences (`Welch's t test`). */
  readonly title: string;
  readonly design: D['kind'];
  /** The kind of question the method answers (default `difference`). */
  readonly question?: Question;
  /** Whether the block must declare `mu`. */
  readonly needsMu?: boolean;
  /** Whether the block must declare `success` (a level of y). */
  readonly needsSuccess?: boolean;
  /** Whether the block must declare `smallest-effect` (equivalence). */
  readonly needsSmallestEffect?: boolean;
  /**
   * Validate and compute. Data that make the method impossible (a constant
   * sample, an empty table row) throw a `MethodError` with a message an
   * author can act on; the block stage positions it.
   */
  compute(design: D, options: MethodOptions): MethodOutcome;
}
