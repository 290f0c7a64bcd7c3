import {describe, expect, it} from 'vitest';
import {validatePValues} from '../../../src/methods/adjust/validate-p-values.js';
import {UserError} from '../../../src/user-error.js';

describe('validatePValues', () => {
  it('accepts the closed interval [0, 1] and the empty family', () => {
    expect(() => validatePValues([0, 0.5, 1], 'holm')).not.toThrow();
    expect(() => validatePValues([], 'holm')).not.toThrow();
  });

  it.each([
    [[0.2, Number.NaN], 'p[1] is NaN'],
    [[-0.01], 'p[0] is -0.01'],
    [[1.0000001], 'p[0] is 1.0000001'],
    [[Infinity], 'p[0] is Infinity'],
    [['0.5' as unknown as number], 'p[0] is 0.5'],
  ])('rejects %j with a plain Error naming the function', (p, detail) => {
    let caught: unknown;
    try {
      validatePValues(p, 'hochberg');
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(Error);
    // Programmer misuse, not an author's mistake: never a UserError.
    expect(caught).not.toBeInstanceOf(UserError);
    expect((caught as Error).message).toMatch(/^hochberg: /);
    expect((caught as Error).message).toContain(detail);
  });

  it('rejects a non-array', () => {
    expect(() => validatePValues(0.5 as unknown as number[], 'bonferroni')).toThrow(/^bonferroni: expected an array/);
  });
});
