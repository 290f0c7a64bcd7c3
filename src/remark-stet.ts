import type {Code, Root, Yaml} from 'mdast';
import path from 'node:path';
import {SKIP, visit} from 'unist-util-visit';
import type {VFile} from 'vfile';
import type {BlockCache} from './cache/block-cache.js';
import {blockChart, type BlockChart} from './charts/block-chart.js';
import {familyCharts} from './charts/family-charts.js';
import type {RenderedChart} from './charts/render-draft.js';
import {adjustFamilies} from './compute/adjust-families.js';
import {computeBlock, type ComputedBlock} from './compute/compute-block.js';
import type {Dataset} from './data/column.js';
import {reportError} from './document/report-error.js';
import type {Disclosure} from './interpret/disclosure.js';
import {interpretBlock, type InterpretedBlock} from './interpret/result-record.js';
import {blockNodes} from './render/block-nodes.js';
import {resolveCrossReferences} from './render/cross-references.js';
import {familyNodes, familyPlacement} from './render/family-nodes.js';
import {createFloatCounter, type FloatNumbers} from './render/float-numbers.js';
import {resolveReferences} from './render/resolve-references.js';
import {createDatasetLoader} from './resolve/load-datasets.js';
import {selectRows} from './resolve/select-rows.js';
import type {BlockSpec} from './spec/block-spec.js';
import {parseBlock} from './spec/parse-block.js';
import {defaultSettings, parseSettings, type DocumentSettings} from './spec/parse-settings.js';
import {UserError} from './user-error.js';

/** Options of the `remarkStet` plugin. */
export interface RemarkStetOptions {
  /** Read data files outside the report's folder (default: false). */
  allowOutside?: boolean | undefined;
  /** Render charts (default: true). */
  charts?: boolean | undefined;
  /** The block's plan label and count of specifications, from `stet.lock` and the ledger (default: none). */
  disclose?: ((spec: BlockSpec, settings: DocumentSettings) => Disclosure | undefined) | undefined;
  /** Reuse computed blocks and charts whose inputs did not change (`stet watch`). */
  cache?: BlockCache | undefined;
}

/** What the plugin leaves on `file.data.stet` for writers. */
export interface StetData {
  readonly settings: DocumentSettings;
  readonly blocks: ReadonlyMap<string, InterpretedBlock>;
  readonly datasets: ReadonlyMap<string, Dataset>;
  /** Chart SVG by block id; the document refers to `charts/ID.svg`. */
  readonly charts: ReadonlyMap<string, BlockChart>;
  /** Figure and table numbers by block id, in document order. */
  readonly floats: FloatNumbers;
  /** Every valid block as declared (before `auto` is resolved), by id. */
  readonly specs: ReadonlyMap<string, BlockSpec>;
  /** Forest plot by family name; written as `charts/family-NAME.svg`. */
  readonly familyCharts: ReadonlyMap<string, RenderedChart>;
}

declare module 'vfile' {
  interface DataMap {
    stet: StetData;
  }
}

/**
 * remark plugin: runs the ```stet blocks of a document and replaces them
 * with their results.
 *
 *   front matter → block specs → datasets → rows → compute → adjust
 *   families → interpret → charts → replace blocks (numbering figures and
 *   tables) → resolve {{fig:/tab: cross-references}} and {{references}}
 *
 * Authors' mistakes become fatal messages on the file, with positions; the
 * tree is left as far as it got.
 */
