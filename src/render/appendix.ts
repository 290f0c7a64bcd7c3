import type {BlockContent, ListItem, PhrasingContent, Root, RootContent, Table, TableRow} from 'mdast';
import type {BlockChart} from '../charts/block-chart.js';
import {blockNumbers} from '../interpret/block-numbers.js';
import {formatDf, formatFixed, formatInterval, formatP} from '../interpret/format-number.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {adjustNames, appendixWords as words} from '../interpret/wording.js';
import {formatField} from './format-field.js';
import {resultsTablesByKind} from './results-tables.js';

/**
 * The appendix as mdast: every block in full detail, whatever its `show`
 * says — method, variant and `auto` reason, data and filter, rows used and
 * left out, family and adjustment, sensitivity, warnings, and numbered
 * tables (A1, A2, … across the document) and figures. Charts are images of
 * `charts/ID.svg`, which the HTML writer inlines. Text nodes hold data as
 * written; the Markdown and HTML writers escape it.
 */
export function appendixTree(
  blocks: ReadonlyMap<string, InterpretedBlock>,
  charts: ReadonlyMap<string, BlockChart>,
  title: string,
  report: string,
): Root {
  const children: RootContent[] = [heading(1, words.title(title)), paragraph([text(words.intro(report))])];
  const counter = {table: 0, figure: 0};
  let number = 0;
  for (const [id, block] of blocks) children.push(...blockSection(++number, id, block, charts.get(id), counter));
  return {type: 'root', children};
}

function blockSection(
  number: number,
  id: string,
  block: InterpretedBlock,
  chart: BlockChart | undefined,
  counter: {table: number; figure: number},
): RootContent[] {
  const {result, computed} = block;
  const {spec} = computed;
  // The heading's id lets the report and other documents link to `NAME.appendix.html#appendix-ID`.
  const title: RootContent = {...heading(2, words.blockHeading(number, id, result.title)), data: {hProperties: {id: `appendix-${id}`}}};
  const nodes: RootContent[] = [title, definitions(block)];
  nodes.push(paragraph([strong(`${words.labels.sentence}.`), text(` ${result.sentence}`)]));
  const tables: {kind: string; table: Table}[] = [...resultsTablesByKind(block), ...extraTables(block)];
  for (const {kind, table} of tables) {
    nodes.push(paragraph([strong(words.table(++counter.table)), text(` ${words.of(words.tableKinds[kind] ?? kind, id)}`)]), table);
  }
  nodes.push(paragraph([strong(`${words.labels.warnings}:`), text(result.warnings.length ? '' : ` ${words.noWarnings}`)]));
  if (result.warnings.length) nodes.push(list(result.warnings.map((warning) => [text(warning)])));
  if (chart) {
    nodes.push(
      paragraph([{type: 'image', url: `charts/${id}.svg`, alt: chart.alt, title: null}]),
      paragraph([strong(words.figure(++counter.figure)), text(` ${spec.caption ?? chart.alt}`)]),
    );
  }
  return nodes;
}

