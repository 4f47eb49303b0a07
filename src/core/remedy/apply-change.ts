/**
 * A change applied to a model description: the one place the field paths of a remedy's `change`
 * meet the spec, so proving a remedy and showing it read the same fields.
 */
import type { FloatFormat, ModelSpec, Scaling, ScalingKind, StorageDType } from '../model.js';
import { FLOAT_FORMATS, SCALING_KINDS, STORAGE_DTYPES } from '../model.js';
import { dtypeQuantization } from '../metrics/quantized-weights.js';
import { weightDType } from '../metrics/storage-bytes.js';
import {
  DEFAULT_BANDED_HIGH,
  DEFAULT_BANDED_LOW,
  DEFAULT_YARN_ALPHA,
  DEFAULT_YARN_BETA,
} from '../parse/spec-defaults.js';
import type { Change, ChangeValue } from '../report/types.js';

/** Every field path a remedy may change, in the order reports list them. */
export const CHANGE_KEYS = [
  'position.base',
  'position.scaling.kind',
  'position.scaling.factor',
  'position.scaling.originalSpan',
  'kvHeads',
  'dtypes.cache',
  'dtypes.positions',
  'serving.span',
  'serving.sequences',
  'serving.tensorParallel',
  'serving.pipelineParallel',
  'dtypes.weights',
  'quantization.groupSize',
] as const;

export type ChangeKey = (typeof CHANGE_KEYS)[number];

/** Thrown for a change no remedy can produce: an unknown field or a value of the wrong kind. */
export class ChangeError extends Error {}

/** Whether `key` is a field path a remedy may change. */
export function isChangeKey(key: string): key is ChangeKey {
  return (CHANGE_KEYS as readonly string[]).includes(key);
}

function numberOf(key: string, value: ChangeValue): number {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new ChangeError(`change ${key} = ${JSON.stringify(value)}: expected a finite number`);
  return value;
}

function nameOf<T extends string>(key: string, value: ChangeValue, allowed: readonly T[]): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new ChangeError(
      `change ${key} = ${JSON.stringify(value)}: expected one of ${allowed.join(', ')}`,
    );
  }
  return value as T;
}

/** A scaling block with the documented defaults, for a code that had none (linear unless told). */
function freshScaling(kind: ScalingKind): Scaling {
  return {
    kind,
    factor: 1,
    originalSpan: null,
    alpha: DEFAULT_YARN_ALPHA,
    beta: DEFAULT_YARN_BETA,
    low: DEFAULT_BANDED_LOW,
    high: DEFAULT_BANDED_HIGH,
  };
}

/**
 * A copy of `spec` with `change` applied; `spec` is not touched. Scaling fields on a rotary code
 * without scaling add a scaling block (linear unless the change names the kind). Throws
 * `ChangeError` for an unknown field, a value of the wrong kind, or a rotary field on another code.
 */
export function applyChange(spec: ModelSpec, change: Change): ModelSpec {
  const next: ModelSpec = { ...spec, dtypes: { ...spec.dtypes }, serving: { ...spec.serving } };
  const position =
    spec.position.kind === 'rotary'
      ? { ...spec.position, scaling: spec.position.scaling ? { ...spec.position.scaling } : null }
      : spec.position;
  const rotary = () => {
    if (position.kind !== 'rotary')
      throw new ChangeError(`change to the rotary code of a ${position.kind} position code`);
    return position;
  };
  const scaling = (): Scaling => {
    const code = rotary();
    if (code.scaling === null) {
      const kind = change['position.scaling.kind'];
      code.scaling = freshScaling(
        kind === undefined ? 'linear' : nameOf('position.scaling.kind', kind, SCALING_KINDS),
      );
    }
    return code.scaling;
  };
  for (const [key, value] of Object.entries(change)) {
    if (!isChangeKey(key))
      throw new ChangeError(
        `change ${key}: not a field a remedy changes (${CHANGE_KEYS.join(', ')})`,
      );
    switch (key) {
      case 'position.base':
        rotary().base = numberOf(key, value);
        break;
      case 'position.scaling.kind':
        scaling().kind = nameOf(key, value, SCALING_KINDS);
        break;
      case 'position.scaling.factor':
        scaling().factor = numberOf(key, value);
        break;
      case 'position.scaling.originalSpan':
        scaling().originalSpan = numberOf(key, value);
        break;
      case 'kvHeads':
        next.kvHeads = numberOf(key, value);
        break;
      case 'dtypes.cache':
        next.dtypes.cache = nameOf<StorageDType>(key, value, STORAGE_DTYPES);
        break;
      case 'dtypes.positions':
        next.dtypes.positions = nameOf<FloatFormat>(key, value, FLOAT_FORMATS);
        break;
      case 'serving.span':
        next.serving.span = numberOf(key, value);
        break;
      case 'serving.sequences':
        next.serving.sequences = numberOf(key, value);
        break;
      case 'serving.tensorParallel':
        next.serving.tensorParallel = numberOf(key, value);
        break;
      case 'serving.pipelineParallel':
        next.serving.pipelineParallel = numberOf(key, value);
        break;
      // A new weight format replaces the quantization the description had.
      case 'dtypes.weights':
        next.dtypes.weights = nameOf<StorageDType>(key, value, STORAGE_DTYPES);
        next.quantization = null;
        break;
      case 'quantization.groupSize':
        numberOf(key, value);
        break;
    }
  }
  if (Object.hasOwn(change, 'quantization.groupSize')) {
    const q = dtypeQuantization(
      weightDType(next),
      numberOf('quantization.groupSize', change['quantization.groupSize']!),
    );
    if (q === null)
      throw new ChangeError(
        `change quantization.groupSize: the weight format ${weightDType(next)} is not a quantized format (int4, int8, fp8)`,
      );
    next.quantization = q;
  }
  next.position = position;
  return next;
}

/** The value a field has before the change, in the change's terms; null when not stated (a default applies). */
export function currentValue(spec: ModelSpec, key: string): ChangeValue | null {
  const code = spec.position;
  const scaling = code.kind === 'rotary' ? code.scaling : null;
  switch (key) {
    case 'position.base':
      return code.kind === 'rotary' ? code.base : null;
    case 'position.scaling.kind':
      return scaling ? scaling.kind : null;
    case 'position.scaling.factor':
      return scaling ? scaling.factor : null;
    case 'position.scaling.originalSpan':
      return scaling ? scaling.originalSpan : null;
    case 'kvHeads':
      return spec.kvHeads;
    case 'dtypes.cache':
      return spec.dtypes.cache;
    case 'dtypes.positions':
      return spec.dtypes.positions;
    case 'serving.span':
      return spec.serving.span;
    case 'serving.sequences':
      return spec.serving.sequences;
    case 'serving.tensorParallel':
      return spec.serving.tensorParallel ?? null;
    case 'serving.pipelineParallel':
      return spec.serving.pipelineParallel ?? null;
    case 'dtypes.weights':
      return spec.quantization
        ? `${spec.quantization.method} (${spec.quantization.bits}-bit)`
        : spec.dtypes.weights;
    case 'quantization.groupSize':
      return spec.quantization?.groupSize ?? null;
    default:
      return null;
  }
}

/** The change's entries in `CHANGE_KEYS` order, so every report lists them the same way. */
export function changeEntries(change: Change): [ChangeKey, ChangeValue][] {
  return CHANGE_KEYS.filter((key) => Object.hasOwn(change, key)).map((key) => [key, change[key]!]);
}
