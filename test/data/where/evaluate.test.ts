import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import type {Column, Dataset, NumericColumn} from '../../../src/data/column.js';
import {evaluateWhere} from '../../../src/data/where/evaluate.js';
import {parseWhere} from '../../../src/data/where/parse.js';
import {WhereError} from '../../../src/data/where/where-error.js';
import {makeDataset} from '../make-dataset.js';

const CSV = [
  'site,strength,age,flag,`weird`,compressive strength,day',
  'east,31.5,28,TRUE,a,30,2024-01-05',
  'west,NA,7,false,b,35,2024-02-01',
  'east,28,NA,True,c,NA,2023-12-31',
  'NA,40,28,,d,41,',
  'north,35,14,no,e,25,2024-01-05',
].join('\n');

const rows = async (source: string): Promise<number[]> => {
  const mask = evaluateWhere(parseWhere(source), await makeDataset(CSV));
  return [...mask.keys()].filter((i) => mask[i] === 1);
};

async function evaluateError(source: string): Promise<WhereError> {
  try {
    evaluateWhere(parseWhere(source), await makeDataset(CSV));
  } catch (error) {
    expect(error).toBeInstanceOf(WhereError);
    return error as WhereError;
  }
  return expect.unreachable(`expected a WhereError for ${source}`);
}

describe('evaluateWhere', () => {
  it('compares numeric and text columns', async () => {
    expect(await rows('age == 28 and site != "north"')).toEqual([0]);
    expect(await rows('strength > 30')).toEqual([0, 3, 4]);
    expect(await rows('strength <= 31.5')).toEqual([0, 2]);
    expect(await rows('30 < strength')).toEqual([0, 3, 4]);
    expect(await rows('site == \'east\'')).toEqual([0, 2]);
    expect(await rows('`compressive strength` >= 35')).toEqual([1, 3]);
    expect(await rows('strength > age')).toEqual([0, 3, 4]);
    expect(await rows('```weird``` in ["b", "e"]')).toEqual([1, 4]);
  });

  it('orders text by code units (ISO dates work)', async () => {
    expect(await rows('day >= "2024-01-01" and day < "2024-02-01"')).toEqual([0, 4]);
    expect(await rows('site < "f"')).toEqual([0, 2]);
  });

  it('matches in and not in lists', async () => {
    expect(await rows('site in ["east", "north"]')).toEqual([0, 2, 4]);
    expect(await rows('site not in ["east"]')).toEqual([1, 4]);
    expect(await rows('age in [7, 14]')).toEqual([1, 4]);
  });

  it('never lets a missing cell satisfy a comparison, not even through not', async () => {
    // Row 1 has strength NA; row 3 has site NA.
    expect(await rows('strength != 28')).toEqual([0, 3, 4]);
    expect(await rows('not (strength > 30)')).toEqual([2]);
    expect(await rows('site not in ["east"]')).not.toContain(3);
    expect(await rows('not site in ["east"]')).toEqual([1, 4]);
  });

  it('uses three-valued logic: true or unknown is true, false and unknown is false', async () => {
    expect(await rows('strength > 100 or site == "west"')).toEqual([1]);
    expect(await rows('not (strength > 100 and site == "west")')).toEqual([0, 2, 3, 4]);
    expect(await rows('not (strength > 30 or age > 20)')).toEqual([]);
  });

  it('compares true/false with 1/0 and with true/false text in any case', async () => {
    expect(await rows('flag == true')).toEqual([0, 2]);
    expect(await rows('flag != true')).toEqual([1, 4]);
    expect(await rows('false == flag')).toEqual([1]);
    const numeric = await makeDataset('b\n1\n0\nNA\n2\n');
    expect([...evaluateWhere(parseWhere('b == true or b == false'), numeric)]).toEqual([1, 1, 0, 0]);
  });

  it('returns one byte per row, and none for an empty dataset', async () => {
    expect((await rows('1 == 1')).length).toBe(5);
    const empty = await makeDataset('x\n');
    expect(evaluateWhere(parseWhere('x > 1'), empty)).toEqual(new Uint8Array(0));
  });

  it('reports an unknown column with the closest name and the available ones', async () => {
    const error = await evaluateError('age > 1 and strenght > 30');
    expect([error.ruleId, error.offset, error.length, error.place, error.message]).toEqual([
      'unknown-column', 12, 8, {line: 1, column: 13}, 'unknown column strenght',
    ]);
    expect(error.hint).toBe(
      'did you mean strength? columns of mem.csv: site, strength, age, flag, ```weird```, `compressive strength`, day',
    );
  });

  it('reports a number column compared with text, at the text', async () => {
    const error = await evaluateError('strength > "30"');
    expect([error.ruleId, error.offset, error.message, error.hint]).toEqual([
      'where-type', 11, 'column strength holds numbers but "30" is text', 'remove the quotes: 30',
    ]);
    expect((await evaluateError('age in [1, "x"]')).offset).toBe(11);
    expect((await evaluateError('age == "0x10"')).hint).toBe('compare age with a number, e.g. age > 0');
  });

  it('reports a text column compared with a number, saying why it is text', async () => {
    const ordered = await evaluateError('site > 3');
    expect([ordered.offset, ordered.message, ordered.hint]).toEqual([7, 'column site holds text but 3 is a number', 'compare site with text, e.g. site == "east"']);
    const dataset = await makeDataset('v\n1.5\n2\n"12,1O"\n');
    try {
      evaluateWhere(parseWhere('v >= 2'), dataset);
      expect.unreachable();
    } catch (error) {
      expect((error as WhereError).hint).toMatch(/^it is text because row 3 has "12,1O"; ordering needs a numeric column/);
    }
  });

  it('reports other mismatches at the operator', async () => {
    expect((await evaluateError('site == age')).offset).toBe(5);
    expect((await evaluateError('flag > true')).message).toMatch(/cannot be compared with >/);
    expect((await evaluateError('1 == "1"')).message).toBe('cannot compare 1 (number) with "1" (text)');
  });
});

