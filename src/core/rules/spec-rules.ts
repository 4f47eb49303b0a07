/**
 * Findings a model spec raises on its own, before any metric: sizes that cannot be, head counts
 * that do not group, rotary widths that do not pair, scaling blocks that contradict the span.
 * NaN marks a value the reader already reported (`value-invalid`), so it is skipped here: one
 * problem, one finding.
 */
import type { Finding, LocationMap, ModelSpec } from '../model.js';
import { literalNumber } from '../parse/quote.js';
import { isCount } from '../metrics/sizes.js';
import { shardingDegrees, shards } from '../metrics/per-device.js';
import { rotaryWidth, rotatedChannels } from '../metrics/frequencies.js';
import { RULES } from './catalog.js';
import type { RuleId } from './catalog.js';

interface SizeField {
  /** Spec field path, as in the location map. */
  field: string;
  get(spec: ModelSpec): number | null | undefined;
  /** Completes "set it to …". */
  what: string;
  /** Smallest acceptable value (default: `1`). */
  min?: number;
  /** Fractions allowed (default: `false`). */
  real?: boolean;
}

/** Every size the rules check, in report order. */
const SIZE_FIELDS: readonly SizeField[] = [
  { field: 'layers', get: (s) => s.layers, what: 'the number of layers' },
  { field: 'hidden', get: (s) => s.hidden, what: 'the model width' },
  { field: 'heads', get: (s) => s.heads, what: 'the number of attention heads' },
  { field: 'kvHeads', get: (s) => s.kvHeads, what: 'the number of key/value heads' },
  { field: 'headDim', get: (s) => s.headDim, what: 'the width of one head' },
  { field: 'ffn', get: (s) => s.ffn, what: 'the feed-forward width' },
  { field: 'vocab', get: (s) => s.vocab, what: 'the vocabulary size' },
  { field: 'declaredSpan', get: (s) => s.declaredSpan, what: 'the maximum positions in tokens' },
  { field: 'trainedSpan', get: (s) => s.trainedSpan, what: 'the span trained at, in tokens' },
  { field: 'experts.total', get: (s) => s.experts?.total, what: 'the number of experts' },
  {
    field: 'experts.active',
    get: (s) => s.experts?.active,
    what: 'the number of experts each token uses',
  },
  { field: 'encoder.layers', get: (s) => s.encoder?.layers, what: 'the number of encoder layers' },
  { field: 'encoder.heads', get: (s) => s.encoder?.heads, what: 'the number of encoder heads' },
  {
    field: 'encoder.kvHeads',
    get: (s) => s.encoder?.kvHeads,
    what: 'the number of encoder key/value heads',
  },
  {
    field: 'encoder.headDim',
    get: (s) => s.encoder?.headDim,
    what: 'the width of one encoder head',
  },
  { field: 'encoder.ffn', get: (s) => s.encoder?.ffn, what: 'the encoder feed-forward width' },
  { field: 'experts.width', get: (s) => s.experts?.width, what: 'the width of one routed expert' },
  {
    field: 'experts.shared',
    get: (s) => s.experts?.shared,
    what: 'the number of shared experts',
    min: 0,
  },
  {
    field: 'experts.sharedWidth',
    get: (s) => s.experts?.sharedWidth,
    what: 'the width of one shared expert',
  },
  {
    field: 'experts.denseLayers',
    get: (s) => s.experts?.denseLayers,
    what: 'the number of dense layers',
    min: 0,
  },
  { field: 'latent.kvRank', get: (s) => s.latent?.kvRank, what: 'the compressed key/value width' },
  { field: 'latent.qRank', get: (s) => s.latent?.qRank, what: 'the compressed query width' },
  {
    field: 'latent.ropeDim',
    get: (s) => s.latent?.ropeDim,
    what: 'the decoupled rotary width per head',
  },
  {
    field: 'latent.nopeDim',
    get: (s) => s.latent?.nopeDim,
    what: 'the query/key width without position code per head',
    min: 0,
  },
  { field: 'latent.valueDim', get: (s) => s.latent?.valueDim, what: 'the value width per head' },
  { field: 'chunkSize', get: (s) => s.chunkSize, what: 'the tokens per chunk' },
  { field: 'layerNorms', get: (s) => s.layerNorms, what: 'the norms per layer', min: 0 },
  { field: 'slidingWindow', get: (s) => s.slidingWindow, what: 'the window in tokens' },
  { field: 'windowLayers', get: (s) => s.windowLayers, what: 'the number of windowed layers' },
  {
    field: 'position.scaling.originalSpan',
    get: (s) => (s.position.kind === 'rotary' ? s.position.scaling?.originalSpan : null),
    what: 'the span trained at before scaling, in tokens',
  },
  { field: 'serving.span', get: (s) => s.serving.span, what: 'the served span in tokens' },
  {
    field: 'serving.sequences',
    get: (s) => s.serving.sequences,
    what: 'the number of concurrent sequences',
  },
  {
    field: 'serving.deviceGiB',
    get: (s) => s.serving.deviceGiB,
    what: 'the device memory in GiB',
    real: true,
  },
  {
    field: 'serving.outputTokens',
    get: (s) => s.serving.outputTokens,
    what: 'the tokens kept for output',
    min: 0,
  },
  {
    field: 'serving.promptTokens',
    get: (s) => s.serving.promptTokens,
    what: 'the tokens taken by a fixed prompt',
    min: 0,
  },
  {
    field: 'serving.tensorParallel',
    get: (s) => s.serving.tensorParallel,
    what: 'the devices each layer is split over',
  },
  {
    field: 'serving.pipelineParallel',
    get: (s) => s.serving.pipelineParallel,
    what: 'the pipeline stages',
  },
];

