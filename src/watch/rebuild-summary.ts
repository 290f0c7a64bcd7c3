import type {CacheCounts} from '../cache/block-cache.js';
import type {ChangedValue} from './changed-values.js';
import type {ConclusionFlip} from './conclusion-flips.js';

export interface RebuildReport {
  /** The first build of the session (nothing to compare with). */
  readonly first: boolean;
  readonly milliseconds: number;
  readonly counts: CacheCounts;
  readonly changed: readonly ChangedValue[];
  readonly flips: readonly ConclusionFlip[];
  readonly added: readonly string[];
  readonly removed: readonly string[];
}

/**
 * A few lines after each rebuild: time, blocks recomputed and reused,
 * values that changed, and a loud line per conclusion that flipped.
 */
export function rebuildSummary(report: RebuildReport, at: Date, loud: (text: string) => string): string {
  const {counts} = report;
  const time = at.toISOString().slice(11, 19);
  const lines = [
    `[${time}] ${report.first ? 'built' : 'rebuilt'} in ${Math.round(report.milliseconds)} ms: ` +
      `${counts.computed} block${counts.computed === 1 ? '' : 's'} recomputed, ${counts.reused} reused`,
  ];
  if (report.added.length) lines.push(`  new blocks: ${report.added.join(', ')}`);
  if (report.removed.length) lines.push(`  removed blocks: ${report.removed.join(', ')}`);
  for (const change of report.changed) {
    const [before, after] = showPair(change.before, change.after);
    lines.push(`  ${change.block}.${change.field}: ${before} → ${after}`);
  }
  for (const flip of report.flips) {
    lines.push(loud(`  !! CONCLUSION FLIPPED in ${flip.block}: ${flipWords[flip.kind]} (${flip.detail})`));
  }
  return `${lines.join('\n')}\n`;
}

const flipWords = {
  decision: 'the decision changed',
  sign: 'the estimate changed sign',
  'smallest-effect': 'the interval crossed the smallest effect',
} as const;

/**
 * Two values as text, numbers with just enough significant digits (at
 * least 4) to tell them apart, so a change is never printed as `x → x`.
 */
export function showPair(a: unknown, b: unknown): [string, string] {
  for (let digits = 4; digits <= 17; digits++) {
    const pair: [string, string] = [show(a, digits), show(b, digits)];
    if (pair[0] !== pair[1] || digits === 17) return pair;
  }
  return [show(a, 17), show(b, 17)];
}

function show(value: unknown, digits: number): string {
  if (value === undefined) return '(none)';
  if (typeof value === 'number') return Number.isFinite(value) ? String(Number(value.toPrecision(digits))) : String(value);
  if (Array.isArray(value)) return `[${value.map((item) => show(item, digits)).join(', ')}]`;
  if (value === null) return '—';
  return typeof value === 'string' ? value : JSON.stringify(value);
}
