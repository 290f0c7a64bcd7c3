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

describe('accept-null in other words', async () => {
  const {check} = await ruleChecker('accept-null');
  it('flags proofs of no effect, conclusions that H0 is true and a null that holds', () => {
    expect(check('The records establish that rebalancing has no effect on wear.')).toEqual(['13:establish that rebalancing has no effect']);
    expect(check('We conclude that H0 is true.')).toEqual(['4:conclude that H0 is true']);
    expect(check('The null hypothesis of equal waits holds ({{early.p}}).')).toEqual(['5:null hypothesis of equal waits holds']);
  });
  it('leaves suppositions and negations', () => {
    expect(check('If the null hypothesis holds, such readings are rare ({{drift.p}}).')).toEqual([]);
    expect(check('We cannot conclude that H0 is true.')).toEqual([]);
    expect(check('The client will accept the report.')).toEqual([]);
  });
});

describe('accept-null: shown to be true', async () => {
  const {check} = await ruleChecker('accept-null');
  it('flags a null shown to be true', () => {
    expect(check('The results show the null hypothesis to be true.')).toHaveLength(1);
    expect(check('The results do not show the null hypothesis to be true.')).toEqual([]);
  });
});