/**
 * Findings of `spec` on its own (all `block`): `size-invalid`, `kv-heads-indivisible`,
 * `rotary-width-odd`, `scaling-factor-below-one`, `original-span-above-declared`, and
 * `value-invalid` for sizes that contradict each other (more active experts than experts, more
 * windowed layers than layers). Each names the key as `locations` records it.
 */
export function specFindings(spec: ModelSpec, locations: LocationMap): Finding[] {
  const out: Finding[] = [];
  const push = (rule: RuleId, field: string | null, message: string): void => {
    const at = field === null ? undefined : locations[field];
    out.push({
      rule,
      severity: RULES[rule].severity,
      message,
      key: at?.key ?? null,
      line: at?.line ?? null,
    });
  };
  const name = (field: string): string => locations[field]?.key ?? field;

  for (const size of SIZE_FIELDS) {
    const v = size.get(spec);
    if (v === null || v === undefined || Number.isNaN(v)) continue;
    const problem = sizeProblem(v, size.min ?? 1, size.real ?? false);
    if (problem === null) continue;
    const kind = size.real ? `a number above 0` : `a whole number of at least ${size.min ?? 1}`;
    const derived = derivation(spec, locations, size.field);
    const message = derived
      ? `${derived.subject}${problem}; ${derived.advice}`
      : `${name(size.field)} is ${literalNumber(v)}${problem}; set it to ${size.what}: ${kind}`;
    push(
      'size-invalid',
      locations[size.field] ? size.field : derivedFrom(size.field, locations),
      message,
    );
  }

  // Latent attention caches one shared latent, not grouped key/value heads.
  if (!spec.latent) headGrouping(spec.heads, spec.kvHeads, 'heads', 'kvHeads', name, push);
  if (spec.encoder)
    headGrouping(
      spec.encoder.heads,
      spec.encoder.kvHeads,
      'encoder.heads',
      'encoder.kvHeads',
      name,
      push,
    );

  parallelLayout(spec, name, push);

  if (
    spec.experts &&
    isCount(spec.experts.total) &&
    isCount(spec.experts.active) &&
    spec.experts.active > spec.experts.total
  ) {
    push(
      'value-invalid',
      'experts.active',
      `${name('experts.active')} is ${spec.experts.active}, more than ${name('experts.total')} ${spec.experts.total}; a token cannot use more experts than there are: set it to at most ${spec.experts.total}`,
    );
  }
  const dense = spec.experts?.denseLayers;
  if (isCount(dense) && isCount(spec.layers) && dense > spec.layers) {
    push(
      'value-invalid',
      'experts.denseLayers',
      `${name('experts.denseLayers')} makes ${dense} dense layers, more than the ${spec.layers} layers (${name('layers')}); set it to at most ${spec.layers}`,
    );
  }
  if (spec.layerTypes && isCount(spec.layers) && spec.layerTypes.length !== spec.layers) {
    push(
      'value-invalid',
      'layerTypes',
      `${name('layerTypes')} has ${spec.layerTypes.length} entries, but there are ${spec.layers} layers (${name('layers')}); give one entry per layer`,
    );
  }
  const outside = (spec.positionFreeLayers ?? []).filter(
    (i) => !(Number.isSafeInteger(i) && i >= 0 && (!isCount(spec.layers) || i < spec.layers)),
  );
  if (outside.length > 0) {
    push(
      'value-invalid',
      'positionFreeLayers',
      `${name('positionFreeLayers')} lists ${outside.join(', ')}, not a 0-based layer index below ${spec.layers}; list layers that exist`,
    );
  }
  if (isCount(spec.windowLayers) && isCount(spec.layers) && spec.windowLayers > spec.layers) {
    push(
      'value-invalid',
      'windowLayers',
      `${name('windowLayers')} makes ${spec.windowLayers} windowed layers, more than the ${spec.layers} layers (${name('layers')}); set it to at most ${spec.layers}`,
    );
  }

  if (spec.position.kind === 'rotary') {
    checkRotaryWidth(spec, locations, name, push);
    const scaling = spec.position.scaling;
    if (scaling && Number.isFinite(scaling.factor) && scaling.factor < 1) {
      const hint =
        isCount(scaling.originalSpan) &&
        isCount(spec.declaredSpan) &&
        spec.declaredSpan > scaling.originalSpan
          ? ` such as ${literalNumber(spec.declaredSpan / scaling.originalSpan)} (${name('declaredSpan')} ${spec.declaredSpan} / ${name('position.scaling.originalSpan')} ${scaling.originalSpan})`
          : '';
      push(
        'scaling-factor-below-one',
        'position.scaling.factor',
        `${name('position.scaling.factor')} is ${literalNumber(scaling.factor)}; a scaling factor below 1 shrinks the trained span instead of extending it: set it to the extended span over the original span, at least 1${hint}, or remove the scaling block`,
      );
    }
    if (scaling && scaling.kind === 'pairwise' && isCount(spec.headDim)) {
      const f = spec.position.fraction;
      const pairs =
        Number.isFinite(f) && f > 0 && f <= 1 ? Math.floor((spec.headDim * f + 1e-9) / 2) : NaN;
      for (const [list, which] of [
        [scaling.shortFactors, 'short'],
        [scaling.longFactors, 'long'],
      ] as const) {
        if (list && !Number.isNaN(pairs) && list.length !== pairs) {
          push(
            'value-invalid',
            'position.scaling',
            `the ${which} factors of ${name('position.scaling')} number ${list.length}, but the rotary code has ${pairs} pairs (head width × rotary share / 2); give one factor per pair`,
          );
        }
      }
    }
    if (
      scaling &&
      isCount(scaling.originalSpan) &&
      isCount(spec.declaredSpan) &&
      scaling.originalSpan > spec.declaredSpan
    ) {
      const extended =
        Number.isFinite(scaling.factor) && scaling.factor >= 1
          ? ` (${scaling.originalSpan} × ${literalNumber(scaling.factor)} = ${literalNumber(scaling.originalSpan * scaling.factor)})`
          : '';
      push(
        'original-span-above-declared',
        'position.scaling.originalSpan',
        `${name('position.scaling.originalSpan')} is ${scaling.originalSpan}, above ${name('declaredSpan')} ${spec.declaredSpan}; the original span is the span trained before scaling and cannot exceed the declared span: set ${name('declaredSpan')} to the extended span${extended}, or ${name('position.scaling.originalSpan')} to the span the model was trained at`,
      );
    }
  }
  return out;
}

