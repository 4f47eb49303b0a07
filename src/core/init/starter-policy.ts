import type { Dialect, ModelSpec } from '../model.js';
import { POLICY_SCHEMA } from '../policy/schema.js';
import { DEFAULT_POLICY_PATH } from '../policy/defaults.js';
import { schemaUrl } from '../home.js';

/** A model config `init` found in the repository: its path and, when it could be read, its dialect and spec. */
export interface FoundConfig {
  path: string;
  dialect: Dialect | null;
  spec: ModelSpec | null;
}

/** One line of text for a YAML comment: control characters (a newline would end the comment) shown as `?`. */
function commentText(text: string): string {
  return text.replace(/[\u0000-\u001f\u007f\u2028\u2029]/g, '?');
}

/** A YAML scalar for any string: JSON's double-quoted form is valid YAML. */
function quoted(text: string): string {
  return JSON.stringify(text);
}

/**
 * The glob that picks a config like `path` in its top folder: the built-in glob its file name
 * matches (`config.json`, `*.reach.*`, `*model*`), under the path's first folder
 * (`models/x/config.json` → `models/**\/config.json`); at the top level, the built-in glob itself.
 */
export function starterGlob(path: string): string {
  const parts = path.split('/');
  const name = parts[parts.length - 1]!;
  const pattern =
    name === 'config.json'
      ? 'config.json'
      : /\.reach\.(ya?ml|json)$/.test(name)
        ? '*.reach.{yaml,yml,json}'
        : /\.(ya?ml|json)$/.test(name) && name.includes('model')
          ? '*model*.{json,yaml,yml}'
          : name;
  return parts.length > 1 ? `${parts[0]}/**/${pattern}` : `**/${pattern}`;
}

/** Folders (as `top/**` globs) a workflow's `paths` filter needs: every found config's top folder, then the policy. */
export function workflowPaths(found: readonly FoundConfig[]): string[] | null {
  if (found.length === 0) return null;
  const tops = [
    ...new Set(found.map((c) => (c.path.includes('/') ? `${c.path.split('/')[0]}/**` : c.path))),
  ].sort();
  return [...tops, DEFAULT_POLICY_PATH];
}

/** The one value every readable config agrees on, or null. */
function common<T>(found: readonly FoundConfig[], pick: (spec: ModelSpec) => T | null): T | null {
  const values = found.filter((c) => c.spec !== null).map((c) => pick(c.spec!));
  if (values.length === 0 || values.some((v) => v === null || v !== values[0])) return null;
  return values[0]!;
}

/** Meaning of a metric's limit, from the policy schema (`unit: definition`). */
function meaning(metric: string): string {
  const limits = (
    POLICY_SCHEMA.definitions as Record<
      string,
      { properties?: Record<string, { description?: string }> }
    >
  ).limits;
  return limits?.properties?.[metric]?.description ?? metric;
}

/** Limits suggested in the starter policy, commented out: metric, its bounds as YAML lines, and why. */
const SUGGESTED_LIMITS: readonly { metric: string; bounds: string[]; why: string }[] = [
  {
    metric: 'headroom',
    bounds: ['min: 0'],
    why: 'block a span past what the position code supports',
  },
  {
    metric: 'exposedPairs',
    bounds: ['max: 0'],
    why: 'block rotary pairs turned further than training turned them',
  },
  {
    metric: 'declaredSpan',
    bounds: ['max-increase-pct: 100', 'severity: warn'],
    why: 'warn when a pull request more than doubles the span',
  },
  {
    metric: 'fitSequences',
    bounds: ['min: 1'],
    why: 'block when not one sequence fits the device (needs serving.device-memory-gib)',
  },
  {
    metric: 'memoryBytes',
    bounds: ['max-increase-pct: 25', 'severity: warn'],
    why: 'warn when memory at the span grows by more than a quarter',
  },
];

