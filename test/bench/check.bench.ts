import path from 'node:path';
import {bench, describe} from 'vitest';
import {buildReport} from '../../src/build-report.js';
import {checkReport} from '../../src/check/check-report.js';
import {compileReport} from '../../src/compile-report.js';
import {sampleCopy} from '../helpers/small-report.js';

// The concrete sample, built once into a copy; then `check` with nothing
// changed (hashes only) against a full in-memory compile (what check does
// when something changed, and what a build does before writing).
const report = await sampleCopy();
await buildReport(report);
const first = await checkReport(report);
if (!first.fresh || first.compiled) throw new Error(`bench setup: expected fresh output checked from hashes (${path.dirname(report)})`);

describe('stet check on the concrete sample', () => {
  bench('check, nothing changed (hashes only)', async () => {
    await checkReport(report);
  }, {iterations: 30, time: 0});

  bench('full compile in memory', async () => {
    await compileReport(report);
  }, {iterations: 10, time: 0});
});
