import {appendFile} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {edit, smallWorkspace} from '../helpers/small-report.js';
import {cli} from '../helpers/workspace.js';

describe('stet check', () => {
  it('exits 0 on fresh output and 1 naming each stale block and file', async () => {
    const report = await smallWorkspace();
    const out = path.join(path.dirname(report), 'out');
    expect((await cli('build', report)).code).toBe(0);
    const fresh = await cli('check', report);
    expect(fresh).toMatchObject({code: 0, stderr: ''});
    expect(fresh.stdout).toMatch(/is up to date with .*report\.md\.\n$/);

    await edit(path.join(path.dirname(report), 'data/loads.csv'), 'A,9.8,2', 'A,9.9,2');
    await appendFile(path.join(out, 'report.html'), ' ');
    const stale = await cli('check', report);
    expect(stale.code).toBe(1);
    expect(stale.stdout).toBe('');
    const lines = stale.stderr.split('\n');
    expect(lines[0]).toMatch(/^stale: .*out does not match .*report\.md and its data:$/);
    expect(lines).toContainEqual(expect.stringMatching(/^ {2}block rigs: data file data\/loads\.csv changed \(sha256 [0-9a-f]{8}… → [0-9a-f]{8}…\)$/));
    expect(lines).toContainEqual(expect.stringMatching(/^ {2}block nominal: data file data\/loads\.csv changed/));
    expect(lines).toContainEqual(expect.stringMatching(/^ {2}\S*out\/report\.html: edited by hand since the last build/));
    expect(lines).toContainEqual(expect.stringMatching(/^ {2}\S*out\/report\.results\.json: out of date$/));

    expect((await cli('build', report)).code).toBe(0);
    expect((await cli('check', report)).code).toBe(0);
  });

  it('checks the folder given by --out, and exits 1 when nothing was built there', async () => {
    const report = await smallWorkspace();
    const elsewhere = path.join(path.dirname(report), 'published');
    expect((await cli('build', report, '--out', elsewhere)).code).toBe(0);
    expect((await cli('check', report, '--out', elsewhere)).code).toBe(0);
    const missing = await cli('check', report);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/report\.html: missing/);
  });

  it('prints the errors of a report that no longer builds and exits 1', async () => {
    const report = await smallWorkspace();
    expect((await cli('build', report)).code).toBe(0);
    await edit(report, 'test: welch-t', 'test: welch');
    const result = await cli('check', report);
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/report\.md:\d+:\d+: error: .*\[unknown-method\]/);
  });

  it('is a usage error without exactly one report', async () => {
    expect((await cli('check')).code).toBe(2);
  });
});
