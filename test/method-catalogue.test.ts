import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {beforeAll, describe, expect, it} from 'vitest';
import {buildReport} from '../src/build-report.js';
import {methodIds} from '../src/methods/registry.js';
import {workspace} from './helpers/workspace.js';

// Invented, deterministic data (a formula, no randomness): this test checks
// that every method builds in a report with the fields of contract §6, not
// its statistics (each method's own test does that against a source).
function fixture(): string {
  const lines = ['id,g3,g2,y,before,after,x,outcome,ok_before,ok_after'];
  for (let i = 0; i < 36; i++) {
    const g3 = ['a', 'b', 'c'][i % 3]!;
    const g2 = i % 2 === 0 ? 'p' : 'q';
    const noise = 3 * Math.sin(i * 1.7) + 2 * Math.cos(i * 0.9);
    const y = 20 + (g3 === 'c' ? 4 : g3 === 'b' ? 1 : 0) + (g2 === 'q' ? 1.5 : 0) + noise;
    const before = 50 + 4 * Math.sin(i * 2.3);
    const after = before + 1.2 + Math.cos(i * 1.3);
    const x = 10 + i * 0.5 + 2 * Math.sin(i);
    const outcome = (i * 7) % 5 < (g2 === 'q' ? 3 : 2) ? 'pass' : 'fail';
    const okBefore = i % 4 === 0 ? 'no' : 'yes';
    const okAfter = i % 6 === 0 || i % 4 === 1 ? 'no' : 'yes';
    lines.push([i + 1, g3, g2, y.toFixed(2), before.toFixed(1), after.toFixed(1), x.toFixed(2), outcome, okBefore, okAfter].join(','));
  }
  return `${lines.join('\n')}\n`;
}

const blocks: Record<string, string> = {
  'one-sample-t': 'y: y\nmu: 21',
  'paired-t': 'y: [before, after]',
  'wilcoxon-signed-rank': 'y: [before, after]',
  'sign-test': 'y: [before, after]',
  'student-t': 'y: y\nby: g2',
  'welch-t': 'y: y\nby: g2',
  'mann-whitney': 'y: y\nby: g2',
  tost: 'y: y\nby: g2\nsmallest-effect: 4',
  anova: 'y: y\nby: g3',
  'welch-anova': 'y: y\nby: g3',
  'kruskal-wallis': 'y: y\nby: g3',
  levene: 'y: y\nby: g3',
  'brown-forsythe': 'y: y\nby: g3',
  'chi-square': 'y: outcome\nby: g3',
  'fisher-exact': 'y: outcome\nby: g2',
  'two-proportion': 'y: outcome\nby: g2\nsuccess: pass',
  mcnemar: 'y: [ok_before, ok_after]',
  binomial: 'y: outcome\nsuccess: pass\nmu: 0.5',
  'one-proportion': 'y: outcome\nsuccess: pass\nmu: 0.5',
  'chi-square-gof': 'y: g3',
  pearson: 'x: x\ny: y',
  spearman: 'x: x\ny: y',
  kendall: 'x: x\ny: y',
  'linear-regression': 'x: x\ny: y',
  'shapiro-wilk': 'y: y',
  describe: 'y: y\nby: g3',
  auto: 'y: y\nby: g3',
};

/** Further `auto` designs, checked for the method chosen. */
const autoBlocks: Record<string, [string, string]> = {
  'auto-pair': ['y: [before, after]', 'paired-t'],
  'auto-two': ['y: y\nby: g2', 'welch-t'],
  'auto-xy': ['x: x\ny: y', 'pearson'],
  'auto-table': ['y: outcome\nby: g3', 'chi-square'],
  'auto-one': ['y: y\nmu: 20', 'one-sample-t'],
};

const diagnostics = new Set(['shapiro-wilk', 'levene', 'brown-forsythe']);
/** Independence and fit have no estimate in the data's units; their effect is the estimate. */
const withoutEstimate = new Set(['chi-square', 'chi-square-gof']);

const forbidden = /accept(ed)? the null|prove[sd]? the null|no difference|probability that the null|due to chance|marginally significant|trend toward|p = \.000|observed power/i;

