/**
 * For one blocking finding, the nearest change that passes. Each kind of change (a scaling
 * factor, a served span, a sequence count, a cache dtype, a key/value head count, a rotary base,
 * a position format) first searches the cheap metrics it moves for the nearest value that clears
 * the finding, then proves that value: the whole description measured and judged again (see
 * `prove.ts`). The first kind that proves is the remedy, the other kinds that prove are
 * alternatives, and when none proves the reasons are given. Searches are bounded: a whole-number
 * bisection (at most 54 steps), at most `MAX_PROOFS_PER_KIND` full proofs per kind, and the
 * capped stages of the base search (`rotary-base.ts`).
 */
import { checkLimit } from '../policy/limit-check.js';
import type { Limit } from '../policy/judging.js';
import { isMetricPath, metricValue } from '../metrics/metric-path.js';
import { computeMetrics, frequencyPlan } from '../metrics/compute.js';
import { positionExactLimit } from '../metrics/float-format.js';
import { servedSequences } from '../metrics/kv-cache.js';
import { usableDeviceBytes } from '../metrics/memory-curve.js';
import { firstNegativeOffset } from '../metrics/first-negative.js';
import { baseFrequencies } from '../metrics/frequencies.js';
import { similarityScan } from '../metrics/similarity-scan.js';
import { MAX_REMEDY_SCAN_WORK, MAX_SCAN_WORK } from '../metrics/scan-limits.js';
import { viaMemo } from '../metrics/scan-memo.js';
import { positiveCount } from '../metrics/sizes.js';
import { evaluationSpan, trainedSpan } from '../metrics/spans.js';
import { bytesPerElement, cacheDType, weightDType } from '../metrics/storage-bytes.js';
import { deviceCount, parallelDegrees, shardingDegrees, shards } from '../metrics/per-device.js';
import { DEFAULT_GROUP_SIZE } from '../metrics/quantized-weights.js';
import type { Finding, FloatFormat, ModelSpec, StorageDType } from '../model.js';
import { FLOAT_FORMATS, STORAGE_DTYPES } from '../model.js';
import { isRuleId, RULES, type RuleId } from '../rules/catalog.js';
import { formatInteger, formatNumber, formatTokens } from '../format/units.js';
import { applyChange } from './apply-change.js';
import { lightMetric, rangeMetrics, budgetMetrics } from './light-metrics.js';
import { uncomputedScanMetrics } from '../rules/metric-rules.js';
import {
  MAX_FILE_PROOF_WORK,
  prove,
  type FindingIdentity,
  type Proof,
  type RemedyContext,
} from './prove.js';
import { searchRotaryBase, type BaseDirection, type BaseTrial } from './rotary-base.js';
import { coveringFactor } from './scaling-factor.js';
import type { Change, Remedy, RemedyFields } from '../report/types.js';
import { largestPassing } from './whole-search.js';

/** Full proofs one kind of change may run before it gives up (default: `4`). */
export const MAX_PROOFS_PER_KIND = 4;

/**
 * pair·offsets: work all the proofs for one finding may do, a proof costing its pairs times its
 * span; a proof past it (or past the file's `MAX_FILE_PROOF_WORK`) is not run (default: `2^31`,
 * about 1.6 s at the measured 0.75 ns per pair·offset of `computeMetrics`).
 */
export const MAX_PROOF_WORK = 2 ** 31;

/** The finding a search works on, with the limit it crossed when it is a limit. */
interface Target extends FindingIdentity {
  limit: Limit | null;
  /** The base version's value of the limited metric (for `max-increase-pct`). */
  baseValue: number | null;
  /** Proof work left for this finding (see `MAX_PROOF_WORK`). */
  work: { left: number };
}

/** pair·offsets a proof of `spec` scans: its frequency pairs times its span (1 without either). */
export function proofCost(spec: ModelSpec): number {
  const pairs = baseFrequencies(spec)?.length ?? 0;
  return Math.max(1, pairs) * Math.max(1, evaluationSpan(spec) ?? 1);
}

/** One kind's result: a proven remedy, or why there is none. */
interface KindOutcome {
  remedy: Remedy | null;
  whyNot: string | null;
}

type Resolves = (spec: ModelSpec) => boolean;

const none = (whyNot: string): KindOutcome => ({ remedy: null, whyNot });

/** The value of a metric for a changed spec: cheaply when it needs no scan, else measured in full (within the search's scan budget). */
function valueOf(spec: ModelSpec, metric: string, ctx: RemedyContext): number | null {
  const light = lightMetric(spec, metric);
  if (light !== undefined) return light;
  return isMetricPath(metric)
    ? metricValue(computeMetrics(spec, ctx.memo, ctx.scans), metric)
    : null;
}

