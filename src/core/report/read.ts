/**
 * Reading back the JSON report `renderGateJson` writes, so a second, privileged workflow can
 * publish what a first, unprivileged one decided. That file is untrusted: on a pull request from
 * a fork, the fork's own workflow wrote it. It is checked field by field against the report's
 * shape (every enum, every number, every line), fields the renderers do not know are dropped,
 * the verdict and the counts must follow from the findings, and the comment rendered from it
 * escapes every text again, as for any report. Remedies are read back too, their names checked
 * (metric names of the contract, dotted field paths) and their texts escaped by the renderers.
 */
import { Ajv } from 'ajv';
import type { ErrorObject, ValidateFunction } from 'ajv';
import { METRIC_PATHS } from '../metrics/metric-path.js';
import {
  FLOAT_FORMATS,
  LAYER_ATTENTIONS,
  POSITION_KINDS,
  SCALING_KINDS,
  SEVERITIES,
  STORAGE_DTYPES,
} from '../model.js';
import type { ModelSpec } from '../model.js';
import { PRECISION_METRICS, SCALAR_METRICS } from '../metrics/types.js';
import type { Metrics } from '../metrics/types.js';
import { ReadError } from '../parse/errors.js';
import { truncate } from '../parse/quote.js';
import { RULES } from '../rules/catalog.js';
import type { GateReport } from './types.js';
import { tally, verdictOf } from './verdict.js';
import { nullRecord } from '../null-record.js';

/** Longest report read back, in UTF-16 code units (default: `67108864`, 64 Mi). */
export const MAX_REPORT_CHARS = 64 * 1024 * 1024;

type Schema = Record<string, unknown>;

const numberOrNull: Schema = { type: ['number', 'null'] };
const count: Schema = { type: 'integer', minimum: 0 };
const text: Schema = { type: 'string' };
const textOrNull: Schema = { type: ['string', 'null'] };
const lineOrNull: Schema = { type: ['integer', 'null'], minimum: 1 };
const severity: Schema = { enum: [...SEVERITIES] };

/** Rule ids of the catalogue: a report names no other rule. */
const ruleId: Schema = { enum: Object.keys(RULES) };

const escapeRe = (text: string): string => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** A finding's identity as remedies name it: a rule id, with the metric after a colon for limits. */
const identity: Schema = {
  type: 'string',
  pattern: `^(${Object.keys(RULES).map(escapeRe).join('|')})(:(${METRIC_PATHS.map(escapeRe).join('|')}))?$`,
};

/** A commit id as git writes it: 40 hexadecimal digits (64 in a SHA-256 repository). */
const commitId: Schema = { type: 'string', pattern: '^([0-9a-f]{40}|[0-9a-f]{64})$' };

/**
 * A repository path as git lists it: no `.` or `..` segment, no leading `/`, no NUL (a link built
 * from `a/../../x` would leave the blob page for another page of the same host).
 */
const repoPath: Schema = {
  type: 'string',
  minLength: 1,
  maxLength: 4096,
  pattern: '^(?!/)(?![\\s\\S]*(^|/)\\.{1,2}(/|$))[^\\u0000]+$',
};
const repoPathOrNull: Schema = { anyOf: [repoPath, { type: 'null' }] };

/** An object whose listed properties are all required (mapped from name to schema). */
function record(
  properties: Record<string, Schema>,
  nullable = false,
  optional: string[] = [],
): Schema {
  return {
    type: nullable ? ['object', 'null'] : 'object',
    properties,
    required: Object.keys(properties).filter((name) => !optional.includes(name)),
    // With removeAdditional, fields the renderers do not know are dropped, whatever they hold.
    additionalProperties: false,
  };
}

/** A mapping of dotted names (no prototype keys) to values of `value`. */
function map(
  value: Schema,
  names: Schema = { pattern: '^[A-Za-z][A-Za-z0-9]*(\\.[A-Za-z0-9]+)*$', maxLength: 80 },
): Schema {
  return {
    type: 'object',
    propertyNames: { ...names, not: { enum: ['__proto__', 'constructor', 'prototype'] } },
    additionalProperties: value,
  };
}

const numbers = (names: readonly string[]): Record<string, Schema> =>
  Object.fromEntries(names.map((name) => [name, numberOrNull]));

const precision = record(numbers(PRECISION_METRICS));

const precisionByFormat = record(
  Object.fromEntries(FLOAT_FORMATS.map((format) => [format, precision])),
);

