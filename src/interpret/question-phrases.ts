import type {ComputedBlock} from '../compute/compute-block.js';
import {numberFormat, recordedDecimals, type NumberFormat} from './format-number.js';
import {styleNamed} from './number-style.js';
import {unitText} from './block-numbers.js';
import {wording} from './wording.js';

/** The contrast a block tests, its null hypothesis, and the equality it must not claim. */
export interface QuestionPhrases {
  readonly contrast: string;
  readonly nullHypothesis: string;
  readonly claim: string;
}

/** Methods whose estimate is a difference in means, worded as such. */
export const meanMethods = new Set(['one-sample-t', 'paired-t', 'student-t', 'welch-t', 'tost']);

export function questionPhrases(block: ComputedBlock): QuestionPhrases {
  const {design, spec, names, question} = block;
  const [first = '', second = ''] = names.samples;
  const p = wording.phrases;
  switch (design.kind) {
    case 'two-group':
      return meanMethods.has(spec.method) ? p.meanDifference(names.outcome, second, first) : p.locationShift(names.outcome, second, first);
    case 'paired':
      return spec.method === 'paired-t' ? p.pairedDifference(second, first) : p.pairedShift(second, first);
    case 'one-sample':
      return question === 'diagnostic' ? p.normality(names.outcome) : p.oneSample(names.outcome, declared(block, spec.mu ?? 0));
    case 'k-group':
      return question === 'diagnostic'
        ? p.spread(names.outcome, names.by)
        : p.kGroups(names.outcome, design.samples.length, names.by, spec.method === 'kruskal-wallis');
    case 'bivariate': {
      const predictors = names.samples.slice(0, -1).join(' and ');
      return spec.method === 'linear-regression'
        ? p.regression(names.outcome, predictors)
        : p.correlation(predictors, names.outcome, spec.method !== 'pearson');
    }
    case 'contingency':
      return spec.method === 'two-proportion' && design.success !== undefined
        ? p.twoProportions(design.success, design.columns[1] ?? '', design.columns[0] ?? '')
        : p.independence(names.outcome, names.by);
    case 'paired-categorical':
      return p.pairedProportions(first, second);
    case 'counts':
      return p.fit(names.outcome);
    case 'proportion':
      return p.proportion(design.success, formatOf(block).bounded(spec.mu ?? 0, Math.max(2, recordedDecimals([spec.mu ?? 0]))));
    default:
      return {contrast: '', nullHypothesis: '', claim: ''};
  }
}

/** A value the author declared (mu, smallest effect), as written, with units. */
export function declared(block: ComputedBlock, value: number): string {
  return unitText(formatOf(block).fixed(value, recordedDecimals([value])), block.units);
}

function formatOf(block: ComputedBlock): NumberFormat {
  return numberFormat(styleNamed(block.spec.style));
}
