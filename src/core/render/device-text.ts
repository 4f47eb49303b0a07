/**
 * The memory fit in words, the same in every report: per device when a replica spans more than
 * one device ("per device, 8 devices: weights 16.1 GiB, cache 10 GiB at 4,096 tokens × 64
 * sequences"), and what the usable memory leaves out (the reserve). Plain text; the markdown and
 * HTML renderers escape it.
 */
import { reserveWords, usableDeviceBytes } from '../metrics/memory-curve.js';
import type { Metrics } from '../metrics/types.js';
import type { ModelSpec } from '../model.js';
import { formatBytes, formatInteger, formatNumber } from '../format/units.js';

/** `per device, 8 devices (tensor-parallel 8 × pipeline-parallel 1): weights 16.1 GiB, cache 10 GiB at 4,096 tokens × 64 sequences`; null on one device. */
export function perDeviceText(spec: ModelSpec, metrics: Metrics): string | null {
  const devices = metrics.devices;
  if (devices === null || devices <= 1 || metrics.weightBytesPerDevice === null) return null;
  const sequences = spec.serving.sequences ?? 1;
  const cache =
    metrics.memoryBytesPerDevice === null
      ? null
      : metrics.memoryBytesPerDevice - metrics.weightBytesPerDevice;
  const layout = `tensor-parallel ${formatInteger(spec.serving.tensorParallel ?? 1)} × pipeline-parallel ${formatInteger(spec.serving.pipelineParallel ?? 1)}`;
  const at =
    metrics.evaluationSpan === null
      ? ''
      : ` at ${formatInteger(metrics.evaluationSpan)} tokens × ${formatInteger(sequences)} sequence${sequences === 1 ? '' : 's'}`;
  return `per device, ${formatInteger(devices)} devices (${layout}): weights ${formatBytes(metrics.weightBytesPerDevice)}, cache ${formatBytes(cache)}${at}`;
}

/**
 * `358 sequences fit per replica in 72 GiB usable of 80 GiB per device (after the 10 % reserve
 * kept for activations, workspace and fragmentation)`; null without a device budget.
 */
export function fitText(spec: ModelSpec, metrics: Metrics, withReserve = true): string | null {
  const usable = usableDeviceBytes(spec);
  if (usable === null || metrics.fitSequences === null) return null;
  const devices = metrics.devices ?? 1;
  const n = metrics.fitSequences;
  const fit =
    n > 0
      ? `${formatInteger(n)} sequence${n === 1 ? '' : 's'} of ${formatInteger(metrics.evaluationSpan)} tokens fit${devices > 1 ? ' per replica' : ''}`
      : `no sequence of ${formatInteger(metrics.evaluationSpan)} tokens fits${devices > 1 ? ' a replica' : ''}`;
  const reserve = withReserve ? ` (${reserveWords(spec)})` : '';
  return `${fit} in ${formatBytes(usable)} usable of ${formatNumber(spec.serving.deviceGiB ?? null)} GiB${devices > 1 ? ' per device' : ''}${reserve}`;
}
