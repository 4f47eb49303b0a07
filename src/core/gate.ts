import type { ChangedFile } from './changes.js';
import { decide, type ChangedConfig, type GateReport } from './compare/decide.js';
import type { Judging } from './compare/judging.js';
import { inspectModel, toFailure, type FileFailure, type FileReport } from './inspect.js';
import type { ServingPatch } from './model.js';
import { decodeText } from './parse/source.js';
import { DEFAULT_POLICY, isModelConfig, parsePolicy, resolvePolicy, type Policy } from './policy/index.js';
import { attachRemedies } from './remedy/attach.js';
import { policyChanges } from './policy/diff.js';

/** Reads a file's bytes at a commit; null when the file does not exist there. */
export interface ContentSource {
  read(ref: string, path: string): Promise<Uint8Array | null>;
  /**
   * Many reads at once, answered in order with an `Error` where `read` would throw; a source that
   * batches (git: a few processes for all files) offers it, others are read file by file.
   */
  readMany?(requests: readonly ContentRequest[]): Promise<(Uint8Array | null | Error)[]>;
}

/** One file at one commit. */
export interface ContentRequest {
  ref: string;
  path: string;
}

/** Files whose versions are read together before they are measured: bounds the bytes held at once. */
const READ_WINDOW = 32;

export interface GateRequest {
  base: string;
  head: string;
  changes: ChangedFile[];
  /** Path of the policy file, read from the base commit. */
  policyPath: string;
  /** Commit the policy is read at (default: `base`): the base branch's tip when `base` is the merge base. */
  policyRef?: string;
  /** Labels on the pull request (default: none). */
  labels?: string[];
  /** Notices from gathering the changes (truncated lists, fork tokens). */
  notices?: string[];
  /** Serving overrides from the command line (default: none). */
  overrides?: ServingPatch;
  /** How many files are read at once from a source without `readMany` (default: 8). */
  concurrency?: number;
}

/** Thrown when the policy file on the base commit cannot be read: the gate fails closed. */
export class PolicyUnreadableError extends Error {}

/** The measured version of one file from its bytes (or the error reading them); null when absent. */
function inspectVersion(bytes: Uint8Array | null | Error, path: string, serving: ServingPatch,
  overrides: ServingPatch | undefined, policyPath: string): FileReport | FileFailure | null {
  if (bytes instanceof Error) return toFailure(path, bytes);
  if (bytes === null) return null;
  try {
    return inspectModel(decodeText(bytes, path), path, {
      defaults: serving, defaultsOrigin: { key: `${policyPath} serving`, line: null },
      overrides, overridesOrigin: { key: 'command line', line: null },
    });
  } catch (error) {
    return toFailure(path, error);
  }
}

/** Bytes of every request, in order: one batch when the source batches, else `concurrency` reads at a time. */
async function readAll(source: ContentSource, requests: ContentRequest[], concurrency: number): Promise<(Uint8Array | null | Error)[]> {
  const asError = (error: unknown): Error => (error instanceof Error ? error : new Error(String(error)));
  if (source.readMany) {
    try {
      return await source.readMany(requests);
    } catch (error) {
      return requests.map(() => asError(error));
    }
  }
  return mapLimited(requests, concurrency, (r) => source.read(r.ref, r.path).catch(asError));
}

async function mapLimited<T, R>(items: T[], limit: number, work: (item: T) => Promise<R>): Promise<R[]> {
  const results: R[] = new Array(items.length);
  let next = 0;
  const workers = Array.from({ length: Math.min(limit, items.length) }, async () => {
    while (next < items.length) {
      const index = next++;
      results[index] = await work(items[index]!);
    }
  });
  await Promise.all(workers);
  return results;
}

function sameBytes(a: Uint8Array | null, b: Uint8Array | null): boolean {
  if (a === null || b === null) return a === b;
  return a.length === b.length && a.every((byte, i) => byte === b[i]);
}

/** What the head's policy would change (old → new), or why it cannot be said; never throws. */
function headPolicyChanges(base: Policy, bytes: Uint8Array | null, path: string): string[] {
  if (bytes === null) return ['the policy file is deleted: built-in rules only after merge'];
  try {
    return policyChanges(base, parsePolicy(decodeText(bytes, path), path));
  } catch (error) {
    return [`the head's policy does not read: ${error instanceof Error ? error.message : String(error)}`];
  }
}

