import {samplesOf} from '../compute/compute-block.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {capitalize} from '../interpret/wording.js';
import {boxPlotSpec} from './box-plot.js';
import {renderSvg} from './render-svg.js';

/** A rendered chart of a block: the SVG and its text alternative. */
export interface BlockChart {
  readonly svg: string;
  readonly alt: string;
}

/**
 * The chart `chart: auto` picks for a block, or undefined when the block has
 * none: for now a box plot with every point for two-group and paired blocks.
 */
export async function blockChart(block: InterpretedBlock): Promise<BlockChart | undefined> {
  const {spec, design, units, names} = block.computed;
  if (spec.chart === 'none' || !spec.show.has('chart')) return undefined;
  if (design.kind !== 'two-group' && design.kind !== 'paired' && design.kind !== 'k-group') return undefined;
  const paired = design.kind === 'paired';
  // Boxes are named as in the sentences (a paired design's column labels).
  const samples = samplesOf(design).map((s, i) => ({label: names.samples[i] ?? s.label, values: s.values}));
  const yTitle = paired ? (units ? capitalize(units) : 'Measurement') : capitalize(names.outcome);
  const groups = samples.map((s) => `${s.label} (n = ${s.values.length})`).join(' and ');
  const alt =
    `Box plot of ${paired ? 'the paired measurements' : names.outcome}${units ? ` in ${units}` : ''} for ${groups}; ` +
    `every observation is a point, boxes show the median and quartiles, a diamond marks each mean${paired ? ', and lines join the two measurements of each pair' : ''}.`;
  const rendered = await renderSvg(boxPlotSpec({samples, yTitle, ...(paired || !units ? {} : {units}), paired}), {
    title: spec.caption ?? `${block.result.title}: ${yTitle}`,
    description: alt,
    idPrefix: `stet-${spec.id}`,
  });
  return {svg: rendered.svg, alt};
}

