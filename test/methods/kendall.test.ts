import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {kendall} from '../../src/methods/kendall.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {Alternative, BivariateDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits, sample} from './helpers.js';
import {nistRegression} from './nist-regression.js';

function design(x: ArrayLike<number>, y: ArrayLike<number>): BivariateDesign {
  return {kind: 'bivariate', x: [sample('x', Array.from(x))], y: sample('y', Array.from(y))};
}

interface Case {
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
  readonly tau: number;
  readonly p: Record<Alternative, number>;
  readonly variant: string;
}

const tuna = example<{data: {x_hunter_L: number[]; y_panel_score: number[]}; published: {kendall_for_reference: {T: number; tau: number; p_exact: number}}}>(
  'spearman_correlation--r-cortest-hollander-wolfe-1973-p187.json',
);
const doc = example<{data: {x: number[]; y: number[]}}>('pearson_correlation--scipy-doc.json').data;
const ties = example<{data: {x: number[]; y: number[]}}>('spearman_correlation--scipy-doc-ties.json').data;
const judges = example<{data: {CONT: number[]; INTG: number[]}}>('pearson_correlation--r-cortest-usjudgeratings.json').data;
const longley = nistRegression('Longley').design;
const filip = nistRegression('Filip').design;
const fx = filip.x[0]!.values;
const fy = filip.y.values;

// scipy 1.17.1: stats.kendalltau(x, y, alternative=alt, method=m) with m = 'exact' for the
// exact cases (scipy's 'auto' switches to the normal approximation above n = 33) and
// 'asymptotic' otherwise. Filip rows 18–62 and 18–72 are the longest runs without ties in y.
const cases: Record<string, Case> = {
  'tuna (n = 9)': {
    x: tuna.data.x_hunter_L,
    y: tuna.data.y_panel_score,
    tau: 0.4444444444444444,
    p: {'two-sided': 0.11943893298059964, greater: 0.05971946649029982, less: 0.9624118165784833},
    variant: 'exact',
  },
  'scipy pearsonr doc data (n = 7)': {
    x: doc.x,
    y: doc.y,
    tau: -0.7142857142857143,
    p: {'two-sided': 0.03015873015873016, greater: 0.9946428571428572, less: 0.01507936507936508},
    variant: 'exact',
  },
  'NIST Longley x1 vs y (n = 16)': {
    x: longley.x[0]!.values,
    y: longley.y.values,
    tau: 0.9166666666666666,
    p: {'two-sided': 1.3894896500716607e-9, greater: 6.947448250358304e-10, less: 0.9999999998220601},
    variant: 'exact',
  },
  'NIST Filip rows 18–62 (n = 45)': {
    x: fx.subarray(17, 62),
    y: fy.subarray(17, 62),
    tau: 0.9777777777777777,
    p: {'two-sided': 1.911916533544304e-45, greater: 9.55958266772152e-46, less: 1},
    variant: 'exact',
  },
  'NIST Filip rows 18–72 (n = 55, no ties)': {
    x: fx.subarray(17, 72),
    y: fy.subarray(17, 72),
    tau: 0.9542087542087543,
    p: {'two-sided': 8.084428160468928e-25, greater: 4.042214080234464e-25, less: 1},
    variant: 'normal approximation',
  },
  'NIST Filip, all 82 rows (ties in y)': {
    x: fx,
    y: fy,
    tau: 0.951506067258768,
    p: {'two-sided': 1.1148026876761472e-36, greater: 5.574013438380736e-37, less: 1},
    variant: 'normal approximation with tie correction',
  },
  'USJudgeRatings CONT vs INTG (n = 43, ties)': {
    x: judges.CONT,
    y: judges.INTG,
    tau: -0.12034401738852009,
    p: {'two-sided': 0.2697706159477087, greater: 0.8651146920261457, less: 0.13488530797385434},
    variant: 'normal approximation with tie correction',
  },
  'scipy spearmanr doc data (n = 5, ties)': {
    x: ties.x,
    y: ties.y,
    tau: 0.7378647873726218,
    p: {'two-sided': 0.07697417298126674, greater: 0.03848708649063337, less: 0.9615129135093666},
    variant: 'normal approximation with tie correction',
  },
};

