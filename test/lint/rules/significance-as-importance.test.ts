import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('significance-as-importance', async () => {
  const {check} = await ruleChecker('significance-as-importance');

  it('flags importance inferred from significance alone', () => {
    expect(check('It is significant, so it matters.')).toEqual(['7:significant, so it matters']);
    expect(check('The delay is statistically significant and therefore important.')).toEqual(['14:statistically significant and therefore important']);
    expect(check('Since the delay is significant, it is large enough to act on.')).toHaveLength(1);
  });

  it('does not flag when the size is beside the claim, or significance is denied', () => {
    expect(check('It is significant, and its size ({{delivery.estimate}}) matters for scheduling.')).toEqual([]);
    expect(check('It is significant, so it matters: the delay of 15 minutes exceeds our 5-minute margin.')).toEqual([]);
    expect(check('It is not significant, so it is not important to act.')).toEqual([]);
  });
});
