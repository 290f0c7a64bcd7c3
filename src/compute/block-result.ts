import type {
  Alternative,
  AssumptionCheck,
  EffectSize,
  Estimate,
  PosthocComparison,
  Sensitivity,
  Statistic,
} from '../methods/types.js';
import type {Summary} from '../methods/shared/summarize.js';

/** Rows of the dataset and why some were not used (contract §6 `rows`). */
export interface RowAccount {
  readonly used: number;
  readonly excluded_missing: number;
  readonly excluded_filter: number;
  /** Rows in levels of `by` that the block's `levels` left out. */
  readonly excluded_levels: number;
}

/**
 * One block's result record: contract §6, numbers unrounded. Method-specific
 * fields (`coefficients`, `anova_table`, `expected`, …) sit beside these.
 */
export interface BlockResult {
  readonly method: string;
  /** The test's name as used in sentences. */
  readonly title: string;
  readonly data: string;
  readonly n: number;
  readonly groups: Readonly<Record<string, Summary>>;
  readonly statistic?: Statistic;
  readonly df?: number | readonly [number, number] | null;
  readonly p?: number;
  readonly p_adjusted?: number | null;
  readonly alpha?: number;
  readonly alternative?: Alternative;
  readonly decision?: 'reject' | 'fail-to-reject';
  readonly estimate?: Estimate;
  readonly effect?: EffectSize;
  readonly sensitivity?: Sensitivity;
  readonly smallest_effect?: number | null;
  readonly family?: {readonly name: string; readonly adjust: string; readonly size: number} | null;
  readonly assumptions: readonly AssumptionCheck[];
  readonly posthoc?: readonly PosthocComparison[];
  /** Which computation gave p: `exact`, `normal approximation …`. */
  readonly variant?: string;
  /** Why `test: auto` chose this method. */
  readonly auto?: {readonly reason: string};
  readonly sentence: string;
  readonly warnings: readonly string[];
  readonly rows: RowAccount;
  /** Distinct specifications of this block the ledger has seen, this one included. */
  readonly specifications_evaluated?: number;
  /** Against `stet.lock`; absent when the report has no lock. */
  readonly plan?: 'confirmatory' | 'exploratory';
}
