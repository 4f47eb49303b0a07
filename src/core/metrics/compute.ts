/**
 * The metric engine: every metric of the contract (docs/metrics.md) for one model spec. The
 * spec arrives with serving values from the CLI or policy merged in; documented defaults are
 * applied here; degenerate sizes give null metrics, never NaN, Infinity or an exception.
 */
import type { FloatFormat, ModelSpec } from '../model.js';
import type { LayerKindMetrics, Metrics, PrecisionMetrics } from './types.js';
import { alibiHorizon, alibiSlopes } from './alibi-slopes.js';
import {
  pairwiseAttentionFactor,
  scaleFrequencies,
  yarnAttentionScale,
} from './context-scaling.js';
import { flopsPerToken } from './flops.js';
import { baseFrequencies, rotaryHeadDim, rotaryWidth } from './frequencies.js';
import { cacheBytesAtSpan, cachePerTokenBytes, servedSequences } from './kv-cache.js';
import { layerGroups, visibleSpan } from './layer-kinds.js';
import type { LayerGroup } from './layer-kinds.js';
import { memoryBytes } from './memory-fit.js';
import { usableDeviceBytes } from './memory-curve.js';
import {
  cachePerSequencePerDevice,
  cachePerTokenBytesPerDevice,
  deviceCount,
  fitSequencesPerDevice,
  kvHeadsPerDevice,
  memoryBytesPerDevice,
  weightBytesPerDevice,
} from './per-device.js';
import { storedWeightBytes } from './quantized-weights.js';
import { numberFormatMetrics } from './number-format.js';
import { parameterCounts } from './parameter-count.js';
import { positionShare } from './position-share.js';
import { extensionRatio, headroom, reach, scalingCover } from './reach.js';
import { receptiveField } from './receptive-field.js';
import { positiveFinite } from './sizes.js';
import { similarityScan } from './similarity-scan.js';
import {
  bucketHorizon,
  declaredSpan,
  evaluationSpan,
  servedSpan,
  trainedSpan,
  tunedSpan,
} from './spans.js';
import { visionParams } from './vision-params.js';
import { tokenBudget } from './token-budget.js';
import { exposedPairs, unturnedPairs, wavelengthRange } from './wavelengths.js';
import { viaMemo, type ScanMemo } from './scan-memo.js';
import { MAX_SCAN_WORK } from './scan-limits.js';

export { evaluationSpan, trainedSpan, tunedSpan } from './spans.js';

/** The frequencies every positional scan runs on. */
export interface FrequencyPlan {
  /** `θ_i`, before scaling. */
  theta: Float64Array;
  /** `θ'_i`, after context scaling. */
  scaled: Float64Array;
}

/** A rotary setting other than the model's own: the local layers' base, which runs unscaled. */
export interface RotarySetting {
  base: number;
  unscaled: boolean;
}

/**
 * per token: `θ_i` and `θ'_i` of the spec's code (or of `setting`) over span `T` and trained
 * span `L0`; null for learned, ALiBi and position-free codes and for degenerate input.
 */
export function frequencyPlan(
  spec: ModelSpec,
  span: number | null,
  trained: number | null,
  setting?: RotarySetting,
): FrequencyPlan | null {
  const theta = baseFrequencies(spec, setting?.base);
  if (theta === null) return null;
  const code = spec.position;
  if (code.kind !== 'rotary') return { theta, scaled: theta };
  if (setting?.unscaled) return { theta, scaled: theta };
  const r = rotaryWidth(rotaryHeadDim(spec), code.fraction) as number;
  const scaled = scaleFrequencies(theta, code.base, r, code.scaling ?? null, span, trained);
  return scaled === null ? null : { theta, scaled };
}

/**
 * ratio: `attentionScale`: `0.1 ln(s) + 1` for yarn (Peng et al. 2023, Eq. 22); for pairwise
 * (LongRoPE) scaling its own attention factor, stated or `sqrt(1 + ln(s)/ln(L0))`; 1 otherwise.
 */
export function attentionScale(spec: ModelSpec): number | null {
  const code = spec.position;
  if (code?.kind === 'rotary' && code.scaling?.kind === 'yarn')
    return yarnAttentionScale(code.scaling.factor);
  if (code?.kind === 'rotary' && code.scaling?.kind === 'pairwise')
    return pairwiseAttentionFactor(code.scaling, trainedSpan(spec));
  return 1;
}

/** The metrics that depend on the frequencies and the spans alone: the positional scans and what they give. */
export interface PositionalMetrics {
  range: ReturnType<typeof wavelengthRange> | null;
  similarity: ReturnType<typeof similarityScan>;
  precision: Record<FloatFormat, PrecisionMetrics>;
  unturnedPairs: number | null;
  exposedPairs: number | null;
}

