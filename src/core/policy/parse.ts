/**
 * Reading the policy file: YAML text to a checked `Policy`, or a `PolicyError` naming the file,
 * key and line of every problem. The gate fails closed on the error, so nothing here guesses.
 */
import picomatch from 'picomatch';
import { isScalar, visit } from 'yaml';
import type { Document, LineCounter } from 'yaml';
import type { ErrorObject } from 'ajv';
import type { ServingPatch, SourceLocation } from '../model.js';
import { DEFAULT_EXCLUDE, DEFAULT_FILES, MAX_POLICY_CHARS } from './defaults.js';
import { GLOB_OPTIONS, MAX_GLOB_LENGTH, MAX_GLOB_STARS } from './resolve.js';
import { formatKeyPath, lineOf, nodeAt } from './locate.js';
import type { KeyPath } from './locate.js';
import { nearestName } from '../parse/nearest.js';
import { literalNumber, quoteText } from '../parse/quote.js';
import {
  MAX_ALIASES,
  MAX_ENTRIES,
  MAX_TOKENS,
  YamlLimitError,
  composeYaml,
} from '../parse/yaml.js';
import { validatePolicyValue } from './schema.js';
import type {
  LimitSetting,
  LimitTable,
  Policy,
  PolicyOverride,
  PolicyProblem,
  PolicyServingBlock,
  RuleLevel,
  RuleTable,
  Standing,
} from './types.js';
import { elementAt } from '../element-at.js';
import { nullRecord } from '../null-record.js';

/** Problems listed in one error at most; the rest are counted. */
const MAX_PROBLEMS = 20;

/** Offset of the document's first alias and the top-level key that holds it, or null without aliases. */
function firstAlias(doc: Document): { offset: number; key: string | null } | null {
  let found: { offset: number; key: string | null } | null = null;
  visit(doc, {
    Alias(_, node, path) {
      const top = path.find(
        (step) => step !== doc && (step as { key?: unknown }).key !== undefined,
      ) as { key?: unknown } | undefined;
      found = {
        offset: node.range?.[0] ?? 0,
        key: isScalar(top?.key) ? String(top.key.value) : null,
      };
      return visit.BREAK;
    },
  });
  return found;
}

function formatProblem(problem: PolicyProblem): string {
  const where = problem.line === null ? problem.file : `${problem.file}:${problem.line}`;
  return problem.key === null
    ? `${where}: ${problem.message}`
    : `${where}: ${problem.key}: ${problem.message}`;
}

/** A policy file the gate cannot use. `file`, `line`, `key` describe the first problem. */
export class PolicyError extends Error {
  readonly file: string;
  readonly line: number | null;
  readonly key: string | null;
  readonly problems: readonly PolicyProblem[];

  constructor(problems: readonly PolicyProblem[]) {
    const first = elementAt(problems, 0);
    const more =
      problems.length > 1
        ? ` (and ${problems.length - 1} more: ${problems.slice(1).map(formatProblem).join('; ')})`
        : '';
    super(`${formatProblem(first)}${more}`);
    this.name = 'PolicyError';
    this.file = first.file;
    this.line = first.line;
    this.key = first.key;
    this.problems = problems;
  }
}

/** A value of the policy quoted for a message: text as the model reader quotes it, collections named. */
function quote(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'a mapping';
  if (typeof value === 'number') return literalNumber(value);
  return typeof value === 'string' ? quoteText(value) : (JSON.stringify(value) ?? 'nothing');
}

const TYPE_WORDS: Record<string, string> = {
  integer: 'a whole number',
  number: 'a finite number',
  string: 'a string',
  array: 'a list',
  object: 'a mapping',
  boolean: 'true or false',
  null: 'null',
};

function typeWords(type: unknown): string {
  const names = Array.isArray(type) ? type : String(type).split(',');
  return names.map((name) => TYPE_WORDS[String(name)] ?? String(name)).join(' or ');
}

const COMPARISON_WORDS: Record<string, string> = {
  '>=': 'at least',
  '>': 'above',
  '<=': 'at most',
  '<': 'below',
};

