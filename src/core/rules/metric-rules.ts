import type { Finding, LocationMap, ModelSpec } from '../model.js';
import type { MetricPath, Metrics } from '../metrics/types.js';
import { MAX_SCAN_ELEMENTS, MAX_SCAN_SPAN, MAX_SCAN_WORK } from '../metrics/scan-limits.js';
import { reserveWords, usableDeviceBytes } from '../metrics/memory-curve.js';
import { formatBytes, formatInteger, formatNumber, formatTokens } from '../format/units.js';
import { RULES, type RuleId } from './catalog.js';
import { firstStated } from './first-stated.js';

const at = (locations: LocationMap, ...paths: string[]) => firstStated(locations, paths);

function finding(
  rule: RuleId,
  message: string,
  where: { key: string | null; line: number | null },
): Finding {
  return { rule, severity: RULES[rule].severity, message, ...where };
}

function spanName(
  spec: ModelSpec,
  locations: LocationMap,
): { label: string; where: { key: string | null; line: number | null } } {
  if (spec.serving.span !== null)
    return { label: 'served span', where: at(locations, 'serving.span') };
  return { label: 'declared span', where: at(locations, 'declaredSpan') };
}

function codeLabel(spec: ModelSpec): string {
  const code = spec.position;
  if (code.kind !== 'rotary') return `${code.kind} position code`;
  return code.scaling
    ? `rotary code with ${code.scaling.kind} scaling`
    : 'rotary code without scaling';
}

