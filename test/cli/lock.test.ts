import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {edit, smallWorkspace} from '../helpers/small-report.js';
import {cli} from '../helpers/workspace.js';

describe('stet lock', () => {
  it('locks, shows, refuses to move silently, and moves with --force', async () => {
    const report = await smallWorkspace();
    const lockFile = path.join(path.dirname(report), 'stet.lock');
    const none = await cli('lock', '--show', report);
    expect(none).toMatchObject({code: 0});
    expect(none.stdout).toMatch(/has no locked plan/);

    const locked = await cli('lock', report);
    expect(locked.code).toBe(0);
    expect(locked.stdout).toMatch(/^Locked 2 block\(s\) in .*stet\.lock; commit it with the report\.\n$/);
    const first = await readFile(lockFile, 'utf8');

    await edit(report, 'alpha: 0.05', 'alpha: 0.10');
    const shown = await cli('lock', '--show', report);
    expect(shown.code).toBe(0);
    expect(shown.stdout).toMatch(/^ {2}rigs \(locked \d{4}-\d\d-\d\dT[\d:.]+Z\): alpha 0\.05, alternative two-sided, by rig, data loads, levels \[A, B\], method welch-t, y load_kn$/m);
    expect(shown.stdout).toContain('Differences from the report now:\n  rigs: alpha 0.05 → 0.1\n  nominal: alpha 0.05 → 0.1\n');

    const refused = await cli('lock', report);
    expect(refused.code).toBe(1);
    expect(refused.stderr).toContain('  rigs: alpha 0.05 → 0.1\n');
    expect(refused.stderr).toMatch(/--force/);
    expect(await readFile(lockFile, 'utf8')).toBe(first);

    const forced = await cli('lock', '--force', report);
    expect(forced.code).toBe(0);
    expect(forced.stdout).toMatch(/^Changed the plan:\n {2}rigs: alpha 0\.05 → 0\.1\n/);
    expect(JSON.parse(await readFile(lockFile, 'utf8')).blocks.rigs.plan.alpha).toBe(0.1);
    expect((await cli('lock', '--show', report)).stdout).toMatch(/The report matches the locked plan\.\n$/);
    expect((await cli('lock', report)).stdout).toMatch(/already matches/);
  });

  it('refuses a report with errors, locking nothing', async () => {
    const report = await smallWorkspace();
    await edit(report, 'mu: 10', 'mu: ten');
    const result = await cli('lock', report);
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/report\.md:\d+:\d+: error: /);
    await expect(readFile(path.join(path.dirname(report), 'stet.lock'))).rejects.toThrow(/ENOENT/);
  });

  it('names a missing report without a stack trace', async () => {
    const result = await cli('lock', '/nonexistent/report.md');
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/report not found \[report-missing\]/);
  });
});
