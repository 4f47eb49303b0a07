/**
 * The metrics a remedy search moves, computed alone: the same functions `computeMetrics` calls,
 * without the positional scans, so a search can try dozens of values in microseconds before the
 * one full proof. Each returns exactly what `computeMetrics` reports under the same name.
 */
import type { ModelSpec } from '../model.js';
import { cacheBytesAtSpan, cachePerTokenBytes, servedSequences } from '../metrics/kv-cache.js';
import { memoryBytes } from '../metrics/memory-fit.js';
import { usableDeviceBytes } from '../metrics/memory-curve.js';
import {
  cachePerSequencePerDevice,
  cachePerTokenBytesPerDevice,
  deviceCount,
  fitSequencesPerDevice,
  kvHeadsPerDevice,
  memoryBytesPerDevice,
  weightBytesPerDevice,
} from '../metrics/per-device.js';
import { storedWeightBytes } from '../metrics/quantized-weights.js';
import { frequencyPlan } from '../metrics/compute.js';
import { collidingPositions } from '../metrics/position-rounding.js';
import { extensionRatio, headroom, reach, scalingCover } from '../metrics/reach.js';
import { declaredSpan, evaluationSpan, trainedSpan } from '../metrics/spans.js';
import type { FloatFormat } from '../model.js';

/** Context-budget metrics of docs/metrics.md for `spec`. */
export interface BudgetMetrics {
  weightBytes: number | null;
  cachePerTokenBytes: number | null;
  cacheBytesAtSpan: number | null;
  memoryBytes: number | null;
  fitSequences: number | null;
  devices: number | null;
  kvHeadsPerDevice: number | null;
  weightBytesPerDevice: number | null;
  cachePerTokenBytesPerDevice: number | null;
  memoryBytesPerDevice: number | null;
}

export function budgetMetrics(spec: ModelSpec): BudgetMetrics {
  const span = evaluationSpan(spec);
  const weights = storedWeightBytes(spec);
  const cache = cacheBytesAtSpan(spec, span);
  const deviceWeights = weightBytesPerDevice(spec, weights);
  const perSequence = cachePerSequencePerDevice(spec, span);
  return {
    weightBytes: weights,
    cachePerTokenBytes: cachePerTokenBytes(spec),
    cacheBytesAtSpan: cache,
    memoryBytes: memoryBytes(weights, cache),
    fitSequences: fitSequencesPerDevice(usableDeviceBytes(spec), deviceWeights, perSequence),
    devices: deviceCount(spec),
    kvHeadsPerDevice: kvHeadsPerDevice(spec),
    weightBytesPerDevice: deviceWeights,
    cachePerTokenBytesPerDevice: cachePerTokenBytesPerDevice(spec),
    memoryBytesPerDevice: memoryBytesPerDevice(deviceWeights, perSequence, servedSequences(spec)),
  };
}

/** Range metrics of docs/metrics.md that need no scan. */
export interface RangeMetrics {
  declaredSpan: number | null;
  trainedSpan: number | null;
  evaluationSpan: number | null;
  reach: number | null;
  scalingCover: number | null;
  headroom: number | null;
  extensionRatio: number | null;
}

export function rangeMetrics(spec: ModelSpec): RangeMetrics {
  const declared = declaredSpan(spec);
  const trained = trainedSpan(spec);
  const span = evaluationSpan(spec);
  const r = reach(spec, trained, declared);
  return {
    declaredSpan: declared,
    trainedSpan: trained,
    evaluationSpan: span,
    reach: r,
    scalingCover: scalingCover(spec, trained),
    headroom: headroom(r, span),
    extensionRatio: extensionRatio(span, trained),
  };
}

/**
 * The value of `metric` for `spec` when it needs no scan, else `undefined` (the caller measures
 * in full): budget and range metrics, and `precision.<D>.collidingPositions`.
 */
export function lightMetric(spec: ModelSpec, metric: string): number | null | undefined {
  if (metric in BUDGET_NAMES) return budgetMetrics(spec)[metric as keyof BudgetMetrics];
  if (metric in RANGE_NAMES) return rangeMetrics(spec)[metric as keyof RangeMetrics];
  const colliding = /^precision\.(fp32|bf16|fp16)\.collidingPositions$/.exec(metric);
  if (colliding) {
    // Null without frequencies, as `numberFormatMetrics` reports it.
    const span = evaluationSpan(spec);
    if (span === null || frequencyPlan(spec, span, trainedSpan(spec)) === null) return null;
    return collidingPositions(colliding[1] as FloatFormat, span);
  }
  return undefined;
}

const BUDGET_NAMES = {
  weightBytes: 1,
  cachePerTokenBytes: 1,
  cacheBytesAtSpan: 1,
  memoryBytes: 1,
  fitSequences: 1,
  devices: 1,
  kvHeadsPerDevice: 1,
  weightBytesPerDevice: 1,
  cachePerTokenBytesPerDevice: 1,
  memoryBytesPerDevice: 1,
};
const RANGE_NAMES = {
  declaredSpan: 1,
  trainedSpan: 1,
  evaluationSpan: 1,
  reach: 1,
  scalingCover: 1,
  headroom: 1,
  extensionRatio: 1,
};
