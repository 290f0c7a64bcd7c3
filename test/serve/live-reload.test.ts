import {spawn, type ChildProcess} from 'node:child_process';
import {existsSync} from 'node:fs';
import {writeFile} from 'node:fs/promises';
import path from 'node:path';
import {afterAll, describe, expect, it} from 'vitest';
import {workspace} from '../helpers/workspace.js';

const chromiumPath = '/usr/bin/chromium';
const hasChromium = existsSync(chromiumPath);
if (!hasChromium) console.log(`live-reload browser test not run: no Chromium at ${chromiumPath}`);

const report = `---
title: Rods
stet:
  datasets:
    rods: data/rods.csv
---

# Rods

\`\`\`stet
id: rods
test: one-sample-t
data: rods
y: length
mu: 100
show: [sentence]
\`\`\`

The mean length was {{rods.groups.all.mean}} mm.
`;
const rods = (first: string) => `length\n${first}\n100.2\n99.9\n100.4\n100.1\n99.8\n`;

const cli = new URL('../../dist/cli/main.js', import.meta.url).pathname;
const children: ChildProcess[] = [];
afterAll(() => {
  for (const child of children) if (child.exitCode === null) child.kill('SIGKILL');
});

describe('stet watch --serve in a browser', () => {
  it.runIf(hasChromium)('shows new numbers without a manual reload, a banner on failure, and stops on Ctrl-C', async () => {
    const dir = await workspace({'report.md': report, 'data/rods.csv': rods('100.0')});
    const child = spawn(process.execPath, [cli, 'watch', 'report.md', '--serve', '0'], {cwd: dir, env: {...process.env, NO_COLOR: '1'}});
    children.push(child);
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (text: string) => (stdout += text));
    child.stderr.setEncoding('utf8').on('data', (text: string) => (stderr += text));
    const url = await until(() => /Serving (http:\/\/127\.0\.0\.1:\d+\/)/.exec(stdout)?.[1]);
    expect(stdout).toContain('Watching report.md');

    const {chromium} = await import('playwright-core');
    const browser = await chromium.launch({executablePath: chromiumPath});
    try {
      const tab = await browser.newPage();
      await tab.goto(url);
      // (100.0 + 100.2 + 99.9 + 100.4 + 100.1 + 99.8) / 6 = 100.07
      await tab.getByText('The mean length was 100.07 mm.').waitFor();
      await tab.locator('html[data-stet-live="connected"]').waitFor({state: 'attached'});

      await writeFile(path.join(dir, 'data/rods.csv'), rods('101.2'));
      // (101.2 + 100.2 + 99.9 + 100.4 + 100.1 + 99.8) / 6 = 100.27
      await tab.getByText('The mean length was 100.27 mm.').waitFor({timeout: 15_000});
      // The sentence whose values changed is marked for a few seconds.
      expect(await tab.locator('[data-stet-block="rods"].stet-changed').count()).toBe(1);
      await tab.locator('html[data-stet-live="connected"]').waitFor({state: 'attached'});

      await writeFile(path.join(dir, 'data/rods.csv'), rods('<b>oops</b>'));
      const banner = tab.locator('#stet-banner');
      await banner.waitFor({timeout: 15_000});
      expect(await banner.textContent()).toContain('<b>oops</b>'); // shown as text, not markup
      expect(await tab.locator('#stet-banner b').count()).toBe(0);
      expect(await tab.getByText('The mean length was 100.27 mm.').count()).toBe(1);

      await writeFile(path.join(dir, 'data/rods.csv'), rods('100.0'));
      await banner.waitFor({state: 'detached', timeout: 15_000});
      await tab.getByText('The mean length was 100.07 mm.').waitFor({timeout: 15_000});
      expect(await banner.count()).toBe(0);
    } finally {
      await browser.close();
    }

    const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
    child.kill('SIGINT');
    expect(await exited).toBe(0);
    expect(stdout).toContain('Stopped watching.');
    expect(stderr).toContain('the last good output stays');
  }, 60_000);
});

async function until<T>(find: () => T | undefined, timeout = 20_000): Promise<T> {
  const started = Date.now();
  for (;;) {
    const found = find();
    if (found !== undefined) return found;
    if (Date.now() - started > timeout) throw new Error('timed out');
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}
