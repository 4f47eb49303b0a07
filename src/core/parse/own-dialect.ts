/**
 * context-reach's own model description (`format: context-reach-model/1`, YAML or JSON, kebab-case
 * keys). `schema/model.schema.json` is its definition; the shipped schema is checked with ajv and
 * each schema error becomes a finding naming the key and its line.
 */
import type { ErrorObject, ValidateFunction } from 'ajv';
import modelSchema from '../../../schema/model.schema.json' with { type: 'json' };
import type {
  Experts,
  FloatFormat,
  LayerAttention,
  PositionKind,
  ScalingKind,
  StorageDType,
  WeightQuantization,
} from '../model.js';
import { dtypeQuantization } from '../metrics/quantized-weights.js';
import { isCount } from '../metrics/sizes.js';
import {
  FLOAT_FORMATS,
  OWN_LAYER_ATTENTIONS,
  POSITION_KINDS,
  SCALING_KINDS,
  STORAGE_DTYPES,
} from '../model.js';
import { orderedRamp, type FieldReader, type NumberCheck } from './fields.js';
import { parsePointer } from './json-pointer.js';
import { quoteValue } from './quote.js';
import type { PathSegment } from './quote.js';
import type { PositionDraft, ScalingDraft, SpecDraft } from './spec-defaults.js';
import {
  DEFAULT_BANDED_HIGH,
  DEFAULT_BANDED_LOW,
  DEFAULT_YARN_ALPHA,
  DEFAULT_YARN_BETA,
} from './spec-defaults.js';
import { suggestKey } from './suggest.js';
import { validate } from './model-validator.generated.js';

/** The value of `format` that marks the own dialect. */
export const MODEL_FORMAT = 'context-reach-model/1';
/** What every version of the own dialect's `format` starts with. */
export const MODEL_FORMAT_FAMILY = 'context-reach-model/';

/** The model description's JSON Schema, as shipped in `schema/model.schema.json`. */
export const MODEL_SCHEMA: Readonly<Record<string, unknown>> = modelSchema;

/** The schema's validator, compiled from `schema/model.schema.json` at build time (scripts/generate-validators.mjs). */
const compiled = validate as ValidateFunction;

/** Schema errors for a parsed own-dialect document (empty when it conforms); errors carry `data` and `parentSchema`. */
export function validateModelValue(value: unknown): ErrorObject[] {
  return compiled(value) ? [] : [...(compiled.errors ?? [])];
}

/**
 * Keys whose range the spec rules judge (`size-invalid`, `scaling-factor-below-one`): schema
 * range errors on them are left to those rules, so both dialects report a bad size alike.
 */
const RULE_CHECKED = new Set([
  '/model/layers',
  '/model/hidden',
  '/model/heads',
  '/model/kv-heads',
  '/model/head-dim',
  '/model/feed-forward/size',
  '/model/vocab',
  '/model/experts/total',
  '/model/experts/active',
  '/model/encoder/layers',
  '/model/encoder/heads',
  '/model/encoder/kv-heads',
  '/model/encoder/head-dim',
  '/model/encoder/feed-forward/size',
  '/model/declared-span',
  '/model/trained-span',
  '/model/sliding-window/size',
  '/model/sliding-window/layers',
  '/model/position/scaling/factor',
  '/model/experts/size',
  '/model/experts/shared',
  '/model/experts/shared-size',
  '/model/experts/dense-layers',
  '/model/latent-attention/kv-rank',
  '/model/latent-attention/q-rank',
  '/model/latent-attention/rope-head-dim',
  '/model/latent-attention/nope-head-dim',
  '/model/latent-attention/value-head-dim',
  '/model/chunked-attention/size',
  '/model/norms-per-layer',
  '/model/position/scaling/original-span',
  '/serving/span',
  '/serving/sequences',
  '/serving/device-memory-gib',
  '/serving/output-tokens',
  '/serving/prompt-tokens',
  '/serving/tensor-parallel',
  '/serving/pipeline-parallel',
]);
const RANGE_KEYWORDS = new Set([
  'minimum',
  'maximum',
  'exclusiveMinimum',
  'exclusiveMaximum',
  'multipleOf',
]);

const COMPARISON_WORDS: Record<string, string> = {
  '>=': 'at least',
  '>': 'above',
  '<=': 'at most',
  '<': 'below',
};
const TYPE_WORDS: Record<string, string> = {
  integer: 'a whole number',
  number: 'a number',
  string: 'text',
  array: 'a list',
  object: 'a mapping',
  boolean: 'true or false',
};

