/**
 * Weight storage with a quantization (docs/metrics.md, "Quantized weights"; common practice): the
 * linear weight matrices of the layers at `bits / 8` bytes per weight plus, per group of
 * `groupSize` weights, one scale of `scaleBits` and, where the method stores one, a zero point of
 * `bits` bits; embeddings, norms, biases and (unless stated) the output matrix stay in the
 * unquantized dtype. GPTQ (Frantar et al. 2022) uses 4-bit weights in groups of 128.
 */
import type { ModelSpec, StorageDType, WeightQuantization } from '../model.js';
import { parameterBreakdown, type ParameterBreakdown } from './parameter-count.js';
import { positiveCount } from './sizes.js';
import { bytesPerElement, DEFAULT_WEIGHT_DTYPE, weightDType } from './storage-bytes.js';

/** Weight dtypes that are quantized formats: stored bits and scale bits when given a group size. */
export const QUANTIZED_DTYPES: Readonly<
  Partial<Record<StorageDType, { bits: number; scaleBits: number }>>
> = {
  int4: { bits: 4, scaleBits: 16 },
  int8: { bits: 8, scaleBits: 16 },
  fp8: { bits: 8, scaleBits: 32 },
};

/** Weights per scale when a remedy proposes a quantized format (default: `128`; GPTQ, Frantar et al. 2022). */
export const DEFAULT_GROUP_SIZE = 128;

/**
 * The quantization a weight dtype with a group size describes (own description, policy, command
 * line): int4/int8 with one 16-bit scale per group, fp8 with one 32-bit scale per group; null
 * for a dtype that is not a quantized format.
 */
export function dtypeQuantization(
  dtype: StorageDType,
  groupSize: number,
  zeroPoint = false,
): WeightQuantization | null {
  const format = QUANTIZED_DTYPES[dtype];
  if (!format) return null;
  return {
    method: dtype,
    bits: format.bits,
    groupSize,
    scaleBits: format.scaleBits,
    zeroPoint: dtype !== 'fp8' && zeroPoint,
    output: false,
  };
}

/** The dtype unquantized parts stay in: the weight dtype when it is a float format, else `bf16`. */
export function unquantizedDType(spec: ModelSpec): StorageDType {
  const dtype = weightDType(spec);
  return dtype === 'fp32' || dtype === 'bf16' || dtype === 'fp16' ? dtype : DEFAULT_WEIGHT_DTYPE;
}

/**
 * bytes: quantized storage of `weights` weights: `weights·bits/8 + ceil(weights/groupSize)·
 * (scaleBits + (zeroPoint ? bits : 0))/8`; one scale per matrix (`groupSize` null) is not counted.
 * Null for degenerate input.
 */
export function quantizedBytes(weights: number, q: WeightQuantization): number | null {
  const bits = q.bits;
  if (
    !(Number.isFinite(bits) && bits > 0 && bits <= 32) ||
    !(Number.isFinite(q.scaleBits) && q.scaleBits >= 0)
  )
    return null;
  const groups =
    q.groupSize === null
      ? 0
      : positiveCount(q.groupSize) === null
        ? NaN
        : Math.ceil(weights / q.groupSize);
  const total = (weights * bits + groups * (q.scaleBits + (q.zeroPoint ? bits : 0))) / 8;
  return Number.isFinite(total) ? total : null;
}

/**
 * bytes: `weightBytes` under a quantization: the layers' matrices (and the output matrix when
 * `output`; only the routed experts' matrices when `scope` is `experts`) by `quantizedBytes`,
 * everything else at the unquantized dtype. Null when the
 * breakdown or the quantization is degenerate.
 */
export function quantizedWeightBytes(
  spec: ModelSpec,
  parts: ParameterBreakdown,
  q: WeightQuantization,
): number | null {
  const plain = bytesPerElement(unquantizedDType(spec));
  const quantized =
    q.scope === 'experts' ? parts.expertMatrices : parts.matrices + (q.output ? parts.output : 0);
  const stored = quantizedBytes(quantized, q);
  if (plain === null || stored === null) return null;
  const total = stored + (parts.params - quantized) * plain;
  return Number.isFinite(total) ? total : null;
}

/**
 * bytes: `weightBytes` of `spec` (docs/metrics.md): with a quantization, `quantizedWeightBytes`;
 * otherwise `params · bytes(weight dtype)`.
 */
export function storedWeightBytes(spec: ModelSpec): number | null {
  const parts = parameterBreakdown(spec);
  if (parts === null) return null;
  if (spec.quantization) return quantizedWeightBytes(spec, parts, spec.quantization);
  const bytes = bytesPerElement(weightDType(spec));
  if (bytes === null) return null;
  const w = parts.params * bytes;
  return Number.isFinite(w) ? w : null;
}
