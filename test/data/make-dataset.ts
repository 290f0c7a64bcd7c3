import type {Dataset} from '../../src/data/column.js';
import {defaultDatasetOptions, type DatasetOptions} from '../../src/data/dataset-options.js';
import {inferTypes} from '../../src/data/infer-types.js';
import {readCsv} from '../../src/data/read-csv.js';

/** A Dataset from CSV text, without touching the disk (the loader's steps 2 and 3). */
export async function makeDataset(text: string, options: Partial<DatasetOptions> = {}): Promise<Dataset> {
  const full: DatasetOptions = {...defaultDatasetOptions('mem.csv'), ...options};
  const table = await readCsv(text, {file: full.file, delimiter: full.delimiter ?? ',', delimiterSource: 'declared'});
  const columns = inferTypes(table, full);
  return {
    name: 'mem',
    file: full.file,
    absolutePath: '/nowhere/' + full.file,
    sha256: '',
    rowCount: table.rowCount,
    columns: new Map(columns.map((c) => [c.name, c])),
    units: full.units,
    labels: full.labels,
  };
}
