import type {BlockResult} from '../compute/block-result.js';
import type {ComputedBlock} from '../compute/compute-block.js';
import {blockNumbers} from './block-numbers.js';
import type {Disclosure} from './disclosure.js';
import {writeSentence, type Adjustment} from './sentence.js';
import {methodNote, wording} from './wording.js';
import {plainText, segmentsOf, type SentenceSegment} from './symbol-marks.js';

/**
 * The block's result record (contract §6): the computed numbers, the
 * decision on the (adjusted) p at the block's alpha, and the sentence.
 */
export interface InterpretedBlock {
  readonly result: BlockResult;
  /** The sentence in segments, statistic symbols marked, for Markdown and HTML. */
  readonly segments: readonly SentenceSegment[];
  /** The compact statistic string `{{id}}` renders, symbols marked (`symbol-marks.ts`). */
  readonly compact: string;
  readonly computed: ComputedBlock;
}

export function interpretBlock(block: ComputedBlock, adjustment: Adjustment | undefined, disclosure?: Disclosure): InterpretedBlock {
  const {spec, outcome} = block;
  const marked = writeSentence(block, adjustment, disclosure);
  const sentence = plainText(marked);
  const segments = segmentsOf(marked);
  const {compact, format} = blockNumbers(block, adjustment?.pAdjusted ?? outcome?.p);
  const n = block.rows.used;
  const base = {
    method: spec.method,
    title: block.title,
    ...(block.autoReason ? {auto: {reason: wording.autoReason(block.autoReason)}} : {}),
    data: spec.data,
    n,
    groups: block.groups,
    assumptions: outcome?.assumptions ?? [],
    sentence,
    warnings: (outcome?.warnings ?? []).map((note) => plainText(methodNote(note, format))),
    rows: block.rows,
    ...(disclosure ? {specifications_evaluated: disclosure.specifications} : {}),
    ...(disclosure?.plan ? {plan: disclosure.plan} : {}),
  };
  if (!outcome) return {result: base, segments, compact, computed: block};
  const decisive = adjustment?.pAdjusted ?? outcome.p;
  const result: BlockResult = {
    // Method-specific fields first, so they can never overwrite the contract's.
    ...outcome.details,
    ...base,
    statistic: outcome.statistic,
    df: outcome.df,
    p: outcome.p,
    p_adjusted: adjustment?.pAdjusted ?? null,
    alpha: spec.alpha,
    alternative: spec.alternative,
    decision: decisive <= spec.alpha ? 'reject' : 'fail-to-reject',
    ...(outcome.estimate ? {estimate: outcome.estimate} : {}),
    ...(outcome.effect ? {effect: outcome.effect} : {}),
    ...(outcome.sensitivity ? {sensitivity: outcome.sensitivity} : {}),
    ...(outcome.posthoc ? {posthoc: outcome.posthoc} : {}),
    ...(outcome.variant ? {variant: outcome.variant} : {}),
    smallest_effect: spec.smallestEffect ?? null,
    family: adjustment ? {name: adjustment.family, adjust: adjustment.method, size: adjustment.size} : null,
  };
  return {result, segments, compact, computed: block};
}
