import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('p-value-meaning', async () => {
  const {check} = await ruleChecker('p-value-meaning');

  it('flags p read as the probability of a hypothesis or of chance', () => {
    expect(check('p is the probability that the null hypothesis is true.')).toEqual(['10:probability that the null hypothesis is true']);
    expect(check('The delay is not due to chance ({{delivery.p}}).')).toEqual([]);
    expect(check('The delay is due to chance.')).toEqual(['11:is due to chance']);
    expect(check('There is a 3% chance that the result was due to chance.')).toHaveLength(1);
    expect(check('We are 99% certain that the effect is real.')).toHaveLength(1);
  });

  it('does not flag the correct reading or its negation', () => {
    expect(check('The p-value is not the probability that the null hypothesis is true.')).toEqual([]);
    expect(check('If the null hypothesis were true, data this extreme would occur with probability p.')).toEqual([]);
    expect(check('We are 95% confident in the method.')).toEqual([]);
  });
});
