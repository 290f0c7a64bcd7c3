import {describe, expect, it} from 'vitest';
import {workspace} from '../../helpers/workspace.js';
import {lintMarkdown, placed} from '../lint-fixture.js';

const data = 'g,v\na,1\na,2\na,3\na,4\nb,3\nb,4\nb,6\nb,5\n';
const block = (alphaLines: string) => `\`\`\`stet\nid: one\ntest: welch-t\ndata: d.csv\ny: v\nby: g\n${alphaLines}\`\`\`\n`;

describe('alpha-unexplained and alpha-too-large', async () => {
  const dir = await workspace({'d.csv': data});
  const rules = (markdown: string) => lintMarkdown(markdown, dir).then(({findings}) => placed(findings));

  it('flags a block alpha unlike the document\'s without a comment, at its line', async () => {
    expect(await rules(block('alpha: 0.01\n'))).toEqual(['7:1 alpha-unexplained']);
  });

  it('accepts a comment on the line or above, or the document\'s own alpha', async () => {
    expect(await rules(block('alpha: 0.01  # fixed by the test plan\n'))).toEqual([]);
    expect(await rules(block('# safety-critical, fixed in the plan\nalpha: 0.01\n'))).toEqual([]);
    expect(await rules(block('alpha: 0.05\n'))).toEqual([]);
  });

  it('flags an alpha above 0.1 in a block and in the front matter', async () => {
    expect(await rules(block('alpha: 0.2  # exploratory\n'))).toEqual(['7:1 alpha-too-large']);
    expect(await rules(`---\nstet:\n  alpha: 0.15\n---\n${block('')}`)).toEqual(['3:3 alpha-too-large']);
  });
});
