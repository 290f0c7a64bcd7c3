/**
 * A faithful JSON form of the plain data stages exchange: objects, arrays,
 * strings, booleans, finite numbers, and what JSON loses — `undefined`,
 * NaN, ±Infinity, -0, typed arrays, Map and Set. Tagged values are
 * one-key objects `{"$stet": kind, ...}`; an author's object can never
 * collide because every plain object is wrapped as `{"$o": {...}}` only
 * when it happens to own a `$stet` key.
 *
 * Anything else (class instances, functions, symbols) throws: a value the
 * codec cannot copy faithfully must not be cached.
 */
export type Encoded = null | boolean | number | string | Encoded[] | {[key: string]: Encoded};

const typedArrays = {
  Float64Array,
  Float32Array,
  Int32Array,
  Uint32Array,
  Int16Array,
  Uint16Array,
  Int8Array,
  Uint8Array,
  Uint8ClampedArray,
} as const;
type TypedArrayName = keyof typeof typedArrays;

export function encodeValue(value: unknown): Encoded {
  if (value === undefined) return {$stet: 'undefined'};
  if (value === null || typeof value === 'boolean' || typeof value === 'string') return value;
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return {$stet: 'NaN'};
    if (value === Infinity) return {$stet: 'Infinity'};
    if (value === -Infinity) return {$stet: '-Infinity'};
    if (Object.is(value, -0)) return {$stet: '-0'};
    return value;
  }
  if (Array.isArray(value)) {
    if (Object.keys(value).length !== value.length) throw new Error('cannot encode a sparse array');
    return value.map(encodeValue);
  }
  if (ArrayBuffer.isView(value)) {
    const name = value.constructor.name;
    if (!(name in typedArrays)) throw new Error(`cannot encode a ${name}`);
    // Bytes, not numbers: NaN payloads and -0 survive exactly.
    return {$stet: 'typed', type: name, bytes: Buffer.from(value.buffer, value.byteOffset, value.byteLength).toString('base64')};
  }
  if (value instanceof Map) return {$stet: 'Map', entries: [...value].map(([k, v]) => [encodeValue(k), encodeValue(v)])};
  if (value instanceof Set) return {$stet: 'Set', values: [...value].map(encodeValue)};
  if (typeof value === 'object' && isPlain(value)) {
    const out: {[key: string]: Encoded} = {};
    for (const [key, item] of Object.entries(value)) out[key] = encodeValue(item);
    return Object.hasOwn(out, '$stet') || Object.hasOwn(out, '$o') ? {$stet: 'object', value: out} : out;
  }
  throw new Error(`cannot encode a ${typeof value === 'object' ? value.constructor?.name : typeof value}`);
}

export function decodeValue(encoded: Encoded): unknown {
  if (encoded === null || typeof encoded !== 'object') return encoded;
  if (Array.isArray(encoded)) return encoded.map(decodeValue);
  const tag = encoded['$stet'];
  if (typeof tag !== 'string') return decodeObject(encoded);
  switch (tag) {
    case 'undefined':
      return undefined;
    case 'NaN':
      return NaN;
    case 'Infinity':
      return Infinity;
    case '-Infinity':
      return -Infinity;
    case '-0':
      return -0;
    case 'typed': {
      const type = encoded['type'] as TypedArrayName;
      const bytes = Buffer.from(encoded['bytes'] as string, 'base64');
      const Constructor = typedArrays[type];
      const copy = new Uint8Array(bytes.length);
      copy.set(bytes);
      return new Constructor(copy.buffer, 0, bytes.length / Constructor.BYTES_PER_ELEMENT);
    }
    case 'Map':
      return new Map((encoded['entries'] as Encoded[][]).map(([k, v]) => [decodeValue(k!), decodeValue(v!)]));
    case 'Set':
      return new Set((encoded['values'] as Encoded[]).map(decodeValue));
    case 'object':
      return decodeObject(encoded['value'] as {[key: string]: Encoded});
    default:
      throw new Error(`unknown tag ${tag}`);
  }
}

function decodeObject(encoded: {[key: string]: Encoded}): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, item] of Object.entries(encoded)) out[key] = decodeValue(item);
  return out;
}

function isPlain(value: object): boolean {
  const prototype = Object.getPrototypeOf(value);
  return prototype === Object.prototype || prototype === null;
}
