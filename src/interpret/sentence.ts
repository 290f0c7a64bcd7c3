import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import {blockNumbers, unitText, type BlockNumbers} from './block-numbers.js';
import {formatFixed, formatPercent, formatUnitBounded, pClause, recordedDecimals} from './format-number.js';
import {adjustNames, capitalize, wording, type Direction} from './wording.js';

/**
 * The interpretive sentence of a block (contract §7). Which statements
 * appear is decided here; how they read lives in `wording.ts`.
 */
export interface Adjustment {
  readonly pAdjusted: number;
  readonly method: string;
  readonly family: string;
  readonly size: number;
}

export function writeSentence(block: ComputedBlock, adjustment: Adjustment | undefined): string {
  const {outcome, spec} = block;
  const p = adjustment?.pAdjusted ?? outcome?.p;
  const numbers = blockNumbers(block, p);
  if (!outcome || p === undefined) return describeSentence(block, numbers);
  const alpha = formatUnitBounded(spec.alpha, 3).replace(/0+$/, '');
  const design = block.design;
  const estimate = estimatePhrase(block, numbers);
  const parts: string[] = [];
  if (p <= spec.alpha) {
    parts.push(wording.significant(block.title, estimate, numbers.estimateCi, numbers.testStatistics, alpha, wording.nullHypothesis[design.kind]!));
  } else {
    parts.push(wording.notSignificant(block.title, contrastPhrase(block), alpha, numbers.testStatistics, estimate, numbers.estimateCi));
  }
  if (spec.alternative !== 'two-sided') parts.push(alternativeNote(block));
  if (adjustment) {
    const name = adjustNames[adjustment.method] ?? adjustment.method;
    parts.push(wording.adjusted(name, adjustment.size, adjustment.family, pClause(adjustment.pAdjusted, spec.alpha)));
  }
  parts.push(wording.effect(`Hedges’ ${numbers.effect}`));
  parts.push(...smallestEffectStatement(block, numbers, p <= spec.alpha));
  const smallest = Math.min(...samplesOf(design).map((s) => s.values.length));
  if (smallest < 10) parts.push(wording.smallSample(smallest));
  return parts.join(' ');
}

/** A value the author declared (mu, smallest effect), as written, with units. */
function declared(block: ComputedBlock, value: number): string {
  return unitText(formatFixed(value, recordedDecimals([value])), block.units);
}

function alternativeNote(block: ComputedBlock): string {
  const {spec, design, names} = block;
  const higher = spec.alternative === 'greater';
  const [first, second] = names.samples;
  if (design.kind === 'one-sample') return wording.oneSampleAlternative(names.outcome, higher, declared(block, spec.mu ?? 0));
  if (design.kind === 'paired') return wording.pairedAlternative(higher, second!, first!);
  return wording.twoGroupAlternative(names.outcome, higher, second!, first!);
}

function smallestEffectStatement(block: ComputedBlock, numbers: BlockNumbers, significant: boolean): string[] {
  const {outcome, spec} = block;
  if (!outcome) return [];
  const delta = spec.smallestEffect;
  const claim = wording.equalityClaim[block.design.kind]!;
  if (!significant) {
    const sensitivity = outcome.sensitivity;
    if (!sensitivity) return [];
    if (delta !== undefined && sensitivity.power_at_smallest_effect !== null) {
      return [wording.powerAtSmallestEffect(claim, formatPercent(sensitivity.power_at_smallest_effect), declared(block, delta))];
    }
    return [wording.minimumDetectable(claim, numbers.withUnits(sensitivity.min_detectable_effect_80))];
  }
  if (delta === undefined) return [];
  const shift = block.design.kind === 'one-sample' ? (spec.mu ?? 0) : 0;
  const [lower, upper] = outcome.estimate.ci.map((bound) => bound - shift) as [number, number];
  const smallest = declared(block, delta);
  if (lower > -delta && upper < delta) return [wording.smallestEffectInside(smallest)];
  if (lower >= delta || upper <= -delta) return [wording.smallestEffectBeyond(smallest)];
  return [wording.smallestEffectStraddles(smallest)];
}

function estimatePhrase(block: ComputedBlock, numbers: BlockNumbers): string {
  const {outcome, design, spec, names} = block;
  const value = outcome!.estimate.value;
  if (design.kind === 'one-sample') {
    const mu = spec.mu ?? 0;
    const difference = value - mu;
    return wording.oneSampleEstimate(
      names.outcome,
      numbers.withUnits(value),
      numbers.withUnits(Math.abs(difference)),
      direction(difference, numbers.estimateDecimals),
      declared(block, mu),
    );
  }
  const amount = numbers.withUnits(Math.abs(value));
  const dir = direction(value, numbers.estimateDecimals);
  const [first, second] = names.samples;
  if (design.kind === 'paired') return wording.pairedEstimate(amount, dir, second!, first!);
  return wording.twoGroupEstimate(names.outcome, amount, dir, second!, first!);
}

function contrastPhrase(block: ComputedBlock): string {
  const {design, spec, names} = block;
  const [first, second] = names.samples;
  if (design.kind === 'one-sample') return wording.oneSampleContrast(names.outcome, declared(block, spec.mu ?? 0));
  if (design.kind === 'paired') return wording.pairedContrast(second!, first!);
  return wording.twoGroupContrast(names.outcome, second!, first!);
}

function describeSentence(block: ComputedBlock, numbers: BlockNumbers): string {
  const {spec, groups} = block;
  const outcome = block.names.outcome;
  const d = numbers.summaryDecimals;
  const entries = Object.entries(groups);
  if (spec.by === undefined && entries.length === 1) {
    const g = entries[0]![1];
    const r = numbers.recordedDecimals;
    return wording.describeAll(outcome, String(g.n), numbers.withUnits(g.mean, d), formatFixed(g.sd, d), formatFixed(g.median, d), formatFixed(g.min, r), formatFixed(g.max, r));
  }
  const parts = entries.map(([label, g]) => wording.describeGroup(label, String(g.n), numbers.withUnits(g.mean, d), formatFixed(g.sd, d)));
  return wording.describeGroups(outcome, spec.by ?? 'column', parts);
}

function direction(value: number, decimals: number): Direction {
  if (Number(Math.abs(value).toFixed(decimals)) === 0) return 'none';
  return value > 0 ? 'higher' : 'lower';
}

