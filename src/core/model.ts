/**
 * The one typed model description every dialect normalises into. Nothing past the parsers sees
 * dialect keys. Fields hold what the file states (after normalisation); `null` means "not
 * stated", and the metrics apply the documented defaults. Sizes are plain numbers that may be
 * invalid (zero, negative, fractional, NaN): the rules report them, the metrics return null.
 */

/** Binary floating-point formats the position code can be computed in. */
export type FloatFormat = 'fp32' | 'bf16' | 'fp16';
export const FLOAT_FORMATS: readonly FloatFormat[] = ['fp32', 'bf16', 'fp16'];

/** Storage formats for weights and the key/value cache. */
export type StorageDType = 'fp32' | 'bf16' | 'fp16' | 'fp8' | 'int8' | 'int4';
export const STORAGE_DTYPES: readonly StorageDType[] = [
  'fp32',
  'bf16',
  'fp16',
  'fp8',
  'int8',
  'int4',
];

/**
 * Context-extension schemes for rotary codes (docs/metrics.md, symbol θ'_i). `pairwise`: one factor
 * per frequency pair, `θ'_i = θ_i / factor_i` (LongRoPE, Ding et al. 2024; the checkpoint key
 * `longrope`, formerly `su`).
 */
export type ScalingKind = 'linear' | 'ntk' | 'dynamic' | 'yarn' | 'banded' | 'pairwise';
export const SCALING_KINDS: readonly ScalingKind[] = [
  'linear',
  'ntk',
  'dynamic',
  'yarn',
  'banded',
  'pairwise',
];

export interface Scaling {
  kind: ScalingKind;
  /** `s`, the scaling factor. */
  factor: number;
  /** The span the unscaled code was trained at, from the scaling block (default: `null`). */
  originalSpan: number | null;
  /** yarn ramp start `α` (default: `1`). */
  alpha: number;
  /** yarn ramp end `β` (default: `32`). */
  beta: number;
  /** banded low-frequency factor (default: `1`). */
  low: number;
  /** banded high-frequency factor (default: `4`). */
  high: number;
  // Position-related additions (issue 10): per-pair factors of `pairwise` scaling.
  /** pairwise: factors used while the span is at most the original span, one per pair (default: none). */
  shortFactors?: number[] | null;
  /** pairwise: factors used once the span exceeds the original span, one per pair (default: none). */
  longFactors?: number[] | null;
  /** pairwise: attention factor as stated (default: `null`, the published default applies). */
  attentionFactor?: number | null;
}

export type PositionCode =
  | { kind: 'sinusoidal' }
  | { kind: 'learned' }
  | {
      kind: 'rotary';
      /** Rotary base (default: `10000`). */
      base: number;
      /** Share of each head's width that rotates (default: `1`). */
      fraction: number;
      scaling: Scaling | null;
    }
  | { kind: 'alibi' }
  | {
      /** Relative position buckets (T5 style, Raffel et al. 2020, section 2.1): no hard reach. */
      kind: 'relative';
      /** Number of buckets (default: `32`). */
      buckets: number;
      /** Distance past which every offset shares the last bucket (default: `128`). */
      maxDistance: number;
    }
  | { kind: 'none' };

export type PositionKind = PositionCode['kind'];
export const POSITION_KINDS: readonly PositionKind[] = [
  'sinusoidal',
  'learned',
  'rotary',
  'alibi',
  'relative',
  'none',
];

/**
 * A vision tower beside the language model (multimodal configs), ViT style: patch embedding,
 * a position table over the patches (plus one class token), pre-norm encoder layers.
 */
export interface VisionTower {
  layers: number;
  hidden: number;
  ffn: number;
  patch: number;
  image: number;
  channels: number;
}

/** The encoder of an encoder-decoder model; the top-level fields describe the decoder. */
export interface EncoderStack {
  layers: number;
  heads: number;
  kvHeads: number;
  headDim: number;
  ffn: number;
}

// --- Experts, latent attention, layers that differ, encoder-only (docs/metrics.md, "Mixtures of experts
// and latent attention", "Layers that differ"). Optional fields: absent is the documented default.

