import {anova} from './anova.js';
import {binomial} from './binomial.js';
import {brownForsythe} from './brown-forsythe.js';
import {chiSquareGof} from './chi-square-gof.js';
import {chiSquare} from './chi-square.js';
import {fisherExact} from './fisher-exact.js';
import {kendall} from './kendall.js';
import {kruskalWallis} from './kruskal-wallis.js';
import {levene} from './levene.js';
import {linearRegression} from './linear-regression.js';
import {mannWhitney} from './mann-whitney.js';
import {mcnemar} from './mcnemar.js';
import {oneProportion} from './one-proportion.js';
import {oneSampleT} from './one-sample-t.js';
import {pairedT} from './paired-t.js';
import {pearson} from './pearson.js';
import {shapiroWilk} from './shapiro-wilk.js';
import {signTest} from './sign-test.js';
import {spearman} from './spearman.js';
import {studentT} from './student-t.js';
import {tost} from './tost.js';
import {twoProportion} from './two-proportion.js';
import type {Design, MethodDefinition} from './types.js';
import {welchAnova} from './welch-anova.js';
import {welchT} from './welch-t.js';
import {wilcoxonSignedRank} from './wilcoxon-signed-rank.js';

/**
 * Every test a block may declare, by id (contract §3). `describe` and
 * `auto` are not tests and are handled by the compute stage. Adding a
 * method: one file, one line here.
 */
const definitions = [
  register(oneSampleT),
  register(pairedT),
  register(studentT),
  register(welchT),
  register(tost),
  register(mannWhitney),
  register(wilcoxonSignedRank),
  register(signTest),
  register(anova),
  register(welchAnova),
  register(kruskalWallis),
  register(chiSquare),
  register(chiSquareGof),
  register(fisherExact),
  register(mcnemar),
  register(binomial),
  register(oneProportion),
  register(twoProportion),
  register(pearson),
  register(spearman),
  register(kendall),
  register(linearRegression),
  register(shapiroWilk),
  register(levene),
  register(brownForsythe),
];

export const methods: ReadonlyMap<string, MethodDefinition<Design>> = new Map(
  definitions.map((definition) => [definition.id, definition]),
);

/** Every id a block's `test:` accepts, for validation and hints. */
export const methodIds: readonly string[] = ['describe', 'auto', ...methods.keys()];

/** The design stage hands each method the design kind it declares. */
function register<D extends Design>(definition: MethodDefinition<D>): MethodDefinition<Design> {
  return definition as unknown as MethodDefinition<Design>;
}
