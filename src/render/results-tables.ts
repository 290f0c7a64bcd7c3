import type {PhrasingContent, Table, TableRow} from 'mdast';
import {blockNumbers, type BlockNumbers} from '../interpret/block-numbers.js';
import {styleNamed} from '../interpret/number-style.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {capitalize, effectNames} from '../interpret/wording.js';
import {markedPhrasing} from './marked-phrasing.js';

/**
 * GFM tables of a block: descriptives per group (numeric outcomes) or the
 * observed counts (categorical ones), one row with the test, and the
 * post-hoc comparisons when there are any.
 */
export function resultsTables(block: InterpretedBlock): Table[] {
  return resultsTablesByKind(block).map(({table}) => table);
}

export type ResultsTableKind = 'descriptives' | 'counts' | 'test' | 'posthoc';

/** The same tables, each with its kind (the appendix captions them). */
export function resultsTablesByKind(block: InterpretedBlock): {kind: ResultsTableKind; table: Table}[] {
  const numbers = blockNumbers(block.computed, block.result.p_adjusted ?? block.result.p);
  const italic = styleNamed(block.computed.spec.style).italicSymbols;
  const tables = {
    descriptives: descriptivesTable(block, numbers),
    counts: countsTable(block, numbers),
    test: testTable(block, numbers),
    posthoc: posthocTable(block, numbers),
  };
  return Object.entries(tables).flatMap(([kind, table]) => (table ? [{kind: kind as ResultsTableKind, table: withPhrasing(table, italic)}] : []));
}

function descriptivesTable(block: InterpretedBlock, numbers: BlockNumbers): Table | undefined {
  const {result, computed} = block;
  const entries = Object.entries(result.groups);
  if (entries.length === 0) return undefined;
  const d = numbers.summaryDecimals;
  const r = numbers.recordedDecimals;
  const formatFixed = numbers.format.fixed;
  const unit = computed.units && computed.design.kind !== 'bivariate' ? ` (${computed.units})` : '';
  const header = computed.design.kind === 'paired' || computed.design.kind === 'bivariate' ? 'Variable' : computed.spec.by ?? 'Sample';
  return table(
    [header, 'n', `Mean${unit}`, 'SD', 'Median', 'Min', 'Max'],
    entries.map(([label, g]) => [label, String(g.n), formatFixed(g.mean, d), formatFixed(g.sd, d), formatFixed(g.median, d), formatFixed(g.min, r), formatFixed(g.max, r)]),
  );
}

function countsTable(block: InterpretedBlock, numbers: BlockNumbers): Table | undefined {
  const {design, spec} = block.computed;
  const {fixed: formatFixed, bounded: formatUnitBounded} = numbers.format;
  if (design.kind === 'contingency') {
    return table([`${spec.y} \\ ${spec.by}`, ...design.columns], design.rows.map((row, i) => [row, ...design.counts[i]!.map(String)]));
  }
  if (design.kind === 'paired-categorical') {
    return table([`${design.first} \\ ${design.second}`, ...design.levels], design.levels.map((row, i) => [row, ...design.table[i]!.map(String)]));
  }
  if (design.kind === 'counts') {
    const total = design.counts.reduce((a, b) => a + b, 0);
    const expected = design.expected ?? design.levels.map(() => 1 / design.levels.length);
    return table([String(spec.y), 'Observed', 'Expected'], design.levels.map((level, i) => [level, String(design.counts[i]), formatFixed(expected[i]! * total, 1)]));
  }
  if (design.kind === 'proportion') {
    return table(['Successes', 'Trials', 'Proportion'], [[String(design.successes), String(design.trials), formatUnitBounded(design.successes / design.trials, 3)]]);
  }
  return undefined;
}

