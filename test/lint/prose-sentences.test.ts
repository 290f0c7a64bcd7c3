import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import {describe, expect, it} from 'vitest';
import {proseSentences, sentencesOfText} from '../../src/lint/prose-sentences.js';

const parse = (markdown: string) => proseSentences(unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml']).parse(markdown), markdown);

describe('proseSentences', () => {
  it('splits sentences, not abbreviations or decimals, and places each', () => {
    const sentences = parse('The mean was 2.5 MPa, e.g. for Quarrybank. Group B was lower.\nIt rained.\n');
    expect(sentences.map((sentence) => sentence.text)).toEqual(['The mean was 2.5 MPa, e.g. for Quarrybank.', 'Group B was lower.', 'It rained.']);
    expect(sentences.map((sentence) => sentence.placeOf(0))).toEqual([{line: 1, column: 1}, {line: 1, column: 44}, {line: 2, column: 1}]);
  });

  it('reads headings, list items and table cells; skips front matter, code, HTML and blocks', () => {
    const markdown = '---\ntitle: p = .01\n---\n\n# Head\n\n- item one\n\n| cell |\n| - |\n| two |\n\n```stet\nid: a\n```\n\n<div>html</div>\n';
    expect(parse(markdown).map((sentence) => sentence.text)).toEqual(['Head', 'item one', 'cell', 'two']);
  });

  it('masks references, inline code and quoted phrases, keeping offsets', () => {
    const [sentence] = parse('See {{a.p}} and `p = .01` and “accept the null” here.\n');
    expect(sentence!.text).toBe('See {{a.p}} and ####### and “accept the null” here.');
    expect(sentence!.masked).toBe('See ####### and ####### and “###############” here.');
    expect(sentence!.references).toEqual([{id: 'a', path: ['p'], start: 4, end: 11}]);
    expect(sentence!.blockIds).toEqual(['a']);
  });

  it('reads a disable comment before a paragraph', () => {
    const sentences = parse('<!-- stet-lint-disable accept-null, observed-power -->\nWe accept it.\n\nNext.\n');
    expect([...sentences[0]!.disabled]).toEqual(['accept-null', 'observed-power']);
    expect(sentences[1]!.disabled.size).toBe(0);
  });

  it('gives a plain sentence the block it was written for', () => {
    expect(sentencesOfText('It was significant. It was large.', ['b']).map((sentence) => sentence.blockIds)).toEqual([['b'], ['b']]);
  });
});
