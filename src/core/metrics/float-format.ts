/**
 * Binary floating-point formats positions and angles are computed in: IEEE 754-2008 binary32
 * (`fp32`) and binary16 (`fp16`), and bfloat16 (`bf16`: 8 significant bits, binary32's exponent
 * range). Everything here is exact: no rounding through another format.
 */
import { elementAt } from '../element-at.js';
import type { FloatFormat } from '../model.js';

interface FormatShape {
  /** Significant bits including the implicit one (IEEE 754-2008 `p`). */
  bits: number;
  /** Exponent of the smallest normal number (`emin`). */
  minExponent: number;
  /** Exponent of the largest finite number (`emax`). */
  maxExponent: number;
}

const SHAPES: Record<FloatFormat, FormatShape> = {
  fp32: { bits: 24, minExponent: -126, maxExponent: 127 },
  fp16: { bits: 11, minExponent: -14, maxExponent: 15 },
  bf16: { bits: 8, minExponent: -126, maxExponent: 127 },
};

/** value: largest finite number `(2 - 2^(1-p)) 2^emax` (binary16 65504, bfloat16 ≈ 3.3895e38). */
const MAX_FINITE: Record<FloatFormat, number> = {
  fp32: (2 - 2 ** -23) * 2 ** 127,
  fp16: (2 - 2 ** -10) * 2 ** 15,
  bf16: (2 - 2 ** -7) * 2 ** 127,
};

/** count: significant bits `p` of the format (IEEE 754-2008 Table 3.5; bfloat16: 8). */
export function significantBits(format: FloatFormat): number {
  return SHAPES[format].bits;
}

/** exponent: smallest normal exponent `emin` (binary32 and bfloat16 -126, binary16 -14). */
export function minNormalExponent(format: FloatFormat): number {
  return SHAPES[format].minExponent;
}

/** tokens: `2^p`, the largest n with every integer in [0, n] exact (IEEE 754-2008: 2^24, 2^11; bfloat16 2^8). */
export function positionExactLimit(format: FloatFormat): number {
  return 2 ** SHAPES[format].bits;
}

/**
 * value: smallest magnitude that rounds to infinity under round to nearest, ties to even,
 * `(2 - 2^-p) 2^emax`: halfway past the largest finite number, whose last bit is odd, so the
 * tie goes up (IEEE 754-2008 §7.4; binary16 65520).
 */
export function overflowThreshold(format: FloatFormat): number {
  const { bits, maxExponent } = SHAPES[format];
  return (2 - 2 ** -bits) * 2 ** maxExponent;
}

// 2^k for whole k in [-POW2_BIAS, POW2_BIAS], each exact (0 below 2^-1074): a table read is
// several times faster than `2 ** k` in the rounding loops of the number-format scans.
const POW2_BIAS = 1100;
const POW2 = Float64Array.from({ length: 2 * POW2_BIAS + 1 }, (_, i) => 2 ** (i - POW2_BIAS));

// Scratch view of one binary64 for reading its exponent field; endianness is detected once.
const scratch = new Float64Array(1);
const words = new Uint32Array(scratch.buffer);
const HIGH = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;

/** exponent: `floor(log2 |x|)` exactly, for finite non-zero binary64 `x` (subnormals included). */
export function binaryExponent(x: number): number {
  scratch[0] = x;
  const biased = (elementAt(words, HIGH) >>> 20) & 0x7ff;
  if (biased !== 0) return biased - 1023;
  // binary64 subnormal: scale into the normal range (exact) and read again
  scratch[0] = x * 2 ** 64;
  return ((elementAt(words, HIGH) >>> 20) & 0x7ff) - 1023 - 64;
}

/**
 * value: distance between neighbouring numbers of the format around `x`, `2^(max(e, emin) - p + 1)`
 * with `e = floor(log2 |x|)` (IEEE 754-2008 §3.3); the subnormal spacing below `2^emin`.
 */
export function spacingAt(x: number, format: FloatFormat): number {
  const { bits, minExponent } = SHAPES[format];
  const e = x === 0 ? minExponent : binaryExponent(x);
  return elementAt(POW2, POW2_BIAS + Math.max(e, minExponent) - bits + 1);
}

/**
 * value: `fl_D(x)`, `x` rounded once to the nearest number of format D, ties to even, with
 * subnormals and overflow to ±Infinity (IEEE 754-2008 §4.3.1, §7.4). Rounds straight from the
 * binary64 value: rounding through binary32 first would be double rounding.
 */
export function roundToFormat(x: number, format: FloatFormat): number {
  // Math.fround is binary64 → binary32 round to nearest, ties to even (ECMA-262 §21.3.2.17).
  if (format === 'fp32') return Math.fround(x);
  if (x === 0 || !Number.isFinite(x)) return x;
  const { bits, minExponent } = SHAPES[format];
  const a = Math.abs(x);
  const q = Math.max(binaryExponent(a), minExponent) - bits + 1;
  // a / 2^q has at most `bits` integer bits; scaling by a power of two is exact here
  const scaled = a * elementAt(POW2, POW2_BIAS - q);
  let r = Math.floor(scaled);
  const rest = scaled - r;
  if (rest > 0.5 || (rest === 0.5 && r % 2 === 1)) r += 1;
  let y = r * elementAt(POW2, POW2_BIAS + q);
  if (y > MAX_FINITE[format]) y = Infinity;
  return x < 0 ? -y : y;
}
