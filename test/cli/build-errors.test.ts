import {writeFile} from 'node:fs/promises';
import path from 'node:path';
import {beforeAll, describe, expect, it} from 'vitest';
import {cli, snapshotFolder, workspace} from '../helpers/workspace.js';

// Invented data: these tests check error reporting, not statistics.
const csv = 'id,site,strength,note\n1,A,30.1,x\n2,A,31.4,x\n3,A,29.8,x\n4,B,33.0,x\n5,B,32.2,x\n6,B,34.1,x\n7,C,28.0,x\n';

function report(blocks: string, prose = '', front = 'stet:\n  datasets:\n    tests: data/tests.csv\n'): string {
  return `---\n${front}---\n\n# Report\n\n${blocks}\n${prose}\n`;
}

function block(body: string): string {
  return '```stet\n' + body.trim() + '\n```\n';
}

const good = block('id: t1\ntest: welch-t\ndata: tests\ny: strength\nby: site\nlevels: [A, B]');

/** 1-based line and column of `needle` in `text`. */
function placeOf(text: string, needle: string): string {
  const index = text.indexOf(needle);
  if (index < 0) throw new Error(`fixture does not contain ${needle}`);
  const before = text.slice(0, index);
  return `${before.split('\n').length}:${index - before.lastIndexOf('\n')}`;
}

interface Case {
  readonly name: string;
  readonly report: string;
  /** Text whose position the error must point at (in the report), or `file:line:col` elsewhere. */
  readonly at: string | {readonly file: string; readonly place: string};
  readonly rule: string;
  readonly data?: string;
}

const cases: Case[] = [
  {name: 'unknown column', report: report(block('id: t1\ntest: welch-t\ndata: tests\ny: strenght\nby: site\nlevels: [A, B]')), at: 'y: strenght', rule: 'unknown-column'},
  {name: 'duplicate id', report: report(good + '\n' + block('id: t1\ntest: describe\ndata: tests\ny: strength')), at: 'id: t1\ntest: describe', rule: 'duplicate-id'},
  {name: 'bad YAML in a block', report: report(block('id: t1\ntest: welch-t\ny: [strength, site\nby: site')), at: 'by: site', rule: 'yaml-syntax'},
  // The YAML parser notices the unclosed list at the end of its line.
  {name: 'bad YAML in the front matter', report: report(good, '', 'stet:\n  alpha: [0.05\n'), at: '\n---\n\n# Report', rule: 'yaml-syntax'},
  {name: 'text in a numeric column', report: report(good), data: csv.replace('31.4', '31.4x'), at: 'y: strength', rule: 'column-not-numeric'},
  {
    name: 'text in a column declared numeric',
    report: report(good, '', 'stet:\n  datasets:\n    tests:\n      file: data/tests.csv\n      types: {strength: number}\n'),
    data: csv.replace('31.4', '31.4x'),
    at: {file: 'data/tests.csv', place: '3:5'},
    rule: 'data-not-a-number',
  },
  {name: 'row with too many fields', report: report(good), data: csv.replace('31.4', '31,4'), at: {file: 'data/tests.csv', place: '3:10'}, rule: 'csv-field-count'},
  {name: 'empty group after where', report: report(block('id: t1\ntest: welch-t\ndata: tests\nwhere: site == "A"\ny: strength\nby: site')), at: 'by: site', rule: 'wrong-level-count'},
  {name: 'declared level with no rows', report: report(block('id: t1\ntest: welch-t\ndata: tests\ny: strength\nby: site\nlevels: [A, D]')), at: 'levels:', rule: 'unknown-level'},
  {name: 'three levels instead of two', report: report(block('id: t1\ntest: student-t\ndata: tests\ny: strength\nby: site')), at: 'by: site', rule: 'wrong-level-count'},
  {name: 'n < 2 in a group', report: report(block('id: t1\ntest: welch-t\ndata: tests\ny: strength\nby: site\nlevels: [A, C]')), at: '```stet', rule: 'too-few-observations'},
  {name: 'unknown method', report: report(block('id: t1\ntest: welsh-t\ndata: tests\ny: strength\nby: site')), at: 'welsh-t', rule: 'unknown-method'},
  {name: 'unknown reference', report: report(good, 'See {{t2}}.'), at: '{{t2}}', rule: 'unknown-reference'},
  {name: 'unknown field', report: report(good, 'See {{t1.groups.Z.mean}}.'), at: '{{t1.groups.Z.mean}}', rule: 'unknown-reference'},
  {name: 'data file missing', report: report(good, '', 'stet:\n  datasets:\n    tests: data/nope.csv\n'), at: 'data/nope.csv', rule: 'data-file-missing'},
  {name: 'path outside the report folder', report: report(good, '', 'stet:\n  datasets:\n    tests: ../tests.csv\n'), at: '../tests.csv', rule: 'path-outside'},
  {name: 'missing id', report: report(block('test: describe\ndata: tests\ny: strength')), at: '```stet', rule: 'missing-id'},
  {name: 'unknown key', report: report(block('id: t1\ntest: welch-t\ndata: tests\ny: strength\nby: site\nlevels: [A, B]\nalpah: 0.01')), at: 'alpah', rule: 'unknown-key'},
  {name: 'alpha out of range', report: report(block('id: t1\ntest: welch-t\ndata: tests\ny: strength\nby: site\nlevels: [A, B]\nalpha: 5')), at: '5', rule: 'invalid-value'},
  {name: 'where syntax error', report: report(block('id: t1\ntest: welch-t\ndata: tests\nwhere: site == == "A"\ny: strength\nby: site')), at: '== "A"', rule: 'where-syntax'},
  {name: 'unknown dataset', report: report(block('id: t1\ntest: describe\ndata: test\ny: strength')), at: 'data: test', rule: 'unknown-dataset'},
  {name: 'one-sample test without mu', report: report(block('id: t1\ntest: one-sample-t\ndata: tests\ny: strength')), at: '```stet', rule: 'missing-mu'},
  {name: 'unknown front-matter setting', report: report(good, '', 'stet:\n  alhpa: 0.05\n'), at: 'alhpa', rule: 'unknown-setting'},
  {name: 'invalid block id', report: report(block('id: T 1\ntest: describe\ndata: tests\ny: strength')), at: 'id: T 1', rule: 'invalid-id'},
];

