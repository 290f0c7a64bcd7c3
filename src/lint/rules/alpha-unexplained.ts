import type {LintRule} from '../types.js';

export const alphaUnexplained: LintRule = {
  id: 'alpha-unexplained',
  severity: 'warning',
  explanation: 'a block alpha that differs from the document alpha needs a reason, written before the data',
  suggestion: 'Add a YAML comment on the `alpha` line (or the line above) saying why, e.g. `alpha: 0.01  # safety-critical, fixed in the test plan`.',
  checkDocument(context) {
    const lines = context.source.split(/\r?\n/);
    return context.specs.flatMap((spec) => {
      const place = spec.keyPlaces['alpha'];
      if (!place || spec.alpha === context.settings.alpha) return [];
      const line = lines[place.line - 1] ?? '';
      const above = lines[place.line - 2] ?? '';
      if (/\s#/.test(line) || /^\s*#/.test(above)) return [];
      return [{place, message: `block \`${spec.id}\` sets alpha = ${spec.alpha}, not the document's ${context.settings.alpha}, without saying why`}];
    });
  },
};
