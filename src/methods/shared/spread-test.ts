import {MethodError} from '../method-error.js';
import type {KGroupDesign, MethodOutcome} from '../types.js';
import {levene, type LeveneCentre} from './levene-core.js';
import {summarize} from './summarize.js';

/**
 * The outcome shared by the `levene` and `brown-forsythe` methods: the F test
 * of `levene-core.ts`, and in `details` the ratio of the largest to the
 * smallest group SD with the groups it compares. The ratio has no interval:
 * the usual F interval for a variance ratio assumes normal data, which is
 * what these tests avoid, and the extreme pair is chosen from the data, so
 * it is reported as a description and `estimate` is left out.
 */
export function spreadTestOutcome({samples}: KGroupDesign, centre: LeveneCentre, title: string): MethodOutcome {
  if (samples.length < 2) {
    throw new MethodError(`${title} compares two or more groups; there is ${samples.length}`, 'Declare `by` with at least two levels.');
  }
  for (const s of samples) {
    if (s.values.length < 2) {
      throw new MethodError(
        `${title} needs at least two values in every group; "${s.label}" has ${s.values.length}`,
        'Check `where`, the levels and missing values in the data.',
      );
    }
  }
  const {f, df1, df2, p} = levene(samples, centre);
  if (Number.isNaN(f)) {
    throw new MethodError(
      `the absolute deviations from each group’s ${centre} are constant within every group, so ${title} is undefined`,
      'This happens with constant groups, or groups of two values under mean centring; inspect the spreads directly.',
    );
  }
  const sds = samples.map((s) => summarize(s.values).sd);
  let largest = 0;
  let smallest = 0;
  sds.forEach((sd, i) => {
    if (sd > sds[largest]!) largest = i;
    if (sd < sds[smallest]!) smallest = i;
  });
  const constant = samples.filter((_, i) => sds[i] === 0).map((s) => s.label);
  return {
    statistic: {name: 'F', value: f},
    df: [df1, df2],
    p,
    details: {
      centre,
      sd_ratio: {
        name: 'ratio of largest to smallest SD',
        // JSON has no infinity: a constant group leaves the ratio undefined.
        value: sds[smallest]! > 0 ? sds[largest]! / sds[smallest]! : null,
        largest: samples[largest]!.label,
        smallest: samples[smallest]!.label,
      },
    },
    ...(constant.length > 0 ? {warnings: [{kind: 'constant-groups' as const, groups: constant}]} : {}),
  };
}
