import type { ChangedFile } from './changes.js';
import { decide, type ChangedConfig } from './compare/decide.js';
import type { Judging } from './policy/judging.js';
import { inspectModel, toFailure, type FileFailure, type FileReport } from './inspect.js';
import type { ServingPatch } from './model.js';
import { decodeText } from './parse/source.js';
import {
  DEFAULT_POLICY,
  isModelConfig,
  parsePolicy,
  resolvePolicy,
  type Policy,
} from './policy/index.js';
import { attachRemedies } from './remedy/attach.js';
import { createScanMemo, type ScanMemo } from './metrics/scan-memo.js';
import { pairMoves } from './pair-moves.js';
import { policyChanges } from './policy/diff.js';
import { type GateReport } from './report/types.js';

/** Reads a file's bytes at a commit; null when the file does not exist there. */
export interface ContentSource {
  read(ref: string, path: string): Promise<Uint8Array | null>;
  /**
   * Many reads at once, answered in order with an `Error` where `read` would throw; a source that
   * batches (git: a few processes for all files) offers it, others are read file by file.
   */
  readMany?(requests: readonly ContentRequest[]): Promise<(Uint8Array | null | Error)[]>;
  /**
   * Whether anything (a file, a symlink, a directory, a submodule) is at `path`: where `read` gives
   * null for a path that does exist, the policy there fails closed instead of counting as absent.
   */
  exists?(ref: string, path: string): Promise<boolean>;
}

/** One file at one commit. */
export interface ContentRequest {
  ref: string;
  path: string;
}

export interface GateRequest {
  base: string;
  head: string;
  changes: ChangedFile[];
  /** Path of the policy file, read from the base commit. */
  policyPath: string;
  /** Commit the policy is read at (default: `base`): the base branch's tip when `base` is the merge base. */
  policyRef?: string;
  /**
   * Labels on the pull request (default: none). May be a promise: the gate reads and measures
   * first and waits for the labels only to decide (the action asks GitHub for them meanwhile).
   */
  labels?: string[] | Promise<string[]>;
  /** Notices from gathering the changes (truncated lists, fork tokens). */
  notices?: string[];
  /** Serving overrides from the command line (default: none). */
  overrides?: ServingPatch;
  /** How many files are read at once from a source without `readMany` (default: 8). */
  concurrency?: number;
  /**
   * The run's memory of positional computations (default: a new one for this run): every file,
   * version and remedy proof asking the same computation shares one answer.
   */
  memo?: ScanMemo;
}

/**
 * Thrown when a file's base version exists but could not be read (the API kept failing, git
 * failed, it is too large): judging the head alone would drop every base-against-head rule, so
 * the gate fails closed and names the file and the reason.
 */
export class BaseUnreadableError extends Error {}

/**
 * Whether something that is not a regular file is at `path` in `ref`, for a base version that read
 * as absent (false where the source cannot tell). A failed look is a failed read of the base.
 */
async function existsAtBase(source: ContentSource, ref: string, path: string): Promise<boolean> {
  if (!source.exists) return false;
  try {
    return await source.exists(ref, path);
  } catch (error) {
    throw new BaseUnreadableError(
      `${path} could not be looked up at base ${ref}: ${error instanceof Error ? error.message : String(error)}. Its head cannot be judged against it, so the check fails until it can be read (re-run the job)`,
    );
  }
}

/** The measured version of one file from its bytes (or the error reading them); null when absent. */
function inspectVersion(
  bytes: Uint8Array | null | Error,
  path: string,
  serving: ServingPatch,
  overrides: ServingPatch | undefined,
  policyPath: string,
  memo: ScanMemo,
): FileReport | FileFailure | null {
  if (bytes instanceof Error) return toFailure(path, bytes);
  if (bytes === null) return null;
  try {
    return inspectModel(decodeText(bytes, path), path, {
      defaults: serving,
      defaultsOrigin: { key: `${policyPath} serving`, line: null },
      overrides,
      overridesOrigin: { key: 'command line', line: null },
      memo,
    });
  } catch (error) {
    return toFailure(path, error);
  }
}

