/**
 * Hand-written sentences for measuring the lint's precision and recall,
 * each with the rule ids it should raise (none for a good sentence). They
 * cite the blocks of `corpus-report.ts`: `delivery` (significant; South
 * slower than North), `drift` (not significant; after − before ≈ +0.01),
 * `strength` (significant; Quarrybank weaker than Northfield), `early` (not
 * significant). Written for stet, in its own invented scenarios.
 */
export interface CorpusSentence {
  readonly text: string;
  readonly expect: readonly string[];
}

export const corpus: readonly CorpusSentence[] = [
  // Hand-typed statistics.
  {text: 'South deliveries took longer (p = 0.03).', expect: ['hand-typed-statistic']},
  {text: 'The drift after servicing was small, p<.05 notwithstanding.', expect: ['hand-typed-statistic']},
  {text: 'Cylinders from Quarrybank were weaker, t(24.6) = -3.48, p < 0.001.', expect: ['hand-typed-statistic', 'hand-typed-statistic']},
  {text: 'Curing regime mattered for cube strength, F(2, 30) = 4.4.', expect: ['hand-typed-statistic']},
  {text: 'Water–cement ratio and strength were related (r = -.59).', expect: ['hand-typed-statistic']},
  {text: 'Failed tickets depended on the supplier, χ²(1) = 3.9.', expect: ['hand-typed-statistic']},
  {text: 'A plain-text version of the same check gave chi2(1)=3.9 on the delivery tickets.', expect: ['hand-typed-statistic']},
  {text: 'The depots differed by a large standardized amount, d = 0.8.', expect: ['hand-typed-statistic']},
  {text: 'The sensors drifted by Hedges’ g = 1.1 after the firmware update.', expect: ['hand-typed-statistic']},
  {text: 'The mean extra delivery time was 15 minutes, 95% CI [13.3, 16.7].', expect: ['hand-typed-statistic']},
  {text: 'The share of late trucks was 12% (CI 8% to 17%).', expect: ['hand-typed-statistic']},
  {text: 'The p-value was 0.0019 for the 28-day comparison of suppliers.', expect: ['hand-typed-statistic']},
  {text: 'We set the significance level at α = 0.05 before the first cylinder was crushed.', expect: []},
  {text: 'Each truck was timed from the gate to the pump, t = 2.5 h at most.', expect: []},
  {text: 'The 28-day comparison gave {{strength.p}} with an estimate of {{strength.estimate}}.', expect: []},
  {text: 'Twelve cubes per regime were crushed on day 28 at 20 °C.', expect: []},

  // Accepting or proving the null.
  {text: 'We accept the null hypothesis for the sensor drift ({{drift.p}}).', expect: ['accept-null']},
  {text: 'The paired test proves there is no drift after servicing.', expect: ['accept-null']},
  {text: 'The null hypothesis was therefore accepted for the 7-day strength.', expect: ['accept-null']},
  {text: 'This confirms the null: servicing does not move the readings.', expect: ['accept-null']},
  {text: 'We did not accept the null hypothesis; we failed to reject it ({{drift.p}}).', expect: []},
  {text: 'A non-significant result never proves the null hypothesis.', expect: []},

  // Equality claimed from a non-significant result.
  {text: 'The sensor readings before and after the service were the same ({{drift.p}}).', expect: ['no-difference-claim']},
  {text: 'There was no difference between the suppliers at 7 days ({{early.p}}).', expect: ['no-difference-claim']},
  {text: 'Early strength was not significantly different, so the two mixes are equivalent.', expect: ['no-difference-claim']},
  {text: 'At 7 days the suppliers did not differ ({{early}}).', expect: ['no-difference-claim']},
  {text: 'The servicing had no effect on the readings ({{drift.estimate}}).', expect: ['no-difference-claim']},
  {text: 'This does not show that the early strengths are equal ({{early.p}}).', expect: []},
  {text: 'We cannot conclude that the readings are the same before and after ({{drift.p}}).', expect: []},
  {text: 'No statistically significant drift was detected ({{drift.p}}); the test could miss a drift of 0.1 units.', expect: []},
  {text: 'The two depots are not equal: South took longer ({{delivery.estimate}}).', expect: []},

  // p misread as a probability of a hypothesis or of chance.
  {text: 'The p-value of the drift test is the probability that the null hypothesis is true.', expect: ['p-value-meaning']},
  {text: 'There is only a 0.2% chance that the strength difference is due to chance ({{strength.p}}).', expect: ['p-value-meaning']},
  {text: 'The slower South deliveries are unlikely to be due to chance ({{delivery.p}}).', expect: ['p-value-meaning']},
  {text: 'We are 95% sure that the depot effect is real.', expect: ['p-value-meaning']},
  {text: 'The p-value gives the probability that the alternative hypothesis is false.', expect: ['p-value-meaning']},
  {text: 'The p-value is not the probability that the null hypothesis is true.', expect: []},
  {text: 'If the depots did not differ, data this extreme would be rare ({{delivery.p}}).', expect: []},

  // Near significance.
  {text: 'The 7-day difference was marginally significant ({{early.p}}).', expect: ['near-significance']},
  {text: 'Sensor drift approached significance after the firmware update.', expect: ['near-significance']},
  {text: 'There was a trend towards significance in early strength ({{early.p}}).', expect: ['near-significance']},
  {text: 'The drift was almost significant, which suggests a small effect.', expect: ['near-significance']},
  {text: 'Slump showed a trend toward significance between suppliers.', expect: ['near-significance']},
  {text: 'We avoid the phrase “marginally significant” in this report.', expect: []},

  // Significance as a size.
  {text: 'The depot difference was highly significant ({{delivery.p}}).', expect: ['significance-as-size']},
  {text: 'Strength at 28 days was very significantly lower for Quarrybank ({{strength.p}}).', expect: ['significance-as-size']},
  {text: 'The delivery result is more significant than the strength result.', expect: ['significance-as-size']},
  {text: 'The depot difference was statistically significant ({{delivery}}).', expect: []},

  // Observed power.
  {text: 'The observed power of the drift test was 6%.', expect: ['observed-power']},
  {text: 'A post hoc power analysis of the 7-day comparison gave 13%.', expect: ['observed-power']},
  {text: 'We do not report observed power; the sensitivity is stated instead.', expect: []},
  {text: 'The test had {{early.sensitivity.power_at_smallest_effect}} power to detect a difference of 2 MPa.', expect: []},

  // Significance taken as importance.
  {text: 'The South delay is statistically significant and therefore important for scheduling.', expect: ['significance-as-importance']},
  {text: 'Quarrybank’s concrete was significantly weaker, so it matters for the structure.', expect: ['significance-as-importance']},
  {text: 'The difference is significant, which means it is meaningful for the pump crews.', expect: ['significance-as-importance']},
  {text: 'The difference is statistically significant, and its size ({{delivery.estimate}}) matters for scheduling.', expect: []},

  // Contradictions with the decision.
  {text: 'At 7 days Quarrybank’s cylinders were significantly weaker ({{early.p}}).', expect: ['contradicts-decision']},
  {text: 'The service changed the readings significantly ({{drift.estimate}}).', expect: ['contradicts-decision']},
  {text: 'The depot difference was not statistically significant ({{delivery.p}}).', expect: ['contradicts-decision']},
  {text: 'There was no significant difference in 28-day strength ({{strength}}).', expect: ['contradicts-decision']},
  {text: 'We reject the null hypothesis of no drift ({{drift.p}}).', expect: ['contradicts-decision']},
  {text: 'Strength differed significantly at 28 days ({{strength.p}}) but not at 7 days ({{early.p}}).', expect: []},
  {text: 'The early comparison ({{early.p}}) was not statistically significant.', expect: []},
  {text: 'South deliveries were significantly slower ({{delivery.p}}).', expect: []},

  // Contradictions with the direction of the estimate.
  {text: 'Quarrybank’s cylinders were stronger than Northfield’s at 28 days ({{strength.estimate}}).', expect: ['contradicts-direction']},
  {text: 'Delivery times were lower for South than for North ({{delivery.estimate}}).', expect: ['contradicts-direction']},
  {text: 'Mean strength was higher in Quarrybank than in Northfield ({{strength.p}}).', expect: ['contradicts-direction']},
  {text: 'Readings decreased from before to after the service ({{drift.estimate}}).', expect: ['contradicts-direction']},
  // Labelled clean until "longer" was read as a direction word; it is wrong: South took longer.
  {text: 'North took longer than South on average ({{delivery}}).', expect: ['contradicts-direction']},
  {text: 'Northfield’s cylinders were stronger than Quarrybank’s ({{strength.estimate}}).', expect: []},
  {text: 'South delivery times were higher than North’s ({{delivery.estimate}}).', expect: []},
  {text: 'Quarrybank’s strengths were less variable than Northfield’s ({{strength.groups.Quarrybank.sd}}).', expect: []},
  {text: 'North had more trucks in the study than South ({{delivery.n}} in all).', expect: []},

  // Plain good sentences.
  {text: 'Trucks from the South depot took {{delivery.estimate}} longer than those from the North depot.', expect: []},
  {text: 'Sensor drift after servicing was small and not statistically significant ({{drift}}).', expect: []},
  {text: 'The interval for the drift ({{drift.estimate.ci}}) includes changes too small to matter for calibration.', expect: []},
  {text: 'We fail to reject the null hypothesis of equal early strength ({{early.p}}).', expect: []},
  {text: 'The sentence stet writes for this block reads: {{strength.sentence}}', expect: []},
  {text: 'Quarrybank’s concrete averaged {{strength.groups.Quarrybank.mean}} MPa at 28 days.', expect: []},
  {text: 'The two depots are compared with Welch’s t test because their spreads may differ.', expect: []},
  {text: 'A significant portion of the trucks arrived before seven in the morning.', expect: []},
];