/** Instance path of an ajv error as key segments; digits index lists. */
function segments(instancePath: string, data: unknown): (string | number)[] {
  const parts =
    instancePath === ''
      ? []
      : instancePath
          .slice(1)
          .split('/')
          .map((part) => part.replace(/~1/g, '/').replace(/~0/g, '~'));
  const path: (string | number)[] = [];
  let cursor: unknown = data;
  for (const part of parts) {
    if (Array.isArray(cursor)) {
      path.push(Number(part));
      cursor = cursor[Number(part)];
    } else {
      path.push(part);
      cursor =
        cursor !== null && typeof cursor === 'object'
          ? (cursor as Record<string, unknown>)[part]
          : undefined;
    }
  }
  return path;
}

function unknownKeyMessage(
  parentKey: string | number | undefined,
  name: string,
  allowed: string[],
): string {
  const nearest = nearestName(name, allowed);
  const hint = nearest === null ? '' : `; did you mean "${nearest}"?`;
  if (parentKey === 'limits') {
    return `unknown metric ${quote(name)}: limits are keyed by metric names exactly as in the metric contract (docs/metrics.md of context-reach)${hint}`;
  }
  if (parentKey === 'rules')
    return `unknown rule id ${quote(name)}: expected a rule id of context-reach${hint}`;
  return `unknown key ${quote(name)}: expected one of ${allowed.join(', ')}${hint}`;
}

function schemaProblem(
  error: ErrorObject,
  file: string,
  doc: Document,
  lines: LineCounter,
  data: unknown,
): PolicyProblem {
  const path = segments(error.instancePath, data);
  const located = nodeAt(doc, path);
  const valueLine =
    lineOf(lines, located.value) ?? lineOf(lines, located.key) ?? lineOf(lines, located.nearest);
  const value = error.data;
  const params = error.params as Record<string, unknown>;
  const base = { file, key: path.length === 0 ? null : formatKeyPath(path), line: valueLine };
  switch (error.keyword) {
    case 'additionalProperties': {
      const name = String(params.additionalProperty);
      const keyPath = [...path, name];
      const at = nodeAt(doc, keyPath);
      const allowed = Object.keys(
        (error.parentSchema?.properties as Record<string, unknown> | undefined) ?? {},
      ).filter((key) => key !== '$schema');
      return {
        file,
        key: formatKeyPath(keyPath),
        line: lineOf(lines, at.key) ?? valueLine,
        message: unknownKeyMessage(path[path.length - 1], name, allowed),
      };
    }
    case 'required':
      return {
        ...base,
        message: `has no ${quote(params.missingProperty)}; expected a list of globs naming the configs this entry applies to`,
      };
    case 'type':
      return { ...base, message: `is ${quote(value)}; expected ${typeWords(params.type)}` };
    case 'enum': {
      const allowed = (params.allowedValues as unknown[]).map(String);
      const nearest = typeof value === 'string' ? nearestName(value, allowed) : null;
      return {
        ...base,
        message: `is ${quote(value)}; expected one of ${allowed.join(', ')}${nearest === null ? '' : `; did you mean "${nearest}"?`}`,
      };
    }
    case 'minimum':
    case 'maximum':
    case 'exclusiveMinimum':
    case 'exclusiveMaximum':
      return {
        ...base,
        message: `is ${quote(value)}; expected a number ${COMPARISON_WORDS[String(params.comparison)]} ${String(params.limit)}`,
      };
    case 'minItems':
    case 'maxItems':
      return {
        ...base,
        message: `has ${(value as unknown[]).length} entries; expected ${error.keyword === 'minItems' ? 'at least' : 'at most'} ${String(params.limit)}`,
      };
    case 'minLength':
    case 'maxLength':
      return {
        ...base,
        message: `is ${quote(value)} (${String(value).length} characters); expected ${error.keyword === 'minLength' ? 'at least' : 'at most'} ${String(params.limit)} characters`,
      };
    case 'minProperties':
      return {
        ...base,
        message: `is empty; expected at least one of ${Object.keys((error.parentSchema?.properties as object | undefined) ?? {}).join(', ')}`,
      };
    case 'pattern':
      return {
        ...base,
        message: `is ${quote(value)}; expected a repository-relative glob without a leading "/" or "!" (list files to leave out under exclude)`,
      };
    default:
      return {
        ...base,
        message: `is ${quote(value)}; ${error.message ?? 'not allowed by the policy schema'}`,
      };
  }
}