/** A mixture-of-experts feed-forward (docs/metrics.md, "Mixtures of experts and latent attention"). */
export interface Experts {
  /** Routed experts `E`. */
  total: number;
  /** Routed experts each token uses, `k`. */
  active: number;
  /** Width of one routed expert, `moeFfn` (default: `ffn`). */
  width?: number | null;
  /** Always-active shared experts (default: `0`). */
  shared?: number | null;
  /** Width of one shared expert (default: `width`). */
  sharedWidth?: number | null;
  /** A `hidden → 1` gate on the shared experts' output, as Qwen2-MoE-style blocks have (default: `false`). */
  sharedGate?: boolean | null;
  /** Decoder layers whose feed-forward is dense, of width `ffn` (default: `0`). */
  denseLayers?: number | null;
}

/** Latent attention (Liu et al. 2024, DeepSeek-V2, section 2.1). */
export interface LatentAttention {
  /** `d_c`, the compressed key/value width (`kv_lora_rank`). */
  kvRank: number;
  /** `d_c'`, the compressed query width (`q_lora_rank`; default: `null`, a plain query projection). */
  qRank: number | null;
  /** `d_h^R`, the decoupled rotary width per head (`qk_rope_head_dim`). */
  ropeDim: number;
  /** Per-head query/key width without position code (`qk_nope_head_dim`). */
  nopeDim: number;
  /** Per-head value width (`v_head_dim`). */
  valueDim: number;
}

/**
 * Attention of one decoder layer: every earlier token, a sliding window, a fixed chunk, or
 * cross-attention to the image tokens only (Mllama-style `cross_attention_layers`: the layer
 * attends to no earlier text token and caches none per text token).
 */
export type LayerAttention = 'full' | 'sliding' | 'chunked' | 'cross';
export const LAYER_ATTENTIONS: readonly LayerAttention[] = ['full', 'sliding', 'chunked', 'cross'];
/** The kinds the own model format states (its `layer-pattern`); `cross` is read from checkpoint configs only. */
export const OWN_LAYER_ATTENTIONS: readonly LayerAttention[] = ['full', 'sliding', 'chunked'];

export interface Serving {
  /** Served span in tokens (default: `null`, the declared span is evaluated). */
  span: number | null;
  /** Concurrent sequences held in the cache (default: `1`). */
  sequences: number | null;
  /** Device memory budget in GiB (default: `null`, no budget). */
  deviceGiB: number | null;
  /** Fraction of device memory kept free (default: `0.1`). */
  reserve: number | null;
  /** Tokens reserved for the model's output (default: `null`). */
  outputTokens: number | null;
  /** Tokens reserved for a fixed prompt (default: `null`). */
  promptTokens: number | null;
  /** Tensor-parallel degree `t`: devices each layer is split over (default: `1`). */
  tensorParallel?: number | null;
  /** Pipeline-parallel degree `p`: stages the layers are split into (default: `1`). */
  pipelineParallel?: number | null;
  /** GiB kept on every device for activations and workspace, beside the reserve share (default: `null`, none). */
  activationReserveGiB?: number | null;
}

/**
 * A weight quantization (docs/metrics.md, "Quantized weights"): the linear weight matrices of the
 * layers stored at `bits` per weight plus a scale per group (and a zero point where the method
 * stores one); embeddings, norms and, unless `output` says so, the output matrix stay unquantized.
 */
export interface WeightQuantization {
  /** The method as named where it was stated (`gptq`, `awq`, `fp8`, `bitsandbytes`, or the dtype `int4`/`int8`/`fp8`). */
  method: string;
  /** Stored bits per quantized weight. */
  bits: number;
  /** Weights sharing one scale; null for one scale per matrix (its share of the bytes is negligible and not counted). */
  groupSize: number | null;
  /** Bits of one scale (16 for group-quantized integer formats, 32 for block-scaled 8-bit floats). */
  scaleBits: number;
  /** A zero point of `bits` bits is stored per group. */
  zeroPoint: boolean;
  /** The output matrix is quantized too (default: `false`). */
  output: boolean;
  /**
   * Which matrices of the layers are quantized: `experts`, the routed experts' only (MXFP4
   * checkpoints); absent, every matrix of the layers.
   */
  scope?: 'experts';
}

