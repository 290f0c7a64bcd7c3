import {readFile} from 'node:fs/promises';
import {workspace} from '../helpers/workspace.js';
import {lintMarkdown} from './lint-fixture.js';

/**
 * The invented report the corpus sentences cite, with results fixed by its
 * data: `delivery` (reject; South took longer than North), `drift` (not
 * significant; after - before slightly positive), `strength` (reject;
 * Quarrybank lower than Northfield), `early` (not significant).
 */
export const corpusReport = `---
stet:
  adjust: holm
  datasets:
    cylinders: cylinders.csv
---

\`\`\`stet
id: delivery
test: welch-t
data: delivery.csv
y: minutes
by: depot
levels: [North, South]
family: f
\`\`\`

\`\`\`stet
id: drift
test: paired-t
data: drift.csv
y: [before, after]
family: f
\`\`\`

\`\`\`stet
id: strength
test: welch-t
data: cylinders
where: age_days == 28
y: strength_mpa
by: supplier
levels: [Northfield, Quarrybank]
family: f
\`\`\`

\`\`\`stet
id: early
test: welch-t
data: cylinders
where: age_days == 7
y: strength_mpa
by: supplier
levels: [Northfield, Quarrybank]
family: f
\`\`\`
`;

// Invented delivery times (minutes) for two depots, far apart on purpose.
const delivery = 'depot,minutes\n' + [31, 29, 33, 30, 32, 28, 31, 30].map((m) => `North,${m}`).join('\n') + '\n' +
  [45, 47, 44, 46, 48, 45, 43, 46].map((m) => `South,${m}`).join('\n') + '\n';
// Invented sensor readings before and after a service: differences tiny and mixed.
const drift = 'before,after\n10.0,10.1\n10.2,10.0\n9.9,10.0\n10.1,10.3\n10.0,9.9\n10.3,10.2\n9.8,9.9\n10.1,10.1\n';

export async function corpusContext() {
  const cylinders = await readFile(new URL('../../samples/concrete/data/cylinders.csv', import.meta.url), 'utf8');
  const dir = await workspace({'delivery.csv': delivery, 'drift.csv': drift, 'cylinders.csv': cylinders});
  return lintMarkdown(corpusReport, dir);
}
