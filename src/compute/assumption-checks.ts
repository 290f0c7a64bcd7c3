import {levene} from '../methods/shared/levene-core.js';
import {shapiroWilk} from '../methods/shared/shapiro-wilk-core.js';
import type {AssumptionCheck, Design, Sample} from '../methods/types.js';

/**
 * Assumption checks reported beside the tests that lean on them: normality
 * of each group (Shapiro–Wilk) for t tests and ANOVA, equal spreads
 * (Levene, mean-centred) where the test pools variances. They are reported,
 * never used to switch the test: choosing a test on a pre-test's p-value
 * distorts the error rates of the test finally run (Zimmerman 2004, Br. J.
 * Math. Stat. Psychol. 57:173).
 */
const normalTheory = new Set(['one-sample-t', 'paired-t', 'student-t', 'welch-t', 'tost', 'anova', 'welch-anova']);
const pooledVariance = new Set(['student-t', 'anova']);

export function assumptionChecks(method: string, design: Design): AssumptionCheck[] {
  if (!normalTheory.has(method)) return [];
  const checks: AssumptionCheck[] = [];
  for (const sample of normalitySamples(design)) {
    if (sample.values.length < 3 || sample.values.length > 5000) continue;
    const {w, p} = shapiroWilk(sample.values);
    if (Number.isFinite(w)) checks.push({check: 'shapiro-wilk', group: sample.label, statistic: w, p});
  }
  const groups = design.kind === 'two-group' ? [design.first, design.second] : design.kind === 'k-group' ? design.samples : [];
  if (pooledVariance.has(method) && groups.length >= 2) {
    const {f, p} = levene(groups, 'mean');
    if (Number.isFinite(f)) checks.push({check: 'levene', statistic: f, p});
  }
  return checks;
}

/** Paired designs assume normal differences, not normal measurements. */
function normalitySamples(design: Design): readonly Sample[] {
  switch (design.kind) {
    case 'one-sample':
      return [design.sample];
    case 'paired':
      return [{label: 'differences', values: design.second.values.map((v, i) => v - design.first.values[i]!)}];
    case 'two-group':
      return [design.first, design.second];
    case 'k-group':
      return design.samples;
    default:
      return [];
  }
}
