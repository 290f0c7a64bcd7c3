import type {LintRule} from '../types.js';
import {acceptNull} from './accept-null.js';
import {alphaTooLarge} from './alpha-too-large.js';
import {alphaUnexplained} from './alpha-unexplained.js';
import {contradictsDecision} from './contradicts-decision.js';
import {contradictsDirection} from './contradicts-direction.js';
import {handTypedStatistic} from './hand-typed-statistic.js';
import {nearSignificance} from './near-significance.js';
import {noDifferenceClaim} from './no-difference-claim.js';
import {observedPower} from './observed-power.js';
import {pValueMeaning} from './p-value-meaning.js';
import {significanceAsImportance} from './significance-as-importance.js';
import {significanceAsSize} from './significance-as-size.js';
import {undisclosedMultiplicity} from './undisclosed-multiplicity.js';

/** Every lint rule, in the order the README lists them. Add a rule here (one line). */
export const lintRules: readonly LintRule[] = [
  handTypedStatistic,
  acceptNull,
  noDifferenceClaim,
  pValueMeaning,
  nearSignificance,
  significanceAsSize,
  observedPower,
  significanceAsImportance,
  contradictsDecision,
  contradictsDirection,
  undisclosedMultiplicity,
  alphaUnexplained,
  alphaTooLarge,
];

export const lintRuleIds: readonly string[] = lintRules.map((rule) => rule.id);
