import {describe, expect, it} from 'vitest';
import {readCsv, type CsvTable} from '../../src/data/read-csv.js';
import {catchUserError} from './catch-user-error.js';

const read = (text: string, delimiter = ',', delimiterSource: 'declared' | 'extension' | 'sniffed' = 'declared'): Promise<CsvTable> =>
  readCsv(text, {file: 'data/x.csv', delimiter, delimiterSource});

const cells = (table: CsvTable): Record<string, readonly string[]> =>
  Object.fromEntries(table.columns.map((c) => [c.name, c.cells]));

describe('readCsv', () => {
  it('folds rows into columns and counts rows', async () => {
    const table = await read('a,b\n1,x\n2,y\n');
    expect(cells(table)).toEqual({a: ['1', '2'], b: ['x', 'y']});
    expect(table.rowCount).toBe(2);
  });

  it('reads RFC 4180 quotes: delimiters, doubled quotes and line breaks inside quotes', async () => {
    const table = await read('name,note\n"Smith, J.","say ""hi"""\n"multi\nline",""\n');
    expect(cells(table)).toEqual({name: ['Smith, J.', 'multi\nline'], note: ['say "hi"', '']});
    expect([...table.columns[1]!.quoted]).toEqual([1, 1]);
  });

  it('handles CRLF, lone CR, a missing final line break and skips empty lines', async () => {
    expect(cells(await read('a,b\r\n1,2\r\n\r\n3,4\r\n'))).toEqual({a: ['1', '3'], b: ['2', '4']});
    expect(cells(await read('a,b\r1,2\r3,4'))).toEqual({a: ['1', '3'], b: ['2', '4']});
  });

  it('parses files with mixed line endings', async () => {
    expect(cells(await read('a,b\n1,2\r\n3,4\r5,6'))).toEqual({a: ['1', '3', '5'], b: ['2', '4', '6']});
  });

  it('marks quoted cells exactly, whatever the quotes contain', async () => {
    const table = await read('a;b;c\n\n"x;""y"";z";2;"3"\n4;"";5\n', ';');
    const flags = table.columns.map((c) => [...c.quoted]);
    expect(flags).toEqual([[1, 0], [0, 1], [1, 0]]);
    expect(cells(table)).toEqual({a: ['x;"y";z', '4'], b: ['2', ''], c: ['3', '5']});
  });

  it('keeps characters whole across the 64 KiB pieces fed to the parser', async () => {
    const head = 'a,b\nx,';
    const filler = 'y'.repeat(65535 - head.length);
    // The emoji's two UTF-16 units straddle offset 65536, where a piece ends.
    const table = await read(`${head}${filler}\u{1F600}\n1,"two\nlines ${'z'.repeat(70000)}"\n`);
    expect(table.columns[1]!.cells[0]).toBe(`${filler}\u{1F600}`);
    expect(table.columns[1]!.cells[1]).toBe(`two\nlines ${'z'.repeat(70000)}`);
  });

  it('drops a byte order mark that reached it (bom: true)', async () => {
    expect((await read('\uFEFFid,v\n1,2\n')).columns[0]!.name).toBe('id');
  });

  it('keeps whitespace in every cell and marks which cells were quoted', async () => {
    const table = await read('a,b\n 1 ," 2 "\n');
    expect(cells(table)).toEqual({a: [' 1 '], b: [' 2 ']});
    expect([...table.columns[0]!.quoted, ...table.columns[1]!.quoted]).toEqual([0, 1]);
  });

  it('reads semicolon and tab files', async () => {
    expect(cells(await read('x;y\n1,5;a\n', ';'))).toEqual({x: ['1,5'], y: ['a']});
    expect(cells(await read('x\ty\n1.5\ta b\n', '\t'))).toEqual({x: ['1.5'], y: ['a b']});
  });

  it('gives a header-only file zero rows and an empty file an error', async () => {
    const table = await read('a,b\n');
    expect(table.rowCount).toBe(0);
    expect(cells(table)).toEqual({a: [], b: []});
    const error = await catchUserError(() => read('\n\n'));
    expect([error.ruleId, error.file]).toEqual(['data-empty', 'data/x.csv']);
  });

  it('locates data cells for later errors, skipping the header', async () => {
    const table = await read('a,b\n"x\ny",2\n3,44\n');
    expect(table.locate(1, 1)).toEqual({line: 4, column: 3});
  });
});

