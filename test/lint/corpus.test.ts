import {describe, expect, it} from 'vitest';
import {lintSentences} from '../../src/lint/lint-report.js';
import {sentencesOfText} from '../../src/lint/prose-sentences.js';
import {blindBatch} from './corpus-blind.js';
import {corpus, heldOut, thirdBatch, type CorpusSentence} from './corpus.js';
import {finalHeldOut} from './corpus-held-out.js';
import {corpusContext} from './corpus-report.js';

describe('lint corpus: precision and recall', async () => {
  const {context} = await corpusContext();

  it('finds at least 90% of the planted problems and raises at most 10% false findings', () => {
    const tuned = score(corpus);
    const held = score(heldOut);
    const third = score(thirdBatch);
    const blind = score(blindBatch);
    const final = score(finalHeldOut);
    const all = score([...corpus, ...heldOut, ...thirdBatch, ...blindBatch, ...finalHeldOut]);
    const total = corpus.length + heldOut.length + thirdBatch.length + blindBatch.length + finalHeldOut.length;
    console.log([
      `lint corpus: ${total} sentences, ${all.planted} planted findings; precision ${all.precision.toFixed(3)}, recall ${all.recall.toFixed(3)}`,
      `  first batch (${corpus.length}): precision ${tuned.precision.toFixed(3)}, recall ${tuned.recall.toFixed(3)}; second batch (${heldOut.length}): precision ${held.precision.toFixed(3)}, recall ${held.recall.toFixed(3)}; third batch (${thirdBatch.length}): precision ${third.precision.toFixed(3)}, recall ${third.recall.toFixed(3)}`,
      `  fourth batch (${blindBatch.length}): precision ${blind.precision.toFixed(3)}, recall ${blind.recall.toFixed(3)} (${blind.planted} planted); fifth batch, held out (${finalHeldOut.length}): precision ${final.precision.toFixed(3)}, recall ${final.recall.toFixed(3)} (${final.planted} planted)`,
      ...all.misses.map((miss) => `  ${miss}`),
    ].join('\n'));
    expect(total).toBeGreaterThanOrEqual(60);
    expect(all.recall).toBeGreaterThanOrEqual(0.9);
    expect(all.precision).toBeGreaterThanOrEqual(0.9);
  });

  function score(sentences: readonly CorpusSentence[]) {
    let truePositives = 0;
    let falsePositives = 0;
    let falseNegatives = 0;
    const misses: string[] = [];
    for (const {text, expect: expected} of sentences) {
      const found = lintSentences(sentencesOfText(text), context).map((finding) => finding.rule);
      const left = [...expected];
      for (const rule of found) {
        const at = left.indexOf(rule);
        if (at >= 0) {
          left.splice(at, 1);
          truePositives++;
        } else {
          falsePositives++;
          misses.push(`false ${rule}: ${text}`);
        }
      }
      falseNegatives += left.length;
      misses.push(...left.map((rule) => `missed ${rule}: ${text}`));
    }
    return {
      planted: truePositives + falseNegatives,
      precision: truePositives / (truePositives + falsePositives),
      recall: truePositives / (truePositives + falseNegatives),
      misses,
    };
  }
});
