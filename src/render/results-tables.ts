import type {PhrasingContent, Table, TableRow} from 'mdast';
import {blockNumbers} from '../interpret/block-numbers.js';
import {formatFixed, formatP, formatUnitBounded} from '../interpret/format-number.js';
import type {InterpretedBlock} from '../interpret/result-record.js';

/**
 * GFM tables of a block: descriptives per group, then (for tests) one row
 * with the statistic, p, decision, estimate and effect size.
 */
export function resultsTables(block: InterpretedBlock): Table[] {
  const {result, computed} = block;
  const numbers = blockNumbers(computed, result.p_adjusted ?? result.p);
  const d = numbers.summaryDecimals;
  const r = numbers.recordedDecimals;
  const unit = computed.units ? ` (${computed.units})` : '';
  const descriptives = table(
    [groupHeader(block), 'n', `Mean${unit}`, 'SD', 'Median', 'Min', 'Max'],
    Object.entries(result.groups).map(([label, g]) => [
      label, String(g.n), formatFixed(g.mean, d), formatFixed(g.sd, d), formatFixed(g.median, d), formatFixed(g.min, r), formatFixed(g.max, r),
    ]),
  );
  if (result.p === undefined || !result.estimate || !result.effect) return [descriptives];
  const adjusted = result.p_adjusted != null;
  const p = (value: number) => {
    const {relation, text} = formatP(value, result.alpha);
    return relation === '=' ? text : `${relation} ${text}`;
  };
  const level = `${Math.round(computed.spec.confidence * 1000) / 10}% CI`;
  const alpha = formatUnitBounded(result.alpha!, 3).replace(/0+$/, '');
  const test = table(
    [
      'Test', 'Statistic', 'p', ...(adjusted ? ['Adjusted p'] : []), `Decision (α = ${alpha})`,
      `${estimateHeader(block)} [${level}]`, `Hedges’ g [${level}]`,
    ],
    [[
      result.title,
      numbers.statistic,
      p(result.p),
      ...(adjusted ? [p(result.p_adjusted!)] : []),
      result.decision === 'reject' ? 'reject H₀' : 'fail to reject H₀',
      `${numbers.withUnits(result.estimate.value)} ${numbers.estimateCi.replace(/^.*CI /, '')}`,
      `${formatFixed(result.effect.value, 2)} ${numbers.effect.replace(/^.*CI /, '')}`,
    ]],
  );
  return [descriptives, test];
}

function groupHeader(block: InterpretedBlock): string {
  const {spec, design} = block.computed;
  if (design.kind === 'paired') return 'Measurement';
  return spec.by ?? 'Sample';
}

function estimateHeader(block: InterpretedBlock): string {
  const name = block.result.estimate!.name;
  return name.charAt(0).toUpperCase() + name.slice(1);
}

function table(header: readonly string[], rows: readonly (readonly string[])[]): Table {
  const row = (cells: readonly string[]): TableRow => ({
    type: 'tableRow',
    children: cells.map((cell) => ({type: 'tableCell', children: [text(cell)]})),
  });
  return {
    type: 'table',
    align: header.map((_, i) => (i === 0 ? 'left' : 'right')),
    children: [row(header), ...rows.map(row)],
  };
}

function text(value: string): PhrasingContent {
  return {type: 'text', value};
}
