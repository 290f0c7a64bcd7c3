import path from 'node:path';
import type {CompiledReport} from '../compile-report.js';
import {isPlanned} from '../lock/lock-file.js';
import {specificationHash} from '../spec/spec-fingerprint.js';
import {appendLedger, type LedgerEntry} from './ledger.js';

/** After a build: append each test block's specification, data and outcome to the ledger when new. */
export async function recordEvaluations(compiled: CompiledReport, now: Date): Promise<LedgerEntry[]> {
  const {data, history} = compiled;
  if (!data || !history) return [];
  const report = path.basename(compiled.reportPath);
  const candidates: LedgerEntry[] = [];
  for (const [id, spec] of data.specs) {
    const result = data.blocks.get(id)?.result;
    const dataset = data.datasets.get(spec.data);
    if (!isPlanned(spec) || !result || !dataset) continue;
    candidates.push({
      time: now.toISOString(),
      report,
      block: id,
      spec: specificationHash(spec, data.settings.adjust),
      data: dataset.sha256,
      p: result.p ?? null,
      decision: result.decision ?? null,
    });
  }
  return appendLedger(path.dirname(compiled.reportPath), history.ledger, candidates);
}
