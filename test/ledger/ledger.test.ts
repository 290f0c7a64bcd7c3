import {appendFile, readFile} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {buildReport} from '../../src/build-report.js';
import {appendLedger, countSpecifications, readLedger, type LedgerEntry} from '../../src/ledger/ledger.js';
import {edit, smallWorkspace} from '../helpers/small-report.js';
import {workspace} from '../helpers/workspace.js';

interface Results {
  blocks: Record<string, {sentence: string; specifications_evaluated?: number; plan?: string}>;
}

async function buildAndRead(report: string): Promise<Results> {
  const result = await buildReport(report);
  expect(result.messages.filter((m) => m.fatal).map(String)).toEqual([]);
  return JSON.parse(await readFile(path.join(path.dirname(report), 'out/report.results.json'), 'utf8')) as Results;
}

async function ledgerLines(report: string): Promise<Record<string, unknown>[]> {
  const text = await readFile(path.join(path.dirname(report), '.stet/ledger.jsonl'), 'utf8');
  return text.trim().split('\n').map((line) => JSON.parse(line) as Record<string, unknown>);
}

describe('the ledger across builds', () => {
  it('records one line per distinct specification, and the sentence discloses more than one', async () => {
    const report = await smallWorkspace();
    const first = await buildAndRead(report);
    await buildAndRead(report);
    expect((await ledgerLines(report)).map((e) => e['block'])).toEqual(['rigs', 'nominal']);
    expect(first.blocks['rigs']!.specifications_evaluated).toBe(1);
    expect(first.blocks['rigs']!.sentence).not.toMatch(/specifications/);

    await edit(report, 'levels: [A, B]', 'levels: [A, B]\nalpha: 0.10');
    const second = await buildAndRead(report);
    const lines = await ledgerLines(report);
    expect(lines.map((e) => e['block'])).toEqual(['rigs', 'nominal', 'rigs']);
    expect(lines[2]).toMatchObject({report: 'report.md', decision: expect.stringMatching(/^(reject|fail-to-reject)$/), p: expect.any(Number)});
    expect(second.blocks['rigs']!.specifications_evaluated).toBe(2);
    expect(second.blocks['rigs']!.sentence).toContain('2 specifications of this comparison were evaluated while this report was written; see the appendix.');
    expect(second.blocks['nominal']!.specifications_evaluated).toBe(1);
    expect(second.blocks['nominal']!.sentence).not.toMatch(/specifications/);
    // The appendix the sentence points to gives the count.
    const appendix = await readFile(path.join(path.dirname(report), 'out/report.appendix.md'), 'utf8');
    expect(appendix).toContain('**Specifications evaluated:** 2 distinct specifications of this block were evaluated');

    // Back to the first alpha: still two distinct specifications, no new line.
    await edit(report, '\nalpha: 0.10', '');
    expect((await buildAndRead(report)).blocks['rigs']!.specifications_evaluated).toBe(2);
    expect(await ledgerLines(report)).toHaveLength(3);
  });

  it('adds a line, not a specification, when only the data changed', async () => {
    const report = await smallWorkspace();
    await buildAndRead(report);
    await edit(path.join(path.dirname(report), 'data/loads.csv'), 'B,12.0,1', 'B,12.2,1');
    const results = await buildAndRead(report);
    expect(await ledgerLines(report)).toHaveLength(4);
    expect(results.blocks['rigs']!.specifications_evaluated).toBe(1);
  });

  it('skips a corrupt line with a warning, never failing the build', async () => {
    const report = await smallWorkspace();
    await buildAndRead(report);
    await appendFile(path.join(path.dirname(report), '.stet/ledger.jsonl'), '{"time": "cut sho');
    const result = await buildReport(report);
    expect(result.ok).toBe(true);
    expect(result.messages.map((m) => m.reason)).toEqual(['.stet/ledger.jsonl line 3 is not a ledger entry; it was skipped']);
  });
});

describe('readLedger and appendLedger', () => {
  const entry = (block: string, spec: string, data = 'd1'): LedgerEntry => ({time: 't', report: 'r.md', block, spec, data, p: 0.5, decision: 'fail-to-reject'});

  it('appends only new keys and counts distinct specifications of one block', async () => {
    const dir = await workspace({});
    expect(await appendLedger(dir, await readLedger(dir), [entry('a', 's1'), entry('a', 's1'), entry('b', 's1')])).toHaveLength(2);
    expect(await appendLedger(dir, await readLedger(dir), [entry('a', 's1'), entry('a', 's2'), entry('a', 's1', 'd2')])).toHaveLength(2);
    const ledger = await readLedger(dir);
    expect(ledger.entries).toHaveLength(4);
    expect(countSpecifications(ledger, 'r.md', 'a', 's1')).toBe(2);
    expect(countSpecifications(ledger, 'r.md', 'a', 's3')).toBe(3);
    expect(countSpecifications(ledger, 'other.md', 'a', 's1')).toBe(1);
  });

  it('starts a new line after a line cut short, so no entry is lost', async () => {
    const dir = await workspace({'.stet/ledger.jsonl': '{"time": "t", "rep'});
    const ledger = await readLedger(dir);
    expect(ledger.warnings).toHaveLength(1);
    await appendLedger(dir, ledger, [entry('a', 's1')]);
    const again = await readLedger(dir);
    expect(again.entries.map((e) => e.block)).toEqual(['a']);
    expect(again.warnings).toHaveLength(1);
  });

  it('treats lines that are JSON but not entries as corrupt', async () => {
    const dir = await workspace({'.stet/ledger.jsonl': '[1, 2]\n{"time": "t"}\n\n'});
    const ledger = await readLedger(dir);
    expect(ledger.entries).toEqual([]);
    expect(ledger.warnings).toHaveLength(2);
  });
});