/** Bytes of every request, in order: one batch when the source batches, else `concurrency` reads at a time. */
async function readAll(
  source: ContentSource,
  requests: ContentRequest[],
  concurrency: number,
): Promise<(Uint8Array | null | Error)[]> {
  const asError = (error: unknown): Error =>
    error instanceof Error ? error : new Error(String(error));
  if (source.readMany) {
    try {
      return await source.readMany(requests);
    } catch (error) {
      return requests.map(() => asError(error));
    }
  }
  return mapLimited(requests, concurrency, (r) => source.read(r.ref, r.path).catch(asError));
}

async function mapLimited<T, R>(
  items: T[],
  limit: number,
  work: (item: T) => Promise<R>,
): Promise<R[]> {
  const results = new Array<R>(items.length);
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
    return [
      `the head's policy does not read: ${error instanceof Error ? error.message : String(error)}`,
    ];
  }
}

/**
 * The whole gate over a pull request: the policy from the base commit, the changed model
 * configs read at both commits, and one decision. Nothing from the pull request is executed;
 * files are read as data.
 *
 * Reads: the policy (at `policyRef`, and at head when the pull request changes it), then every
 * version of every changed config in ONE `readMany` call (a source that batches answers it
 * with a fixed number of processes, whatever the number of files); remedies are proven on the
 * descriptions read here, never read again. Compute: positional metrics go through one memo for
 * the run (`scan-memo.ts`), so a code and span repeated across files and versions, or proofs,
 * is scanned once.
 */
