import {example} from '../../helpers/reference.js';

/**
 * Reference values for the adjustment tests. The three shared examples are
 * read from shared/reference/examples/ at run time (field names below); the
 * R multtest tables, which live in no shared file, were transcribed by
 * script from their source, never typed by hand.
 */

type Pairs = Readonly<Record<string, number>>;

interface NeuhausFile {
  data: {p_values: number[]};
  published: {
    bh_adjusted_scipy_docs: number[];
    bonferroni_times_m_scipy_docs: number[];
    'bh_rejections_at_0.05': number;
    'bonferroni_rejections_at_0.05': number;
  };
  scipy: {
    bh_adjusted_scipy_docs: number[];
    bonferroni_adjusted: number[];
    holm_adjusted_derived: number[];
    'holm_rejections_at_0.05_derived': number;
  };
}

const bh1995 = example<NeuhausFile>('p_adjust_bh_bonferroni_holm--benjamini-hochberg-1995.json');

/**
 * shared/reference/examples/p_adjust_bh_bonferroni_holm--benjamini-hochberg-1995.json:
 * the 15 p-values of Benjamini & Hochberg (1995), worked example (Neuhaus et al. 1992).
 */
export const neuhaus = {
  /** `data.p_values` */
  p: bh1995.data.p_values,
  /** `published.bh_adjusted_scipy_docs`, printed by numpy to 8 decimal places */
  bhPublished: bh1995.published.bh_adjusted_scipy_docs,
  /** `scipy.bh_adjusted_scipy_docs` (statsmodels fdr_bh, full precision) */
  bhScipy: bh1995.scipy.bh_adjusted_scipy_docs,
  /** `published.bonferroni_times_m_scipy_docs` (p·m before the cap) */
  bonferroniTimesMPublished: bh1995.published.bonferroni_times_m_scipy_docs,
  /** `scipy.bonferroni_adjusted` (statsmodels bonferroni, capped at 1) */
  bonferroniScipy: bh1995.scipy.bonferroni_adjusted,
  /** `scipy.holm_adjusted_derived` (statsmodels holm; not in the paper) */
  holmScipy: bh1995.scipy.holm_adjusted_derived,
  /** `published.bh_rejections_at_0.05` */
  bhRejectionsPublished: bh1995.published['bh_rejections_at_0.05'],
  /** `published.bonferroni_rejections_at_0.05` */
  bonferroniRejectionsPublished: bh1995.published['bonferroni_rejections_at_0.05'],
  /** `scipy.holm_rejections_at_0.05_derived` */
  holmRejectionsScipy: bh1995.scipy['holm_rejections_at_0.05_derived'],
};

interface FleissFile {
  published: {holm_adjusted: Pairs};
  scipy: {raw: Pairs; holm_adjusted: Pairs};
}

const fleissFile = example<FleissFile>('p_adjust_holm--r-pairwise-prop-test-fleiss1981.json');
const fleissPairs = Object.keys(fleissFile.scipy.raw);

/**
 * shared/reference/examples/p_adjust_holm--r-pairwise-prop-test-fleiss1981.json:
 * Holm over the 6 Yates-corrected pairwise proportion tests (R ?pairwise.prop.test).
 */
export const fleiss = {
  pairs: fleissPairs,
  /** `scipy.raw` (scipy chi2_contingency, correction=True) */
  raw: inPairOrder(fleissFile.scipy.raw, fleissPairs),
  /** `scipy.holm_adjusted` (statsmodels holm) */
  holmScipy: inPairOrder(fleissFile.scipy.holm_adjusted, fleissPairs),
  /** `published.holm_adjusted`, printed by R to 3 decimals */
  holmPublished: inPairOrder(fleissFile.published.holm_adjusted, fleissPairs),
};

type AirqualityFields = 'holm_pooled_sd' | 'bonferroni_pooled_sd' | 'holm_welch';

interface AirqualityFile {
  data: Record<'ozone_May' | 'ozone_Jun' | 'ozone_Jul' | 'ozone_Aug' | 'ozone_Sep', number[]>;
  published: Record<AirqualityFields, Pairs>;
  scipy: Record<AirqualityFields, Pairs>;
}

const airFile = example<AirqualityFile>('p_adjust_holm_bonferroni--r-pairwise-t-airquality.json');
const airPairs = Object.keys(airFile.published.holm_pooled_sd);

