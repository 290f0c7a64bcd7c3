import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('observed-power', async () => {
  const {check} = await ruleChecker('observed-power');

  it('flags power computed after the fact', () => {
    expect(check('The observed power was 6%.')).toEqual(['5:observed power']);
    expect(check('A post-hoc power analysis followed.')).toEqual(['3:post-hoc power']);
    expect(check('Post hoc power was low.')).toEqual(['1:Post hoc power']);
  });

  it('does not flag a refusal or a declared sensitivity', () => {
    expect(check('We do not report observed power.')).toEqual([]);
    expect(check('The test had {{early.sensitivity.power_at_smallest_effect}} power to detect 2 MPa.')).toEqual([]);
  });
});

describe('observed-power described', async () => {
  const {check} = await ruleChecker('observed-power');
  it('flags power computed from the data in hand', () => {
    expect(check('The power calculated from the observed effect was low.')).toEqual(['5:power calculated from the observed effect']);
    expect(check('A power analysis on the collected data gave 18%.')).toEqual(['3:power analysis on the collected data']);
    expect(check('We ran a power analysis after the study.')).toEqual(['10:power analysis after the study']);
  });
  it('leaves planned power', () => {
    expect(check('A power analysis before the study fixed the sample size.')).toEqual([]);
    expect(check('Power at the smallest effect of interest was planned at 80%.')).toEqual([]);
  });
});