/** The first line of a YAML parser message, without its own position suffix. */
function yamlMessage(
  code: string,
  message: string,
  text: string,
  offsets: [number, number],
): string {
  if (code === 'DUPLICATE_KEY') {
    const key =
      text
        .slice(elementAt(offsets, 0), elementAt(offsets, 0) + 200)
        .split(/[:\n]/)[0]
        ?.trim() ?? '';
    return `duplicate key ${quote(key)}; expected each key once per mapping`;
  }
  if (/call stack/i.test(message)) return 'nested too deeply; expected a policy a few levels deep';
  const first = (message.split('\n')[0] ?? '').replace(/ at line \d+, column \d+:?$/, '');
  return `not valid YAML: ${first}`;
}

/** Problems the schema cannot express: limits without a bound, min above max, unusable globs. */
function semanticProblems(
  data: Record<string, unknown>,
  file: string,
  doc: Document,
  lines: LineCounter,
): PolicyProblem[] {
  const problems: PolicyProblem[] = [];
  const at = (path: KeyPath, message: string): void => {
    const located = nodeAt(doc, path);
    problems.push({
      file,
      key: formatKeyPath(path),
      line: lineOf(lines, located.key) ?? lineOf(lines, located.value),
      message,
    });
  };
  const checkLimits = (limits: unknown, prefix: KeyPath, topLevel: boolean): void => {
    if (limits === null || typeof limits !== 'object') return;
    for (const [metric, limit] of Object.entries(limits as Record<string, unknown>)) {
      if (limit === null || typeof limit !== 'object') continue;
      const entry = limit as Record<string, unknown>;
      const bounds = ['max', 'min', 'max-increase-pct'].filter(
        (name) => typeof entry[name] === 'number',
      );
      if (topLevel && bounds.length === 0) {
        at(
          [...prefix, metric],
          'sets no bound; expected at least one of max, min, max-increase-pct',
        );
      }
      if (typeof entry.min === 'number' && typeof entry.max === 'number' && entry.min > entry.max) {
        at(
          [...prefix, metric, 'min'],
          `is ${quote(entry.min)}, above max ${quote(entry.max)}; expected min at most max`,
        );
      }
    }
  };
  const checkGlobs = (globs: unknown, prefix: KeyPath): void => {
    if (!Array.isArray(globs)) return;
    globs.forEach((glob, index) => {
      if (typeof glob !== 'string') return;
      let reason: string | null = null;
      try {
        const crowded = glob
          .split('/')
          .find(
            (segment) => segment !== '**' && (segment.match(/\*/g) ?? []).length > MAX_GLOB_STARS,
          );
        if (glob.length > MAX_GLOB_LENGTH)
          reason = `it is ${glob.length} characters long; at most ${MAX_GLOB_LENGTH}`;
        // Stars in one segment backtrack against each other: k of them cost up to n^k steps on a name of n characters.
        else if (crowded !== undefined)
          reason = `its segment ${quote(crowded)} has more stars than matching can afford; at most ${MAX_GLOB_STARS} stars per segment`;
        // picomatch turns a pattern it cannot read ("[z-a]", "{a,b") into one that matches nothing.
        else if (picomatch.makeRe(glob, GLOB_OPTIONS).source === '$^')
          reason = 'it can match no path';
      } catch (error) {
        reason = (error as Error).message;
      }
      if (reason !== null)
        at(
          [...prefix, index],
          `is ${quote(glob)}, not a usable glob (${reason}); expected a glob such as "models/**/config.json"`,
        );
    });
  };
  checkLimits(data.limits, ['limits'], true);
  checkGlobs(data.files, ['files']);
  checkGlobs(data.exclude, ['exclude']);
  if (Array.isArray(data.overrides)) {
    data.overrides.forEach((override: unknown, index) => {
      if (override === null || typeof override !== 'object') return;
      const entry = override as Record<string, unknown>;
      checkLimits(entry.limits, ['overrides', index, 'limits'], false);
      checkGlobs(entry.files, ['overrides', index, 'files']);
    });
  }
  return problems;
}

/** The policy's `serving` keys as written (kebab-case), each with the serving-patch field it sets. */
export const SERVING_FIELDS: ReadonlyArray<[keyof PolicyServingBlock, keyof ServingPatch]> = [
  ['span', 'span'],
  ['sequences', 'sequences'],
  ['device-memory-gib', 'deviceGiB'],
  ['reserve', 'reserve'],
  ['output-tokens', 'outputTokens'],
  ['prompt-tokens', 'promptTokens'],
  ['weights', 'weights'],
  ['cache', 'cache'],
  ['positions', 'positions'],
  ['trained-span', 'trainedSpan'],
  ['tensor-parallel', 'tensorParallel'],
  ['pipeline-parallel', 'pipelineParallel'],
  ['activation-reserve-gib', 'activationReserveGiB'],
  ['weight-group-size', 'weightGroupSize'],
];