/** `a, b or c`. */
function orList(items: readonly (string | number)[]): string {
  return items.length <= 1
    ? items.join('')
    : `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}`;
}

/**
 * `layout-unshardable` (docs/metrics.md, "Serving across devices"): a tensor degree `t` with
 * `heads % t != 0`, or with neither of `kvHeads` and `t` dividing the other, cannot split the
 * attention (decoder, and encoder where there is one); a pipeline degree above the layers leaves a
 * stage empty. The message names the degrees that work.
 */
function parallelLayout(
  spec: ModelSpec,
  name: (field: string) => string,
  push: (rule: RuleId, field: string | null, message: string) => void,
): void {
  const t = spec.serving.tensorParallel;
  if (isCount(t) && t > 1) {
    const stacks: [string, number, number][] = [['', spec.heads, spec.kvHeads]];
    if (spec.encoder) stacks.push(['encoder ', spec.encoder.heads, spec.encoder.kvHeads]);
    const problems: string[] = [];
    for (const [stack, heads, kv] of stacks) {
      if (!isCount(heads) || !isCount(kv) || shards(heads, kv, t)) continue;
      if (heads % t !== 0)
        problems.push(`${t} does not divide the ${heads} ${stack}attention heads`);
      else problems.push(`${t} and the ${kv} ${stack}key/value heads do not divide one another`);
    }
    if (problems.length > 0) {
      let working =
        isCount(spec.heads) && isCount(spec.kvHeads)
          ? shardingDegrees(spec.heads, spec.kvHeads, 64)
          : [];
      if (spec.encoder && isCount(spec.encoder.heads) && isCount(spec.encoder.kvHeads)) {
        const encoder = spec.encoder;
        working = working.filter((d) => shards(encoder.heads, encoder.kvHeads, d));
      }
      const advice =
        working.length > 0
          ? `use a tensor-parallel degree of ${orList(working)}`
          : 'no tensor-parallel degree splits these heads';
      push(
        'layout-unshardable',
        'serving.tensorParallel',
        `The tensor-parallel degree ${t} (${name('serving.tensorParallel')}) cannot shard the attention: ${problems.join('; ')}; ${advice}.`,
      );
    }
  }
  const p = spec.serving.pipelineParallel;
  if (isCount(p) && isCount(spec.layers) && p > spec.layers) {
    push(
      'layout-unshardable',
      'serving.pipelineParallel',
      `The pipeline-parallel degree ${p} (${name('serving.pipelineParallel')}) is more than the ${spec.layers} layers, so a stage would hold none; use at most ${spec.layers} stages.`,
    );
  }
}

