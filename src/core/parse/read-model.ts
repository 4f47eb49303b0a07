/**
 * Reads one model file, in either dialect, into the one `ModelSpec`: text → parsed document →
 * the `--at` block → dialect → draft → defaults. Anything that makes the file unreadable throws
 * `ReadError`; everything about single values is a finding, so one run lists all of them.
 */
import type { Dialect, Finding, LocationMap, ModelSpec } from '../model.js';
import { isCheckpointConfig, readCheckpoint } from './checkpoint-dialect.js';
import { NotAModelError, ReadError } from './errors.js';
import { FieldReader } from './fields.js';
import { PointerError, formatPointer, resolvePointer } from './json-pointer.js';
import { MODEL_FORMAT, MODEL_FORMAT_FAMILY, readOwnDialect } from './own-dialect.js';
import { kindOf, quoteValue, truncate } from './quote.js';
import type { PathSegment } from './quote.js';
import { completeSpec } from './spec-defaults.js';
import { familyOf } from './checkpoint-families.js';
import {
  TOWER_KEY,
  isLanguageModelBlock,
  nestedModelKey,
  readVisionTower,
} from './nested-model.js';
import { reportUnreadKeys } from './unread-keys.js';
import { RULES } from '../rules/catalog.js';
import { parseSource } from './source.js';
import type { SourceDocument, SourceMapping, SourceValue } from './source.js';
import { elementAt } from '../element-at.js';

export interface ModelRead {
  dialect: Dialect;
  spec: ModelSpec;
  /** Spec field path (`layers`, `position.scaling.factor`, `serving.span`, …) to the key it was read from. */
  locations: LocationMap;
  /** Problems with single values, found while reading (the spec rules are separate: `specFindings`). */
  findings: Finding[];
}

export interface ReadModelOptions {
  /** JSON pointer (RFC 6901) to the model block inside a larger document (default: the whole document). */
  at?: string;
}

function isMapping(v: SourceValue | undefined): v is SourceMapping {
  return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}

/** Which dialect `value` is written in (any `context-reach-model/` version counts as the own one), or null when it is not a model description. */
export function detectDialect(value: SourceMapping): Dialect | null {
  const format = value.format;
  if (typeof format === 'string' && format.startsWith(MODEL_FORMAT_FAMILY)) return 'context-reach';
  if (isCheckpointConfig(value)) return 'checkpoint';
  return null;
}

/**
 * Reads the model description in `text` (JSON or YAML) from file `path`.
 * Throws `ReadError` naming the file and line when the text cannot be read as a model at all.
 */
export function readModel(text: string, path: string, options: ReadModelOptions = {}): ModelRead {
  const doc = parseSource(text, path);
  let { root, prefix } = selectBlock(doc, path, options.at);

  const format = root.format;
  if (
    typeof format === 'string' &&
    format.startsWith(MODEL_FORMAT_FAMILY) &&
    format !== MODEL_FORMAT
  ) {
    const formatPath = [...prefix, 'format'];
    throw new ReadError(
      path,
      doc.lineOf(formatPath),
      `format ${quoteValue(format)} is not supported; this version reads ${MODEL_FORMAT}`,
      'format',
    );
  }
  let dialect = detectDialect(root);
  // A multimodal file: the language model is nested (text_config, language_config, …), never the vision tower.
  let parent: { value: SourceMapping; prefix: PathSegment[] } = { value: root, prefix };
  if (dialect === null || (dialect === 'checkpoint' && wrapsNestedModel(root))) {
    const nested = nestedModelKey(root);
    if (nested !== null) {
      parent = { value: root, prefix };
      root = root[nested] as SourceMapping;
      prefix = [...prefix, nested];
      dialect = 'checkpoint';
    }
  } else if (dialect === 'checkpoint' && prefix.length > 0) {
    // Read with --at: the block's parent holds the vision tower.
    const up = prefix.slice(0, -1);
    const holder = up.reduce<SourceValue | undefined>(
      (v, k) => (isMapping(v ?? null) ? (v as SourceMapping)[k as string] : undefined),
      doc.value,
    );
    if (isMapping(holder) && !isMapping(root.vision_config)) parent = { value: holder, prefix: up };
  }
  if (dialect === null) throw notAModel(doc, root, prefix, path);

  const reader = new FieldReader(doc, root, prefix, dialect === 'checkpoint');
  const draft = dialect === 'context-reach' ? readOwnDialect(reader) : readCheckpoint(reader);
  const findings = reader.findings;
  if (dialect === 'checkpoint') {
    reportUnreadKeys(reader);
    defaultsTaken(reader);
    const vision = readVisionTower(doc, parent.value, parent.prefix, draft.hidden);
    findings.push(...vision.findings);
    if (vision.tower !== null) draft.vision = vision.tower;
  }
  return { dialect, spec: completeSpec(draft), locations: reader.locations, findings };
}