function testTable(block: InterpretedBlock, numbers: BlockNumbers): Table | undefined {
  const {result, computed} = block;
  if (result.p === undefined) return undefined;
  const p = (value: number) => {
    const {relation, text} = numbers.format.p(value, result.alpha);
    return relation === '=' ? text : `${relation} ${text}`;
  };
  const level = `${Math.round(computed.spec.confidence * 1000) / 10}% CI`;
  const alpha = numbers.alpha;
  const adjusted = result.p_adjusted != null;
  const columns: [string, string][] = [
    ['Test', result.title],
    ['Statistic', numbers.statistic],
    ['p', p(result.p)],
  ];
  if (adjusted) columns.push(['Adjusted p', p(result.p_adjusted!)]);
  columns.push([`Decision (α = ${alpha})`, result.decision === 'reject' ? 'reject H₀' : 'fail to reject H₀']);
  const {estimate, effect} = result;
  if (estimate) {
    columns.push([`${capitalize(estimate.name)} [${level}]`, `${numbers.estimateText(estimate.value)} ${numbers.estimateCi.replace(/^.*CI /, '')}`]);
  }
  // An effect that is the estimate itself (r, an odds ratio) gets no second column.
  const repeatsEstimate = estimate && effect && effect.value === estimate.value && effect.ci?.[0] === estimate.ci[0] && effect.ci?.[1] === estimate.ci[1];
  if (effect && numbers.effect && !repeatsEstimate) {
    const name = columnName(effectNames[effect.name] ?? effect.name);
    const hasCi = numbers.effect.includes('% CI ');
    columns.push([hasCi ? `${name} [${level}]` : name, numbers.effect.replace(/^[^=]*= /, '').replace(/, [\d.]+% CI /, ' ')]);
  }
  return table(columns.map(([header]) => header), [columns.map(([, cell]) => cell)]);
}

function posthocTable(block: InterpretedBlock, numbers: BlockNumbers): Table | undefined {
  const comparisons = block.result.posthoc;
  if (!comparisons?.length) return undefined;
  const level = `${Math.round(block.computed.spec.confidence * 1000) / 10}% CI`;
  const d = numbers.estimateDecimals;
  const {fixed: formatFixed, p: formatP} = numbers.format;
  // Dunn's procedure compares mean ranks and has no interval.
  const ranks = comparisons.every((c) => c.ci === null);
  const header = ranks ? ['Comparison', 'Difference in mean ranks', 'Adjusted p'] : ['Comparison', 'Difference', `Simultaneous ${level}`, 'Adjusted p'];
  return table(
    header,
    comparisons.map((c) => {
      const {relation, text} = formatP(c.p_adjusted, block.result.alpha);
      const p = relation === '=' ? text : `${relation} ${text}`;
      const interval = c.ci ? `[${formatFixed(c.ci[0], d)}, ${formatFixed(c.ci[1], d)}]` : '—';
      return ranks ? [`${c.b} − ${c.a}`, formatFixed(c.estimate, d), p] : [`${c.b} − ${c.a}`, formatFixed(c.estimate, d), interval, p];
    }),
  );
}

/** A name as a column header: `the odds ratio` → `Odds ratio`; symbols (`r`, `η²`) as they are. */
function columnName(name: string): string {
  const bare = name.replace(/^the /, '');
  return bare.length > 3 ? capitalize(bare) : bare;
}

function table(header: readonly string[], rows: readonly (readonly string[])[]): Table {
  const row = (cells: readonly string[]): TableRow => ({
    type: 'tableRow',
    children: cells.map((cell) => ({type: 'tableCell', children: [text(cell)]})),
  });
  return {type: 'table', align: header.map((_, i) => (i === 0 ? 'left' : 'right')), children: [row(header), ...rows.map(row)]};
}

function text(value: string): PhrasingContent {
  return {type: 'text', value};
}

/** Cells hold marked symbols (`t(24.6) = 2.91`): set them as the style asks. */
function withPhrasing(t: Table, italic: boolean): Table {
  return {
    ...t,
    children: t.children.map((row) => ({
      ...row,
      children: row.children.map((cell) => ({
        ...cell,
        children: cell.children.flatMap((child) => (child.type === 'text' ? markedPhrasing(child.value, italic) : [child])),
      })),
    })),
  };
}
