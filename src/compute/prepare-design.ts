import type {Dataset} from '../data/column.js';
import type {DesignKind} from '../methods/types.js';
import type {BlockSpec} from '../spec/block-spec.js';
import {prepareBivariate} from './design/bivariate.js';
import {prepareContingency, prepareCounts, preparePairedCategorical, prepareProportion} from './design/categorical.js';
import {countExcluded} from './design/columns.js';
import {prepareGroups, preparePaired, type Prepared} from './design/numeric.js';

export type {Prepared as PreparedDesign} from './design/numeric.js';

/**
 * Turn a block and its dataset into the shape its method reads, and
 * account for every row left out.
 * @param keep Rows that passed `where` (1) or not (0).
 */
export function prepareDesign(spec: BlockSpec, kind: DesignKind, dataset: Dataset, keep: Uint8Array): Prepared {
  const excluded = countExcluded(keep);
  switch (kind) {
    case 'paired':
      return preparePaired(spec, dataset, keep, excluded);
    case 'contingency':
      return prepareContingency(spec, dataset, keep, excluded);
    case 'paired-categorical':
      return preparePairedCategorical(spec, dataset, keep, excluded);
    case 'counts':
      return prepareCounts(spec, dataset, keep, excluded);
    case 'proportion':
      return prepareProportion(spec, dataset, keep, excluded);
    case 'bivariate':
      return prepareBivariate(spec, dataset, keep, excluded);
    default:
      return prepareGroups(spec, kind, dataset, keep, excluded);
  }
}