/** Per layer kind (`LayerKindMetrics`). */
const layerKind = record({
  attention: { enum: [...LAYER_ATTENTIONS] },
  positionCode: { enum: [...POSITION_KINDS] },
  scaled: { type: 'boolean' },
  ...numbers([
    'layers',
    'window',
    'rotaryBase',
    'visibleSpan',
    'fastestWavelength',
    'slowestWavelength',
    'unturnedPairs',
    'exposedPairs',
    'separationFloor',
    'separationFloorOffset',
    'discriminationSpan',
  ]),
  precision: precisionByFormat,
});

const metrics = record(
  {
    ...numbers(SCALAR_METRICS),
    alibiSlopes: { type: ['array', 'null'], items: { type: 'number' } },
    visionParams: numberOrNull,
    precision: precisionByFormat,
    layerKinds: { type: ['array', 'null'], items: layerKind },
  },
  false,
  ['layerKinds', 'visionParams'],
);

const booleanOrNull: Schema = { type: ['boolean', 'null'] };

/*
 * Field lists the schema below and `NULLABLE_SPEC_FIELDS` both use: each named once, so a field
 * added to one is in the other.
 */
/** Spec numbers a config may leave unstated (null). */
const SPEC_OPTIONAL_NUMBERS = [
  'trainedSpan',
  'slidingWindow',
  'windowLayers',
  'embeddingInitStd',
  'embeddingMultiplier',
] as const;
/** Spec fields older reports lack, null when unstated. */
const SPEC_OPTIONAL = [
  'latent',
  'layerTypes',
  'positionFreeLayers',
  'chunkSize',
  'localBase',
  'layerNorms',
  'qkNorms',
  'encoderOnly',
  'quantization',
  'vision',
] as const;
/** A mixture of experts' fields older reports lack, null when unstated. */
const EXPERT_OPTIONAL = ['width', 'shared', 'sharedWidth', 'denseLayers', 'sharedGate'] as const;
/** A context scaling's fields older reports lack, null when unstated. */
const SCALING_OPTIONAL = ['shortFactors', 'longFactors', 'attentionFactor'] as const;
/** Serving fields older reports lack. */
const SERVING_OPTIONAL = ['tensorParallel', 'pipelineParallel', 'activationReserveGiB'] as const;
/** Every serving number, null when unstated. */
const SERVING_NUMBERS = [
  'span',
  'sequences',
  'deviceGiB',
  'reserve',
  'outputTokens',
  'promptTokens',
  ...SERVING_OPTIONAL,
] as const;

const spec = record(
  {
    name: textOrNull,
    ...numbers([
      'layers',
      'hidden',
      'heads',
      'kvHeads',
      'headDim',
      'ffn',
      'vocab',
      'declaredSpan',
      ...SPEC_OPTIONAL_NUMBERS,
    ]),
    gated: { type: 'boolean' },
    tied: { type: 'boolean' },
    bias: { type: 'boolean' },
    experts: record(
      {
        ...numbers(['total', 'active', 'width', 'shared', 'sharedWidth', 'denseLayers']),
        sharedGate: booleanOrNull,
      },
      true,
      [...EXPERT_OPTIONAL],
    ),
    latent: record(numbers(['kvRank', 'qRank', 'ropeDim', 'nopeDim', 'valueDim']), true),
    layerTypes: { type: ['array', 'null'], items: { enum: [...LAYER_ATTENTIONS] } },
    positionFreeLayers: { type: ['array', 'null'], items: { type: 'number' } },
    ...numbers(['chunkSize', 'localBase', 'layerNorms']),
    qkNorms: booleanOrNull,
    encoderOnly: booleanOrNull,
    encoder: record(numbers(['layers', 'heads', 'kvHeads', 'headDim', 'ffn']), true),
    vision: record(numbers(['layers', 'hidden', 'ffn', 'patch', 'image', 'channels']), true),
    position: {
      ...record(
        {
          kind: { enum: [...POSITION_KINDS] },
          base: numberOrNull,
          fraction: numberOrNull,
          scaling: record(
            {
              kind: { enum: [...SCALING_KINDS] },
              ...numbers([
                'factor',
                'originalSpan',
                'alpha',
                'beta',
                'low',
                'high',
                'attentionFactor',
              ]),
              shortFactors: { type: ['array', 'null'], items: { type: 'number' } },
              longFactors: { type: ['array', 'null'], items: { type: 'number' } },
            },
            true,
            [...SCALING_OPTIONAL],
          ),
          buckets: numberOrNull,
          maxDistance: numberOrNull,
        },
        false,
        ['base', 'fraction', 'scaling', 'buckets', 'maxDistance'],
      ),
      if: { properties: { kind: { const: 'rotary' } } },
      then: { required: ['base', 'fraction', 'scaling'] },
    },
    dtypes: record({
      weights: { enum: [...STORAGE_DTYPES, null] },
      cache: { enum: [...STORAGE_DTYPES, null] },
      positions: { enum: [...FLOAT_FORMATS, null] },
    }),
    serving: record(numbers(SERVING_NUMBERS), false, [...SERVING_OPTIONAL]),
    quantization: record(
      {
        method: text,
        ...numbers(['bits', 'groupSize', 'scaleBits']),
        zeroPoint: { type: 'boolean' },
        output: { type: 'boolean' },
        // Only MXFP4 checkpoints state it (their routed experts alone are quantized).
        scope: { enum: ['experts'] },
      },
      true,
      ['scope'],
    ),
  },
  false,
  [...SPEC_OPTIONAL],
);

