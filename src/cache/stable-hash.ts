import {createHash} from 'node:crypto';
import {encodeValue, type Encoded} from './value-codec.js';

/**
 * sha256 of a value's content, independent of the order its object keys
 * were written in: the key of a cache entry. Uses the codec's faithful
 * form, so NaN, typed arrays, Maps and Sets hash by content.
 */
export function stableHash(value: unknown): string {
  const hash = createHash('sha256');
  feed(hash, encodeValue(value));
  return hash.digest('hex');
}

function feed(hash: ReturnType<typeof createHash>, value: Encoded): void {
  if (value === null || typeof value !== 'object') {
    hash.update(JSON.stringify(value));
    return;
  }
  if (Array.isArray(value)) {
    hash.update('[');
    for (const item of value) feed(hash, item), hash.update(',');
    hash.update(']');
    return;
  }
  hash.update('{');
  for (const key of Object.keys(value).sort()) {
    hash.update(JSON.stringify(key));
    hash.update(':');
    feed(hash, value[key]!);
    hash.update(',');
  }
  hash.update('}');
}