describe('readCsv errors', () => {
  it('refuses an empty header name, with a hint for a trailing delimiter', async () => {
    const inner = await catchUserError(() => read('a,,c\n1,2,3\n'));
    expect([inner.ruleId, inner.file, inner.place]).toEqual(['csv-header-empty', 'data/x.csv', {line: 1, column: 3}]);
    const trailing = await catchUserError(() => read('a,b,\n1,2,\n'));
    expect(trailing.place).toEqual({line: 1, column: 5});
    expect(trailing.hint).toMatch(/end of every line/);
  });

  it('refuses a duplicate header name at its second occurrence', async () => {
    const error = await catchUserError(() => read('id,x,id\n1,2,3\n'));
    expect([error.ruleId, error.place, error.message]).toEqual([
      'csv-header-duplicate', {line: 1, column: 6}, 'column name "id" appears twice in the header (columns 1 and 3)',
    ]);
  });

  it('refuses rows with too many fields at the first extra field', async () => {
    const error = await catchUserError(() => read('a,b\n1,2\n3,4,5\n'));
    expect([error.ruleId, error.place, error.message]).toEqual(['csv-field-count', {line: 3, column: 5}, 'row 2 has 3 fields but the header has 2']);
  });

  it('refuses rows with too few fields at the end of the row, after a multi-line CRLF field', async () => {
    // csv-parse itself reports line 5 here (a quoted CRLF counts twice); the row is on line 4.
    const error = await catchUserError(() => read('a,b\r\n"x\r\ny",2\r\n33\r\n'));
    expect([error.place, error.message]).toEqual([{line: 4, column: 3}, 'row 2 has 1 field but the header has 2']);
  });

  it('mentions a guessed delimiter in the hint of a field-count error', async () => {
    const error = await catchUserError(() => read('a;b\n1;2;3\n', ';', 'sniffed'));
    expect(error.hint).toMatch(/guessed from the first lines/);
    const declared = await catchUserError(() => read('a;b\n1;2;3\n', ';', 'declared'));
    expect(declared.hint).not.toMatch(/guessed/);
  });

  it('refuses an unclosed quote at the opening quote', async () => {
    const error = await catchUserError(() => read('a,b\n1,2\n3,"4\n5,6\n'));
    expect([error.ruleId, error.place]).toEqual(['csv-unclosed-quote', {line: 3, column: 3}]);
  });

  it('reports a bad header before errors further down', async () => {
    const duplicate = await catchUserError(() => read('a,a\n1,2\n3\n'));
    expect(duplicate.ruleId).toBe('csv-header-duplicate');
    const unclosed = await catchUserError(() => read('a,"b\n1,2\n3\n'));
    expect([unclosed.ruleId, unclosed.place]).toEqual(['csv-unclosed-quote', {line: 1, column: 3}]);
  });

  it('refuses a quote inside an unquoted field at the quote', async () => {
    const spaced = await catchUserError(() => read('a,b\n1, "2"\n'));
    expect([spaced.ruleId, spaced.place]).toEqual(['csv-stray-quote', {line: 2, column: 4}]);
    expect(spaced.hint).toMatch(/remove the space/);
    const inner = await catchUserError(() => read('a,b\n1,5\'10"\n'));
    expect(inner.place).toEqual({line: 2, column: 7});
  });

  it('refuses text after a closing quote', async () => {
    const error = await catchUserError(() => read('a,b\n1,"2"x\n'));
    expect([error.ruleId, error.place]).toEqual(['csv-stray-quote', {line: 2, column: 3}]);
  });
});