/**
 * shared/reference/examples/p_adjust_holm_bonferroni--r-pairwise-t-airquality.json:
 * pairwise t tests of Ozone by Month (R ?pairwise.t.test), NA dropped.
 * Pairs are "later-earlier" in R's lower-triangle order.
 */
export const airquality = {
  /** `data.ozone_*` */
  ozone: {
    May: airFile.data.ozone_May,
    Jun: airFile.data.ozone_Jun,
    Jul: airFile.data.ozone_Jul,
    Aug: airFile.data.ozone_Aug,
    Sep: airFile.data.ozone_Sep,
  },
  pairs: airPairs,
  /** `scipy.holm_pooled_sd` */
  holmPooledScipy: inPairOrder(airFile.scipy.holm_pooled_sd, airPairs),
  /** `published.holm_pooled_sd`, printed by R to 5 decimals */
  holmPooledPublished: inPairOrder(airFile.published.holm_pooled_sd, airPairs),
  /** `scipy.bonferroni_pooled_sd` */
  bonferroniPooledScipy: inPairOrder(airFile.scipy.bonferroni_pooled_sd, airPairs),
  /** `published.bonferroni_pooled_sd`, printed by R to 5 decimals */
  bonferroniPooledPublished: inPairOrder(airFile.published.bonferroni_pooled_sd, airPairs),
  /** `scipy.holm_welch` */
  holmWelchScipy: inPairOrder(airFile.scipy.holm_welch, airPairs),
  /** `published.holm_welch`, printed by R to 5 decimals */
  holmWelchPublished: inPairOrder(airFile.published.holm_welch, airPairs),
};

function inPairOrder(values: Pairs, pairs: readonly string[]): number[] {
  return pairs.map((pair) => {
    const value = values[pair];
    if (value === undefined) throw new Error(`reference file lacks pair ${pair}`);
    return value;
  });
}

/**
 * R package multtest, `mt.rawp2adjp`, as stored in statsmodels'
 * statsmodels/stats/tests/test_multi.py (commit 0123770f843f5d1f20912249ee2510ffad2fbed1),
 * arrays `res_multtest1`, `res_multtest2`, `res_multtest3`, `res0_large`; columns
 * rawp, Bonferroni, Holm, Hochberg, BH, BY. Rows are sorted by raw p.
 */
export interface MulttestTable {
  readonly raw: readonly number[];
  readonly bonferroni: readonly number[];
  readonly holm: readonly number[];
  readonly hochberg: readonly number[];
  readonly bh: readonly number[];
  readonly by: readonly number[];
}

