import path from 'node:path';
import {compileReport, type CompiledReport, type OutputFormat} from '../../src/compile-report.js';
import {workspace} from './workspace.js';

/**
 * An invented report with one block of each method family the renderers
 * treat differently: two groups (in a family), k groups with post-hoc
 * comparisons, a contingency table, a regression and a description.
 */
export function fixtureFiles(): Record<string, string> {
  const rows = ['mix,strength,water,cured'];
  const mixes = ['lean', 'standard', 'rich'];
  for (let i = 0; i < 24; i++) {
    const mix = mixes[i % 3]!;
    const water = 0.4 + (i % 8) * 0.025;
    const strength = 30 + (i % 3) * 2.5 - water * 10 + ((i * 7) % 5) * 0.6;
    rows.push(`${mix},${strength.toFixed(1)},${water.toFixed(3)},${(i * 5) % 7 < 3 ? 'yes' : 'no'}`);
  }
  const block = (body: string) => `\`\`\`stet\n${body.trim()}\n\`\`\`\n`;
  const report = `---
title: Renderer fixture
stet:
  adjust: holm
  datasets:
    mixes:
      file: mixes.csv
      units: {strength: MPa}
---

# Fixture

${block(`
id: lean-rich
test: welch-t
data: mixes
y: strength
by: mix
levels: [lean, rich]
family: pairs
caption: Strength of lean and rich mixes.
`)}
${block(`
id: lean-standard
test: student-t
data: mixes
where: water < 0.55
y: strength
by: mix
levels: [lean, standard]
family: pairs
`)}
${block(`
id: mixes
test: anova
data: mixes
y: strength
by: mix
posthoc: tukey
`)}
${block(`
id: curing
test: chi-square
data: mixes
y: cured
by: mix
`)}
${block(`
id: water
test: linear-regression
data: mixes
x: water
y: strength
`)}
${block(`
id: spread
test: describe
data: mixes
y: strength
`)}
The welch test gave {{lean-rich.p}}.
`;
  return {'report.md': report, 'mixes.csv': `${rows.join('\n')}\n`};
}

/** Compile a report in memory from its files. */
export async function compileFiles(files: Record<string, string>, formats: OutputFormat[] = ['md', 'html', 'json', 'tex']): Promise<CompiledReport> {
  const dir = await workspace(files);
  const result = await compileReport(path.join(dir, 'report.md'), {formats: new Set(formats), now: () => new Date('2026-01-02T03:04:05Z')});
  if (!result.ok) throw new Error(`fixture did not compile: ${result.messages.map(String).join('\n')}`);
  return result;
}
