/**
 * Every metric of the contract (docs/metrics.md), under exactly its name there. `null` where a
 * metric does not apply or its inputs are degenerate.
 */
import type { FloatFormat, LayerAttention, PositionKind } from '../model.js';

export interface PrecisionMetrics {
  /** tokens: largest n with every integer in [0, n] exact in the format. */
  positionExactLimit: number | null;
  /** count: p in [1, T) with fl(p) == fl(p-1); overflowing positions count. */
  collidingPositions: number | null;
  /** radians: max |fl(fl(p) fl(θ'_i)) - p θ'_i|; null when anything overflows. */
  angleErrorMax: number | null;
  /** token: first p whose position or any angle overflows. */
  overflowPosition: number | null;
  /** count: pairs with two neighbouring positions at the same rounded angle. */
  blurredPairs: number | null;
}

/**
 * The positional metrics of one kind of decoder layer (docs/metrics.md, "Layers that differ"): its
 * attention, its position code and rotary setting. Scans over offsets (`exposedPairs`, the
 * similarity scan) run over the tokens the layer sees, `min(T, window)`; number formats over the
 * absolute positions `[0, T)`, which every layer's angles are computed at.
 */
export interface LayerKindMetrics {
  attention: LayerAttention;
  /** The layer's position code; `none` for layers without one. */
  positionCode: PositionKind;
  /** count: decoder layers of this kind. */
  layers: number;
  /** tokens: window or chunk; null for full attention. */
  window: number | null;
  /** Rotary base of these layers; null without a rotary code. */
  rotaryBase: number | null;
  /** Whether the model's context scaling applies to these layers. */
  scaled: boolean;
  /** tokens: `min(T, window)`, the offsets these layers see. */
  visibleSpan: number | null;
  fastestWavelength: number | null;
  slowestWavelength: number | null;
  unturnedPairs: number | null;
  exposedPairs: number | null;
  separationFloor: number | null;
  separationFloorOffset: number | null;
  discriminationSpan: number | null;
  precision: Record<FloatFormat, PrecisionMetrics>;
}

export interface Metrics {
  // Positional range
  declaredSpan: number | null;
  trainedSpan: number | null;
  servedSpan: number | null;
  /** `T`, the span every scan runs over (not in the contract; shown so reviewers see it). */
  evaluationSpan: number | null;
  reach: number | null;
  /** tokens: the span a scaled code was trained or tuned at, when stated; null otherwise. */
  tunedSpan: number | null;
  /** tokens: relative-bucket codes: the distance past which offsets share the last bucket. */
  bucketHorizon: number | null;
  scalingCover: number | null;
  headroom: number | null;
  extensionRatio: number | null;
  fastestWavelength: number | null;
  slowestWavelength: number | null;
  unturnedPairs: number | null;
  exposedPairs: number | null;
  separationFloor: number | null;
  separationFloorOffset: number | null;
  discriminationSpan: number | null;
  attentionScale: number | null;
  alibiSlopes: number[] | null;
  alibiHorizon: number | null;
  receptiveField: number | null;
  positionShare: number | null;
  precision: Record<FloatFormat, PrecisionMetrics>;
  // Context budget
  params: number | null;
  /**
   * count: a multimodal config's vision tower, counted apart from `params`; null without one.
   * Reported beside the contract's metrics (not in `SCALAR_METRICS`, so no policy limit names it).
   */
  visionParams: number | null;
  activeParams: number | null;
  nonEmbeddingParams: number | null;
  weightBytes: number | null;
  cachePerTokenBytes: number | null;
  cacheBytesAtSpan: number | null;
  memoryBytes: number | null;
  fitSequences: number | null;
  // Serving across devices
  devices: number | null;
  kvHeadsPerDevice: number | null;
  weightBytesPerDevice: number | null;
  cachePerTokenBytesPerDevice: number | null;
  memoryBytesPerDevice: number | null;
  flopsPerToken: number | null;
  tokenBudget: number | null;
  /** Per layer kind, when the decoder layers are not all alike (default: `null`, one kind: the top-level values). */
  layerKinds?: LayerKindMetrics[] | null;
}

/**
 * The figures of serving across devices (docs/metrics.md): the device count and the per-device
 * shares. With one device each equals its single-device figure (`per-device.ts`), so a report
 * may leave them out there. The last of `SCALAR_METRICS`.
 */
export const PER_DEVICE_METRICS = [
  'devices',
  'kvHeadsPerDevice',
  'weightBytesPerDevice',
  'cachePerTokenBytesPerDevice',
  'memoryBytesPerDevice',
] as const satisfies readonly (keyof Metrics)[];

export type PerDeviceMetric = (typeof PER_DEVICE_METRICS)[number];

/** Scalar metric names (everything but `precision` and `alibiSlopes`), in report order. */
export const SCALAR_METRICS = [
  'declaredSpan',
  'trainedSpan',
  'servedSpan',
  'evaluationSpan',
  'reach',
  'tunedSpan',
  'bucketHorizon',
  'scalingCover',
  'headroom',
  'extensionRatio',
  'fastestWavelength',
  'slowestWavelength',
  'unturnedPairs',
  'exposedPairs',
  'separationFloor',
  'separationFloorOffset',
  'discriminationSpan',
  'attentionScale',
  'alibiHorizon',
  'receptiveField',
  'positionShare',
  'params',
  'activeParams',
  'nonEmbeddingParams',
  'weightBytes',
  'cachePerTokenBytes',
  'cacheBytesAtSpan',
  'memoryBytes',
  'fitSequences',
  'flopsPerToken',
  'tokenBudget',
  ...PER_DEVICE_METRICS,
] as const satisfies readonly (keyof Metrics)[];

export type ScalarMetric = (typeof SCALAR_METRICS)[number];

export const PRECISION_METRICS = [
  'positionExactLimit',
  'collidingPositions',
  'angleErrorMax',
  'overflowPosition',
  'blurredPairs',
] as const satisfies readonly (keyof PrecisionMetrics)[];

export type PrecisionMetric = (typeof PRECISION_METRICS)[number];

/** Names a policy can put limits on: scalar metrics and `precision.<format>.<metric>`. */
export type MetricPath = ScalarMetric | `precision.${FloatFormat}.${PrecisionMetric}`;
