import type { LocationMap, ModelSpec, ServingPatch, SourceLocation } from './model.js';
import { dtypeQuantization } from './metrics/quantized-weights.js';
import { weightDType } from './metrics/storage-bytes.js';

/** How a patch meets the file's own values: policy defaults yield to them, CLI flags replace them. */
export type PatchMode = 'default' | 'override';

type Field = keyof ServingPatch;

/**
 * Where each patch field lands in the spec, as the location map and a remedy's change name the
 * field: the one list of what a serving patch (a policy's `serving`, the CLI's flags) can set. A
 * group size sets the whole `quantization` record, located as `quantization`.
 */
export const SERVING_SPEC_PATH: Readonly<Record<Field, string>> = {
  span: 'serving.span',
  sequences: 'serving.sequences',
  deviceGiB: 'serving.deviceGiB',
  reserve: 'serving.reserve',
  outputTokens: 'serving.outputTokens',
  promptTokens: 'serving.promptTokens',
  weights: 'dtypes.weights',
  cache: 'dtypes.cache',
  positions: 'dtypes.positions',
  trainedSpan: 'trainedSpan',
  tensorParallel: 'serving.tensorParallel',
  pipelineParallel: 'serving.pipelineParallel',
  activationReserveGiB: 'serving.activationReserveGiB',
  weightGroupSize: 'quantization.groupSize',
};

function current(spec: ModelSpec, field: Field): unknown {
  switch (field) {
    case 'weights':
    case 'cache':
    case 'positions':
      return spec.dtypes[field];
    case 'trainedSpan':
      return spec.trainedSpan;
    case 'weightGroupSize':
      return spec.quantization ?? null;
    default:
      return spec.serving[field] ?? null;
  }
}

/**
 * A copy of `spec` with the patch applied, and the locations of the patched fields pointed at
 * `origin` (the policy file or the command line), so findings name where a value came from.
 */
export function applyServing(
  spec: ModelSpec,
  locations: LocationMap,
  patch: ServingPatch,
  mode: PatchMode,
  origin: SourceLocation | ((field: Field) => SourceLocation),
): { spec: ModelSpec; locations: LocationMap } {
  const next: ModelSpec = { ...spec, dtypes: { ...spec.dtypes }, serving: { ...spec.serving } };
  const nextLocations: LocationMap = { ...locations };
  const where = (field: Field) => (typeof origin === 'function' ? origin(field) : origin);
  let weightsSet = false;
  for (const field of Object.keys(SERVING_SPEC_PATH) as Field[]) {
    const value = patch[field];
    if (value === undefined || field === 'weightGroupSize') continue;
    if (mode === 'default' && current(spec, field) !== null) continue;
    switch (field) {
      case 'weights':
      case 'cache':
        next.dtypes[field] = value as never;
        weightsSet ||= field === 'weights';
        break;
      case 'positions':
        next.dtypes.positions = value as never;
        break;
      case 'trainedSpan':
        next.trainedSpan = value as number;
        break;
      default:
        next.serving[field] = value as number;
    }
    nextLocations[SERVING_SPEC_PATH[field]] = where(field);
  }
  // A weight format given here replaces the file's own quantization; with a group size, a
  // quantized format (int4, int8, fp8) counts its matrices at low width plus scales.
  const group = patch.weightGroupSize;
  const fileQuantized = spec.quantization !== null && spec.quantization !== undefined;
  if (weightsSet && mode === 'override') next.quantization = null;
  if (group !== undefined && !(mode === 'default' && fileQuantized)) {
    const q = dtypeQuantization(weightDType(next), group);
    if (q !== null) {
      next.quantization = q;
      nextLocations.quantization = where('weightGroupSize');
    }
  }
  return { spec: next, locations: nextLocations };
}
