import {describe, expect, it} from 'vitest';
import {vlJson} from '../../src/charts/vl-json.js';

describe('vlJson', () => {
  it('writes the same text whatever order the keys were set in', () => {
    const a = vlJson({mark: 'bar', data: {values: [{b: 1, a: 2}]}, $schema: 's'});
    const b = vlJson({$schema: 's', data: {values: [{a: 2, b: 1}]}, mark: 'bar'});
    expect(a).toBe(b);
    expect(a).toBe('{\n  "$schema": "s",\n  "data": {\n    "values": [\n      {\n        "a": 2,\n        "b": 1\n      }\n    ]\n  },\n  "mark": "bar"\n}\n');
  });

  it('keeps array order and drops undefined keys', () => {
    expect(JSON.parse(vlJson({layer: [3, 1, 2], x: undefined}))).toEqual({layer: [3, 1, 2]});
  });
});