const STORAGE = Object.fromEntries(STORAGE_DTYPES.map((d) => [d, d])) as Record<
  string,
  StorageDType
>;
const FLOATS = Object.fromEntries(FLOAT_FORMATS.map((d) => [d, d])) as Record<string, FloatFormat>;
const CODES = Object.fromEntries(POSITION_KINDS.map((k) => [k, k])) as Record<string, PositionKind>;
const KINDS = Object.fromEntries(SCALING_KINDS.map((k) => [k, k])) as Record<string, ScalingKind>;

/** Required blocks the reader does not read as single values, and what they should hold. */
const REQUIRED_BLOCKS: Readonly<Record<string, string>> = {
  model: 'the model block (layers, hidden, heads, vocab, position, declared-span)',
  position: 'the position block, e.g. "position: {code: rotary, base: 10000}"',
};

const above = (limit: number, what: string): NumberCheck => ({
  test: (n) => n > limit,
  expected: `${what} above ${limit}`,
});

/** Reads the own dialect from `r.root` into a draft; every problem becomes a finding on `r`. */
export function readOwnDialect(r: FieldReader): SpecDraft {
  for (const error of validateModelValue(r.root)) schemaFinding(r, error);

  const m = (...p: string[]): string[] => ['model', ...p];
  const need = (n: number | undefined, path: string[], what: string): number =>
    n ?? r.missing(path, what);

  const draft: SpecDraft = {
    name: r.text('name', m('name'), 'a model name') ?? null,
    layers: need(
      r.count('layers', m('layers'), 'decoder layers'),
      m('layers'),
      'the number of decoder layers',
    ),
    hidden: need(r.count('hidden', m('hidden'), 'model width'), m('hidden'), 'the model width'),
    heads: need(
      r.count('heads', m('heads'), 'attention heads'),
      m('heads'),
      'the number of attention heads',
    ),
    kvHeads: r.count('kvHeads', m('kv-heads'), 'key/value heads'),
    headDim: r.count('headDim', m('head-dim'), 'head width'),
    ffn: r.count('ffn', m('feed-forward', 'size'), 'feed-forward width'),
    gated: r.flag('gated', m('feed-forward', 'gated')),
    vocab: need(r.count('vocab', m('vocab'), 'vocabulary size'), m('vocab'), 'the vocabulary size'),
    tied: r.flag('tied', m('tied-output')),
    bias: r.flag('bias', m('bias')),
    experts: r.has(m('experts')) ? readExperts(r, m('experts'), need) : null,
    encoder: r.has(m('encoder'))
      ? {
          layers: need(
            r.count('encoder.layers', m('encoder', 'layers'), 'encoder layers'),
            m('encoder', 'layers'),
            'the number of encoder layers',
          ),
          heads: need(
            r.count('encoder.heads', m('encoder', 'heads'), 'encoder heads'),
            m('encoder', 'heads'),
            'the number of encoder heads',
          ),
          kvHeads: r.count('encoder.kvHeads', m('encoder', 'kv-heads'), 'encoder key/value heads'),
          headDim: r.count('encoder.headDim', m('encoder', 'head-dim'), 'encoder head width'),
          ffn: r.count(
            'encoder.ffn',
            m('encoder', 'feed-forward', 'size'),
            'encoder feed-forward width',
          ),
        }
      : null,
    position: readPosition(r, m('position')),
    declaredSpan: need(
      r.count('declaredSpan', m('declared-span'), 'tokens'),
      m('declared-span'),
      'the maximum positions the model declares',
    ),
    trainedSpan: r.count('trainedSpan', m('trained-span'), 'tokens') ?? null,
    slidingWindow: r.has(m('sliding-window'))
      ? need(
          r.count('slidingWindow', m('sliding-window', 'size'), 'tokens'),
          m('sliding-window', 'size'),
          'the window size in tokens',
        )
      : null,
    windowLayers: r.count('windowLayers', m('sliding-window', 'layers'), 'layers') ?? null,
    ...readShapes(r, m, need),
    dtypes: {
      weights:
        r.choice('dtypes.weights', m('dtypes', 'weights'), STORAGE, 'weight storage') ?? null,
      cache:
        r.choice('dtypes.cache', m('dtypes', 'cache'), STORAGE, 'key/value cache storage') ?? null,
      positions:
        r.choice('dtypes.positions', m('dtypes', 'positions'), FLOATS, 'position format') ?? null,
    },
    embeddingInitStd:
      r.real(
        'embeddingInitStd',
        m('embedding-init', 'std'),
        'standard deviation',
        above(0, 'a standard deviation'),
      ) ?? null,
    embeddingMultiplier:
      r.real(
        'embeddingMultiplier',
        m('embedding-init', 'multiplier'),
        'factor',
        above(0, 'a factor'),
      ) ?? null,
    serving: {
      span: r.count('serving.span', ['serving', 'span'], 'tokens') ?? null,
      sequences: r.count('serving.sequences', ['serving', 'sequences'], 'sequences') ?? null,
      deviceGiB: r.real('serving.deviceGiB', ['serving', 'device-memory-gib'], 'GiB') ?? null,
      reserve:
        r.real('serving.reserve', ['serving', 'reserve'], 'share', {
          test: (n) => n >= 0 && n < 1,
          expected: 'a share from 0 up to but not including 1',
        }) ?? null,
      outputTokens: r.count('serving.outputTokens', ['serving', 'output-tokens'], 'tokens') ?? null,
      promptTokens: r.count('serving.promptTokens', ['serving', 'prompt-tokens'], 'tokens') ?? null,
      tensorParallel:
        r.count(
          'serving.tensorParallel',
          ['serving', 'tensor-parallel'],
          'devices each layer is split over',
        ) ?? null,
      pipelineParallel:
        r.count('serving.pipelineParallel', ['serving', 'pipeline-parallel'], 'pipeline stages') ??
        null,
      activationReserveGiB:
        r.real('serving.activationReserveGiB', ['serving', 'activation-reserve-gib'], 'GiB', {
          test: (n) => n >= 0,
          expected: 'GiB kept per device, at least 0',
        }) ?? null,
    },
    quantization: readWeightGroups(r, m('dtypes')),
  };
  return draft;
}

