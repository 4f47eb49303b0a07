import type { MetricPath } from '../metrics/types.js';
import { formatBytes, formatCount, formatInteger, formatNumber, formatTokens } from '../units.js';

type Kind = 'tokens' | 'bytes' | 'count' | 'large' | 'ratio' | 'radians' | 'share' | 'flop';

const KIND: Partial<Record<string, Kind>> = {
  declaredSpan: 'tokens', trainedSpan: 'tokens', servedSpan: 'tokens', evaluationSpan: 'tokens', reach: 'tokens', tunedSpan: 'tokens', bucketHorizon: 'tokens',
  scalingCover: 'tokens', headroom: 'tokens', extensionRatio: 'ratio', fastestWavelength: 'ratio',
  slowestWavelength: 'ratio', unturnedPairs: 'count', exposedPairs: 'count', separationFloor: 'ratio',
  separationFloorOffset: 'tokens', discriminationSpan: 'tokens', attentionScale: 'ratio', alibiHorizon: 'tokens',
  receptiveField: 'tokens', positionShare: 'share', params: 'large', visionParams: 'large', activeParams: 'large',
  nonEmbeddingParams: 'large', weightBytes: 'bytes', cachePerTokenBytes: 'bytes', cacheBytesAtSpan: 'bytes',
  memoryBytes: 'bytes', fitSequences: 'count', flopsPerToken: 'flop', tokenBudget: 'tokens',
  devices: 'count', kvHeadsPerDevice: 'count', weightBytesPerDevice: 'bytes', cachePerTokenBytesPerDevice: 'bytes',
  memoryBytesPerDevice: 'bytes',
  positionExactLimit: 'tokens', collidingPositions: 'count', angleErrorMax: 'radians', overflowPosition: 'tokens',
  blurredPairs: 'count',
};

function kindOf(metric: MetricPath): Kind {
  const name = metric.startsWith('precision.') ? metric.split('.')[2]! : metric;
  return KIND[name] ?? 'ratio';
}

/** A metric value in the unit people read it in: tokens with k/M, bytes in GiB, counts with separators. */
export function formatMetric(metric: MetricPath, value: number | null): string {
  if (value === null) return '—';
  switch (kindOf(metric)) {
    case 'tokens': return formatTokens(value);
    case 'bytes': return formatBytes(value);
    case 'count': return formatInteger(value);
    case 'large': return formatCount(value);
    case 'flop': return formatCount(value);
    case 'share': return `${formatNumber(value * 100, 3)} %`;
    case 'radians': return `${formatNumber(value, 3)} rad`;
    default: return formatNumber(value);
  }
}

/** A signed change in the metric's unit, with the percentage when defined. */
export function formatChange(metric: MetricPath, change: number | null, pct: number | null): string {
  if (change === null) return '—';
  if (change === 0) return '0';
  const sign = change > 0 ? '+' : '−';
  const magnitude = formatMetric(metric, Math.abs(change)).replace(/ \(\d+[kM]\)$/, '');
  return pct === null ? `${sign}${magnitude}` : `${sign}${magnitude} (${sign}${formatNumber(Math.abs(pct), 3)} %)`;
}
