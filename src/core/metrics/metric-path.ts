import { FLOAT_FORMATS } from '../model.js';
import type { Metrics, MetricPath } from './types.js';
import { PRECISION_METRICS, SCALAR_METRICS } from './types.js';

/** Every name a policy limit or a report row can use, scalar metrics first. */
export const METRIC_PATHS: readonly MetricPath[] = [
  ...SCALAR_METRICS,
  ...FLOAT_FORMATS.flatMap((format) =>
    PRECISION_METRICS.map((name) => `precision.${format}.${name}` as MetricPath),
  ),
];

const KNOWN = new Set<string>(METRIC_PATHS);

export function isMetricPath(name: string): name is MetricPath {
  return KNOWN.has(name);
}

/** The value of one metric, or null when it does not apply. */
export function metricValue(metrics: Metrics, path: MetricPath): number | null {
  if (path.startsWith('precision.')) {
    const [, format, name] = path.split('.') as [
      string,
      keyof Metrics['precision'],
      keyof Metrics['precision']['fp32'],
    ];
    return metrics.precision[format]?.[name] ?? null;
  }
  const value = metrics[path as keyof Metrics];
  return typeof value === 'number' ? value : null;
}

/**
 * Spec fields a metric follows from, most direct first: where an annotation about the metric
 * goes when the limit itself has no line in the model file.
 */
export const METRIC_SOURCES: Partial<Record<string, string[]>> = {
  declaredSpan: ['declaredSpan'],
  trainedSpan: ['trainedSpan', 'position.scaling.originalSpan', 'declaredSpan'],
  servedSpan: ['serving.span'],
  reach: ['position.scaling.factor', 'trainedSpan', 'declaredSpan'],
  scalingCover: ['position.scaling.factor', 'position.scaling.originalSpan'],
  headroom: ['serving.span', 'declaredSpan', 'position.scaling.factor'],
  extensionRatio: ['serving.span', 'declaredSpan', 'trainedSpan'],
  separationFloor: ['position.base', 'serving.span', 'declaredSpan'],
  discriminationSpan: ['position.base', 'position.scaling.factor'],
  unturnedPairs: ['position.base', 'trainedSpan'],
  exposedPairs: ['position.base', 'serving.span', 'declaredSpan'],
  params: ['layers', 'hidden', 'ffn', 'experts.total', 'experts.width', 'vocab'],
  weightBytes: ['quantization', 'dtypes.weights', 'layers', 'hidden'],
  cachePerTokenBytes: ['kvHeads', 'latent.kvRank', 'headDim', 'dtypes.cache', 'layers'],
  cacheBytesAtSpan: [
    'serving.sequences',
    'serving.span',
    'dtypes.cache',
    'kvHeads',
    'latent.kvRank',
    'layerTypes',
    'slidingWindow',
  ],
  memoryBytes: ['serving.sequences', 'serving.span', 'dtypes.cache', 'dtypes.weights'],
  fitSequences: ['serving.sequences', 'serving.deviceGiB', 'serving.span', 'dtypes.cache'],
  flopsPerToken: ['serving.span', 'layers', 'hidden'],
  tokenBudget: ['serving.outputTokens', 'serving.promptTokens', 'serving.span'],
  devices: ['serving.tensorParallel', 'serving.pipelineParallel'],
  kvHeadsPerDevice: ['serving.tensorParallel', 'kvHeads'],
  weightBytesPerDevice: [
    'serving.tensorParallel',
    'serving.pipelineParallel',
    'quantization',
    'dtypes.weights',
  ],
  cachePerTokenBytesPerDevice: [
    'serving.tensorParallel',
    'serving.pipelineParallel',
    'kvHeads',
    'dtypes.cache',
  ],
  memoryBytesPerDevice: [
    'serving.sequences',
    'serving.span',
    'serving.tensorParallel',
    'serving.pipelineParallel',
  ],
};