type Need = (n: number | undefined, path: string[], what: string) => number;

/** Experts with their widths, shared experts and dense layers (docs/metrics.md, "Mixtures of experts and latent attention"). */
function readExperts(r: FieldReader, at: string[], need: Need): Experts {
  const experts: Experts = {
    total: need(
      r.count('experts.total', [...at, 'total'], 'experts'),
      [...at, 'total'],
      'the number of experts',
    ),
    active: need(
      r.count('experts.active', [...at, 'active'], 'active experts'),
      [...at, 'active'],
      'the number of experts each token uses',
    ),
  };
  const width = r.count('experts.width', [...at, 'size'], 'routed expert width');
  if (width !== undefined) experts.width = width;
  const shared = r.count('experts.shared', [...at, 'shared'], 'shared experts');
  if (shared !== undefined) experts.shared = shared;
  const sharedWidth = r.count('experts.sharedWidth', [...at, 'shared-size'], 'shared expert width');
  if (sharedWidth !== undefined) experts.sharedWidth = sharedWidth;
  const gate = r.flag('experts.sharedGate', [...at, 'shared-gate']);
  if (gate !== undefined) experts.sharedGate = gate;
  const dense = r.count('experts.denseLayers', [...at, 'dense-layers'], 'dense layers');
  if (dense !== undefined) experts.denseLayers = dense;
  return experts;
}

