import type { LocationMap, ModelSpec, ServingPatch, SourceLocation } from './model.js';

/** How a patch meets the file's own values: policy defaults yield to them, CLI flags replace them. */
export type PatchMode = 'default' | 'override';

type Field = keyof ServingPatch;

/** Where each patch field lands in the spec, as a location-map path. */
const SPEC_PATH: Record<Field, string> = {
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
};

function current(spec: ModelSpec, field: Field): unknown {
  switch (field) {
    case 'weights': case 'cache': case 'positions': return spec.dtypes[field];
    case 'trainedSpan': return spec.trainedSpan;
    default: return spec.serving[field];
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
  for (const field of Object.keys(SPEC_PATH) as Field[]) {
    const value = patch[field];
    if (value === undefined) continue;
    if (mode === 'default' && current(spec, field) !== null) continue;
    switch (field) {
      case 'weights': case 'cache': next.dtypes[field] = value as never; break;
      case 'positions': next.dtypes.positions = value as never; break;
      case 'trainedSpan': next.trainedSpan = value as number; break;
      default: next.serving[field] = value as number;
    }
    nextLocations[SPEC_PATH[field]] = typeof origin === 'function' ? origin(field) : origin;
  }
  return { spec: next, locations: nextLocations };
}
