/**
 * What a policy says for one model config: matching globs, and the top level with every
 * matching override laid over it.
 */
import picomatch from 'picomatch';
import type { Limit } from './judging.js';
import { METRIC_PATHS } from '../metrics/metric-path.js';
import type { Severity, SourceLocation } from '../model.js';
import type { FilePolicy, LimitSetting, Policy, PolicyOverride, RuleLevel } from './types.js';
import { nullRecord } from '../null-record.js';

type Matcher = (path: string) => boolean;

/**
 * Options of every glob: dotfiles match, and no extglobs (`+(a|b)` nests quantifiers, which
 * backtrack without bound in a regular expression); `!` at the start still negates.
 */
export const GLOB_OPTIONS = { dot: true, noextglob: true } as const;
/** Stars in one segment of a policy glob (default: `3`): k stars cost up to n^k steps on a name of n characters. */
export const MAX_GLOB_STARS = 3;
/** Longest policy glob, in characters (default: `1024`). */
export const MAX_GLOB_LENGTH = 1024;
/** Longest path matched (default: `4096`, Linux's PATH_MAX); a longer one fails the run closed. */
export const MAX_MATCH_PATH = 4096;
/**
 * Longest path segment matched (default: `255`, the longest file name ext4, APFS and NTFS hold):
 * with at most 3 stars a segment costs at most about 255^3 / 6 steps. A longer one fails closed.
 */
export const MAX_MATCH_SEGMENT = 255;
const matchers = new WeakMap<readonly string[], Matcher>();

/** One compiled matcher per glob list; policies are parsed once and asked about many paths. */
function matcherFor(globs: readonly string[]): Matcher {
  let matcher = matchers.get(globs);
  if (!matcher) {
    matcher = globs.length === 0 ? () => false : picomatch([...globs], GLOB_OPTIONS);
    matchers.set(globs, matcher);
  }
  return matcher;
}

/**
 * Repository paths as globs see them: forward slashes, no leading `./`, and line breaks (legal in
 * git paths) as a character glob wildcards match, since picomatch's patterns stop at them and a
 * model config with a line break in its name would otherwise never be judged.
 */
function normalise(path: string): string {
  if (path.length > MAX_MATCH_PATH) {
    throw new Error(
      `${path.slice(0, 80)}… is ${path.length} characters long, longer than ${MAX_MATCH_PATH} characters; the policy's globs are not matched against it, so the change cannot be judged`,
    );
  }
  const long = path.split('/').find((segment) => segment.length > MAX_MATCH_SEGMENT);
  if (long !== undefined) {
    throw new Error(
      `${path.slice(0, 80)}… has a name of ${long.length} characters, longer than ${MAX_MATCH_SEGMENT}; the policy's globs are not matched against it, so the change cannot be judged`,
    );
  }
  return path
    .replace(/\\/g, '/')
    .replace(/^(\.\/)+/, '')
    .replace(/[\n\r\u2028\u2029]/g, '\u001f');
}

/** Whether the policy's `files` globs pick `path` and its `exclude` globs leave it in. */
export function isModelConfig(policy: Policy, path: string): boolean {
  const file = normalise(path);
  if (file === '') return false;
  return matcherFor(policy.files)(file) && !matcherFor(policy.exclude)(file);
}

/** The overrides whose globs match `path`, in file order. */
export function matchingOverrides(policy: Policy, path: string): PolicyOverride[] {
  const file = normalise(path);
  return policy.overrides.filter((override) => matcherFor(override.files)(file));
}

interface LimitState extends LimitSetting {
  origin: SourceLocation | null;
}

/** The policy for one config: serving defaults, limits and rule levels after the overrides. */
export function resolvePolicy(policy: Policy, filePath: string): FilePolicy {
  const file = normalise(filePath);
  const serving: Record<string, unknown> = {};
  const rules: Record<string, RuleLevel> = nullRecord();
  const limits = new Map<string, LimitState>();
  const origins: Record<string, SourceLocation> = nullRecord();
  const where = (name: string): SourceLocation =>
    policy.locations[name] ?? { key: name, line: null };

  const layer = (
    block: Pick<PolicyOverride, 'serving' | 'limits' | 'rules'>,
    prefix: string,
  ): void => {
    for (const [field, value] of Object.entries(block.serving)) {
      if (value === undefined) continue;
      serving[field] = value;
      origins[`serving.${field}`] = where(`${prefix}serving.${field}`);
    }
    for (const [metric, setting] of Object.entries(block.limits)) {
      const origin = where(`${prefix}limits.${metric}`);
      origins[`limits.${metric}`] = origin;
      if (setting === null) {
        limits.delete(metric);
        continue;
      }
      // Key by key: an override can change a severity and keep the bound set above it.
      const state: LimitState = { ...(limits.get(metric) ?? {}), origin };
      if (setting.max !== undefined) state.max = setting.max;
      if (setting.min !== undefined) state.min = setting.min;
      if (setting.maxIncreasePct !== undefined) state.maxIncreasePct = setting.maxIncreasePct;
      if (setting.severity !== undefined) state.severity = setting.severity;
      limits.set(metric, state);
    }
    for (const [id, level] of Object.entries(block.rules)) {
      rules[id] = level;
      origins[`rules.${id}`] = where(`${prefix}rules.${id}`);
    }
  };

  layer(policy, '');
  policy.overrides.forEach((override, index) => {
    if (matcherFor(override.files)(file)) layer(override, `overrides[${index}].`);
  });

  const resolved: Record<string, Limit> = nullRecord();
  // Contract order, so reports list limits the same way every time.
  for (const metric of METRIC_PATHS) {
    const state = limits.get(metric);
    if (!state) continue;
    const limit: Limit = { severity: state.severity ?? 'block' };
    if (typeof state.max === 'number') limit.max = state.max;
    if (typeof state.min === 'number') limit.min = state.min;
    if (typeof state.maxIncreasePct === 'number') limit.maxIncreasePct = state.maxIncreasePct;
    if (limit.max !== undefined || limit.min !== undefined || limit.maxIncreasePct !== undefined)
      resolved[metric] = limit;
  }
  return {
    limits: resolved,
    rules,
    standing: policy.standing,
    serving: serving,
    waiverLabel: policy.waiverLabel,
    origins,
  };
}

/** The level a rule runs at for one config: the policy's choice, else the rule's own severity. */
export function ruleLevel(
  filePolicy: Pick<FilePolicy, 'rules'>,
  ruleId: string,
  ownSeverity: Severity,
): RuleLevel {
  return Object.prototype.hasOwnProperty.call(filePolicy.rules, ruleId)
    ? (filePolicy.rules[ruleId] ?? ownSeverity)
    : ownSeverity;
}
