import type {OutputFormat} from '../compile-report.js';
import type {StetData} from '../remark-stet.js';
import {tableCsv} from './table-csv.js';
import {tableTex} from './table-tex.js';
import {valuesTex} from './values-tex.js';

/**
 * The table outputs of a build, by path relative to the output folder:
 * `tables/ID.csv` for every block always; with `tex`, `tables/ID.tex` for
 * every block and `NAME.values.tex`.
 */
export function tableFiles(data: StetData, formats: ReadonlySet<OutputFormat>, name: string, source: string): [string, string][] {
  const files: [string, string][] = [];
  for (const [id, block] of data.blocks) {
    files.push([`tables/${id}.csv`, tableCsv(id, block.result)]);
    if (formats.has('tex')) files.push([`tables/${id}.tex`, tableTex(block, source)]);
  }
  if (formats.has('tex')) files.push([`${name}.values.tex`, valuesTex(data.blocks, source, name)]);
  return files;
}
