import {createHash} from 'node:crypto';
import {mkdir, mkdtemp, rm, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import {join} from 'node:path';
import {afterAll, beforeAll, describe, expect, it} from 'vitest';
import type {NumericColumn, StringColumn} from '../../src/data/column.js';
import {defaultDatasetOptions} from '../../src/data/dataset-options.js';
import {loadDataset} from '../../src/data/load-dataset.js';
import {catchUserError} from './catch-user-error.js';

let dir: string;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'stet-load-'));
  await mkdir(join(dir, 'data'));
  const files: Record<string, string | Buffer> = {
    'data/cylinders.csv': '\uFEFFsupplier,strength\r\nA,31.5\r\n"B",NA\r\nB,29\r\n',
    'data/mixes.csv': 'mix;strength;slump\nm1;31,5;80\nm2;n/a;95\n',
    'data/mixes.tsv': 'mix\tstrength\nm1\t31.5\n',
    'data/pipes.txt': 'a|b\n1|x\n2|y\n',
    'data/Case.csv': 'a\n1\n',
  };
  for (const [name, content] of Object.entries(files)) await writeFile(join(dir, name), content);
});

afterAll(async () => {
  await rm(dir, {recursive: true, force: true});
});

describe('loadDataset', () => {
  it('loads a CSV with BOM and CRLF into typed columns with the hash of its bytes', async () => {
    const options = {...defaultDatasetOptions('data/cylinders.csv'), units: {strength: 'MPa'}};
    const dataset = await loadDataset('cylinders', options, dir);
    const bytes = Buffer.from('\uFEFFsupplier,strength\r\nA,31.5\r\n"B",NA\r\nB,29\r\n');
    expect(dataset.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
    expect([dataset.name, dataset.file, dataset.absolutePath, dataset.rowCount]).toEqual([
      'cylinders', 'data/cylinders.csv', join(dir, 'data/cylinders.csv'), 3,
    ]);
    expect([...dataset.columns.keys()]).toEqual(['supplier', 'strength']);
    expect((dataset.columns.get('supplier') as StringColumn).values).toEqual(['A', 'B', 'B']);
    const strength = dataset.columns.get('strength') as NumericColumn;
    expect([...strength.missing]).toEqual([0, 1, 0]);
    expect(strength.values[2]).toBe(29);
    expect(dataset.units).toEqual({strength: 'MPa'});
  });

  it('sniffs ";" in a .csv with decimal "," and uses the declared missing markers', async () => {
    const options = {...defaultDatasetOptions('data/mixes.csv'), decimal: ',' as const, missing: ['', 'n/a']};
    const dataset = await loadDataset('mixes', options, dir);
    const strength = dataset.columns.get('strength') as NumericColumn;
    expect([strength.values[0], strength.missing[1]]).toEqual([31.5, 1]);
    expect(dataset.columns.get('slump')?.kind).toBe('number');
  });

  it('reads .tsv by extension and sniffs other extensions', async () => {
    expect((await loadDataset('t', defaultDatasetOptions('data/mixes.tsv'), dir)).columns.get('strength')?.kind).toBe('number');
    expect([...(await loadDataset('p', defaultDatasetOptions('data/pipes.txt'), dir)).columns.keys()]).toEqual(['a', 'b']);
  });

  it('reports a missing file with where it looked and what is there', async () => {
    const error = await catchUserError(() => loadDataset('x', defaultDatasetOptions('data/cylinder.csv'), dir));
    expect([error.ruleId, error.file, error.message]).toEqual(['data-file-missing', 'data/cylinder.csv', 'data file data/cylinder.csv not found']);
    expect(error.hint).toContain(join(dir, 'data/cylinder.csv'));
    expect(error.hint).toContain('cylinders.csv');
    const cased = await catchUserError(() => loadDataset('x', defaultDatasetOptions('data/case.csv'), dir));
    expect(cased.hint).toMatch(/Case\.csv \(names are case-sensitive\)/);
    const noFolder = await catchUserError(() => loadDataset('x', defaultDatasetOptions('nope/x.csv'), dir));
    expect(noFolder.ruleId).toBe('data-file-missing');
  });

  it('reports a folder given as data file', async () => {
    const error = await catchUserError(() => loadDataset('x', defaultDatasetOptions('data'), dir));
    expect(error.ruleId).toBe('data-file-unreadable');
  });

  it('refuses units for a column the file does not have', async () => {
    const options = {...defaultDatasetOptions('data/cylinders.csv'), units: {strenght: 'MPa'}};
    const error = await catchUserError(() => loadDataset('c', options, dir));
    expect(error.ruleId).toBe('unknown-column');
  });

  it('places data errors in the file as the author wrote its path', async () => {
    await writeFile(join(dir, 'data/bad.csv'), 'a,b\n1,2\n3\n');
    const error = await catchUserError(() => loadDataset('b', defaultDatasetOptions('data/bad.csv'), dir));
    expect([error.file, error.place]).toEqual(['data/bad.csv', {line: 3, column: 2}]);
  });
});
