import type {LintRule} from '../types.js';
import type {Place} from '../../user-error.js';

/** Above this, a "significant" result is weak evidence by any convention. */
const largest = 0.1; // common practice, no source

export const alphaTooLarge: LintRule = {
  id: 'alpha-too-large',
  severity: 'warning',
  explanation: `an alpha above ${largest} makes false positives common`,
  suggestion: 'Use alpha 0.05 (or smaller); if a larger alpha is truly wanted, explain it in the text.',
  checkDocument(context) {
    const findings: Array<{place: Place; message: string}> = [];
    if (context.settings.alpha > largest) {
      findings.push({place: frontMatterAlpha(context.source), message: `the document alpha ${context.settings.alpha} is above ${largest}`});
    }
    for (const spec of context.specs) {
      const place = spec.keyPlaces['alpha'];
      if (place && spec.alpha > largest) findings.push({place, message: `block \`${spec.id}\` uses alpha = ${spec.alpha}, above ${largest}`});
    }
    return findings;
  },
};

/** The `alpha:` line of the front matter (settings keep no places). */
function frontMatterAlpha(source: string): Place {
  const lines = source.split(/\r?\n/);
  const end = lines.indexOf('---', 1);
  const index = lines.slice(0, end > 0 ? end : lines.length).findIndex((line) => /^\s+alpha\s*:/.test(line));
  return index >= 0 ? {line: index + 1, column: lines[index]!.search(/\S/) + 1} : {line: 1, column: 1};
}