/** Latent attention, the layer pattern, chunked attention, norms and encoder-only. */
function readShapes(
  r: FieldReader,
  m: (...p: string[]) => string[],
  need: Need,
): Partial<SpecDraft> {
  const out: Partial<SpecDraft> = {};
  const la = m('latent-attention');
  if (r.has(la)) {
    out.latent = {
      kvRank: need(
        r.count('latent.kvRank', [...la, 'kv-rank'], 'key/value latent width'),
        [...la, 'kv-rank'],
        'the compressed key/value width',
      ),
      qRank: r.count('latent.qRank', [...la, 'q-rank'], 'query latent width') ?? null,
      ropeDim: need(
        r.count('latent.ropeDim', [...la, 'rope-head-dim'], 'rotary width per head'),
        [...la, 'rope-head-dim'],
        'the rotary width per head',
      ),
      nopeDim: need(
        r.count('latent.nopeDim', [...la, 'nope-head-dim'], 'query/key width without position'),
        [...la, 'nope-head-dim'],
        'the query/key width without position code',
      ),
      valueDim: need(
        r.count('latent.valueDim', [...la, 'value-head-dim'], 'value width per head'),
        [...la, 'value-head-dim'],
        'the value width per head',
      ),
    };
  }
  const lp = m('layer-pattern');
  const kinds = r.get([...lp, 'kinds']);
  const layers = r.get(m('layers'));
  if (
    Array.isArray(kinds) &&
    kinds.length > 0 &&
    kinds.every(
      (k) => typeof k === 'string' && (OWN_LAYER_ATTENTIONS as readonly string[]).includes(k),
    )
  ) {
    r.locate('layerTypes', [...lp, 'kinds']);
    if (
      typeof layers === 'number' &&
      Number.isSafeInteger(layers) &&
      layers >= 1 &&
      layers <= 1 << 20
    ) {
      if (kinds.length > layers) {
        r.report(
          'value-invalid',
          [...lp, 'kinds'],
          `${r.key([...lp, 'kinds'])} has ${kinds.length} entries, more than the ${layers} layers; give one entry per layer or a shorter pattern that repeats`,
        );
      } else {
        out.layerTypes = Array.from(
          { length: layers },
          (_, i) => kinds[i % kinds.length] as LayerAttention,
        );
        const types = out.layerTypes;
        if (types.includes('sliding') && !r.has(m('sliding-window')))
          r.missing(
            m('sliding-window'),
            `the window: ${r.key([...lp, 'kinds'])} lists sliding layers`,
          );
        if (types.includes('chunked') && !r.has(m('chunked-attention')))
          r.missing(
            m('chunked-attention'),
            `the chunk: ${r.key([...lp, 'kinds'])} lists chunked layers`,
          );
        if (r.has(m('sliding-window', 'layers'))) {
          r.report(
            'key-ignored',
            m('sliding-window', 'layers'),
            `${r.key(m('sliding-window', 'layers'))} has no effect: ${r.key([...lp, 'kinds'])} says which layers slide; remove it`,
          );
        }
      }
    }
  }
  const free = r.get([...lp, 'position-free']);
  if (Array.isArray(free) && free.every((i) => typeof i === 'number')) {
    r.locate('positionFreeLayers', [...lp, 'position-free']);
    if (free.length > 0) out.positionFreeLayers = free;
  }
  if (r.has(m('chunked-attention'))) {
    out.chunkSize = need(
      r.count('chunkSize', m('chunked-attention', 'size'), 'tokens per chunk'),
      m('chunked-attention', 'size'),
      'the tokens per chunk',
    );
  }
  const norms = r.count('layerNorms', m('norms-per-layer'), 'norms per layer');
  if (norms !== undefined) out.layerNorms = norms;
  const qk = r.flag('qkNorms', m('qk-norms'));
  if (qk !== undefined) out.qkNorms = qk;
  const encoderOnly = r.flag('encoderOnly', m('encoder-only'));
  if (encoderOnly !== undefined) out.encoderOnly = encoderOnly;
  const localBase = r.real(
    'localBase',
    m('position', 'local-base'),
    'rotary base',
    above(1, 'a rotary base'),
  );
  if (localBase !== undefined) out.localBase = localBase;
  return out;
}

/**
 * `dtypes.weight-group-size` (and `weight-zero-point`): with weights int4, int8 or fp8, the
 * layers' matrices are stored quantized with a scale per group (docs/metrics.md, "Quantized weights").
 */
function readWeightGroups(r: FieldReader, at: string[]): WeightQuantization | null {
  const groupPath = [...at, 'weight-group-size'];
  const zeroPath = [...at, 'weight-zero-point'];
  const zeroPoint = r.flag(null, zeroPath);
  if (!r.has(groupPath)) {
    if (zeroPoint !== undefined)
      r.report(
        'key-ignored',
        zeroPath,
        `${r.key(zeroPath)} has no effect without ${r.key(groupPath)}; state the weights sharing one scale, e.g. 128`,
      );
    return null;
  }
  const group = r.count('quantization', groupPath, 'weights per scale');
  if (group === undefined || Number.isNaN(group) || !isCount(group)) return null;
  const weights = r.get([...at, 'weights']);
  const q =
    typeof weights === 'string' && Object.hasOwn(STORAGE, weights)
      ? dtypeQuantization(STORAGE[weights]!, group, zeroPoint === true)
      : null;
  if (q === null) {
    r.report(
      'key-ignored',
      groupPath,
      `${r.key(groupPath)} has no effect: ${r.key([...at, 'weights'])} is ${r.has([...at, 'weights']) ? r.quote([...at, 'weights']) : 'not stated (bf16)'}, not a quantized format; set it to int4, int8 or fp8, or remove the group size`,
    );
  }
  return q;
}