describe('evaluateWhere, properties', () => {
  const column = (values: Array<number | null>): NumericColumn => ({
    kind: 'number',
    name: 'x',
    values: Float64Array.from(values, (v) => v ?? Number.NaN),
    missing: Uint8Array.from(values, (v) => (v === null ? 1 : 0)),
    offset: 0,
    centred: Float64Array.from(values, (v) => v ?? Number.NaN),
  });
  const dataset = (columns: Column[], rowCount: number): Dataset => ({
    name: 'd', file: 'd.csv', absolutePath: '/d.csv', sha256: '', rowCount, units: {}, labels: {},
    columns: new Map(columns.map((c) => [c.name, c])),
  });
  const finite = fc.double({noNaN: true, noDefaultInfinity: true});

  it('x OP v selects exactly the rows a direct filter selects', () => {
    const operators = ['==', '!=', '<', '<=', '>', '>='] as const;
    const direct = {'==': (a: number, b: number) => a === b, '!=': (a: number, b: number) => a !== b,
      '<': (a: number, b: number) => a < b, '<=': (a: number, b: number) => a <= b,
      '>': (a: number, b: number) => a > b, '>=': (a: number, b: number) => a >= b};
    fc.assert(
      fc.property(fc.array(fc.option(finite, {freq: 5})), finite, fc.constantFrom(...operators), (values, v, op) => {
        // String(v) is the shortest round-trip literal, so the parser reads back exactly v.
        const literal = Object.is(v, -0) ? '-0' : String(v);
        const mask = evaluateWhere(parseWhere(`x ${op} ${literal}`), dataset([column(values)], values.length));
        const expected = values.map((a) => (a !== null && direct[op](a, v) ? 1 : 0));
        expect([...mask]).toEqual(expected);
      }),
      {numRuns: 500},
    );
  });

  it('not in is the complement of in among rows with a value', () => {
    fc.assert(
      fc.property(fc.array(fc.option(fc.integer({min: -3, max: 3}))), fc.array(fc.integer({min: -3, max: 3}), {minLength: 1}), (values, items) => {
        const d = dataset([column(values)], values.length);
        const list = `[${items.join(', ')}]`;
        const inside = evaluateWhere(parseWhere(`x in ${list}`), d);
        const outside = evaluateWhere(parseWhere(`x not in ${list}`), d);
        values.forEach((value, i) => {
          expect(inside[i]! + outside[i]!).toBe(value === null ? 0 : 1);
          expect(inside[i]).toBe(value !== null && items.includes(value) ? 1 : 0);
        });
      }),
      {numRuns: 300},
    );
  });
});