const location = record({ key: text, line: lineOrNull });
const version = record({ spec, metrics }, true);
/** The head also carries where each field was stated (optional: reports written before it lack it). */
const headVersion = record({ spec, metrics, locations: map(location) }, true, ['locations']);

const failure = record(
  { path: text, line: lineOrNull, message: text, notAModel: { type: 'boolean' } },
  true,
  ['notAModel'],
);

const limit = record(
  {
    max: { type: 'number' },
    min: { type: 'number' },
    maxIncreasePct: { type: 'number' },
    severity,
  },
  true,
  ['max', 'min', 'maxIncreasePct'],
);

const delta = record(
  {
    metric: { enum: [...METRIC_PATHS] },
    base: numberOrNull,
    head: numberOrNull,
    change: numberOrNull,
    changePct: numberOrNull,
    limit,
    state: { enum: ['ok', 'crossed', 'unjudged'] },
    note: text,
  },
  false,
  ['note'],
);

/** A remedy (`src/core/remedy/types.ts`): the change, the metrics it gives, the findings it raises. */
const remedy = record(
  {
    change: map({ type: ['number', 'string'] }),
    metrics: map(numberOrNull, { enum: [...METRIC_PATHS] }),
    raises: { type: 'array', items: identity },
    cost: text,
  },
  false,
  ['cost'],
);

const finding = record(
  {
    rule: ruleId,
    severity,
    message: text,
    key: textOrNull,
    line: lineOrNull,
    standing: { type: 'boolean' },
    counts: { enum: [...SEVERITIES, null] },
    waived: { type: 'boolean' },
    file: repoPath,
    metric: { enum: [...METRIC_PATHS] },
    remedy: { ...remedy, type: ['object', 'null'] },
    remedyWhyNot: textOrNull,
    remedyAlternatives: { type: 'array', items: remedy },
  },
  false,
  ['metric', 'remedy', 'remedyWhyNot', 'remedyAlternatives'],
);

const verdict: Schema = { enum: ['ok', 'warn', 'block'] };
const status: Schema = { enum: ['added', 'modified', 'renamed', 'deleted'] };

const file = record(
  {
    path: repoPath,
    previousPath: repoPathOrNull,
    status,
    dialect: { enum: ['context-reach', 'checkpoint', null] },
    verdict,
    deltas: { type: 'array', items: delta },
    findings: { type: 'array', items: finding },
    base: version,
    head: headVersion,
    baseError: failure,
    headError: failure,
    remedyTogether: record(
      {
        change: map({ type: ['number', 'string'] }),
        metrics: map(numberOrNull, { enum: [...METRIC_PATHS] }),
        passes: { type: 'boolean' },
        stillBlocking: { type: 'array', items: identity },
      },
      true,
    ),
    assumed: record(
      { metrics: { type: 'array', items: { enum: [...METRIC_PATHS] } }, reason: text },
      true,
    ),
  },
  false,
  ['remedyTogether', 'assumed'],
);

/** The JSON Schema of the report `renderGateJson` writes (version 1). */
export const GATE_JSON_SCHEMA: Readonly<Schema> = {
  ...record({
    version: { const: 1 },
    verdict,
    blocking: count,
    warnings: count,
    base: commitId,
    head: commitId,
    policy: record(
      {
        source: { enum: ['file', 'built-in'] },
        path: text,
        changedInHead: { type: 'boolean' },
        limitChanges: { type: 'array', items: text },
      },
      false,
      ['limitChanges'],
    ),
    waiver: record({ label: textOrNull, applied: { type: 'boolean' }, waivedBlocks: count }),
    notices: { type: 'array', items: text },
    deleted: {
      type: 'array',
      items: record({ status, path: repoPath, previousPath: repoPathOrNull }),
    },
    files: { type: 'array', items: file },
  }),
};

let compiled: ValidateFunction | null = null;

function validator(): ValidateFunction {
  // removeAdditional drops what `additionalProperties: false` does not admit instead of failing.
  compiled ??= new Ajv({
    strict: true,
    strictRequired: false,
    allowUnionTypes: true,
    removeAdditional: true,
    allErrors: false,
  }).compile(GATE_JSON_SCHEMA);
  return compiled;
}

