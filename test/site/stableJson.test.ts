import { describe, expect, it } from 'vitest';
import { stableJson } from '../../src/site/stableJson.ts';

describe('stableJson()', () => {
  it('sorts keys at every depth, whatever order they were added in', () => {
    expect(stableJson({ b: 1, a: { d: [{ z: 1, y: 2 }], c: 3 } })).toBe(stableJson({ a: { c: 3, d: [{ y: 2, z: 1 }] }, b: 1 }));
    expect(stableJson({ b: 1, a: 2 })).toBe('{\n  "a": 2,\n  "b": 1\n}\n');
  });

  it('rounds numbers to the fixed precision so last-bit differences vanish', () => {
    expect(stableJson({ x: 0.1 + 0.2, y: 4150.123456 })).toBe('{\n  "x": 0.3,\n  "y": 4150.1235\n}\n');
    expect(stableJson([1 / 3], { decimals: 2 })).toBe('[\n  0.33\n]\n');
  });

  it('writes -0 as 0, non-finite numbers as null and leaves out undefined fields', () => {
    expect(JSON.parse(stableJson({ a: -0, b: Number.NaN, c: Infinity, d: undefined, e: -1e-9 }))).toEqual({
      a: 0,
      b: null,
      c: null,
      e: 0,
    });
    expect(stableJson({ e: -1e-9 })).toBe('{\n  "e": 0\n}\n');
  });
});
