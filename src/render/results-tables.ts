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
  const numbers = blockNumbers(block.computed, block.result.p_adjusted ?? block.result.p);
  const italic = styleNamed(block.computed.spec.style).italicSymbols;
  return [descriptivesTable(block, numbers), countsTable(block, numbers), testTable(block, numbers), posthocTable(block, numbers)]
    .filter((t): t is Table => t !== undefined)
    .map((t) => withPhrasing(t, italic));
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
  if (result.estimate) {
    columns.push([`${capitalize(result.estimate.name)} [${level}]`, `${numbers.estimateText(result.estimate.value)} ${numbers.estimateCi.replace(/^.*CI /, '')}`]);
  }
  if (result.effect && numbers.effect) {
    columns.push([`${capitalize(effectNames[result.effect.name] ?? result.effect.name)} [${level}]`, numbers.effect.replace(/^[^=]*= /, '').replace(/, [\d.]+% CI /, ' ')]);
  }
  return table(columns.map(([header]) => header), [columns.map(([, cell]) => cell)]);
}

function posthocTable(block: InterpretedBlock, numbers: BlockNumbers): Table | undefined {
  const comparisons = block.result.posthoc;
  if (!comparisons?.length) return undefined;
  const level = `${Math.round(block.computed.spec.confidence * 1000) / 10}% CI`;
  const d = numbers.estimateDecimals;
  const {fixed: formatFixed, p: formatP} = numbers.format;
  return table(
    ['Comparison', 'Difference', `Simultaneous ${level}`, 'Adjusted p'],
    comparisons.map((c) => {
      const {relation, text} = formatP(c.p_adjusted, block.result.alpha);
      return [`${c.b} − ${c.a}`, formatFixed(c.estimate, d), c.ci ? `[${formatFixed(c.ci[0], d)}, ${formatFixed(c.ci[1], d)}]` : '—', relation === '=' ? text : `${relation} ${text}`];
    }),
  );
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
