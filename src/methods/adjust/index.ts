import type {AdjustMethod} from '../../spec/parse-settings.js';
import {benjaminiHochberg} from './benjamini-hochberg.js';
import {benjaminiYekutieli} from './benjamini-yekutieli.js';
import {bonferroni} from './bonferroni.js';
import {hochberg} from './hochberg.js';
import {holm} from './holm.js';
import {validatePValues} from './validate-p-values.js';

export {benjaminiHochberg, benjaminiYekutieli, bonferroni, hochberg, holm};

/**
 * Adjusted p-values for one family of tests, in the input order, by the
 * method named in the document's `adjust` setting. `none` returns a copy so
 * callers may always treat the result as their own.
 */
export function adjustPValues(method: AdjustMethod, p: readonly number[]): number[] {
  switch (method) {
    case 'none':
      validatePValues(p, 'adjustPValues');
      return [...p];
    case 'bonferroni':
      return bonferroni(p);
    case 'holm':
      return holm(p);
    case 'hochberg':
      return hochberg(p);
    case 'bh':
      return benjaminiHochberg(p);
    case 'by':
      return benjaminiYekutieli(p);
    default:
      throw new Error(`adjustPValues: unknown method ${JSON.stringify(method satisfies never)}`);
  }
}
