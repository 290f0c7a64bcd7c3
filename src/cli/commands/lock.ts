import path from 'node:path';
import {parseArgs} from 'node:util';
import {createLock, lockName, readLock, writeLock} from '../../lock/lock-file.js';
import {planDifferences} from '../../lock/plan-diff.js';
import {readPlan} from '../../lock/read-plan.js';
import {show} from '../../lock/plan-diff.js';
import type {CommandContext} from '../command.js';
import {oneReport} from '../one-report.js';
import {printMessages} from '../print-messages.js';

export async function run({args, io, paint}: CommandContext): Promise<number> {
  const {values, positionals} = parseArgs({
    args: [...args],
    allowPositionals: true,
    options: {show: {type: 'boolean'}, force: {type: 'boolean'}},
  });
  const report = oneReport('lock', positionals);
  const plan = await readPlan(report);
  if (!printMessages(plan.messages, io, paint)) {
    io.stderr(`${lockName} was not changed.\n`);
    return 1;
  }
  const lock = await readLock(report);
  const lockFile = path.relative(process.cwd(), path.join(path.dirname(path.resolve(report)), lockName));
  const differences = lock ? planDifferences(lock, plan.specs, plan.settings.adjust) : [];
  const list = (lines: readonly string[]) => lines.map((line) => `  ${line}\n`).join('');

  if (values.show) {
    if (!lock) return io.stdout(`${report} has no locked plan (${lockFile} not found).\n`), 0;
    io.stdout(`Locked plan in ${lockFile}:\n`);
    for (const [id, block] of Object.entries(lock.blocks)) {
      io.stdout(`  ${id} (locked ${block.locked_at}): ${Object.entries(block.plan).map(([k, v]) => `${k} ${show(v)}`).join(', ')}\n`);
    }
    io.stdout(differences.length ? `Differences from the report now:\n${list(differences)}` : 'The report matches the locked plan.\n');
    return 0;
  }

  if (lock && !values.force) {
    if (differences.length === 0) return io.stdout(`${lockFile} already matches ${report}.\n`), 0;
    io.stderr(`${paint.error('error')}: ${lockFile} exists and the report differs from it:\n${list(differences)}`);
    io.stderr('A lock is only worth something if it does not move silently: blocks that differ are labelled exploratory.\n');
    io.stderr('Run with --force to record the current plan (the changes are then part of the plan from now on).\n');
    return 1;
  }
  const next = createLock(path.basename(report), plan.specs, plan.settings.adjust, new Date(), lock);
  await writeLock(report, next);
  if (differences.length) io.stdout(`Changed the plan:\n${list(differences)}`);
  io.stdout(`Locked ${Object.keys(next.blocks).length} block(s) in ${lockFile}; commit it with the report.\n`);
  return 0;
}
