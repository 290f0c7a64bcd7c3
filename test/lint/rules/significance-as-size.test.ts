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
