import {randomBytes} from 'node:crypto';
import {mkdir, readFile, readdir, rename, rm, writeFile} from 'node:fs/promises';
import path from 'node:path';
import type {BlockChart} from '../charts/block-chart.js';
import type {ComputedBlock} from '../compute/compute-block.js';
import type {Dataset} from '../data/column.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import type {BlockSpec} from '../spec/block-spec.js';
import {version} from '../version.js';
import {stableHash} from './stable-hash.js';
import {decodeValue, encodeValue, type Encoded} from './value-codec.js';

/**
 * A content-addressed cache of the two costly stages of a build: computing
 * a block (selecting rows, running the method) and rendering its chart.
 *
 * - A block is keyed by its spec without positions, the content of the
 *   dataset it reads as loaded (columns, units, labels — so a changed
 *   `missing` marker or label counts as a change, not only the file's
 *   bytes) and stet's version. Editing prose therefore recomputes nothing;
 *   editing one dataset recomputes only the blocks that read it.
 * - A chart is keyed by the whole interpreted block it is drawn from.
 *
 * Families are adjusted and results interpreted after the cache, since
 * they depend on every block of a family.
 *
 * Entries live in memory and, when `dir` is given, as JSON files in it
 * (`blocks/HASH.json`, `charts/HASH.json`). `endBuild` forgets every entry
 * the build did not use, so a long watch session stays bounded.
 */
export interface BlockCache {
  computed(spec: BlockSpec, dataset: Dataset, compute: () => ComputedBlock): Promise<ComputedBlock>;
  chart(block: InterpretedBlock, render: () => Promise<BlockChart | undefined>): Promise<BlockChart | undefined>;
  /** Start counting a build. */
  beginBuild(): void;
  /** Forget entries this build did not use; resolves to its counts. */
  endBuild(): Promise<CacheCounts>;
}

export interface CacheCounts {
  readonly computed: number;
  readonly reused: number;
  readonly chartsRendered: number;
  readonly chartsReused: number;
}

type Kind = 'blocks' | 'charts';

export function createBlockCache(options: {dir?: string | undefined} = {}): BlockCache {
  const memory = {blocks: new Map<string, ComputedBlock>(), charts: new Map<string, BlockChart | null>()};
  const used = {blocks: new Set<string>(), charts: new Set<string>()};
  const datasetKeys = new WeakMap<Dataset, string>();
  let counts = {computed: 0, reused: 0, chartsRendered: 0, chartsReused: 0};

  const datasetKey = (dataset: Dataset): string => {
    let key = datasetKeys.get(dataset);
    if (key === undefined) datasetKeys.set(dataset, (key = stableHash(dataset)));
    return key;
  };

  async function lookup<T>(kind: Kind, key: string): Promise<T | undefined> {
    used[kind].add(key);
    const held = (memory[kind] as Map<string, T>).get(key);
    if (held !== undefined || !options.dir) return held;
    const text = await readFile(path.join(options.dir, kind, `${key}.json`), 'utf8').catch(() => undefined);
    if (text === undefined) return undefined;
    try {
      const value = decodeValue(JSON.parse(text) as Encoded) as T;
      (memory[kind] as Map<string, T>).set(key, value);
      return value;
    } catch {
      return undefined; // A damaged entry is recomputed and overwritten.
    }
  }

  async function store<T>(kind: Kind, key: string, value: T): Promise<void> {
    (memory[kind] as Map<string, T>).set(key, value);
    if (!options.dir) return;
    let text: string;
    try {
      text = JSON.stringify(encodeValue(value));
    } catch {
      return; // Not plain data: kept in memory only.
    }
    const folder = path.join(options.dir, kind);
    const temporary = path.join(folder, `.${key}.${randomBytes(4).toString('hex')}.tmp`);
    try {
      await mkdir(folder, {recursive: true});
      await writeFile(temporary, text);
      await rename(temporary, path.join(folder, `${key}.json`));
    } catch {
      await rm(temporary, {force: true}); // A cache that cannot be written only costs time.
    }
  }

  return {
    async computed(spec, dataset, compute) {
      const key = stableHash({version, spec: positionless(spec), dataset: datasetKey(dataset)});
      const cached = await lookup<ComputedBlock>('blocks', key);
      if (cached) {
        counts.reused++;
        // The current spec carries the current positions; `auto` keeps its choice.
        return {...cached, spec: {...spec, method: cached.spec.method}};
      }
      const block = compute();
      counts.computed++;
      await store('blocks', key, block);
      return block;
    },
    async chart(block, render) {
      const key = stableHash({version, block: {...block, computed: {...block.computed, spec: positionless(block.computed.spec)}}});
      const cached = await lookup<BlockChart | null>('charts', key);
      if (cached !== undefined) {
        counts.chartsReused++;
        return cached ?? undefined;
      }
      const chart = await render();
      counts.chartsRendered++;
      await store('charts', key, chart ?? null);
      return chart;
    },
    beginBuild() {
      counts = {computed: 0, reused: 0, chartsRendered: 0, chartsReused: 0};
      used.blocks.clear();
      used.charts.clear();
    },
    async endBuild() {
      for (const kind of ['blocks', 'charts'] as const) {
        for (const key of memory[kind].keys()) if (!used[kind].has(key)) memory[kind].delete(key);
        if (!options.dir) continue;
        const names = await readdir(path.join(options.dir, kind)).catch(() => [] as string[]);
        await Promise.all(names
          .filter((name) => name.endsWith('.json') && !used[kind].has(name.slice(0, -'.json'.length)))
          .map((name) => rm(path.join(options.dir!, kind, name), {force: true})));
      }
      return counts;
    },
  };
}

/** A spec without the places it was written at: moving a block is not a change. */
function positionless(spec: BlockSpec): unknown {
  return {...spec, place: null, keyPlaces: null, where: spec.where?.source ?? null};
}
