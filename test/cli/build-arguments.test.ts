import {describe, expect, it} from 'vitest';
import {parseBuildArguments, parseFormats} from '../../src/cli/build-arguments.js';
import {UsageError} from '../../src/cli/command.js';
import {cli} from '../helpers/workspace.js';

describe('the arguments build and watch share', () => {
  it('reads the report and every option', () => {
    const parsed = parseBuildArguments('build', ['r.md', '--out', 'o', '--to', 'html, tex', '--template', 't.html', '--allow-html', '--allow-outside']);
    expect(parsed).toEqual({
      report: 'r.md',
      options: {out: 'o', allowOutside: true, template: 't.html', allowHtml: true, formats: new Set(['html', 'tex'])},
    });
    expect(parseBuildArguments('watch', ['r.md']).options.formats).toBeUndefined();
  });

  it('refuses an unknown or empty format list, and a missing or second report', () => {
    expect(() => parseFormats('html,pdf')).toThrow(new UsageError('unknown format `pdf` in --to (formats: md, html, json, tex)'));
    expect(() => parseFormats(' , ')).toThrow(UsageError);
    expect(() => parseBuildArguments('build', [])).toThrow('`stet build` takes exactly one report');
    expect(() => parseBuildArguments('watch', ['a.md', 'b.md'])).toThrow('`stet watch` takes exactly one report');
  });

  it('makes a wrong format a usage error (exit 2) on the command line', async () => {
    const run = await cli('build', 'r.md', '--to', 'docx');
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('stet: unknown format `docx` in --to (formats: md, html, json, tex)\nRun `stet --help` for usage.\n');
  });
});
