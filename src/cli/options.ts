import type { FloatFormat, ServingPatch, StorageDType } from '../core/model.js';
import { FLOAT_FORMATS, STORAGE_DTYPES } from '../core/model.js';

/** A command-line mistake: reported in one line with exit status 2, never a stack trace. */
export class UsageError extends Error {}

/** A positive whole number of tokens or sequences, up to 2^53. */
export function positiveInteger(flag: string, text: string): number {
  const value = Number(text);
  if (!/^\d+$/.test(text.trim()) || !Number.isSafeInteger(value) || value <= 0) {
    throw new UsageError(`--${flag} takes a positive whole number, got '${text}'`);
  }
  return value;
}

export function positiveNumber(flag: string, text: string): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || value <= 0) {
    throw new UsageError(`--${flag} takes a positive number, got '${text}'`);
  }
  return value;
}

export function nonNegativeNumber(flag: string, text: string): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || value < 0) {
    throw new UsageError(`--${flag} takes a number of at least 0, got '${text}'`);
  }
  return value;
}

export function storageDType(flag: string, text: string): StorageDType {
  if ((STORAGE_DTYPES as readonly string[]).includes(text)) return text as StorageDType;
  throw new UsageError(`--${flag} takes one of ${STORAGE_DTYPES.join(', ')}, got '${text}'`);
}

export function floatFormat(flag: string, text: string): FloatFormat {
  if ((FLOAT_FORMATS as readonly string[]).includes(text)) return text as FloatFormat;
  throw new UsageError(`--${flag} takes one of ${FLOAT_FORMATS.join(', ')}, got '${text}'`);
}

/** Serving flags shared by `inspect` and `diff`, for node:util parseArgs. */
export const SERVING_FLAGS = {
  'served-span': { type: 'string' },
  'trained-span': { type: 'string' },
  sequences: { type: 'string' },
  'device-gib': { type: 'string' },
  'weight-dtype': { type: 'string' },
  'cache-dtype': { type: 'string' },
  'position-dtype': { type: 'string' },
  'tensor-parallel': { type: 'string' },
  'pipeline-parallel': { type: 'string' },
  'activation-reserve-gib': { type: 'string' },
  'weight-group-size': { type: 'string' },
} as const;

/** The serving patch the flags describe (only the flags given). */
export function servingPatch(values: Record<string, unknown>): ServingPatch {
  const patch: ServingPatch = {};
  const text = (name: string) => (typeof values[name] === 'string' ? (values[name] as string) : undefined);
  let v: string | undefined;
  if ((v = text('served-span')) !== undefined) patch.span = positiveInteger('served-span', v);
  if ((v = text('trained-span')) !== undefined) patch.trainedSpan = positiveInteger('trained-span', v);
  if ((v = text('sequences')) !== undefined) patch.sequences = positiveInteger('sequences', v);
  if ((v = text('device-gib')) !== undefined) patch.deviceGiB = positiveNumber('device-gib', v);
  if ((v = text('weight-dtype')) !== undefined) patch.weights = storageDType('weight-dtype', v);
  if ((v = text('cache-dtype')) !== undefined) patch.cache = storageDType('cache-dtype', v);
  if ((v = text('position-dtype')) !== undefined) patch.positions = floatFormat('position-dtype', v);
  if ((v = text('tensor-parallel')) !== undefined) patch.tensorParallel = positiveInteger('tensor-parallel', v);
  if ((v = text('pipeline-parallel')) !== undefined) patch.pipelineParallel = positiveInteger('pipeline-parallel', v);
  if ((v = text('activation-reserve-gib')) !== undefined) patch.activationReserveGiB = nonNegativeNumber('activation-reserve-gib', v);
  if ((v = text('weight-group-size')) !== undefined) patch.weightGroupSize = positiveInteger('weight-group-size', v);
  return patch;
}
