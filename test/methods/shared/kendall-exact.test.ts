import {describe, expect, it} from 'vitest';
import {discordantDistribution, discordantTails} from '../../../src/methods/shared/kendall-exact.js';
import {lre} from '../../helpers/lre.js';

/** Inversion counts of every permutation of 0…n−1, by brute force. */
function bruteForce(n: number): number[] {
  const counts = new Array<number>((n * (n - 1)) / 2 + 1).fill(0);
  const visit = (prefix: number[], rest: number[]) => {
    if (rest.length === 0) {
      let inversions = 0;
      for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (prefix[i]! > prefix[j]!) inversions++;
      counts[inversions]!++;
      return;
    }
    rest.forEach((v, k) => visit([...prefix, v], [...rest.slice(0, k), ...rest.slice(k + 1)]));
  };
  visit([], Array.from({length: n}, (_, i) => i));
  return counts;
}

describe('exact distribution of Kendall’s discordant pairs', () => {
  it('equals the inversion counts of all n! permutations for n ≤ 7', () => {
    for (let n = 1; n <= 7; n++) {
      const total = bruteForce(n).reduce((a, b) => a + b, 0);
      const p = discordantDistribution(n);
      bruteForce(n).forEach((count, k) => expect(lre(p[k]!, count / total), `n = ${n}, k = ${k}`).toBeGreaterThanOrEqual(15));
    }
  });

  it('keeps full relative precision in the far tail at n = 50', () => {
    // exact: P(D = 0) = 1/50! and P(D = 1) = 49/50! (one adjacent transposition); mpmath 1.3.0 at 30 digits: 1/50! = 3.287949416633158067e-65
    const p = discordantDistribution(50);
    expect(lre(p[0]!, 3.287949416633158067e-65)).toBeGreaterThanOrEqual(14);
    expect(lre(p[1]!, 49 * 3.287949416633158067e-65)).toBeGreaterThanOrEqual(14);
    expect(lre(p.reduce((a, b) => a + b, 0), 1)).toBeGreaterThanOrEqual(14);
    const {atMost, atLeast} = discordantTails(50, 0);
    expect(atMost).toBe(p[0]);
    expect(lre(atLeast, 1)).toBeGreaterThanOrEqual(14);
  });

  it('rejects n outside 1…50 as programmer misuse', () => {
    expect(() => discordantDistribution(51)).toThrow(/n must be an integer/);
    expect(() => discordantDistribution(2.5)).toThrow(/n must be an integer/);
  });
});
