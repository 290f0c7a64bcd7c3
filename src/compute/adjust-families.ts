import type {Adjustment} from '../interpret/sentence.js';
import {adjustPValues} from '../methods/adjust/index.js';
import type {AdjustMethod} from '../spec/parse-settings.js';
import type {ComputedBlock} from './compute-block.js';

/**
 * Adjusted p-values within each `family` of tests, by the document's
 * `adjust` method. Blocks outside a family, or documents with
 * `adjust: none`, get no adjustment.
 */
export function adjustFamilies(blocks: readonly ComputedBlock[], method: AdjustMethod): Map<string, Adjustment> {
  const adjustments = new Map<string, Adjustment>();
  if (method === 'none') return adjustments;
  const families = new Map<string, ComputedBlock[]>();
  for (const block of blocks) {
    const family = block.spec.family;
    if (family === undefined || !block.outcome) continue;
    families.set(family, [...(families.get(family) ?? []), block]);
  }
  for (const [family, members] of families) {
    const adjusted = adjustPValues(method, members.map((block) => block.outcome!.p));
    members.forEach((block, i) => {
      adjustments.set(block.spec.id, {pAdjusted: adjusted[i]!, method, family, size: members.length});
    });
  }
  return adjustments;
}