function readPosition(r: FieldReader, at: string[]): PositionDraft {
  const code = r.choice('position', [...at, 'code'], CODES, 'the position code');
  if (code === undefined && !r.reported([...at, 'code']))
    r.missing([...at, 'code'], `the position code: ${POSITION_KINDS.join(', ')}`);
  if (code === 'relative') {
    return {
      kind: 'relative',
      buckets: r.count('position.buckets', [...at, 'buckets'], 'buckets'),
      maxDistance: r.count('position.maxDistance', [...at, 'max-distance'], 'tokens'),
    };
  }
  if (code !== 'rotary') {
    for (const key of ['base', 'local-base', 'fraction', 'scaling']) {
      if (code && r.has([...at, key])) {
        r.report(
          'key-ignored',
          [...at, key],
          `${r.key([...at, key])} has no effect: it applies to rotary codes, and ${r.key([...at, 'code'])} is ${code}; remove it or set the code to rotary`,
        );
      }
    }
    return { kind: code ?? 'none' };
  }
  const base = r.real('position.base', [...at, 'base'], 'rotary base', above(1, 'a rotary base'));
  const fraction = r.real('position.fraction', [...at, 'fraction'], 'share', {
    test: (n) => n > 0 && n <= 1,
    expected: 'a share of the head above 0 and at most 1',
  });
  return {
    kind: 'rotary',
    base,
    fraction,
    scaling: r.has([...at, 'scaling']) ? readScaling(r, [...at, 'scaling']) : null,
  };
}

function readScaling(r: FieldReader, at: string[]): ScalingDraft | null {
  const kind = r.choice('position.scaling', [...at, 'kind'], KINDS, 'the scaling kind');
  if (!kind) {
    if (kind === undefined)
      r.missing([...at, 'kind'], `the scaling kind: ${SCALING_KINDS.join(', ')}`);
    return null;
  }
  const factor =
    r.real('position.scaling.factor', [...at, 'factor'], 'scaling factor') ??
    r.missing([...at, 'factor'], 'the scaling factor (extended span over original span)');
  const draft: ScalingDraft = {
    kind,
    factor,
    originalSpan:
      r.count('position.scaling.originalSpan', [...at, 'original-span'], 'tokens') ?? null,
    alpha: r.real('position.scaling.alpha', [...at, 'alpha'], 'ramp start', {
      test: (n) => n >= 0,
      expected: 'a ramp start of at least 0',
    }),
    beta: r.real('position.scaling.beta', [...at, 'beta'], 'ramp end', above(0, 'a ramp end')),
    low: r.real(
      'position.scaling.low',
      [...at, 'low'],
      'low-frequency factor',
      above(0, 'a low-frequency factor'),
    ),
    high: r.real(
      'position.scaling.high',
      [...at, 'high'],
      'high-frequency factor',
      above(0, 'a high-frequency factor'),
    ),
  };
  if (kind === 'pairwise') {
    const list = (key: string): number[] | null => {
      const v = r.get([...at, key]);
      return Array.isArray(v) && v.every((x) => typeof x === 'number') ? v : null;
    };
    draft.shortFactors = list('short-factors');
    draft.longFactors = list('long-factors');
    draft.attentionFactor =
      r.real(
        'position.scaling.attentionFactor',
        [...at, 'attention-factor'],
        'attention factor',
        above(0, 'an attention factor'),
      ) ?? null;
    for (const key of ['short-factors', 'long-factors']) {
      if (!r.has([...at, key])) r.missing([...at, key], 'a list of factors, one per rotary pair');
    }
  }
  orderedRamp(
    r,
    at,
    'alpha',
    draft.alpha,
    DEFAULT_YARN_ALPHA,
    'beta',
    draft.beta,
    DEFAULT_YARN_BETA,
    true,
  );
  orderedRamp(
    r,
    at,
    'low',
    draft.low,
    DEFAULT_BANDED_LOW,
    'high',
    draft.high,
    DEFAULT_BANDED_HIGH,
    true,
  );
  for (const key of kind === 'yarn'
    ? ['low', 'high']
    : kind === 'banded'
      ? ['alpha', 'beta']
      : ['alpha', 'beta', 'low', 'high']) {
    if (r.has([...at, key])) {
      r.report(
        'key-ignored',
        [...at, key],
        `${r.key([...at, key])} has no effect on ${kind} scaling (alpha and beta are yarn's, low and high are banded's); remove it`,
      );
    }
  }
  return draft;
}

