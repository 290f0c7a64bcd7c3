import {accurateMean} from './summarize.js';

/**
 * Pearson's product-moment correlation r = Sxy / √(Sxx·Syy) of paired
 * samples, with NaN when either sample is constant.
 *
 * Accuracy: the sums of squares and cross-products run over deviations from
 * compensated means, with Neumaier-compensated accumulation and the
 * corrected two-pass term −(Σdx)(Σdy)/n (Chan, Golub & LeVeque 1983, The
 * American Statistician 37(3), eq. 1.7), so r keeps its digits when the
 * data share many leading digits. The result is clamped to [-1, 1].
 * Deviations are scaled by their largest magnitude before squaring, so
 * tiny or huge values neither underflow nor overflow.
 */
export function pearsonR(x: Float64Array, y: Float64Array): number {
  const n = x.length;
  if (y.length !== n) throw new Error(`pearsonR: x has ${n} values but y has ${y.length}`);
  const dx = deviations(x);
  const dy = deviations(y);
  const sxx = new CompensatedSum();
  const syy = new CompensatedSum();
  const sxy = new CompensatedSum();
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += dx[i]!;
    sy += dy[i]!;
    sxx.add(dx[i]! * dx[i]!);
    syy.add(dy[i]! * dy[i]!);
    sxy.add(dx[i]! * dy[i]!);
  }
  const xx = sxx.value() - (sx * sx) / n;
  const yy = syy.value() - (sy * sy) / n;
  if (!(xx > 0) || !(yy > 0)) return NaN;
  // One rounding in √(xx·yy), so that r = ±1 comes out exactly for exact lines.
  const r = (sxy.value() - (sx * sy) / n) / Math.sqrt(xx * yy);
  return Math.max(-1, Math.min(1, r));
}

/**
 * Deviations from the compensated mean, scaled by their largest magnitude
 * (r is scale-free), so that squares neither underflow nor overflow.
 */
function deviations(values: Float64Array): Float64Array {
  const mean = accurateMean(values);
  const d = values.map((value) => value - mean);
  const scale = d.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  return scale > 0 && Number.isFinite(scale) ? d.map((v) => v / scale) : d;
}

/** Neumaier's compensated summation. */
class CompensatedSum {
  private sum = 0;
  private compensation = 0;

  add(term: number): void {
    const t = this.sum + term;
    this.compensation += Math.abs(this.sum) >= Math.abs(term) ? this.sum - t + term : term - t + this.sum;
    this.sum = t;
  }

  value(): number {
    return this.sum + this.compensation;
  }
}
