import { describe, expect, it } from 'vitest';
import { sameJson } from './same-json';

describe('sameJson', () => {
  it('ignores key order and undefined members', () => {
    expect(sameJson({ a: 1, b: [1, { c: 2, d: 3 }] }, { b: [1, { d: 3, c: 2 }], a: 1 })).toBe(true);
    expect(sameJson({ a: 1, b: undefined }, { a: 1 })).toBe(true);
  });

  it('tells different values, lengths and shapes apart', () => {
    expect(sameJson({ a: 1 }, { a: 2 })).toBe(false);
    expect(sameJson([1, 2], [1, 2, 3])).toBe(false);
    expect(sameJson({ a: [1] }, { a: { 0: 1 } })).toBe(false);
    expect(sameJson(null, {})).toBe(false);
    expect(sameJson({ a: 1 }, { a: 1, b: 2 })).toBe(false);
  });
});
