import {wording} from './wording.js';

/**
 * What a block's history adds to its sentence: whether the locked plan
 * declared it (absent when the report has no lock), and how many distinct
 * specifications of it the ledger has seen, the current one included.
 */
export interface Disclosure {
  readonly plan: 'confirmatory' | 'exploratory' | undefined;
  readonly specifications: number;
}

/** Phrases for the sentence: nothing when there is no lock and one specification. */
export function disclosurePhrases(disclosure: Disclosure | undefined): string[] {
  if (!disclosure) return [];
  const parts: string[] = [];
  if (disclosure.plan) parts.push(disclosure.plan === 'confirmatory' ? wording.planConfirmatory : wording.planExploratory);
  if (disclosure.specifications > 1) parts.push(wording.specificationsEvaluated(disclosure.specifications));
  return parts;
}
