import {readFileSync} from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {prepareDesign} from '../../src/compute/prepare-design.js';
import {anova} from '../../src/methods/anova.js';
import {MethodError} from '../../src/methods/method-error.js';
import {studentT} from '../../src/methods/student-t.js';
import type {KGroupDesign, MethodOptions, Sample} from '../../src/methods/types.js';
import {parseBlock} from '../../src/spec/parse-block.js';
import {defaultSettings} from '../../src/spec/parse-settings.js';
import {makeDataset} from '../data/make-dataset.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, options as baseOptions, pDigits, sample} from './helpers.js';

const options = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  baseOptions({posthoc: undefined, correction: 'none', intercept: true, ...overrides});

const run = (samples: Sample[], overrides: Partial<MethodOptions> = {}) =>
  anova.compute({kind: 'k-group', samples}, options(overrides));

type Groups = Record<string, number[]>;
const groupsOf = (data: Groups): Sample[] => Object.entries(data).map(([label, values]) => sample(label, values));

interface Table {
  between: {ss: number; df: number; ms: number};
  within: {ss: number; df: number; ms: number};
  total: {ss: number; df: number};
}
const tableOf = (details: unknown) => (details as {anova_table: Table}).anova_table;

/** A NIST StRD ANOVA file: its data rows (group, response text) and certified values. */
interface NistAnova {
  readonly rows: readonly (readonly [string, string])[];
  readonly ssBetween: number;
  readonly ssWithin: number;
  readonly msBetween: number;
  readonly msWithin: number;
  readonly f: number;
  readonly rSquared: number;
  readonly residualSd: number;
  readonly df: readonly [number, number];
}

const nistDir = path.resolve(new URL('../..', import.meta.url).pathname, '../shared/reference/nist-strd');

function nistAnova(name: string): NistAnova {
  const certified = JSON.parse(readFileSync(path.join(nistDir, 'certified.json'), 'utf8'))[name];
  const lines = readFileSync(path.join(nistDir, certified.file), 'latin1').split(/\r?\n/);
  const rows = lines
    .slice(certified.lines.data[0] - 1, certified.lines.data[1])
    .map((line) => line.trim().split(/\s+/) as [string, string]);
  return {
    rows,
    ssBetween: Number(certified.between.ss),
    ssWithin: Number(certified.within.ss),
    msBetween: Number(certified.between.ms),
    msWithin: Number(certified.within.ms),
    f: Number(certified.between.f),
    rSquared: Number(certified.r_squared),
    residualSd: Number(certified.residual_sd),
    df: [certified.between.df, certified.within.df],
  };
}

/** Groups in file order from (group, value) rows. */
function groupRows(rows: readonly (readonly [string, number])[]): Sample[] {
  const groups = new Map<string, number[]>();
  for (const [g, v] of rows) {
    const values = groups.get(g) ?? [];
    values.push(v);
    groups.set(g, values);
  }
  return [...groups].map(([label, values]) => sample(label, values));
}

/**
 * The file's rows as the text cells of a CSV, read by the data stage and
 * split by the design stage as the block `test: anova`, `y: response`,
 * `by: treatment` would be: each sample carries its exact decimal centring.
 */
async function nistDesign(nist: NistAnova): Promise<KGroupDesign> {
  const dataset = await makeDataset(`treatment,response\n${nist.rows.map(([g, v]) => `${g},${v}`).join('\n')}\n`);
  const at = {line: 1, column: 1};
  const spec = parseBlock('id: nist\ntest: anova\ndata: mem\ny: response\nby: treatment\n', at, at, defaultSettings);
  return prepareDesign(spec, 'k-group', dataset, new Uint8Array(dataset.rowCount).fill(1)).design as KGroupDesign;
}

function certifiedDigits(result: ReturnType<typeof run>, nist: NistAnova): Record<string, number> {
  const table = tableOf(result.details);
  const details = result.details as {r_squared: number; residual_sd: number};
  return {
    ssBetween: lre(table.between.ss, nist.ssBetween),
    msBetween: lre(table.between.ms, nist.msBetween),
    ssWithin: lre(table.within.ss, nist.ssWithin),
    msWithin: lre(table.within.ms, nist.msWithin),
    f: lre(result.statistic.value, nist.f),
    rSquared: lre(details.r_squared, nist.rSquared),
    residualSd: lre(details.residual_sd, nist.residualSd),
  };
}

/**
 * Digits reached on the certified values when the data are read as
 * doubles only (Number of the text, samples without `centred`), measured: SiRstv 13.1, SmLs01–03 15.1,
 * AtmWtAg 10.2, SmLs04–06 9.9, SmLs07–09 3.9. Below 13 digits the loss is
 * the rounding of the decimals to doubles: the same statistics computed
 * exactly (Python fractions) from those doubles agree with ours to 15.7
 * digits or more (the F values below).
 */
