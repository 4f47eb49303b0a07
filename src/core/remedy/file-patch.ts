/**
 * A remedy in the file's own keys and format: the change a person pastes into the model file
 * (JSON keys of a checkpoint config, `rope_scaling` blocks included; the YAML keys of the
 * context-reach model format), or into the policy's `serving` block when a serving value came
 * from there. Built from the location map the reader records (where each spec field was stated),
 * so an edit lands on the key the file already has, with the spelling it already uses.
 */
import type { Dialect, LocationMap, ModelSpec } from '../model.js';
import { changeEntries, isChangeKey, type ChangeKey } from './apply-change.js';
import { SERVING_FIELDS } from '../policy/parse.js';
import { SERVING_SPEC_PATH } from '../serving-patch.js';
import type { Change, ChangeValue } from '../report/types.js';

/** One key to set: its dotted path in the file (as the reader names it), the value, and the line it is on now. */
export interface KeyEdit {
  field: ChangeKey;
  /** Dotted key path as the file spells it, e.g. `rope_scaling.factor`, `model.position.scaling.factor`. */
  key: string;
  value: ChangeValue;
  /** Line the key is on now; null for a key the file does not have yet. */
  line: number | null;
}

/** Where the edits go: the model file itself, or the policy's serving block. */
export interface FilePatch {
  target: 'model' | 'policy';
  /** The file the edits go into, for words: the model path, or the policy key as the location map names it. */
  where: string;
  format: 'json' | 'yaml';
  edits: KeyEdit[];
  /** The change, ready to paste: one line per existing key, a whole block for a new one. */
  snippet: string;
}

/** Checkpoint keys for a field the file does not state yet (the keys published configs use). */
const CHECKPOINT_KEYS: Partial<Record<ChangeKey, string>> = {
  'position.base': 'rope_theta',
  'position.scaling.kind': 'rope_type',
  'position.scaling.factor': 'factor',
  'position.scaling.originalSpan': 'original_max_position_embeddings',
  kvHeads: 'num_key_value_heads',
};

/** Own-format keys for a field the file does not state yet, under the model block. */
const OWN_KEYS: Partial<Record<ChangeKey, string>> = {
  'position.base': 'position.base',
  'position.scaling.kind': 'position.scaling.kind',
  'position.scaling.factor': 'position.scaling.factor',
  'position.scaling.originalSpan': 'position.scaling.original-span',
  kvHeads: 'kv-heads',
  'dtypes.cache': 'dtypes.cache',
  'dtypes.positions': 'dtypes.positions',
  'dtypes.weights': 'dtypes.weights',
  'quantization.groupSize': 'dtypes.weight-group-size',
};

/**
 * Policy `serving` keys, kebab-case as the policy file spells them, for each field a remedy may
 * change that the policy's serving block can set.
 */
const POLICY_SERVING_KEYS: ReadonlyMap<ChangeKey, string> = new Map(
  SERVING_FIELDS.flatMap(([written, field]): [ChangeKey, string][] => {
    const key = SERVING_SPEC_PATH[field];
    return isChangeKey(key) ? [[key, written]] : [];
  }),
);

/**
 * Fields a checkpoint config cannot state: they are serving settings, set in the policy. A
 * quantized checkpoint is another checkpoint: for this one, the policy states the format it is
 * served in.
 */
export const SERVING_ONLY: ReadonlySet<ChangeKey> = new Set(POLICY_SERVING_KEYS.keys());

/** A JSON value as published configs write it: factors and bases as floats (`4.0`), spans and counts as integers. */
export function jsonValue(field: ChangeKey, value: ChangeValue): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if ((field === 'position.scaling.factor' || field === 'position.base') && Number.isInteger(value))
    return `${value}.0`;
  return String(value);
}

/** A YAML scalar: names and numbers as plain scalars. */
export function yamlValue(value: ChangeValue): string {
  return typeof value === 'string' ? value : String(value);
}

function scalingPrefix(locations: LocationMap): string {
  for (const field of [
    'position.scaling',
    'position.scaling.factor',
    'position.scaling.originalSpan',
  ]) {
    const key = locations[field]?.key;
    if (key && key.includes('.')) return key.slice(0, key.lastIndexOf('.'));
  }
  return 'rope_scaling';
}

/** The dotted root of the own format's model block (`model.`), from any key the reader located there. */
function ownRoot(locations: LocationMap): string {
  const key = locations.layers?.key ?? locations.hidden?.key ?? 'model.layers';
  return key.slice(0, key.length - key.split('.').pop()!.length);
}

