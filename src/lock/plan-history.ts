import path from 'node:path';
import type {Disclosure} from '../interpret/disclosure.js';
import {countSpecifications, readLedger, type Ledger} from '../ledger/ledger.js';
import type {BlockSpec} from '../spec/block-spec.js';
import type {DocumentSettings} from '../spec/parse-settings.js';
import {planHash, specificationHash} from '../spec/spec-fingerprint.js';
import {isPlanned, readLock, type LockFile} from './lock-file.js';

/** What a report's past says about its blocks: its lock and its ledger. */
export interface PlanHistory {
  readonly lock: LockFile | undefined;
  readonly ledger: Ledger;
  /** The plan label and specification count of a declared block. */
  readonly disclose: (spec: BlockSpec, settings: DocumentSettings) => Disclosure | undefined;
}

export async function readPlanHistory(reportPath: string): Promise<PlanHistory> {
  const absolute = path.resolve(reportPath);
  const [lock, ledger] = await Promise.all([readLock(absolute), readLedger(path.dirname(absolute))]);
  const report = path.basename(absolute);
  return {
    lock,
    ledger,
    disclose(spec, settings) {
      if (!isPlanned(spec)) return undefined;
      const specifications = countSpecifications(ledger, report, spec.id, specificationHash(spec, settings.adjust));
      if (!lock) return {plan: undefined, specifications};
      const confirmatory = lock.blocks[spec.id]?.hash === planHash(spec, settings.adjust);
      return {plan: confirmatory ? 'confirmatory' : 'exploratory', specifications};
    },
  };
}
