import {isScalar} from 'yaml';
import {defaultDatasetOptions, normalizeDelimiter, type DatasetOptions} from '../data/dataset-options.js';
import {mappingEntries, parseYamlAt} from '../document/yaml-at.js';
import {styleNames, type StyleName} from '../interpret/number-style.js';
import {UserError, type Place} from '../user-error.js';
import {parseLintSettings} from './parse-lint-settings.js';
import {didYouMean} from './suggest.js';
import {levelRules, readChoice, readNumber, readString, readStringList, type ValueContext} from './read-value.js';

/**
 * The report's front matter: document-wide defaults under `stet:` and
 * everything else (title, author, …) kept for the output.
 */
export const adjustMethods = ['none', 'bonferroni', 'holm', 'hochberg', 'bh', 'by'] as const;
export type AdjustMethod = (typeof adjustMethods)[number];

export interface DatasetDeclaration {
  readonly options: DatasetOptions;
  readonly place: Place;
}

export interface DocumentSettings {
  readonly title: string | undefined;
  readonly alpha: number;
  readonly confidence: number;
  readonly adjust: AdjustMethod;
  /** Number conventions (`number-style.ts`). */
  readonly style: StyleName;
  readonly datasets: ReadonlyMap<string, DatasetDeclaration>;
  /** Lint rules switched off (`lint: {off: [...]}`). */
  readonly lintOff: ReadonlySet<string>;
  /** Front matter without the `stet` key, for the Markdown output. */
  readonly passthrough: Readonly<Record<string, unknown>>;
}

export const defaultSettings: DocumentSettings = {
  title: undefined,
  alpha: 0.05,
  confidence: 0.95,
  adjust: 'none',
  style: 'science',
  datasets: new Map(),
  lintOff: new Set(),
  passthrough: {},
};

const settingKeys = ['alpha', 'confidence', 'adjust', 'style', 'datasets', 'lint'];
const datasetKeys = ['file', 'delimiter', 'decimal', 'missing', 'types', 'units', 'labels'];

/** @param origin Report position of the first line inside the `---` fences. */
export function parseSettings(text: string, origin: Place): DocumentSettings {
  const yaml = parseYamlAt(text, origin);
  const root = yaml.document.contents;
  if (root === null) return defaultSettings;
  const top = mappingEntries(yaml, root, 'The front matter', 'Write `key: value` lines between the `---` fences.');
  const passthrough = (yaml.document.toJS() ?? {}) as Record<string, unknown>;
  delete passthrough['stet'];
  const title = typeof passthrough['title'] === 'string' ? passthrough['title'] : undefined;
  const stetEntry = top.find((entry) => entry.key === 'stet');
  let settings: DocumentSettings = {...defaultSettings, title, passthrough};
  if (!stetEntry) return settings;
  for (const {key, keyNode, valueNode} of mappingEntries(yaml, stetEntry.valueNode, '`stet`', 'Example: `stet: {alpha: 0.05}`.')) {
    const context: ValueContext = {yaml, key, node: valueNode};
    if (key === 'alpha') settings = {...settings, alpha: readNumber(context, levelRules.alpha)};
    else if (key === 'confidence') settings = {...settings, confidence: readNumber(context, levelRules.confidence)};
    else if (key === 'adjust') settings = {...settings, adjust: readChoice(context, adjustMethods)};
    else if (key === 'style') settings = {...settings, style: readStyle(context)};
    else if (key === 'datasets') settings = {...settings, datasets: parseDatasets(context)};
    else if (key === 'lint') settings = {...settings, lintOff: parseLintSettings(context)};
    else {
      throw new UserError(`unknown setting \`${key}\` under \`stet\``, {
        ruleId: 'unknown-setting',
        place: yaml.placeOf(keyNode),
        hint: didYouMean(key, settingKeys, `Settings are: ${settingKeys.join(', ')}.`),
      });
    }
  }
  return settings;
}