describe('Kendall’s rank correlation', () => {
  for (const [name, c] of Object.entries(cases)) {
    it(`matches scipy kendalltau on ${name}`, () => {
      for (const alternative of ['two-sided', 'greater', 'less'] as const) {
        const result = kendall.compute(design(c.x, c.y), options({alternative}));
        expect(lre(result.estimate!.value, c.tau), alternative).toBeGreaterThanOrEqual(15);
        expect(lre(result.p, c.p[alternative]), alternative).toBeGreaterThanOrEqual(c.variant === 'exact' ? 13 : pDigits);
        expect(result.variant).toBe(c.variant);
        expect(result.statistic.name).toBe(c.variant === 'exact' ? 'T' : 'z');
      }
    });
  }

  it('reports R’s T = 26 and exact p = 0.05972 on the tuna data', () => {
    const result = kendall.compute(design(tuna.data.x_hunter_L, tuna.data.y_panel_score), options({alternative: 'greater'}));
    // R stats-Ex.Rout.save, ?cor.test(method = "kendall", alternative = "greater"): T = 26, p-value = 0.05972, tau 0.4444444
    const printed = tuna.published.kendall_for_reference;
    expect(result.statistic).toEqual({name: 'T', value: printed.T});
    expect(Number(result.p.toPrecision(4))).toBe(printed.p_exact);
    expect(Number(result.estimate!.value.toPrecision(7))).toBe(printed.tau);
  });

  it('gives the Fieller–Hartley–Pearson Fisher-z interval', () => {
    const twoSided = kendall.compute(design(tuna.data.x_hunter_L, tuna.data.y_panel_score), options());
    // mpmath 1.3.0 at 40 digits: tanh(atanh(4/9) ± z_.975 √(0.437/5))
    expect(lre(twoSided.estimate!.ci[0], -0.10132909957581678)).toBeGreaterThanOrEqual(14);
    expect(lre(twoSided.estimate!.ci[1], 0.78458581177199357)).toBeGreaterThanOrEqual(14);
    const less = kendall.compute(design(judges.CONT, judges.INTG), options({alternative: 'less'}));
    // mpmath 1.3.0 at 40 digits: tanh(atanh(tau) + z_.95 √(0.437/39)), tau = -0.12034401738852009
    expect(less.estimate!.ci[0]).toBe(-1);
    expect(lre(less.estimate!.ci[1], 0.053134617057799291)).toBeGreaterThanOrEqual(13);
    expect(less.effect).toEqual({name: 'tau-b', value: less.estimate!.value, ci: less.estimate!.ci});
  });

  it('refuses fewer than 5 pairs and a constant variable', () => {
    expect(() => kendall.compute(design([1, 2, 3, 4], [3, 1, 2, 4]), options())).toThrow(MethodError);
    expect(() => kendall.compute(design([1, 2, 3, 4, 5], [0, 0, 0, 0, 0]), options())).toThrow(/y is constant/);
  });
});

describe('Kendall’s rank correlation: properties', () => {
  // Small integers make ties common; n spans the exact and approximate ranges.
  const pairs = fc
    .integer({min: 5, max: 70})
    .chain((n) =>
      fc.tuple(
        fc.oneof(fc.array(fc.integer({min: 0, max: 8}), {minLength: n, maxLength: n}), fc.shuffledSubarray(Array.from({length: n}, (_, i) => i), {minLength: n, maxLength: n})),
        fc.oneof(fc.array(fc.integer({min: 0, max: 8}), {minLength: n, maxLength: n}), fc.shuffledSubarray(Array.from({length: n}, (_, i) => i), {minLength: n, maxLength: n})),
      ),
    )
    .filter(([x, y]) => new Set(x).size > 1 && new Set(y).size > 1);

  it('tau-b equals the O(n²) definition; p in [0, 1]; invariant under shuffling rows and swapping x and y', () => {
    fc.assert(
      fc.property(pairs, fc.infiniteStream(fc.nat()), ([x, y], seeds) => {
        const base = kendall.compute(design(x, y), options());
        // Kendall 1945: tau-b = Σ sign(dx)·sign(dy) / √((n0 − n1)(n0 − n2)), by brute force.
        let s = 0;
        let tx = 0;
        let ty = 0;
        for (let i = 0; i < x.length; i++) {
          for (let j = i + 1; j < x.length; j++) {
            s += Math.sign(x[i]! - x[j]!) * Math.sign(y[i]! - y[j]!);
            tx += x[i] === x[j] ? 1 : 0;
            ty += y[i] === y[j] ? 1 : 0;
          }
        }
        const n0 = (x.length * (x.length - 1)) / 2;
        expect(lre(base.estimate!.value, s / Math.sqrt((n0 - tx) * (n0 - ty)))).toBeGreaterThanOrEqual(14);
        const order = x.map((_, i) => ({i, key: seeds.next().value as number})).sort((a, b) => a.key - b.key);
        const shuffled = kendall.compute(design(order.map((o) => x[o.i]!), order.map((o) => y[o.i]!)), options());
        const swapped = kendall.compute(design(y, x), options());
        for (const other of [shuffled, swapped]) {
          expect(other.estimate!.value).toBe(base.estimate!.value);
          expect(other.p).toBe(base.p);
        }
        const greater = kendall.compute(design(x, y), options({alternative: 'greater'})).p;
        const less = kendall.compute(design(x, y), options({alternative: 'less'})).p;
        for (const p of [base.p, greater, less]) {
          expect(p).toBeGreaterThanOrEqual(0);
          expect(p).toBeLessThanOrEqual(1);
        }
        expect(lre(base.p, Math.min(1, 2 * Math.min(greater, less)))).toBeGreaterThanOrEqual(14);
      }),
      {numRuns: 200},
    );
  });
});
