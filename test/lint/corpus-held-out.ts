import type {CorpusSentence} from './corpus.js';

/**
 * A fifth batch, written after the rules were widened for the fourth and
 * scored once, with no rule changed for it afterwards. New invented scenarios
 * (call-centre hold times, brake pads, irrigation, bakery ovens, library
 * loans) citing the blocks of `corpus-report.ts`. Score on that one run:
 * precision 0.900 (9 of 10 findings right), recall 0.692 (9 of 13 planted).
 */
export const finalHeldOut: readonly CorpusSentence[] = [
  // Planted findings.
  {text: 'Hold times fell after the new rota (two-sided p of .012).', expect: ['hand-typed-statistic']},
  {text: 'Brake pad wear correlated with rider weight at Pearson r = .62.', expect: ['hand-typed-statistic']},
  {text: 'The irrigation schedules were shown to be equally effective for tomato yield ({{early.p}}).', expect: ['no-difference-claim']},
  {text: 'Because oven temperature was not a significant predictor, it plays no role in crust colour.', expect: ['no-difference-claim']},
  {text: 'The data lend support to the null hypothesis for loan returns ({{early.p}}).', expect: ['accept-null']},
  {text: 'There is a 95% probability that the new rota genuinely shortens hold times ({{delivery.p}}).', expect: ['p-value-meaning']},
  {text: 'The odds are less than one in a hundred that the crust difference is a random artefact ({{delivery.p}}).', expect: ['p-value-meaning']},
  {text: 'Brake wear showed a weak tendency towards significance ({{early.p}}).', expect: ['near-significance']},
  {text: 'The oven effect was massively significant, the strongest in the study ({{delivery.p}}).', expect: ['significance-as-size']},
  {text: 'Post-experiment power for the irrigation comparison came out at 0.35.', expect: ['observed-power']},
  {text: 'The difference in hold times reached statistical significance and is therefore of real consequence to callers.', expect: ['significance-as-importance']},
  {text: 'Quarrybank’s 28-day cylinders were not significantly different from Northfield’s ({{strength}}).', expect: ['contradicts-decision']},
  {text: 'Mean strength at 28 days was greater for Quarrybank than for Northfield ({{strength.estimate}}).', expect: ['contradicts-direction']},

  // Clean but tricky.
  {text: 'The bakery will accept the oven settings once the trial ends.', expect: []},
  {text: 'We did not find that the irrigation schedules differ in yield, which is not the same as finding that they are equal ({{early.p}}).', expect: []},
  {text: 'A sentence like “the brake pads wear identically” would overstate a non-significant comparison.', expect: []},
  {text: 'The pooled-variance test assumes equal variances; we used Welch’s test instead ({{delivery.p}}).', expect: []},
  {text: 'Hold times were shorter at North than at South ({{delivery.estimate}}).', expect: []},
  {text: 'The test could not exclude a crust-colour difference of up to two shades ({{early.estimate.ci}}).', expect: []},
  {text: 'Loan returns were not significantly later after the fee change ({{drift.p}}), and the interval ({{drift.estimate.ci}}) is wide.', expect: []},
];