/** Why a kind stops once the file's scan budget is spent (`MAX_REMEDY_SCAN_WORK`). */
function budgetSpent(what: string): KindOutcome {
  return none(
    `${what} was not proven: the remedy search of this file spent its ${formatInteger(MAX_REMEDY_SCAN_WORK)} units of similarity-scan work`,
  );
}

function blockerText(id: string): string {
  return id.startsWith('limit-crossed:') ? `the ${id.slice('limit-crossed:'.length)} limit` : id;
}

function describeBlockers(proof: Proof): string {
  return proof.blockers.map(blockerText).join(', ');
}

/**
 * What the changed description still breaks among the metrics the remedy shows: a blocking
 * rule about them, or any limit on them (whatever its severity). A remedy that breaks one is
 * never shown: its own figures would contradict a finding.
 */
export function ownBreaks(proof: Proof, shown: readonly string[]): string[] {
  const out = new Set<string>();
  for (const finding of proof.decision.findings) {
    if (finding.rule === 'limit-crossed' && finding.metric && shown.includes(finding.metric))
      out.add(`the ${finding.metric} limit`);
    if (
      finding.severity === 'block' &&
      (remedyRule(finding.rule)?.metrics ?? []).some((m) => shown.includes(m))
    )
      out.add(finding.rule);
  }
  return [...out];
}

/** `resolves`, and every policy limit on a shown metric that needs no scan holds as well. */
function withOwnLimits(ctx: RemedyContext, resolves: Resolves, shown: readonly string[]): Resolves {
  const limited = shown.filter((m) => ctx.judging.limits[m] !== undefined && isMetricPath(m));
  if (limited.length === 0) return resolves;
  return (spec) =>
    resolves(spec) &&
    limited.every((m) => {
      const value = lightMetric(spec, m);
      if (value === undefined) return true; // scanned metrics are judged by the proof
      const base = ctx.base && isMetricPath(m) ? metricValue(ctx.base.metrics, m) : null;
      return checkLimit(ctx.judging.limits[m]!, base, value).crossed.length === 0;
    });
}

/** ` within the limits` when a policy limit bears on a shown metric, for the reasons a kind gives. */
function withinWords(ctx: RemedyContext, shown: readonly string[]): string {
  return shown.some((m) => ctx.judging.limits[m] !== undefined) ? ' within the limits' : '';
}

function remedyOf(
  change: Change,
  proof: Proof,
  shown: string[],
  target: Target,
  cost?: (change: Change) => string,
): Remedy {
  const metrics: Record<string, number | null> = {};
  for (const name of [...(target.metric ? [target.metric] : []), ...shown]) {
    if (isMetricPath(name) && !(name in metrics)) metrics[name] = metricValue(proof.metrics, name);
  }
  return { change, metrics, raises: proof.raises, ...(cost ? { cost: cost(change) } : {}) };
}

/**
 * Proves candidate changes in order (at most `MAX_PROOFS_PER_KIND`), returning the first that
 * passes; `what` names the kind in reasons.
 */
function proveFirst(
  ctx: RemedyContext,
  target: Target,
  candidates: Change[],
  shown: string[],
  what: string,
  costOf?: (change: Change) => string,
): KindOutcome {
  let last: Proof | null = null;
  let lastBreaks: string[] = [];
  let proofs = 0;
  for (const change of candidates.slice(0, MAX_PROOFS_PER_KIND)) {
    if (ctx.scans.cut || ctx.scans.left <= 0) return budgetSpent(what);
    const cost = proofCost(applyChange(ctx.head.spec, change));
    if (cost > target.work.left || cost > ctx.work.left) {
      return none(
        `${what} was not proven: its proof would scan ${formatInteger(cost)} pair·offsets, past what is left of the search's budget (${formatInteger(MAX_PROOF_WORK)} per finding, ${formatInteger(MAX_FILE_PROOF_WORK)} per file)`,
      );
    }
    target.work.left -= cost;
    ctx.work.left -= cost;
    proofs += 1;
    const proof = prove(ctx, target, change);
    // A proof whose scan the budget cut short proves nothing either way.
    if (ctx.scans.cut) return budgetSpent(what);
    const breaks = proof.passes ? ownBreaks(proof, shown) : [];
    if (proof.passes && breaks.length === 0)
      return { remedy: remedyOf(change, proof, shown, target, costOf), whyNot: null };
    if (breaks.length > 0) lastBreaks = breaks;
    last = proof;
  }
  if (last === null) return none(`no ${what} to try`);
  if (lastBreaks.length > 0 && last.passes)
    return none(`${what} clears it but still breaks ${lastBreaks.join(', ')}`);
  const capped = candidates.length > proofs ? ` (stopped after ${proofs} proofs)` : '';
  return none(
    `${what} ${proofs === 1 ? 'clears it but still blocks' : 'cleared it but each still blocked'} on ${describeBlockers(last)}${capped}`,
  );
}

