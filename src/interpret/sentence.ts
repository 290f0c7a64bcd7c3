import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import type {MethodOutcome} from '../methods/types.js';
import {blockNumbers, boundedScale, type BlockNumbers} from './block-numbers.js';
import {formatFixed, formatPercent, formatUnitBounded, pClause} from './format-number.js';
import {declared, meanMethods, questionPhrases, type QuestionPhrases} from './question-phrases.js';
import {adjustNames, effectNames, wording, type Direction} from './wording.js';
import {disclosurePhrases, type Disclosure} from './disclosure.js';

/**
 * The interpretive sentence of a block (contract §7). Which statements
 * appear, and in what order, is decided here; how each reads lives in
 * `wording.ts`:
 *
 *   finding (test, statistic, p, alpha, decision) → estimate with CI →
 *   standardized effect → one-sided note → adjustment → post-hoc pairs →
 *   smallest effect or sensitivity → assumption notes → warnings → auto
 */
export interface Adjustment {
  readonly pAdjusted: number;
  readonly method: string;
  readonly family: string;
  readonly size: number;
}

const posthocNames: Record<string, string> = {tukey: 'Tukey–Kramer', 'games-howell': 'Games–Howell', dunn: 'Holm'};
const companions: Record<string, string> = {anova: 'tukey', 'welch-anova': 'games-howell', 'kruskal-wallis': 'dunn'};
const rankAlternatives: Record<string, string> = {
  'student-t': 'mann-whitney',
  'welch-t': 'mann-whitney',
  'paired-t': 'wilcoxon-signed-rank',
  'one-sample-t': 'sign-test',
  anova: 'kruskal-wallis',
  'welch-anova': 'kruskal-wallis',
};

export function writeSentence(block: ComputedBlock, adjustment: Adjustment | undefined, disclosure?: Disclosure): string {
  const {outcome, spec} = block;
  const p = adjustment?.pAdjusted ?? outcome?.p;
  const numbers = blockNumbers(block, p);
  if (!outcome || p === undefined) return describeSentence(block, numbers);
  const alpha = formatUnitBounded(spec.alpha, 3).replace(/0+$/, '');
  const significant = p <= spec.alpha;
  const phrases = questionPhrases(block);
  const parts: string[] = [];
  if (block.question === 'equivalence') {
    parts.push(equivalenceFinding(block, numbers, phrases, alpha, significant));
  } else {
    parts.push(
      significant
        ? wording.significant(block.title, phrases.contrast, alpha, numbers.testStatistics, phrases.nullHypothesis)
        : wording.notSignificant(block.title, phrases.contrast, alpha, numbers.testStatistics),
    );
    const estimate = estimatePhrase(block, numbers);
    if (estimate) parts.push((significant ? wording.estimateSignificant : wording.estimateNotSignificant)(estimate, numbers.estimateCi));
  }
  const effect = outcome.effect;
  if (effect && !sameAsEstimate(outcome)) parts.push(wording.effect(`${effectNames[effect.name] ?? effect.name} ${numbers.effect.replace(/^[^=]*= /, '= ')}`));
  if (spec.alternative !== 'two-sided') parts.push(alternativeNote(block));
  if (adjustment) {
    const name = adjustNames[adjustment.method] ?? adjustment.method;
    parts.push(wording.adjusted(name, adjustment.size, adjustment.family, pClause(adjustment.pAdjusted, spec.alpha)));
  }
  parts.push(...posthocStatement(block, numbers, alpha));
  if (block.question !== 'equivalence') parts.push(...smallestEffectStatement(block, numbers, phrases, significant));
  parts.push(...assumptionNotes(block));
  parts.push(...(outcome.warnings ?? []));
  const smallest = Math.min(...samplesOf(block.design).map((s) => s.values.length));
  if (Number.isFinite(smallest) && smallest < 10 && meanMethods.has(spec.method)) parts.push(wording.smallSample(smallest));
  const spearman = outcome.details?.['spearman'] as {rho: number; p: number} | undefined;
  if (spearman) parts.push(wording.spearmanBeside(formatUnitBounded(spearman.rho, 2), pClause(spearman.p)));
  if (block.autoReason) parts.push(wording.autoChoice(block.autoReason));
  parts.push(...disclosurePhrases(disclosure));
  return parts.join(' ');
}

function equivalenceFinding(block: ComputedBlock, numbers: BlockNumbers, phrases: QuestionPhrases, alpha: string, equivalent: boolean): string {
  const margin = declared(block, block.spec.smallestEffect ?? 0);
  const [first = '', second = ''] = block.names.samples;
  const contrast = wording.equivalenceContrast(block.names.outcome, second, first);
  const template = equivalent ? wording.equivalent : wording.notEquivalent;
  return template(block.title, contrast, margin, alpha, numbers.estimateCi, numbers.testStatistics);
}

/** Correlations are their own standardized effect: say it once. */
function sameAsEstimate(outcome: MethodOutcome): boolean {
  return outcome.estimate !== undefined && outcome.effect !== undefined && outcome.effect.value === outcome.estimate.value;
}

function estimatePhrase(block: ComputedBlock, numbers: BlockNumbers): string | undefined {
  const {outcome, design, spec, names} = block;
  const estimate = outcome?.estimate;
  if (!estimate) return undefined;
  const value = estimate.value;
  const [first = '', second = ''] = names.samples;
  if (meanMethods.has(spec.method)) {
    if (design.kind === 'one-sample') {
      const mu = spec.mu ?? 0;
      const dir = direction(value - mu, numbers.estimateDecimals);
      return wording.oneSampleEstimate(names.outcome, numbers.withUnits(value), numbers.withUnits(Math.abs(value - mu)), dir, declared(block, mu));
    }
    const amount = numbers.withUnits(Math.abs(value));
    const dir = direction(value, numbers.estimateDecimals);
    if (design.kind === 'paired') return wording.pairedEstimate(amount, dir, second, first);
    return wording.twoGroupEstimate(names.outcome, amount, dir, second, first);
  }
  const text = boundedScale(block) ? formatUnitBounded(value, Math.max(2, numbers.estimateDecimals)) : numbers.withUnits(value);
  return wording.genericEstimate(estimate.name, text);
}