/** The policy's `serving` block in spec terms (camelCase `ServingPatch`), keys it leaves out left out. */
export function servingPatchOf(block: PolicyServingBlock): ServingPatch {
  const patch: Record<string, unknown> = {};
  for (const [written, field] of SERVING_FIELDS) {
    if (block[written] !== undefined) patch[field] = block[written];
  }
  return patch;
}

function limitTable(
  limits: Record<string, Record<string, unknown> | null> | undefined,
): LimitTable {
  const table: Record<string, LimitSetting | null> = nullRecord();
  for (const [metric, entry] of Object.entries(limits ?? {})) {
    if (entry === null) {
      table[metric] = null;
      continue;
    }
    const setting: LimitSetting = {};
    if (entry.max !== undefined) setting.max = entry.max as number | null;
    if (entry.min !== undefined) setting.min = entry.min as number | null;
    if (entry['max-increase-pct'] !== undefined)
      setting.maxIncreasePct = entry['max-increase-pct'] as number | null;
    if (entry.severity !== undefined) setting.severity = entry.severity as LimitSetting['severity'];
    table[metric] = setting;
  }
  return table;
}

function ruleTable(rules: Record<string, RuleLevel> | undefined): RuleTable {
  const table: Record<string, RuleLevel> = nullRecord();
  for (const [id, level] of Object.entries(rules ?? {})) table[id] = level;
  return table;
}

interface Block {
  serving?: PolicyServingBlock;
  limits?: Record<string, Record<string, unknown> | null>;
  rules?: Record<string, RuleLevel>;
}

/** Where each setting of one block (top level or an override) was written. */
function recordLocations(
  locations: Record<string, SourceLocation>,
  block: Block,
  prefix: KeyPath,
  doc: Document,
  lines: LineCounter,
): void {
  const record = (name: string, path: KeyPath): void => {
    const located = nodeAt(doc, path);
    locations[name] = {
      key: formatKeyPath(path),
      line: lineOf(lines, located.key) ?? lineOf(lines, located.value),
    };
  };
  const lead = formatKeyPath(prefix);
  const named = (rest: string): string => (lead === '' ? rest : `${lead}.${rest}`);
  for (const [written, field] of SERVING_FIELDS) {
    if (block.serving?.[written] !== undefined)
      record(named(`serving.${field}`), [...prefix, 'serving', written]);
  }
  for (const metric of Object.keys(block.limits ?? {}))
    record(named(`limits.${metric}`), [...prefix, 'limits', metric]);
  for (const id of Object.keys(block.rules ?? {}))
    record(named(`rules.${id}`), [...prefix, 'rules', id]);
}

/** What a policy past one of the YAML pipeline's bounds is told. */
function limitMessage(error: YamlLimitError): string {
  switch (error.limit) {
    case 'nesting':
      return 'nested too deeply; expected a policy a few levels deep';
    case 'documents':
      return 'not valid YAML: holds more than one YAML document; a policy holds one';
    case 'tokens':
      return `cannot be read as YAML: holds more than ${MAX_TOKENS} syntax tokens; a policy is a short file`;
    case 'entries':
      return `cannot be read as YAML: holds more than ${MAX_ENTRIES} keys and list items; a policy is a short file`;
  }
}

/**
 * Parses and checks a policy file (YAML; JSON is YAML too). Pure: the caller reads the file.
 * Throws `PolicyError` listing every problem with file, key and line.
 */