/** Findings that follow from one file's metrics: span past reach, unaccounted spans, rounding. */
export function metricFindings(
  spec: ModelSpec,
  metrics: Metrics,
  locations: LocationMap,
): Finding[] {
  const findings: Finding[] = [];
  const T = metrics.evaluationSpan;
  const { label, where } = spanName(spec, locations);

  if (metrics.headroom !== null && metrics.headroom < 0 && metrics.reach !== null && T !== null) {
    const L0 = metrics.trainedSpan;
    let advice: string;
    if (spec.position.kind === 'learned') {
      advice = `grow the position table to ${formatInteger(T)} rows (retraining it), or serve at most ${formatInteger(metrics.reach)} tokens`;
    } else if (spec.position.kind === 'rotary' && L0 !== null && L0 > 0) {
      const kind = spec.position.scaling?.kind ?? 'linear';
      advice = `raise the ${kind} scaling factor to at least ${formatInteger(Math.ceil(T / L0))} (covers ${formatInteger(Math.ceil(T / L0) * L0)}), or serve at most ${formatInteger(metrics.reach)} tokens`;
    } else {
      advice = `serve at most ${formatInteger(metrics.reach)} tokens`;
    }
    findings.push(
      finding(
        'span-past-reach',
        `The ${label} ${formatTokens(T)} is ${formatInteger(-metrics.headroom)} tokens past the reach ${formatTokens(metrics.reach)} of the ${codeLabel(spec)} (trained span ${formatTokens(L0)}); ${advice}.`,
        where,
      ),
    );
  }

  if (
    spec.position.kind === 'rotary' &&
    spec.position.scaling &&
    spec.trainedSpan === null &&
    metrics.scalingCover !== null &&
    metrics.declaredSpan !== null &&
    metrics.declaredSpan > metrics.scalingCover
  ) {
    const scaling = spec.position.scaling;
    findings.push(
      finding(
        'span-beyond-scaling-cover',
        `The reach ${formatTokens(metrics.reach)} is the declared span, taken on assumption: ${scaling.kind} scaling alone accounts for ${formatTokens(metrics.scalingCover)} (original span ${formatTokens(metrics.trainedSpan)} × factor ${scaling.factor}), and no tuned span is stated. If the scaled model was trained or tuned at ${formatTokens(metrics.declaredSpan)}, state it as the trained span (--trained-span ${metrics.declaredSpan}, or the policy's serving block); it is then the tuned span and is not multiplied by the factor again. Otherwise raise the factor to ${formatInteger(Math.ceil(metrics.declaredSpan / (metrics.trainedSpan ?? 1)))}.`,
        at(locations, 'declaredSpan'),
      ),
    );
  }

  const usable = usableDeviceBytes(spec);
  const devices = metrics.devices ?? 1;
  const perDevice = metrics.memoryBytesPerDevice;
  if (usable !== null && perDevice !== null && perDevice > usable) {
    const sequences = spec.serving.sequences ?? 1;
    const fit =
      metrics.fitSequences !== null && metrics.fitSequences > 0
        ? `at most ${formatInteger(metrics.fitSequences)} sequence${metrics.fitSequences === 1 ? '' : 's'} of ${formatTokens(T)} fit`
        : 'not even one sequence at this span fits';
    const held = `${formatInteger(sequences)} sequence${sequences === 1 ? '' : 's'} of ${formatTokens(T)} tokens`;
    const budget = `${formatBytes(usable)} usable of ${formatNumber(spec.serving.deviceGiB)} GiB`;
    const message =
      devices > 1
        ? `Per device (${formatInteger(devices)} devices: tensor-parallel ${formatInteger(spec.serving.tensorParallel ?? 1)} × pipeline-parallel ${formatInteger(spec.serving.pipelineParallel ?? 1)}), weights (${formatBytes(metrics.weightBytesPerDevice)}) plus the key/value cache for ${held} need ${formatBytes(perDevice)}, over the ${budget} per device (${reserveWords(spec)}); ${fit} per replica: hold fewer sequences, a narrower cache dtype, more devices or quantized weights, or serve a shorter span.`
        : `Weights (${formatBytes(metrics.weightBytes)}) plus the key/value cache for ${held} (${formatBytes(metrics.cacheBytesAtSpan)}) need ${formatBytes(metrics.memoryBytes)}, over the ${budget} (${reserveWords(spec)}); ${fit}: hold fewer sequences, a narrower cache dtype or fewer key/value heads, spread the replica over more devices, store the weights quantized, or serve a shorter span.`;
    findings.push(
      finding(
        'memory-over-budget',
        message,
        at(
          locations,
          'serving.sequences',
          'serving.span',
          'serving.deviceGiB',
          'serving.tensorParallel',
          'dtypes.cache',
        ),
      ),
    );
  }

  const format = spec.dtypes.positions ?? 'fp32';
  const rounding = metrics.precision[format];
  const formatWhere = at(locations, 'dtypes.positions', 'serving.span', 'declaredSpan');
  if (rounding.collidingPositions !== null && rounding.collidingPositions > 0 && T !== null) {
    const overflow =
      rounding.overflowPosition !== null
        ? `; from position ${formatInteger(rounding.overflowPosition)} on it overflows`
        : '';
    findings.push(
      finding(
        'positions-collide',
        `In ${format}, ${formatInteger(rounding.collidingPositions)} of the ${formatInteger(T - 1)} neighbouring position pairs in the ${label} ${formatTokens(T)} round to the same value (every integer is exact only up to ${formatInteger(rounding.positionExactLimit)})${overflow}; compute positions in fp32, or serve at most ${formatInteger(rounding.positionExactLimit)} tokens.`,
        formatWhere,
      ),
    );
  }
  if (rounding.blurredPairs !== null && rounding.blurredPairs > 0) {
    findings.push(
      finding(
        'pairs-blurred',
        `In ${format}, ${formatInteger(rounding.blurredPairs)} frequency pairs give two neighbouring positions within the ${label} ${formatTokens(T)} the same rounded angle, so those pairs cannot tell the neighbours apart; compute angles in a wider format if the model relies on them.`,
        formatWhere,
      ),
    );
  }
  const missing = uncomputedScanMetrics(metrics);
  if (missing.length > 0 && T !== null) {
    const found =
      metrics.discriminationSpan !== null
        ? ` (the first negative sum, discriminationSpan ${formatInteger(metrics.discriminationSpan)}, was found before the stop and is exact)`
        : '';
    findings.push(
      finding(
        'scan-incomplete',
        `The positional scans over the ${label} ${formatTokens(T)} stopped at their bound (at most ${formatInteger(MAX_SCAN_SPAN)} tokens, ${formatInteger(MAX_SCAN_ELEMENTS)} pair-positions and ${formatInteger(MAX_SCAN_WORK)} units of similarity-scan work), so ${missing.join(', ')} ${missing.length === 1 ? 'is' : 'are'} not computed${found}; a limit on ${missing.length === 1 ? 'it' : 'them'} counts as crossed. Review this span by hand, or serve a shorter one.`,
        where,
      ),
    );
  }
  return findings;
}

/**
 * The scan metrics a rotary or sinusoidal code should have over its span but does not: the scans
 * stopped at `MAX_SCAN_SPAN`, `MAX_SCAN_ELEMENTS` or `MAX_SCAN_WORK`. An angle error left null
 * because something overflows is not missing: overflow is its answer.
 */
export function uncomputedScanMetrics(metrics: Metrics): MetricPath[] {
  const T = metrics.evaluationSpan;
  if (metrics.fastestWavelength === null || T === null || T < 2) return [];
  const missing: MetricPath[] = [];
  if (metrics.separationFloor === null) {
    missing.push('separationFloor', 'separationFloorOffset');
    if (metrics.discriminationSpan === null) missing.push('discriminationSpan');
  }
  for (const format of ['fp32', 'bf16', 'fp16'] as const) {
    const p = metrics.precision[format];
    if (p.angleErrorMax === null && p.overflowPosition === null)
      missing.push(`precision.${format}.angleErrorMax`);
    if (p.blurredPairs === null) missing.push(`precision.${format}.blurredPairs`);
  }
  return missing;
}
