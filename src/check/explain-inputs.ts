import {readFile} from 'node:fs/promises';
import path from 'node:path';
import type {CompiledReport} from '../compile-report.js';
import {blockSpecHash, sha256} from '../spec/spec-fingerprint.js';
import {version} from '../version.js';
import type {Finding} from './check-report.js';
import {disclosureRecord, hashTemplates, templateFile, type BuildManifest} from './manifest.js';
import {proseHash} from './prose-hash.js';

/**
 * Why the output may be stale: each input that differs from the build
 * record, named — the block and its data file, its specification, the
 * prose, a template, stet itself, the lock or the ledger.
 */
export async function explainInputs(compiled: CompiledReport, manifest: BuildManifest): Promise<Finding[]> {
  const data = compiled.data!;
  const findings: Finding[] = [];
  const add = (subject: string, reason: string) => findings.push({subject, reason, kind: 'input'});
  if (manifest.stet !== version) add('stet', `version changed (${manifest.stet} → ${version})`);
  if (manifest.formats.includes('html')) {
    const templates = await hashTemplates(templateFile(compiled.reportPath, manifest.page.template));
    for (const [name, hash] of Object.entries(templates)) if (manifest.templates[name] !== hash) add(`template ${name}`, 'changed');
  }
  for (const [id, spec] of data.specs) {
    const subject = `block ${id}`;
    const before = manifest.blocks[id];
    if (!before) {
      add(subject, 'added since the last build');
      continue;
    }
    if (before.spec !== blockSpecHash(spec, data.settings.adjust)) add(subject, 'specification changed');
    const now = data.datasets.get(spec.data);
    const then = manifest.datasets[before.data];
    if (now && then && now.sha256 !== then.sha256) add(subject, `data file ${now.file} changed (sha256 ${short(then.sha256)} → ${short(now.sha256)})`);
    else if (now && !then) add(subject, `now reads data file ${now.file}`);
    const disclosure = compiled.history?.disclose(spec, data.settings);
    const record = disclosure && disclosureRecord(disclosure);
    if (record && before.disclosure) {
      if (record.plan !== before.disclosure.plan) add(subject, `plan ${before.disclosure.plan ?? 'unlocked'} → ${record.plan ?? 'unlocked'} (stet.lock changed)`);
      if (record.specifications !== before.disclosure.specifications) {
        add(subject, `specifications evaluated ${before.disclosure.specifications} → ${record.specifications} (ledger)`);
      }
    }
  }
  for (const id of Object.keys(manifest.blocks).sort()) if (!data.specs.has(id)) add(`block ${id}`, 'removed from the report');
  const text = await readFile(compiled.reportPath, 'utf8');
  if (proseHash(text) !== manifest.report.prose) add(path.basename(compiled.reportPath), 'report prose or front matter changed');
  return findings;
}

function short(hash: string): string {
  return `${hash.slice(0, 8)}…`;
}
