/**
 * What a dialect reader states, and the one place the documented defaults fill the rest.
 * Values a reader found missing or unusable arrive as NaN (the reader has reported them);
 * values derived from them stay NaN, so one bad key gives one finding and metrics return null.
 */
import type {
  EncoderStack,
  Experts,
  FloatFormat,
  LatentAttention,
  LayerAttention,
  ModelSpec,
  PositionCode,
  Scaling,
  ScalingKind,
  Serving,
  StorageDType,
  VisionTower,
  WeightQuantization,
} from '../model.js';
import { isCount } from '../metrics/sizes.js';

/** A scaling block as stated: missing values take the defaults below. */
export interface ScalingDraft {
  kind: ScalingKind;
  factor: number;
  originalSpan?: number | null;
  alpha?: number;
  beta?: number;
  low?: number;
  high?: number;
  shortFactors?: number[] | null;
  longFactors?: number[] | null;
  attentionFactor?: number | null;
}

export type PositionDraft =
  | { kind: 'sinusoidal' | 'learned' | 'alibi' | 'none' }
  | { kind: 'relative'; buckets?: number; maxDistance?: number }
  | { kind: 'rotary'; base?: number; fraction?: number; scaling?: ScalingDraft | null };

/** Everything a dialect can state; `undefined` is "not stated". */
export interface SpecDraft {
  name?: string | null;
  layers: number;
  hidden: number;
  heads: number;
  kvHeads?: number;
  headDim?: number;
  ffn?: number;
  gated?: boolean;
  vocab: number;
  tied?: boolean;
  bias?: boolean;
  experts?: Experts | null;
  encoder?: {
    layers: number;
    heads: number;
    kvHeads?: number;
    headDim?: number;
    ffn?: number;
  } | null;
  position: PositionDraft;
  declaredSpan: number;
  trainedSpan?: number | null;
  vision?: VisionTower | null;
  slidingWindow?: number | null;
  windowLayers?: number | null;
  dtypes?: {
    weights?: StorageDType | null;
    cache?: StorageDType | null;
    positions?: FloatFormat | null;
  };
  // Experts, latent attention, layers that differ, encoder-only (see ModelSpec).
  latent?: LatentAttention | null;
  layerTypes?: LayerAttention[] | null;
  positionFreeLayers?: number[] | null;
  chunkSize?: number | null;
  localBase?: number | null;
  layerNorms?: number | null;
  qkNorms?: boolean | null;
  encoderOnly?: boolean | null;
  embeddingInitStd?: number | null;
  embeddingMultiplier?: number | null;
  serving?: Partial<Serving>;
  quantization?: WeightQuantization | null;
}

/** Rotary base (default: `10000`; Su et al. 2021, RoFormer, eq. 15 with Vaswani et al.'s 10000). */
export const DEFAULT_ROTARY_BASE = 10000;
/** Share of each head that rotates (default: `1`). */
export const DEFAULT_ROTARY_FRACTION = 1;
/** yarn ramp ends α and β (default: `1` and `32`; Peng et al. 2023, YaRN, section 3.2, "for the Llama family"). */
export const DEFAULT_YARN_ALPHA = 1;
export const DEFAULT_YARN_BETA = 32;
/** banded low and high frequency factors (default: `1` and `4`; common practice). */
export const DEFAULT_BANDED_LOW = 1;
export const DEFAULT_BANDED_HIGH = 4;
/** Relative position buckets and their largest distance (default: `32` and `128`; Raffel et al. 2020, T5, section 2.1). */
export const DEFAULT_RELATIVE_BUCKETS = 32;
export const DEFAULT_RELATIVE_MAX_DISTANCE = 128;
/** Feed-forward width over model width (default: `4`; Vaswani et al. 2017, Table 3: 2048 = 4 × 512). */
export const DEFAULT_FFN_RATIO = 4;

/** Width of one head when a config states none: `hidden / heads` (NaN when either is unusable). */
export function defaultHeadDim(hidden: number, heads: number): number {
  return isCount(hidden) && isCount(heads) ? hidden / heads : NaN;
}

