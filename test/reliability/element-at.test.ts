// elementAt (src/core/element-at.ts): the checked read behind the code's indexed reads since
// noUncheckedIndexedAccess. The reference for what an index is: ECMA-262 §6.1.7, an array index
// is a whole number i with 0 <= i < 2^32 - 1; a typed array reads `undefined` past its length
// (ECMA-262 §10.4.5.15, TypedArrayGetElement).
import { describe, expect, it } from 'vitest';
import { elementAt } from '../../src/core/element-at.js';
import { nullRecord } from '../../src/core/null-record.js';

describe('elementAt', () => {
  it('reads every index inside a list and a typed array', () => {
    const list = ['a', 'b', 'c'];
    expect(list.map((_, i) => elementAt(list, i))).toEqual(list);
    const typed = Float64Array.of(0.5, -0, NaN);
    expect(Object.is(elementAt(typed, 1), -0)).toBe(true);
    expect(elementAt(typed, 2)).toBeNaN();
  });

  it('throws a RangeError naming the index for indexes outside the list', () => {
    const list = [1, 2, 3];
    for (const i of [3, 4, -1, 1.5, NaN, 2 ** 32, Infinity])
      expect(() => elementAt(list, i)).toThrow(new RangeError(`index ${i} is outside a list of 3`));
    expect(() => elementAt(new Float64Array(2), 2)).toThrow(RangeError);
    expect(() => elementAt('', 0)).toThrow(RangeError);
  });

  it('returns an undefined the list holds inside its length, and holes read as undefined', () => {
    expect(elementAt([undefined, 1], 0)).toBeUndefined();
    expect(elementAt(new Array<number | undefined>(2), 1)).toBeUndefined();
  });
});

describe('nullRecord', () => {
  it('has no prototype, so names from a file are plain keys', () => {
    const table = nullRecord<number>();
    expect(Object.getPrototypeOf(table)).toBeNull();
    expect(table.constructor).toBeUndefined();
    table.__proto__ = 1;
    expect(Object.keys(table)).toEqual(['__proto__']);
  });
});
