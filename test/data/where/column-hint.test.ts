import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {unknownColumnHint, whyText, writtenName} from '../../../src/data/where/column-hint.js';
import {tokenize} from '../../../src/data/where/tokenize.js';
import {makeDataset} from '../make-dataset.js';

describe('writtenName', () => {
  it('writes plain names bare and everything else in backticks', () => {
    expect(writtenName('strength')).toBe('strength');
    expect(writtenName('site.code_2')).toBe('site.code_2');
    expect(writtenName('compressive strength')).toBe('`compressive strength`');
    expect(writtenName('and')).toBe('`and`');
    expect(writtenName('2nd')).toBe('`2nd`');
  });

  it('round-trips through the tokenizer for any non-empty name', () => {
    fc.assert(
      fc.property(fc.string({minLength: 1, maxLength: 20}), (name) => {
        const tokens = tokenize(writtenName(name));
        expect(tokens.map((t) => [t.kind, t.value])).toEqual([['identifier', name], ['end', undefined]]);
      }),
      {numRuns: 1000},
    );
  });
});

describe('unknownColumnHint', () => {
  it('suggests a name differing in case, spaces or up to two edits, and lists the columns', async () => {
    const dataset = await makeDataset('Strength,site,x\n1,a,2\n');
    expect(unknownColumnHint('strength', dataset)).toBe('did you mean Strength? columns of mem.csv: Strength, site, x');
    expect(unknownColumnHint('stie', dataset)).toMatch(/^did you mean site\?/);
    expect(unknownColumnHint('y', dataset)).toBe('columns of mem.csv: Strength, site, x');
    expect(unknownColumnHint('temperature', dataset)).toBe('columns of mem.csv: Strength, site, x');
  });

  it('lists at most 30 columns', async () => {
    const names = Array.from({length: 35}, (_, i) => `c${i}`);
    const dataset = await makeDataset(`${names.join(',')}\n${names.map(() => '1').join(',')}\n`);
    expect(unknownColumnHint('zzz', dataset)).toMatch(/c29, …$/);
  });
});

describe('whyText', () => {
  it('names the first cell that is no number, preferring cells no decimal mark explains', () => {
    const column = {kind: 'string' as const, name: 'v', values: ['1,5', null, '2', 'n.a.', '3']};
    expect(whyText(column)).toBe('it is text because row 4 has "n.a."');
    expect(whyText({...column, values: ['1', '1,5']})).toBe('it is text because row 2 has "1,5"');
    expect(whyText({...column, values: ['1', '2']})).toBe('it is text because the dataset declares it string');
    expect(whyText({...column, values: ['east', null]})).toBeUndefined();
  });
});
