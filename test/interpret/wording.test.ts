import {readFileSync} from 'node:fs';
import {describe, expect, it} from 'vitest';
import type {MethodNote} from '../../src/methods/types.js';
import {numberFormat} from '../../src/interpret/format-number.js';
import {numberStyles} from '../../src/interpret/number-style.js';
import {plainText} from '../../src/interpret/symbol-marks.js';
import {chartWords, methodNote, wording} from '../../src/interpret/wording.js';

const notes: MethodNote[] = [
  {kind: 'spread-ratio', larger: 'b', smaller: 'a', ratio: 10, alternative: 'welch-anova'},
  {kind: 'small-expected', below: 2, cells: 4, smallest: 1.23456, alternative: 'fisher-exact'},
  {kind: 'small-expected', below: 1, cells: 6, smallest: 0.456},
  {kind: 'small-groups', groups: ['x', 'y']},
  {kind: 'unattainable-interval', confidence: 0.95, estimate: 'shift', between: ['A', 'B']},
  {kind: 'unattainable-interval', confidence: 0.9, estimate: 'median difference', pairs: 3},
  {kind: 'ties-approximation', tied: 'zero differences'},
  {kind: 'dropped-zeros', zeros: 2, pairs: 12, second: 'B', first: 'A', mu: 0, wilcoxon: true},
  {kind: 'few-expected', trials: 8, mu: 0.05, alternative: 'binomial'},
  {kind: 'constant-groups', groups: ['a']},
  {kind: 'smallest-effect-out-of-range', smallest: 0.4, bound: 1, baseline: 0.8},
  {kind: 'no-sensitivity', baseline: 0.625, n1: 8, n2: 7},
];

describe('methodNote', () => {
  it('words every kind of caveat as one sentence, naming the method an author may declare', () => {
    const texts = notes.map((note) => plainText(methodNote(note, numberFormat())));
    for (const text of texts) {
      expect(text).toMatch(/^\S.*\.$/);
      expect(text).not.toMatch(/no difference|\bthe same\b|undefined|NaN/);
    }
    expect(texts[0]).toBe('The standard deviations of b and a differ by a factor of 10.0; this test assumes equal spreads, so consider declaring `test: welch-anova`.');
    expect(texts[1]).toContain('2 of 4 expected counts are below 5 (smallest 1.2)');
    expect(texts[1]).toContain('`test: fisher-exact`');
    expect(texts[2]).toContain('(smallest 0.46)');
    expect(texts[2]).toContain('combining sparse levels');
    expect(texts[4]).toBe('With these group sizes no interval for the shift between A and B reaches 95% confidence, so its bounds are infinite.');
    expect(texts[8]).toContain('a null proportion of .05');
  });

  it('prints bounded values as the style asks', () => {
    const note: MethodNote = {kind: 'no-sensitivity', baseline: 0.625, n1: 8, n2: 7};
    expect(methodNote(note, numberFormat(numberStyles.science))).toContain('at .625');
    expect(methodNote(note, numberFormat(numberStyles.engineering))).toContain('at 0.625');
  });
});

describe('auto reasons', () => {
  it('word the number of groups', () => {
    expect(wording.autoReason({design: 'k-groups', groups: 4})).toMatch(/^a numeric outcome in 4 independent groups/);
  });
});

describe('chartWords', () => {
  // The source text of every entry, comments left out: a sample call would
  // read one branch of each conditional, the source reads them all.
  const source = readFileSync(new URL('../../src/interpret/wording.ts', import.meta.url), 'utf8');
  const entries = source
    .slice(source.indexOf('export const chartWords'))
    .replace(/\/\*\*[\s\S]*?\*\//g, '')
    .replace(/^\s*\/\/.*$/gm, '');

  it('use none of the phrasings contract §7 forbids', () => {
    // The slice holds the entries (a missing marker would leave nothing to read).
    expect(entries).toContain('`Scatter plot of ${y} against ${x}, ${n} points`');
    expect(chartWords.scatter.head('y', 'x', 3)).toBe('Scatter plot of y against x, 3 points');
    const forbidden: readonly RegExp[] = [
      /\baccept(s|ed|ing)?\b/i,
      /\bprov(e|es|ed|en|ing)\b/i,
      /\bno difference\b/i,
      /\bthe same\b/i,
      /probability (that )?the null/i,
      /due to chance/i,
      /marginally significant/i,
      /trend(ing)? towards? (statistical )?significance/i,
      /p = 0?\.000\b/,
      /observed power/i,
      /\b(are|is|were|was) equal\b/,
    ];
    for (const pattern of forbidden) expect(entries).not.toMatch(pattern);
  });
});
