import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {compileReport} from '../../src/compile-report.js';
import {workspace} from '../helpers/workspace.js';

// Invented data: two groups of a made-up measurement.
const csv = 'group,y\n' + [1.2, 2.3, 3.1, 2.2, 1.8, 2.9].map((v, i) => `${i % 2 ? 'b' : 'a'},${(v + (i % 2) * 0.4).toFixed(1)}`).join('\n') + '\n';

async function compile(style: string | undefined) {
  const front = style ? `---\nstet:\n  style: ${style}\n---\n` : '';
  const report = `${front}# R\n\n\`\`\`stet\nid: cmp\ntest: welch-t\ndata: d.csv\ny: y\nby: group\nshow: [sentence]\n\`\`\`\n\nIn short, {{cmp}}.\n`;
  const dir = await workspace({'report.md': report, 'd.csv': csv});
  const compiled = await compileReport(path.join(dir, 'report.md'), {out: path.join(dir, 'out'), now: () => new Date(0)});
  expect(compiled.messages.map(String)).toEqual([]);
  const json = JSON.parse(compiled.files.get('report.results.json')!);
  return {md: compiled.files.get('report.md')!, html: compiled.files.get('report.html')!, sentence: json.blocks.cmp.sentence as string};
}

describe('statistic symbols', () => {
  it('are italic in Markdown and HTML in the default style, plain in JSON', async () => {
    const {md, html, sentence} = await compile(undefined);
    expect(md).toMatch(/\(_t_\(\d+\.\d\) = −?\d\.\d\d, _p_ = \.\d{3}\)/);
    expect(md).toMatch(/In short, _t_\(/);
    expect(html).toMatch(/<em>t<\/em>\(\d+\.\d\)/);
    expect(sentence).toMatch(/\(t\(\d+\.\d\) = −?\d\.\d\d, p = \.\d{3}\)/);
    expect(sentence).not.toMatch(/[*_\uE000\uE001]/);
  });

  it('are upright with leading zeros in the engineering style', async () => {
    const {md, sentence} = await compile('engineering');
    expect(md).not.toMatch(/_t_|\*t\*/);
    expect(md).toMatch(/\(t\(\d+\.\d\) = −?\d\.\d\d, p = 0\.\d{3}\)/);
    expect(sentence).toMatch(/α = 0\.05/);
  });
});
