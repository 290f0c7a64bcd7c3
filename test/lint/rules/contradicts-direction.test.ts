import {describe, expect, it} from 'vitest';
import {ruleChecker} from './rule-check.js';

// strength: difference in means (Quarrybank - Northfield) < 0; delivery: (South - North) > 0;
// drift: mean difference (after - before) > 0 (corpus-report.ts).
describe('contradicts-direction', async () => {
  const {check, rule} = await ruleChecker('contradicts-direction');

  it('is an error', () => expect(rule.severity).toBe('error'));

  it('flags a direction word against the sign of the estimate when both groups are named', () => {
    expect(check('Quarrybank was stronger than Northfield ({{strength.estimate}}).')).toEqual(['16:stronger']);
    expect(check('Mean strength was higher in Quarrybank than in Northfield ({{strength.p}}).')).toEqual(['19:higher']);
    expect(check('Delivery times were lower for South than for North ({{delivery}}).')).toEqual(['21:lower']);
    expect(check('Readings decreased from before to after ({{drift.estimate}}).')).toEqual(['10:decreased']);
  });

  it('accepts agreeing comparisons and ignores what it cannot read', () => {
    expect(check('Northfield was stronger than Quarrybank ({{strength.estimate}}).')).toEqual([]);
    expect(check('Mean strength was 2.8 MPa lower in Quarrybank than in Northfield ({{strength}}).')).toEqual([]);
    expect(check('Readings increased from before to after ({{drift.estimate}}).')).toEqual([]);
    expect(check('Quarrybank was stronger than expected ({{strength.estimate}}).')).toEqual([]);
    expect(check('Quarrybank was no stronger than Northfield ({{strength.estimate}}).')).toEqual([]);
    expect(check('Quarrybank was less variable than Northfield ({{strength.estimate}}).')).toEqual([]);
    expect(check('South had more trucks than North ({{delivery.n}}).')).toEqual([]);
    expect(check('Quarrybank was stronger than Northfield.')).toEqual([]);
  });

  it('reads more/less as about the outcome only when the outcome is named', () => {
    expect(check('South took more minutes than North ({{delivery.estimate}}).')).toEqual([]);
    expect(check('North needed more minutes than South ({{delivery.estimate}}).')).toEqual(['14:more']);
  });
});

describe('contradicts-direction with above, below and exceeded', async () => {
  const {check} = await ruleChecker('contradicts-direction');
  it('reads the group right after the word', () => {
    expect(check('The mean for South was below that of North ({{delivery.estimate}}).')).toEqual(['24:below']);
    expect(check('North’s times exceeded South’s ({{delivery.estimate}}).')).toEqual(['15:exceeded']);
    expect(check('South’s times exceeded North’s ({{delivery.estimate}}).')).toEqual([]);
    expect(check('South’s times were above 40 minutes ({{delivery.estimate}}).')).toEqual([]);
  });
});

describe('contradicts-direction with size adjectives', async () => {
  const {check} = await ruleChecker('contradicts-direction');
  it('reads longer and shorter', () => {
    expect(check('North took longer than South ({{delivery.estimate}}).')).toEqual(['12:longer']);
    expect(check('North’s trips were shorter than South’s ({{delivery.estimate}}).')).toEqual([]);
  });
});
