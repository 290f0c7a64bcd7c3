import {pClause} from '../interpret/format-number.js';

/** A p-value as stet's own sentences print it, for lint messages. */
export function formatP(p: number | null | undefined): string {
  return p === null || p === undefined ? 'p not computed' : pClause(p);
}
