import {describe, expect, it} from 'vitest';
import {countChart} from '../../src/charts/count-chart.js';
import type {ComputedBlock} from '../../src/compute/compute-block.js';
import type {ContingencyDesign, ProportionDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {layerValues} from './svg-items.js';

/** The fields of a computed block that the bar charts read. */
function block(question: 'proportion' | 'independence', mu?: number): ComputedBlock {
  return {
    spec: {confidence: 0.95, mu, caption: undefined},
    question,
    outcome: undefined,
    names: {outcome: 'check', by: 'supplier', samples: []},
    units: undefined,
  } as unknown as ComputedBlock;
}

describe('countChart', () => {
  it('draws one proportion with its Wilson interval and the null proportion', () => {
    const design: ProportionDesign = {kind: 'proportion', successes: 7, trials: 20, success: 'fail'};
    const draft = countChart(block('proportion', 0.5), design);
    const [bar] = layerValues(draft.spec, 'bars');
    // scipy 1.17.1: stats.binomtest(7, 20).proportion_ci(0.95, method='wilson')
    expect(lre(Number(bar!['lower']), 0.1811918241010821)).toBeGreaterThanOrEqual(13);
    expect(lre(Number(bar!['upper']), 0.5671457233147637)).toBeGreaterThanOrEqual(13);
    expect(bar!['value']).toBe(0.35);
    expect(draft.description).toBe(
      'Bar chart of the proportion of check = fail: 7 of 20 (35%, two-sided 95% Wilson CI 18.1% to 56.7%); a dashed line marks the null proportion 0.500.',
    );
  });

  it('draws each group\'s proportion of successes for a proportion question, counts otherwise', () => {
    const design: ContingencyDesign = {kind: 'contingency', rows: ['fail', 'pass'], columns: ['North', 'South'], counts: [[0, 7], [12, 13]], success: 'fail'};
    const proportions = layerValues(countChart(block('proportion'), design).spec, 'bars');
    expect(proportions.map((b) => b['value'])).toEqual([0, 0.35]);
    // scipy 1.17.1: stats.binomtest(0, 12).proportion_ci(0.95, method='wilson').high
    expect(proportions[0]!['lower']).toBe(0);
    expect(lre(Number(proportions[0]!['upper']), 0.24249400665524085)).toBeGreaterThanOrEqual(13);
    const counts = layerValues(countChart(block('independence'), design).spec, 'bars');
    expect(counts.map((b) => [b['group'], b['category'], b['value']])).toEqual([
      ['North', 'fail', 0], ['North', 'pass', 12], ['South', 'fail', 7], ['South', 'pass', 13],
    ]);
  });
});
