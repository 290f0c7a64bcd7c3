import {execFile} from 'node:child_process';
import path from 'node:path';
import {promisify} from 'node:util';
import {describe, expect, it} from 'vitest';
import {runCli} from '../../src/cli/run-cli.js';
import {wantsColour} from '../../src/cli/wants-colour.js';
import {cli, workspace} from '../helpers/workspace.js';

const run = promisify(execFile);
const bin = new URL('../../dist/cli/main.js', import.meta.url).pathname;
const version = (await import('../../package.json', {with: {type: 'json'}})).default.version;

describe('stet command line', () => {
  it('prints its version and help', async () => {
    expect((await cli('--version')).stdout).toBe(`${version}\n`);
    const help = await cli('--help');
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/stet build REPORT\.md/);
  });

  it('runs as a real process: exit codes and messages', async () => {
    const dir = await workspace({
      'ok.md': '```stet\nid: a\ntest: describe\ndata: d.csv\ny: x\n```\n',
      'bad.md': '```stet\nid: a\ntest: describe\ndata: d.csv\ny: z\n```\n',
      'd.csv': 'x\n1\n2\n3\n',
    });
    const ok = await run(process.execPath, [bin, 'build', 'ok.md'], {cwd: dir});
    expect(ok.stdout).toMatch(/^Built out \(\d+ files\)/);
    expect(ok.stdout).toContain(`Report: ${path.join('out', 'ok.html')}`);
    const bad = await run(process.execPath, [bin, 'build', 'bad.md'], {cwd: dir}).catch((error: {code: number; stderr: string}) => error);
    expect('code' in bad && bad.code).toBe(1);
    expect(bad.stderr).toMatch(/^bad\.md:5:1: error: column `z` not found in dataset `d\.csv` \[unknown-column\]\n {2}hint: /);
    expect(bad.stderr).not.toMatch(/\u001b\[/);
    const usage = await run(process.execPath, [bin, 'lint'], {cwd: dir}).catch((error: {code: number}) => error);
    expect('code' in usage && usage.code).toBe(2);
  });

  it('colours only on a terminal and never with NO_COLOR', async () => {
    expect(wantsColour({isTTY: true}, {})).toBe(true);
    expect(wantsColour({isTTY: true}, {NO_COLOR: '1'})).toBe(false);
    expect(wantsColour({isTTY: false}, {})).toBe(false);
    expect(wantsColour({}, {})).toBe(false);
    let stderr = '';
    await runCli(['build', '/nonexistent/r.md'], {stdout: () => {}, stderr: (t) => (stderr += t), colour: true});
    expect(stderr).toMatch(/\u001b\[31merror/);
  });
});
