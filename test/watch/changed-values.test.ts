import {describe, expect, it} from 'vitest';
import {changedValues} from '../../src/watch/changed-values.js';

const record = (p: number, extra: object = {}) => ({
  p,
  p_adjusted: null,
  decision: p <= 0.05 ? 'reject' : 'fail-to-reject',
  statistic: {name: 't', value: 2.5},
  estimate: {value: 3, ci: [1, 5]},
  groups: {A: {n: 10, mean: 31.2, sd: 2}},
  n: 20,
  ...extra,
});

describe('changed values', () => {
  it('lists the shown fields that changed, old and new', () => {
    const before = {blocks: {a: record(0.01), b: record(0.2)}};
    const after = {blocks: {a: record(0.07, {estimate: {value: 3, ci: [-0.1, 5]}}), b: record(0.2)}};
    expect(changedValues(before, after, '')).toEqual([
      {block: 'a', field: 'decision', before: 'reject', after: 'fail-to-reject'},
      {block: 'a', field: 'p', before: 0.01, after: 0.07},
      {block: 'a', field: 'estimate.ci', before: [1, 5], after: [-0.1, 5]},
    ]);
  });

  it('adds fields the prose names with {{id.path}}, and only those', () => {
    const before = {blocks: {a: record(0.01)}};
    const after = {blocks: {a: record(0.01, {n: 21, groups: {A: {n: 11, mean: 31.5, sd: 2}}})}};
    expect(changedValues(before, after, 'Mean {{ a.groups.A.mean }} of {{a}}.')).toEqual([
      {block: 'a', field: 'groups.A.mean', before: 31.2, after: 31.5},
    ]);
  });

  it('leaves out blocks added or removed, and references to unknown blocks', () => {
    expect(changedValues({blocks: {a: record(0.01)}}, {blocks: {b: record(0.01)}}, '{{c.p}}')).toEqual([]);
  });
});
