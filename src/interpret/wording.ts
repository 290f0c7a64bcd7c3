/**
 * Every phrase stet writes about a result, in one place so a reviewer can
 * read all of it at once (and a translation could replace it). Functions
 * take already-formatted strings; they never compute or round.
 *
 * Rules (contract §7): "reject" or "fail to reject", never "accept"; a
 * non-significant result never reads as equality; p is never called the
 * probability that a hypothesis is true.
 */
export const wording = {
  // Descriptions of what a design compares.
  twoGroupContrast: (outcome: string, second: string, first: string) =>
    `mean ${outcome} between ${second} and ${first}`,
  pairedContrast: (second: string, first: string) => `${second} and ${first} within pairs`,
  oneSampleContrast: (outcome: string, mu: string) => `mean ${outcome} from the reference value ${mu}`,

  // The estimate, in the data's units, with its direction in plain words.
  twoGroupEstimate: (outcome: string, amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `mean ${outcome} was the same to the reported precision in ${second} and ${first}`
      : `mean ${outcome} was ${amount} ${direction} in ${second} than in ${first}`,
  pairedEstimate: (amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `${second} and ${first} agreed on average to the reported precision`
      : `${second} was on average ${amount} ${direction} than ${first} within pairs`,
  oneSampleEstimate: (outcome: string, mean: string, amount: string, direction: Direction, mu: string) =>
    direction === 'none'
      ? `mean ${outcome} was ${mean}, equal to the reference value ${mu} to the reported precision`
      : `mean ${outcome} was ${mean}, ${amount} ${direction === 'higher' ? 'above' : 'below'} the reference value ${mu}`,

  nullHypothesis: {
    'two-group': 'equal population means',
    paired: 'a zero mean difference',
    'one-sample': 'a population mean equal to the reference value',
  } as Record<string, string>,

  // One-sided tests name their alternative hypothesis in words.
  twoGroupAlternative: (outcome: string, higher: boolean, second: string, first: string) =>
    `One-sided test: the alternative hypothesis is that mean ${outcome} is ${higher ? 'higher' : 'lower'} in ${second} than in ${first}.`,
  pairedAlternative: (higher: boolean, second: string, first: string) =>
    `One-sided test: the alternative hypothesis is that ${second} is ${higher ? 'higher' : 'lower'} than ${first} on average.`,
  oneSampleAlternative: (outcome: string, higher: boolean, mu: string) =>
    `One-sided test: the alternative hypothesis is that mean ${outcome} is ${higher ? 'above' : 'below'} ${mu}.`,

  significant: (test: string, estimate: string, ci: string, stats: string, alpha: string, nullHypothesis: string) =>
    `${testSubject(test)} found a statistically significant difference at the pre-declared α = ${alpha}: ` +
    `${estimate} (${ci}; ${stats}), so the null hypothesis of ${nullHypothesis} is rejected.`,
  notSignificant: (test: string, contrast: string, alpha: string, stats: string, estimate: string, ci: string) =>
    `${testSubject(test)} detected no statistically significant difference in the ${contrast} at the pre-declared ` +
    `α = ${alpha} (${stats}); the null hypothesis is not rejected. In these data, ${estimate} (${ci}).`,
  effect: (effect: string) => `The standardized effect was ${effect}.`,
  equalityClaim: {
    'two-group': 'the population means are equal',
    paired: 'the mean difference is zero',
    'one-sample': 'the population mean equals the reference value',
  } as Record<string, string>,
  powerAtSmallestEffect: (claim: string, power: string, smallest: string) =>
    `This does not show that ${claim}: the test had ${power} power to detect a difference of ${smallest}.`,
  minimumDetectable: (claim: string, amount: string) =>
    `This does not show that ${claim}: with these data, only a difference of about ${amount} or more would have been detected with 80% power.`,

  smallestEffectInside: (smallest: string) =>
    `Although statistically significant, the difference is smaller than the smallest effect of interest: the whole interval lies within ±${smallest}.`,
  smallestEffectBeyond: (smallest: string) =>
    `The whole interval lies beyond the smallest effect of interest (${smallest}).`,
  smallestEffectStraddles: (smallest: string) =>
    `The interval includes differences both smaller and larger than the smallest effect of interest (${smallest}), so whether the difference matters in practice remains uncertain.`,

  adjusted: (method: string, size: number, family: string, p: string) =>
    `The decision uses the ${method}-adjusted ${p}, across the ${size} tests of family “${family}”.`,

  smallSample: (n: number) =>
    `With only ${n} observations in the smallest group, the test leans on approximately normal data, which so few observations cannot check.`,

  describeAll: (outcome: string, n: string, mean: string, sd: string, median: string, min: string, max: string) =>
    `${capitalize(outcome)} (n = ${n}): mean ${mean}, SD ${sd}, median ${median}, range ${min} to ${max}.`,
  describeGroup: (label: string, n: string, mean: string, sd: string) => `${label} (n = ${n}): mean ${mean}, SD ${sd}`,
  describeGroups: (outcome: string, by: string, parts: readonly string[]) =>
    `${capitalize(outcome)} by ${by}: ${parts.join('; ')}.`,

  confidenceInterval: (level: string, interval: string) => `${level} CI ${interval}`,
} as const;

export type Direction = 'higher' | 'lower' | 'none';

/** `Welch's t test` stands alone; `paired t test` takes an article. */
function testSubject(title: string): string {
  return /^[A-Z]/.test(title) ? title : `The ${title}`;
}

export function capitalize(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Names of adjustment methods as written in sentences. */
export const adjustNames: Record<string, string> = {
  bonferroni: 'Bonferroni',
  holm: 'Holm',
  hochberg: 'Hochberg',
  bh: 'Benjamini–Hochberg',
  by: 'Benjamini–Yekutieli',
};

/** Symbols of effect sizes in compact strings. */
export const effectSymbols: Record<string, string> = {'hedges-g': 'g'};
