import type {StetData} from '../remark-stet.js';

/**
 * `NAME.results.json` (contract §6): unrounded numbers. JSON has no
 * infinity, so the open bound of a one-sided interval is written as null.
 */
export function resultsJson(data: StetData, source: string, version: string): string {
  const datasets = Object.fromEntries(
    [...data.datasets.values()].map((d) => [d.name, {file: d.file, sha256: d.sha256, rows: d.rowCount, columns: [...d.columns.keys()]}]),
  );
  const blocks = Object.fromEntries([...data.blocks].map(([id, block]) => [id, block.result]));
  const document = {stet: {version}, source, alpha: data.settings.alpha, confidence: data.settings.confidence, adjust: data.settings.adjust, datasets, blocks};
  return `${JSON.stringify(document, (_key, value: unknown) => (typeof value === 'number' && !Number.isFinite(value) ? null : value), 2)}\n`;
}
