import {cp, mkdtemp, readFile, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {workspace} from './workspace.js';

/** Invented bench-test readings for two rigs (a demo scenario of our own). */
export const smallData = `rig,load_kn,batch
A,10.2,1
A,11.1,1
A,9.8,2
A,10.6,2
A,10.9,3
A,NA,3
B,12.0,1
B,11.4,1
B,12.6,2
B,11.9,2
B,12.3,3
C,13.0,1
`;

export const smallReport = `---
title: Rig loads
stet:
  alpha: 0.05
  # The two tests answer separate questions, so they form no family.
  lint: {off: [undisclosed-multiplicity]}
  datasets:
    loads: data/loads.csv
---

# Rig loads

Two rigs were compared.

\`\`\`stet
id: rigs
test: welch-t
data: loads
y: load_kn
by: rig
levels: [A, B]
chart: none
\`\`\`

Rig A against a nominal 10 kN:

\`\`\`stet
id: nominal
test: one-sample-t
data: loads
where: rig == "A"
y: load_kn
mu: 10
chart: none
\`\`\`
`;

/** A throwaway folder holding the small report and its data; returns the report's path. */
export async function smallWorkspace(): Promise<string> {
  const dir = await workspace({'report.md': smallReport, 'data/loads.csv': smallData});
  return path.join(dir, 'report.md');
}

/** A copy of the concrete sample in a throwaway folder; returns the report's path. */
export async function sampleCopy(): Promise<string> {
  const dir = await mkdtemp(path.join(tmpdir(), 'stet-sample-copy-'));
  await cp(new URL('../../samples/concrete/', import.meta.url).pathname, dir, {recursive: true, filter: (source) => !/\/(out|\.stet)(\/|$)/.test(source)});
  return path.join(dir, 'report.md');
}

/** Replace text in a file, failing loudly when the text is not there. */
export async function edit(file: string, from: string | RegExp, to: string): Promise<void> {
  const text = await readFile(file, 'utf8');
  const next = text.replace(from, to);
  if (next === text) throw new Error(`edit: ${String(from)} not found in ${file}`);
  await writeFile(file, next);
}
