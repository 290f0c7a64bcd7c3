/**
 * The interface every statistical method implements, and the result record
 * every method returns (contract §6). Adding a method is one file exporting a
 * `MethodDefinition` plus its registration in `registry.ts`.
 */
export type Alternative = 'two-sided' | 'greater' | 'less';

/** How a method reads its data; the design stage prepares each shape. */
export type DesignKind = 'none' | 'one-sample' | 'paired' | 'two-group';

/** Numeric outcome, one group per level (or a single group `all`). */
export interface Sample {
  readonly label: string;
  readonly values: Float64Array;
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

export type Design = OneSampleDesign | PairedDesign | TwoGroupDesign | DescribeDesign;

export interface MethodOptions {
  readonly alternative: Alternative;
  /** Confidence level of every interval, e.g. 0.95. */
  readonly confidence: number;
  readonly alpha: number;
  /** Null value (one-sample tests); 0 for differences. */
  readonly mu: number;
  /** Smallest effect of interest, in the outcome's units. */
  readonly smallestEffect: number | undefined;
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
}

export interface EffectSize {
  /** Stable id, e.g. `hedges-g`. */
  readonly name: string;
  readonly value: number;
  readonly ci: readonly [number, number];
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

/** What a method computes; the block stage adds alpha, decision and words. */
export interface MethodOutcome {
  readonly statistic: Statistic;
  /** A number, `[df1, df2]` for F tests, or null. */
  readonly df: number | readonly [number, number] | null;
  readonly p: number;
  readonly estimate: Estimate;
  readonly effect: EffectSize;
  readonly sensitivity?: Sensitivity;
  readonly assumptions?: readonly AssumptionCheck[];
  readonly warnings?: readonly string[];
}

export interface MethodDefinition<D extends Design = Design> {
  /** Method id as written in a block (`welch-t`). */
  readonly id: string;
  /** Name used in sentences (`Welch's t test`). */
  readonly title: string;
  readonly design: D['kind'];
  /** Whether the block must declare `mu`. */
  readonly needsMu?: boolean;
  compute(design: D, options: MethodOptions): MethodOutcome;
}
