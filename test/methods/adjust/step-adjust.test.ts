import {describe, expect, it} from 'vitest';
import {stepAdjust} from '../../../src/methods/adjust/step-adjust.js';

describe('stepAdjust', () => {
  // A factor of 10 for every rank makes the running max/min the only thing at work;
  // all values are exact in binary after ×10 except where capped.
  const flat = () => 10;

  // Hand computation: sorted 0.0625, 0.1875, 0.25 with factors 3, 2, 1 give
  // 0.1875, 0.375, 0.25 (all exact in binary); the two directions then differ.
  const p = [0.0625, 0.25, 0.1875];
  const holmLike = (j: number, m: number) => m - j + 1;

  it('step-down keeps a running maximum from the smallest p upwards', () => {
    expect(stepAdjust(p, 'down', holmLike)).toEqual([0.1875, 0.375, 0.375]);
  });

  it('step-up keeps a running minimum from the largest p downwards', () => {
    expect(stepAdjust(p, 'up', holmLike)).toEqual([0.1875, 0.25, 0.25]);
  });

  it('caps at 1 before the running step and returns the input order', () => {
    expect(stepAdjust([0.5, 0.0625, 0.25], 'down', flat)).toEqual([1, 0.625, 1]);
    expect(stepAdjust([0.5, 0.0625, 0.25], 'up', flat)).toEqual([1, 0.625, 1]);
  });

  it('hands the factor 1-based ranks and the family size', () => {
    const seen: Array<[number, number]> = [];
    stepAdjust([0.3, 0.1, 0.2], 'up', (j, m) => (seen.push([j, m]), 1));
    expect(seen).toEqual([[3, 3], [2, 3], [1, 3]]);
  });
});
