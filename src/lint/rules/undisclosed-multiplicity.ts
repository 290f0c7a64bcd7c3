import {isConfirmatory} from '../confirmatory.js';
import type {LintRule} from '../types.js';

export const undisclosedMultiplicity: LintRule = {
  id: 'undisclosed-multiplicity',
  severity: 'warning',
  explanation: 'several tests at the same alpha raise the chance of a false positive unless the family is declared',
  suggestion: 'Put related tests in one `family:` and set `stet: {adjust: holm}` in the front matter, or say in the text why each test stands alone.',
  checkDocument(context) {
    const tests = context.specs.filter(isConfirmatory);
    if (tests.length < 2 || tests.some((spec) => spec.family !== undefined)) return [];
    const second = tests[1]!;
    const adjusted = context.settings.adjust !== 'none';
    return [{
      place: second.keyPlaces['test'] ?? second.place,
      message: `${tests.length} tests in this report (\`${tests[0]!.id}\`, \`${second.id}\`${tests.length > 2 ? ', …' : ''}) and no \`family\` declared${adjusted ? `, so \`adjust: ${context.settings.adjust}\` applies to none of them` : ''}`,
    }];
  },
};
