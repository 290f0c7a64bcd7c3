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
