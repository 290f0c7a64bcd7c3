import path from 'node:path';
import type {Dataset} from '../data/column.js';
import {defaultDatasetOptions} from '../data/dataset-options.js';
import {loadDataset} from '../data/load-dataset.js';
import {placeOfKey, type BlockSpec} from '../spec/block-spec.js';
import type {DocumentSettings} from '../spec/parse-settings.js';
import {didYouMean} from '../spec/suggest.js';
import {UserError} from '../user-error.js';

/**
 * Datasets of a report, each loaded once however many blocks read it.
 * A block's `data` names a front-matter dataset or is a path; paths must
 * stay inside the report's folder unless `allowOutside` is set.
 */
export interface DatasetLoader {
  load(spec: BlockSpec): Promise<Dataset>;
  /** Every dataset loaded so far, by name. */
  loaded(): Promise<ReadonlyMap<string, Dataset>>;
}

export function createDatasetLoader(settings: DocumentSettings, baseDir: string, allowOutside: boolean): DatasetLoader {
  const cache = new Map<string, Promise<Dataset>>();
  return {
    load(spec) {
      const declared = settings.datasets.get(spec.data);
      const looksLikePath = /\.(csv|tsv|txt)$/i.test(spec.data);
      if (!declared && !looksLikePath) {
        const names = [...settings.datasets.keys()];
        throw new UserError(`unknown dataset \`${spec.data}\``, {
          ruleId: 'unknown-dataset',
          place: placeOfKey(spec, 'data'),
          hint: didYouMean(spec.data, names, names.length
            ? `Datasets in the front matter: ${names.join(', ')}; or give a path ending in .csv or .tsv.`
            : 'Declare it under `stet: datasets:` in the front matter, or give a path ending in .csv or .tsv.'),
        });
      }
      const options = declared?.options ?? defaultDatasetOptions(spec.data);
      const place = declared?.place ?? placeOfKey(spec, 'data');
      const absolute = path.resolve(baseDir, options.file);
      const relative = path.relative(baseDir, absolute);
      if (!allowOutside && (relative.startsWith('..') || path.isAbsolute(relative))) {
        throw new UserError(`data file \`${options.file}\` is outside the report's folder`, {
          ruleId: 'path-outside',
          place,
          hint: 'Move the data beside the report, or build with --allow-outside if you trust this report.',
        });
      }
      let pending = cache.get(spec.data);
      if (!pending) {
        pending = loadDataset(spec.data, options, baseDir).catch((error: unknown) => {
          // Errors with no place inside the data file point at the declaration.
          if (error instanceof UserError && !error.place) {
            throw new UserError(error.message, {ruleId: error.ruleId, place, ...(error.hint ? {hint: error.hint} : {})});
          }
          throw error;
        });
        cache.set(spec.data, pending);
      }
      return pending;
    },
    async loaded() {
      const entries = await Promise.allSettled([...cache.entries()].map(async ([name, p]) => [name, await p] as const));
      return new Map(entries.flatMap((entry) => (entry.status === 'fulfilled' ? [entry.value] : [])));
    },
  };
}