function describe(error: ErrorObject, root: unknown): string {
  let value: unknown = root;
  for (const part of error.instancePath.split('/').slice(1)) {
    value =
      value !== null && typeof value === 'object'
        ? (value as Record<string, unknown>)[part.replace(/~1/g, '/').replace(/~0/g, '~')]
        : undefined;
  }
  // Collections are named, not printed: a tampered report may nest them without end.
  const shown = Array.isArray(value)
    ? 'a list'
    : value !== null && typeof value === 'object'
      ? 'a mapping'
      : (JSON.stringify(value) ?? 'nothing');
  const quoted = truncate(shown);
  const where = error.instancePath === '' ? 'the top level' : error.instancePath;
  const expected =
    error.keyword === 'required'
      ? `a field ${JSON.stringify((error.params as { missingProperty: string }).missingProperty)}`
      : error.keyword === 'enum'
        ? `one of ${(error.params as { allowedValues: unknown[] }).allowedValues.map((v) => JSON.stringify(v)).join(', ')}`
        : (error.message ?? error.keyword);
  return `${where} is ${quoted}; expected ${expected}`;
}

/** Numbers the spec types as always present were NaN when written; JSON wrote them as null. */
function restoreNaN(value: unknown, nullable: ReadonlySet<string>): unknown {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return value;
  const out: Record<string, unknown> = nullRecord();
  for (const [key, entry] of Object.entries(value)) {
    out[key] = entry === null && !nullable.has(key) ? NaN : restoreNaN(entry, nullable);
  }
  return out;
}

/** Spec fields that are null by design ("not stated"); every other null was a NaN. */
const NULLABLE_SPEC_FIELDS = new Set<string>([
  'name',
  'experts',
  'encoder',
  'vision',
  'scaling',
  'originalSpan',
  'weights',
  'cache',
  'positions',
  'groupSize',
  'qRank',
  ...SPEC_OPTIONAL_NUMBERS,
  ...SPEC_OPTIONAL,
  ...EXPERT_OPTIONAL,
  ...SCALING_OPTIONAL,
  ...SERVING_NUMBERS,
]);

/**
 * The gate report in `text` (what `renderGateJson` writes), checked as untrusted input from
 * `file`. Throws `ReadError` naming the file, the line for JSON syntax, and the first field that
 * does not fit (its JSON pointer, the value, what was expected).
 */
export function readGateJson(text: string, file: string): GateReport {
  if (text.length > MAX_REPORT_CHARS) {
    throw new ReadError(
      file,
      null,
      `is ${text.length} characters long; a report is read up to ${MAX_REPORT_CHARS}`,
    );
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const at = /position (\d+)/.exec(message);
    const line = at ? text.slice(0, Number(at[1])).split('\n').length : null;
    throw new ReadError(
      file,
      line,
      `is not a JSON report: ${message.replace(/ in JSON at position \d+.*$/s, '')}`,
    );
  }
  const validate = validator();
  if (!validate(value)) {
    throw new ReadError(
      file,
      null,
      `is not a context-reach report of version 1: ${describe(validate.errors![0]!, value)}`,
    );
  }
  const report = value as GateReport;
  for (const [index, decision] of report.files.entries()) {
    for (const side of ['base', 'head'] as const) {
      const read = decision[side] as unknown as { spec: unknown; metrics: Metrics } | null;
      decision[side] =
        read === null
          ? null
          : {
              path: decision.path,
              dialect: decision.dialect ?? 'checkpoint',
              locations: {},
              findings: [],
              spec: restoreNaN(read.spec, NULLABLE_SPEC_FIELDS) as ModelSpec,
              metrics: read.metrics,
            };
    }
    if (decision.verdict !== verdictOf(decision.findings)) {
      throw new ReadError(
        file,
        null,
        `/files/${index}/verdict is "${decision.verdict}" but its findings make it "${verdictOf(decision.findings)}"; the report was altered`,
      );
    }
  }
  const all = report.files.flatMap((decision) => decision.findings);
  const expected: Record<'verdict' | 'blocking' | 'warnings' | 'waivedBlocks', string | number> =
    tally(all);
  for (const key of ['verdict', 'blocking', 'warnings', 'waivedBlocks'] as const) {
    const stated = key === 'waivedBlocks' ? report.waiver.waivedBlocks : report[key];
    const path = key === 'waivedBlocks' ? '/waiver/waivedBlocks' : `/${key}`;
    if (stated !== expected[key]) {
      throw new ReadError(
        file,
        null,
        `${path} is ${JSON.stringify(stated)} but the findings make it ${JSON.stringify(expected[key])}; the report was altered`,
      );
    }
  }
  return report;
}
