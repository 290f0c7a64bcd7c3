import type {AutoReason} from '../compute/choose-method.js';
import type {MethodNote} from '../methods/types.js';
import type {NumberFormat} from './format-number.js';
import {symbol} from './symbol-marks.js';

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
  // What each kind of question is about: the contrast tested, the null
  // hypothesis, and the equality a non-significant result must not claim.
  phrases: {
    meanDifference: (outcome: string, second: string, first: string) => ({
      contrast: `difference in mean ${outcome} between ${second} and ${first}`,
      nullHypothesis: 'equal population means',
      claim: 'the population means are equal',
    }),
    locationShift: (outcome: string, second: string, first: string) => ({
      contrast: `difference in ${outcome} between ${second} and ${first}`,
      nullHypothesis: 'identically distributed groups',
      claim: `${outcome} is distributed alike in ${second} and ${first}`,
    }),
    pairedDifference: (second: string, first: string) => ({
      contrast: `difference between ${second} and ${first} within pairs`,
      nullHypothesis: 'a zero mean difference',
      claim: 'the mean difference is zero',
    }),
    pairedShift: (second: string, first: string) => ({
      contrast: `difference between ${second} and ${first} within pairs`,
      nullHypothesis: 'differences centred on zero',
      claim: 'the differences are centred on zero',
    }),
    oneSample: (outcome: string, mu: string) => ({
      contrast: `difference between mean ${outcome} and ${mu}`,
      nullHypothesis: `a population mean of ${mu}`,
      claim: `the population mean is ${mu}`,
    }),
    kGroups: (outcome: string, k: number, by: string, ranks: boolean) => ({
      contrast: `difference in ${ranks ? '' : 'mean '}${outcome} among the ${k} groups of ${by}`,
      nullHypothesis: ranks ? 'identically distributed groups' : 'equal means in all groups',
      claim: ranks ? 'the groups are distributed alike' : 'all group means are equal',
    }),
    correlation: (x: string, y: string, monotonic: boolean) => ({
      contrast: `${monotonic ? 'monotonic ' : ''}association between ${x} and ${y}`,
      nullHypothesis: monotonic ? 'no monotonic association' : 'zero correlation',
      claim: `${x} and ${y} are unrelated`,
    }),
    regression: (y: string, predictors: string) => ({
      contrast: `relation of ${y} to ${predictors}`,
      nullHypothesis: 'zero slopes',
      claim: `${y} is unrelated to ${predictors}`,
    }),
    independence: (y: string, by: string) => ({
      contrast: `association between ${y} and ${by}`,
      nullHypothesis: `independence of ${y} and ${by}`,
      claim: `${y} and ${by} are independent`,
    }),
    proportion: (success: string, mu: string) => ({
      contrast: `difference between the proportion of “${success}” and ${mu}`,
      nullHypothesis: `a proportion of ${mu}`,
      claim: `the proportion is ${mu}`,
    }),
    twoProportions: (success: string, second: string, first: string) => ({
      contrast: `difference in the proportion of “${success}” between ${second} and ${first}`,
      nullHypothesis: 'equal proportions',
      claim: 'the proportions are equal',
    }),
    pairedProportions: (first: string, second: string) => ({
      contrast: `change between ${first} and ${second}`,
      nullHypothesis: 'equal proportions at both measurements',
      claim: 'the proportions at both measurements are equal',
    }),
    fit: (y: string) => ({
      contrast: `departure of ${y} from the expected proportions`,
      nullHypothesis: 'the expected proportions',
      claim: 'the proportions are as expected',
    }),
    normality: (outcome: string) => ({
      contrast: `departure from normality in ${outcome}`,
      nullHypothesis: 'normally distributed data',
      claim: `${outcome} is normally distributed (with few observations this check has little power)`,
    }),
    spread: (outcome: string, by: string) => ({
      contrast: `difference in the spread of ${outcome} among the groups of ${by}`,
      nullHypothesis: 'equal spreads',
      claim: 'the spreads are equal',
    }),
  },

  // The estimate, in the data's units, with its direction in plain words.
  twoGroupEstimate: (outcome: string, amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `mean ${outcome} in ${second} and ${first} matched to the reported precision`
      : `mean ${outcome} was ${amount} ${direction} in ${second} than in ${first}`,
  pairedEstimate: (amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `${second} and ${first} matched on average to the reported precision`
      : `${second} was on average ${amount} ${direction} than ${first} within pairs`,
  oneSampleEstimate: (outcome: string, mean: string, amount: string, direction: Direction, mu: string) =>
    direction === 'none'
      ? `mean ${outcome} was ${mean}, matching the reference value ${mu} to the reported precision`
      : `mean ${outcome} was ${mean}, ${amount} ${direction === 'higher' ? 'above' : 'below'} the reference value ${mu}`,
  shiftEstimate: (outcome: string, amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `typical ${outcome} in ${second} and ${first} matched to the reported precision (Hodges–Lehmann shift)`
      : `the Hodges–Lehmann shift put ${outcome} ${amount} ${direction} in ${second} than in ${first}`,
  pairedShiftEstimate: (amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `${second} and ${first} typically matched within pairs to the reported precision (Hodges–Lehmann estimate)`
      : `the Hodges–Lehmann estimate put ${second} ${amount} ${direction} than ${first} within pairs`,
  medianDifferenceEstimate: (amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `the median difference within pairs was zero to the reported precision`
      : `the median difference within pairs was ${amount}, ${second} ${direction} than ${first}`,
  largestGapEstimate: (outcome: string, amount: string, direction: Direction, high: string, low: string, ranks: boolean) =>
    direction === 'none'
      ? `${ranks ? 'typical' : 'mean'} ${outcome} of the groups matched to the reported precision`
      : ranks
        ? `the largest gap was between ${high} and ${low}: the Hodges–Lehmann shift put ${outcome} ${amount} ${direction} in ${high} than in ${low}`
        : `the largest gap was between ${high} and ${low}: mean ${outcome} was ${amount} ${direction} in ${high} than in ${low}`,
  correlationEstimate: (symbolName: string, value: string, direction: Direction, x: string, y: string) =>
    direction === 'none'
      ? `${symbolName} was ${value}, too close to zero to give a direction at this precision`
      : `higher ${x} went with ${direction} ${y}: ${symbolName} = ${value}`,
  slopeEstimate: (y: string, amount: string, direction: Direction, x: string, others: boolean) =>
    direction === 'none'
      ? `the slope of ${y} on ${x} was zero to the reported precision`
      : `${y} was ${amount} ${direction} for each unit more of ${x}${others ? ', with the other predictors held fixed' : ''}`,
  proportionEstimate: (success: string, value: string, amount: string, direction: Direction, mu: string) =>
    direction === 'none'
      ? `the proportion of “${success}” was ${value}, matching ${mu} to the reported precision`
      : `the proportion of “${success}” was ${value}, ${amount} ${direction === 'higher' ? 'above' : 'below'} ${mu}`,
  twoProportionEstimate: (success: string, amount: string, direction: Direction, second: string, first: string, p2: string, p1: string) =>
    direction === 'none'
      ? `the proportion of “${success}” in ${second} and ${first} matched to the reported precision (${p2} and ${p1})`
      : `the proportion of “${success}” was ${p2} in ${second} and ${p1} in ${first}, ${amount} ${direction} in ${second}`,
  pairedProportionEstimate: (level: string, amount: string, direction: Direction, second: string, first: string) =>
    direction === 'none'
      ? `the proportion of “${level}” at ${second} and at ${first} matched to the reported precision`
      : `the proportion of “${level}” was ${amount} ${direction} at ${second} than at ${first}`,
  correlationFallback: 'the correlation',
  oddsRatioEstimate: (event: string, ratio: string, second: string, first: string) =>
    `the odds of “${event}” were ${ratio} times as high in ${second} as in ${first}`,

  // One-sided tests name their alternative hypothesis in words: what is compared, and with what.
  sides: {
    mean: (outcome: string) => `mean ${outcome}`,
    proportionOf: (level: string) => `the proportion of “${level}”`,
    oddsOf: (level: string) => `the odds of “${level}”`,
    than: (value: string) => `than ${value}`,
    betweenGroups: (second: string, first: string) => `in ${second} than in ${first}`,
    betweenMeasurements: (second: string, first: string) => `at ${second} than at ${first}`,
    statistic: 'the test statistic',
    thanUnderNull: 'than under the null hypothesis',
  },
  twoGroupAlternative: (outcome: string, higher: boolean, second: string, first: string) =>
    `One-sided test: the alternative hypothesis is that ${outcome} is ${higher ? 'higher' : 'lower'} in ${second} than in ${first}.`,
  pairedAlternative: (higher: boolean, second: string, first: string) =>
    `One-sided test: the alternative hypothesis is that ${second} is ${higher ? 'higher' : 'lower'} than ${first} within pairs.`,
  oneSampleAlternative: (outcome: string, higher: boolean, mu: string) =>
    `One-sided test: the alternative hypothesis is that ${outcome} is ${higher ? 'above' : 'below'} ${mu}.`,
  associationAlternative: (higher: boolean, x: string, y: string) =>
    `One-sided test: the alternative hypothesis is that higher ${x} goes with ${higher ? 'higher' : 'lower'} ${y}.`,
  proportionAlternative: (higher: boolean, subject: string, comparison: string) =>
    `One-sided test: the alternative hypothesis is that ${subject} is ${higher ? 'higher' : 'lower'} ${comparison}.`,

  significant: (test: string, contrast: string, alpha: string, stats: string, nullHypothesis: string) =>
    `${testSubject(test)} found a statistically significant ${contrast} at the pre-declared α = ${alpha} ` +
    `(${stats}), so the null hypothesis of ${nullHypothesis} is rejected.`,
  notSignificant: (test: string, contrast: string, alpha: string, stats: string) =>
    `${testSubject(test)} detected no statistically significant ${contrast} at the pre-declared ` +
    `α = ${alpha} (${stats}); the null hypothesis is not rejected.`,
  estimateSignificant: (estimate: string, ci: string) => `${capitalize(estimate)} (${ci}).`,
  estimateNotSignificant: (estimate: string, ci: string) => `In these data, ${estimate} (${ci}).`,
  compatibleValues: (claim: string, ci: string) =>
    `This does not show that ${claim}: the ${ci} shows the values still compatible with the data.`,
  equivalenceContrast: (outcome: string, second: string, first: string) => `mean ${outcome} of ${second} and ${first}`,
  meanRankContrast: (b: string, a: string) => `${b} − ${a} (difference in mean rank)`,
  equivalent: (test: string, contrast: string, margin: string, alpha: string, ci: string, stats: string) =>
    `${testSubject(test)} showed that the ${contrast} are equivalent within ±${margin} at the pre-declared α = ${alpha}: ` +
    `the ${ci} lies inside ±${margin} (${stats}).`,
  notEquivalent: (test: string, contrast: string, margin: string, alpha: string, ci: string, stats: string) =>
    `${testSubject(test)} could not establish that the ${contrast} are equivalent within ±${margin} at the pre-declared ` +
    `α = ${alpha}: the ${ci} extends beyond ±${margin} (${stats}). This does not show that a difference of ${margin} or more exists.`,
  posthocDiffering: (procedure: string, alpha: string, pairs: readonly string[]) =>
    `Pairs that differ at α = ${alpha} (${procedure}-adjusted): ${pairs.join('; ')}.`,
  posthocNone: (procedure: string, alpha: string, pairs: number) =>
    `After ${procedure} adjustment, none of the ${pairs} pairs of groups differed statistically significantly at α = ${alpha}.`,
  posthocPair: (contrast: string, amount: string, ci: string | undefined, p: string) =>
    `${contrast} = ${amount}${ci ? ` (${ci}, ${p})` : ` (${p})`}`,
  assumptionNormality: (group: string, statistic: string, p: string, alternative: string | undefined) =>
    `The Shapiro–Wilk check suggests non-normal data${group ? ` in ${group}` : ''} (${symbol('W')} = ${statistic}, ${p})` +
    (alternative ? `; with small samples, consider declaring \`test: ${alternative}\`.` : '.'),
  assumptionSpread: (statistic: string, p: string, test: string, alternative: string) =>
    `Levene’s check suggests unequal spreads (${symbol('F')} = ${statistic}, ${p}); ${test} assumes equal spreads, so consider declaring \`test: ${alternative}\`.`,
  spearmanBeside: (rho: string, p: string) => `Spearman’s rank correlation, reported beside it, was ${symbol('ρ')} = ${rho} (${p}).`,
  autoChoice: (reason: string) => `The test was chosen from the declared design: ${reason}.`,
  /** Why `test: auto` chose its method (`AutoReason` in compute/choose-method.ts). */
  autoReason: (reason: AutoReason): string => {
    switch (reason.design) {
      case 'paired-numeric':
        return 'y lists two numeric measurements of the same rows (paired design)';
      case 'paired-categorical':
        return 'y lists two categorical measurements of the same rows (paired design)';
      case 'numeric-pair':
        return 'x and y are both numeric (Spearman’s rho is reported beside it)';
      case 'numeric-predictors':
        return 'y is numeric with several numeric predictors';
      case 'two-groups':
        return 'a numeric outcome in two independent groups (Welch’s test does not assume equal spreads)';
      case 'k-groups':
        return `a numeric outcome in ${reason.groups ?? 'several'} independent groups (Welch’s ANOVA does not assume equal spreads; Games–Howell comparisons)`;
      case 'sparse-2x2':
        return 'two categorical columns forming a 2×2 table with an expected count below 5';
      case 'two-categorical':
        return 'two categorical columns (test of independence)';
      case 'one-sample':
        return 'one numeric sample compared with `mu`';
      case 'one-proportion':
        return 'one categorical sample: successes out of trials compared with `mu` (exact test)';
    }
  },
  effect: (effect: string) => `The standardized effect was ${effect}.`,
  effectWithoutInterval: (effect: string) => `The standardized effect was ${effect}; no interval is established for it.`,
  doesNotShow: (claim: string) => `This does not show that ${claim}.`,
  powerAtSmallestEffect: (claim: string, power: string, smallest: string) =>
    `This does not show that ${claim}: the test had ${power} power to detect a difference of ${smallest}.`,
  minimumDetectable: (claim: string, amount: string) =>
    `This does not show that ${claim}: with these data, only a difference of about ${amount} or more would have been detected with 80% power.`,

  smallestEffectInside: (smallest: string) =>
    `Although statistically significant, the difference is smaller than the ${smallest} declared as the smallest effect of interest: the whole interval lies within ±${smallest}.`,
  smallestEffectBeyond: (smallest: string) =>
    `The whole interval lies beyond the smallest effect of interest (${smallest}).`,
  smallestEffectStraddles: (smallest: string) =>
    `The interval includes differences both smaller and larger than the smallest effect of interest (${smallest}), so whether the difference matters in practice remains uncertain.`,

  adjusted: (method: string, size: number, family: string, p: string) =>
    `The decision uses the p-value ${method}-adjusted across the ${size} tests of family “${family}” (${p}).`,

  smallSample: (n: number) =>
    `With only ${n} observations in the smallest group, the test leans on approximately normal data, which so few observations cannot check.`,

  describeAll: (outcome: string, n: string, mean: string, sd: string, median: string, min: string, max: string) =>
    `${capitalize(outcome)} (${symbol('n')} = ${n}): mean ${mean}, ${symbol('SD')} ${sd}, median ${median}, range ${min} to ${max}.`,
  describeGroup: (label: string, n: string, mean: string, sd: string) => `${label} (${symbol('n')} = ${n}): mean ${mean}, ${symbol('SD')} ${sd}`,
  columnFallback: 'column',
  describeGroups: (outcome: string, by: string, parts: readonly string[]) =>
    `${capitalize(outcome)} by ${by}: ${parts.join('; ')}.`,

  confidenceInterval: (level: string, interval: string) => `${level} CI ${interval}`,

  // Plan lock and ledger (stet lock, .stet/ledger.jsonl).
  planConfirmatory: 'Confirmatory: this comparison is as declared in the locked analysis plan.',
  planExploratory: 'Exploratory: this comparison is not in the locked analysis plan, or changed since the plan was locked.',
  specificationsEvaluated: (count: number) =>
    `${count} specifications of this comparison were evaluated while this report was written; see the appendix.`,
  planNote: (plan: 'confirmatory' | 'exploratory') =>
    plan === 'confirmatory' ? 'Plan: confirmatory (as locked in stet.lock).' : 'Plan: exploratory (not in stet.lock, or changed since it was locked).',

  // Captions of figures that are not a block's main chart.
  pairsCaption: (outcome: string, by: string) =>
    `Pairwise differences in ${outcome}${by ? ` between levels of ${by}` : ''}, with simultaneous intervals; a pair whose interval excludes zero differs.`,
  familyCaption: (family: string, size: number) =>
    `The ${size} estimates of family “${family}” with their unadjusted intervals; decisions use the adjusted p-values given in each block.`,
} as const;

export type Direction = 'higher' | 'lower' | 'none';

const percentOf = (level: number) => `${Math.round(level * 1000) / 10}%`;
const listOf = (names: readonly string[]) => names.join(', ');

/** A method's caveat (`MethodNote`), in words; numbers in the report's style. */
export function methodNote(note: MethodNote, format: NumberFormat): string {
  switch (note.kind) {
    case 'spread-ratio':
      return `The standard deviations of ${note.larger} and ${note.smaller} differ by a factor of ${format.fixed(note.ratio, 1)}; ` +
        `this test assumes equal spreads, so consider declaring \`test: ${note.alternative}\`.`;
    case 'small-expected':
      return `${note.below} of ${note.cells} expected counts are below 5 (smallest ${format.fixed(note.smallest, note.smallest < 1 ? 2 : 1)}), ` +
        `so the chi-square approximation may be inaccurate; ` +
        (note.alternative ? `consider declaring \`test: ${note.alternative}\`, which does not rely on it.` : 'consider combining sparse levels.');
    case 'small-groups':
      return `${listOf(note.groups)} ${note.groups.length === 1 ? 'has' : 'have'} fewer than 5 observations; the chi-square approximation is rough there.`;
    case 'unattainable-interval': {
      const subject = note.estimate === 'simultaneous shift' ? 'simultaneous interval for the shift' : `interval for the ${note.estimate}`;
      const between = note.between ? ` between ${note.between[0]} and ${note.between[1]}` : '';
      const sizes = note.pairs === undefined ? 'With these group sizes' : `With ${note.pairs} pairs`;
      return `${sizes} no ${subject}${between} reaches ${percentOf(note.confidence)} confidence, so its bounds are infinite.`;
    }
    case 'ties-approximation': {
      const tied = {values: 'Tied values', differences: 'Tied differences', 'zero differences': 'Zero differences'}[note.tied];
      return `${tied}: the p-value uses the normal approximation with tie and continuity correction, not the exact distribution.`;
    }
    case 'dropped-zeros':
      return `${note.zeros} of ${note.pairs} pairs had a difference ${note.second} − ${note.first} of exactly ${format.fixed(note.mu, Math.min(6, decimalsOf(note.mu)))} ` +
        `and were dropped from the test${note.wilcoxon ? ' (Wilcoxon’s convention)' : ''}; the estimate uses all pairs.`;
    case 'few-expected':
      return `With ${symbol('n')} = ${note.trials} and a null proportion of ${format.bounded(note.mu, Math.max(2, decimalsOf(note.mu)))}, fewer than 5 successes or failures are expected under the null, ` +
        `so the normal approximation may be inaccurate; the exact \`${note.alternative}\` test does not rely on it.`;
    case 'constant-groups':
      return `${listOf(note.groups.map((g) => `“${g}”`))} ${note.groups.length > 1 ? 'are' : 'is'} constant (${symbol('SD')} 0).`;
    case 'smallest-effect-out-of-range':
      return `The declared smallest effect (${format.bounded(note.smallest, Math.max(2, decimalsOf(note.smallest)))}) would take the proportion beyond ${note.bound} ` +
        `from the first group’s ${format.bounded(note.baseline, 3)}, so no power is reported for it.`;
    case 'no-sensitivity':
      return `With groups of ${note.n1} and ${note.n2} and the first group’s proportion at ${format.bounded(note.baseline, 3)}, ` +
        'not even the largest possible change reaches 80% power, so no sensitivity is reported.';
  }
}

/** Decimals a declared value was written with. */
function decimalsOf(value: number): number {
  const text = String(value);
  return text.includes('.') ? text.length - text.indexOf('.') - 1 : 0;
}

/** A possessive name stands alone (`Welch’s t test`); others take an article (`The Kruskal–Wallis test`). */
function testSubject(title: string): string {
  return /^\S+[’']s\b/.test(title) ? title : `The ${title}`;
}

/** Upper-cases a leading Latin letter only: `ω²` and `ρ` are symbols, not words. */
export function capitalize(text: string): string {
  return /^[a-z]/.test(text) ? text.charAt(0).toUpperCase() + text.slice(1) : text;
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
export const effectSymbols: Record<string, string> = {
  'hedges-g': 'g',
  'rank-biserial': 'r_rb',
  'eta-squared': 'η²',
  'omega-squared': 'ω²',
  'epsilon-squared': 'ε²',
  'cramers-v': 'V',
  'cohens-w': 'w',
  'cohens-h': 'h',
  'odds-ratio': 'OR',
  'risk-difference': 'RD',
  'proportion-positive': 'π+',
  r: 'r',
  rho: 'ρ',
  'tau-b': 'τ_b',
  'r-squared': 'R²',
};

/** Names of effect sizes in sentences; Latin symbols marked for italics. */
export const effectNames: Record<string, string> = {
  'hedges-g': `Hedges’ ${symbol('g')}`,
  'rank-biserial': 'the rank-biserial correlation',
  'eta-squared': symbol('η²'),
  'omega-squared': symbol('ω²'),
  'epsilon-squared': symbol('ε²'),
  'cramers-v': `Cramér’s ${symbol('V')}`,
  'cohens-w': `Cohen’s ${symbol('w')}`,
  'cohens-h': `Cohen’s ${symbol('h')}`,
  'odds-ratio': 'the odds ratio',
  r: `Pearson’s ${symbol('r')}`,
  rho: `Spearman’s ${symbol('ρ')}`,
  'tau-b': `Kendall’s ${symbol('τ_b')}`,
  'r-squared': symbol('R²'),
  'proportion-positive': 'the proportion of positive differences',
};

/** Effects bounded by 1 in magnitude, printed without a leading zero. */
export const unitBoundedEffects = new Set(['rank-biserial', 'eta-squared', 'omega-squared', 'epsilon-squared', 'cramers-v', 'r', 'rho', 'tau-b', 'r-squared', 'risk-difference', 'proportion-positive']);

/** Symbols of test statistics. */
export const statisticSymbols: Record<string, string> = {
  'chi-square': 'χ²',
  'X-squared': 'χ²',
  chisq: 'χ²',
};

/** Headings and labels of the appendix (`NAME.appendix.md`/`.html`). */
export const appendixWords = {
  title: (title: string) => `Appendix: ${title}`,
  intro: (report: string) =>
    `Every analysis block of ${report} in full: the method and why it was chosen, the rows used and left out, ` +
    'every descriptive statistic, assumption check and comparison, and every warning.',
  blockHeading: (number: number, id: string, title: string) => `A${number}. ${id}: ${title}`,
  table: (number: number) => `Table A${number}.`,
  figure: (number: number) => `Figure A${number}.`,
  tableKinds: {
    descriptives: 'Descriptive statistics',
    counts: 'Observed counts',
    test: 'Test',
    posthoc: 'Post-hoc comparisons',
    assumptions: 'Assumption checks',
    coefficients: 'Regression coefficients',
    anova: 'Analysis of variance',
  } as Record<string, string>,
  of: (what: string, id: string) => `${what} of block ${id}.`,
  labels: {
    method: 'Method',
    variant: 'Computation',
    auto: 'Chosen by auto',
    alternative: 'Alternative',
    alpha: 'Significance level',
    confidence: 'Confidence level',
    data: 'Data',
    where: 'Rows kept by',
    rows: 'Rows',
    family: 'Multiple testing',
    smallestEffect: 'Smallest effect of interest',
    sensitivity: 'Sensitivity',
    warnings: 'Warnings',
    sentence: 'Result',
    plan: 'Plan',
    specifications: 'Specifications evaluated',
  },
  plan: (plan: 'confirmatory' | 'exploratory') =>
    plan === 'confirmatory' ? 'confirmatory: as recorded in stet.lock' : 'exploratory: not in stet.lock, or changed since it was locked',
  specifications: (count: number) =>
    count === 1
      ? '1: this is the only specification of this block evaluated while the report was written (.stet/ledger.jsonl)'
      : `${count} distinct specifications of this block were evaluated while the report was written (.stet/ledger.jsonl); only this one is reported`,
  rows: (used: number, missing: number, filter: number, levels: number) =>
    `${used} used; ${missing} left out for a missing value; ${filter} left out by the filter; ${levels} in levels not analysed`,
  noWhere: 'all rows (no filter)',
  family: (name: string, adjust: string, size: number) => `family ${name}, ${adjust}-adjusted across ${size} tests`,
  noFamily: 'not in a family; p not adjusted',
  power: (power: string, mde: string) => `power at the smallest effect of interest ${power}; smallest effect detectable with 80% power ${mde}`,
  mde: (mde: string) => `smallest effect detectable with 80% power ${mde}`,
  noWarnings: 'none',
  assumptionHeader: ['Check', 'Group', 'Statistic', 'p'],
  coefficientHeader: ['Term', 'Estimate', 'SE', 't', 'p', 'CI'],
  anovaHeader: ['Source', 'SS', 'df', 'MS'],
};

/**
 * Every word of stet's charts: titles, axis and legend labels, the `<desc>`
 * text alternatives, and the errors of a `chart:` that does not fit. Numbers
 * arrive formatted (src/charts/chart-draft.ts); lists arrive as parts.
 */
export const chartWords = {
  // Shared by several charts.
  interval: (level: string, lower: string, upper: string) => `${level} CI ${lower} to ${upper}`,
  upperBound: (level: string, upper: string) => `one-sided ${level} upper bound ${upper}`,
  lowerBound: (level: string, lower: string) => `one-sided ${level} lower bound ${lower}`,
  estimateLegend: (name: string, level: string, oneSided = false) => `${name}, ${oneSided ? 'one-sided ' : ''}${level} CI`,
  byTitle: (outcome: string, by: string) => `${capitalize(outcome)}${by ? ` by ${by}` : ''}`,
  count: 'Count',
  mean: 'mean',
  group: 'group',
  adjustedP: 'adjusted p',

  // Scatter plot of a correlation or a one-predictor regression.
  scatter: {
    title: (y: string, x: string) => `${capitalize(y)} against ${x}`,
    head: (y: string, x: string, n: number) => `Scatter plot of ${y} against ${x}, ${n} points`,
    regression: (head: string, line: string, slope: string, level: string) =>
      `${head}, with the least-squares line ${line} (slope ${slope}) and, shaded, its pointwise ${level} confidence band for the mean response.`,
    correlation: (head: string, line: string, linear: boolean) =>
      `${head}. The dashed least-squares line ${line} is a guide to the eye; the test is of the ${linear ? 'linear' : 'monotone (rank)'} association, and no band is drawn.`,
    noLine: (head: string) => `${head}.`,
  },

  // Interval plot of a regression's slopes (several predictors).
  slopes: {
    axis: (y: string) => `Slope of ${y}`,
    title: (y: string) => `Regression slopes for ${y}`,
    description: (count: number, y: string, level: string, parts: readonly string[]) =>
      `Interval plot of the ${count} regression slopes for ${y}, each with its ${level} confidence interval, against a dashed line at zero: ${parts.join('; ')}.`,
  },

  // Box or strip plot of numeric groups.
  groups: {
    centreLegend: (level: string) => `mean and ${level} CI`,
    part: (label: string, n: number, median: string, mean: string, interval: string | undefined) =>
      `${label} n = ${n}, median ${median}, mean ${mean}${interval ? ` (${interval})` : ''}`,
    description: (boxes: boolean, outcome: string, by: string, parts: readonly string[], level: string, complete: boolean) =>
      `${boxes ? 'Box plot' : 'Strip plot'} of ${outcome}${by ? ` by ${by}` : ''}: ${parts.join('; ')}. ` +
      `${boxes ? 'Every observation is a point; boxes show the quartiles and median, whiskers reach the furthest point within 1.5 IQR of the box' : 'Every observation is a point'}; ` +
      `a diamond with a bar beside each group marks its mean and ${level} confidence interval` +
      `${complete ? '' : ' (a group with one value or no spread has its mean alone)'}.`,
  },

  // Interval plot of post-hoc comparisons (`ID-pairs`).
  pairs: {
    what: (ranks: boolean) => (ranks ? 'difference in mean ranks' : 'difference in means'),
    title: (outcome: string, by: string) => `Pairwise comparisons of ${outcome}${by ? ` by ${by}` : ''}`,
    part: (b: string, a: string, estimate: string, interval: string | undefined, p: string) =>
      `${b} − ${a}: ${estimate}${interval ? `, simultaneous ${interval}` : ''}, ${p}`,
    /** `level` undefined: the comparisons have no intervals (Dunn's test). */
    description: (what: string, outcome: string, level: string | undefined, parts: readonly string[]) =>
      `Interval plot of every pairwise ${what} of ${outcome}${level === undefined ? '' : ` with simultaneous ${level} intervals`}, ` +
      `against a dashed line at zero: ${parts.join('; ')}.`,
  },

  // Histogram of one sample.
  histogram: {
    title: (outcome: string) => `Distribution of ${outcome}`,
    nullLabel: (value: string) => `μ₀ = ${value}`,
    summary: (outcome: string, n: number, median: string) => `Histogram of ${outcome}, n = ${n}, median ${median}.`,
    estimate: (name: string, value: string, interval: string) =>
      `The ${name} ${value} and its ${interval} are drawn as a diamond with a bar at the top.`,
    nullValue: (value: string) => `A dashed line marks the null value ${value}.`,
  },

  // Normal Q–Q plot of one sample.
  qq: {
    axis: 'Normal quantile',
    title: (outcome: string) => `Normal Q–Q plot of ${outcome}`,
    description: (outcome: string, n: number, intercept: string, slope: string) =>
      `Normal Q–Q plot of ${outcome}, n = ${n}: each sorted value against the standard normal quantile at its plotting position. ` +
      `The dashed line passes through the quartiles (intercept ${intercept}, slope ${slope} per standard deviation); ` +
      'normal data fall near it, bends at the ends indicate heavier or lighter tails, and a curve indicates skew.',
  },

  // Two panels of a paired design: the pairs, then their differences.
  paired: {
    title: (first: string, second: string) => `${capitalize(first)} and ${second}, paired`,
    meanDifference: 'mean difference',
    measurement: 'Measurement',
    difference: 'difference',
    differenceAxis: (label: string | undefined) => (label ? `Difference (${label})` : 'Difference'),
    estimate: (name: string, value: string, interval: string) => `The ${name} is ${value} (${interval}), marked by a diamond with a bar.`,
    description: (first: string, second: string, n: number, boxes: boolean, difference: string, median: string, reference: string, estimate: string | undefined) =>
      `Two panels. Left: ${first} and ${second} for each of ${n} pairs, one line per pair${boxes ? ', with box plots' : ''}. ` +
      `Right: the ${n} differences (${difference}), median ${median}, against a dashed line at ${reference}.${estimate ? ` ${estimate}` : ''}`,
  },

  // Bar charts of categorical blocks.
  counts: {
    proportion: (successes: number, trials: number, percent: string, level: string, lower: string, upper: string) =>
      `${successes} of ${trials} (${percent}, two-sided ${level} Wilson CI ${lower} to ${upper})`,
    proportionAxis: (success: string) => `Proportion ${success}`,
    proportionTitle: (success: string, by: string) => `Proportion ${success} by ${by}`,
    groupProportions: (outcome: string, success: string, by: string, parts: readonly string[]) =>
      `Bar chart of the proportion of ${outcome} = ${success} by ${by}, each bar with its Wilson interval: ${parts.join('; ')}.`,
    contingency: (outcome: string, by: string, parts: readonly string[]) =>
      `Grouped bar chart of counts of ${outcome} by ${by}: ${parts.join('; ')}.`,
    subjects: 'Subjects',
    paired: (first: string, second: string, parts: readonly string[]) =>
      `Grouped bar chart of the subjects by ${first} (groups) and ${second} (bars); the discordant bars are the pairs that changed: ${parts.join('; ')}.`,
    observed: 'observed',
    expected: 'expected',
    fitPart: (level: string, count: number, expected: string | undefined) =>
      `${level} ${count}${expected === undefined ? '' : ` (expected ${expected})`}`,
    fitTitle: (outcome: string) => `Observed and expected counts of ${outcome}`,
    fit: (outcome: string, parts: readonly string[]) =>
      `Grouped bar chart of the observed counts of ${outcome} beside the counts expected under the null hypothesis: ${parts.join('; ')}.`,
    oneProportion: (outcome: string, success: string, proportion: string, nullValue: string | undefined) =>
      `Bar chart of the proportion of ${outcome} = ${success}: ${proportion}` +
      `${nullValue === undefined ? '' : `; a dashed line marks the null proportion ${nullValue}`}.`,
  },

  // Forest plot of a family's estimates.
  family: {
    axis: 'Estimate',
    title: (name: string) => `Family ${name}: estimates with their intervals`,
    description: (count: number, name: string, levels: readonly string[], ratios: boolean, parts: readonly string[]) =>
      `Forest plot of the ${count} estimates of family ${name}, each with its ${levels.join(' or ')} confidence interval ` +
      `(intervals not adjusted for the family), against a dashed line at ${ratios ? 'one' : 'zero'}: ${parts.join('; ')}.`,
  },

  // A `chart:` kind that does not fit the block (UserError chart-not-applicable).
  choice: {
    notFitting: (kind: string, block: string) => `\`chart: ${kind}\` does not fit ${block}`,
    fitting: (kinds: readonly string[]) => `Charts that fit this block: ${kinds.map((k) => `\`${k}\``).join(', ')}.`,
    block: (method: string) => (method === 'describe' ? 'a describe block' : `a \`${method}\` block`),
    groups: (block: string) => `${block}: it compares groups of a numeric outcome`,
    paired: (block: string) => `${block}: it compares two paired measurements`,
    oneSample: (block: string) => `${block}: it has one numeric sample`,
    samples: (block: string, count: number) => `${block} with ${count} groups`,
    pair: (block: string) => `${block}: it relates two numeric columns`,
    predictors: (block: string, count: number) => `${block} with ${count} predictors (no single x axis)`,
    categorical: (block: string) => `${block}: its outcome is categorical (counts)`,
  },
} as const;
