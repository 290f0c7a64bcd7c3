import {describe, expect, it} from 'vitest';
import {workspace} from '../../helpers/workspace.js';
import {lintMarkdown, placed} from '../lint-fixture.js';
import {ruleChecker} from './rule-check.js';

describe('hand-typed-statistic', async () => {
  const {check, suggestions, rule} = await ruleChecker('hand-typed-statistic');

  it('is a warning with an explanation', () => {
    expect(rule.severity).toBe('warning');
    expect(rule.explanation).toMatch(/drift/);
  });

  it('flags typed p-values, test statistics, effect sizes and intervals, with their columns', () => {
    expect(check('Trucks from South were slower (p = 0.03).')).toEqual(['32:p = 0.03']);
    expect(check('Slower, p<.05.')).toEqual(['9:p<.05']);
    expect(check('It gave t(12) = 2.1 and F(2, 30) = 4.4.')).toEqual(['9:t(12) = 2.1', '25:F(2, 30) = 4.4']);
    expect(check('Related: r = .45, χ²(1) = 3.9, chi2(1)=3.9.')).toEqual(['10:r = .45', '19:χ²(1) = 3.9', '32:chi2(1)=3.9']);
    expect(check('Sizes d = 0.8 and g = 1.1.')).toEqual(['7:d = 0.8', '19:g = 1.1']);
    expect(check('Shift 3.1 MPa, 95% CI [1.2, 3.4].')).toEqual(['20:CI [1.2, 3.4]']);
    expect(check('Late share 12% (CI 8% to 17%).')).toEqual(['17:CI 8% to 17%']);
  });

  it('leaves alpha, sample sizes, measurements and references alone', () => {
    expect(check('We fixed α = 0.05 and n = 12 before the data.')).toEqual([]);
    expect(check('Sampled every t = 2.5 h, with g = 9.81 m/s².')).toEqual([]);
    expect(check('The result was {{strength.p}}, {{strength}}.')).toEqual([]);
    expect(check('The step = 0.5 of the gauge.')).toEqual([]);
    expect(check('Twelve cubes, 28 days, 20 °C.')).toEqual([]);
  });

  it('suggests the field of the block whose result has the typed value', () => {
    // drift: p = 0.8018…, statistic t = 0.2607 (see corpus-report.ts).
    expect(suggestions('The drift gave p = .80.')[0]).toContain('`{{drift.p}}`');
    expect(suggestions('The drift gave t(7) = 0.26.')[0]).toContain('`{{drift.statistic}}`');
    expect(suggestions('The delay was 15 min (95% CI [13.3, 16.7]).')[0]).toContain('`{{delivery.estimate.ci}}`');
    expect(suggestions('It gave p = 0.5.')[0]).toMatch(/such as `\{\{ID\.p\}\}`/);
    expect(suggestions('It gave p = 0.5 ({{early.estimate}}).')[0]).toMatch(/such as `\{\{early\.p\}\}`/);
  });

  it('places findings in lists, tables and wrapped lines; skips code', async () => {
    const dir = await workspace({'d.csv': 'x\n1\n2\n3\n'});
    const markdown = [
      '# Result p = .04',
      '',
      '- first item',
      '  wraps here, p = 0.2.',
      '',
      '| a | b |',
      '| - | - |',
      '| t = 2.31 | `p = 0.1` |',
      '',
      '```',
      'p = 0.3',
      '```',
      '',
      'Inline `p = .01` code and *p = .02* emphasis.',
    ].join('\n');
    const {findings} = await lintMarkdown(markdown, dir);
    expect(placed(findings)).toEqual([
      '1:10 hand-typed-statistic',
      '4:15 hand-typed-statistic',
      '8:3 hand-typed-statistic',
      '14:28 hand-typed-statistic',
    ]);
    expect(findings[1]!.place).toMatchObject({start: {line: 4, column: 15}, end: {line: 4, column: 22}});
  });
});

describe('hand-typed statistics in other words', async () => {
  const {check} = await ruleChecker('hand-typed-statistic');
  it('flags a bare p-value, a significance used as p, and named effect sizes', () => {
    expect(check('Depth was greater (p-value 0.03).')).toEqual(['20:p-value 0.03']);
    expect(check('The result had a significance of 0.003.')).toEqual(['18:significance of 0.003']);
    expect(check('The correlation between depth and yield was −0.41.')).toEqual(['5:correlation between depth and yield was −0.41']);
    expect(check('Line B failed more often, odds ratio 2.4.')).toEqual(['27:odds ratio 2.4']);
  });
  it('leaves alpha stated as a significance level', () => {
    expect(check('Tests were run at a significance of 0.05.')).toEqual([]);
    expect(check('We used a significance level of 0.05.')).toEqual([]);
  });
});

describe('test statistics named in words', async () => {
  const {check} = await ruleChecker('hand-typed-statistic');
  it('flags them, and ≈ as a relation', () => {
    expect(check('The t statistic of 2.31 was computed by hand.')).toEqual(['5:t statistic of 2.31']);
    expect(check('The chi-square value was 5.12.')).toEqual(['5:chi-square value was 5.12']);
    expect(check('They were related (r ≈ 0.44).')).toEqual(['20:r ≈ 0.44']);
  });
  it('leaves mentions without a value', () => {
    expect(check('The chi-square test was chosen because counts were large.')).toEqual([]);
    expect(check('The ratio of 2.5 to 1 was used for mixing.')).toEqual([]);
  });
});