// ---- kinds of change -------------------------------------------------------------------------

/**
 * A scaling factor on the code, adding a linear scaling block when there is none, and stating
 * the original span when the changed description would otherwise take another trained span.
 */
function factorChange(spec: ModelSpec, factor: number, trained: number): Change {
  const code = spec.position;
  const change: Change =
    code.kind === 'rotary' && code.scaling
      ? { 'position.scaling.factor': factor }
      : { 'position.scaling.kind': 'linear', 'position.scaling.factor': factor };
  if (trainedSpan(applyChange(spec, change)) !== trained)
    change['position.scaling.originalSpan'] = trained;
  return change;
}

/** The smallest whole scaling factor (of the kind in use, else linear) with `L0 · f` covering `need`. */
function factorKind(
  ctx: RemedyContext,
  target: Target,
  resolves: Resolves,
  trained: number | null,
  need: number | null,
): KindOutcome {
  const spec = ctx.head.spec;
  const code = spec.position;
  if (code.kind !== 'rotary') return none(`a ${code.kind} position code has no scaling factor`);
  if (trained === null || need === null)
    return none('the trained span or the span to cover is unknown');
  const f0 = coveringFactor(need, trained);
  if (f0 === null)
    return none(`no whole factor covers ${formatTokens(need)} from ${formatTokens(trained)}`);
  const current = code.scaling ? code.scaling.factor : 1;
  if (f0 <= current) {
    return none(
      `the ${code.scaling ? `${code.scaling.kind} factor ${formatNumber(current)}` : 'code'} already covers ${formatTokens(need)}; state the trained span if the model was tuned at it`,
    );
  }
  const shown = [
    'reach',
    'scalingCover',
    'headroom',
    'trainedSpan',
    'discriminationSpan',
    'exposedPairs',
    ...(code.scaling?.kind === 'yarn' ? ['attentionScale'] : []),
  ];
  const ok = withOwnLimits(ctx, resolves, shown);
  const candidates: Change[] = [];
  for (let f = f0; f < f0 + MAX_PROOFS_PER_KIND; f++) {
    const change = factorChange(spec, f, trained);
    if (ok(applyChange(spec, change))) candidates.push(change);
  }
  const kind = code.scaling ? code.scaling.kind : 'linear';
  return proveFirst(
    ctx,
    target,
    candidates,
    shown,
    `a ${kind} factor of ${f0}${candidates.length > 1 ? ' or more' : ''}`,
  );
}

/** The longest served span that clears the finding. */
function spanKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const T = evaluationSpan(spec);
  if (T === null || T < 2) return none('the span is not a whole number above 1');
  const shown = ['evaluationSpan', 'headroom', 'memoryBytes', 'fitSequences'];
  const ok = withOwnLimits(ctx, resolves, shown);
  // Headroom is monotone in the span too: the longest span that clears the finding and keeps
  // the served span within reach, so the remedy never trades one blocking finding for another.
  const within = (spec2: ModelSpec) => {
    const h = rangeMetrics(spec2).headroom;
    return h === null || h >= 0;
  };
  const found = largestPassing(1, T - 1, (t) => {
    const next = applyChange(spec, { 'serving.span': t });
    return ok(next) && within(next);
  });
  if (found.value === null)
    return none(
      `no served span from 1 to ${formatInteger(T - 1)} tokens clears it${withinWords(ctx, shown)}`,
    );
  return proveFirst(
    ctx,
    target,
    [{ 'serving.span': found.value }],
    shown,
    `serving at most ${formatTokens(found.value)} tokens`,
  );
}

/** The most concurrent sequences that clear the finding. */
function sequencesKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const current = servedSequences(spec);
  if (current === null) return none('the sequence count is not a whole number');
  if (current <= 1) return none('the service already holds one sequence');
  const shown = ['memoryBytes', 'cacheBytesAtSpan', 'fitSequences'];
  const ok = withOwnLimits(ctx, resolves, shown);
  const found = largestPassing(1, current - 1, (n) =>
    ok(applyChange(spec, { 'serving.sequences': n })),
  );
  if (found.value === null)
    return none(
      `not even one sequence of ${formatTokens(evaluationSpan(spec))} tokens clears it${withinWords(ctx, shown)}`,
    );
  return proveFirst(
    ctx,
    target,
    [{ 'serving.sequences': found.value }],
    shown,
    `${found.value} sequence${found.value === 1 ? '' : 's'}`,
  );
}

