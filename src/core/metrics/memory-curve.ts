/**
 * Device memory as a function of the span, for charts (the `memoryBytes` of docs/metrics.md at any span).
 */
import type { ModelSpec } from '../model.js';
import { servedSequences } from './kv-cache.js';
import { DEFAULT_RESERVE } from './memory-fit.js';
import {
  cachePerSequencePerDevice,
  memoryBytesPerDevice,
  weightBytesPerDevice,
} from './per-device.js';
import { storedWeightBytes } from './quantized-weights.js';
import { positiveCount, positiveFinite } from './sizes.js';

/**
 * bytes: `memoryBytesPerDevice` with T = `span` (on one device, `weightBytes + cacheBytesAtSpan`);
 * null for degenerate input.
 */
export function memoryAtSpan(spec: ModelSpec, span: number): number | null {
  const t = positiveCount(span);
  return memoryBytesPerDevice(
    weightBytesPerDevice(spec, storedWeightBytes(spec)),
    cachePerSequencePerDevice(spec, t),
    servedSequences(spec),
  );
}

/**
 * bytes: memory one device offers weights and cache: `deviceGiB · 2^30 · (1 - reserve) -
 * activationReserveGiB · 2^30`; null without a device budget (reserve default: `0.1`, activation
 * reserve default: none). The reserve share stands for what the runtime holds beside weights and
 * cache: activations, workspace, fragmentation.
 */
export function usableDeviceBytes(spec: ModelSpec): number | null {
  const device = positiveFinite(spec.serving?.deviceGiB);
  const stated = spec.serving?.reserve;
  const reserve = stated === null || stated === undefined ? DEFAULT_RESERVE : stated;
  if (device === null || !(Number.isFinite(reserve) && reserve >= 0 && reserve < 1)) return null;
  const activation = spec.serving?.activationReserveGiB;
  if (activation === null || activation === undefined) return device * 2 ** 30 * (1 - reserve);
  if (!(Number.isFinite(activation) && activation >= 0)) return null;
  return device * 2 ** 30 * (1 - reserve) - activation * 2 ** 30;
}

/**
 * What the usable memory leaves out, in words, for every report that shows a fit: the reserve
 * share (activations, workspace, fragmentation) and the activation reserve per device.
 */
export function reserveWords(spec: ModelSpec): string {
  const stated = spec.serving?.reserve;
  const reserve = stated === null || stated === undefined ? DEFAULT_RESERVE : stated;
  const share = `${Number((reserve * 100).toPrecision(4))} %`;
  const activation = spec.serving?.activationReserveGiB;
  const extra =
    typeof activation === 'number' && Number.isFinite(activation) && activation > 0
      ? ` and ${Number(activation.toPrecision(4))} GiB for activations`
      : '';
  return `after the ${share} reserve kept for activations, workspace and fragmentation${extra}`;
}
