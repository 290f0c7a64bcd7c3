import type {StetData} from '../remark-stet.js';
import {columnsUsed} from './columns-used.js';
import {missingCells} from './missing-cells.js';

/**
 * `NAME.results.json` (contract §6): unrounded numbers. JSON has no
 * infinity, so the open bound of a one-sided interval is written as null.
 */
export function resultsJson(data: StetData, source: string, version: string): string {
  const used = new Map<string, Set<string>>();
  for (const block of data.blocks.values()) {
    const {spec} = block.computed;
    const names = used.get(spec.data) ?? new Set<string>();
    for (const name of columnsUsed(spec)) names.add(name);
    used.set(spec.data, names);
  }
  // `columns` lists every column of the file; `columns_used` those the blocks read, in file order.
  const datasets = Object.fromEntries(
    [...data.datasets.values()].map((d) => [d.name, {
      file: d.file, sha256: d.sha256, rows: d.rowCount, columns: [...d.columns.keys()],
      columns_used: [...d.columns.keys()].filter((name) => used.get(d.name)?.has(name)),
    }]),
  );
  const blocks = Object.fromEntries([...data.blocks].map(([id, block]) => {
    const dataset = data.datasets.get(block.computed.spec.data);
    return [id, dataset ? {...block.result, missing_cells: missingCells(block.computed.spec, dataset)} : block.result];
  }));
  const document = {stet: {version}, source, alpha: data.settings.alpha, confidence: data.settings.confidence, adjust: data.settings.adjust, datasets, blocks};
  return `${JSON.stringify(document, (_key, value: unknown) => (typeof value === 'number' && !Number.isFinite(value) ? null : value), 2)}\n`;
}
