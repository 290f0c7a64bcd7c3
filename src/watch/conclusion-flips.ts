/**
 * Whether an edit turned a block's conclusion around, judged on two
 * versions of its record in `NAME.results.json` (contract §6):
 *
 * - `decision`: reject ↔ fail to reject;
 * - `sign`: the estimate (or, without one, the effect) changed sign;
 * - `smallest-effect`: the interval moved across −δ or +δ, the smallest
 *   effect the author declared as mattering (for example from entirely
 *   above +δ to containing it).
 *
 * Records are read defensively: they come from JSON.
 */
export type FlipKind = 'decision' | 'sign' | 'smallest-effect';

export interface ConclusionFlip {
  readonly block: string;
  readonly kind: FlipKind;
  /** Plain words for the terminal, e.g. `reject → fail-to-reject`. */
  readonly detail: string;
}

export interface ResultRecord {
  readonly decision?: unknown;
  readonly estimate?: unknown;
  readonly effect?: unknown;
  readonly smallest_effect?: unknown;
}

export function conclusionFlips(block: string, before: ResultRecord, after: ResultRecord): ConclusionFlip[] {
  const flips: ConclusionFlip[] = [];
  if (isDecision(before.decision) && isDecision(after.decision) && before.decision !== after.decision) {
    flips.push({block, kind: 'decision', detail: `${before.decision} → ${after.decision}`});
  }
  const [old, now] = [signed(before), signed(after)];
  if (old && now && old.name === now.name && Math.sign(old.value) !== Math.sign(now.value)) {
    flips.push({block, kind: 'sign', detail: `${old.name} ${signWord(old.value)} → ${signWord(now.value)}`});
  }
  const oldCi = interval(before.estimate);
  const newCi = interval(after.estimate);
  const oldDelta = finite(before.smallest_effect);
  const newDelta = finite(after.smallest_effect);
  if (oldCi && newCi && oldDelta !== undefined && newDelta !== undefined) {
    for (const [sign, label] of [[-1, '−δ'], [1, '+δ']] as const) {
      const was = relation(oldCi, sign * Math.abs(oldDelta));
      const is = relation(newCi, sign * Math.abs(newDelta));
      if (was !== is) flips.push({block, kind: 'smallest-effect', detail: `interval ${was} ${label} → ${is} ${label} (δ = ${Math.abs(newDelta)})`});
    }
  }
  return flips;
}

export type Relation = 'below' | 'contains' | 'above';

/** Where an interval lies relative to a bound; touching counts as containing. */
export function relation([low, high]: readonly [number, number], bound: number): Relation {
  if (high < bound) return 'below';
  if (low > bound) return 'above';
  return 'contains';
}

function isDecision(value: unknown): value is string {
  return value === 'reject' || value === 'fail-to-reject';
}

function signed(record: ResultRecord): {name: string; value: number} | undefined {
  for (const [name, part] of [['estimate', record.estimate], ['effect', record.effect]] as const) {
    const value = finite((part as {value?: unknown} | undefined)?.value);
    if (value !== undefined) return {name, value};
  }
  return undefined;
}

function signWord(value: number): string {
  return value > 0 ? 'positive' : value < 0 ? 'negative' : 'zero';
}

function interval(part: unknown): readonly [number, number] | undefined {
  const ci = (part as {ci?: unknown} | undefined)?.ci;
  if (!Array.isArray(ci) || ci.length !== 2) return undefined;
  const [low, high] = [finite(ci[0]), finite(ci[1])];
  // One-sided intervals are written with null for the open end.
  if (low === undefined && high === undefined) return undefined;
  return [low ?? -Infinity, high ?? Infinity];
}

function finite(value: unknown): number | undefined {
  return typeof value === 'number' && Number.isFinite(value) ? value : undefined;
}