function alternativeNote(block: ComputedBlock): string {
  const {spec, design, names} = block;
  const higher = spec.alternative === 'greater';
  const [first = '', second = ''] = names.samples;
  if (design.kind === 'one-sample') return wording.oneSampleAlternative(names.outcome, higher, declared(block, spec.mu ?? 0));
  if (design.kind === 'paired') return wording.pairedAlternative(higher, second, first);
  return wording.twoGroupAlternative(names.outcome, higher, second, first);
}

function posthocStatement(block: ComputedBlock, numbers: BlockNumbers, alpha: string): string[] {
  const comparisons = block.outcome?.posthoc;
  if (!comparisons?.length) return [];
  const procedure = posthocNames[block.spec.posthoc ?? companions[block.spec.method] ?? ''] ?? 'multiplicity';
  const differing = comparisons
    .filter((c) => c.p_adjusted <= block.spec.alpha)
    .map((c) => wording.posthocPair(
      c.ci === null ? wording.meanRankContrast(c.b, c.a) : `${c.b} − ${c.a}`,
      c.ci === null ? formatFixed(c.estimate, 2) : numbers.withUnits(c.estimate),
      c.ci === null ? undefined : wording.confidenceInterval(`${Math.round(block.spec.confidence * 1000) / 10}%`, `[${formatFixed(c.ci[0], numbers.estimateDecimals)}, ${formatFixed(c.ci[1], numbers.estimateDecimals)}]`),
      pClause(c.p_adjusted, block.spec.alpha, 'adjusted p'),
    ));
  return [differing.length ? wording.posthocDiffering(procedure, alpha, differing) : wording.posthocNone(procedure)];
}

function smallestEffectStatement(block: ComputedBlock, numbers: BlockNumbers, phrases: QuestionPhrases, significant: boolean): string[] {
  const {outcome, spec} = block;
  if (!outcome) return [];
  const delta = spec.smallestEffect;
  if (!significant) {
    const sensitivity = outcome.sensitivity;
    if (sensitivity && delta !== undefined && sensitivity.power_at_smallest_effect !== null) {
      return [wording.powerAtSmallestEffect(phrases.claim, formatPercent(sensitivity.power_at_smallest_effect), declared(block, delta))];
    }
    if (sensitivity) return [wording.minimumDetectable(phrases.claim, numbers.withUnits(sensitivity.min_detectable_effect_80))];
    return numbers.estimateCi ? [wording.compatibleValues(phrases.claim, numbers.estimateCi)] : [`This does not show that ${phrases.claim}.`];
  }
  if (delta === undefined || !outcome.estimate || outcome.estimate.units === undefined) return [];
  const shift = block.design.kind === 'one-sample' ? (spec.mu ?? 0) : 0;
  const [lower, upper] = outcome.estimate.ci.map((bound) => bound - shift) as [number, number];
  const smallest = declared(block, delta);
  if (lower > -delta && upper < delta) return [wording.smallestEffectInside(smallest)];
  if (lower >= delta || upper <= -delta) return [wording.smallestEffectBeyond(smallest)];
  return [wording.smallestEffectStraddles(smallest)];
}

/** Failed checks, each with the method the author may declare instead; never a silent switch. */
function assumptionNotes(block: ComputedBlock): string[] {
  const notes: string[] = [];
  const method = block.spec.method;
  for (const check of block.outcome?.assumptions ?? []) {
    if (check.p > 0.05) continue;
    const p = pClause(check.p);
    if (check.check === 'shapiro-wilk') {
      const n = block.groups[check.group ?? '']?.n ?? 0;
      if (n >= 30) continue; // large samples: the t tests are robust, and the check flags trivia
      notes.push(wording.assumptionNormality(check.group === 'differences' ? 'the differences' : (check.group ?? ''), formatFixed(check.statistic, 2), p, rankAlternatives[method]));
    } else if (check.check === 'levene') {
      notes.push(wording.assumptionSpread(formatFixed(check.statistic, 2), p, block.title, method === 'anova' ? 'welch-anova' : 'welch-t'));
    }
  }
  return notes;
}

function describeSentence(block: ComputedBlock, numbers: BlockNumbers): string {
  const {groups, spec} = block;
  const outcome = block.names.outcome;
  const d = numbers.summaryDecimals;
  const entries = Object.entries(groups);
  if (spec.by === undefined && entries.length === 1) {
    const g = entries[0]![1];
    const r = numbers.recordedDecimals;
    return wording.describeAll(outcome, String(g.n), numbers.withUnits(g.mean, d), formatFixed(g.sd, d), formatFixed(g.median, d), formatFixed(g.min, r), formatFixed(g.max, r));
  }
  const parts = entries.map(([label, g]) => wording.describeGroup(label, String(g.n), numbers.withUnits(g.mean, d), formatFixed(g.sd, d)));
  return wording.describeGroups(outcome, block.names.by || 'column', parts);
}

function direction(value: number, decimals: number): Direction {
  if (Number(Math.abs(value).toFixed(decimals)) === 0) return 'none';
  return value > 0 ? 'higher' : 'lower';
}

