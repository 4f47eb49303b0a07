/**
 * The cosine-sum fill's inner loop run as WebAssembly (cosine-sum-kernel.wat, assembled into
 * cosine-sum-kernel.generated.ts by scripts/generate-kernel.mjs): the same recurrence and the same
 * sums in the same order as the TypeScript loop of `fillCosineSums` (cosine-sum-blocks.ts), so the
 * values are identical, not close. It exists for speed only: the loop is most of a gate run's
 * computing, and as JavaScript it runs unoptimized (every intermediate double boxed) for its first
 * ~100 ms of each process, while as WebAssembly it runs compiled from the first call (measured
 * in docs/performance.md).
 *
 * One instance per process, made on first use; its memory holds the arrays of the fill in
 * progress and nothing between calls that a later call relies on without checking (the `2cos θ`
 * array is kept while the same plan's array is passed again, see `loaded`). Where WebAssembly is
 * missing or the module cannot be made, `cosineKernel()` is null and the TypeScript loop runs.
 */
import { COSINE_KERNEL_WASM } from './cosine-sum-kernel.generated.js';

/** The kernel's exported function: see the layout described in cosine-sum-kernel.wat. */
type FillExport = (
  p8: number,
  p4: number,
  p: number,
  n: number,
  twoCos: number,
  now: number,
  before: number,
  out: number,
) => void;

export interface CosineKernel {
  /**
   * `out[j] = Σ_i c_i(j)` for `j < n`, where `c_i(0) = seedNow[i]`, `c_i(-1) = seedBefore[i]` and
   * `c_i(j+1) = twoCos[i] c_i(j) - c_i(j-1)`, summed as `fillCosineSums` sums them. False (and
   * `out` untouched) when its memory cannot hold the arrays.
   */
  fill(
    twoCos: Float64Array,
    seedNow: Float64Array,
    seedBefore: Float64Array,
    n: number,
    out: Float64Array,
  ): boolean;
}

const PAGE_BYTES = 65_536;

/**
 * Stores `src` at `heap[base..base + P)` in the kernel's lane order: each group of eight pairs
 * as 0 4 1 5 2 6 3 7, then one group of four as 0 2 1 3, then the rest in order.
 */
function storeLanes(heap: Float64Array, base: number, src: Float64Array, P: number): void {
  const p8 = P - (P % 8);
  for (let g = 0; g < p8; g += 8) {
    for (let k = 0; k < 4; k++) {
      heap[base + g + 2 * k] = src[g + k]!;
      heap[base + g + 2 * k + 1] = src[g + k + 4]!;
    }
  }
  let i = p8;
  if (i + 4 <= P) {
    heap[base + i] = src[i]!;
    heap[base + i + 1] = src[i + 2]!;
    heap[base + i + 2] = src[i + 1]!;
    heap[base + i + 3] = src[i + 3]!;
    i += 4;
  }
  for (; i < P; i++) heap[base + i] = src[i]!;
}

/** A kernel over a module made from `bytes`; null when WebAssembly cannot make it. */
export function createCosineKernel(
  bytes: Uint8Array<ArrayBuffer> = COSINE_KERNEL_WASM,
): CosineKernel | null {
  let memory: WebAssembly.Memory;
  let fill: FillExport;
  try {
    const instance = new WebAssembly.Instance(new WebAssembly.Module(bytes), {});
    memory = instance.exports.memory as WebAssembly.Memory;
    fill = instance.exports.fill as FillExport;
    if (!(memory instanceof WebAssembly.Memory) || typeof fill !== 'function') return null;
  } catch {
    return null;
  }
  let heap = new Float64Array(memory.buffer);
  // The `2cos θ` array whose lanes are in memory now, and the stride they were stored with.
  let loaded: Float64Array | null = null;
  let loadedStride = -1;
  return {
    fill(twoCos, seedNow, seedBefore, n, out) {
      const P = twoCos.length;
      // Checked once, so the stores below read inside the arrays (as the TypeScript loop does).
      if (seedNow.length < P || seedBefore.length < P || out.length < n)
        throw new RangeError(`the kernel's arrays are shorter than ${P} pairs or ${n} offsets`);
      // Each array starts on a 16-byte boundary, where the kernel's vector loads are aligned.
      const stride = P + (P % 2);
      const words = 3 * stride + n;
      if (heap.length < words) {
        try {
          memory.grow(Math.ceil((words * 8 - memory.buffer.byteLength) / PAGE_BYTES));
        } catch {
          return false;
        }
        heap = new Float64Array(memory.buffer);
        loaded = null;
      }
      if (loaded !== twoCos || loadedStride !== stride) {
        storeLanes(heap, 0, twoCos, P);
        loaded = twoCos;
        loadedStride = stride;
      }
      storeLanes(heap, stride, seedNow, P);
      storeLanes(heap, 2 * stride, seedBefore, P);
      const at = 3 * stride;
      heap.fill(0, at, at + n);
      fill(P - (P % 8), P - (P % 4), P, n, 0, stride * 8, 2 * stride * 8, at * 8);
      out.set(heap.subarray(at, at + n));
      return true;
    },
  };
}

let shared: CosineKernel | null | undefined;

/** The process's kernel, made on first use; null where WebAssembly cannot run it. */
export function cosineKernel(): CosineKernel | null {
  if (shared === undefined) shared = createCosineKernel();
  return shared;
}
