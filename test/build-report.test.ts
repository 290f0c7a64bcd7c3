import {mkdtemp, readFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import jStat from 'jstat';
import {beforeAll, describe, expect, it} from 'vitest';
import {buildReport} from '../src/build-report.js';
import {lre} from './helpers/lre.js';
import {snapshotFolder} from './helpers/workspace.js';

const sample = new URL('../samples/concrete/', import.meta.url).pathname;

/** The sample's CSV read naively, independent of stet's data stage. */
async function cylinders() {
  const text = await readFile(path.join(sample, 'data/cylinders.csv'), 'utf8');
  return text.trim().split('\n').slice(1).map((line) => {
    const [, supplier, , age, strength] = line.split(',');
    return {supplier: supplier!, age: Number(age), strength: strength === 'NA' ? null : Number(strength)};
  });
}

function meanSd(values: number[]) {
  const mean = values.reduce((a, b) => a + b, 0) / values.length;
  const variance = values.reduce((a, b) => a + (b - mean) ** 2, 0) / (values.length - 1);
  return {n: values.length, mean, sd: Math.sqrt(variance)};
}

interface Results {
  stet: {version: string};
  datasets: Record<string, {file: string; sha256: string; rows: number; columns: string[]}>;
  blocks: Record<string, Record<string, any>>;
}

describe('building the sample report', () => {
  let out: string;
  let results: Results;

  beforeAll(async () => {
    out = await mkdtemp(path.join(tmpdir(), 'stet-sample-'));
    const result = await buildReport(path.join(sample, 'report.md'), {out, now: () => new Date('2026-01-02T03:04:05Z')});
    expect(result.messages.map(String)).toEqual([]);
    expect(result.ok).toBe(true);
    results = JSON.parse(await readFile(path.join(out, 'report.results.json'), 'utf8')) as Results;
  });

  it('computes the 28-day Welch test as an independent computation does', async () => {
    const rows = (await cylinders()).filter((r) => r.age === 28 && r.strength !== null);
    const a = meanSd(rows.filter((r) => r.supplier === 'Northfield').map((r) => r.strength!));
    const b = meanSd(rows.filter((r) => r.supplier === 'Quarrybank').map((r) => r.strength!));
    const va = a.sd ** 2 / a.n;
    const vb = b.sd ** 2 / b.n;
    const t = (b.mean - a.mean) / Math.sqrt(va + vb);
    const df = (va + vb) ** 2 / (va ** 2 / (a.n - 1) + vb ** 2 / (b.n - 1));
    // jStat 1.9.6 studentt.cdf as the reference library (about 1e-10 at ordinary df).
    const p = 2 * jStat.studentt.cdf(-Math.abs(t), df);
    const block = results.blocks['supplier-28d']!;
    expect(block['method']).toBe('welch-t');
    expect(lre(block['statistic'].value, t)).toBeGreaterThanOrEqual(12);
    expect(lre(block['df'], df)).toBeGreaterThanOrEqual(12);
    expect(lre(block['p'], p)).toBeGreaterThanOrEqual(8);
    expect(lre(block['groups'].Northfield.mean, a.mean)).toBeGreaterThanOrEqual(13);
    expect(lre(block['groups'].Quarrybank.sd, b.sd)).toBeGreaterThanOrEqual(12);
    expect(block['estimate'].value).toBeCloseTo(b.mean - a.mean, 12);
    expect(block['estimate'].units).toBe('MPa');
    expect(block['rows']).toEqual({used: 27, excluded_missing: 1, excluded_filter: 28, excluded_levels: 0});
    expect(block['decision']).toBe(p <= 0.05 ? 'reject' : 'fail-to-reject');
  });

  it('writes results JSON with the shape of contract §6', () => {
    expect(results.stet.version).toMatch(/^\d+\.\d+\.\d+/);
    expect(results.datasets['cylinders']).toMatchObject({file: 'data/cylinders.csv', rows: 56});
    expect(results.datasets['cylinders']!.sha256).toMatch(/^[0-9a-f]{64}$/);
    for (const [id, block] of Object.entries(results.blocks)) {
      expect(block, id).toHaveProperty('groups');
      expect(block, id).toHaveProperty('rows.used');
      expect(typeof block['sentence'], id).toBe('string');
      if (block['method'] === 'describe') {
        expect(block, id).not.toHaveProperty('decision');
        continue;
      }
      expect(['reject', 'fail-to-reject'], id).toContain(block['decision']);
      for (const key of ['statistic', 'df', 'p', 'p_adjusted', 'alpha', 'alternative', 'estimate', 'effect']) {
        expect(block, `${id}.${key}`).toHaveProperty(key);
      }
      expect(block['effect'].name).toEqual(expect.any(String));
      expect(block['estimate'].ci).toHaveLength(2);
      if (block['method'].endsWith('-t')) expect(block['effect'].name).toBe('hedges-g');
    }
  });

  it('includes both a significant and a non-significant result, worded by the rules', () => {
    const significant = results.blocks['supplier-28d']!;
    const notSignificant = results.blocks['supplier-7d']!;
    expect(significant['decision']).toBe('reject');
    expect(significant['sentence']).toMatch(/statistically significant/);
    expect(significant['sentence']).toMatch(/null hypothesis of equal population means is rejected/);
    expect(notSignificant['decision']).toBe('fail-to-reject');
    expect(notSignificant['sentence']).toMatch(/no statistically significant difference/);
    expect(notSignificant['sentence']).toMatch(/does not show that the population means are equal/);
    expect(notSignificant['sentence']).toMatch(/power to detect a difference of 2 MPa/);
    // The two supplier comparisons form a Holm-adjusted family.
    expect(significant['p_adjusted']).toBeCloseTo(Math.min(1, 2 * significant['p']), 14); // Holm: smallest p times 2
    expect(notSignificant['p_adjusted']).toBe(Math.max(notSignificant['p'], significant['p_adjusted']));
    expect(significant['sentence']).toMatch(/Holm-adjusted/);
    for (const block of Object.values(results.blocks)) {
      expect(block['sentence']).not.toMatch(/accept|prove|no difference|p = \.000|marginally|trend toward|observed power|due to chance/i);
    }
  });

  it('leaves no unresolved reference and one inline SVG per charted block', async () => {
    const markdown = await readFile(path.join(out, 'report.md'), 'utf8');
    const html = await readFile(path.join(out, 'report.html'), 'utf8');
    expect(markdown).not.toContain('{{');
    expect(markdown).not.toContain('```stet');
    expect(html).not.toContain('{{');
    // regimes-pairs: the post-hoc comparisons after the regimes ANOVA.
    const charted = ['supplier-28d', 'quarrybank-spec', 'supplier-7d', 'curing', 'regimes', 'regimes-pairs', 'wc-slope', 'deliveries'];
    // …and the family's forest plot, placed after the family's last block.
    expect(html.match(/<svg/g)).toHaveLength(charted.length + 1);
    expect(html).toMatch(/<figure class="stet-chart" id="fig-family-suppliers"><svg[^]*?<figcaption class="stet-caption"><strong>Figure \d\.<\/strong> The 2 estimates of family “suppliers”/);
    // Chart text is plain: no symbol marks from sentence formatting.
    expect(html).not.toMatch(/[\uE000\uE001]/);
    for (const id of charted) {
      expect(await readFile(path.join(out, `charts/${id}.svg`), 'utf8')).toMatch(/^<svg/);
      expect(JSON.parse(await readFile(path.join(out, `charts/${id}.vl.json`), 'utf8'))).toHaveProperty('$schema');
    }
    // The family's forest plot is written beside them.
    expect(await readFile(path.join(out, 'charts/family-suppliers.svg'), 'utf8')).toMatch(/^<svg/);
    expect(html).toContain('Statistical significance is not a decision rule by itself');
    expect(html).toContain(results.datasets['cylinders']!.sha256);
  });

  it('builds byte-identical output again, apart from the build time', async () => {
    const again = await mkdtemp(path.join(tmpdir(), 'stet-sample-'));
    await buildReport(path.join(sample, 'report.md'), {out: again, now: () => new Date('2027-05-06T07:08:09Z')});
    const first = await snapshotFolder(out);
    const second = await snapshotFolder(again);
    expect([...second.keys()].sort()).toEqual([...first.keys()].sort());
    for (const [file, content] of first) {
      const normalize = (text: string) => text.replace(/\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z/g, 'TIME');
      expect(normalize(second.get(file)!), file).toBe(normalize(content));
      if (file.endsWith('.html')) expect(second.get(file)).not.toBe(content);
    }
  });
});
