import {isScalar, isSeq, type Node} from 'yaml';
import {mappingEntries, parseYamlAt} from '../document/yaml-at.js';
import {methodIds, methods} from '../methods/registry.js';
import {UserError, type Place} from '../user-error.js';
import {chartKinds, showParts, type BlockSpec, type ShowPart} from './block-spec.js';
import type {DocumentSettings} from './parse-settings.js';
import {levelRules, readBoolean, readChoice, readNumber, readString, readStringList, type ValueContext} from './read-value.js';
import {didYouMean} from './suggest.js';

/** Keys a block may hold (contract §3). */
export const blockKeys = [
  'id', 'data', 'where', 'test', 'y', 'by', 'levels', 'x', 'mu', 'success', 'alternative', 'alpha',
  'family', 'smallest-effect', 'posthoc', 'chart', 'show', 'caption', 'expected', 'correction', 'intercept',
] as const;

const idPattern = /^[a-z][a-z0-9_-]*$/;
const smallestEffectRule = {
  min: 0,
  max: Infinity,
  open: true,
  hint: 'The smallest difference that matters, in the outcome\'s units, as a positive number (e.g. 2 for 2 MPa).',
};

/**
 * Validate one ```stet block body and fill defaults from the document.
 * @param origin Report position of the first line of the body.
 */
export function parseBlock(body: string, origin: Place, fence: Place, settings: DocumentSettings): BlockSpec {
  const yaml = parseYamlAt(body, origin, origin.column - 1);
  const hint = 'A block is YAML: `id: strength`, `test: welch-t`, `y: strength`, `by: supplier`, …';
  const entries = mappingEntries(yaml, yaml.document.contents, 'A stet block', hint);
  const values = new Map<string, ValueContext>();
  const keyPlaces: Record<string, Place> = {};
  for (const {key, keyNode, valueNode} of entries) {
    if (!(blockKeys as readonly string[]).includes(key)) {
      throw new UserError(`unknown key \`${key}\` in stet block`, {
        ruleId: 'unknown-key',
        place: yaml.placeOf(keyNode),
        hint: didYouMean(key, blockKeys, `Keys are: ${blockKeys.join(', ')}.`),
      });
    }
    values.set(key, {yaml, key, node: valueNode});
    keyPlaces[key] = yaml.placeOf(keyNode);
  }
  const required = (key: string, what: string): ValueContext => {
    const context = values.get(key);
    if (context) return context;
    throw new UserError(`stet block has no \`${key}\``, {ruleId: `missing-${key}`, place: fence, hint: what});
  };
  const optional = <T>(key: string, read: (context: ValueContext) => T): T | undefined => {
    const context = values.get(key);
    return context === undefined ? undefined : read(context);
  };

  const id = readString(required('id', 'Every block needs an `id` (e.g. `id: strength-28d`) so prose can cite it.'));
  if (!idPattern.test(id)) {
    throw new UserError(`block id \`${id}\` is not valid`, {
      ruleId: 'invalid-id',
      place: keyPlaces['id'] ?? fence,
      hint: 'Use a lowercase letter, then lowercase letters, digits, `-` or `_`.',
    });
  }
  const method = readString(required('test', `Name a test, e.g. \`test: welch-t\`. Tests: ${methodIds.join(', ')}.`));
  if (!methodIds.includes(method)) {
    throw new UserError(`unknown test \`${method}\``, {
      ruleId: 'unknown-method',
      place: placeOfValue(values.get('test')!),
      hint: didYouMean(method, methodIds, `Available: ${methodIds.join(', ')}.`),
    });
  }
  const definition = methods.get(method);
  const design = definition?.design ?? 'none';
  const yContext = required('y', 'Name the outcome column, e.g. `y: strength`.');
  const y = readY(yContext, design === 'paired' || design === 'paired-categorical' || (method === 'auto' && isSeq(yContext.node)));
  const by = optional('by', readString);
  const needs = (wanted: boolean, key: string, why: string, hint: string) => {
    if (wanted && !values.has(key)) throw new UserError(`\`${method}\` ${why} and needs \`${key}\``, {ruleId: `missing-${key}`, place: fence, hint});
  };
  needs(['two-group', 'k-group', 'contingency'].includes(design), 'by', 'compares groups', 'Add the grouping column, e.g. `by: supplier`.');
  needs(design === 'bivariate', 'x', 'relates two columns', 'Add the predictor column, e.g. `x: cement_content`.');
  needs(definition?.needsMu === true, 'mu', 'tests against a null value', 'Add the value under the null hypothesis, e.g. `mu: 30` (or `mu: 0.5` for a proportion).');
  needs(definition?.needsSuccess === true, 'success', 'counts successes', 'Name the level of `y` that counts as a success, e.g. `success: pass`.');
  needs(definition?.needsSmallestEffect === true, 'smallest-effect', 'tests equivalence', 'Declare the equivalence margin in the outcome\'s units, e.g. `smallest-effect: 2`.');
  const mu = optional('mu', (context) => readNumber(context));
  const show = optional('show', (context) => new Set(readStringList(context).map((part) => {
    if (!(showParts as readonly string[]).includes(part)) {
      throw new UserError(`\`show\` lists unknown part \`${part}\``, {
        ruleId: 'invalid-value',
        place: placeOfValue(context),
        hint: `Parts are: ${showParts.join(', ')}.`,
      });
    }
    return part as ShowPart;
  })));
  const whereContext = values.get('where');
  return {
    id,
    method,
    data: readString(required('data', 'Name a dataset from the front matter, or a CSV path.')),
    where: whereContext ? {source: readString(whereContext), place: placeOfText(whereContext)} : undefined,
    y,
    by,
    levels: optional('levels', readStringList),
    x: optional('x', readStringList),
    mu,
    success: optional('success', readString),
    expected: optional('expected', readProportions),
    posthoc: optional('posthoc', (c) => readChoice(c, ['tukey', 'games-howell', 'dunn', 'none'] as const)),
    correction: optional('correction', (c) => readChoice(c, ['yates', 'none'] as const)) ?? 'none',
    intercept: optional('intercept', readBoolean) ?? true,
    alternative: optional('alternative', (c) => readChoice(c, ['two-sided', 'greater', 'less'] as const)) ?? 'two-sided',
    alpha: optional('alpha', (c) => readNumber(c, levelRules.alpha)) ?? settings.alpha,
    confidence: settings.confidence,
    style: settings.style,
    family: optional('family', readString),
    smallestEffect: optional('smallest-effect', (c) => readNumber(c, smallestEffectRule)),
    chart: optional('chart', (c) => readChoice(c, chartKinds)) ?? 'auto',
    show: show ?? new Set(showParts),
    caption: optional('caption', readString),
    place: fence,
    keyPlaces,
  };
}

