/**
 * The machinery shared by the sequential adjustments: sort the p-values,
 * multiply the one of rank j (1 = smallest) by a method's factor, enforce
 * monotonicity across ranks, cap at 1 and return in the input order.
 *
 * - `down` (step-down, Holm): running maximum from the smallest p upwards.
 * - `up` (step-up, Hochberg, BH, BY): running minimum from the largest p
 *   downwards.
 *
 * These are the "adjusted p-value" forms of Wright (1992, Biometrics
 * 48:1005–1013): the adjusted value is the smallest level at which the
 * procedure would reject that hypothesis. Tied p-values get equal adjusted
 * values for every factor that is non-increasing in j, whatever order the
 * sort leaves them in; the sort is stable anyway, so output is
 * deterministic.
 */
export type StepDirection = 'down' | 'up';

/** Factor applied to the p-value of rank `j` (1-based) among `m`. */
export type RankFactor = (j: number, m: number) => number;

export function stepAdjust(p: readonly number[], direction: StepDirection, factor: RankFactor): number[] {
  const m = p.length;
  const order = p.map((_, index) => index).sort((a, b) => p[a]! - p[b]!);
  const adjusted = new Array<number>(m);
  let running = direction === 'down' ? 0 : 1;
  for (let step = 0; step < m; step++) {
    const rank = direction === 'down' ? step : m - 1 - step;
    const index = order[rank]!;
    const scaled = Math.min(1, factor(rank + 1, m) * p[index]!);
    running = direction === 'down' ? Math.max(running, scaled) : Math.min(running, scaled);
    adjusted[index] = running;
  }
  return adjusted;
}
