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
  const text = (name: string) => (typeof values[name] === 'string' ? values[name] : undefined);
  let v: string | undefined;
  if ((v = text('served-span')) !== undefined) patch.span = positiveInteger('served-span', v);
  if ((v = text('trained-span')) !== undefined)
    patch.trainedSpan = positiveInteger('trained-span', v);
  if ((v = text('sequences')) !== undefined) patch.sequences = positiveInteger('sequences', v);
  if ((v = text('device-gib')) !== undefined) patch.deviceGiB = positiveNumber('device-gib', v);
  if ((v = text('weight-dtype')) !== undefined) patch.weights = storageDType('weight-dtype', v);
  if ((v = text('cache-dtype')) !== undefined) patch.cache = storageDType('cache-dtype', v);
  if ((v = text('position-dtype')) !== undefined)
    patch.positions = floatFormat('position-dtype', v);
  if ((v = text('tensor-parallel')) !== undefined)
    patch.tensorParallel = positiveInteger('tensor-parallel', v);
  if ((v = text('pipeline-parallel')) !== undefined)
    patch.pipelineParallel = positiveInteger('pipeline-parallel', v);
  if ((v = text('activation-reserve-gib')) !== undefined)
    patch.activationReserveGiB = nonNegativeNumber('activation-reserve-gib', v);
  if ((v = text('weight-group-size')) !== undefined)
    patch.weightGroupSize = positiveInteger('weight-group-size', v);
  return patch;
}

/** One option of a command's help: the flag with its argument, and what it takes (unit, allowed values, default). */
export type OptionHelp = readonly [flag: string, text: string];

/** The serving flags' help, shared by `inspect` and `diff`. */
export const SERVING_HELP: readonly OptionHelp[] = [
  [
    '--served-span N',
    "tokens served per sequence: a positive whole number (default: the file's serving span, else the policy's, else the declared span)",
  ],
  [
    '--trained-span N',
    "tokens the model was trained at: a positive whole number (default: as stated, else the scaling block's original span, else the declared span)",
  ],
  [
    '--sequences N',
    "sequences held at once: a positive whole number (default: the file's, else the policy's, else 1)",
  ],
  [
    '--device-gib G',
    "device memory in GiB (2^30 bytes): a positive number (default: the file's or the policy's, else no memory budget)",
  ],
  [
    '--weight-dtype D',
    `weight storage: one of ${STORAGE_DTYPES.join(', ')} (default: the file's, else bf16)`,
  ],
  [
    '--cache-dtype D',
    `key/value cache storage: one of ${STORAGE_DTYPES.join(', ')} (default: the weight dtype)`,
  ],
  [
    '--position-dtype D',
    `format positions and angles are computed in: one of ${FLOAT_FORMATS.join(', ')} (default: fp32)`,
  ],
  [
    '--weight-group-size N',
    "weights sharing one scale when --weight-dtype is int4, int8 or fp8: a positive whole number (default: the file's quantization, else none)",
  ],
  [
    '--tensor-parallel N',
    "tensor-parallel degree, devices one layer is split over: a positive whole number (default: the file's or the policy's, else 1)",
  ],
  [
    '--pipeline-parallel N',
    "pipeline-parallel degree, stages the layers are split into: a positive whole number (default: the file's or the policy's, else 1)",
  ],
  [
    '--activation-reserve-gib G',
    'GiB per device kept for activations and workspace beside the reserve fraction: a number of at least 0 (default: 0)',
  ],
];

/** `options:` and one aligned line per option, for a command's usage text. */
export function optionLines(rows: readonly OptionHelp[]): string {
  const width = Math.max(...rows.map(([flag]) => flag.length));
  return `options:\n${rows.map(([flag, text]) => `  ${flag.padEnd(width)}  ${text}`).join('\n')}`;
}