export default function remarkStet(options: RemarkStetOptions = {}) {
  return async function transform(tree: Root, file: VFile): Promise<void> {
    const report = (error: unknown) => reportError(file, error);
    const baseDir = file.dirname ? path.resolve(file.cwd, file.dirname) : file.cwd;

    // 1. Front matter.
    const settings = readSettings(tree, report);

    // 2. Blocks: parse and validate each; ids unique.
    const codes: Code[] = [];
    const specs = new Map<Code, BlockSpec>();
    const failed = new Set<string>();
    visit(tree, 'code', (node: Code) => {
      if (node.lang !== 'stet') return;
      codes.push(node);
      const spec = attempt(report, () => parseBlock(node.value, bodyOrigin(node), placeOf(node), settings));
      if (!spec) {
        // Its references would only repeat the block's own error.
        const id = /^id:\s*["']?([a-z][a-z0-9_-]*)/m.exec(node.value)?.[1];
        if (id) failed.add(id);
        return;
      }
      const duplicate = [...specs.values()].find((other) => other.id === spec.id);
      if (duplicate) {
        report(new UserError(`duplicate block id \`${spec.id}\``, {
          ruleId: 'duplicate-id',
          place: spec.keyPlaces['id'] ?? spec.place,
          hint: `The first block with this id is at line ${duplicate.place.line}; ids must be unique.`,
        }));
        return;
      }
      specs.set(node, spec);
    });

    // 3–5. Load each dataset once, select rows, compute.
    const loader = createDatasetLoader(settings, baseDir, options.allowOutside ?? false);
    const computed = new Map<Code, ComputedBlock>();
    for (const [node, spec] of specs) {
      try {
        const dataset = await loader.load(spec);
        const compute = () => computeBlock(spec, dataset, selectRows(spec, dataset));
        computed.set(node, options.cache ? await options.cache.computed(spec, dataset, compute) : compute());
      } catch (error) {
        failed.add(spec.id);
        report(error);
      }
    }

    // 6–7. Adjust within families, then decide and word each result.
    const adjustments = adjustFamilies([...computed.values()], settings.adjust);
    const blocks = new Map<string, InterpretedBlock>();
    const declared = new Map([...specs.values()].map((spec) => [spec.id, spec]));
    for (const block of computed.values()) {
      const disclosure = options.disclose?.(declared.get(block.spec.id) ?? block.spec, settings);
      blocks.set(block.spec.id, interpretBlock(block, adjustments.get(block.spec.id), disclosure));
    }

    // 8. Charts.
    const charts = new Map<string, BlockChart>();
    let families: ReadonlyMap<string, RenderedChart> = new Map();
    if (options.charts !== false) {
      for (const block of blocks.values()) {
        const render = () => blockChart(block);
        const chart = await attemptAsync(report, () => (options.cache ? options.cache.chart(block, render) : render()));
        if (chart) charts.set(block.computed.spec.id, chart);
      }
      families = await familyCharts(blocks.values());
    }

    // 9. Replace each block by its output (failed blocks stay as written),
    //    numbering figures and tables in document order.
    //    A family's forest plot follows the family's last block.
    const floats = createFloatCounter();
    const familyAfter = familyPlacement(blocks.values(), families);
    visit(tree, 'code', (node: Code, index, parent) => {
      const block = blocks.get(specs.get(node)?.id ?? '');
      if (!parent || index === undefined || !block || computed.get(node) !== block.computed) return;
      const nodes = blockNodes(node, block, charts.get(block.computed.spec.id), floats);
      const family = familyAfter.get(block.computed.spec.id);
      const familyChart = family === undefined ? undefined : families.get(family);
      if (family !== undefined && familyChart) {
        const size = [...blocks.values()].filter((b) => b.computed.spec.family === family && b.computed.outcome?.estimate).length;
        nodes.push(...familyNodes(family, familyChart, size, floats, node.position));
      }
      parent.children.splice(index, 1, ...nodes);
      return [SKIP, index + nodes.length];
    });
    for (const spec of specs.values()) if (!blocks.has(spec.id)) failed.add(spec.id);

    // 10. Inline references: cross-references to floats, then values.
    resolveCrossReferences(tree, floats, failed, report);
    resolveReferences(tree, blocks, failed, report);

    file.data.stet = {settings, blocks, datasets: await loader.loaded(), charts, familyCharts: families, floats, specs: declared};
  };
}

function readSettings(tree: Root, report: (error: unknown) => void): DocumentSettings {
  const yaml = tree.children.find((node): node is Yaml => node.type === 'yaml');
  if (!yaml) return defaultSettings;
  const start = yaml.position?.start ?? {line: 1, column: 1};
  return attempt(report, () => parseSettings(yaml.value, {line: start.line + 1, column: 1})) ?? defaultSettings;
}

/** Where the block's YAML body starts: the line after the opening fence. */
function bodyOrigin(node: Code) {
  const start = placeOf(node);
  return {line: start.line + 1, column: start.column};
}

function placeOf(node: Code) {
  return {line: node.position?.start.line ?? 1, column: node.position?.start.column ?? 1};
}

function attempt<T>(report: (error: unknown) => void, run: () => T): T | undefined {
  try {
    return run();
  } catch (error) {
    report(error);
    return undefined;
  }
}

async function attemptAsync<T>(report: (error: unknown) => void, run: () => Promise<T>): Promise<T | undefined> {
  try {
    return await run();
  } catch (error) {
    report(error);
    return undefined;
  }
}
