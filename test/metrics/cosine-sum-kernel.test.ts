import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  COSINE_BLOCK,
  fillCosineSums,
  planCosineSums,
  type CosinePlan,
} from '../../src/core/metrics/cosine-sum-blocks.js';
import {
  cosineKernel,
  createCosineKernel,
  type CosineKernel,
} from '../../src/core/metrics/cosine-sum-kernel.js';
import { geometricFrequencies } from '../../src/core/metrics/frequencies.js';
// @ts-expect-error: a plain ES module script without types
import * as generator from '../../scripts/generate-kernel.mjs';

const { KERNEL_OUT, generateKernel } = generator as {
  KERNEL_OUT: string;
  generateKernel: (root: string) => Promise<string>;
};
const ROOT = resolve(import.meta.dirname, '../..');

// The WebAssembly kernel must give the TypeScript loop's values bit for bit: both round every
// add, subtract and multiply of binary64 numbers to nearest, ties to even (IEEE 754-2019
// roundTiesToEven; WebAssembly Core Specification 2.0, 2022, numerics of f64 and f64x2; ECMA-262,
// the Number type), and the kernel adds in the loop's order. So the reference here is the loop
// itself (`kernel` null), compared with Object.is: equal values, the sign of zero included.

/** `fillCosineSums` into a buffer of `length` slots filled with a sentinel, through `kernel`. */
function filled(
  plan: CosinePlan,
  k0: number,
  n: number,
  kernel: CosineKernel | null,
  length = COSINE_BLOCK + 3,
): Float64Array {
  const buf = new Float64Array(length).fill(-7.25);
  fillCosineSums(plan, k0, n, buf, kernel);
  return buf;
}

/** Indexes where the two buffers differ (Object.is), at most the first five. */
function differences(a: Float64Array, b: Float64Array): number[] {
  const out: number[] = [];
  for (let j = 0; j < a.length && out.length < 5; j++) if (!Object.is(a[j], b[j])) out.push(j);
  return out;
}

const kernel = cosineKernel();

describe('the WebAssembly cosine-sum kernel', () => {
  it('is made on Node (the fast path the gate takes), once per process', () => {
    expect(kernel).not.toBeNull();
    expect(cosineKernel()).toBe(kernel);
  });

  it(`${KERNEL_OUT} is what scripts/generate-kernel.mjs assembles from the .wat now`, async () => {
    // Stale after an edit of the .wat: `node scripts/generate-kernel.mjs` (or `npm run build`) writes it again.
    const written = readFileSync(resolve(ROOT, KERNEL_OUT), 'utf8');
    expect(written === (await generateKernel(ROOT)), `${KERNEL_OUT} is stale`).toBe(true);
  });

  it('fills the same values as the TypeScript loop, bit for bit, for any pairs, offsets and block length', () => {
    // Frequencies: the geometric series of rotary codes (Su et al. 2021, RoFormer, Eq. 15) over
    // bases from 1.01 to 1e9, or arbitrary angles in (0, π]; pair counts cover every remainder
    // modulo 8 and 4 (the kernel's groups); offsets reach 2^31 (past 2^29 turns the seeds take
    // Math.cos unreduced).
    const theta = fc.oneof(
      fc
        .tuple(fc.double({ min: 1.01, max: 1e9, noNaN: true }), fc.integer({ min: 1, max: 160 }))
        .map(([base, pairs]) => geometricFrequencies(base, 2 * pairs)!),
      fc
        .array(fc.double({ min: 1e-9, max: Math.PI, noNaN: true }), { minLength: 1, maxLength: 70 })
        .map((xs) => Float64Array.from(xs)),
    );
    fc.assert(
      fc.property(
        theta,
        fc.integer({ min: 1, max: 2 ** 31 }),
        fc.integer({ min: 1, max: COSINE_BLOCK }),
        (t, k0, n) => {
          const plan = planCosineSums(t);
          const viaLoop = filled(plan, k0, n, null);
          const viaKernel = filled(plan, k0, n, kernel);
          expect(differences(viaKernel, viaLoop)).toEqual([]);
          // Nothing past the n offsets is written by either.
          expect([viaKernel[n], viaLoop[n]]).toEqual([-7.25, -7.25]);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('gives each plan its own values when fills of different plans alternate', () => {
    // The kernel keeps a plan's 2cos θ in its memory while the same plan fills again.
    const a = planCosineSums(geometricFrequencies(10000, 128)!);
    const b = planCosineSums(geometricFrequencies(500000, 128)!);
    const c = planCosineSums(geometricFrequencies(10000, 74)!);
    for (const [plan, k0] of [
      [a, 1],
      [b, 1],
      [a, 513],
      [c, 99_000],
      [a, 1025],
      [b, 2 ** 20],
    ] as const) {
      expect(
        differences(filled(plan, k0, COSINE_BLOCK, kernel), filled(plan, k0, COSINE_BLOCK, null)),
      ).toEqual([]);
    }
  });

  it('grows its memory for a code with more pairs than its first page holds', () => {
    // 12,000 pairs: three arrays of 96 KB each, past the module's one 64 KiB page.
    const plan = planCosineSums(geometricFrequencies(1e6, 24_000)!);
    const own = createCosineKernel()!;
    expect(differences(filled(plan, 4097, 300, own), filled(plan, 4097, 300, null))).toEqual([]);
    // A small code after the growth still fills right (the lanes are laid out again).
    const small = planCosineSums(geometricFrequencies(10000, 6)!);
    expect(differences(filled(small, 7, 64, own), filled(small, 7, 64, null))).toEqual([]);
  });

  it('falls back to the TypeScript loop when WebAssembly cannot make the module or the kernel declines', () => {
    expect(createCosineKernel(new Uint8Array([0, 97, 115, 109, 9, 9]))).toBeNull();
    const plan = planCosineSums(geometricFrequencies(10000, 64)!);
    const declining: CosineKernel = { fill: () => false };
    const viaFallback = filled(plan, 12_345, 200, declining);
    expect(differences(viaFallback, filled(plan, 12_345, 200, null))).toEqual([]);
    // The fill really ran: the sum at offset k is Σ cos(k θ_i) within the block bound, not the sentinel.
    const exact = Array.from(geometricFrequencies(10000, 64)!).reduce(
      (s, t) => s + Math.cos(12_345 * t),
      0,
    );
    expect(Math.abs(viaFallback[0]! - exact)).toBeLessThan(1e-9);
  });

  it('refuses arrays shorter than the pairs or the block it is asked to fill', () => {
    const twoCos = new Float64Array(8).fill(1.5);
    expect(() =>
      kernel!.fill(twoCos, new Float64Array(8), new Float64Array(7), 4, new Float64Array(4)),
    ).toThrow(RangeError);
    expect(() =>
      kernel!.fill(twoCos, new Float64Array(8), new Float64Array(8), 5, new Float64Array(4)),
    ).toThrow(RangeError);
  });
});
