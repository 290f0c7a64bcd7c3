import type {Summary} from './summarize.js';

/** Pooled standard deviation of two groups, on n1 + n2 - 2 df. */
export function pooledSd(a: Summary, b: Summary): number {
  return Math.sqrt(((a.n - 1) * a.sd ** 2 + (b.n - 1) * b.sd ** 2) / (a.n + b.n - 2));
}
