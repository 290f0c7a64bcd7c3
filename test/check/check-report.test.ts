import {appendFile, readFile, rm, writeFile} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {buildReport} from '../../src/build-report.js';
import {checkReport, type CheckResult} from '../../src/check/check-report.js';
import {edit, smallWorkspace} from '../helpers/small-report.js';

async function built(): Promise<{report: string; out: string}> {
  const report = await smallWorkspace();
  const result = await buildReport(report);
  expect(result.messages.map(String)).toEqual([]);
  return {report, out: path.join(path.dirname(report), 'out')};
}

const lines = (result: CheckResult) => result.findings.map((f) => `${path.basename(f.subject)}: ${f.reason}`);

describe('checkReport', () => {
  it('finds fresh output fresh from hashes alone, without compiling', async () => {
    const {report} = await built();
    const result = await checkReport(report);
    expect(result).toMatchObject({fresh: true, compiled: false, findings: []});
  });

  it('checks against the template and --allow-html the build used', async () => {
    const report = await smallWorkspace();
    const template = path.join(path.dirname(report), 'page.html');
    await writeFile(template, '<main><!--stet:body--></main><aside><!--stet:caution--></aside>\n');
    await writeFile(report, `${await readFile(report, 'utf8')}\n<kbd>raw</kbd> <script>x()</script>\n`);
    expect((await buildReport(report, {template, allowHtml: true})).ok).toBe(true);
    expect(await checkReport(report)).toMatchObject({fresh: true, compiled: false});

    await edit(template, '<main>', '<main class="wide">');
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(lines(result)).toEqual(expect.arrayContaining(['template page.html: changed', 'report.html: out of date']));
  });

  it('names the block and the data file after a data edit', async () => {
    const {report} = await built();
    await edit(path.join(path.dirname(report), 'data/loads.csv'), 'B,12.0,1', 'B,12.5,1');
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(result.compiled).toBe(true);
    expect(result.findings).toContainEqual(expect.objectContaining({
      subject: 'block rigs',
      reason: expect.stringMatching(/^data file data\/loads\.csv changed \(sha256 [0-9a-f]{8}… → [0-9a-f]{8}…\)$/),
    }));
    expect(lines(result)).toContain('report.results.json: out of date');
  });

  it('names a block whose specification changed', async () => {
    const {report} = await built();
    await edit(report, 'mu: 10', 'mu: 10.5');
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(lines(result)).toContain('block nominal: specification changed');
    expect(lines(result)).not.toContain('block rigs: specification changed');
    expect(lines(result)).not.toContain('report.md: report prose or front matter changed');
  });

  it('tells a prose edit apart from a block edit', async () => {
    const {report} = await built();
    await edit(report, 'Two rigs were compared.', 'Two rigs were compared on one day.');
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(lines(result)).toEqual(['report.md: report prose or front matter changed', 'report.md: out of date', 'report.html: out of date']);
  });

  it('names an output edited by hand', async () => {
    const {report, out} = await built();
    await appendFile(path.join(out, 'report.html'), '<!-- tweaked -->\n');
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(result.findings).toEqual([
      {subject: path.join(out, 'report.html'), reason: 'edited by hand since the last build (a build will overwrite it)', kind: 'output'},
    ]);
  });

  it('names a missing output, and reports everything stale without a build record', async () => {
    const {report, out} = await built();
    await rm(path.join(out, 'report.results.json'));
    expect(lines(await checkReport(report))).toEqual(['report.results.json: missing']);
    await rm(path.join(out, '.stet-manifest.json'));
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(lines(result)).toEqual([expect.stringMatching(/^\.stet-manifest\.json: missing/), 'report.results.json: missing']);
  });

  it('recompiles when an input changed but the output did not, and ignores the build time', async () => {
    const {report, out} = await built();
    const before = await readFile(path.join(out, 'report.html'), 'utf8');
    // A YAML comment changes the report's bytes, not the block nor the output.
    await edit(report, 'chart: none\n```\n\nRig A', 'chart: none  # no figure\n```\n\nRig A');
    const result = await checkReport(report, {});
    expect(result).toMatchObject({fresh: true, compiled: true});
    expect(before).toMatch(/<time datetime="[^"]+">/);
  });

  it('names a lock that changes a block\'s label, and a new stet version that changes no output', async () => {
    const {report, out} = await built();
    const manifestFile = path.join(out, '.stet-manifest.json');
    const manifest = JSON.parse(await readFile(manifestFile, 'utf8')) as {stet: string};
    await writeFile(manifestFile, JSON.stringify({...manifest, stet: '0.0.0-old'}));
    const upgraded = await checkReport(report);
    expect(upgraded).toMatchObject({fresh: true, compiled: true});
    expect(lines(upgraded)).toEqual([expect.stringMatching(/^stet: version changed \(0\.0\.0-old → \d/)]);

    await writeFile(path.join(path.dirname(report), 'stet.lock'), JSON.stringify({'stet-lock': 1, report: 'report.md', blocks: {}}));
    const locked = await checkReport(report);
    expect(locked.fresh).toBe(false);
    expect(lines(locked)).toContain('block rigs: plan unlocked → exploratory (stet.lock changed)');
    expect(lines(locked)).toContain('report.results.json: out of date');
  });

  it('does not write the ledger nor any output', async () => {
    const {report, out} = await built();
    const ledger = path.join(path.dirname(report), '.stet/ledger.jsonl');
    const before = [await readFile(ledger, 'utf8'), await readFile(path.join(out, 'report.md'), 'utf8')];
    await edit(report, 'mu: 10', 'mu: 11');
    await checkReport(report);
    expect([await readFile(ledger, 'utf8'), await readFile(path.join(out, 'report.md'), 'utf8')]).toEqual(before);
  });

  it('reports a report that no longer builds as stale, with its messages', async () => {
    const {report} = await built();
    await writeFile(report, (await readFile(report, 'utf8')).replace('y: load_kn\nby: rig', 'y: load\nby: rig'));
    const result = await checkReport(report);
    expect(result.fresh).toBe(false);
    expect(result.messages.some((m) => m.fatal && m.ruleId === 'unknown-column')).toBe(true);
  });
});