export async function runGate(source: ContentSource, request: GateRequest): Promise<GateReport> {
  const { base, head, policyPath } = request;
  const memo = request.memo ?? createScanMemo();
  const basePolicyBytes = await source.read(request.policyRef ?? base, policyPath);
  let policy: Policy = DEFAULT_POLICY;
  if (basePolicyBytes !== null) {
    policy = parsePolicy(decodeText(basePolicyBytes, policyPath), policyPath);
  } else if (source.exists && (await source.exists(request.policyRef ?? base, policyPath))) {
    // A symlink, a directory or a submodule where the policy belongs is not "no policy".
    throw new Error(
      `${policyPath} exists on the base commit but is not a regular file (a symbolic link, a directory or a submodule); expected the policy as a regular file, or nothing at that path`,
    );
  }
  const headPolicyBytes = request.changes.some(
    (c) => c.path === policyPath || c.previousPath === policyPath,
  )
    ? await source.read(head, policyPath)
    : basePolicyBytes;
  const policyChanged = !sameBytes(basePolicyBytes, headPolicyBytes);
  const limitChanges = policyChanged ? headPolicyChanges(policy, headPolicyBytes, policyPath) : [];

  const relevant = request.changes.filter(
    (c) =>
      isModelConfig(policy, c.path) ||
      (c.previousPath !== null && isModelConfig(policy, c.previousPath)),
  );
  let deleted = relevant.filter((c) => c.status === 'deleted');
  const judged = relevant.filter((c) => c.status !== 'deleted');

  // Head of every file, then base of every file not added, then base of every deleted file (a
  // move shows as one deleted and one added file: they are paired below): one read for the run.
  const requests: ContentRequest[] = [
    ...judged.map((change) => ({ ref: head, path: change.path })),
    ...judged
      .filter((change) => change.status !== 'added')
      .map((change) => ({ ref: base, path: change.previousPath ?? change.path })),
  ];
  const deletedFrom = requests.length;
  if (judged.length > 0)
    requests.push(...deleted.map((change) => ({ ref: base, path: change.path })));
  const answers: (Uint8Array | null | Error)[] =
    requests.length === 0 ? [] : await readAll(source, requests, request.concurrency ?? 8);
  const configs: ChangedConfig[] = [];
  let nextBase = judged.length;
  for (const [i, change] of judged.entries()) {
    const filePolicy = resolvePolicy(policy, change.path);
    const judging: Judging = {
      limits: filePolicy.limits,
      rules: filePolicy.rules,
      standing: filePolicy.standing,
    };
    const headVersion = inspectVersion(
      answers[i]!,
      change.path,
      filePolicy.serving,
      request.overrides,
      policyPath,
      memo,
    ) ?? {
      path: change.path,
      line: null,
      message: `${change.path} is not a regular file at head (a symlink, a submodule or too large to read), so it was not judged`,
    };
    answers[i] = null; // the bytes are no longer needed
    let baseVersion: FileReport | FileFailure | null = null;
    let status = change.status;
    if (change.status !== 'added') {
      const baseAnswer = answers[nextBase]!;
      answers[nextBase++] = null;
      const basePath = change.previousPath ?? change.path;
      // A base over the size limit will not read on a re-run either: a broken base, not a failed read.
      if (baseAnswer instanceof Error && baseAnswer.name !== 'ContentTooLargeError') {
        throw new BaseUnreadableError(
          `${basePath} could not be read at base ${base}: ${baseAnswer.message}. Its head cannot be judged against it, so the check fails until it can be read (re-run the job)`,
        );
      }
      baseVersion = inspectVersion(
        baseAnswer,
        basePath,
        filePolicy.serving,
        request.overrides,
        policyPath,
        memo,
      );
      // A base version that is not there (a 404, a shallow history) is an added file; a symlink,
      // a submodule or a directory there is not "nothing": it fails closed (`base-unreadable`).
      if (baseVersion === null && (await existsAtBase(source, base, basePath)))
        baseVersion = {
          path: basePath,
          line: null,
          message: `${basePath} is not a regular file at base (a symbolic link, a submodule or a directory), so it was not read`,
        };
      if (baseVersion === null) status = 'added';
    }
    configs.push({ change: { ...change, status }, base: baseVersion, head: headVersion, judging });
  }

  // A config moved and rewritten shows as deleted plus added: pair them by the model they
  // describe and judge the pair as a change (`src/core/pair-moves.ts`).
  const arrived = configs.filter(
    (c) => c.change.status === 'added' && c.head !== null && 'spec' in c.head,
  );
  if (arrived.length > 0 && deleted.length > 0) {
    const gone = new Map<string, FileReport>();
    deleted.forEach((change, i) => {
      const answer = answers[deletedFrom + i]!;
      answers[deletedFrom + i] = null;
      if (answer instanceof Error) {
        throw new BaseUnreadableError(
          `${change.path} (deleted) could not be read at base ${base}: ${answer.message}. It may have moved to an added file, which cannot be judged against it, so the check fails until it can be read (re-run the job)`,
        );
      }
      const version = inspectVersion(
        answer,
        change.path,
        resolvePolicy(policy, change.path).serving,
        request.overrides,
        policyPath,
        memo,
      );
      if (version !== null && 'spec' in version) gone.set(change.path, version);
    });
    const moves = pairMoves(
      [...gone.values()].map((version) => ({ path: version.path, spec: version.spec })),
      arrived.map((config) => ({
        path: config.change.path,
        spec: (config.head as FileReport).spec,
      })),
    );
    for (const move of moves) {
      const config = arrived.find((c) => c.change.path === move.to)!;
      config.change = { ...config.change, status: 'renamed', previousPath: move.from };
      config.base = gone.get(move.from)!;
    }
    const moved = new Set(moves.map((move) => move.from));
    deleted = deleted.filter((change) => !moved.has(change.path));
  }

  // `config.json` is a common name for things that are not models: when only the default globs
  // picked such a file, it is named in a notice instead of blocking.
  const notices = [...(request.notices ?? [])];
  const judgedConfigs = configs.filter((config) => {
    const head = config.head;
    const skip =
      policy.files === DEFAULT_POLICY.files &&
      head !== null &&
      'notAModel' in head &&
      head.notAModel === true;
    if (skip)
      notices.push(
        `${config.change.path} matched the default file globs but is not a model config; it was not judged (list your model files under \`files\` in the policy to judge exactly those).`,
      );
    return !skip;
  });

  const labels = (await request.labels) ?? [];
  const waiverLabel = policy.waiverLabel ?? null;
  // Every blocking finding gets its remedy here, proven against the same policy and base.
  return attachRemedies(
    decide({
      configs: judgedConfigs,
      deleted,
      policy: {
        source: basePolicyBytes === null ? 'built-in' : 'file',
        path: policyPath,
        changedInHead: policyChanged,
        ...(limitChanges.length > 0 ? { limitChanges } : {}),
      },
      waiver: { label: waiverLabel, applied: waiverLabel !== null && labels.includes(waiverLabel) },
      notices,
      base,
      head,
    }),
    judgedConfigs,
    memo,
  );
}