/** The widest cache dtype narrower than the current one that clears the finding. */
function cacheDtypeKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const current = cacheDType(spec);
  const bytes = bytesPerElement(current);
  if (bytes === null) return none(`the cache dtype ${current} is unknown`);
  const narrower = STORAGE_DTYPES.filter((d) => (bytesPerElement(d) ?? Infinity) < bytes);
  if (narrower.length === 0) return none(`the cache is already in ${current}, the narrowest dtype`);
  const shown = ['cachePerTokenBytes', 'memoryBytes', 'fitSequences'];
  const ok = withOwnLimits(ctx, resolves, shown);
  const candidates = narrower
    .filter((d) => ok(applyChange(spec, { 'dtypes.cache': d })))
    .map((d): Change => ({ 'dtypes.cache': d }));
  if (candidates.length === 0)
    return none(
      `even a ${narrower[narrower.length - 1]} cache does not clear it${withinWords(ctx, shown)}`,
    );
  return proveFirst(ctx, target, candidates, shown, `a ${candidates[0]!['dtypes.cache']} cache`);
}

/**
 * Divisors of `n` below `below`, largest first, at most 64 (grouped-query attention needs kvHeads
 * to divide heads). Trial division up to sqrt(n), so a head count near 2^53 from a hostile file
 * costs about 10^8 steps, not 10^16.
 */
function divisorsBelow(n: number, below: number): number[] {
  const found: number[] = [];
  for (let d = 1; d * d <= n; d++) {
    if (n % d !== 0) continue;
    if (d < below) found.push(d);
    if (n / d !== d && n / d < below) found.push(n / d);
  }
  return found.sort((a, b) => b - a).slice(0, 64);
}

/** The most key/value heads, a divisor of the heads, that clear the finding. */
function kvHeadsKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  // The stored weights of a checkpoint fix its shapes: no remedy reshapes its network.
  if (ctx.head.dialect === 'checkpoint')
    return none(
      'the key/value heads of a checkpoint are fixed by its stored weights, so no remedy changes them',
    );
  const heads = positiveCount(spec.heads);
  const kv = positiveCount(spec.kvHeads);
  if (spec.latent)
    return none(
      'latent attention caches one shared latent per token and layer, whatever the key/value heads',
    );
  if (spec.encoderOnly) return none('an encoder-only model keeps no decoding cache');
  if (heads === null || kv === null) return none('heads or key/value heads are not whole numbers');
  if (kv <= 1) return none('the model already has one key/value head');
  const shown = ['cachePerTokenBytes', 'weightBytes', 'memoryBytes', 'fitSequences'];
  const ok = withOwnLimits(ctx, resolves, shown);
  const candidates = divisorsBelow(heads, kv)
    .filter((d) => ok(applyChange(spec, { kvHeads: d })))
    .map((d): Change => ({ kvHeads: d }));
  if (candidates.length === 0)
    return none(`even one key/value head does not clear it${withinWords(ctx, shown)}`);
  return proveFirst(
    ctx,
    target,
    candidates,
    shown,
    `${candidates[0]!.kvHeads} key/value heads (a retraining-level change)`,
  );
}

/** The narrowest position format with every position in the span distinct. */
function formatKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const current = spec.dtypes.positions ?? 'fp32';
  const order = [...FLOAT_FORMATS].sort((a, b) => positionExactLimit(a) - positionExactLimit(b));
  const candidates = order
    .filter((f) => f !== current && resolves(applyChange(spec, { 'dtypes.positions': f })))
    .map((f): Change => ({ 'dtypes.positions': f }));
  if (candidates.length === 0) {
    return none(
      `no format keeps every position of ${formatTokens(evaluationSpan(spec))} distinct (fp32 holds every whole number up to ${formatInteger(positionExactLimit('fp32'))})`,
    );
  }
  const format = candidates[0]!['dtypes.positions'] as FloatFormat;
  return proveFirst(
    ctx,
    target,
    candidates,
    [`precision.${format}.collidingPositions`, `precision.${format}.angleErrorMax`],
    `positions in ${format}`,
  );
}

/** Which way the base must move for the crossed bound of a discrimination or separation limit. */
function baseDirection(metric: string, limit: Limit, value: number | null): BaseDirection | null {
  if (value === null) return null;
  const below = limit.min !== undefined && value < limit.min;
  // A larger base turns slower: far offsets stay positive longer, but neighbours separate less.
  if (metric === 'discriminationSpan') return below ? 'up' : 'down';
  if (metric === 'separationFloor') return below ? 'down' : 'up';
  return null;
}