/** Why `v` is not a size: a phrase starting with ", " (or empty for a plain range miss), or null when it is fine. */
function sizeProblem(v: number, min: number, real: boolean): string | null {
  if (!Number.isFinite(v)) return ', not a finite number';
  if (real) return v > 0 ? null : '';
  if (!Number.isInteger(v)) return ', not a whole number';
  if (!Number.isSafeInteger(v)) return ', too large to hold exactly in a double (beyond 2^53 − 1)';
  return v >= min ? null : '';
}

/** For a size the defaults derived (no location), how it was derived and what to change; null when it was stated. */
function derivation(
  spec: ModelSpec,
  locations: LocationMap,
  field: string,
): { subject: string; advice: string } | null {
  if (locations[field]) return null;
  const key = (f: string): string => locations[f]?.key ?? f;
  if (field === 'headDim' && isCount(spec.hidden) && isCount(spec.heads)) {
    return {
      subject: `the head width is not stated, and ${key('hidden')} / ${key('heads')} = ${spec.hidden} / ${spec.heads} = ${literalNumber(Number(spec.headDim.toPrecision(6)))}`,
      advice: `state the width of one head, or use a head count that divides ${spec.hidden}`,
    };
  }
  if (
    field === 'encoder.headDim' &&
    spec.encoder &&
    isCount(spec.hidden) &&
    isCount(spec.encoder.heads)
  ) {
    return {
      subject: `the encoder head width is not stated, and ${key('hidden')} / ${key('encoder.heads')} = ${spec.hidden} / ${spec.encoder.heads} = ${literalNumber(Number(spec.encoder.headDim.toPrecision(6)))}`,
      advice: `state the width of one encoder head, or use an encoder head count that divides ${spec.hidden}`,
    };
  }
  return null;
}

/** Where a derived size's finding points: the key it is derived from. */
function derivedFrom(field: string, locations: LocationMap): string | null {
  const from: Record<string, string> = {
    headDim: 'heads',
    kvHeads: 'heads',
    ffn: 'hidden',
    'encoder.headDim': 'encoder.heads',
    'encoder.kvHeads': 'encoder.heads',
    'encoder.ffn': 'hidden',
  };
  const source = from[field];
  return source !== undefined && locations[source] ? source : null;
}

