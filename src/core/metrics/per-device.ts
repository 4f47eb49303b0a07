/**
 * Serving across devices (docs/metrics.md, "Serving across devices"; common practice): one replica
 * spans `devices = t·p` devices, `t` tensor-parallel ranks each holding `ceil(kvHeads/t)` key/value
 * heads of every layer of its stage (Ainslie et al. 2023 for key/value heads shared by query
 * heads), `p` pipeline stages each holding `ceil(layers/p)` layers. Weights split evenly.
 */
import type { ModelSpec } from '../model.js';
import { cacheLayerGroups, type CacheLayerGroup } from './kv-cache.js';
import { positiveCount } from './sizes.js';

/** Tensor and pipeline degree when the serving block states none (default: `1` each). */
export const DEFAULT_PARALLEL_DEGREE = 1;

export interface ParallelDegrees {
  /** Tensor-parallel degree. */
  t: number;
  /** Pipeline-parallel degree. */
  p: number;
}

/** count: `t` and `p` in force (default `1`); null when one is stated but not a positive whole number. */
export function parallelDegrees(spec: ModelSpec): ParallelDegrees | null {
  const stated = (x: number | null | undefined) =>
    x === null || x === undefined ? DEFAULT_PARALLEL_DEGREE : positiveCount(x);
  const t = stated(spec.serving?.tensorParallel);
  const p = stated(spec.serving?.pipelineParallel);
  return t === null || p === null ? null : { t, p };
}

/** count: `devices = t·p`. */
export function deviceCount(spec: ModelSpec): number | null {
  const d = parallelDegrees(spec);
  return d === null || !Number.isSafeInteger(d.t * d.p) ? null : d.t * d.p;
}

/** count: `kvHeadsPerDevice = ceil(kvHeads / t)`. */
export function kvHeadsPerDevice(spec: ModelSpec): number | null {
  const d = parallelDegrees(spec);
  const kv = positiveCount(spec.kvHeads);
  return d === null || kv === null ? null : Math.ceil(kv / d.t);
}

/** bytes: `weightBytesPerDevice = weightBytes / (t·p)` (even split). */
export function weightBytesPerDevice(spec: ModelSpec, weights: number | null): number | null {
  const devices = deviceCount(spec);
  return devices === null || weights === null ? null : weights / devices;
}

/** bytes per token a group's layers each hold at span `span` (per token when `span` is null). */
function tokensHeld(group: CacheLayerGroup, span: number | null): number {
  if (span === null) return group.window === 0 ? 0 : 1;
  return group.window === null ? span : Math.min(span, group.window);
}

/**
 * bytes: the cache one device holds for one sequence over the busiest pipeline stage: the
 * `ceil(layers/p)` layers holding the most (with layers alike, any stage), each
 * `2·ceil(kvHeads/t)·headDim·bytes` per token times `min(T, window)` tokens; per token when
 * `span` is null. Null for degenerate input.
 */
function stageCache(spec: ModelSpec, span: number | null): number | null {
  const d = parallelDegrees(spec);
  const layers = positiveCount(spec.layers);
  if (d === null || layers === null) return null;
  const groups = cacheLayerGroups(spec, d.t);
  if (groups === null) return null;
  let left = Math.ceil(layers / d.p);
  let total = 0;
  const heaviest = [...groups].sort(
    (a, b) => b.tokenBytes * tokensHeld(b, span) - a.tokenBytes * tokensHeld(a, span),
  );
  for (const group of heaviest) {
    const taken = Math.min(left, group.layers);
    total += taken * group.tokenBytes * tokensHeld(group, span);
    left -= taken;
  }
  return Number.isFinite(total) ? total : null;
}

/** bytes: `cachePerTokenBytesPerDevice`: Σ over the layers of one stage of `2·kvHeadsPerDevice·headDim·bytes`. */
export function cachePerTokenBytesPerDevice(spec: ModelSpec): number | null {
  return stageCache(spec, null);
}

/** bytes: cache per sequence per device at span `T`: Σ over the busiest stage's layers of per-token bytes times `min(T, window)`. */
export function cachePerSequencePerDevice(spec: ModelSpec, span: number | null): number | null {
  const t = positiveCount(span);
  return t === null ? null : stageCache(spec, t);
}

/** bytes: `memoryBytesPerDevice = weightBytesPerDevice + sequences · cache per sequence per device`. */
export function memoryBytesPerDevice(
  weights: number | null,
  perSequence: number | null,
  sequences: number | null,
): number | null {
  if (weights === null || perSequence === null || sequences === null) return null;
  const m = weights + sequences * perSequence;
  return Number.isFinite(m) ? m : null;
}

/**
 * count: `fitSequences` with devices: `floor((usable - weightBytesPerDevice) / cache per sequence
 * per device)`, `usable` from `usableDeviceBytes`; negative when the weights alone do not fit.
 * Null without a budget or with an empty cache.
 */
export function fitSequencesPerDevice(
  usable: number | null,
  weights: number | null,
  perSequence: number | null,
): number | null {
  if (usable === null || weights === null || perSequence === null || !(perSequence > 0))
    return null;
  const n = Math.floor((usable - weights) / perSequence);
  return Number.isFinite(n) ? n : null;
}

/**
 * count: tensor degrees that shard `heads` query heads and `kvHeads` key/value heads: divisors of
 * `heads` with `kvHeads % t == 0` or `t % kvHeads == 0`, ascending, at most `limit`.
 */
export function shardingDegrees(heads: number, kvHeads: number, limit = 12): number[] {
  const h = positiveCount(heads);
  const kv = positiveCount(kvHeads);
  if (h === null || kv === null || h > 2 ** 32) return [];
  const divisors: number[] = [];
  for (let d = 1; d * d <= h; d++) {
    if (h % d !== 0) continue;
    divisors.push(d);
    if (d * d !== h) divisors.push(h / d);
  }
  return divisors
    .sort((a, b) => a - b)
    .filter((t) => shards(h, kv, t))
    .slice(0, limit);
}

/** Whether tensor degree `t` shards the heads: `heads % t == 0`, and `kvHeads` and `t` with one dividing the other. */
export function shards(heads: number, kvHeads: number, t: number): boolean {
  return heads % t === 0 && (kvHeads % t === 0 || t % kvHeads === 0);
}