const DOUBLE_INPUT_FLOOR: Record<string, number> = {
  SiRstv: 13, SmLs01: 15, SmLs02: 15, SmLs03: 15, AtmWtAg: 10, SmLs04: 9.5, SmLs05: 9.5, SmLs06: 9.5, SmLs07: 3.5, SmLs08: 3.5, SmLs09: 3.5,
};

/** F computed exactly from the doubles (Python 3.11 fractions.Fraction on float(text)). */
const EXACT_F_FROM_DOUBLES: Record<string, number> = {
  SiRstv: 1.1804623744024467, SmLs01: 21.0, SmLs02: 201.00000000000003, SmLs03: 2001.0000000000002,
  AtmWtAg: 15.946733566676926, SmLs04: 21.0000000007761, SmLs05: 201.00000001241764, SmLs06: 2001.0000001288329,
  SmLs07: 21.00081188781877, SmLs08: 201.01300409594845, SmLs09: 2001.1349262209505,
};

describe('one-way ANOVA', () => {
  describe('NIST StRD ANOVA files (certified values)', () => {
    for (const name of Object.keys(DOUBLE_INPUT_FLOOR)) {
      it(`${name}: read as doubles, the input-limited digits`, () => {
        const nist = nistAnova(name);
        const result = run(groupRows(nist.rows.map(([g, v]) => [g, Number(v)])));
        for (const [key, digits] of Object.entries(certifiedDigits(result, nist))) {
          expect(digits, `${name} ${key}`).toBeGreaterThanOrEqual(DOUBLE_INPUT_FLOOR[name]!);
        }
        expect(lre(result.statistic.value, EXACT_F_FROM_DOUBLES[name]!), name).toBeGreaterThanOrEqual(15);
        expect(result.df).toEqual(nist.df);
      });

      it(`${name}: read exactly by the data stage, at least 14 digits`, async () => {
        const nist = nistAnova(name);
        const design = await nistDesign(nist);
        expect(design.samples.every((s) => s.centred !== undefined)).toBe(true);
        const result = anova.compute(design, options());
        // Measured: at least 14.5 digits on every file and statistic (lowest: AtmWtAg SS_within 14.50,
        // SiRstv F 14.73; SmLs01–09 15.6 or more, against certified values printed to 15 digits).
        for (const [key, digits] of Object.entries(certifiedDigits(result, nist))) {
          expect(digits, `${name} ${key}`).toBeGreaterThanOrEqual(14);
        }
        expect(result.df).toEqual(nist.df);
      });
    }
  });

  it('matches R anova(lm(weight ~ group, PlantGrowth)) and its scipy recomputation', () => {
    const reference = example<{data: Groups; published: Record<string, number>; scipy: Record<string, number>}>(
      'anova_oneway--r-datasets-plantgrowth.json',
    );
    const result = run(groupsOf(reference.data));
    const table = tableOf(result.details);
    // scipy 1.10 f_oneway in the reference file
    expect(lre(result.statistic.value, reference.scipy.F!)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value!)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(table.between.ss, reference.scipy.SS_group!)).toBeGreaterThanOrEqual(13);
    expect(lre(table.within.ss, reference.scipy.SS_residual!)).toBeGreaterThanOrEqual(13);
    expect(lre(table.within.ms, reference.scipy.MS_residual!)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.value, reference.scipy.eta_squared_derived!)).toBeGreaterThanOrEqual(13);
    expect(lre((result.details as {omega_squared: {value: number}}).omega_squared.value, reference.scipy.omega_squared_derived!)).toBeGreaterThanOrEqual(13);
    // R datasets-Ex.Rout.save prints F 4.8461, p 0.01591, Sum Sq 3.7663 and 10.4921
    expect(result.statistic.value.toFixed(4)).toBe(reference.published.F!.toFixed(4));
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    expect(table.between.ss.toFixed(4)).toBe(reference.published.SS_group!.toFixed(4));
    expect(table.within.ss.toFixed(4)).toBe(reference.published.SS_residual!.toFixed(4));
    expect(result.df).toEqual([2, 27]);
    expect(table.total).toEqual({ss: table.between.ss + table.within.ss, df: 29});
  });

  it('gives η² an interval by inverting the noncentral F (PlantGrowth)', () => {
    const reference = example<{data: Groups}>('anova_oneway--r-datasets-plantgrowth.json');
    const result = run(groupsOf(reference.data));
    // mpmath 1.3.0 at 40 digits: λ with P(F' ≤ 4.846087862380136; 2, 27, λ) = .975 and .025
    // (the noncentral F series, secant root), mapped to λ/(λ + 30).
    const expected: [number, number] = [0.3000911501789342789 / 30.3000911501789342789, 25.959340258891299359 / 55.959340258891299359];
    expect(lre(result.effect!.ci![0], expected[0])).toBeGreaterThanOrEqual(12);
    expect(lre(result.effect!.ci![1], expected[1])).toBeGreaterThanOrEqual(12);
    expect(result.effect!.name).toBe('eta-squared');
    expect((result.details as {omega_squared: {ci: unknown}}).omega_squared.ci).toEqual(result.effect!.ci);
  });

  it('estimates the largest difference in means with a Bonferroni-simultaneous interval', () => {
    const reference = example<{data: Groups}>('anova_oneway--r-datasets-plantgrowth.json');
    const estimate = run(groupsOf(reference.data)).estimate!;
    expect(estimate.name).toBe('largest difference in means (trt2 - trt1)');
    // numpy mean difference; scipy 1.17.1: half-width t.ppf(1 - .05/6, 27) * sqrt(MS_within * (1/10 + 1/10))
    expect(lre(estimate.value, 0.8650000000000002)).toBeGreaterThanOrEqual(14);
    expect(intervalDigits(estimate.ci, [0.1534214287326333, 1.5765785712673672], lre)).toBeGreaterThanOrEqual(12);
    expect(estimate.level).toBe(0.95);
  });

  it('matches scipy f_oneway with unequal group sizes (McDonald mussel data)', () => {
    const reference = example<{data: Groups; scipy: {F: number; p_value: number}}>('anova_oneway--scipy-doc-mcdonald-mussel.json');
    const result = run(groupsOf(reference.data));
    // scipy docs f_oneway, full precision
    expect(lre(result.statistic.value, reference.scipy.F)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(result.df).toEqual([4, 34]);
    // mpmath 1.3.0 at 40 digits: λ at P(F' ≤ 7.121019471642447; 4, 34, λ) = .975 and .025, over λ + 39
    expect(lre(result.effect!.ci![0], 6.4472591018017022649 / 45.4472591018017022649)).toBeGreaterThanOrEqual(12);
    expect(lre(result.effect!.ci![1], 54.98661704317878969 / 93.98661704317878969)).toBeGreaterThanOrEqual(12);
  });

  it('matches the NIST e-Handbook 7.4.3.3 example and Lakens (2013) effect sizes', () => {
    const handbook = example<{data: Groups; scipy: Record<string, number>; published: Record<string, number>}>(
      'anova_oneway--nist-ehandbook-7433.json',
    );
    let result = run(groupsOf(handbook.data));
    // scipy 1.10 recomputation in the reference file; the handbook prints F = 9.59
    expect(lre(result.statistic.value, handbook.scipy.F!)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, handbook.scipy.p_value!)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.effect!.value, handbook.scipy.eta_squared!)).toBeGreaterThanOrEqual(13);
    expect(lre((result.details as {omega_squared: {value: number}}).omega_squared.value, handbook.scipy.omega_squared!)).toBeGreaterThanOrEqual(13);
    expect(result.statistic.value.toFixed(2)).toBe(handbook.published.F!.toFixed(2));

    const lakens = example<{data: {movie_1: number[]; movie_2: number[]}; scipy: Record<string, number>; published: Record<string, number>}>(
      'effect_size_eta_omega_squared--lakens2013-movies.json',
    );
    result = run([sample('movie 1', lakens.data.movie_1), sample('movie 2', lakens.data.movie_2)]);
    // Lakens 2013, Table 1 (2 decimals): F = 6.34, η² = 0.26, ω² = 0.21; full precision from the file's scipy block
    expect(lre(result.statistic.value, lakens.scipy.F!)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.value, lakens.scipy.partial_eta_squared!)).toBeGreaterThanOrEqual(13);
    expect(lre((result.details as {omega_squared: {value: number}}).omega_squared.value, lakens.scipy.partial_omega_squared!)).toBeGreaterThanOrEqual(13);
    expect(result.effect!.value.toFixed(2)).toBe(lakens.published.partial_eta_squared!.toFixed(2));
  });

  it('equals Student’s t squared with two groups, and its interval', () => {
    const lakens = example<{data: {movie_1: number[]; movie_2: number[]}}>('effect_size_eta_omega_squared--lakens2013-movies.json');
    const [a, b] = [sample('movie 2', lakens.data.movie_2), sample('movie 1', lakens.data.movie_1)];
    const result = run([a, b]);
    const t = studentT.compute({kind: 'two-group', first: a, second: b}, options());
    expect(lre(result.statistic.value, t.statistic.value ** 2)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, t.p)).toBeGreaterThanOrEqual(12);
    expect(result.estimate!.name).toBe('largest difference in means (movie 1 - movie 2)');
    expect(intervalDigits(result.estimate!.ci, t.estimate!.ci, lre)).toBeGreaterThanOrEqual(13);
  });

  it('reports sensitivity at the declared smallest effect and the 80% detectable effect', () => {
    const reference = example<{data: Groups}>('anova_oneway--r-datasets-plantgrowth.json');
    const groups = groupsOf(reference.data);
    const sensitivity = run(groups, {smallestEffect: 0.5}).sensitivity!;
    // mpmath 1.3.0 at 40 digits: P(F' > F_.95(2, 27); 2, 27, λ), λ = 0.5² · 10 / (2 · MS_within),
    // MS_within = 0.38859592592592596 (the file's scipy value), critical value by root of the central F
    expect(lre(sensitivity.power_at_smallest_effect!, 0.30996387524330000414)).toBeGreaterThanOrEqual(11);
    // mpmath 1.3.0 at 40 digits: δ with power 0.8, √(λ₈₀ · 2 · MS_within / 10), λ₈₀ = 10.788562202782547307
    expect(lre(sensitivity.min_detectable_effect_80, 0.91568458746445343447)).toBeGreaterThanOrEqual(11);
    expect(run(groups).sensitivity!.power_at_smallest_effect).toBeNull();
  });

  it('warns when spreads differ by more than a factor of two', () => {
    const result = run([sample('a', [1, 2, 3, 4]), sample('b', [10, 20, 30, 40]), sample('c', [5, 6, 7, 8])]);
    expect(result.warnings).toEqual([{kind: 'spread-ratio', larger: 'b', smaller: 'a', ratio: expect.closeTo(10, 12), alternative: 'welch-anova'}]);
    expect(run([sample('a', [1, 2, 3]), sample('b', [2, 3, 4])]).warnings).toEqual([]);
  });

  it('rejects data that make the test impossible, with a MethodError', () => {
    expect(() => run([sample('a', [1, 2, 3])])).toThrow(MethodError);
    expect(() => run([sample('a', [1, 2]), sample('b', [])])).toThrow(/b has no observations/);
    expect(() => run([sample('a', [1]), sample('b', [2])])).toThrow(MethodError);
    expect(() => run([sample('a', [1, 1]), sample('b', [2, 2])])).toThrow(/no variation within groups/);
    expect(() => run([sample('a', [1, 2]), sample('b', [2, 4])], {alternative: 'greater'})).toThrow(/no direction/);
  });

  it('gives F = 0, p = 1 and a zero interval when every group mean is equal', () => {
    const result = run([sample('a', [1, 3]), sample('b', [0, 4]), sample('c', [2, 2, 2, 1, 3])]);
    expect(result.statistic.value).toBe(0);
    expect(result.p).toBe(1);
    expect(result.effect!.ci).toEqual([0, 0]);
  });

  describe('properties', () => {
    const groupsArb = fc.array(fc.array(fc.integer({min: -1e6, max: 1e6}).map((v) => v / 1000), {minLength: 2, maxLength: 8}), {
      minLength: 2,
      maxLength: 5,
    });
    const valid = (groups: number[][]) => groups.some((g) => g.some((v) => v !== g[0]));

    it('keeps p in [0, 1]', () => {
      fc.assert(
        fc.property(groupsArb, (groups) => {
          fc.pre(valid(groups));
          const p = run(groups.map((g, i) => sample(`g${i}`, g))).p;
          expect(p).toBeGreaterThanOrEqual(0);
          expect(p).toBeLessThanOrEqual(1);
        }),
        {numRuns: 100},
      );
    });

    it('is unchanged by shuffling rows within groups and by reordering and relabelling groups', () => {
      fc.assert(
        fc.property(groupsArb, fc.integer(), (groups, seed) => {
          fc.pre(valid(groups));
          const base = run(groups.map((g, i) => sample(`g${i}`, g)));
          const shuffle = <T>(items: T[], s: number): T[] =>
            items.map((item, i) => [((s + 1) * 2654435761 * (i + 1)) % 1000003, item] as const).sort((a, b) => a[0] - b[0]).map(([, item]) => item);
          const moved = run(shuffle(groups.map((g, i) => sample(`label ${i}`, shuffle(g, seed + i))), seed));
          expect(lre(moved.statistic.value, base.statistic.value)).toBeGreaterThanOrEqual(12);
          expect(lre(moved.p, base.p)).toBeGreaterThanOrEqual(11);
          expect(lre(moved.estimate!.value, base.estimate!.value)).toBeGreaterThanOrEqual(12);
          expect(lre(moved.effect!.ci![1], base.effect!.ci![1])).toBeGreaterThanOrEqual(10);
        }),
        {numRuns: 60},
      );
    });
  });
});
