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

describe('significance-as-importance, cause first', async () => {
  const {check} = await ruleChecker('significance-as-importance');
  it('flags action or importance drawn from significance alone', () => {
    expect(check('Since the delay is significant ({{delivery.p}}), the managers must act on it.')).toEqual(['1:Since the delay is significant ({{delivery.p}}), the managers must act on']);
    expect(check('Being significant, the effect is of practical importance.')).toEqual(['1:Being significant, the effect is of practical importance']);
  });
  it('leaves inferences that are negated', () => {
    expect(check('Because the delay is not significant, it is not important.')).toEqual([]);
    expect(check('Because it is significant, it is not necessarily important.')).toEqual([]);
  });
});

describe('significance-as-importance: shows that it matters', async () => {
  const {check} = await ruleChecker('significance-as-importance');
  it('flags a significant result said to show importance', () => {
    expect(check('The significant result shows that the delay is important.')).toHaveLength(1);
    expect(check('The significant result shows that the delay is real, not that it is important.')).toEqual([]);
  });
});