export function parsePolicy(text: string, path: string): Policy {
  const fail = (problems: PolicyProblem[]): never => {
    throw new PolicyError(problems.slice(0, MAX_PROBLEMS));
  };
  if (text.length > MAX_POLICY_CHARS) {
    fail([
      {
        file: path,
        line: null,
        key: null,
        message: `is ${text.length} characters long; expected at most ${MAX_POLICY_CHARS} (a policy is a short file)`,
      },
    ]);
  }
  let lines: LineCounter;
  let doc: Document;
  let data: unknown;
  try {
    // The project's one YAML pipeline, with its bounds; aliases within MAX_ALIASES (toJS below).
    try {
      ({ doc, lineCounter: lines } = composeYaml(text, { uniqueKeys: true }));
    } catch (error) {
      if (error instanceof YamlLimitError) {
        return fail([{ file: path, line: error.line, key: null, message: limitMessage(error) }]);
      }
      throw error;
    }
    if (doc.errors.length > 0) {
      const seen = new Set<string>();
      fail(
        doc.errors
          .map((error) => ({
            file: path,
            line: lines.linePos(error.pos[0]).line,
            key: null,
            message: yamlMessage(error.code, error.message, text, error.pos),
          }))
          .filter((problem) => !seen.has(problem.message) && seen.add(problem.message)),
      );
    }
    data = doc.toJS({ maxAliasCount: MAX_ALIASES });
  } catch (error) {
    if (error instanceof PolicyError) throw error;
    // toJS refuses alias bombs with a ReferenceError; absurd nesting overflows the stack.
    const reason = error instanceof RangeError ? 'nested too deeply' : (error as Error).message;
    // An alias bomb is named where its aliases start: the first alias and the key that holds it.
    const alias = /alias/i.test(reason) ? firstAlias(doc!) : null;
    return fail([
      {
        file: path,
        line: alias ? lines!.linePos(alias.offset).line : null,
        key: alias?.key ?? null,
        message: `cannot be read as YAML: ${reason}${alias ? ` (expanding aliases from here; at most ${MAX_ALIASES} are followed)` : ''}`,
      },
    ]);
  }
  // An empty file (or one of comments only) is a policy that sets nothing.
  if (data === null || data === undefined) data = {};
  if (typeof data !== 'object' || Array.isArray(data)) {
    fail([
      {
        file: path,
        line: 1,
        key: null,
        message: `is ${quote(data)}; expected a mapping of policy keys (files, exclude, serving, limits, rules, overrides, standing, waiver-label)`,
      },
    ]);
  }
  const allErrors = validatePolicyValue(data);
  // An enum says more than the type check beside it ("expected one of …"): keep only the enum.
  const enumPaths = new Set(
    allErrors.filter((error) => error.keyword === 'enum').map((error) => error.instancePath),
  );
  const schemaErrors = allErrors.filter(
    (error) => !(error.keyword === 'type' && enumPaths.has(error.instancePath)),
  );
  if (schemaErrors.length > 0) {
    const problems = schemaErrors.map((error) => schemaProblem(error, path, doc, lines, data));
    const seen = new Set<string>();
    fail(
      problems
        .filter((problem) => {
          const id = `${problem.key}\u0000${problem.message}`;
          if (seen.has(id)) return false;
          seen.add(id);
          return true;
        })
        .sort((a, b) => (a.line ?? Infinity) - (b.line ?? Infinity)),
    );
  }
  const record = data as Record<string, unknown>;
  const semantic = semanticProblems(record, path, doc, lines);
  if (semantic.length > 0)
    fail(semantic.sort((a, b) => (a.line ?? Infinity) - (b.line ?? Infinity)));

  const checked = record as Block & {
    files?: string[];
    exclude?: string[];
    overrides?: (Block & { files: string[] })[];
    standing?: Standing;
    'waiver-label'?: string;
  };
  const locations: Record<string, SourceLocation> = nullRecord();
  for (const key of ['files', 'exclude', 'standing', 'waiver-label']) {
    if (checked[key as keyof typeof checked] !== undefined) {
      const located = nodeAt(doc, [key]);
      locations[key] = { key, line: lineOf(lines, located.key) };
    }
  }
  recordLocations(locations, checked, [], doc, lines);
  const overrides: PolicyOverride[] = (checked.overrides ?? []).map((override, index) => {
    const located = nodeAt(doc, ['overrides', index]);
    locations[`overrides[${index}]`] = {
      key: `overrides[${index}]`,
      line: lineOf(lines, located.value),
    };
    recordLocations(locations, override, ['overrides', index], doc, lines);
    return {
      files: [...override.files],
      serving: servingPatchOf(override.serving ?? {}),
      limits: limitTable(override.limits),
      rules: ruleTable(override.rules),
    };
  });
  return {
    path,
    files: checked.files ? [...checked.files] : DEFAULT_FILES,
    exclude: checked.exclude ? [...checked.exclude] : DEFAULT_EXCLUDE,
    serving: servingPatchOf(checked.serving ?? {}),
    limits: limitTable(checked.limits),
    rules: ruleTable(checked.rules),
    overrides,
    standing: checked.standing ?? 'report',
    waiverLabel: checked['waiver-label'] ?? null,
    locations,
  };
}
