import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import type {MethodOutcome} from '../methods/types.js';
import {blockNumbers, type BlockNumbers} from './block-numbers.js';
import {estimateStatement} from './estimate-statement.js';
import {formatPercent} from './format-number.js';
import {declared, meanMethods, questionPhrases, type QuestionPhrases} from './question-phrases.js';
import {adjustNames, effectNames, methodNote, wording} from './wording.js';
import {disclosurePhrases, type Disclosure} from './disclosure.js';

/**
 * The interpretive sentence of a block (contract §7). Which statements
 * appear, and in what order, is decided here; how each reads lives in
 * `wording.ts`; statistic symbols are marked (`symbol-marks.ts`):
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
/** Methods whose estimate a declared `smallest-effect` is measured against. */
const smallestEffectDesigns = new Set(['one-sample', 'paired', 'two-group', 'k-group']);

export function writeSentence(block: ComputedBlock, adjustment: Adjustment | undefined, disclosure?: Disclosure): string {
  const {outcome, spec} = block;
  const p = adjustment?.pAdjusted ?? outcome?.p;
  const numbers = blockNumbers(block, p);
  if (!outcome || p === undefined) return describeSentence(block, numbers);
  const alpha = numbers.alpha;
  const significant = p <= spec.alpha;
  const phrases = questionPhrases(block);
  const parts: string[] = [];
  if (block.question === 'equivalence') {
    parts.push(equivalenceFinding(block, numbers, alpha, significant));
  } else {
    parts.push(
      significant
        ? wording.significant(block.title, phrases.contrast, alpha, numbers.testStatistics, phrases.nullHypothesis)
        : wording.notSignificant(block.title, phrases.contrast, alpha, numbers.testStatistics),
    );
  }
  const estimate = estimateStatement(block, numbers);
  if (estimate) parts.push((significant || block.question === 'equivalence' ? wording.estimateSignificant : wording.estimateNotSignificant)(estimate, numbers.estimateCi));
  const effect = outcome.effect;
  if (effect && !sameAsEstimate(outcome)) {
    const text = `${effectNames[effect.name] ?? effect.name} ${numbers.effect.replace(/^[^=]*= /, '= ')}`;
    parts.push(effect.ci ? wording.effect(text) : wording.effectWithoutInterval(text));
  }
  if (spec.alternative !== 'two-sided') parts.push(alternativeNote(block, numbers));
  if (adjustment) {
    const name = adjustNames[adjustment.method] ?? adjustment.method;
    parts.push(wording.adjusted(name, adjustment.size, adjustment.family, numbers.format.pClause(adjustment.pAdjusted, spec.alpha, 'adjusted p')));
  }
  parts.push(...posthocStatement(block, numbers, alpha));
  if (block.question !== 'equivalence') parts.push(...smallestEffectStatement(block, numbers, phrases, significant));
  parts.push(...assumptionNotes(block, numbers));
  parts.push(...(outcome.warnings ?? []).map((note) => methodNote(note, numbers.format)));
  const smallest = Math.min(...samplesOf(block.design).map((s) => s.values.length));
  if (Number.isFinite(smallest) && smallest < 10 && meanMethods.has(spec.method)) parts.push(wording.smallSample(smallest));
  const spearman = outcome.details?.['spearman'] as {rho: number; p: number} | undefined;
  if (spearman) parts.push(wording.spearmanBeside(numbers.format.bounded(spearman.rho, 2), numbers.format.pClause(spearman.p)));
  if (block.autoReason) parts.push(wording.autoChoice(wording.autoReason(block.autoReason)));
  parts.push(...disclosurePhrases(disclosure));
  return parts.join(' ');
}

/** Only `tost` may say "equivalent", and only when both one-sided tests reject. */
function equivalenceFinding(block: ComputedBlock, numbers: BlockNumbers, alpha: string, equivalent: boolean): string {
  const margin = declared(block, block.spec.smallestEffect ?? 0);
  const [first = '', second = ''] = block.names.samples;
  const contrast = wording.equivalenceContrast(block.names.outcome, second, first);
  const template = equivalent ? wording.equivalent : wording.notEquivalent;
  return template(block.title, contrast, margin, alpha, numbers.estimateCi, numbers.testStatistics);
}

/** Correlations and odds ratios are their own standardized effect: say it once. */
function sameAsEstimate(outcome: MethodOutcome): boolean {
  return outcome.estimate !== undefined && outcome.effect !== undefined && outcome.effect.value === outcome.estimate.value;
}

