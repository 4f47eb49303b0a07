import type { MetricPath } from '../metrics/types.js';
import { formatBytes, formatCount, formatInteger, formatNumber, formatTokens } from './units.js';

type Kind = 'tokens' | 'bytes' | 'count' | 'large' | 'ratio' | 'radians' | 'share' | 'flop';

const KIND: Partial<Record<string, Kind>> = {
  declaredSpan: 'tokens',
  trainedSpan: 'tokens',
  servedSpan: 'tokens',
  evaluationSpan: 'tokens',
  reach: 'tokens',
  tunedSpan: 'tokens',
  bucketHorizon: 'tokens',
  scalingCover: 'tokens',
  headroom: 'tokens',
  extensionRatio: 'ratio',
  fastestWavelength: 'ratio',
  slowestWavelength: 'ratio',
  unturnedPairs: 'count',
  exposedPairs: 'count',
  separationFloor: 'ratio',
  separationFloorOffset: 'tokens',
  discriminationSpan: 'tokens',
  attentionScale: 'ratio',
  alibiHorizon: 'tokens',
  receptiveField: 'tokens',
  positionShare: 'share',
  params: 'large',
  visionParams: 'large',
  activeParams: 'large',
  nonEmbeddingParams: 'large',
  weightBytes: 'bytes',
  cachePerTokenBytes: 'bytes',
  cacheBytesAtSpan: 'bytes',
  memoryBytes: 'bytes',
  fitSequences: 'count',
  flopsPerToken: 'flop',
  tokenBudget: 'tokens',
  devices: 'count',
  kvHeadsPerDevice: 'count',
  weightBytesPerDevice: 'bytes',
  cachePerTokenBytesPerDevice: 'bytes',
  memoryBytesPerDevice: 'bytes',
  positionExactLimit: 'tokens',
  collidingPositions: 'count',
  angleErrorMax: 'radians',
  overflowPosition: 'tokens',
  blurredPairs: 'count',
};

function kindOf(metric: MetricPath): Kind {
  const name = metric.startsWith('precision.') ? metric.split('.')[2]! : metric;
  return KIND[name] ?? 'ratio';
}

/** One minus sign in every report: U+2212, never the hyphen. */
export const MINUS = '\u2212';

/**
 * radians: an angle error as a phase. An error is only meaningful modulo 2π, and once it can
 * reach π the rounded angle can land anywhere on the circle: the phase is lost (IEEE 754 rounding
 * of p·θ, see docs/metrics.md `angleErrorMax`).
 */
export function phaseLost(error: number | null): boolean {
  return error !== null && error >= Math.PI;
}

/** A metric value in the unit people read it in: tokens with k/M, bytes in GiB, counts with separators. */
export function formatMetric(metric: MetricPath, value: number | null): string {
  return plainMetric(metric, value).replace(/-/g, MINUS);
}

function grouped(value: number): string {
  // Four significant digits, with separators once the number has more than four digits.
  const rounded = Number(value.toPrecision(4));
  return Math.abs(rounded) >= 1000
    ? rounded.toLocaleString('en-US', { maximumFractionDigits: 0 })
    : String(rounded);
}

function plainMetric(metric: MetricPath, value: number | null): string {
  if (value === null) return '—';
  switch (kindOf(metric)) {
    case 'tokens':
      return formatTokens(value);
    case 'bytes':
      return formatBytes(value);
    case 'count':
      return formatInteger(value);
    case 'large':
      return formatCount(value);
    case 'flop':
      return formatCount(value);
    case 'share':
      return `${formatNumber(value * 100, 3)} %`;
    case 'radians':
      return phaseLost(value)
        ? 'phase lost (error ≥ π)'
        : `${formatNumber(value % (2 * Math.PI), 3)} rad`;
    default:
      return Math.abs(value) >= 1000 && Math.abs(value) < 1e9
        ? grouped(value)
        : formatNumber(value);
  }
}

/** A signed change in the metric's unit, with the percentage when defined. */
export function formatChange(
  metric: MetricPath,
  change: number | null,
  pct: number | null,
): string {
  if (change === null) return '—';
  if (change === 0) return '0';
  const sign = change > 0 ? '+' : MINUS;
  const magnitude = formatMetric(metric, Math.abs(change)).replace(/ \(\d+[kM]\)$/, '');
  return pct === null
    ? `${sign}${magnitude}`
    : `${sign}${magnitude} (${sign}${formatNumber(Math.abs(pct), 3)} %)`;
}

/** The change column of a delta row: none when an angle error is a lost phase on either side. */
export function formatDeltaChange(delta: {
  metric: MetricPath;
  base: number | null;
  head: number | null;
  change: number | null;
  changePct: number | null;
}): string {
  if (kindOf(delta.metric) === 'radians' && (phaseLost(delta.base) || phaseLost(delta.head)))
    return '—';
  return formatChange(delta.metric, delta.change, delta.changePct);
}
