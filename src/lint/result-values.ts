import type {InterpretedBlock} from '../interpret/result-record.js';
import type {LintContext, ProseSentence} from './types.js';

/** What a hand-typed number claims to be, and the reference fields that hold such values. */
export type StatisticKind = 'p' | 'statistic' | 'effect' | 'interval';

const fieldsOf: Record<StatisticKind, readonly string[]> = {
  p: ['p', 'p_adjusted'],
  statistic: ['statistic'],
  effect: ['effect.value', 'estimate.value'],
  interval: ['estimate.ci', 'effect.ci'],
};

/**
 * The `{{id.field}}` that would replace a hand-typed number: a block whose
 * result rounds to the typed digits when exactly one does, else the block the
 * sentence already cites, else a placeholder id.
 */
export function suggestReference(
  kind: StatisticKind,
  typed: readonly string[],
  relation: string,
  sentence: ProseSentence,
  context: LintContext,
): {readonly reference: string; readonly matched: boolean} {
  const matches: string[] = [];
  for (const [id, block] of context.blocks) {
    for (const field of fieldsOf[kind]) {
      const value = valueOf(block, field);
      if (value !== undefined && agrees(value, typed, relation)) matches.push(`{{${id}.${field}}}`);
    }
  }
  const unique = [...new Set(matches)];
  if (unique.length === 1) return {reference: unique[0]!, matched: true};
  const cited = sentence.blockIds.find((id) => context.blocks.get(id)?.result.decision !== undefined);
  const tested = [...context.blocks].filter(([, block]) => block.result.decision !== undefined);
  const id = cited ?? (tested.length === 1 ? tested[0]![0] : 'ID');
  return {reference: `{{${id}.${fieldsOf[kind][0]}}}`, matched: false};
}

function valueOf(block: InterpretedBlock, field: string): number | readonly number[] | undefined {
  const {result} = block;
  switch (field) {
    case 'p': return result.p;
    case 'p_adjusted': return result.p_adjusted ?? undefined;
    case 'statistic': return result.statistic?.value;
    case 'effect.value': return result.effect?.value;
    case 'estimate.value': return result.estimate?.value;
    case 'estimate.ci': return result.estimate?.ci;
    case 'effect.ci': return result.effect?.ci ?? undefined;
    default: return undefined;
  }
}

/** Whether a result value, rounded as the author rounded, reads as typed. */
function agrees(value: number | readonly number[], typed: readonly string[], relation: string): boolean {
  const values = typeof value === 'number' ? [value] : value;
  if (values.length !== typed.length) return false;
  return values.every((v, i) => {
    const written = typed[i]!.replace('−', '-');
    const number = Number(written);
    if (!Number.isFinite(number) || !Number.isFinite(v)) return false;
    if (relation === '<' || relation === '≤' || relation === '<=') return v < number;
    const decimals = written.includes('.') ? written.length - written.indexOf('.') - 1 : 0;
    return Math.abs(Number(v.toFixed(decimals)) - number) < 10 ** -(decimals + 3);
  });
}