function alternativeNote(block: ComputedBlock, numbers: BlockNumbers): string {
  const {spec, design, names} = block;
  const higher = spec.alternative === 'greater';
  const [first = '', second = ''] = names.samples;
  const {sides} = wording;
  const subject = meanMethods.has(spec.method) ? sides.mean(names.outcome) : names.outcome;
  switch (design.kind) {
    case 'one-sample':
      return wording.oneSampleAlternative(subject, higher, declared(block, spec.mu ?? 0));
    case 'paired':
      return wording.pairedAlternative(higher, second, first);
    case 'two-group':
      return wording.twoGroupAlternative(subject, higher, second, first);
    case 'bivariate':
      return wording.associationAlternative(higher, names.samples[0] ?? '', names.outcome);
    case 'proportion':
      return wording.proportionAlternative(higher, sides.proportionOf(design.success), sides.than(numbers.format.bounded(spec.mu ?? 0, 2)));
    case 'contingency':
      return design.success !== undefined && spec.method === 'two-proportion'
        ? wording.proportionAlternative(higher, sides.proportionOf(design.success), sides.betweenGroups(second, first))
        : wording.proportionAlternative(higher, sides.oddsOf(String(block.outcome?.details?.['event'] ?? '')), sides.betweenGroups(second, first));
    case 'paired-categorical':
      return wording.proportionAlternative(higher, sides.proportionOf(design.levels[1]), sides.betweenMeasurements(second, first));
    default:
      return wording.proportionAlternative(higher, sides.statistic, sides.thanUnderNull);
  }
}

function posthocStatement(block: ComputedBlock, numbers: BlockNumbers, alpha: string): string[] {
  const comparisons = block.outcome?.posthoc;
  if (!comparisons?.length) return [];
  const {format} = numbers;
  const procedure = posthocNames[block.spec.posthoc ?? companions[block.spec.method] ?? ''] ?? 'multiplicity';
  const differing = comparisons
    .filter((c) => c.p_adjusted <= block.spec.alpha)
    .map((c) => wording.posthocPair(
      c.ci === null ? wording.meanRankContrast(c.b, c.a) : `${c.b} − ${c.a}`,
      c.ci === null ? format.fixed(c.estimate, 2) : numbers.withUnits(c.estimate),
      c.ci === null ? undefined : wording.confidenceInterval(`${Math.round(block.spec.confidence * 1000) / 10}%`, format.interval(c.ci, numbers.estimateDecimals)),
      format.pClause(c.p_adjusted, block.spec.alpha, 'adjusted p'),
    ));
  return [differing.length ? wording.posthocDiffering(procedure, alpha, differing) : wording.posthocNone(procedure, alpha, comparisons.length)];
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
    if (sensitivity) return [wording.minimumDetectable(phrases.claim, minimumDetectableText(block, numbers, sensitivity.min_detectable_effect_80))];
    return numbers.estimateCi ? [wording.compatibleValues(phrases.claim, numbers.estimateCi)] : [wording.doesNotShow(phrases.claim)];
  }
  const inUnits = smallestEffectDesigns.has(block.design.kind) || spec.method === 'two-proportion';
  if (delta === undefined || !outcome.estimate || !inUnits) return [];
  const shift = block.design.kind === 'one-sample' ? (spec.mu ?? 0) : 0;
  const [lower, upper] = outcome.estimate.ci.map((bound) => bound - shift) as [number, number];
  const smallest = declared(block, delta);
  if (lower > -delta && upper < delta) return [wording.smallestEffectInside(smallest)];
  if (lower >= delta || upper <= -delta) return [wording.smallestEffectBeyond(smallest)];
  return [wording.smallestEffectStraddles(smallest)];
}

/** Differences in proportions are printed on their bounded scale; the rest in the outcome's units. */
function minimumDetectableText(block: ComputedBlock, numbers: BlockNumbers, value: number): string {
  if (block.design.kind === 'contingency' || block.design.kind === 'proportion') return numbers.format.bounded(value, 2);
  return numbers.withUnits(value);
}

/** Failed checks, each with the method the author may declare instead; never a silent switch. */
function assumptionNotes(block: ComputedBlock, numbers: BlockNumbers): string[] {
  const notes: string[] = [];
  const method = block.spec.method;
  const {format} = numbers;
  for (const check of block.outcome?.assumptions ?? []) {
    if (check.p > 0.05) continue;
    const p = format.pClause(check.p);
    if (check.check === 'shapiro-wilk') {
      const n = block.groups[check.group ?? '']?.n ?? 0;
      if (n >= 30) continue; // large samples: the t tests are robust, and the check flags trivia
      const where = check.group === 'differences' ? 'the differences' : (check.group ?? '');
      notes.push(wording.assumptionNormality(where, format.fixed(check.statistic, 2), p, rankAlternatives[method]));
    } else if (check.check === 'levene') {
      notes.push(wording.assumptionSpread(format.fixed(check.statistic, 2), p, block.title, method === 'anova' ? 'welch-anova' : 'welch-t'));
    }
  }
  return notes;
}

function describeSentence(block: ComputedBlock, numbers: BlockNumbers): string {
  const {groups, spec} = block;
  const {format} = numbers;
  const outcome = block.names.outcome;
  const d = numbers.summaryDecimals;
  const entries = Object.entries(groups);
  const n = (count: number) => format.fixed(count, 0);
  if (spec.by === undefined && entries.length === 1) {
    const g = entries[0]![1];
    const r = numbers.recordedDecimals;
    return wording.describeAll(outcome, n(g.n), numbers.withUnits(g.mean, d), format.fixed(g.sd, d), format.fixed(g.median, d), format.fixed(g.min, r), format.fixed(g.max, r));
  }
  const parts = entries.map(([label, g]) => wording.describeGroup(label, n(g.n), numbers.withUnits(g.mean, d), format.fixed(g.sd, d)));
  return wording.describeGroups(outcome, block.names.by || wording.columnFallback, parts);
}
