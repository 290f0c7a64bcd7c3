import path from 'node:path';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import remarkStringify from 'remark-stringify';
import {unified} from 'unified';
import {VFile} from 'vfile';
import {describe, expect, it} from 'vitest';
import {remarkStet} from '../src/index.js';
import {workspace} from './helpers/workspace.js';

// Invented data: this checks the plugin's contract, not statistics.
const csv = 'group,y\na,1.0\na,2.0\na,3.0\nb,2.5\nb,3.5\nb,4.5\n';

function processor() {
  return unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter).use(remarkStet, {charts: false}).use(remarkStringify).use(remarkGfm);
}

describe('remarkStet in a unified pipeline of someone else', () => {
  it('replaces blocks and references, and leaves results on file.data', async () => {
    const dir = await workspace({'d.csv': csv});
    const file = new VFile({
      path: path.join(dir, 'doc.md'),
      value: '# Doc\n\n```stet\nid: cmp\ntest: welch-t\ndata: d.csv\ny: y\nby: group\nshow: [sentence]\n```\n\nSee {{cmp.p}}.\n',
    });
    const output = String(await processor().process(file));
    expect(output).not.toContain('```stet');
    expect(output).toMatch(/Welch’s t test detected no statistically significant difference/);
    expect(output).toMatch(/See \*p\* = \.\d{3}\./);
    expect(file.messages).toEqual([]);
    const data = file.data.stet!;
    expect(data.blocks.get('cmp')?.result.method).toBe('welch-t');
    expect(data.datasets.get('d.csv')?.rowCount).toBe(6);
  });

  it('reports an author mistake as a fatal message with its place, rule and hint', async () => {
    const dir = await workspace({'d.csv': csv});
    const file = new VFile({path: path.join(dir, 'doc.md'), value: '```stet\nid: cmp\ntest: welch-t\ndata: d.csv\ny: yy\nby: group\n```\n'});
    await processor().run(processor().parse(file), file);
    expect(file.messages).toHaveLength(1);
    const [message] = file.messages;
    expect(message).toMatchObject({fatal: true, line: 5, column: 1, ruleId: 'unknown-column', source: 'stet'});
    expect(message!.note).toMatch(/Did you mean `y`\?/);
  });
});
