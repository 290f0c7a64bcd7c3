import {describe, expect, it} from 'vitest';
import {decodeValue, encodeValue, type Encoded} from '../../src/cache/value-codec.js';

/** Through JSON text, as the disk cache stores it. */
const roundTrip = (value: unknown) => decodeValue(JSON.parse(JSON.stringify(encodeValue(value))) as Encoded);

describe('value codec', () => {
  it('keeps what JSON loses: NaN, ±Infinity, -0 and undefined properties', () => {
    const back = roundTrip({a: NaN, b: Infinity, c: -Infinity, d: -0, e: undefined, f: [undefined, 1]}) as Record<string, unknown>;
    expect(Number.isNaN(back['a'])).toBe(true);
    expect(back['b']).toBe(Infinity);
    expect(back['c']).toBe(-Infinity);
    expect(Object.is(back['d'], -0)).toBe(true);
    expect(Object.hasOwn(back, 'e')).toBe(true);
    expect(back['e']).toBeUndefined();
    expect(back['f']).toEqual([undefined, 1]);
  });

  it('keeps typed arrays byte for byte, with their type', () => {
    const values = new Float64Array([1.5, NaN, -0, Infinity, 0.1 + 0.2]);
    const back = roundTrip({values, missing: new Uint8Array([0, 1, 0])}) as {values: Float64Array; missing: Uint8Array};
    expect(back.values).toBeInstanceOf(Float64Array);
    expect(Buffer.from(back.values.buffer).equals(Buffer.from(values.buffer))).toBe(true);
    expect(back.missing).toBeInstanceOf(Uint8Array);
    expect([...back.missing]).toEqual([0, 1, 0]);
  });

  it('keeps a view onto part of a buffer as just that part', () => {
    const whole = new Float64Array([1, 2, 3, 4]);
    const back = roundTrip(whole.subarray(1, 3)) as Float64Array;
    expect([...back]).toEqual([2, 3]);
  });

  it('keeps Maps and Sets with their order, and key order of objects', () => {
    const back = roundTrip({show: new Set(['table', 'sentence']), m: new Map([['b', 1], ['a', NaN]]), z: 1, y: 2}) as {
      show: Set<string>;
      m: Map<string, number>;
    };
    expect([...back.show]).toEqual(['table', 'sentence']);
    expect([...back.m.keys()]).toEqual(['b', 'a']);
    expect(Number.isNaN(back.m.get('a'))).toBe(true);
    expect(Object.keys(back)).toEqual(['show', 'm', 'z', 'y']);
  });

  it('does not mistake data that looks like a tag for a tag', () => {
    const value = {$stet: 'NaN', other: {$o: 1, $stet: 'typed'}};
    expect(roundTrip(value)).toEqual(value);
  });

  it('refuses values it cannot copy faithfully', () => {
    class Point {
      x = 1;
    }
    expect(() => encodeValue(new Point())).toThrow(/Point/);
    expect(() => encodeValue({f: () => 1})).toThrow(/function/);
    expect(() => encodeValue(new Date(0))).toThrow(/Date/);
  });
});
