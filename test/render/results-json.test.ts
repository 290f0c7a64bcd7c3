import {readFile} from 'node:fs/promises';
import {createHash} from 'node:crypto';
import path from 'node:path';
import {beforeAll, describe, expect, it} from 'vitest';
import {buildReport} from '../../src/build-report.js';
import {sampleCopy} from '../helpers/small-report.js';

interface Results {
  datasets: Record<string, {file: string; sha256: string; rows: number; columns: string[]; columns_used: string[]}>;
  blocks: Record<string, {rows: Record<string, number>; missing_cells: Record<string, number>}>;
}

/** A CSV read naively (no quoting in the sample), independent of stet's data stage. */
async function table(dir: string, file: string, delimiter = ','): Promise<Record<string, string>[]> {
  const [header, ...lines] = (await readFile(path.join(dir, file), 'utf8')).trim().split('\n');
  const names = header!.split(delimiter);
  return lines.map((line) => Object.fromEntries(line.split(delimiter).map((cell, i) => [names[i]!, cell])));
}

const isMissing = (cell: string | undefined) => cell === undefined || cell === '' || cell === 'NA';

describe('provenance in NAME.results.json (the concrete sample)', () => {
  let dir: string;
  let results: Results;

  beforeAll(async () => {
    const report = await sampleCopy();
    dir = path.dirname(report);
    const built = await buildReport(report);
    expect(built.messages.map(String)).toEqual([]);
    results = JSON.parse(await readFile(path.join(dir, 'out/report.results.json'), 'utf8')) as Results;
  });

  it('records each data file with its hash, rows, all columns and the columns blocks read', async () => {
    const cylinders = await table(dir, 'data/cylinders.csv');
    const bytes = await readFile(path.join(dir, 'data/cylinders.csv'));
    expect(results.datasets['cylinders']).toEqual({
      file: 'data/cylinders.csv',
      sha256: createHash('sha256').update(bytes).digest('hex'),
      rows: cylinders.length,
      columns: ['cylinder', 'supplier', 'pour_date', 'age_days', 'strength_mpa', 'slump_mm'],
      // Read by y, by and where of the blocks in report.md; `cylinder` and `pour_date` by none.
      columns_used: ['supplier', 'age_days', 'strength_mpa', 'slump_mm'],
    });
    expect(results.datasets['regimes']!.columns_used).toEqual(['regime', 'water_cement', 'strength_mpa']);
    expect(results.datasets['slabs']!.columns_used).toEqual(['untreated', 'treated']);
  });

  it('accounts for every row of each block as an independent count of the CSV does', async () => {
    const cylinders = await table(dir, 'data/cylinders.csv');
    const count = (rows: Record<string, string>[], where: (r: Record<string, string>) => boolean, used: (r: Record<string, string>) => boolean) => {
      const kept = rows.filter(where);
      const usable = kept.filter(used);
      return {used: usable.length, excluded_missing: kept.length - usable.length, excluded_filter: rows.length - kept.length, excluded_levels: 0};
    };
    const strength = (r: Record<string, string>) => !isMissing(r['strength_mpa']);
    const slump = (r: Record<string, string>) => !isMissing(r['slump_mm']);
    expect(results.blocks['supplier-28d']!.rows).toEqual(count(cylinders, (r) => r['age_days'] === '28', strength));
    expect(results.blocks['supplier-7d']!.rows).toEqual(count(cylinders, (r) => r['age_days'] === '7', strength));
    expect(results.blocks['quarrybank-spec']!.rows).toEqual(count(cylinders, (r) => r['age_days'] === '28' && r['supplier'] === 'Quarrybank', strength));
    expect(results.blocks['slump']!.rows).toEqual(count(cylinders, (r) => r['age_days'] === '7', slump));
    const slabs = await table(dir, 'data/slabs.csv', ';');
    expect(results.blocks['curing']!.rows).toEqual(count(slabs, () => true, (r) => !isMissing(r['untreated']) && !isMissing(r['treated'])));
    // The sample has one damaged cylinder, at 28 days (its strength is NA).
    expect(results.blocks['supplier-28d']!.rows['excluded_missing']).toBe(1);
  });

  it('names the columns whose missing cells excluded rows', async () => {
    const cylinders = await table(dir, 'data/cylinders.csv');
    const missing28 = cylinders.filter((r) => r['age_days'] === '28' && isMissing(r['strength_mpa'])).length;
    expect(results.blocks['supplier-28d']!.missing_cells).toEqual({strength_mpa: missing28});
    expect(results.blocks['supplier-7d']!.missing_cells).toEqual({});
  });
});
