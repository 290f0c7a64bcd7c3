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

describe('p-value-meaning in other words', async () => {
  const {check} = await ruleChecker('p-value-meaning');
  it('flags chance put in other words and a probability given to the null', () => {
    expect(check('It is the likelihood that the drop happened randomly.')).toEqual(['11:likelihood that the drop happened randomly']);
    expect(check('The p-value rules out the possibility that the gap is a coincidence.')).toEqual(['27:possibility that the gap is a coincidence']);
    expect(check('The null hypothesis has a 2% probability of being true.')).toEqual(['5:null hypothesis has a 2% probability of being true']);
  });
  it('leaves chance that is not about the result', () => {
    expect(check('The chance that a joint fails during handling is small.')).toEqual([]);
    expect(check('If the null hypothesis were true, data this extreme would be rare ({{delivery.p}}).')).toEqual([]);
  });
});

describe('p-value-meaning: the chance of being wrong', async () => {
  const {check} = await ruleChecker('p-value-meaning');
  it('flags a percentage chance that the conclusion is wrong', () => {
    expect(check('There is a 4% chance that we are wrong about the clinics.')).toHaveLength(1);
    expect(check('The difference is probably due to chance ({{early.p}}).')).toHaveLength(1);
    expect(check('Alpha is the chance of rejecting a true null hypothesis.')).toEqual([]);
  });
});
