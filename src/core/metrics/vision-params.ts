/**
 * Parameters of a ViT-style vision tower (Dosovitskiy et al. 2021, "An Image is Worth 16x16
 * Words", section 3.1): patch embedding, class token and position table, encoder layers,
 * a final norm. Reported apart from the language model's `params` (docs/metrics.md leaves the tower
 * out of `params`).
 */
import type { VisionTower } from '../model.js';
import { attentionParams, feedForwardParams, normParams } from './parameter-count.js';
import { positiveCount } from './sizes.js';

/**
 * count: `visionParams`: patch embedding `channels·patch²·hidden + hidden` (a convolution with a
 * bias), class token `hidden`, position table `((image/patch)² + 1)·hidden`, per layer attention
 * (q, k, v, o with biases) + plain feed-forward with biases + two LayerNorms, and one final
 * LayerNorm. Null without a tower or when a size is not a positive whole number.
 */
export function visionParams(tower: VisionTower | null): number | null {
  if (tower === null) return null;
  const layers = positiveCount(tower.layers);
  const hidden = positiveCount(tower.hidden);
  const ffn = positiveCount(tower.ffn);
  const patch = positiveCount(tower.patch);
  const image = positiveCount(tower.image);
  const channels = positiveCount(tower.channels);
  if (
    layers === null ||
    hidden === null ||
    ffn === null ||
    patch === null ||
    image === null ||
    channels === null
  )
    return null;
  const patches = Math.floor(image / patch) ** 2;
  const embedding = channels * patch * patch * hidden + hidden + hidden + (patches + 1) * hidden;
  // Heads do not change the count: q, k, v, o are hidden × hidden whatever the split.
  const layer =
    attentionParams(hidden, 1, 1, hidden, true) +
    feedForwardParams(hidden, ffn, false, true) +
    2 * normParams(hidden, true);
  const total = embedding + layers * layer + normParams(hidden, true);
  return Number.isSafeInteger(total) ? total : null;
}
