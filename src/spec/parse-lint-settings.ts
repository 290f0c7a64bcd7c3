import {isSeq, type Node} from 'yaml';
import {mappingEntries} from '../document/yaml-at.js';
import {lintRuleIds} from '../lint/rules/index.js';
import {UserError} from '../user-error.js';
import {readString, type ValueContext} from './read-value.js';
import {didYouMean} from './suggest.js';

const hint = 'Example: `lint: {off: [hand-typed-statistic]}`.';

/** `stet: {lint: {off: [rule-id, …]}}`: the lint rules switched off for this report. */
export function parseLintSettings(context: ValueContext): ReadonlySet<string> {
  const {yaml} = context;
  const off = new Set<string>();
  for (const {key, keyNode, valueNode} of mappingEntries(yaml, context.node, '`lint`', hint)) {
    if (key !== 'off') {
      throw new UserError(`unknown lint setting \`${key}\``, {ruleId: 'unknown-setting', place: yaml.placeOf(keyNode), hint: didYouMean(key, ['off'], hint)});
    }
    const items = isSeq(valueNode) ? (valueNode.items as Node[]) : [valueNode as Node];
    for (const item of items) {
      const id = readString({yaml, key, node: item});
      if (!lintRuleIds.includes(id)) {
        throw new UserError(`unknown lint rule \`${id}\``, {
          ruleId: 'unknown-lint-rule',
          place: yaml.placeOf(item),
          hint: didYouMean(id, lintRuleIds, `Rules are: ${lintRuleIds.join(', ')}.`),
        });
      }
      off.add(id);
    }
  }
  return off;
}
