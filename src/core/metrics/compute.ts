/**
 * The metric engine: every metric of the contract (shared METRICS.md) for one model spec. The
 * spec arrives with serving values from the CLI or policy merged in; documented defaults are
 * applied here; degenerate sizes give null metrics, never NaN, Infinity or an exception.
 */
import type { FloatFormat, ModelSpec } from '../model.js';
import type { Metrics, PrecisionMetrics } from './types.js';
import { alibiHorizon, alibiSlopes } from './alibi-slopes.js';
import { pairwiseAttentionFactor, scaleFrequencies, yarnAttentionScale } from './context-scaling.js';
import { flopsPerToken } from './flops.js';
import { baseFrequencies, rotaryWidth } from './frequencies.js';
import { cacheBytesAtSpan, cachePerTokenBytes, servedSequences } from './kv-cache.js';
import { fitSequences, memoryBytes, weightBytes } from './memory-fit.js';
import { numberFormatMetrics } from './number-format.js';
import { parameterCounts } from './parameter-count.js';
import { positionShare } from './position-share.js';
import { extensionRatio, headroom, reach, scalingCover } from './reach.js';
import { receptiveField } from './receptive-field.js';
import { positiveCount } from './sizes.js';
import { similarityScan } from './similarity-scan.js';
import { bucketHorizon, declaredSpan, evaluationSpan, servedSpan, trainedSpan, tunedSpan } from './spans.js';
import { visionParams } from './vision-params.js';
import { tokenBudget } from './token-budget.js';
import { exposedPairs, unturnedPairs, wavelengthRange } from './wavelengths.js';

export { evaluationSpan, trainedSpan, tunedSpan } from './spans.js';

/** The frequencies every positional scan runs on. */
export interface FrequencyPlan {
  /** `θ_i`, before scaling. */
  theta: Float64Array;
  /** `θ'_i`, after context scaling. */
  scaled: Float64Array;
}

/**
 * per token: `θ_i` and `θ'_i` of the spec's code over span `T` and trained span `L0`; null for
 * learned, ALiBi and position-free codes and for degenerate input.
 */
export function frequencyPlan(spec: ModelSpec, span: number | null, trained: number | null): FrequencyPlan | null {
  const theta = baseFrequencies(spec);
  if (theta === null) return null;
  const code = spec.position;
  if (code.kind !== 'rotary') return { theta, scaled: theta };
  const r = rotaryWidth(spec.headDim, code.fraction) as number;
  const scaled = scaleFrequencies(theta, code.base, r, code.scaling ?? null, span, trained);
  return scaled === null ? null : { theta, scaled };
}

/**
 * ratio: `attentionScale`: `0.1 ln(s) + 1` for yarn (Peng et al. 2023, Eq. 22); for pairwise
 * (LongRoPE) scaling its own attention factor, stated or `sqrt(1 + ln(s)/ln(L0))`; 1 otherwise.
 */
export function attentionScale(spec: ModelSpec): number | null {
  const code = spec.position;
  if (code?.kind === 'rotary' && code.scaling?.kind === 'yarn') return yarnAttentionScale(code.scaling.factor);
  if (code?.kind === 'rotary' && code.scaling?.kind === 'pairwise') return pairwiseAttentionFactor(code.scaling, trainedSpan(spec));
  return 1;
}

/** Every metric of METRICS.md for one spec; null where a metric does not apply or its inputs are degenerate. */
export function computeMetrics(spec: ModelSpec): Metrics {
  const declared = declaredSpan(spec);
  const served = servedSpan(spec);
  const span = evaluationSpan(spec);
  const trained = trainedSpan(spec);
  const reachTokens = reach(spec, trained, declared);

  const plan = frequencyPlan(spec, span, trained);
  const range = plan ? wavelengthRange(plan.scaled) : null;
  const similarity = similarityScan(plan ? plan.scaled : null, span);
  const precision = {} as Record<FloatFormat, PrecisionMetrics>;
  for (const format of ['fp32', 'bf16', 'fp16'] as const) {
    precision[format] = numberFormatMetrics(format, plan ? plan.scaled : null, span);
  }

  const slopes = spec.position?.kind === 'alibi' ? alibiSlopes(spec.heads) : null;

  const counts = parameterCounts(spec);
  const weights = weightBytes(spec, counts ? counts.params : null);
  const cache = cacheBytesAtSpan(spec, span);
  const heads = positiveCount(spec.heads);
  const headDim = positiveCount(spec.headDim);

  return {
    declaredSpan: declared,
    trainedSpan: trained,
    servedSpan: served,
    evaluationSpan: span,
    reach: reachTokens,
    tunedSpan: tunedSpan(spec),
    bucketHorizon: bucketHorizon(spec),
    scalingCover: scalingCover(spec, trained),
    headroom: headroom(reachTokens, span),
    extensionRatio: extensionRatio(span, trained),
    fastestWavelength: range ? range.fastest : null,
    slowestWavelength: range ? range.slowest : null,
    unturnedPairs: plan && trained !== null ? unturnedPairs(plan.scaled, trained) : null,
    exposedPairs: plan && trained !== null && span !== null ? exposedPairs(plan.theta, plan.scaled, trained, span) : null,
    separationFloor: similarity.separationFloor,
    separationFloorOffset: similarity.separationFloorOffset,
    discriminationSpan: similarity.discriminationSpan,
    attentionScale: attentionScale(spec),
    alibiSlopes: slopes,
    alibiHorizon: alibiHorizon(slopes),
    receptiveField: receptiveField(spec),
    positionShare: positionShare(spec),
    precision,
    params: counts ? counts.params : null,
    visionParams: visionParams(spec.vision ?? null),
    activeParams: counts ? counts.activeParams : null,
    nonEmbeddingParams: counts ? counts.nonEmbeddingParams : null,
    weightBytes: weights,
    cachePerTokenBytes: cachePerTokenBytes(spec),
    cacheBytesAtSpan: cache,
    memoryBytes: memoryBytes(weights, cache),
    fitSequences: fitSequences(spec, weights, cache, servedSequences(spec)),
    flopsPerToken: flopsPerToken(counts ? counts.nonEmbeddingParams : null, positiveCount(spec.layers), span, heads, headDim),
    tokenBudget: tokenBudget(spec.serving, span),
  };
}
