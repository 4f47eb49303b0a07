import { describe, expect, it } from 'vitest';
import { f16round } from '@petamoriken/float16';
import { elementAt } from '../../src/core/element-at.js';
import {
  binaryExponent,
  overflowThreshold,
  positionExactLimit,
  roundToFormat,
  spacingAt,
} from '../../src/core/metrics/float-format.js';

/** Deterministic 32-bit generator (mulberry32) so failures reproduce. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const bits32 = new Uint32Array(1);
const float32 = new Float32Array(bits32.buffer);

/** A binary32 value from its bit pattern. */
function fromBits32(u: number): number {
  bits32[0] = u >>> 0;
  return elementAt(float32, 0);
}

/**
 * Reference for bfloat16 on binary32 inputs: round to nearest even on the top 16 bits of the
 * binary32 pattern (the conversion bfloat16 hardware and libraries use; "common practice").
 */
function bf16FromBinary32(x: number): number {
  float32[0] = x;
  const u = elementAt(bits32, 0);
  if ((u & 0x7f800000) === 0x7f800000) return x; // Infinity, NaN
  const lsb = (u >>> 16) & 1;
  const rounded = ((u + 0x7fff + lsb) >>> 0) & 0xffff0000;
  return fromBits32(rounded);
}

/** Binary32 inputs: random patterns weighted to cover subnormals, the fp16 range edges and overflow. */
function binary32Inputs(count: number, seed: number): number[] {
  const next = rng(seed);
  const out: number[] = [];
  for (let n = 0; n < count; n++) {
    const kind = n % 4;
    let u: number;
    if (kind === 0)
      u = Math.floor(next() * 2 ** 32); // anywhere
    else if (kind === 1)
      u = ((Math.floor(next() * 48) + 88) << 23) | Math.floor(next() * 2 ** 23); // exponents 2^-39 .. 2^8: fp16 subnormals to normals
    else if (kind === 2)
      u = ((Math.floor(next() * 6) + 140) << 23) | Math.floor(next() * 2 ** 23); // 2^13 .. 2^18: around 65504 and overflow
    else u = ((Math.floor(next() * 254) + 1) << 23) | (Math.floor(next() * 2 ** 10) << 13) | 0x1000; // fp16-length significands plus a tie bit
    if (next() < 0.5) u |= 0x80000000;
    out.push(fromBits32(u >>> 0));
  }
  return out.filter((x) => !Number.isNaN(x));
}

describe('float-format: IEEE 754 limits', () => {
  it('positionExactLimit(format) is 2^24, 2^8, 2^11 (IEEE 754-2008 p = 24, 11; bfloat16 p = 8)', () => {
    expect(positionExactLimit('fp32')).toBe(16777216);
    expect(positionExactLimit('bf16')).toBe(256);
    expect(positionExactLimit('fp16')).toBe(2048);
    // the next integer is not exact: 2^24 + 1, 257, 2049 round to their even neighbour below
    expect(roundToFormat(16777217, 'fp32')).toBe(16777216);
    expect(roundToFormat(257, 'bf16')).toBe(256);
    expect(roundToFormat(2049, 'fp16')).toBe(2048);
    for (const f of ['fp32', 'bf16', 'fp16'] as const) {
      for (let n = 0; n <= Math.min(positionExactLimit(f), 4096); n++)
        expect(roundToFormat(n, f)).toBe(n);
    }
  });

  /** The largest finite number of a format: what roundToFormat keeps just under the overflow threshold. */
  const maxFinite = (format: 'fp32' | 'bf16' | 'fp16'): number =>
    roundToFormat(overflowThreshold(format) * (1 - 2 ** -52), format);

  it('roundToFormat keeps 65504 for binary16 and ≈3.3895e38 for bfloat16 as the largest finite numbers (IEEE 754-2008 binary16; bfloat16: 8 exponent bits, 8-bit precision)', () => {
    expect(maxFinite('fp16')).toBe(65504);
    // (2 - 2^-7) 2^127 = 3.3895313892515355e38; relative 1e-4 because the source prints 5 digits
    expect(Math.abs(maxFinite('bf16') / 3.3895e38 - 1)).toBeLessThan(1e-4);
    // binary32 max finite, exactly the value Math.fround keeps
    expect(maxFinite('fp32')).toBe(3.4028234663852886e38);
    expect(Math.fround(maxFinite('fp32'))).toBe(maxFinite('fp32'));
  });

  it('overflowThreshold(format) is where round-to-nearest overflows: 65520 for binary16', () => {
    expect(overflowThreshold('fp16')).toBe(65520);
    expect(roundToFormat(65519.99, 'fp16')).toBe(65504);
    expect(roundToFormat(65520, 'fp16')).toBe(Infinity);
    expect(roundToFormat(-65520, 'fp16')).toBe(-Infinity);
    expect(roundToFormat(overflowThreshold('bf16'), 'bf16')).toBe(Infinity);
    expect(roundToFormat(overflowThreshold('fp32'), 'fp32')).toBe(Infinity);
    expect(Math.fround(overflowThreshold('fp32') * (1 - 2 ** -52))).toBe(maxFinite('fp32'));
  });

  it('spacingAt(x, format) is the ulp of the binade, the subnormal step below 2^emin', () => {
    expect(spacingAt(1, 'fp16')).toBe(2 ** -10);
    expect(spacingAt(2048, 'fp16')).toBe(2);
    expect(spacingAt(1e-7, 'fp16')).toBe(2 ** -24);
    expect(spacingAt(300, 'bf16')).toBe(2);
    expect(spacingAt(2 ** 24, 'fp32')).toBe(2);
    expect(binaryExponent(5e-324)).toBe(-1074);
    expect(binaryExponent(0.75)).toBe(-1);
  });
});