/** The nearest rotary base (two significant digits) that clears a discrimination or separation limit. */
function baseKind(ctx: RemedyContext, target: Target): KindOutcome {
  const spec = ctx.head.spec;
  const code = spec.position;
  const { metric, limit } = target;
  if (code.kind !== 'rotary') return none(`a ${code.kind} position code has no base to change`);
  if (!metric || !limit) return none('no limit to meet');
  const T = evaluationSpan(spec);
  const L0 = trainedSpan(spec);
  const direction = baseDirection(
    metric,
    limit,
    metricValue(ctx.head.metrics, metric as 'discriminationSpan'),
  );
  if (T === null || direction === null) return none('the span or the current value is unknown');
  const scaledAt = (base: number) =>
    frequencyPlan(applyChange(spec, { 'position.base': base }), T, L0)?.scaled ?? null;
  // discriminationSpan >= min: no negative sum before min(T, min), found by a scan that stops at the first one.
  const onlyMin =
    metric === 'discriminationSpan' &&
    direction === 'up' &&
    limit.max === undefined &&
    limit.maxIncreasePct === undefined;
  const criterion = (base: number): BaseTrial => {
    const theta = scaledAt(base);
    if (theta === null) return { passes: false, cost: 1 };
    // The file's scan budget spent: no more trials (the search then stops at its caps).
    if (ctx.scans.cut || ctx.scans.left <= 0) {
      ctx.scans.cut = true;
      return { passes: false, cost: Infinity };
    }
    if (onlyMin) {
      const found = viaMemo(
        ctx.memo,
        'firstNegativeOffset',
        firstNegativeOffset,
        theta,
        1,
        Math.min(T, Math.ceil(limit.min as number)),
      );
      ctx.scans.left -= found.elements;
      return { passes: found.offset === null, cost: found.elements };
    }
    // Within what is left of the budget (the limit an argument only when it is not the default).
    const workLimit = ctx.scans.left >= MAX_SCAN_WORK ? undefined : ctx.scans.left;
    const scan =
      workLimit === undefined
        ? viaMemo(ctx.memo, 'similarityScan', similarityScan, theta, T)
        : viaMemo(ctx.memo, 'similarityScan', similarityScan, theta, T, workLimit);
    ctx.scans.left -= scan.work;
    if (workLimit !== undefined && !scan.complete) ctx.scans.cut = true;
    // A scan stopped at its work limit proves nothing: the base does not pass on it.
    if (!scan.complete) return { passes: false, cost: theta.length * T };
    const value = scan[metric as 'discriminationSpan' | 'separationFloor'];
    return {
      passes: checkLimit(limit, target.baseValue, value).crossed.length === 0,
      cost: theta.length * T,
    };
  };
  const search = searchRotaryBase(code.base, direction, criterion);
  if (ctx.scans.cut)
    return budgetSpent(
      `a rotary base ${direction === 'up' ? 'above' : 'below'} ${formatNumber(code.base, 6)}`,
    );
  if (search.base === null) {
    return none(
      `no rotary base ${direction === 'up' ? 'above' : 'below'} ${formatNumber(code.base, 6)} meets the ${metric} limit within the search's caps (${search.evaluations} scans)`,
    );
  }
  const capped = search.capped ? ', the nearest found after the grid walk ran out of budget' : '';
  return proveFirst(
    ctx,
    target,
    [{ 'position.base': search.base }],
    ['discriminationSpan', 'separationFloor', 'unturnedPairs', 'slowestWavelength'],
    `a rotary base of ${formatNumber(search.base, 6)} (a retraining-level change${capped})`,
  );
}

/** Metrics a change of the serving layout or the weight format is shown with. */
const DEVICE_SHOWN = ['devices', 'weightBytesPerDevice', 'memoryBytesPerDevice', 'fitSequences'];

/** What a layout costs in devices: `8 devices per replica (tensor 8 × pipeline 1), was 1`. */
function deviceCost(before: ModelSpec): (change: Change) => string {
  const was = deviceCount(before);
  return (change) => {
    const after = applyChange(before, change);
    const d = parallelDegrees(after);
    return d === null
      ? 'more devices per replica'
      : `${formatInteger(d.t * d.p)} devices per replica (tensor-parallel ${d.t} × pipeline-parallel ${d.p}), was ${formatInteger(was)}`;
  };
}