export interface ModelSpec {
  /** Free-form model name (default: `null`). */
  name: string | null;
  /** Decoder (or only) stack: layers. */
  layers: number;
  hidden: number;
  heads: number;
  /** Key/value heads (default: `heads`). */
  kvHeads: number;
  /** Width of one head (default: `hidden / heads`). */
  headDim: number;
  /** Feed-forward width (default: `4 * hidden`). */
  ffn: number;
  /** Gated feed-forward with three matrices (default: `false`). */
  gated: boolean;
  vocab: number;
  /** Output matrix shares the token embedding (default: `true`). */
  tied: boolean;
  /** Biases on linear layers and norms (default: `false`). */
  bias: boolean;
  /** Mixture of experts (default: `null`, dense). */
  experts: Experts | null;
  /** Encoder stack of an encoder-decoder model (default: `null`). */
  encoder: EncoderStack | null;
  position: PositionCode;
  /** The config's maximum positions. */
  declaredSpan: number;
  /**
   * Explicitly stated trained span (default: `null`). With a scaling block it is the span the
   * scaled model was trained or tuned at (`tunedSpan`), never multiplied by the factor again.
   */
  trainedSpan: number | null;
  /** Vision tower of a multimodal config, counted apart from the language model (default: none). */
  vision?: VisionTower | null;
  /** Sliding attention window (default: `null`, full attention). */
  slidingWindow: number | null;
  /** How many decoder layers use the sliding window (default: all layers). */
  windowLayers: number | null;
  /** Latent attention (default: `null`, plain multi-head attention). */
  latent?: LatentAttention | null;
  /** Attention of each decoder layer in order (default: `null`: `slidingWindow` and `windowLayers` describe the layers). */
  layerTypes?: LayerAttention[] | null;
  /** 0-based decoder layers without any position code (default: none). */
  positionFreeLayers?: number[] | null;
  /** Tokens per chunk of chunked local attention (default: `null`). */
  chunkSize?: number | null;
  /** Rotary base of the local (sliding and chunked) layers, which then run unscaled (default: `null`, the model's code). */
  localBase?: number | null;
  /** Norm vectors of width `hidden` in each decoder layer (default: `2`). */
  layerNorms?: number | null;
  /** Per-head norms on queries and keys, `2·headDim` weights per layer (default: `false`). */
  qkNorms?: boolean | null;
  /** Encoder-only model (BERT style): no decoding key/value cache (default: `false`). */
  encoderOnly?: boolean | null;
  dtypes: {
    /** Weight storage (default: `bf16`). */
    weights: StorageDType | null;
    /** Key/value cache storage (default: the weight dtype). */
    cache: StorageDType | null;
    /** Format positions and angles are computed in (default: `fp32`). */
    positions: FloatFormat | null;
  };
  /** Standard deviation of the embedding initialisation (default: `null`, unknown). */
  embeddingInitStd: number | null;
  /** Factor token embeddings are multiplied by, e.g. sqrt(hidden) (default: `1`). */
  embeddingMultiplier: number | null;
  serving: Serving;
  /** Weight quantization (default: `null`, every weight in the weight dtype). */
  quantization?: WeightQuantization | null;
}

/** Where a normalised field came from: the dialect key and its 1-based line. */
export interface SourceLocation {
  /** The key as written in the file, as a dotted path (e.g. `rope_scaling.factor`). */
  key: string;
  line: number | null;
}

/** Spec field path (e.g. `position.base`, `serving.span`) to where it was stated. */
export type LocationMap = Record<string, SourceLocation>;

export type Severity = 'block' | 'warn' | 'info';
export const SEVERITIES: readonly Severity[] = ['block', 'warn', 'info'];

export interface Finding {
  /** Rule id of the engine or the gate (see `src/core/rules`). */
  rule: string;
  severity: Severity;
  /** Quotes the values and says what to change. */
  message: string;
  /** Dialect key the finding is about (default: `null`, the whole file). */
  key: string | null;
  line: number | null;
}

export type Dialect = 'context-reach' | 'checkpoint';

/**
 * Serving values from outside the model file (policy `serving` block, CLI flags), in spec terms.
 * A policy gives defaults (the file's own values win); CLI flags override.
 */
export interface ServingPatch {
  span?: number;
  sequences?: number;
  deviceGiB?: number;
  reserve?: number;
  outputTokens?: number;
  promptTokens?: number;
  weights?: StorageDType;
  cache?: StorageDType;
  positions?: FloatFormat;
  trainedSpan?: number;
  tensorParallel?: number;
  pipelineParallel?: number;
  activationReserveGiB?: number;
  /** Weights sharing one scale when `weights` is a quantized format (int4, int8, fp8). */
  weightGroupSize?: number;
}
