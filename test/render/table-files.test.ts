import {mkdtemp, readdir} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {cli} from '../helpers/workspace.js';

const sample = new URL('../../samples/concrete/report.md', import.meta.url).pathname;

describe('building the sample with --to md,html,json,tex', () => {
  it('writes the report, appendix, values and a CSV and a .tex table for every block', async () => {
    const out = await mkdtemp(path.join(tmpdir(), 'stet-tables-'));
    const run = await cli('build', sample, '--out', out, '--to', 'md,html,json,tex');
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const written = new Set((await readdir(out, {recursive: true})).map((file) => file.split(path.sep).join('/')));
    const ids = ['supplier-28d', 'quarrybank-spec', 'supplier-7d', 'slump-summary', 'slump', 'curing', 'regimes', 'wc', 'deliveries'];
    const expected = [
      'report.md', 'report.html', 'report.results.json', 'report.appendix.html', 'report.appendix.md', 'report.values.tex',
      ...ids.flatMap((id) => [`tables/${id}.csv`, `tables/${id}.tex`]),
    ];
    expect(expected.filter((file) => !written.has(file))).toEqual([]);
  });
});