/** True when the location was written in the model file itself (not a policy or a flag). */
function inFile(locations: LocationMap, field: string): boolean {
  const loc = locations[field];
  return loc !== undefined && loc.line !== null;
}

function keyFor(dialect: Dialect, locations: LocationMap, field: ChangeKey): string {
  const stated =
    field === 'position.scaling.kind' ? locations['position.scaling'] : locations[field];
  if (stated && stated.line !== null) return stated.key;
  if (dialect === 'checkpoint') {
    if (field.startsWith('position.scaling.'))
      return `${scalingPrefix(locations)}.${CHECKPOINT_KEYS[field]}`;
    return CHECKPOINT_KEYS[field] ?? field;
  }
  return `${ownRoot(locations)}${OWN_KEYS[field] ?? field}`;
}

function jsonSnippet(edits: KeyEdit[], spec: ModelSpec): string {
  const lines: string[] = [];
  const blocks = new Map<string, KeyEdit[]>();
  for (const edit of edits) {
    const parts = edit.key.split('.');
    if (edit.line !== null || parts.length === 1) {
      lines.push(`"${parts[parts.length - 1]}": ${jsonValue(edit.field, edit.value)}`);
    } else {
      const block = parts.slice(0, -1).join('.');
      blocks.set(block, [...(blocks.get(block) ?? []), edit]);
    }
  }
  for (const [block, inner] of blocks) {
    // A new scaling block names its kind first, as published configs do.
    const ordered = [...inner].sort((a, b) =>
      a.field === 'position.scaling.kind' ? -1 : b.field === 'position.scaling.kind' ? 1 : 0,
    );
    const body = ordered
      .map((e) => `"${e.key.split('.').pop()}": ${jsonValue(e.field, e.value)}`)
      .join(', ');
    lines.push(`"${block.split('.').pop()}": {${body}}`);
  }
  void spec;
  return lines.join(',\n');
}

function yamlSnippet(edits: KeyEdit[]): string {
  const lines: string[] = [];
  const opened: string[] = [];
  for (const edit of edits) {
    if (edit.line !== null) {
      lines.push(`${edit.key.split('.').pop()}: ${yamlValue(edit.value)}`);
      continue;
    }
    const parts = edit.key.split('.');
    // Open the parent mappings this key needs that the previous new key did not open.
    let depth = 0;
    while (depth < parts.length - 1 && opened[depth] === parts[depth]) depth += 1;
    opened.length = depth;
    for (let i = depth; i < parts.length - 1; i++) {
      lines.push(`${'  '.repeat(i)}${parts[i]}:`);
      opened.push(parts[i]!);
    }
    lines.push(
      `${'  '.repeat(parts.length - 1)}${parts[parts.length - 1]}: ${yamlValue(edit.value)}`,
    );
  }
  return lines.join('\n');
}

/**
 * The change as edits of the model file and, for serving values a checkpoint config cannot hold
 * or that the policy set, of the policy's serving block: one patch per file touched.
 */
export function filePatches(
  change: Change,
  dialect: Dialect,
  spec: ModelSpec,
  locations: LocationMap,
  path: string,
): FilePatch[] {
  const model: KeyEdit[] = [];
  const policy: KeyEdit[] = [];
  let policyWhere = 'the policy';
  for (const [field, value] of changeEntries(change)) {
    const loc = locations[field];
    const fromPolicy = loc !== undefined && loc.line === null && !inFile(locations, field);
    if ((dialect === 'checkpoint' && SERVING_ONLY.has(field)) || fromPolicy) {
      if (loc?.key) policyWhere = loc.key.replace(/ serving$/, '');
      policy.push({
        field,
        key: `serving.${POLICY_SERVING_KEYS.get(field) ?? field}`,
        value,
        line: null,
      });
      continue;
    }
    model.push({
      field,
      key: keyFor(dialect, locations, field),
      value,
      line: (field === 'position.scaling.kind' ? locations['position.scaling'] : loc)?.line ?? null,
    });
  }
  const patches: FilePatch[] = [];
  if (model.length > 0) {
    const format =
      dialect === 'checkpoint' || path.toLowerCase().endsWith('.json') ? 'json' : 'yaml';
    patches.push({
      target: 'model',
      where: path,
      format,
      edits: model,
      snippet: format === 'json' ? jsonSnippet(model, spec) : yamlSnippet(model),
    });
  }
  if (policy.length > 0) {
    patches.push({
      target: 'policy',
      where: policyWhere,
      format: 'yaml',
      edits: policy,
      snippet: yamlSnippet(policy),
    });
  }
  return patches;
}