function headGrouping(
  heads: number,
  kvHeads: number,
  headsField: string,
  kvField: string,
  name: (field: string) => string,
  push: (rule: RuleId, field: string | null, message: string) => void,
): void {
  if (!isCount(heads) || !isCount(kvHeads) || heads % kvHeads === 0) return;
  const divisors = divisorsOf(heads);
  const below = divisors.filter((d) => d < kvHeads).pop();
  const above = divisors.find((d) => d > kvHeads);
  const choices = [below, above].filter((d): d is number => d !== undefined);
  const examples = choices.length > 0 ? ` such as ${choices.join(' or ')}` : '';
  push(
    'kv-heads-indivisible',
    kvField,
    `${name(kvField)} is ${kvHeads}, which does not divide ${name(headsField)} ${heads}; use a divisor of ${heads}${examples}`,
  );
}

/** Divisors of `n` in ascending order, by trial up to sqrt(n); none past 2^32, where the trial would take too long for a message. */
function divisorsOf(n: number): number[] {
  if (n > 2 ** 32) return [];
  const small: number[] = [];
  const large: number[] = [];
  for (let d = 1; d * d <= n; d++) {
    if (n % d !== 0) continue;
    small.push(d);
    if (d * d !== n) large.unshift(n / d);
  }
  return [...small, ...large];
}

/**
 * Rotary codes turn channel pairs, so `headDim * fraction` must be an even whole number
 * (`r = 2 floor(headDim * fraction / 2)` in the metric contract silently drops the rest).
 */
function checkRotaryWidth(
  spec: ModelSpec,
  locations: LocationMap,
  name: (field: string) => string,
  push: (rule: RuleId, field: string | null, message: string) => void,
): void {
  if (spec.position.kind !== 'rotary') return;
  const { fraction } = spec.position;
  // Latent attention turns only the decoupled rotary part (DeepSeek-V2, §2.1.3).
  const headDim = spec.latent ? spec.latent.ropeDim : spec.headDim;
  if (!isCount(headDim) || !Number.isFinite(fraction) || fraction <= 0 || fraction > 1) return;
  const width = headDim * fraction;
  // A decimal fraction is inexact in binary; the product lands within a few ulps of the decimal one.
  const channels = rotatedChannels(headDim, fraction);
  const whole = Number.isInteger(channels);
  if (whole && channels % 2 === 0 && channels >= 2) return;

  const headName = spec.latent
    ? `${name('latent.ropeDim')} ${headDim}`
    : locations.headDim
      ? `${name('headDim')} ${headDim}`
      : `the head width ${headDim} (${name('hidden')} / ${name('heads')})`;
  const used = rotaryWidth(headDim, fraction) ?? 0;
  const metricsNote = `the metrics use ${used} channel${used === 1 ? '' : 's'}`;
  if (fraction === 1) {
    const evens = [headDim - 1, headDim + 1].filter((d) => d >= 2);
    push(
      'rotary-width-odd',
      spec.latent
        ? 'latent.ropeDim'
        : locations.headDim
          ? 'headDim'
          : locations.heads
            ? 'heads'
            : null,
      `${headName} is odd, so the rotary width ${headDim} leaves one channel without a partner (${metricsNote}); use an even head width such as ${evens.join(' or ')}`,
    );
    return;
  }
  const widthText = whole ? String(channels) : literalNumber(Number(width.toPrecision(6)));
  const lo = 2 * Math.floor(width / 2);
  const candidates = [lo, lo + 2].filter((w) => w >= 2 && w <= headDim);
  const suggestions = candidates.map(
    (w) => `${literalNumber(Number((w / headDim).toPrecision(6)))} (${w} channels)`,
  );
  push(
    'rotary-width-odd',
    locations['position.fraction'] ? 'position.fraction' : 'headDim',
    `${headName} × ${name('position.fraction')} ${literalNumber(fraction)} = ${widthText}, which is not an even whole number, so the rotary channels do not pair up (${metricsNote}); use a fraction giving an even width${suggestions.length ? `, such as ${suggestions.join(' or ')}` : ''}`,
  );
}