/** The spec with every documented default applied; derived values are NaN when their inputs are unusable. */
export function completeSpec(draft: SpecDraft): ModelSpec {
  const { layers, hidden, heads } = draft;
  const kvHeads = draft.kvHeads ?? (isCount(heads) ? heads : NaN);
  const headDim = draft.headDim ?? defaultHeadDim(hidden, heads);
  const ffn = draft.ffn ?? (isCount(hidden) ? DEFAULT_FFN_RATIO * hidden : NaN);
  return {
    name: draft.name ?? null,
    layers,
    hidden,
    heads,
    kvHeads,
    headDim,
    ffn,
    gated: draft.gated ?? false,
    vocab: draft.vocab,
    tied: draft.tied ?? true,
    bias: draft.bias ?? false,
    experts: draft.experts ?? null,
    encoder: draft.encoder ? completeEncoder(draft.encoder, hidden) : null,
    position: completePosition(draft.position),
    declaredSpan: draft.declaredSpan,
    trainedSpan: draft.trainedSpan ?? null,
    ...(draft.vision ? { vision: draft.vision } : {}),
    slidingWindow: draft.slidingWindow ?? null,
    windowLayers: draft.windowLayers ?? null,
    dtypes: {
      weights: draft.dtypes?.weights ?? null,
      cache: draft.dtypes?.cache ?? null,
      positions: draft.dtypes?.positions ?? null,
    },
    embeddingInitStd: draft.embeddingInitStd ?? null,
    embeddingMultiplier: draft.embeddingMultiplier ?? null,
    ...completeShapes(draft),
    serving: {
      span: draft.serving?.span ?? null,
      sequences: draft.serving?.sequences ?? null,
      deviceGiB: draft.serving?.deviceGiB ?? null,
      reserve: draft.serving?.reserve ?? null,
      outputTokens: draft.serving?.outputTokens ?? null,
      promptTokens: draft.serving?.promptTokens ?? null,
      tensorParallel: draft.serving?.tensorParallel ?? null,
      pipelineParallel: draft.serving?.pipelineParallel ?? null,
      activationReserveGiB: draft.serving?.activationReserveGiB ?? null,
    },
    quantization: draft.quantization ?? null,
  };
}

/** Experts, latent attention, layer kinds, encoder-only: stated fields only, so plain models keep their shape. */
function completeShapes(draft: SpecDraft): Partial<ModelSpec> {
  const out: Partial<ModelSpec> = {};
  if (draft.latent) out.latent = draft.latent;
  if (draft.layerTypes) out.layerTypes = draft.layerTypes;
  if (draft.positionFreeLayers && draft.positionFreeLayers.length > 0)
    out.positionFreeLayers = draft.positionFreeLayers;
  if (draft.chunkSize !== undefined && draft.chunkSize !== null) out.chunkSize = draft.chunkSize;
  if (draft.localBase !== undefined && draft.localBase !== null) out.localBase = draft.localBase;
  if (draft.layerNorms !== undefined && draft.layerNorms !== null)
    out.layerNorms = draft.layerNorms;
  if (draft.qkNorms) out.qkNorms = true;
  if (draft.encoderOnly) out.encoderOnly = true;
  return out;
}

function completeEncoder(e: NonNullable<SpecDraft['encoder']>, hidden: number): EncoderStack {
  return {
    layers: e.layers,
    heads: e.heads,
    kvHeads: e.kvHeads ?? (isCount(e.heads) ? e.heads : NaN),
    headDim: e.headDim ?? (isCount(hidden) && isCount(e.heads) ? hidden / e.heads : NaN),
    ffn: e.ffn ?? (isCount(hidden) ? DEFAULT_FFN_RATIO * hidden : NaN),
  };
}

function completePosition(p: PositionDraft): PositionCode {
  if (p.kind === 'relative') {
    return {
      kind: 'relative',
      buckets: p.buckets ?? DEFAULT_RELATIVE_BUCKETS,
      maxDistance: p.maxDistance ?? DEFAULT_RELATIVE_MAX_DISTANCE,
    };
  }
  if (p.kind !== 'rotary') return { kind: p.kind };
  return {
    kind: 'rotary',
    base: p.base ?? DEFAULT_ROTARY_BASE,
    fraction: p.fraction ?? DEFAULT_ROTARY_FRACTION,
    scaling: p.scaling ? completeScaling(p.scaling) : null,
  };
}

function completeScaling(s: ScalingDraft): Scaling {
  return {
    kind: s.kind,
    factor: s.factor,
    originalSpan: s.originalSpan ?? null,
    alpha: s.alpha ?? DEFAULT_YARN_ALPHA,
    beta: s.beta ?? DEFAULT_YARN_BETA,
    low: s.low ?? DEFAULT_BANDED_LOW,
    high: s.high ?? DEFAULT_BANDED_HIGH,
    ...(s.kind === 'pairwise'
      ? {
          shortFactors: s.shortFactors ?? null,
          longFactors: s.longFactors ?? null,
          attentionFactor: s.attentionFactor ?? null,
        }
      : {}),
  };
}
