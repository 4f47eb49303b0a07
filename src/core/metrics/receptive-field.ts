/**
 * Receptive field of a stack of sliding-window layers (Beltagy et al. 2020, Longformer, §3.1:
 * `ℓ × w` at the top layer ℓ).
 */
import type { ModelSpec } from '../model.js';
import { positiveCount } from './sizes.js';
import { windowedLayers } from './kv-cache.js';

/** tokens: `receptiveField = layers · w` when every decoder layer has the window w; null otherwise. */
export function receptiveField(spec: ModelSpec): number | null {
  const layers = positiveCount(spec.layers);
  const windowed = windowedLayers(spec);
  if (layers === null || windowed === null || windowed !== layers) return null;
  const r = layers * (spec.slidingWindow as number);
  return Number.isFinite(r) ? r : null;
}
