import type {Summary} from './summarize.js';

/**
 * A pooled-variance test is unreliable when spreads differ and group sizes
 * differ (Welch 1947; Delacre, Lakens & Leys 2017, Int. Rev. Soc. Psychol.
 * 30(1)). The ratio 2 is a rule of thumb, a fact of the trade.
 */
export function spreadWarnings(labelA: string, a: Summary, labelB: string, b: Summary): string[] {
  const ratio = Math.max(a.sd, b.sd) / Math.min(a.sd, b.sd);
  if (!(ratio > 2)) return [];
  return [
    `The standard deviations of ${labelA} and ${labelB} differ by a factor of ${ratio.toFixed(1)}; ` +
      "Student’s t assumes equal spreads. Consider declaring `test: welch-t`.",
  ];
}
