import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('contradicts-decision', async () => {
  const {check, rule, suggestions} = await ruleChecker('contradicts-decision');

  it('is an error', () => expect(rule.severity).toBe('error'));

  it('flags "significant" with a fail-to-reject block, and the reverse', () => {
    expect(check('Early strength was significantly lower ({{early.p}}).')).toEqual(['20:significantly']);
    expect(check('The depots did not differ significantly ({{delivery.p}}).')).toEqual(['27:significantly']);
    expect(check('No significant difference in 28-day strength ({{strength}}).')).toEqual(['1:No significant']);
    expect(check('We reject the null hypothesis of no drift ({{drift.p}}).')).toEqual(['1:We reject the null']);
    expect(suggestions('Early strength was significantly lower ({{early.p}}).')[0]).toContain('{{early.sentence}}');
  });

  it('reads each part of a sentence with its own reference', () => {
    expect(check('Strength differed significantly at 28 days ({{strength.p}}) but not at 7 days ({{early.p}}).')).toEqual([]);
    expect(check('Strength differed significantly at 7 days ({{early.p}}) but not at 28 days ({{strength.p}}).')).toEqual(['19:significantly']);
  });

  it('does not flag agreeing words, lay uses, near-significance or comparisons within a block', () => {
    expect(check('The delay was statistically significant ({{delivery}}).')).toEqual([]);
    expect(check('Drift was not statistically significant ({{drift.p}}).')).toEqual([]);
    expect(check('A significant portion of trucks came early ({{drift.n}}).')).toEqual([]);
    expect(check('It was marginally significant ({{early.p}}).')).toEqual([]);
    expect(check('We set the significance level before the data ({{early.alpha}}).')).toEqual([]);
    expect(check('The slabs were compared ({{early.posthoc}}) and were significantly different.')).toEqual([]);
  });
});

describe('contradicts-decision across a turn', async () => {
  const {check} = await ruleChecker('contradicts-decision');
  it('does not lend one part\'s reference to another part', () => {
    expect(check('Although the early test was not significant, the 28-day difference was significant ({{strength.p}}).')).toEqual([]);
    expect(check('Although the 28-day difference was significant ({{strength.p}}), the early test was not significant.')).toEqual([]);
  });
});

describe('contradicts-decision with two blocks in one part', async () => {
  const {check} = await ruleChecker('contradicts-decision');
  it('reads a claim as about the nearest reference', () => {
    expect(check('The 28-day test ({{strength.p}}) was significant, and the 7-day test ({{early.p}}) was not.')).toEqual([]);
    expect(check('The 7-day test ({{early.p}}) was significant, and the 28-day test ({{strength.p}}) was too.')).toEqual(['34:significant']);
  });
});

describe('contradicts-decision in other words', async () => {
  const {check} = await ruleChecker('contradicts-decision');
  it('reads a rejected or retained null hypothesis with its content', () => {
    expect(check('The null hypothesis of equal early strength was rejected ({{early.p}}).')).toHaveLength(1);
    expect(check('The null hypothesis of equal strength was retained ({{strength.p}}).')).toHaveLength(1);
    expect(check('The null hypothesis of equal early strength was not rejected ({{early.p}}).')).toEqual([]);
  });
  it('leaves phrases that are near-significance, not claims', () => {
    expect(check('Early strength was close to being significant ({{early.p}}).')).toEqual([]);
    expect(check('It was significant at the 10% level ({{early.p}}).')).toEqual([]);
  });
});

describe('contradicts-decision with alpha and evidence', async () => {
  const {check} = await ruleChecker('contradicts-decision');
  it('reads p against alpha and "no evidence of" as claims', () => {
    expect(check('The p-value was below alpha ({{early.p}}).')).toHaveLength(1);
    expect(check('We found no evidence of a difference ({{strength.p}}).')).toHaveLength(1);
    expect(check('We found no evidence of a difference ({{early.p}}).')).toEqual([]);
    expect(check('Wait times were slightly significant ({{early.p}}).')).toEqual([]);
  });
});
