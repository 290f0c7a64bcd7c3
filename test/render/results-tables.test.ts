import {beforeAll, describe, expect, it} from 'vitest';
import {compileFiles, fixtureFiles} from '../helpers/render-fixture.js';

const report = `# Tables

\`\`\`stet
id: corr
test: pearson
data: mixes.csv
x: water
y: strength
\`\`\`

\`\`\`stet
id: ranks
test: kruskal-wallis
data: mixes.csv
y: strength
by: mix
\`\`\`
`;

describe('results tables', () => {
  let md: string;
  beforeAll(async () => {
    md = (await compileFiles({...fixtureFiles(), 'report.md': report}, ['md'])).files.get('report.md')!;
  });

  it('show a correlation once, without a leading zero', () => {
    const header = md.split('\n').find((line) => line.startsWith('| Test |') && line.includes('Pearson'))!;
    expect(header).toBe('| Test | Statistic | p | Decision (α = .05) | Pearson r \\[95% CI] |');
    // The shape, not the digits: r and both bounds as `.dd`, as in the sentence.
    expect(md).toMatch(/\| Pearson’s correlation \| _t_\(22\) = [^|]+ \| [^|]+ \| [^|]+ \| −?\.\d\d \\\[−?\.\d\d, −?\.\d\d] \|\n/);
  });

  it('label Dunn’s comparisons as mean ranks and give an effect without interval no CI header', () => {
    expect(md).toContain('| Comparison | Difference in mean ranks | Adjusted p |');
    expect(md).toMatch(/\| Test \| [^\n]*\| ε² \|\n/);
  });
});