/**
 * A second batch, written after the rules were tuned on the first and
 * measured before any rule was changed for it: precision 1.000, recall 0.571
 * (12 of 21) on that first run. Rules were then widened; all batches are
 * checked together from then on.
 */
export const heldOut: readonly CorpusSentence[] = [
  {text: 'Depot South was slower on average (P = .001).', expect: ['hand-typed-statistic']},
  {text: 'The regression of strength on water–cement ratio had R² = 0.35.', expect: ['hand-typed-statistic']},
  {text: 'Drift and ambient temperature were uncorrelated (Spearman’s rho of 0.12).', expect: ['hand-typed-statistic']},
  {text: 'The confidence interval ran from 1.1 to 4.4 MPa.', expect: ['hand-typed-statistic']},
  {text: 'The Kruskal–Wallis test on slump gave H(2) = 6.1.', expect: ['hand-typed-statistic']},
  {text: 'Routes were compared with z = 1.96 as the critical value.', expect: ['hand-typed-statistic']},
  {text: 'The gauge was recalibrated every 30 days and read to 0.01 mm.', expect: []},
  {text: 'Among 40 trucks, 7 failed the ticket check ({{delivery.n}} timed).', expect: []},
  {text: 'Our data show that the firmware update has no effect on drift ({{drift}}).', expect: ['no-difference-claim']},
  {text: 'Since p was above .05, both depots deliver equally fast.', expect: ['hand-typed-statistic']},
  {text: 'The readings stayed equivalent after servicing ({{drift.p}}).', expect: ['no-difference-claim']},
  {text: 'That the drift was not significant ({{drift.p}}) does not mean the sensors are identical.', expect: []},
  {text: 'This analysis demonstrates that the null hypothesis is correct.', expect: ['accept-null']},
  {text: 'We therefore accepted H0 for the 7-day strength.', expect: ['accept-null']},
  {text: 'The result has a 98% probability of being real.', expect: ['p-value-meaning']},
  {text: 'The chance that the depot difference arose by chance is below 1%.', expect: ['p-value-meaning']},
  {text: 'The difference in early strength was borderline significant.', expect: ['near-significance']},
  {text: 'The 7-day result narrowly missed significance ({{early.p}}).', expect: ['near-significance']},
  {text: 'South’s delay was extremely significant.', expect: ['significance-as-size']},
  {text: 'Retrospective power for the drift test was low.', expect: ['observed-power']},
  {text: 'Because the delay is statistically significant, it is large enough to change the schedule.', expect: ['significance-as-importance']},
  {text: 'Quarrybank’s 28-day strength was not significantly lower ({{strength.estimate}}).', expect: ['contradicts-decision']},
  {text: 'The service shifted the readings significantly upward ({{drift}}).', expect: ['contradicts-decision']},
  {text: 'The early strengths did not differ significantly between suppliers ({{early.p}}).', expect: []},
  {text: 'North’s trucks were slower than South’s ({{delivery.estimate}}).', expect: []},
  {text: 'Northfield’s mean was lower than Quarrybank’s at 28 days ({{strength.groups.Northfield.mean}}).', expect: ['contradicts-direction']},
  {text: 'Quarrybank delivered weaker concrete than Northfield ({{strength}}).', expect: []},
  {text: 'The readings after servicing were higher than before, by {{drift.estimate.value}} units.', expect: []},
  {text: 'The delay at South is larger than the smallest delay that matters to the pump crews ({{delivery.estimate}}).', expect: []},
  {text: 'We report the interval rather than calling the result significant or not.', expect: []},
];