describe('float-format: roundToFormat against outside references', () => {
  const inputs = binary32Inputs(120000, 20240611);

  it('roundToFormat(x, "fp16") agrees with @petamoriken/float16 f16round on 120,000 binary32 inputs', () => {
    expect(inputs.length).toBeGreaterThanOrEqual(100000);
    let subnormals = 0;
    let overflows = 0;
    for (const x of inputs) {
      const ours = roundToFormat(x, 'fp16');
      const theirs = f16round(x);
      if (!Object.is(ours, theirs))
        throw new Error(`fp16 mismatch at ${x}: ours ${ours}, library ${theirs}`);
      if (ours !== 0 && Math.abs(ours) < 2 ** -14) subnormals++;
      if (!Number.isFinite(ours)) overflows++;
    }
    // the sample must actually reach both ends of the format
    expect(subnormals).toBeGreaterThan(1000);
    expect(overflows).toBeGreaterThan(1000);
  });

  it('roundToFormat(x, "bf16") agrees bit for bit with round-to-nearest-even on the top 16 bits of binary32', () => {
    for (const x of inputs) {
      const ours = roundToFormat(x, 'bf16');
      const reference = bf16FromBinary32(x);
      if (!Object.is(ours, reference))
        throw new Error(`bf16 mismatch at ${x}: ours ${ours}, bit trick ${reference}`);
    }
  });

  it('roundToFormat(x, "fp32") is Math.fround (ECMA-262: binary64 to binary32, ties to even)', () => {
    const next = rng(7);
    for (let n = 0; n < 20000; n++) {
      const x = (next() - 0.5) * 2 ** Math.floor(next() * 300 - 150);
      expect(Object.is(roundToFormat(x, 'fp32'), Math.fround(x))).toBe(true);
    }
  });

  it('roundToFormat rounds binary64 once: a constructed tie shows double rounding through binary32 differs', () => {
    // x = 1 + 2^-8 + 2^-30 (binary64). In bfloat16 (8 bits) the candidates are 1 and 1 + 2^-7;
    // x sits just above their midpoint 1 + 2^-8, so single rounding goes up. Through binary32
    // first, the 2^-30 is rounded away (binary32 keeps 23 fraction bits), leaving the exact
    // midpoint, which ties to even: 1.
    const x = 1 + 2 ** -8 + 2 ** -30;
    expect(roundToFormat(x, 'bf16')).toBe(1 + 2 ** -7);
    expect(bf16FromBinary32(Math.fround(x))).toBe(1);
    // the same for binary16 (11 bits): midpoint of 1 and 1 + 2^-10 is 1 + 2^-11
    const y = 1 + 2 ** -11 + 2 ** -30;
    expect(roundToFormat(y, 'fp16')).toBe(1 + 2 ** -10);
    expect(roundToFormat(Math.fround(y), 'fp16')).toBe(1);
    // the library, fed binary64 directly, also rounds once here
    expect(f16round(y)).toBe(1 + 2 ** -10);
  });

  it('roundToFormat keeps NaN, ±0 and ±Infinity', () => {
    for (const f of ['fp32', 'bf16', 'fp16'] as const) {
      expect(roundToFormat(NaN, f)).toBeNaN();
      expect(Object.is(roundToFormat(-0, f), -0)).toBe(true);
      expect(roundToFormat(Infinity, f)).toBe(Infinity);
      expect(roundToFormat(-Infinity, f)).toBe(-Infinity);
    }
  });
});