/**
 * The smallest tensor-parallel degree above the current one, among the degrees that shard the
 * heads (`shardingDegrees`), that clears the finding; costs devices.
 */
function tensorKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const d = parallelDegrees(spec);
  const heads = positiveCount(spec.heads);
  const kv = positiveCount(spec.kvHeads);
  if (d === null || heads === null || kv === null)
    return none('the parallel degrees or head counts are not whole numbers');
  const higher = shardingDegrees(heads, kv, 64).filter((t) => t > d.t);
  if (higher.length === 0)
    return none(
      `no tensor-parallel degree above ${d.t} shards ${heads} heads and ${kv} key/value heads`,
    );
  const candidates = higher
    .filter((t) => resolves(applyChange(spec, { 'serving.tensorParallel': t })))
    .map((t): Change => ({ 'serving.tensorParallel': t }));
  if (candidates.length === 0)
    return none(`even a tensor-parallel degree of ${higher[higher.length - 1]} does not clear it`);
  return proveFirst(
    ctx,
    target,
    candidates,
    [...DEVICE_SHOWN, 'kvHeadsPerDevice'],
    `a tensor-parallel degree of ${candidates[0]!['serving.tensorParallel']}`,
    deviceCost(spec),
  );
}

/** The fewest pipeline stages above the current count (at most the layers) that clear the finding; costs devices. */
function pipelineKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const d = parallelDegrees(spec);
  const layers = positiveCount(spec.layers);
  if (d === null || layers === null)
    return none('the parallel degrees or the layers are not whole numbers');
  if (d.p >= layers) return none(`the pipeline already has one stage per layer (${layers})`);
  const at = (p: number) => resolves(applyChange(spec, { 'serving.pipelineParallel': p }));
  if (!at(layers)) return none(`even ${layers} pipeline stages (one per layer) do not clear it`);
  // Memory per device only falls as stages are added: the last failing count, plus one.
  const failing = largestPassing(d.p, layers, (p) => !at(p));
  const stages = failing.value === null ? d.p : failing.value + 1;
  return proveFirst(
    ctx,
    target,
    [{ 'serving.pipelineParallel': stages }],
    ['cachePerTokenBytesPerDevice', ...DEVICE_SHOWN],
    `${stages} pipeline stages`,
    deviceCost(spec),
  );
}

/** Quantized formats a remedy proposes, widest first, with the group size of common practice. */
const QUANTIZED_CHOICES: readonly { dtype: StorageDType; bits: number }[] = [
  { dtype: 'int8', bits: 8 },
  { dtype: 'int4', bits: 4 },
];

/** The widest quantized weight format (int8, then int4, groups of 128) that clears the finding; cautions on accuracy. */
function quantizeKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const now = spec.quantization?.bits ?? (bytesPerElement(weightDType(spec)) ?? 2) * 8;
  const narrower = QUANTIZED_CHOICES.filter((c) => c.bits < now);
  if (narrower.length === 0) return none(`the weights are already stored at ${now} bits`);
  const candidates = narrower
    .map((c): Change => ({
      'dtypes.weights': c.dtype,
      'quantization.groupSize': DEFAULT_GROUP_SIZE,
    }))
    .filter((change) => resolves(applyChange(spec, change)));
  if (candidates.length === 0) return none('even int4 weights in groups of 128 do not clear it');
  const cost = (change: Change) =>
    `accuracy risk: ${String(change['dtypes.weights'])} weights change the model's outputs; evaluate the quantized checkpoint before serving it`;
  return proveFirst(
    ctx,
    target,
    candidates,
    ['weightBytes', ...DEVICE_SHOWN],
    `${String(candidates[0]!['dtypes.weights'])} weights in groups of ${DEFAULT_GROUP_SIZE}`,
    cost,
  );
}

/** The sharding degree nearest the stated one (above first) and a pipeline within the layers, for `layout-unshardable`. */
function layoutKind(ctx: RemedyContext, target: Target, resolves: Resolves): KindOutcome {
  const spec = ctx.head.spec;
  const d = parallelDegrees(spec);
  const heads = positiveCount(spec.heads);
  const kv = positiveCount(spec.kvHeads);
  const layers = positiveCount(spec.layers);
  if (d === null || heads === null || kv === null || layers === null)
    return none('the parallel degrees or head counts are not whole numbers');
  const degrees = shardingDegrees(heads, kv, 64);
  const ordered = [...degrees.filter((t) => t >= d.t), ...degrees.filter((t) => t < d.t).reverse()];
  const candidates = ordered
    .map((t): Change => {
      const change: Change = {};
      if (t !== d.t) change['serving.tensorParallel'] = t;
      if (d.p > layers) change['serving.pipelineParallel'] = layers;
      return change;
    })
    .filter((change) => Object.keys(change).length > 0 && resolves(applyChange(spec, change)));
  if (candidates.length === 0) return none('no tensor-parallel degree shards these heads');
  return proveFirst(
    ctx,
    target,
    candidates,
    ['devices', 'memoryBytesPerDevice', 'fitSequences', 'kvHeadsPerDevice'],
    'a degree that shards the heads',
    deviceCost(spec),
  );
}

