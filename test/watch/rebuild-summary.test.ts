import {describe, expect, it} from 'vitest';
import {rebuildSummary, showPair} from '../../src/watch/rebuild-summary.js';

describe('printing a changed value', () => {
  it('uses four significant digits when they tell the values apart', () => {
    expect(showPair(0.0018761, 0.0057531)).toEqual(['0.001876', '0.005753']);
    expect(showPair([1, -2.5], [1, -2.25])).toEqual(['[1, -2.5]', '[1, -2.25]']);
  });

  it('uses more digits when four would print the same number twice', () => {
    expect(showPair(31.2345, 31.2349)).toEqual(['31.2345', '31.2349']);
    expect(showPair(0.1 + 0.2, 0.3)).toEqual(['0.30000000000000004', '0.3']);
  });

  it('prints a missing value and an open interval end in words', () => {
    expect(showPair(undefined, 0.5)).toEqual(['(none)', '0.5']);
    expect(showPair([1.5, null], [1.25, null])).toEqual(['[1.5, —]', '[1.25, —]']);
  });
});

describe('the summary after a rebuild', () => {
  const counts = {computed: 2, reused: 7, chartsRendered: 1, chartsReused: 3};
  const at = new Date('2026-01-02T03:04:05.678Z');

  it('says the time, what was recomputed, what changed and, loudly, what flipped', () => {
    const text = rebuildSummary({
      first: false,
      milliseconds: 123.4,
      counts,
      changed: [{block: 'a', field: 'p', before: 0.01, after: 0.07}],
      flips: [{block: 'a', kind: 'decision', detail: 'reject → fail-to-reject'}],
      added: ['c'],
      removed: [],
    }, at, (t) => `<<${t}>>`);
    expect(text).toBe(
      '[03:04:05] rebuilt in 123 ms: 2 blocks recomputed, 7 reused\n' +
      '  new blocks: c\n' +
      '  a.p: 0.01 → 0.07\n' +
      '<<  !! CONCLUSION FLIPPED in a: the decision changed (reject → fail-to-reject)>>\n',
    );
  });

  it('says "built" for the first build and counts one block in the singular', () => {
    const text = rebuildSummary({first: true, milliseconds: 5, counts: {...counts, computed: 1, reused: 0}, changed: [], flips: [], added: [], removed: []}, at, (t) => t);
    expect(text).toBe('[03:04:05] built in 5 ms: 1 block recomputed, 0 reused\n');
  });
});
