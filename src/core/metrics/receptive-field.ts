/**
 * Receptive field of a stack of local-attention layers (Beltagy et al. 2020, Longformer, §3.1:
 * `ℓ × w` at the top layer ℓ).
 */
import type { ModelSpec } from '../model.js';
import { layerGroups } from './layer-kinds.js';

/**
 * tokens: `receptiveField = Σ_sliding layers w` when no decoder layer has full attention, plus one
 * chunk when chunked layers are present (a chunk never reaches past its own start, so chunked
 * layers add at most one chunk; an upper bound); null when any layer has full attention.
 */
export function receptiveField(spec: ModelSpec): number | null {
  const groups = layerGroups(spec);
  if (groups === null || groups.some((g) => g.window === null)) return null;
  let r = 0;
  for (const g of groups) if (g.attention === 'sliding') r += g.layers * (g.window as number);
  if (groups.some((g) => g.attention === 'chunked')) r += spec.chunkSize as number;
  return Number.isFinite(r) && r > 0 ? r : null;
}