/**
 * Whether a mapping with checkpoint keys of its own is a wrapper around a nested language model:
 * it holds one (`nestedModelKey`) but does not state a layer count and a head count itself
 * (PaliGemma-style files repeat the text model's `hidden_size`, and sometimes its layer count, at
 * the top level; the model is the nested block). A top level that states both is read as the model.
 */
function wrapsNestedModel(root: SourceMapping): boolean {
  if (nestedModelKey(root) === null) return false;
  const states = (keys: string[]) =>
    keys.some((k) => Object.prototype.hasOwnProperty.call(root, k) && root[k] !== null);
  return !(
    states(['num_hidden_layers', 'n_layer', 'num_layers', 'n_layers']) &&
    states(['num_attention_heads', 'n_head', 'num_heads', 'n_heads'])
  );
}

/** One `family-default-taken` finding listing every default a sparse config relied on. */
function defaultsTaken(r: FieldReader): void {
  if (r.defaultsUsed.length === 0) return;
  const modelType = r.get(['model_type']);
  const type = typeof modelType === 'string' ? modelType.toLowerCase() : '';
  const family = familyOf(type)?.published;
  if (family === undefined) return;
  const values = r.defaultsUsed.map((k) => `${k} ${JSON.stringify(family.values[k])}`).join(', ');
  const at = ['model_type'];
  r.findings.push({
    rule: 'family-default-taken',
    severity: RULES['family-default-taken'].severity,
    message: `${r.key(at)} "${type}": ${r.defaultsUsed.length === 1 ? 'a key is' : `${r.defaultsUsed.length} keys are`} not stated, so the family's published defaults are taken (${family.source}): ${values}; state ${r.defaultsUsed.length === 1 ? 'it' : 'them'} if the model differs`,
    key: r.key(at),
    line: r.line(at),
  });
}

function selectBlock(
  doc: SourceDocument,
  file: string,
  at: string | undefined,
): { root: SourceMapping; prefix: PathSegment[] } {
  if (at === undefined || at === '') return { root: doc.value, prefix: [] };
  let selected: { value: unknown; path: PathSegment[] };
  try {
    selected = resolvePointer(doc.value, at);
  } catch (error) {
    if (!(error instanceof PointerError)) throw error;
    const line = error.resolvedPath.length === 0 ? null : doc.lineOf(error.resolvedPath);
    throw new ReadError(file, line, `--at ${error.message}`);
  }
  if (!isMapping(selected.value as SourceValue)) {
    throw new ReadError(
      file,
      doc.lineOf(selected.path),
      `--at ${JSON.stringify(at)} selects ${kindOf(selected.value)}; expected a mapping holding a model`,
    );
  }
  return { root: selected.value as SourceMapping, prefix: selected.path };
}

function notAModel(
  doc: SourceDocument,
  root: SourceMapping,
  prefix: PathSegment[],
  file: string,
): NotAModelError {
  const where =
    prefix.length === 0
      ? 'at the top level'
      : `under ${JSON.stringify(formatPointer(prefix.map(String)))}`;
  const line =
    prefix.length === 0
      ? Object.keys(root).length > 0
        ? doc.lineOf([elementAt(Object.keys(root), 0)])
        : null
      : doc.lineOf(prefix);
  // A model nested one level down (multimodal configs keep it under text_config) is worth naming.
  const nested = Object.keys(root).find(
    (k) =>
      !TOWER_KEY.test(k) &&
      isMapping(root[k]) &&
      (detectDialect(root[k]) !== null || isLanguageModelBlock(root[k])),
  );
  const hint =
    nested === undefined
      ? ''
      : `; ${truncate(nested)} (line ${doc.lineOf([...prefix, nested]) ?? '?'}) holds one: read it with --at ${formatPointer([...prefix.map(String), nested])}`;
  return new NotAModelError(
    file,
    line,
    `not a model config: expected "format: ${MODEL_FORMAT}" or checkpoint keys such as hidden_size and num_hidden_layers ${where}${hint}`,
  );
}