/**
 * The whole gate over a pull request: the policy from the base commit, the changed model
 * configs read at both commits, and one decision. Nothing from the pull request is executed;
 * files are read as data.
 */
export async function runGate(source: ContentSource, request: GateRequest): Promise<GateReport> {
  const { base, head, policyPath } = request;
  const basePolicyBytes = await source.read(request.policyRef ?? base, policyPath);
  let policy: Policy = DEFAULT_POLICY;
  if (basePolicyBytes !== null) {
    policy = parsePolicy(decodeText(basePolicyBytes, policyPath), policyPath);
  }
  const headPolicyBytes = request.changes.some((c) => c.path === policyPath || c.previousPath === policyPath)
    ? await source.read(head, policyPath)
    : basePolicyBytes;
  const policyChanged = !sameBytes(basePolicyBytes, headPolicyBytes);
  const limitChanges = policyChanged ? headPolicyChanges(policy, headPolicyBytes, policyPath) : [];

  const relevant = request.changes.filter((c) =>
    isModelConfig(policy, c.path) || (c.previousPath !== null && isModelConfig(policy, c.previousPath)));
  const deleted = relevant.filter((c) => c.status === 'deleted');
  const judged = relevant.filter((c) => c.status !== 'deleted');

  const configs: ChangedConfig[] = [];
  for (let start = 0; start < judged.length; start += READ_WINDOW) {
    const window = judged.slice(start, start + READ_WINDOW);
    // Head of every file, then base of every file not added.
    const requests: ContentRequest[] = [
      ...window.map((change) => ({ ref: head, path: change.path })),
      ...window.filter((change) => change.status !== 'added').map((change) => ({ ref: base, path: change.previousPath ?? change.path })),
    ];
    const answers = await readAll(source, requests, request.concurrency ?? 8);
    let nextBase = window.length;
    for (const [i, change] of window.entries()) {
      const filePolicy = resolvePolicy(policy, change.path);
      const judging: Judging = { limits: filePolicy.limits, rules: filePolicy.rules, standing: filePolicy.standing };
      const headVersion = inspectVersion(answers[i]!, change.path, filePolicy.serving, request.overrides, policyPath)
        ?? { path: change.path, line: null, message: `${change.path} is not a regular file at head (a symlink, a submodule or too large to read), so it was not judged` };
      let baseVersion: FileReport | FileFailure | null = null;
      let status = change.status;
      if (change.status !== 'added') {
        baseVersion = inspectVersion(answers[nextBase++]!, change.previousPath ?? change.path, filePolicy.serving, request.overrides, policyPath);
        // A base version that is not there (a 404, a shallow history) is an added file.
        if (baseVersion === null) status = 'added';
      }
      configs.push({ change: { ...change, status }, base: baseVersion, head: headVersion, judging });
    }
  }

  // `config.json` is a common name for things that are not models: when only the default globs
  // picked such a file, it is named in a notice instead of blocking.
  const notices = [...(request.notices ?? [])];
  const judgedConfigs = configs.filter((config) => {
    const head = config.head;
    const skip = policy.files === DEFAULT_POLICY.files && head !== null && 'notAModel' in head && head.notAModel === true;
    if (skip) notices.push(`${config.change.path} matched the default file globs but is not a model config; it was not judged (list your model files under \`files\` in the policy to judge exactly those).`);
    return !skip;
  });

  const labels = request.labels ?? [];
  const waiverLabel = policy.waiverLabel ?? null;
  // Every blocking finding gets its remedy here, proven against the same policy and base.
  return attachRemedies(decide({
    configs: judgedConfigs,
    deleted,
    policy: { source: basePolicyBytes === null ? 'built-in' : 'file', path: policyPath, changedInHead: policyChanged, ...(limitChanges.length > 0 ? { limitChanges } : {}) },
    waiver: { label: waiverLabel, applied: waiverLabel !== null && labels.includes(waiverLabel) },
    notices,
    base,
    head,
  }), judgedConfigs);
}
