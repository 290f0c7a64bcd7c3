import {describe, expect, it} from 'vitest';
import {conclusionFlips, relation} from '../../src/watch/conclusion-flips.js';

// Records shaped as in NAME.results.json (contract §6); numbers invented.
const base = {
  decision: 'reject',
  estimate: {name: 'difference in means (B - A)', value: 3.1, ci: [0.8, 5.4]},
  effect: {name: 'hedges-g', value: 1.25, ci: [0.31, 2.17]},
  smallest_effect: null,
};

const kinds = (before: object, after: object) => conclusionFlips('b', before, after).map((flip) => flip.kind);

describe('conclusion flips', () => {
  it('finds none when nothing that decides the conclusion changed', () => {
    expect(conclusionFlips('b', base, {...base, estimate: {...base.estimate, value: 2.9, ci: [0.5, 5.1]}})).toEqual([]);
    expect(conclusionFlips('b', base, base)).toEqual([]);
  });

  it('finds a decision that changed, both ways', () => {
    expect(conclusionFlips('b', base, {...base, decision: 'fail-to-reject'})).toEqual([
      {block: 'b', kind: 'decision', detail: 'reject → fail-to-reject'},
    ]);
    expect(kinds({...base, decision: 'fail-to-reject'}, base)).toEqual(['decision']);
  });

  it('ignores a decision that appears or disappears (describe blocks have none)', () => {
    const {decision: _omitted, ...describe} = base;
    expect(kinds(describe, base)).toEqual([]);
    expect(kinds(base, describe)).toEqual([]);
  });

  it('finds an estimate whose sign changed, and a move to or from zero', () => {
    const negative = {...base, estimate: {...base.estimate, value: -0.2, ci: [-2.5, 2.1]}};
    expect(conclusionFlips('b', base, negative)).toContainEqual({block: 'b', kind: 'sign', detail: 'estimate positive → negative'});
    expect(kinds(base, {...base, estimate: {...base.estimate, value: 0}})).toContain('sign');
    expect(kinds({...base, estimate: {...base.estimate, value: 0}}, base)).toContain('sign');
  });

  it('uses the effect for the sign when a block has no estimate', () => {
    const {estimate: _e, ...onlyEffect} = base;
    expect(kinds(onlyEffect, {...onlyEffect, effect: {...base.effect, value: -0.4}})).toEqual(['sign']);
  });

  it('does not compare signs of different things (an estimate before, only an effect after)', () => {
    const {estimate: _e, ...onlyEffect} = base;
    expect(kinds(base, {...onlyEffect, effect: {...base.effect, value: -0.4}})).toEqual([]);
  });

  it('ignores values that are not finite numbers', () => {
    expect(kinds(base, {...base, estimate: {...base.estimate, value: null}})).toEqual([]);
    expect(kinds({...base, estimate: 'junk'}, base)).toEqual([]);
  });

  it('finds an interval that crossed +δ', () => {
    const before = {...base, smallest_effect: 2, estimate: {...base.estimate, ci: [2.5, 5.4]}};
    const after = {...before, estimate: {...base.estimate, ci: [1.5, 4.4]}};
    expect(conclusionFlips('b', before, after)).toEqual([
      {block: 'b', kind: 'smallest-effect', detail: 'interval above +δ → contains +δ (δ = 2)'},
    ]);
  });

  it('finds an interval that crossed −δ, with δ written negative', () => {
    const before = {...base, smallest_effect: -1, estimate: {...base.estimate, value: 0, ci: [-0.5, 0.5]}};
    const after = {...before, estimate: {...base.estimate, value: 0, ci: [-1.5, 0.5]}};
    expect(conclusionFlips('b', before, after).map((f) => f.detail)).toEqual(['interval above −δ → contains −δ (δ = 1)']);
  });

  it('finds an equivalence-style change: from within ±δ to reaching past both bounds', () => {
    const before = {...base, smallest_effect: 1, estimate: {...base.estimate, value: 0.1, ci: [-0.5, 0.7]}};
    const after = {...before, estimate: {...base.estimate, value: 0.1, ci: [-1.2, 1.4]}};
    expect(kinds(before, after)).toEqual(['smallest-effect', 'smallest-effect']);
  });

  it('reads a null bound as the open end of a one-sided interval', () => {
    const before = {...base, smallest_effect: 1, estimate: {...base.estimate, ci: [1.5, null]}};
    const after = {...before, estimate: {...base.estimate, ci: [0.5, null]}};
    expect(kinds(before, after)).toEqual(['smallest-effect']);
    expect(kinds(before, before)).toEqual([]);
  });

  it('needs a smallest effect before and after to judge a crossing', () => {
    const before = {...base, estimate: {...base.estimate, ci: [2.5, 5.4]}};
    expect(kinds(before, {...before, smallest_effect: 3})).toEqual([]);
  });

  it('reports several flips of one edit together', () => {
    const before = {...base, smallest_effect: 1, estimate: {...base.estimate, value: 3.1, ci: [1.5, 4.7]}};
    const after = {...before, decision: 'fail-to-reject', estimate: {...base.estimate, value: -0.3, ci: [-2.1, 1.5]}};
    expect(kinds(before, after)).toEqual(['decision', 'sign', 'smallest-effect', 'smallest-effect']);
  });
});

describe('where an interval lies relative to a bound', () => {
  it('counts touching as containing', () => {
    expect(relation([1, 2], 2)).toBe('contains');
    expect(relation([2, 3], 2)).toBe('contains');
    expect(relation([0, 1.999], 2)).toBe('below');
    expect(relation([2.001, 3], 2)).toBe('above');
  });
});
