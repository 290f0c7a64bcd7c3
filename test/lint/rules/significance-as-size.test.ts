import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('significance-as-size', async () => {
  const {check} = await ruleChecker('significance-as-size');

  it('flags significance graded like a size', () => {
    expect(check('The delay was highly significant.')).toEqual(['15:highly significant']);
    expect(check('It was very highly statistically significant.')).toEqual(['8:very highly statistically significant']);
    expect(check('The delay is more significant than the drift.')).toEqual(['14:more significant than']);
  });

  it('does not flag plain significance or size words elsewhere', () => {
    expect(check('The delay was statistically significant ({{delivery}}).')).toEqual([]);
    expect(check('The delay was very large ({{delivery.estimate}}) and significant.')).toEqual([]);
  });
});

describe('significance-as-size from a small p-value', async () => {
  const {check} = await ruleChecker('significance-as-size');
  it('flags a large effect read off a small p-value', () => {
    expect(check('Given how tiny the p-value is, the delay must be large.')).toEqual(['11:tiny the p-value is, the delay must be large']);
    expect(check('The smaller the p-value, the larger the effect.')).toEqual(['1:The smaller the p-value, the larger']);
  });
  it('leaves sentences that deny the inference', () => {
    expect(check('A small p-value does not mean the effect is large.')).toEqual([]);
    expect(check('A highly significant p-value says nothing about size.')).toEqual([]);
  });
});

describe('significance-as-size: p so small', async () => {
  const {check} = await ruleChecker('significance-as-size');
  it('flags a size read from how small p is, or how strong significance is', () => {
    expect(check('The p-value was so small that the effect must be big.')).toHaveLength(1);
    expect(check('The significance was overwhelming.')).toHaveLength(1);
    expect(check('The client knows the p-value is small, but the effect is not large.')).toEqual([]);
  });
});