describe('every method of the catalogue builds in a report', () => {
  let results: Record<string, Record<string, any>>;
  let markdown: string;

  beforeAll(async () => {
    const report = Object.entries(blocks)
      .map(([method, keys]) => '```stet\n' + `id: b-${method}\ntest: ${method}\ndata: d.csv\n${keys}\nchart: none\n` + '```\n')
      .join('\n') +
      Object.entries(autoBlocks).map(([id, [keys]]) => '```stet\n' + `id: ${id}\ntest: auto\ndata: d.csv\n${keys}\nchart: none\n` + '```\n').join('\n');
    // A catalogue of unrelated tests, not a family: the lint's multiplicity warning does not apply.
    const front = '---\nstet:\n  lint: {off: [undisclosed-multiplicity]}\n---\n\n';
    const dir = await workspace({'report.md': `${front}# All methods\n\n${report}`, 'd.csv': fixture()});
    const result = await buildReport(path.join(dir, 'report.md'), {out: path.join(dir, 'out')});
    expect(result.messages.map(String)).toEqual([]);
    results = JSON.parse(await readFile(path.join(dir, 'out/report.results.json'), 'utf8')).blocks;
    markdown = await readFile(path.join(dir, 'out/report.md'), 'utf8');
  });

  it('covers every method id of contract §3', () => {
    expect(Object.keys(blocks).sort()).toEqual([...methodIds].sort());
  });

  for (const method of Object.keys(blocks).filter((m) => m !== 'describe')) {
    it(`${method}: statistic, p, decision and a sentence by the rules`, () => {
      const block = results[`b-${method}`]!;
      expect(block['statistic'].value).toEqual(expect.any(Number));
      expect(block['p']).toBeGreaterThanOrEqual(0);
      expect(block['p']).toBeLessThanOrEqual(1);
      expect(['reject', 'fail-to-reject']).toContain(block['decision']);
      expect(block['decision']).toBe(block['p'] <= block['alpha'] ? 'reject' : 'fail-to-reject');
      expect(block['sentence']).toMatch(/α = \.05/);
      expect(block['sentence']).toMatch(block['decision'] === 'reject' ? /statistically significant|equivalent within/ : /no statistically significant|could not establish/);
      expect(block['sentence']).not.toMatch(forbidden);
      expect(block['rows'].used).toBeGreaterThan(0);
      // Contract §7: an estimate with its interval where the question has one
      // in the data's terms, and a standardized effect with its interval.
      if (!diagnostics.has(method) && !withoutEstimate.has(method)) expect(block['estimate'].ci, method).toHaveLength(2);
      if (!diagnostics.has(method)) {
        expect(block['effect'].name, method).toEqual(expect.any(String));
        if (method !== 'kruskal-wallis') expect(block['effect'].ci, method).toHaveLength(2);
      }
    });
  }

  it('adds the method-specific fields of contract §6', () => {
    expect(results['b-anova']).toHaveProperty('anova_table.between.ss');
    expect(results['b-anova']).toHaveProperty('anova_table.within.df', 33);
    expect(results['b-anova']).toHaveProperty('r_squared');
    expect(results['b-linear-regression']!['coefficients']).toHaveLength(2);
    expect(results['b-linear-regression']).toHaveProperty('r_squared');
    expect(results['b-linear-regression']).toHaveProperty('residual_sd');
    expect(results['b-pearson']!['estimate'].value).toBeGreaterThanOrEqual(-1);
    expect(results['b-auto']!['method']).toBe('welch-anova');
    expect(results['b-auto']!['auto'].reason).toMatch(/3 independent groups/);
    expect(results['b-describe']).not.toHaveProperty('decision');
    expect(results['b-describe']!['groups'].a.lag1_autocorrelation).toEqual(expect.any(Number));
    expect(results['b-welch-t']!['groups']).toHaveProperty('p');
  });

  it('chooses from the declared design with `test: auto`, and says why', () => {
    for (const [id, [, method]] of Object.entries(autoBlocks)) {
      expect(results[id]!['method'], id).toBe(method);
      expect(results[id]!['auto'].reason, id).toEqual(expect.any(String));
      expect(results[id]!['sentence'], id).toMatch(/chosen from the declared design/);
    }
    expect(results['auto-xy']!['spearman'].rho).toBeCloseTo(results['b-spearman']!['estimate'].value, 14);
    expect(results['auto-xy']!['sentence']).toMatch(/Spearman’s rank correlation, reported beside it, was ρ = /);
  });

  it('runs assumption checks beside normal-theory tests without switching them', () => {
    const checks = results['b-student-t']!['assumptions'] as {check: string}[];
    expect(checks.map((c) => c.check).sort()).toEqual(['levene', 'shapiro-wilk', 'shapiro-wilk']);
    expect(results['b-student-t']!['method']).toBe('student-t');
  });

  it('resolves every block in the Markdown', () => {
    expect(markdown).not.toContain('```stet');
  });
});
