import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('near-significance', async () => {
  const {check} = await ruleChecker('near-significance');

  it('flags phrases that make a non-significant result nearly significant', () => {
    expect(check('It was marginally significant.')).toEqual(['8:marginally significant']);
    expect(check('Drift approached significance.')).toEqual(['7:approached significance']);
    expect(check('A trend toward significance and a trend towards significance.')).toHaveLength(2);
    expect(check('It was almost significant ({{early.p}}).')).toEqual(['8:almost significant']);
  });

  it('does not flag quoted mentions or plain statements', () => {
    expect(check('We never write “marginally significant”.')).toEqual([]);
    expect(check('The result was not statistically significant ({{early.p}}).')).toEqual([]);
    expect(check('Strength showed a trend over the 28 days.')).toEqual([]);
  });
});

describe('near-significance in other words', async () => {
  const {check} = await ruleChecker('near-significance');
  it('flags closeness, falling short, trending and a looser alpha', () => {
    expect(check('Wait times were close to being significant.')).toEqual(['17:close to being significant']);
    expect(check('A near-significant drop in failures.')).toEqual(['3:near-significant']);
    expect(check('The drop fell just short of significance.')).toEqual(['10:fell just short of significance']);
    expect(check('Failures were trending ({{early.p}}).')).toEqual(['10:were trending']);
    expect(check('We saw a non-significant trend in wait times.')).toEqual(['10:non-significant trend']);
    expect(check('It was significant at the 0.10 level.')).toEqual(['8:significant at the 0.10 level']);
  });
  it('leaves trends in time and plain misses', () => {
    expect(check('Costs were trending upward during the study.')).toEqual([]);
    expect(check('The test was not statistically significant, and we say no more ({{early.p}}).')).toEqual([]);
  });
});

describe('near-significance: tendencies and edges', async () => {
  const {check} = await ruleChecker('near-significance');
  it('flags them', () => {
    expect(check('The effect tended toward significance.')).toHaveLength(1);
    expect(check('Failures were on the cusp of significance.')).toHaveLength(1);
    expect(check('Wait times were slightly significant.')).toHaveLength(1);
  });
});
