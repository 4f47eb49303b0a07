import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createScanMemo, stableKey } from '../../src/core/metrics/scan-memo.js';

// The memo key names a computation's arguments exactly: equal keys only for equal bits. The bit
// patterns below are IEEE 754-2019 binary64 facts (section 3.4): -0 is the sign bit alone
// (0x8000000000000000), +0 all zero bits; a quiet NaN has the top fraction bit set and any payload.

const bits = (hi: number, lo: number): Float64Array => {
  const view = new DataView(new ArrayBuffer(8));
  view.setUint32(0, hi);
  view.setUint32(4, lo);
  return new Float64Array([view.getFloat64(0)]);
};

describe('stableKey(value)', () => {
  it('tells the sign of zero apart, in numbers and in typed arrays', () => {
    expect(stableKey(-0)).not.toBe(stableKey(0));
    expect(stableKey(bits(0x80000000, 0))).not.toBe(stableKey(bits(0, 0)));
    expect(Object.is(bits(0x80000000, 0)[0], -0)).toBe(true);
  });

  it('tells NaN payloads apart in typed arrays (0x7FF8000000000000 vs 0x7FF8000000000001)', () => {
    const a = bits(0x7ff80000, 0);
    const b = bits(0x7ff80000, 1);
    expect(Number.isNaN(a[0]) && Number.isNaN(b[0])).toBe(true);
    expect(stableKey(a)).not.toBe(stableKey(b));
    expect(stableKey(a)).toBe(stableKey(bits(0x7ff80000, 0)));
  });

  it('tells apart arrays of the same bytes in other classes, lengths and alignments', () => {
    const bytes = new Uint8Array([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    const keys = [
      stableKey(new Uint8Array(bytes.buffer, 0, 8)),
      stableKey(new Int8Array(bytes.buffer, 0, 8)),
      stableKey(new Uint8Array(bytes.buffer, 1, 8)),
      stableKey(new Uint8Array(bytes.buffer, 0, 9)),
      stableKey(new Float64Array(bytes.buffer.slice(0, 8))),
      stableKey(new Uint16Array(bytes.buffer.slice(0, 8))),
    ];
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('equal bits give equal keys, different bits different keys (random binary64 arrays)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double(), { maxLength: 70 }),
        fc.array(fc.double(), { maxLength: 70 }),
        (xs, ys) => {
          const a = new Float64Array(xs);
          const b = new Float64Array(ys);
          const same =
            a.length === b.length &&
            new Uint8Array(a.buffer).every((byte, i) => byte === new Uint8Array(b.buffer)[i]);
          expect(stableKey(a) === stableKey(b)).toBe(same);
          expect(stableKey(a)).toBe(stableKey(new Float64Array(xs)));
        },
      ),
      { numRuns: 300, seed: 16 },
    );
  });

  it('argument lists whose raw bytes hold the separators still give distinct memo keys', () => {
    // Code units of ',' (0x2C) and '>' (0x3E) inside the bytes: the length prefix keeps the
    // boundary between arguments where it is.
    const memo = createScanMemo();
    const seen: string[] = [];
    const record = (...args: unknown[]) => {
      seen.push(args.map(stableKey).join(','));
      return seen.length;
    };
    const comma = new Uint16Array([0x2c, 0x6e, 0x31]); // ",n1"
    memo.call('f', record, new Uint16Array([0x41]), 1);
    memo.call('f', record, new Uint16Array([0x41, ...comma]));
    expect(memo.misses).toBe(2);
    expect(new Set(seen).size).toBe(2);
  });

  it('large arrays (2^20 words) are keyed whole, not cut', () => {
    const a = new Float64Array(1 << 18);
    const b = new Float64Array(1 << 18);
    b[b.length - 1] = 1;
    expect(stableKey(a)).not.toBe(stableKey(b));
    expect(stableKey(a).length).toBeGreaterThan(1 << 20);
  });
});
