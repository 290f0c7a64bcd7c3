import type {Root, RootContent} from 'mdast';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkStringify from 'remark-stringify';
import {unified} from 'unified';
import {stringify as stringifyYaml} from 'yaml';

/**
 * The built report as Markdown. Every stringify option is set, so output is
 * stable across library defaults; the front matter keeps everything but
 * `stet:` (title, author, … stay for downstream tools).
 */
export function toMarkdown(tree: Root, passthrough: Readonly<Record<string, unknown>>): string {
  const body = tree.children.filter((node) => node.type !== 'yaml');
  const front: RootContent[] = Object.keys(passthrough).length
    ? [{type: 'yaml', value: stringifyYaml(passthrough).trimEnd()}]
    : [];
  return unified()
    .use(remarkStringify, {
      bullet: '-',
      emphasis: '_',
      strong: '*',
      fence: '`',
      fences: true,
      rule: '-',
      listItemIndent: 'one',
      incrementListMarker: true,
      setext: false,
    })
    .use(remarkGfm, {tablePipeAlign: false})
    .use(remarkFrontmatter)
    .stringify({type: 'root', children: [...front, ...body]});
}
