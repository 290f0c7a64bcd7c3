import type {BlockSpec} from '../spec/block-spec.js';

/** Blocks that describe or check assumptions answer no research question. */
const notConfirmatory = new Set(['describe', 'shapiro-wilk', 'levene', 'brown-forsythe']);

export function isConfirmatory(spec: BlockSpec): boolean {
  return !notConfirmatory.has(spec.method);
}
