import {describe, expect, it} from 'vitest';
import {workspace} from '../../helpers/workspace.js';
import {lintMarkdown, placed} from '../lint-fixture.js';

const block = (id: string, test: string, extra = '') => `\`\`\`stet\nid: ${id}\ntest: ${test}\ndata: d.csv\ny: v\nby: g\n${extra}\`\`\`\n`;
const data = 'g,v\na,1\na,2\na,3\na,4\nb,3\nb,4\nb,6\nb,5\n';

describe('undisclosed-multiplicity', async () => {
  const dir = await workspace({'d.csv': data});
  const rule = (markdown: string) => lintMarkdown(markdown, dir).then(({findings}) => placed(findings.filter((f) => f.ruleId === 'undisclosed-multiplicity')));

  it('points at the second test when two tests declare no family', async () => {
    expect(await rule(`${block('one', 'welch-t')}\n${block('two', 'mann-whitney')}`)).toEqual(['11:1 undisclosed-multiplicity']);
  });

  it('is quiet with a family, with one test, or when the others describe or check assumptions', async () => {
    expect(await rule(`---\nstet: {adjust: holm}\n---\n${block('one', 'welch-t', 'family: f\n')}\n${block('two', 'mann-whitney', 'family: f\n')}`)).toEqual([]);
    expect(await rule(`${block('one', 'welch-t')}\n${block('two', 'levene')}\n${block('three', 'describe')}`)).toEqual([]);
  });
});