function readY(context: ValueContext, paired: boolean): string | readonly [string, string] {
  if (!paired) {
    if (isSeq(context.node)) {
      throw new UserError('`y` must be one column for this test', {
        ruleId: 'invalid-value',
        place: placeOfValue(context),
        hint: 'Only paired tests take two columns, `y: [before, after]`.',
      });
    }
    return readString(context);
  }
  const columns = readStringList(context);
  if (columns.length !== 2) {
    throw new UserError('a paired test needs `y` to list exactly two columns', {
      ruleId: 'invalid-value',
      place: placeOfValue(context),
      hint: 'Example: `y: [before, after]`; the estimate is after − before.',
    });
  }
  return [columns[0]!, columns[1]!];
}

function placeOfValue(context: ValueContext): Place {
  return context.yaml.placeOf(context.node as Node | null);
}

/** Where the text of a scalar starts: after its opening quote, if any. */
function placeOfText(context: ValueContext): Place {
  const place = placeOfValue(context);
  const quoted = isScalar(context.node) && (context.node.type === 'QUOTE_DOUBLE' || context.node.type === 'QUOTE_SINGLE');
  return quoted ? {line: place.line, column: place.column + 1} : place;
}

/** `expected: {red: 0.5, green: 0.25, blue: 0.25}`: non-negative proportions. */
function readProportions(context: ValueContext): Record<string, number> {
  const proportions: Record<string, number> = Object.create(null) as Record<string, number>;
  const hint = 'Example: `expected: {pass: 0.9, fail: 0.1}` (proportions per level of y, summing to 1).';
  for (const {key, valueNode} of mappingEntries(context.yaml, context.node, '`expected`', hint)) {
    proportions[key] = readNumber({yaml: context.yaml, key, node: valueNode}, {min: 0, max: 1, hint});
  }
  const total = Object.values(proportions).reduce((sum, p) => sum + p, 0);
  if (Math.abs(total - 1) > 1e-9) {
    throw new UserError(`\`expected\` proportions sum to ${total}, not 1`, {ruleId: 'invalid-value', place: placeOfValue(context), hint});
  }
  return proportions;
}
