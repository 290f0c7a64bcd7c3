import {access} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {cli, snapshotFolder, workspace} from '../../helpers/workspace.js';

// Invented readings: group b is far above a (significant); w does not differ.
const data = 'g,v,w\na,1,1\na,2,2\na,3,3\na,4,4\nb,7,2\nb,8,1\nb,9,4\nb,10,3\n';
const blocks = '```stet\nid: up\ntest: welch-t\ndata: d.csv\ny: v\nby: g\nfamily: f\n```\n\n```stet\nid: flat\ntest: welch-t\ndata: d.csv\ny: w\nby: g\nfamily: f\n```\n\n';
const front = (lint = '') => `---\nstet:\n  adjust: holm\n${lint}---\n\n`;

describe('stet lint', () => {
  it('prints warnings as file:line:column with a hint and exits 0', async () => {
    const dir = await workspace({'d.csv': data, 'r.md': `${front()}${blocks}Group b was higher (p = 0.01).\n`});
    const run = await cli('lint', path.join(dir, 'r.md'));
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/r\.md:24:21: warning: hand-typed p-value `p = 0\.01` .* \[hand-typed-statistic\]\n {2}hint: Write a reference such as `\{\{ID\.p\}\}`/);
    expect(run.stdout).toMatch(/0 errors, 1 warning\.\n$/);
  });

  it('exits 1 on a contradiction and prints JSON findings with --format json', async () => {
    const dir = await workspace({'d.csv': data, 'r.md': `${front()}${blocks}The groups differed significantly ({{flat.p}}).\n`});
    const run = await cli('lint', path.join(dir, 'r.md'), '--format', 'json');
    expect(run.code).toBe(1);
    const findings = JSON.parse(run.stdout) as Array<Record<string, unknown>>;
    expect(findings).toEqual([{
      file: path.join(dir, 'r.md'),
      line: 24,
      column: 21,
      endLine: 24,
      endColumn: 34,
      severity: 'error',
      rule: 'contradicts-decision',
      message: expect.stringContaining('block `flat`'),
      suggestion: expect.stringContaining('{{flat.sentence}}'),
    }]);
  });

  it('exits 2 on usage errors', async () => {
    expect((await cli('lint')).code).toBe(2);
    expect((await cli('lint', 'r.md', '--format', 'xml')).code).toBe(2);
  });

  it('honours lint: {off: [...]} and the inline disable comment; refuses unknown rule ids', async () => {
    const prose = 'Group b was higher (p = 0.01).\n\n<!-- stet-lint-disable near-significance -->\nIt was almost significant.\n';
    const dir = await workspace({
      'd.csv': data,
      'off.md': `${front('  lint: {off: [hand-typed-statistic]}\n')}${blocks}${prose}`,
      'typo.md': `${front('  lint: {off: [hand-typed-statistics]}\n')}${blocks}`,
    });
    const off = await cli('lint', path.join(dir, 'off.md'));
    expect(off.code).toBe(0);
    expect(off.stdout).toBe('No lint findings.\n');
    const typo = await cli('lint', path.join(dir, 'typo.md'));
    expect(typo.code).toBe(1);
    expect(typo.stderr).toMatch(/typo\.md:4:16: error: unknown lint rule `hand-typed-statistics` \[unknown-lint-rule\]\n {2}hint: Did you mean `hand-typed-statistic`\?/);
  });

  it('prints the report\'s own errors as build does', async () => {
    const dir = await workspace({'d.csv': data, 'r.md': '```stet\nid: a\ntest: welch-t\ndata: d.csv\ny: nope\nby: g\n```\n'});
    const run = await cli('lint', path.join(dir, 'r.md'));
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/r\.md:5:1: error: column `nope` not found/);
  });
});

describe('stet build runs the lint', () => {
  it('prints lint warnings and still builds', async () => {
    const dir = await workspace({'d.csv': data, 'r.md': `${front()}${blocks}Group b was higher (p = 0.01).\n`});
    const run = await cli('build', path.join(dir, 'r.md'), '--to', 'md');
    expect(run.code).toBe(0);
    expect(run.stderr).toMatch(/warning: hand-typed p-value .* \[hand-typed-statistic\]/);
    await access(path.join(dir, 'out', 'r.md'));
  });

  it('fails on a contradiction and writes nothing', async () => {
    const dir = await workspace({'d.csv': data, 'r.md': `${front()}${blocks}Group a was higher than group b ({{up.estimate}}).\n`});
    const run = await cli('build', path.join(dir, 'r.md'), '--to', 'md');
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/r\.md:24:13: error: “higher” contradicts block `up`.*\[contradicts-direction\]/);
    expect(run.stderr).toMatch(/nothing was written/);
    expect(await snapshotFolder(path.join(dir, 'out'))).toEqual(new Map());
  });
});
