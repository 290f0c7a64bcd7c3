/**
 * Forest plots of families: each declared `family` as one chart of its
 * blocks' estimates with their intervals (`charts/family-NAME.svg`).
 */
import type {InterpretedBlock} from '../interpret/result-record.js';
import {capitalize, chartWords} from '../interpret/wording.js';
import {decimalsForWidth, pClause} from '../interpret/format-number.js';
import {intervalText, levelText, quantity, withUnits, type ChartDraft} from './chart-draft.js';
import {intervalPlotSpec} from './interval-plot.js';
import {renderDraft, type RenderedChart} from './render-draft.js';

/** Where a family's chart is written, relative to the output folder: a safe file name from any family name. */
export function familyChartPath(name: string): string {
  return `charts/family-${name.toLowerCase().replace(/[^a-z0-9_-]+/g, '-')}`;
}

/** The forest plot of every family with at least one estimate, by family name, in document order. */
export async function familyCharts(blocks: Iterable<InterpretedBlock>): Promise<ReadonlyMap<string, RenderedChart>> {
  const families = new Map<string, InterpretedBlock[]>();
  for (const block of blocks) {
    const name = block.computed.spec.family;
    if (name === undefined || !block.computed.outcome?.estimate) continue;
    families.set(name, [...(families.get(name) ?? []), block]);
  }
  const charts = new Map<string, RenderedChart>();
  for (const [name, members] of families) {
    charts.set(name, await renderDraft(familyDraft(name, members), familyChartPath(name).replace('charts/', 'stet-')));
  }
  return charts;
}

export function familyDraft(name: string, members: readonly InterpretedBlock[]): ChartDraft {
  const estimates = members.map((m) => ({id: m.computed.spec.id, estimate: m.computed.outcome!.estimate!, block: m}));
  const units = new Set(estimates.map((e) => e.estimate.units));
  const shared = units.size === 1 ? [...units][0] : undefined;
  const names = new Set(estimates.map((e) => e.estimate.name.replace(/\s*\(.*\)$/, '')));
  const xTitle = names.size === 1 ? capitalize([...names][0]!) : chartWords.family.axis;
  const rows = estimates.map((e) => ({label: e.id, estimate: e.estimate.value, ci: e.estimate.ci}));
  const parts = estimates.map((e) => {
    const finite = e.estimate.ci.filter(Number.isFinite);
    const decimals = finite.length === 2 ? decimalsForWidth(finite[1]! - finite[0]!) : 2;
    const {p, p_adjusted: adjusted} = e.block.result;
    const pText = typeof adjusted === 'number' ? `, ${pClause(adjusted, undefined, chartWords.adjustedP)}` : typeof p === 'number' ? `, ${pClause(p)}` : '';
    return `${e.id}, ${e.estimate.name}: ${quantity(e.estimate.value, decimals, e.estimate.units)} (${intervalText(e.estimate.ci, decimals, e.estimate.level)})${pText}`;
  });
  // Ratios (odds ratio, risk ratio) have no effect at 1, differences at 0.
  const reference = estimates.every((e) => /ratio/i.test(e.estimate.name)) ? 1 : 0;
  const levels = new Set(estimates.map((e) => levelText(e.estimate.level)));
  return {
    spec: intervalPlotSpec({rows, reference, xTitle: withUnits(xTitle, shared)}),
    title: chartWords.family.title(name),
    description: chartWords.family.description(estimates.length, name, [...levels], reference === 1, parts),
  };
}