export const multtest: Readonly<Record<string, MulttestTable>> = {
  /** `res_multtest1` */
  multtest1: {
    raw: [
      5.23656777208e-05, 0.00028140506198, 0.0149877310796, 0.0202732688798, 0.177096952723,
      0.642193923795, 0.680845947633, 0.71626938238, 0.838541367553, 0.967833824309,
    ],
    bonferroni: [
      0.000523656777208, 0.0028140506197999998, 0.149877310796, 0.202732688798, 1, 1, 1, 1, 1, 1,
    ],
    holm: [
      0.000523656777208, 0.00253264555782, 0.1199018486368, 0.1419128821586, 1, 1, 1, 1, 1, 1,
    ],
    hochberg: [
      0.000523656777208, 0.00253264555782, 0.1199018486368, 0.1419128821586, 0.967833824309,
      0.967833824309, 0.967833824309, 0.967833824309, 0.967833824309, 0.967833824309,
    ],
    bh: [
      0.000523656777208, 0.0014070253098999999, 0.04995910359866667, 0.0506831721995,
      0.354193905446, 0.8953367279750001, 0.8953367279750001, 0.8953367279750001,
      0.9317126306144445, 0.967833824309,
    ],
    by: [
      0.0015337740764175588, 0.004121132465226944, 0.14632862843720582, 0.14844940238274187, 1, 1,
      1, 1, 1, 1,
    ],
  },
  /** `res_multtest2` */
  multtest2: {
    raw: [
      0.002, 0.004, 0.006, 0.008, 0.01, 0.012,
    ],
    bonferroni: [
      0.012, 0.024, 0.036, 0.048, 0.06, 0.072,
    ],
    holm: [
      0.012, 0.02, 0.024, 0.024, 0.024, 0.024,
    ],
    hochberg: [
      0.012, 0.012, 0.012, 0.012, 0.012, 0.012,
    ],
    bh: [
      0.012, 0.012, 0.012, 0.012, 0.012, 0.012,
    ],
    by: [
      0.0294, 0.0294, 0.0294, 0.0294, 0.0294, 0.0294,
    ],
  },
  /** `res_multtest3` */
  multtest3: {
    raw: [
      0.001, 0.002, 0.003, 0.004, 0.005, 0.05, 0.06, 0.07, 0.08, 0.09,
    ],
    bonferroni: [
      0.01, 0.02, 0.03, 0.04, 0.05, 0.5, 0.6, 0.7, 0.8, 0.9,
    ],
    holm: [
      0.01, 0.018, 0.024, 0.028, 0.03, 0.25, 0.25, 0.25, 0.25, 0.25,
    ],
    hochberg: [
      0.01, 0.018, 0.024, 0.028, 0.03, 0.09, 0.09, 0.09, 0.09, 0.09,
    ],
    bh: [
      0.01, 0.01, 0.01, 0.01, 0.01, 0.08333333333333334, 0.0857142857142857, 0.0875,
      0.0888888888888889, 0.09,
    ],
    by: [
      0.02928968253968254, 0.02928968253968254, 0.02928968253968254, 0.02928968253968254,
      0.02928968253968254, 0.2440806878306878, 0.2510544217687075, 0.2562847222222222,
      0.260352733686067, 0.2636071428571428,
    ],
  },
  /** `res0_large` */
  large: {
    raw: [
      0.00031612, 0.0003965, 0.00048442, 0.00051932, 0.00101436, 0.00121506, 0.0014516, 0.00265684,
      0.00430043, 0.01743686, 0.02080285, 0.02785414, 0.0327198, 0.03494679, 0.04206808,
      0.08067095, 0.23882767, 0.28352304, 0.36140401, 0.43565145, 0.44866768, 0.45368782,
      0.48282088, 0.49223781, 0.55451638, 0.6207473, 0.71847853, 0.72424145, 0.85950263,
      0.89032747,
    ],
    bonferroni: [
      0.0094836, 0.011895, 0.0145326, 0.0155796, 0.0304308, 0.0364518, 0.043548, 0.0797052,
      0.1290129, 0.5231058, 0.6240855, 0.8356242, 0.981594, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1,
      1, 1, 1, 1,
    ],
    holm: [
      0.0094836, 0.0114985, 0.01356376, 0.01402164, 0.02637336, 0.0303765, 0.0348384, 0.06110732,
      0.09460946, 0.36617406, 0.416057, 0.52922866, 0.5889564, 0.59409543, 0.67308928, 1, 1, 1, 1,
      1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1,
    ],
    hochberg: [
      0.0094836, 0.0114985, 0.01356376, 0.01402164, 0.02637336, 0.0303765, 0.0348384, 0.06110732,
      0.09460946, 0.36617406, 0.416057, 0.52922866, 0.5889564, 0.59409543, 0.67308928, 0.89032747,
      0.89032747, 0.89032747, 0.89032747, 0.89032747, 0.89032747, 0.89032747, 0.89032747,
      0.89032747, 0.89032747, 0.89032747, 0.89032747, 0.89032747, 0.89032747, 0.89032747,
    ],
    bh: [
      0.0038949, 0.0038949, 0.0038949, 0.0038949, 0.0060753, 0.0060753, 0.006221142857142857,
      0.00996315, 0.01433476666666667, 0.05231058, 0.05673504545454545, 0.06963535,
      0.07488597857142856, 0.07488597857142856, 0.08413616, 0.15125803125, 0.421460594117647,
      0.4725384, 0.570637910526316, 0.6152972625, 0.6152972625, 0.6152972625, 0.6152972625,
      0.6152972625, 0.665419656, 0.7162468846153845, 0.775972982142857, 0.775972982142857,
      0.889140651724138, 0.89032747,
    ],
    by: [
      0.01556007537622183, 0.01556007537622183, 0.01556007537622183, 0.01556007537622183,
      0.02427074531648065, 0.02427074531648065, 0.02485338565390302, 0.0398026560334295,
      0.0572672083580799, 0.2089800939109816, 0.2266557764630925, 0.2781923271071372,
      0.2991685206792373, 0.2991685206792373, 0.336122876445059, 0.6042738882921044, 1, 1, 1, 1, 1,
      1, 1, 1, 1, 1, 1, 1, 1, 1,
    ],
  },
};