/**
 * The starter policy `context-reach init` writes to `.github/context-reach.yml`: the schema
 * comment editors read for completion, `files` globs for the configs found, the serving values
 * every found config agrees on, and limits left commented, each with its meaning. Valid against
 * `schema/policy.schema.json` as written and with every commented limit uncommented.
 */
export function renderStarterPolicy(found: readonly FoundConfig[]): string {
  const lines: string[] = [
    `# yaml-language-server: $schema=${schemaUrl('policy.schema.json')}`,
    '#',
    '# The context-reach policy. The gate reads it from the base commit of every pull request, so a',
    '# pull request cannot loosen its own gate. Every key is described in the README ("Policy file")',
    '# and in the schema above, which editors with a YAML language server use for completion.',
  ];
  if (found.length === 0) {
    lines.push(
      '#',
      '# `context-reach init` found no model configs, so the built-in globs pick them (see `files` below).',
    );
  } else {
    lines.push(
      '#',
      `# Written by \`context-reach init\` from the ${found.length} model config${found.length === 1 ? '' : 's'} found:`,
    );
    for (const config of found) {
      const what =
        config.spec === null
          ? 'could not be read; fix it and run the gate'
          : `${config.dialect}, ${config.spec.declaredSpan.toLocaleString('en-US')} positions`;
      lines.push(`#   ${commentText(config.path)} (${commentText(what)})`);
    }
  }
  lines.push('');
  const globs = [...new Set(found.map((c) => starterGlob(c.path)))];
  if (globs.length > 0) {
    lines.push(
      '# Which files are model configs (globs, repository-relative; `**` is any depth).',
      'files:',
    );
    for (const glob of globs) lines.push(`  - ${quoted(glob)}`);
  } else {
    lines.push(
      '# Which files are model configs (globs, repository-relative; `**` is any depth). Without',
      '# `files`, the built-in globs apply.',
      '# files:',
      '#   - "models/**/config.json"',
    );
  }
  lines.push('');

  const weights = common(found, (spec) => spec.dtypes.weights);
  const cache = common(found, (spec) => spec.dtypes.cache);
  const inferred: string[] = [];
  const row = (left: string, note: string) => `${left.padEnd(30)}# ${note}`;
  if (weights !== null)
    inferred.push(
      row(`  weights: ${weights}`, `every config found stores its weights as ${weights}`),
    );
  if (cache !== null)
    inferred.push(
      row(`  cache: ${cache}`, `every config found keeps its key/value cache as ${cache}`),
    );
  const commented = [
    row('  # span: 8192', "tokens served per sequence (default: each config's declared span)"),
    row('  # sequences: 1', 'sequences held in the key/value cache at once'),
    row('  # device-memory-gib: 80', 'memory per replica in GiB, for fitSequences'),
    ...(cache === null
      ? [row('  # cache: fp8', 'key/value cache format (default: the weight format)')]
      : []),
  ];
  lines.push('# Serving defaults for every model config; a value the config states itself wins.');
  if (inferred.length > 0) lines.push('serving:', ...inferred, ...commented);
  else lines.push('# serving:', ...commented.map((line) => `#${line.slice(1)}`));
  lines.push('');

  lines.push(
    "# Limits on the head version's metrics (names as in the README's metrics table). None is set:",
    "# uncomment the ones your team wants. Each bound is in the metric's unit; `severity` is block",
    '# (the default), warn or info.',
    '# limits:',
  );
  for (const { metric, bounds, why } of SUGGESTED_LIMITS) {
    lines.push(`#   ${metric}:`.padEnd(44) + `# ${commentText(meaning(metric))}`);
    for (const [i, bound] of bounds.entries())
      lines.push(`#     ${bound}`.padEnd(44) + (i === 0 ? `# ${why}` : '').trimEnd());
  }
  lines.push(
    '',
    '# A finding the base version already had is listed without blocking (`report`), or blocks (`block`).',
    'standing: report',
    '',
    '# A pull-request label that turns blocks into warnings, recorded in the report.',
    '# waiver-label: context-reach-waive',
  );
  return `${lines.map((line) => line.trimEnd()).join('\n')}\n`;
}