function parseDatasets(context: ValueContext): Map<string, DatasetDeclaration> {
  const {yaml} = context;
  const datasets = new Map<string, DatasetDeclaration>();
  const hint = 'Example: `datasets: {cylinders: data/cylinders.csv}`.';
  for (const {key, valueNode} of mappingEntries(yaml, context.node, '`datasets`', hint)) {
    const place = yaml.placeOf(valueNode);
    const options = isScalar(valueNode)
      ? defaultDatasetOptions(readString({yaml, key, node: valueNode}))
      : parseDatasetOptions({yaml, key, node: valueNode});
    datasets.set(key, {options, place});
  }
  return datasets;
}

function parseDatasetOptions(context: ValueContext): DatasetOptions {
  const {yaml} = context;
  const entries = mappingEntries(yaml, context.node, `dataset \`${context.key}\``, 'Give a path, or a mapping with `file:`.');
  const fileEntry = entries.find((entry) => entry.key === 'file');
  if (!fileEntry) {
    throw new UserError(`dataset \`${context.key}\` has no \`file\``, {
      ruleId: 'dataset-no-file',
      place: yaml.placeOf(context.node),
      hint: 'Add `file: path/to/data.csv` (relative to the report).',
    });
  }
  let options = defaultDatasetOptions(readString({yaml, key: 'file', node: fileEntry.valueNode}));
  for (const {key, keyNode, valueNode} of entries) {
    const value: ValueContext = {yaml, key, node: valueNode};
    if (key === 'file') continue;
    if (key === 'delimiter') options = {...options, delimiter: readDelimiter(value)};
    else if (key === 'decimal') options = {...options, decimal: readChoice(value, ['.', ','] as const)};
    else if (key === 'missing') options = {...options, missing: readStringList(value)};
    else if (key === 'types') options = {...options, types: readTypes(value)};
    else if (key === 'units') options = {...options, units: readNames(value, 'Example: `units: {strength: MPa}`.')};
    else if (key === 'labels') options = {...options, labels: readNames(value, 'Example: `labels: {strength_mpa: compressive strength}`.')};
    else {
      throw new UserError(`unknown dataset option \`${key}\``, {
        ruleId: 'unknown-setting',
        place: yaml.placeOf(keyNode),
        hint: didYouMean(key, datasetKeys, `Dataset options are: ${datasetKeys.join(', ')}.`),
      });
    }
  }
  return options;
}

/** Unknown styles get a did-you-mean, like unknown keys. */
function readStyle(context: ValueContext): StyleName {
  const written = readString(context);
  const style = styleNames.find((name) => name === written);
  if (style) return style;
  throw new UserError(`unknown style \`${written}\``, {
    ruleId: 'invalid-value',
    place: context.yaml.placeOf(context.node),
    hint: didYouMean(written, styleNames, `Styles are: ${styleNames.join(', ')}.`),
  });
}

function readDelimiter(context: ValueContext): string {
  const delimiter = normalizeDelimiter(readString(context));
  if (delimiter !== undefined) return delimiter;
  throw new UserError('`delimiter` must be one character, `\\t`, or a name (comma, semicolon, tab, pipe, space)', {
    ruleId: 'invalid-value',
    place: context.yaml.placeOf(context.node),
    hint: 'Example: `delimiter: ";"`.',
  });
}

function readTypes(context: ValueContext): Record<string, 'number' | 'string'> {
  // No prototype: a column named `__proto__` must stay an ordinary key.
  const types: Record<string, 'number' | 'string'> = Object.create(null) as Record<string, 'number' | 'string'>;
  for (const {key, valueNode} of mappingEntries(context.yaml, context.node, '`types`', 'Example: `types: {batch: string}`.')) {
    types[key] = readChoice({yaml: context.yaml, key, node: valueNode}, ['number', 'string'] as const);
  }
  return types;
}

/** A mapping of column names to text (`units`, `labels`). */
function readNames(context: ValueContext, hint: string): Record<string, string> {
  const names: Record<string, string> = Object.create(null) as Record<string, string>;
  for (const {key, valueNode} of mappingEntries(context.yaml, context.node, `\`${context.key}\``, hint)) {
    names[key] = readString({yaml: context.yaml, key, node: valueNode});
  }
  return names;
}

