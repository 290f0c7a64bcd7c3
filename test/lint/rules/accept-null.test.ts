import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('accept-null', async () => {
  const {check} = await ruleChecker('accept-null');

  it('flags accepting, proving or confirming the null, with the phrase and its column', () => {
    expect(check('We accept the null hypothesis for drift.')).toEqual(['4:accept the null hypothesis']);
    expect(check('The test proves there is no drift.')).toEqual(['10:proves there is no drift']);
    expect(check('So the null hypothesis was accepted.')).toEqual(['8:null hypothesis was accepted']);
    expect(check('We accepted H0 at 7 days.')).toEqual(['4:accepted H0']);
    expect(check('This demonstrates that the means are equal.')).toEqual(['6:demonstrates that the means are equal']);
  });

  it('does not flag negated or correct wording', () => {
    expect(check('We did not accept the null hypothesis.')).toEqual([]);
    expect(check('A test never proves the null hypothesis.')).toEqual([]);
    expect(check('This does not prove that the means are equal.')).toEqual([]);
    expect(check('We fail to reject the null hypothesis ({{drift.p}}).')).toEqual([]);
    expect(check('Rather than accept the null, we report the interval.')).toEqual([]);
  });
});
