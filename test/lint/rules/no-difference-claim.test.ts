import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

describe('no-difference-claim', async () => {
  const {check} = await ruleChecker('no-difference-claim');

  it('flags equality claimed beside a non-significant result', () => {
    expect(check('There was no difference at 7 days ({{early.p}}).')).toEqual(['11:no difference']);
    expect(check('The readings are the same ({{drift}}).')).toEqual(['14:are the same']);
    expect(check('Not significant, so the mixes are equal.')).toEqual(['31:are equal']);
    expect(check('The suppliers did not differ ({{early}}).')).toEqual(['15:did not differ']);
  });

  it('does not flag stet\'s own negations, equivalence tests or significant results', () => {
    expect(check('This does not show that the population means are equal ({{early.p}}).')).toEqual([]);
    expect(check('We do not treat the suppliers as different at 7 days ({{early.p}}), nor as equal.')).toEqual([]);
    expect(check('They did not differ significantly ({{early.p}}).')).toEqual([]);
    expect(check('The means are equal within 2 MPa.')).toEqual([]);
    expect(check('Strength is not the same across suppliers ({{strength.p}}).')).toEqual([]);
    expect(check('The depots are the same distance from the site ({{delivery.p}}).')).toEqual([]);
  });
});

describe('no-difference-claim and rounding', async () => {
  const {check} = await ruleChecker('no-difference-claim');
  it('leaves equality stated to a precision or within a margin', () => {
    expect(check('Mean drift was the same to the reported precision after and before ({{drift.p}}).')).toEqual([]);
    expect(check('The readings were equal within 0.2 units ({{drift.p}}).')).toEqual([]);
    expect(check('The readings were equal ({{drift.p}}).')).toEqual(['14:were equal']);
  });
});

describe('no-difference-claim in other words', async () => {
  const {check} = await ruleChecker('no-difference-claim');
  it('flags verbs that claim sameness or no change', () => {
    expect(check('Not significant, so the two pastes gave identical failure rates.')).toEqual(['36:gave identical failure']);
    expect(check('Rebalancing did not alter the vibration ({{drift.p}}).')).toEqual(['13:did not alter']);
    expect(check('Both pumps are equally smooth ({{drift.p}}).')).toEqual(['12:are equally smooth']);
    expect(check('Servicing kept the readings unchanged ({{drift.p}}).')).toEqual(['11:kept the readings unchanged']);
    expect(check('Our measurements show that there is no change in root depth.')).toEqual(['18:show that there is no change']);
  });
  it('leaves the null hypothesis, suppositions, outer negations and assumed equal variances', () => {
    expect(check('The null hypothesis of no difference was not rejected ({{early.p}}).')).toEqual([]);
    expect(check('If the pumps were identical, readings this far apart would be common ({{drift.p}}).')).toEqual([]);
    expect(check('This does not show that rebalancing did not change the vibration ({{drift.p}}).')).toEqual([]);
    expect(check('It would be wrong to say the pumps are the same ({{drift.p}}).')).toEqual([]);
    expect(check('The variances were equal, so the pooled test was used ({{early.p}}).')).toEqual([]);
    expect(check('The pooled test gave the same decision ({{early.p}}).')).toEqual([]);
  });
});