// ---- which kinds for which finding -----------------------------------------------------------

type Kind = (ctx: RemedyContext, target: Target, resolves: Resolves) => KindOutcome;

/** How one blocking rule is remedied. */
interface RuleRemedy {
  /** The kinds of change to try, in order (the first that proves is the remedy), or why none is searched. */
  kinds(ctx: RemedyContext, target: Target): Kind[] | string;
  /** Whether a changed spec clears the finding, judged on the metrics it depends on; null: no search. */
  resolves(ctx: RemedyContext, target: Target): Resolves | null;
  /** Metrics the rule is about: a remedy showing one of them must not leave the rule standing (default: none). */
  metrics?: readonly string[];
}

/** Kinds of change that lower the memory a replica needs, in the order they are tried. */
const MEMORY_KINDS: readonly Kind[] = [
  sequencesKind,
  cacheDtypeKind,
  kvHeadsKind,
  spanKind,
  tensorKind,
  pipelineKind,
  quantizeKind,
];

/** The scaling factor covers the declared span. */
const coversDeclared: Resolves = (spec) => {
  const r = rangeMetrics(spec);
  return r.scalingCover !== null && r.declaredSpan !== null && r.scalingCover >= r.declaredSpan;
};

/** The kinds for a crossed limit: by the limited metric. */
function limitKinds(ctx: RemedyContext, target: Target): Kind[] | string {
  const range = rangeMetrics(ctx.head.spec);
  const T = range.evaluationSpan;
  const metric = target.metric ?? '';
  const limit = target.limit;
  if (!limit) return `the policy has no limit on ${metric}`;
  if (
    isMetricPath(metric) &&
    metricValue(ctx.head.metrics, metric) === null &&
    uncomputedScanMetrics(ctx.head.metrics).includes(metric)
  ) {
    return `no remedy is searched for ${metric}: the scans stopped at their bound at this span (scan-incomplete), so no change can be proven against it; serve a shorter span`;
  }
  if (metric === 'discriminationSpan' || metric === 'separationFloor')
    return [(c, t) => baseKind(c, t)];
  if (metric === 'memoryBytes' || metric === 'cacheBytesAtSpan') return [...MEMORY_KINDS];
  if (metric === 'memoryBytesPerDevice') return [...MEMORY_KINDS];
  if (metric === 'fitSequences')
    return [cacheDtypeKind, kvHeadsKind, spanKind, tensorKind, pipelineKind, quantizeKind];
  if (metric === 'weightBytesPerDevice') return [tensorKind, pipelineKind, quantizeKind];
  if (metric === 'weightBytes') return [quantizeKind];
  if (metric === 'cachePerTokenBytes') return [cacheDtypeKind, kvHeadsKind];
  if (metric === 'headroom' && limit.min !== undefined && T !== null) {
    return [
      (c, t, r) =>
        factorKind(c, t, r, range.trainedSpan, T + Math.max(0, Math.ceil(limit.min as number))),
      spanKind,
    ];
  }
  if (metric === 'reach' && limit.min !== undefined) {
    return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, Math.ceil(limit.min as number))];
  }
  if (/^precision\.(fp32|bf16|fp16)\.collidingPositions$/.test(metric)) return [spanKind];
  return `no remedy is searched for a limit on ${metric}: remedies cover spans and reach, rotary discrimination and separation, memory, and colliding positions`;
}