/**
 * The positional metrics of a frequency plan (null: no rotary frequencies) over evaluation span
 * `span` and trained span `trained`, both in tokens, the similarity scan within `workLimit`
 * (default: `MAX_SCAN_WORK`): a pure function of exactly these inputs, so a run computes it once
 * per distinct code and span (see `scan-memo.ts`).
 */
export function positionalMetrics(
  theta: Float64Array | null,
  scaled: Float64Array | null,
  span: number | null,
  trained: number | null,
  workLimit: number = MAX_SCAN_WORK,
): PositionalMetrics {
  const precision = {} as Record<FloatFormat, PrecisionMetrics>;
  for (const format of ['fp32', 'bf16', 'fp16'] as const)
    precision[format] = numberFormatMetrics(format, scaled, span);
  return {
    range: scaled ? wavelengthRange(scaled) : null,
    similarity: similarityScan(scaled, span, workLimit),
    precision,
    unturnedPairs: scaled && trained !== null ? unturnedPairs(scaled, trained) : null,
    exposedPairs:
      theta && scaled && trained !== null && span !== null
        ? exposedPairs(theta, scaled, trained, span)
        : null,
  };
}

/**
 * Similarity-scan work (units of `SCAN_WORK`, `scan-limits.ts`) a caller lets its scans spend in
 * all: each scan runs within what is left (and `MAX_SCAN_WORK`) and its work is taken off.
 * `cut` turns true when a scan stopped because the budget, not `MAX_SCAN_WORK`, ran out.
 */
export interface ScanBudget {
  left: number;
  cut: boolean;
  /**
   * Positional metrics already paid for (the judged file's own, from the run's memo): handing
   * them out again costs nothing, so they are not charged (default: none).
   */
  free?: PositionalMetrics;
}

/**
 * The positional metrics of `spec` through `memo` (the similarity scan within `limit`, default
 * `MAX_SCAN_WORK`): what `computeMetrics` hands out, the same object for the same inputs.
 */
export function positionalMetricsOf(spec: ModelSpec, memo?: ScanMemo): PositionalMetrics {
  const span = evaluationSpan(spec);
  const trained = trainedSpan(spec);
  return positionalOf(frequencyPlan(spec, span, trained), span, trained, memo, undefined);
}

function positionalOf(
  plan: FrequencyPlan | null,
  span: number | null,
  trained: number | null,
  memo: ScanMemo | undefined,
  limit: number | undefined,
): PositionalMetrics {
  const theta = plan ? plan.theta : null;
  const scaled = plan ? plan.scaled : null;
  // The limit is an argument only when it is not the default, so full scans share memo keys.
  return limit === undefined
    ? viaMemo(memo, 'positionalMetrics', positionalMetrics, theta, scaled, span, trained)
    : viaMemo(memo, 'positionalMetrics', positionalMetrics, theta, scaled, span, trained, limit);
}

/** The work limit a scan gets under `budget`: undefined (the default, `MAX_SCAN_WORK`) when it has that much. */
function budgetLimit(budget: ScanBudget | undefined): number | undefined {
  return budget === undefined || budget.left >= MAX_SCAN_WORK
    ? undefined
    : Math.max(0, budget.left);
}

/** Takes a scan's work off `budget`, noting a stop the budget caused. */
function charge(
  budget: ScanBudget | undefined,
  limit: number | undefined,
  similarity: { work: number; complete: boolean },
): void {
  if (budget === undefined) return;
  budget.left -= similarity.work;
  if (limit !== undefined && !similarity.complete) budget.cut = true;
}

/**
 * Every metric of docs/metrics.md for one spec; null where a metric does not apply or its inputs are
 * degenerate. With a `memo`, the positional metrics are computed once per distinct input within
 * the memo's run; with a `budget`, the similarity scans spend at most what is left of it.
 */
export function computeMetrics(spec: ModelSpec, memo?: ScanMemo, budget?: ScanBudget): Metrics {
  const declared = declaredSpan(spec);
  const served = servedSpan(spec);
  const span = evaluationSpan(spec);
  const trained = trainedSpan(spec);
  const reachTokens = reach(spec, trained, declared);

  const plan = frequencyPlan(spec, span, trained);
  const limit = budgetLimit(budget);
  const positional = positionalOf(plan, span, trained, memo, limit);
  if (positional !== budget?.free) charge(budget, limit, positional.similarity);
  const { range, similarity } = positional;
  // A copy per report, so no two reports share (and could change) one object.
  const precision = {} as Record<FloatFormat, PrecisionMetrics>;
  for (const format of ['fp32', 'bf16', 'fp16'] as const)
    precision[format] = { ...positional.precision[format] };

  const slopes = spec.position?.kind === 'alibi' ? alibiSlopes(spec.heads) : null;

  const counts = parameterCounts(spec);
  const weights = storedWeightBytes(spec);
  const cache = cacheBytesAtSpan(spec, span);
  const deviceWeights = weightBytesPerDevice(spec, weights);
  const perSequence = cachePerSequencePerDevice(spec, span);

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
    unturnedPairs: positional.unturnedPairs,
    exposedPairs: positional.exposedPairs,
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
    fitSequences: fitSequencesPerDevice(usableDeviceBytes(spec), deviceWeights, perSequence),
    flopsPerToken: flopsPerToken(spec, counts ? counts.nonEmbeddingParams : null, span),
    tokenBudget: tokenBudget(spec.serving, span),
    devices: deviceCount(spec),
    kvHeadsPerDevice: kvHeadsPerDevice(spec),
    weightBytesPerDevice: deviceWeights,
    cachePerTokenBytesPerDevice: cachePerTokenBytesPerDevice(spec),
    memoryBytesPerDevice: memoryBytesPerDevice(deviceWeights, perSequence, servedSequences(spec)),
    layerKinds: layerKindMetrics(
      spec,
      span,
      trained,
      { plan, range, similarity, precision },
      budget,
    ),
  };
}

