import {readFile, writeFile} from 'node:fs/promises';
import path from 'node:path';
import type {BlockSpec} from '../spec/block-spec.js';
import type {AdjustMethod} from '../spec/parse-settings.js';
import {canonicalJson, planFields, planHash, type PlanFields} from '../spec/spec-fingerprint.js';
import {UserError} from '../user-error.js';

/**
 * `stet.lock` beside the report: the hypothesis-defining fields of every
 * test block, recorded by `stet lock` and meant to be committed. JSON with
 * sorted keys, so the same plan always gives the same bytes and diffs stay
 * small. Describe blocks test nothing and are not part of a plan.
 */
export interface LockedBlock {
  readonly hash: string;
  /** When this block's plan, as it stands, was first locked. */
  readonly locked_at: string;
  readonly plan: PlanFields;
}

export interface LockFile {
  readonly 'stet-lock': 1;
  readonly report: string;
  readonly blocks: Readonly<Record<string, LockedBlock>>;
}

export const lockName = 'stet.lock';

export function lockPath(reportPath: string): string {
  return path.join(path.dirname(path.resolve(reportPath)), lockName);
}

/** The lock beside a report, or undefined when there is none. */
export async function readLock(reportPath: string): Promise<LockFile | undefined> {
  let text: string;
  try {
    text = await readFile(lockPath(reportPath), 'utf8');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
    throw error;
  }
  const invalid = (why: string) => new UserError(`${lockName} is not a valid plan lock: ${why}`, {
    ruleId: 'lock-invalid',
    file: lockName,
    hint: `Restore it from version control, or recreate it with \`stet lock --force\` (the plan then counts from now).`,
  });
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw invalid((error as Error).message);
  }
  const lock = value as Partial<LockFile> | null;
  if (!lock || lock['stet-lock'] !== 1 || typeof lock.blocks !== 'object' || lock.blocks === null) throw invalid('expected {"stet-lock": 1, "blocks": {…}}');
  for (const [id, block] of Object.entries(lock.blocks)) {
    if (typeof block?.hash !== 'string' || typeof block.plan !== 'object') throw invalid(`block \`${id}\` has no hash or plan`);
  }
  return lock as LockFile;
}

/** Whether a block is part of a plan at all. */
export function isPlanned(spec: BlockSpec): boolean {
  return spec.method !== 'describe';
}

/**
 * The lock for the current blocks. A block whose plan is unchanged keeps
 * the time it was first locked.
 */
export function createLock(report: string, specs: readonly BlockSpec[], adjust: AdjustMethod, now: Date, previous?: LockFile): LockFile {
  const blocks: Record<string, LockedBlock> = {};
  for (const spec of specs.filter(isPlanned)) {
    const hash = planHash(spec, adjust);
    const before = previous?.blocks[spec.id];
    blocks[spec.id] = {hash, locked_at: before?.hash === hash ? before.locked_at : now.toISOString(), plan: planFields(spec, adjust)};
  }
  return {'stet-lock': 1, report, blocks};
}

export async function writeLock(reportPath: string, lock: LockFile): Promise<void> {
  await writeFile(lockPath(reportPath), `${canonicalJson(lock, 2)}\n`);
}
