/**
 * Bytes per stored element (common practice: fp32 4, bf16/fp16 2, fp8/int8 1, int4 0.5).
 */
import type { StorageDType } from '../model.js';

const BYTES: Record<StorageDType, number> = {
  fp32: 4,
  bf16: 2,
  fp16: 2,
  fp8: 1,
  int8: 1,
  int4: 0.5,
};

/** Weight storage when the spec states none (default: `bf16`). */
export const DEFAULT_WEIGHT_DTYPE: StorageDType = 'bf16';

/** bytes: size of one element of `dtype`; null for an unknown name. */
export function bytesPerElement(dtype: StorageDType | null | undefined): number | null {
  return dtype !== null && dtype !== undefined && Object.hasOwn(BYTES, dtype) ? BYTES[dtype] : null;
}

/** The weight dtype in force (default: `bf16`). */
export function weightDType(spec: {
  dtypes?: { weights: StorageDType | null } | null;
}): StorageDType {
  return spec.dtypes?.weights ?? DEFAULT_WEIGHT_DTYPE;
}

/** The cache dtype in force (default: the weight dtype). */
export function cacheDType(spec: {
  dtypes?: { weights: StorageDType | null; cache: StorageDType | null } | null;
}): StorageDType {
  return spec.dtypes?.cache ?? weightDType(spec);
}
