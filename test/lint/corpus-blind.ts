import type {CorpusSentence} from './corpus.js';

/**
 * A fourth batch, written before any rule changed for it, in new invented
 * scenarios (soil compaction, pump vibration, clinic waits, solder joints)
 * that cite the blocks of `corpus-report.ts`. First score, with the rules as
 * they stood: precision 0.400 (2 of 5 findings right), recall 0.077 (2 of 26
 * planted findings).
 * Rules were then widened for the misses it showed; after that, precision
 * 1.000, recall 0.962 (25 of 26; "outperformed" is left unread, since
 * whether it means higher or lower depends on the outcome).
 */
export const blindBatch: readonly CorpusSentence[] = [
  // Planted findings.
  {text: 'Root depth was greater in the loosened plots (p-value 0.03).', expect: ['hand-typed-statistic']},
  {text: 'The correlation between compaction and yield was −0.41.', expect: ['hand-typed-statistic']},
  {text: 'Solder joints from line B failed more often, odds ratio 2.4 (95% CI 1.3–4.5).', expect: ['hand-typed-statistic', 'hand-typed-statistic']},
  {text: 'Our pump records establish that rebalancing has no effect on bearing temperature.', expect: ['accept-null']},
  {text: 'The null hypothesis of equal wait times holds for the two clinics ({{early.p}}).', expect: ['accept-null']},
  {text: 'The test leads us to conclude that H0 is true for the solder pastes.', expect: ['accept-null']},
  {text: 'Since the test was not significant, the two soil treatments give identical yields.', expect: ['no-difference-claim']},
  {text: 'The firmware update did not change the vibration readings ({{drift.p}}).', expect: ['no-difference-claim']},
  {text: 'The two compaction levels produced equivalent root depths ({{early}}).', expect: ['no-difference-claim']},
  {text: 'Both clinics are equally quick to see patients ({{early.p}}).', expect: ['no-difference-claim']},
  {text: 'The p-value ({{drift.p}}) is the likelihood that the vibration drop happened randomly.', expect: ['p-value-meaning']},
  {text: 'So the null hypothesis has only a 0.1% probability of being correct ({{strength.p}}).', expect: ['p-value-meaning']},
  {text: 'The low p-value rules out the possibility that the clinic gap is a coincidence ({{delivery.p}}).', expect: ['p-value-meaning']},
  {text: 'Solder failures were close to being significant ({{early.p}}).', expect: ['near-significance']},
  {text: 'The vibration drop fell just short of significance ({{drift.p}}).', expect: ['near-significance']},
  {text: 'There was a near-significant reduction in wait times at the north clinic.', expect: ['near-significance']},
  {text: 'Given how tiny the p-value is ({{delivery.p}}), the delay must be large.', expect: ['significance-as-size']},
  {text: 'The power calculated from the observed effect was 0.21 for the drift test.', expect: ['observed-power']},
  {text: 'We then ran a power analysis on the collected solder data and found 18% power.', expect: ['observed-power']},
  {text: 'Since the delay is significant ({{delivery.p}}), the depot managers must act on it.', expect: ['significance-as-importance']},
  {text: 'Being statistically significant, the soil compaction effect is clearly of practical importance.', expect: ['significance-as-importance']},
  {text: 'We could not reject the null for 28-day strength ({{strength.p}}).', expect: ['contradicts-decision']},
  {text: 'The null hypothesis of equal early strength was rejected ({{early.p}}).', expect: ['contradicts-decision']},
  {text: 'The mean for South was below that of North ({{delivery.estimate}}).', expect: ['contradicts-direction']},
  {text: 'Quarrybank’s cylinders outperformed Northfield’s at 28 days ({{strength.estimate}}).', expect: ['contradicts-direction']},

  // Clean but tricky.
  {text: 'We did not find evidence that compaction changes root depth ({{early.p}}).', expect: []},
  {text: 'This does not show that the two clinics have equal wait times ({{early.p}}).', expect: []},
  {text: 'The test could not rule out a change in vibration of either sign ({{drift.estimate.ci}}).', expect: []},
  {text: 'The client will accept the report once the soil cores are logged.', expect: []},
  {text: 'The inspector accepted the pump bearings after the vibration check.', expect: []},
  {text: 'The pooled test, with equal variances assumed, gave the same decision as Welch’s test ({{delivery.p}}).', expect: []},
  {text: 'Writing “the pumps are identical” would claim more than a non-significant test can show.', expect: []},
  {text: 'Both clinics use the same booking system, and their wait times did not differ significantly ({{early.p}}).', expect: []},
  {text: 'The null hypothesis of no difference in solder failures was not rejected ({{early.p}}).', expect: []},
  {text: 'Vibration fell from 7.1 to 4.2 mm/s after rebalancing.', expect: []},
  {text: 'Significance alone cannot tell us whether the clinic delay matters; its size ({{delivery.estimate}}) can.', expect: []},
  {text: 'A highly significant p-value says nothing about size, so we report {{delivery.estimate}}.', expect: []},
  {text: 'We did not compute observed power, because it only restates the p-value.', expect: []},
  {text: 'North’s trucks arrived earlier than South’s on most days ({{delivery.estimate}}).', expect: []},
  {text: 'If the two pastes failed equally often, counts this far apart would be rare ({{strength.p}}).', expect: []},
];
