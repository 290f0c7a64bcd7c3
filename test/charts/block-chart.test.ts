import path from 'node:path';
import {beforeAll, describe, expect, it} from 'vitest';
import {compileReport, type CompiledReport} from '../../src/compile-report.js';
import {workspace} from '../helpers/workspace.js';
import {ids, items} from './svg-items.js';

// Invented, deterministic data (a formula, no randomness): these tests check
// which chart each block gets and what it says, not the statistics.
function fixture(): string {
  const lines = ['id,g3,g2,y,before,after,x,x2,outcome,ok_before,ok_after'];
  for (let i = 0; i < 36; i++) {
    const g3 = ['a', 'b', 'c'][i % 3]!;
    const g2 = i % 2 === 0 ? 'p' : 'q';
    const y = 20 + (g3 === 'c' ? 4 : g3 === 'b' ? 1 : 0) + (g2 === 'q' ? 1.5 : 0) + 3 * Math.sin(i * 1.7) + 2 * Math.cos(i * 0.9);
    const before = 50 + 4 * Math.sin(i * 2.3);
    const after = before + 1.2 + Math.cos(i * 1.3);
    const x = 10 + i * 0.5 + 2 * Math.sin(i);
    const x2 = 5 + Math.cos(i * 0.7) * 3;
    const outcome = (i * 7) % 5 < (g2 === 'q' ? 3 : 2) ? 'pass' : 'fail';
    const okBefore = i % 4 === 0 ? 'no' : 'yes';
    const okAfter = i % 6 === 0 || i % 4 === 1 ? 'no' : 'yes';
    lines.push([i + 1, g3, g2, y.toFixed(2), before.toFixed(1), after.toFixed(1), x.toFixed(2), x2.toFixed(2), outcome, okBefore, okAfter].join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** Each method's block, and how its chart's description starts. */
const blocks: Record<string, [string, RegExp | null]> = {
  'one-sample-t': ['y: y\nmu: 21', /^Histogram of y, n = 36, .*dashed line marks the null value 21/],
  'paired-t': ['y: [before, after]', /^Two panels\. .*The mean difference/],
  'wilcoxon-signed-rank': ['y: [before, after]', /^Two panels\. .*The Hodges–Lehmann shift/],
  'sign-test': ['y: [before, after]', /^Two panels\. .*The median difference/],
  'student-t': ['y: y\nby: g2\nfamily: pq', /^Box plot of y by g2: p n = 18, /],
  'welch-t': ['y: y\nby: g2\nfamily: pq', /^Box plot of y by g2: /],
  'mann-whitney': ['y: y\nby: g2', /^Box plot of y by g2: /],
  tost: ['y: y\nby: g2\nsmallest-effect: 4', /^Box plot of y by g2: /],
  anova: ['y: y\nby: g3', /^Box plot of y by g3: a n = 12, .*; b n = 12, .*; c n = 12, /],
  'welch-anova': ['y: y\nby: g3', /^Box plot of y by g3: /],
  'kruskal-wallis': ['y: y\nby: g3', /^Box plot of y by g3: /],
  levene: ['y: y\nby: g3', /^Box plot of y by g3: /],
  'brown-forsythe': ['y: y\nby: g3', /^Box plot of y by g3: /],
  'chi-square': ['y: outcome\nby: g3', /^Grouped bar chart of counts of outcome by g3: a: /],
  'fisher-exact': ['y: outcome\nby: g2', /^Grouped bar chart of counts of outcome by g2: /],
  'two-proportion': ['y: outcome\nby: g2\nsuccess: pass', /^Bar chart of the proportion of outcome = pass by g2, .*two-sided 95% Wilson CI/],
  mcnemar: ['y: [ok_before, ok_after]', /^Grouped bar chart of the subjects by ok_before/],
  binomial: ['y: outcome\nsuccess: pass\nmu: 0.5', /^Bar chart of the proportion of outcome = pass: \d+ of 36 .*null proportion 0\.500/],
  'one-proportion': ['y: outcome\nsuccess: pass\nmu: 0.5', /^Bar chart of the proportion of outcome = pass/],
  'chi-square-gof': ['y: g3', /^Grouped bar chart of the observed counts of g3 .*a 12 \(expected 12\.0\)/],
  pearson: ['x: x\ny: y', /^Scatter plot of y against x, 36 points\. The dashed least-squares line .* guide to the eye; .* linear association/],
  spearman: ['x: x\ny: y', /monotone \(rank\) association/],
  kendall: ['x: x\ny: y', /monotone \(rank\) association/],
  'linear-regression': ['x: x\ny: y', /^Scatter plot of y against x, 36 points, with the least-squares line .* pointwise 95% confidence band for the mean response/],
  'shapiro-wilk': ['y: y', /^Normal Q–Q plot of y, n = 36/],
  describe: ['y: y\nby: g3', null],
};

let compiled: CompiledReport;
const svgOf = (id: string) => compiled.files.get(`charts/${id}.svg`) ?? '';
const descOf = (svg: string) => /<desc id="[^"]*">([^<]*)<\/desc>/.exec(svg)?.[1] ?? '';

async function compileBlocks(extra = ''): Promise<CompiledReport> {
  const report = Object.entries(blocks).map(([method, [keys]]) => '```stet\n' + `id: b-${method}\ntest: ${method}\ndata: d.csv\n${keys}\n` + '```\n').join('\n');
  const more = '```stet\nid: b-multi\ntest: linear-regression\ndata: d.csv\nx: [x, x2]\ny: y\n```\n';
  const dir = await workspace({'report.md': `# Charts\n\n${report}\n${more}\n${extra}`, 'd.csv': fixture()});
  return compileReport(path.join(dir, 'report.md'), {now: () => new Date(0), formats: new Set(['md', 'html'])});
}

describe('blockChart with chart: auto', () => {
  beforeAll(async () => {
    compiled = await compileBlocks();
    expect(compiled.messages.map(String)).toEqual([]);
    // About 40 charts and every method of the catalogue: seconds on a busy machine.
  }, 120_000);

  for (const [method, [, description]] of Object.entries(blocks)) {
    it(`${method}: ${description ? 'the chart its design calls for' : 'no chart'}`, () => {
      const svg = svgOf(`b-${method}`);
      if (!description) {
        expect(compiled.files.has(`charts/b-${method}.svg`)).toBe(false);
        return;
      }
      expect(svg).toMatch(/^<svg [^>]*role="img"[^>]*><title id="[^"]+">[^<]+<\/title><desc /);
      expect(descOf(svg)).toMatch(description);
      const spec = JSON.parse(compiled.files.get(`charts/b-${method}.vl.json`) ?? 'null');
      expect(spec.$schema).toMatch(/vega-lite\/v6/);
      expect(spec.config.font).toMatch(/^Helvetica/);
    });
  }

  it('draws every observation of a group chart and each group mean with its interval', () => {
    const svg = svgOf('b-anova');
    expect(items(svg, 'points')).toHaveLength(36);
    expect(items(svg, 'means')).toHaveLength(3);
    expect(items(svg, 'intervals')).toHaveLength(3);
  });

  it('draws a paired design as lines per pair beside the differences', () => {
    const svg = svgOf('b-paired-t');
    expect(items(svg, 'pairs')).toHaveLength(36);
    expect(items(svg, 'difference-points')).toHaveLength(36);
    expect(items(svg, 'difference-reference')).toHaveLength(1);
  });

  it('adds the post-hoc pairs chart to k-group tests, and only to them', () => {
    for (const m of ['anova', 'welch-anova', 'kruskal-wallis']) {
      const svg = svgOf(`b-${m}-pairs`);
      expect(descOf(svg), m).toMatch(/^Interval plot of every pairwise difference in (means|mean ranks) of y/);
      expect(items(svg, 'estimates')).toHaveLength(3);
      expect(compiled.files.has(`charts/b-${m}-pairs.vl.json`)).toBe(true);
    }
    expect(items(svg('b-anova-pairs'), 'intervals')).toHaveLength(3);
    // Dunn's test has no simultaneous interval
    expect(items(svg('b-kruskal-wallis-pairs'), 'intervals')).toHaveLength(0);
    expect([...compiled.files.keys()].filter((f) => f.endsWith('-pairs.svg'))).toHaveLength(3);
    function svg(id: string) {
      return svgOf(id);
    }
  });

  it('draws a regression with several predictors as its slopes with intervals', () => {
    const svg = svgOf('b-multi');
    expect(descOf(svg)).toMatch(/^Interval plot of the 2 regression slopes for y, each with its 95% confidence interval/);
    expect(items(svg, 'estimates')).toHaveLength(2);
  });

  it('draws each family as a forest plot of its estimates', () => {
    const svg = compiled.files.get('charts/family-pq.svg') ?? '';
    expect(descOf(svg)).toMatch(/^Forest plot of the 2 estimates of family pq, .*b-student-t, difference in means \(q - p\): 1\.5 .*, p = /);
    expect(items(svg, 'estimates')).toHaveLength(2);
    expect(compiled.files.has('charts/family-pq.vl.json')).toBe(true);
  });

  it('inlines every chart in the HTML once, extras included, with no id shared between charts', () => {
    const html = compiled.files.get('report.html') ?? '';
    const svgs = [...compiled.files.entries()].filter(([f]) => /^charts\/b-.*\.svg$/.test(f));
    for (const [file] of svgs) {
      const id = file.slice('charts/'.length, -'.svg'.length);
      expect(html.split(`<figure class="stet-chart" id="fig-${id}">`)).toHaveLength(2);
    }
    const all = svgs.flatMap(([, svg]) => ids(svg));
    expect(new Set(all).size).toBe(all.length);
    const markdown = compiled.files.get('report.md') ?? '';
    expect(markdown).toContain('](charts/b-anova-pairs.svg)');
  });

  it('describes every chart by the wording rules of contract §7', () => {
    const forbidden = /accept(ed)? the null|prove[sd]?|no difference|probability that the null|due to chance|marginally significant|trend toward|p = \.000|observed power/i;
    const svgs = [...compiled.files].filter(([f]) => f.endsWith('.svg'));
    expect(svgs.length).toBeGreaterThanOrEqual(28);
    for (const [file, svg] of svgs) {
      expect(descOf(svg).length, file).toBeGreaterThan(40);
      expect(descOf(svg), file).not.toMatch(forbidden);
      expect(descOf(svg), file).not.toMatch(/NaN|undefined|Infinity/);
    }
  });

  it('writes the same bytes on a second compile', async () => {
    const again = await compileBlocks();
    for (const [file, text] of compiled.files) if (file.startsWith('charts/')) expect(again.files.get(file), file).toBe(text);
  }, 120_000);
});

describe('blockChart with an explicit chart', () => {
  it('honours a kind that fits the design', async () => {
    const report = [
      // A catalogue of chart kinds, not a family of tests.
      '---\nstet:\n  lint: {off: [undisclosed-multiplicity]}\n---',
      '```stet\nid: q\ntest: one-sample-t\ndata: d.csv\ny: y\nmu: 21\nchart: qq\n```',
      '```stet\nid: s\ntest: welch-t\ndata: d.csv\ny: y\nby: g2\nchart: strip\n```',
      '```stet\nid: d\ntest: describe\ndata: d.csv\ny: y\nby: g3\nchart: box\n```',
      '```stet\nid: n\ntest: anova\ndata: d.csv\ny: y\nby: g3\nchart: none\n```',
    ].join('\n\n');
    const dir = await workspace({'report.md': report, 'd.csv': fixture()});
    const result = await compileReport(path.join(dir, 'report.md'), {formats: new Set(['md'])});
    expect(result.messages.map(String)).toEqual([]);
    expect(descOf(result.files.get('charts/q.svg') ?? '')).toMatch(/^Normal Q–Q plot/);
    expect(descOf(result.files.get('charts/s.svg') ?? '')).toMatch(/^Strip plot of y by g2/);
    expect(descOf(result.files.get('charts/d.svg') ?? '')).toMatch(/^Box plot of y by g3/);
    expect([...result.files.keys()].filter((f) => f.startsWith('charts/n'))).toEqual([]);
  });

  it('rejects a kind that does not fit, at the chart key, with the kinds that do', async () => {
    const report = '# R\n\n```stet\nid: w\ntest: welch-t\ndata: d.csv\ny: y\nby: g2\nchart: scatter\n```\n';
    const dir = await workspace({'report.md': report, 'd.csv': fixture()});
    const result = await compileReport(path.join(dir, 'report.md'));
    expect(result.ok).toBe(false);
    const [message] = result.messages;
    expect(message?.ruleId).toBe('chart-not-applicable');
    expect(message?.line).toBe(9);
    expect(message?.reason).toMatch(/`chart: scatter` does not fit a `welch-t` block: it compares groups/);
    expect(message?.note).toBe('Charts that fit this block: `auto`, `box`, `strip`, `none`.');
  });
});