/**
 * A third batch, measured once before any rule changed for it, like the
 * second: precision 1.000, recall 0.700 (14 of 20) on that first run.
 */
export const thirdBatch: readonly CorpusSentence[] = [
  {text: 'The calibration offset grew by 0.4 units per month (SE 0.1, p = .002).', expect: ['hand-typed-statistic']},
  {text: 'Quarrybank’s slump was 4 mm higher, 95% confidence interval −6 to 13 mm.', expect: ['hand-typed-statistic']},
  {text: 'The effect on delivery time was large (Cohen’s d = 2.3).', expect: ['hand-typed-statistic']},
  {text: 'Cube strength fell with the water–cement ratio, F(1, 34) = 17.8, p < .001.', expect: ['hand-typed-statistic', 'hand-typed-statistic']},
  {text: 'Only 3 of the 40 sensors were replaced during the study.', expect: []},
  {text: 'The threshold of 0.05 was set in the test plan.', expect: []},
  {text: 'All 24 cylinders were crushed at 28 days ± 4 hours.', expect: []},
  {text: 'Because the test was not significant ({{drift.p}}), we conclude the servicing makes no difference.', expect: ['no-difference-claim']},
  {text: 'The 7-day strengths of the two suppliers were practically identical ({{early}}).', expect: ['no-difference-claim']},
  {text: 'Our result supports the null hypothesis of no drift ({{drift.p}}).', expect: ['accept-null']},
  {text: 'The data prove that servicing leaves the readings unchanged.', expect: ['accept-null']},
  {text: 'There is a 97% chance that South really is slower ({{delivery.p}}).', expect: ['p-value-meaning']},
  {text: 'The small p-value means the delay is unlikely to be a random fluke.', expect: ['p-value-meaning']},
  {text: 'The drift result was significant at the 10% level but not at 5%.', expect: ['near-significance']},
  {text: 'The early-age difference was nearly significant ({{early.p}}).', expect: ['near-significance']},
  {text: 'The South delay was hugely significant ({{delivery.p}}).', expect: ['significance-as-size']},
  {text: 'We computed the achieved power of the drift test afterwards.', expect: ['observed-power']},
  {text: 'The weaker Quarrybank concrete is a significant finding and must therefore matter to the engineer.', expect: ['significance-as-importance']},
  {text: 'The depot difference turned out to be nonsignificant ({{delivery.p}}).', expect: ['contradicts-decision']},
  {text: 'Supplier mattered significantly for early strength ({{early}}).', expect: ['contradicts-decision']},
  {text: 'After servicing the sensors read lower than before ({{drift.estimate}}).', expect: ['contradicts-direction']},
  {text: 'North’s delivery times exceeded South’s, being higher than South by {{delivery.estimate.value}} minutes.', expect: ['contradicts-direction']},
  {text: 'South’s deliveries took longer than North’s by {{delivery.estimate.value}} minutes ({{delivery.p}}).', expect: []},
  {text: 'Since the early difference was not significant ({{early.p}}), we make no claim about 7-day strength.', expect: []},
  {text: 'The null hypothesis was rejected for the depots ({{delivery.p}}) but not for the sensors ({{drift.p}}).', expect: []},
  {text: 'We cannot tell from these data whether the suppliers differ at 7 days ({{early.estimate}}).', expect: []},
  {text: 'Significance alone does not make the South delay important; its size ({{delivery.estimate}}) does.', expect: []},
  {text: 'The sensitivity statement gives the smallest drift the test could detect ({{drift.sentence}}).', expect: []},
  {text: 'Northfield outperformed Quarrybank at 28 days ({{strength.estimate}}).', expect: []},
  {text: 'The sample of twelve slabs is small, so the interval is wide.', expect: []},
];
