/**
 * What charts cost: the sample report compiled by the plugin with and
 * without charts (vitest prints the ratio), and the charts alone.
 * Run with `npm run bench`.
 */
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import {VFile} from 'vfile';
import {bench, describe} from 'vitest';
import {blockChart} from '../../src/charts/block-chart.js';
import {familyCharts} from '../../src/charts/family-charts.js';
import remarkStet from '../../src/remark-stet.js';

const reportPath = path.resolve('samples/concrete/report.md');
const text = await readFile(reportPath, 'utf8');

async function compile(charts: boolean) {
  const file = new VFile({path: reportPath, value: text});
  const processor = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml']).use(remarkStet, {charts});
  await processor.run(processor.parse(file), file);
  // Without charts the sample's {{fig:…}} cross-references have nothing to name.
  const errors = file.messages.filter((m) => charts || !String(m.reason).startsWith('cross-reference'));
  if (errors.length > 0) throw new Error(String(errors[0]));
  return file.data.stet!;
}

const blocks = [...(await compile(false)).blocks.values()];

describe('sample report (samples/concrete)', () => {
  bench('compile without charts', async () => {
    await compile(false);
  });
  bench('compile with charts', async () => {
    await compile(true);
  });
});

describe('charts of the sample report alone', () => {
  bench(`render every block chart and family chart`, async () => {
    for (const block of blocks) await blockChart(block);
    await familyCharts(blocks);
  });
});
