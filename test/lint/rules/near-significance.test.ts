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