describe('stet build on bad input', () => {
  let dir: string;
  let before: Map<string, string>;

  beforeAll(async () => {
    dir = await workspace({'reports/report.md': report(good, 'Result: {{t1}}.'), 'reports/data/tests.csv': csv, 'tests.csv': csv});
    const first = await cli('build', path.join(dir, 'reports/report.md'));
    expect(first.stderr).toBe('');
    expect(first.code).toBe(0);
    before = await snapshotFolder(path.join(dir, 'reports/out'));
    expect(before.size).toBeGreaterThanOrEqual(4);
  });

  it.each(cases)('$name: file:line:column, exit 1, previous output untouched', async (testCase) => {
    const reportPath = path.join(dir, 'reports/report.md');
    await writeFile(reportPath, testCase.report);
    await writeFile(path.join(dir, 'reports/data/tests.csv'), testCase.data ?? csv);
    const run = await cli('build', reportPath);
    const where = typeof testCase.at === 'string'
      ? `${reportPath}:${placeOf(testCase.report, testCase.at)}`
      : `${path.join(dir, 'reports', testCase.at.file)}:${testCase.at.place}`;
    expect(run.code).toBe(1);
    expect(run.stderr).toContain(`${where}: error: `);
    expect(run.stderr).toContain(`[${testCase.rule}]`);
    expect(run.stderr).toMatch(/\n {2}hint: \S/);
    expect(run.stderr).not.toMatch(/\n\s+at /);
    expect(run.stderr).toContain('nothing was written');
    expect(await snapshotFolder(path.join(dir, 'reports/out'))).toEqual(before);
  });

  it('reports a missing report file without a stack trace', async () => {
    const run = await cli('build', path.join(dir, 'nope.md'));
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/nope\.md:1:1: error: report not found \[report-missing\]/);
  });

  it('treats command-line mistakes as usage errors (exit 2)', async () => {
    expect((await cli('build')).code).toBe(2);
    expect((await cli('frobnicate', 'x.md')).code).toBe(2);
    expect((await cli('build', 'x.md', '--bogus')).code).toBe(2);
  });
});