/** Method, data, rows, family and sensitivity as a list of labelled items. */
function definitions(block: InterpretedBlock): BlockContent {
  const {result, computed} = block;
  const {spec} = computed;
  const l = words.labels;
  const items: [string, PhrasingContent[]][] = [[l.method, [text(`${result.title} `), code(result.method)]]];
  if (result.variant) items.push([l.variant, [text(result.variant)]]);
  if (result.auto) items.push([l.auto, [text(result.auto.reason)]]);
  if (result.alternative) items.push([l.alternative, [text(result.alternative)]]);
  if (result.alpha !== undefined) items.push([l.alpha, [text(`α = ${formatField(block, ['alpha'])}`)]]);
  items.push([l.confidence, [text(`${Math.round(spec.confidence * 1000) / 10}%`)]]);
  items.push([l.data, [code(spec.data)]]);
  items.push([l.where, spec.where ? [code(spec.where.source)] : [text(words.noWhere)]]);
  const rows = result.rows;
  items.push([l.rows, [text(words.rows(rows.used, rows.excluded_missing, rows.excluded_filter, rows.excluded_levels))]]);
  if (result.p !== undefined) {
    const family = result.family;
    items.push([l.family, [text(family ? words.family(family.name, adjustNames[family.adjust] ?? family.adjust, family.size) : words.noFamily)]]);
  }
  if (result.plan) items.push([l.plan, [text(words.plan(result.plan))]]);
  if (result.specifications_evaluated !== undefined) items.push([l.specifications, [text(words.specifications(result.specifications_evaluated))]]);
  if (result.smallest_effect != null) items.push([l.smallestEffect, [text(blockNumbers(computed, result.p).withUnits(result.smallest_effect))]]);
  if (result.sensitivity) {
    const mde = formatField(block, ['sensitivity', 'min_detectable_effect_80']) ?? '';
    const power = result.sensitivity.power_at_smallest_effect;
    items.push([l.sensitivity, [text(power === null ? words.mde(mde) : words.power(formatField(block, ['sensitivity', 'power_at_smallest_effect'])!, mde))]]);
  }
  return list(items.map(([label, value]) => [strong(`${label}:`), text(' '), ...value]));
}

/** Assumption checks, regression coefficients and the ANOVA table. */
function extraTables(block: InterpretedBlock): {kind: string; table: Table}[] {
  const {result} = block;
  const details = result as unknown as Record<string, unknown>;
  const p = (value: number) => {
    const {relation, text: shown} = formatP(value);
    return relation === '=' ? shown : `${relation} ${shown}`;
  };
  const tables: {kind: string; table: Table}[] = [];
  if (result.assumptions.length) {
    tables.push({
      kind: 'assumptions',
      table: table(words.assumptionHeader, result.assumptions.map((a) => [a.check, a.group ?? '—', formatFixed(a.statistic, 3), p(a.p)])),
    });
  }
  const coefficients = details['coefficients'] as {term: string; estimate: number; se: number; t: number; p: number; ci: [number, number]}[] | undefined;
  if (Array.isArray(coefficients) && coefficients.length) {
    const d = blockNumbers(block.computed, result.p).estimateDecimals;
    tables.push({
      kind: 'coefficients',
      table: table(words.coefficientHeader, coefficients.map((c) => [c.term, formatFixed(c.estimate, d), formatFixed(c.se, d), formatFixed(c.t, 2), p(c.p), formatInterval(c.ci, d)])),
    });
  }
  const anova = details['anova_table'] as Record<string, {ss: number; df: number; ms?: number}> | undefined;
  if (anova && typeof anova === 'object') {
    const d = blockNumbers(block.computed, result.p).summaryDecimals;
    tables.push({
      kind: 'anova',
      table: table(words.anovaHeader, Object.entries(anova).map(([source, row]) => [source, formatFixed(row.ss, d), formatDf(row.df), row.ms === undefined ? '—' : formatFixed(row.ms, d)])),
    });
  }
  return tables;
}

function table(header: readonly string[], rows: readonly (readonly string[])[]): Table {
  const row = (cells: readonly string[]): TableRow => ({type: 'tableRow', children: cells.map((cell) => ({type: 'tableCell', children: [text(cell)]}))});
  return {type: 'table', align: header.map((_, i) => (i === 0 ? 'left' : 'right')), children: [row(header), ...rows.map(row)]};
}

function list(items: PhrasingContent[][]): BlockContent {
  return {type: 'list', ordered: false, spread: false, children: items.map((children): ListItem => ({type: 'listItem', spread: false, children: [paragraph(children)]}))};
}

function heading(depth: 1 | 2, value: string): RootContent {
  return {type: 'heading', depth, children: [text(value)]};
}

function paragraph(children: PhrasingContent[]): BlockContent & {type: 'paragraph'} {
  return {type: 'paragraph', children};
}

function strong(value: string): PhrasingContent {
  return {type: 'strong', children: [text(value)]};
}

function code(value: string): PhrasingContent {
  return {type: 'inlineCode', value};
}

function text(value: string): PhrasingContent {
  return {type: 'text', value};
}
