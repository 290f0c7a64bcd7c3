import {describe, expect, it} from 'vitest';
import type {NumericColumn, StringColumn} from '../../src/data/column.js';
import {defaultDatasetOptions, type DatasetOptions} from '../../src/data/dataset-options.js';
import {inferTypes} from '../../src/data/infer-types.js';
import {readCsv} from '../../src/data/read-csv.js';
import {catchUserError} from './catch-user-error.js';

async function infer(text: string, options: Partial<DatasetOptions> = {}, delimiter = ',') {
  const full = {...defaultDatasetOptions('data/x.csv'), ...options};
  return inferTypes(await readCsv(text, {file: full.file, delimiter, delimiterSource: 'declared'}), full);
}

describe('inferTypes', () => {
  it('makes a column numeric when every non-missing cell is a number', async () => {
    const [a, b] = await infer('a,b\n-1.5,x\n1e3,y\n+2,z\n.5,w\n');
    expect(a?.kind).toBe('number');
    expect([...(a as NumericColumn).values]).toEqual([-1.5, 1000, 2, 0.5]);
    expect(b).toEqual({kind: 'string', name: 'b', values: ['x', 'y', 'z', 'w']});
  });

  it('marks missing cells (default markers "" and NA) with NaN and the mask', async () => {
    const [a, b] = await infer('a,b\n1,NA\nNA,\n,"p"\n3,q\n');
    const numeric = a as NumericColumn;
    expect(numeric.kind).toBe('number');
    expect([...numeric.missing]).toEqual([0, 1, 1, 0]);
    expect(Number.isNaN(numeric.values[1]) && Number.isNaN(numeric.values[2])).toBe(true);
    expect((b as StringColumn).values).toEqual([null, null, 'p', 'q']);
  });

  it('uses the declared missing markers instead of the defaults', async () => {
    const [a] = await infer('a\n1\nn/a\nNA\n', {missing: ['n/a']});
    expect(a?.kind).toBe('string'); // "NA" is no longer a marker, so it is text
    const [b] = await infer('a\n1\nn/a\n-\n', {missing: ['n/a', '-']});
    expect([...(b as NumericColumn).missing]).toEqual([0, 1, 1]);
  });

  it('trims unquoted numeric cells only; quoted text is never trimmed', async () => {
    const [a, b, c] = await infer('a,b,c\n 1 ," 2",x \n2,"3", y\n');
    expect([...(a as NumericColumn).values]).toEqual([1, 2]);
    expect(b).toEqual({kind: 'string', name: 'b', values: [' 2', '3']});
    expect(c).toEqual({kind: 'string', name: 'c', values: ['x ', ' y']});
  });

  it('reads quoted numbers as numbers (files that quote every field)', async () => {
    const [a] = await infer('"a"\n"1.5"\n"2"\n');
    expect([...(a as NumericColumn).values]).toEqual([1.5, 2]);
  });

  it('honours decimal ",": 1,5 is a number, 1.5 is text', async () => {
    const [x, y] = await infer('x;y\n1,5;1.5\n-2;3\n', {decimal: ','}, ';');
    expect([...(x as NumericColumn).values]).toEqual([1.5, -2]);
    expect(y?.kind).toBe('string');
  });

  it('keeps thousands separators, hex, infinities and NaN as text', async () => {
    for (const cell of ['"1,000"', '0x10', 'Infinity', 'NaN']) {
      const [a] = await infer(`a\n1\n${cell}\n`);
      expect(a?.kind).toBe('string');
    }
  });

  it('makes an all-missing column and a header-only column numeric', async () => {
    const [a] = await infer('a,b\nNA,1\n,2\n');
    expect(a?.kind).toBe('number');
    const [c] = await infer('c\n');
    expect(c).toEqual({kind: 'number', name: 'c', values: new Float64Array(0), missing: new Uint8Array(0), offset: 0, centred: new Float64Array(0)});
    expect((a as NumericColumn).offset).toBe(0);
    expect([...(a as NumericColumn).centred]).toEqual([NaN, NaN]);
  });

  it('centres numeric columns on their first value in exact decimal arithmetic', async () => {
    // NIST StRD SmLs07 data: 1000000000000.4 and .3 are 0.1 apart, their doubles 0.0999755859375 apart.
    const [y] = await infer('y\nNA\n1000000000000.4\n1000000000000.3\nNA\n1000000000000.5\n');
    const numeric = y as NumericColumn;
    expect(numeric.offset).toBe(1000000000000.4);
    expect([...numeric.centred]).toEqual([NaN, 0, -0.1, NaN, 0.1]); // exact decimal differences, nearest doubles
    expect(numeric.values[2]! - numeric.values[1]!).toBe(-0.0999755859375); // what parsing to doubles alone gives
  });

  it('centres forced numeric columns and decimal-comma columns too', async () => {
    const [x] = await infer('x;y\n10000000,2;a\n10000000,1;b\n', {decimal: ',', types: {x: 'number'}}, ';');
    expect((x as NumericColumn).offset).toBe(10000000.2);
    expect([...(x as NumericColumn).centred]).toEqual([0, -0.1]); // NIST StRD NumAcc4 values, exact difference
  });

  it('forces text with types: string, keeping the missing markers', async () => {
    const [batch] = await infer('batch\n007\nNA\n12\n', {types: {batch: 'string'}});
    expect(batch).toEqual({kind: 'string', name: 'batch', values: ['007', null, '12']});
  });

  it('forces numbers with types: number and reports the first bad cell at its place', async () => {
    const rows = Array.from({length: 12}, (_, i) => `s${i},${30 + i}`);
    const text = ['id,strength', ...rows, 's12,12.1O', 's13,x'].join('\n');
    const error = await catchUserError(() => infer(text, {types: {strength: 'number'}}));
    expect(`${error.file}:${error.place?.line}:${error.place?.column}: ${error.message}`).toBe(
      'data/x.csv:14:5: column "strength" is declared number but row 13 has "12.1O"',
    );
    expect(error.ruleId).toBe('data-not-a-number');
  });

  it('suggests the other decimal mark when the bad cell reads under it', async () => {
    const error = await catchUserError(() => infer('a;v\nx;1\ny;12,5\n', {types: {v: 'number'}}, ';'));
    expect(error.place).toEqual({line: 3, column: 3});
    expect(error.hint).toMatch(/decimal: ","/);
  });

  it('is not confused by column names that are Object.prototype members', async () => {
    const columns = await infer('toString,constructor\n1,a\n');
    expect(columns.map((c) => c.kind)).toEqual(['number', 'string']);
  });

  it('refuses types for a column the file does not have', async () => {
    const error = await catchUserError(() => infer('a\n1\n', {types: {b: 'string'}}));
    expect([error.ruleId, error.hint]).toEqual(['unknown-column', 'columns of data/x.csv: "a"']);
  });
});
