import type {ComputedBlock} from '../compute/compute-block.js';
import type {BlockNumbers} from './block-numbers.js';
import {declared} from './question-phrases.js';
import {effectNames, wording, type Direction} from './wording.js';

/**
 * The estimate of a block in plain words, with its direction (`mean
 * strength was 2.8 MPa lower in B than in A`): which template applies is
 * decided here from the method and design; the phrases live in `wording.ts`.
 * Undefined where the question has no estimate (independence, fit,
 * diagnostics).
 */
export function estimateStatement(block: ComputedBlock, numbers: BlockNumbers): string | undefined {
  const {outcome, design, spec, names} = block;
  const estimate = outcome?.estimate;
  if (!estimate) return undefined;
  const value = estimate.value;
  const [first = '', second = ''] = names.samples;
  const amount = numbers.withUnits(Math.abs(value));
  const dir = direction(value, numbers.estimateDecimals);
  const bounded = (v: number) => numbers.format.bounded(v, Math.max(2, numbers.estimateDecimals));
  switch (spec.method) {
    case 'one-sample-t': {
      const mu = spec.mu ?? 0;
      return wording.oneSampleEstimate(names.outcome, numbers.withUnits(value), numbers.withUnits(Math.abs(value - mu)), direction(value - mu, numbers.estimateDecimals), declared(block, mu));
    }
    case 'paired-t':
      return wording.pairedEstimate(amount, dir, second, first);
    case 'student-t':
    case 'welch-t':
    case 'tost':
      return wording.twoGroupEstimate(names.outcome, amount, dir, second, first);
    case 'mann-whitney':
      return wording.shiftEstimate(names.outcome, amount, dir, second, first);
    case 'wilcoxon-signed-rank':
      return wording.pairedShiftEstimate(amount, dir, second, first);
    case 'sign-test':
      return wording.medianDifferenceEstimate(amount, dir, second, first);
    case 'anova':
    case 'welch-anova':
    case 'kruskal-wallis': {
      const [low = '', high = ''] = estimate.pair ?? [];
      return wording.largestGapEstimate(names.outcome, amount, dir, high, low, spec.method === 'kruskal-wallis');
    }
    case 'pearson':
    case 'spearman':
    case 'kendall':
      return wording.correlationEstimate(effectNames[outcome.effect?.name ?? ''] ?? wording.correlationFallback, bounded(value), dir, names.samples[0] ?? '', names.outcome);
    case 'linear-regression':
      return wording.slopeEstimate(names.outcome, amount, dir, names.samples[0] ?? '', names.samples.length > 2);
    case 'binomial':
    case 'one-proportion': {
      const mu = spec.mu ?? 0;
      const success = design.kind === 'proportion' ? design.success : '';
      return wording.proportionEstimate(success, bounded(value), bounded(Math.abs(value - mu)), direction(value - mu, Math.max(2, numbers.estimateDecimals)), bounded(mu));
    }
    case 'two-proportion': {
      const proportions = outcome.details?.['proportions'] as Record<string, number> | undefined;
      const success = design.kind === 'contingency' ? design.success ?? '' : '';
      const [p1 = NaN, p2 = NaN] = [proportions?.[first], proportions?.[second]];
      return wording.twoProportionEstimate(success, bounded(Math.abs(value)), direction(value, Math.max(2, numbers.estimateDecimals)), second, first, bounded(p2), bounded(p1));
    }
    case 'mcnemar': {
      const level = design.kind === 'paired-categorical' ? design.levels[1] : '';
      return wording.pairedProportionEstimate(level, bounded(Math.abs(value)), direction(value, Math.max(2, numbers.estimateDecimals)), second, first);
    }
    case 'fisher-exact': {
      const event = String(outcome.details?.['event'] ?? '');
      return wording.oddsRatioEstimate(event, numbers.format.fixed(value, Math.max(2, numbers.estimateDecimals)), second, first);
    }
    default:
      return undefined;
  }
}

/** Direction of a difference at the precision it is printed with. */
export function direction(value: number, decimals: number): Direction {
  if (Number(Math.abs(value).toFixed(decimals)) === 0) return 'none';
  return value > 0 ? 'higher' : 'lower';
}
