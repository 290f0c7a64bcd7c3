import {describe, expect, it} from 'vitest';
import {qrLeastSquares} from '../../../src/methods/shared/qr-least-squares.js';
import {lre} from '../../helpers/lre.js';

describe('Householder QR least squares', () => {
  it('solves a small overdetermined system and returns R⁻¹ with R⁻¹R⁻ᵀ = (XᵀX)⁻¹', () => {
    // Hand computation (common practice, no source): X = [1 1; 1 2; 1 3; 1 4], y = [6, 5, 7, 10]
    // XᵀX = [4 10; 10 30], Xᵀy = [28, 77], b = (XᵀX)⁻¹Xᵀy = [3.5, 1.4], (XᵀX)⁻¹ = [1.5 −0.5; −0.5 0.2]
    const fit = qrLeastSquares([Float64Array.of(1, 1, 1, 1), Float64Array.of(1, 2, 3, 4)], Float64Array.of(6, 5, 7, 10));
    if (fit.kind !== 'fit') throw new Error('expected a fit');
    expect(lre(fit.coefficients[0]!, 3.5)).toBeGreaterThanOrEqual(14.5);
    expect(lre(fit.coefficients[1]!, 1.4)).toBeGreaterThanOrEqual(14.5);
    const [r0, r1] = fit.rInverse as [Float64Array, Float64Array];
    const covariance = [
      [r0[0]! ** 2 + r0[1]! ** 2, r0[1]! * r1[1]!],
      [r0[1]! * r1[1]!, r1[1]! ** 2],
    ];
    expect(lre(covariance[0]![0]!, 1.5)).toBeGreaterThanOrEqual(14.5);
    expect(lre(covariance[0]![1]!, -0.5)).toBeGreaterThanOrEqual(14.5);
    expect(lre(covariance[1]![1]!, 0.2)).toBeGreaterThanOrEqual(14.5);
    // residuals y − Xb = [1.1, −1.3, −0.7, 0.9]; SSR = ‖Q₁ᵀy‖² = ‖Xb‖² = 4.9² + 6.3² + 7.7² + 9.1² = 205.8
    [1.1, -1.3, -0.7, 0.9].forEach((r, i) => expect(lre(fit.residuals[i]!, r)).toBeGreaterThanOrEqual(13.5));
    expect(lre(fit.explainedSumOfSquares, 205.8)).toBeGreaterThanOrEqual(14.5);
  });

  it('reports the first column that depends on the earlier ones', () => {
    const x = Float64Array.of(1, 2, 3, 4, 5);
    const fit = qrLeastSquares([x, Float64Array.of(2, 0, 1, 3, 1), x.map((v) => 3 * v)], Float64Array.of(1, 3, 2, 5, 4));
    expect(fit).toEqual({kind: 'collinear', column: 2});
  });

  it('rejects more columns than rows as programmer misuse', () => {
    expect(() => qrLeastSquares([Float64Array.of(1), Float64Array.of(2)], Float64Array.of(1))).toThrow(/need 1 to 1 columns/);
  });
});