function schemaFinding(r: FieldReader, error: ErrorObject): void {
  const pointer = error.instancePath;
  // Numbers of the wrong kind (1e400, 2.5 layers) are the readers' and the spec rules' to report.
  // ajv's `type` parameter is the schema's type: one name, as model.schema.json never lists several.
  const expects = (error.params as { type?: unknown }).type;
  if (
    error.keyword === 'type' &&
    typeof error.data === 'number' &&
    (expects === 'integer' || expects === 'number')
  )
    return;
  if (RULE_CHECKED.has(pointer) && RANGE_KEYWORDS.has(error.keyword)) return;
  const path: PathSegment[] = parsePointer(pointer);
  const key = r.key(path);
  const params = error.params as Record<string, unknown>;
  const schema = (error.parentSchema ?? {}) as { properties?: Record<string, unknown> };
  switch (error.keyword) {
    case 'required': {
      // Single values are the reader's to call missing, in its words; only whole blocks are named here.
      const name = String(params.missingProperty);
      const block = REQUIRED_BLOCKS[name];
      if (block !== undefined)
        r.report(
          'value-invalid',
          [...path, name],
          `${r.key([...path, name])} is missing; expected ${block}`,
        );
      return;
    }
    case 'additionalProperties': {
      const name = String(params.additionalProperty);
      // Already reported (a long name shortened to the same key): no suggestion to look for.
      if (r.reported([...path, name])) return;
      // Counted, not listed: no suggestion to look for.
      if (r.full('value-invalid')) return r.report('value-invalid', [...path, name], '');
      const known = Object.keys(schema.properties ?? {}).filter((k) => k !== '$schema');
      const nearest = suggestKey(name, known);
      const where = path.length === 0 ? 'at the top level' : `under ${key}`;
      r.report(
        'value-invalid',
        [...path, name],
        `${r.key([...path, name])} is not a known key ${where}${nearest === null ? '' : `; did you mean "${nearest}"?`} (known keys: ${known.join(', ')})`,
      );
      return;
    }
    case 'type': {
      const types = (Array.isArray(params.type) ? params.type : String(params.type).split(',')).map(
        (t) => TYPE_WORDS[String(t)] ?? String(t),
      );
      r.report('value-invalid', path, `${key} ${r.is(path)}; expected ${types.join(' or ')}`);
      return;
    }
    case 'enum': {
      const allowed = (params.allowedValues as unknown[]).map(String);
      const nearest = typeof error.data === 'string' ? suggestKey(error.data, allowed) : null;
      const hint = nearest === null ? '' : `; did you mean "${nearest}"?`;
      if (pointer.endsWith('/scaling/kind')) {
        r.report(
          'scaling-kind-unknown',
          path,
          `${key} is ${r.quote(path)}, not a known scaling kind (${allowed.join(', ')})${hint}; without a known kind the code is read unscaled`,
        );
      } else {
        r.report(
          'value-invalid',
          path,
          `${key} is ${r.quote(path)}; expected one of ${allowed.join(', ')}${hint}`,
        );
      }
      return;
    }
    case 'minimum':
    case 'maximum':
    case 'exclusiveMinimum':
    case 'exclusiveMaximum':
      r.report(
        'value-invalid',
        path,
        `${key} is ${r.quote(path)}; expected a number ${COMPARISON_WORDS[String(params.comparison)] ?? String(params.comparison)} ${String(params.limit)}`,
      );
      return;
    case 'maxLength':
      r.report(
        'value-invalid',
        path,
        `${key} is ${String(error.data).length} characters long; expected at most ${String(params.limit)}`,
      );
      return;
    default:
      r.report(
        'value-invalid',
        path,
        `${key} is ${quoteValue(error.data)}; ${error.message ?? 'not allowed by the model schema'}`,
      );
  }
}