/** Every rule a remedy is searched for; the others need the value itself corrected. */
const RULE_REMEDIES: Readonly<Partial<Record<RuleId, RuleRemedy>>> = {
  'span-past-reach': {
    kinds: (ctx) => {
      const range = rangeMetrics(ctx.head.spec);
      return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, range.evaluationSpan), spanKind];
    },
    resolves: () => (spec) => {
      const h = rangeMetrics(spec).headroom;
      return h !== null && h >= 0;
    },
    metrics: ['headroom', 'reach', 'scalingCover'],
  },
  'span-beyond-scaling-cover': {
    kinds: (ctx) => {
      const range = rangeMetrics(ctx.head.spec);
      return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, range.declaredSpan)];
    },
    resolves: () => coversDeclared,
  },
  'span-grew-code-unchanged': {
    // The trained span is the base's: the head's own is only its (grown) declared span.
    kinds: (ctx) => {
      const range = rangeMetrics(ctx.head.spec);
      return [
        (c, t, r) => factorKind(c, t, r, ctx.base?.metrics.trainedSpan ?? null, range.declaredSpan),
      ];
    },
    resolves: () => coversDeclared,
  },
  'memory-over-budget': {
    kinds: () => [...MEMORY_KINDS],
    resolves: () => (spec) => {
      const usable = usableDeviceBytes(spec);
      const memory = budgetMetrics(spec).memoryBytesPerDevice;
      return usable === null || (memory !== null && memory <= usable);
    },
    metrics: ['memoryBytes', 'cacheBytesAtSpan', 'fitSequences'],
  },
  'positions-collide': {
    kinds: () => [formatKind, spanKind],
    resolves: () => (spec) => {
      const colliding = lightMetric(
        spec,
        `precision.${spec.dtypes.positions ?? 'fp32'}.collidingPositions`,
      );
      return !(typeof colliding === 'number' && colliding > 0);
    },
    metrics: [
      'precision.fp32.collidingPositions',
      'precision.bf16.collidingPositions',
      'precision.fp16.collidingPositions',
    ],
  },
  'layout-unshardable': {
    kinds: () => [layoutKind],
    resolves: () => (spec) => {
      const d = parallelDegrees(spec);
      return (
        d !== null &&
        shards(spec.heads, spec.kvHeads, d.t) &&
        d.p <= spec.layers &&
        (!spec.encoder || shards(spec.encoder.heads, spec.encoder.kvHeads, d.t))
      );
    },
  },
  'limit-crossed': {
    kinds: limitKinds,
    resolves: (ctx, target) => {
      const { limit, metric } = target;
      if (!limit || !metric) return null;
      return (spec) =>
        checkLimit(limit, target.baseValue, valueOf(spec, metric, ctx)).crossed.length === 0;
    },
  },
};

/** The remedy entry of `rule`, or undefined when no remedy is searched for it. */
function remedyRule(rule: string): RuleRemedy | undefined {
  return isRuleId(rule) ? RULE_REMEDIES[rule] : undefined;
}

/** The kinds for `target`, or why none is searched. */
function kindsFor(ctx: RemedyContext, target: Target): Kind[] | string {
  const entry = remedyRule(target.rule);
  if (entry !== undefined) return entry.kinds(ctx, target);
  const help = isRuleId(target.rule) ? ` ${RULES[target.rule].help}` : '';
  const cause =
    target.rule === 'base-unreadable'
      ? 'the head is not at fault, and no change to it can make the base version read'
      : 'the value itself must be corrected, as the message says';
  return `no remedy is searched for ${target.rule}: ${cause}.${help}`;
}

/**
 * The remedy of one blocking finding of `ctx`'s head: the first kind of change that proves, the
 * other kinds that prove as alternatives, or why none does.
 */
export function proposeRemedy(
  ctx: RemedyContext,
  finding: Finding & { metric?: string },
): RemedyFields {
  const metric = finding.metric;
  const limit =
    finding.rule === 'limit-crossed' && metric ? (ctx.judging.limits[metric] ?? null) : null;
  const baseValue =
    metric && ctx.base && isMetricPath(metric) ? metricValue(ctx.base.metrics, metric) : null;
  const target: Target = {
    rule: finding.rule,
    ...(metric ? { metric } : {}),
    limit,
    baseValue,
    work: { left: MAX_PROOF_WORK },
  };
  const kinds = kindsFor(ctx, target);
  if (typeof kinds === 'string')
    return { remedy: null, remedyWhyNot: kinds, remedyAlternatives: [] };
  const resolves = remedyRule(finding.rule)?.resolves(ctx, target) ?? null;
  if (resolves === null)
    return {
      remedy: null,
      remedyWhyNot: `no remedy is searched for ${finding.rule}`,
      remedyAlternatives: [],
    };
  const outcomes = kinds.map((kind) => kind(ctx, target, resolves));
  const proven = outcomes.filter((o) => o.remedy !== null).map((o) => o.remedy as Remedy);
  if (proven.length === 0) {
    return {
      remedy: null,
      remedyWhyNot: `No change found that passes: ${outcomes.map((o) => o.whyNot).join('; ')}.`,
      remedyAlternatives: [],
    };
  }
  return { remedy: proven[0]!, remedyWhyNot: null, remedyAlternatives: proven.slice(1) };
}