interface TopLevel {
  plan: FrequencyPlan | null;
  range: { fastest: number; slowest: number } | null;
  similarity: ReturnType<typeof similarityScan>;
  precision: Record<FloatFormat, PrecisionMetrics>;
}

/**
 * The positional metrics of each kind of decoder layer (docs/metrics.md, "Layers that differ"); null
 * when every layer is of one kind with the model's own code (the top-level values then describe
 * it) or the layers are degenerate. Local (sliding, chunked) layers use `localBase` unscaled when
 * the spec states one; settings equal to the top level's reuse its scans.
 */
export function layerKindMetrics(
  spec: ModelSpec,
  span: number | null,
  trained: number | null,
  top: TopLevel,
  budget?: ScanBudget,
): LayerKindMetrics[] | null {
  const groups = layerGroups(spec);
  if (groups === null) return null;
  const code = spec.position;
  const local = (g: LayerGroup) =>
    g.window !== null && code?.kind === 'rotary' && positiveFinite(spec.localBase) !== null;
  if (groups.length === 1 && groups[0]!.positional && !local(groups[0]!)) return null;
  const formats = ['fp32', 'bf16', 'fp16'] as const;
  const precisionCache = new Map<number, Record<FloatFormat, PrecisionMetrics>>();
  return groups.map((g): LayerKindMetrics => {
    const visible = span === null ? null : visibleSpan(g, span);
    const ownCode = g.positional ? code.kind : 'none';
    const setting: RotarySetting | undefined = local(g)
      ? { base: spec.localBase as number, unscaled: true }
      : undefined;
    const rotaryBase =
      ownCode === 'rotary' && code.kind === 'rotary' ? (setting ? setting.base : code.base) : null;
    const plan = !g.positional
      ? null
      : setting
        ? frequencyPlan(spec, span, trained, setting)
        : top.plan;
    let precision: Record<FloatFormat, PrecisionMetrics>;
    if (!g.positional) precision = nullPrecision(span);
    else if (!setting) precision = top.precision;
    else {
      const cached = precisionCache.get(setting.base);
      precision = cached ?? ({} as Record<FloatFormat, PrecisionMetrics>);
      if (cached === undefined) {
        for (const format of formats)
          precision[format] = numberFormatMetrics(format, plan ? plan.scaled : null, span);
        precisionCache.set(setting.base, precision);
      }
    }
    const range = plan === null ? null : setting ? wavelengthRange(plan.scaled) : top.range;
    let similarity = top.similarity;
    if (plan === null) similarity = similarityScan(null, null);
    else if (setting || visible !== span) {
      const limit = budgetLimit(budget);
      similarity = similarityScan(plan.scaled, visible, limit);
      charge(budget, limit, similarity);
    }
    return {
      attention: g.attention,
      positionCode: ownCode,
      layers: g.layers,
      window: g.window,
      rotaryBase,
      scaled:
        ownCode === 'rotary' &&
        !setting &&
        code.kind === 'rotary' &&
        code.scaling !== null &&
        code.scaling !== undefined,
      visibleSpan: visible,
      fastestWavelength: range ? range.fastest : null,
      slowestWavelength: range ? range.slowest : null,
      unturnedPairs: plan && trained !== null ? unturnedPairs(plan.scaled, trained) : null,
      exposedPairs:
        plan && trained !== null && visible !== null
          ? exposedPairs(plan.theta, plan.scaled, trained, visible)
          : null,
      separationFloor: similarity.separationFloor,
      separationFloorOffset: similarity.separationFloorOffset,
      discriminationSpan: similarity.discriminationSpan,
      precision,
    };
  });
}

function nullPrecision(span: number | null): Record<FloatFormat, PrecisionMetrics> {
  const out = {} as Record<FloatFormat, PrecisionMetrics>;
  for (const format of ['fp32', 'bf16', 'fp16'] as const)
    out[format] = numberFormatMetrics(format, null, span);
  return out;
}
