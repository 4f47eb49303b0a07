import { createWorktreeGit, type GitReader } from '../adapters/git.js';
import { runGate } from '../core/gate.js';
import type { Console } from './console.js';
import { commitOf, defaultBase, exitStatus, outReport, writeHtmlReport } from './diff.js';
import { UsageError, servingPatch } from './options.js';
import { createWorktreeFiles } from './worktree.js';

/** The name the report gives the working tree where a commit id would stand. */
export const WORKTREE = 'working tree';

interface DiffValues {
  base?: string;
  policy?: string;
  label?: string[];
  html?: string;
  [flag: string]: unknown;
}

/**
 * `diff` without `--head`, the check before a push: the working tree (staged and unstaged changes
 * of tracked files) against where the branch left its upstream (`@{upstream}`), or against
 * `--base`, or, with no upstream, the base `diff` picks for a commit. The policy is read at the
 * upstream's tip (or the base), as the pull request's gate will read it.
 */
export async function diffWorktree(
  git: GitReader,
  values: DiffValues,
  format: 'text' | 'markdown' | 'json',
  failOn: 'block' | 'warn' | 'never',
  io: Console,
): Promise<number> {
  const worktree = createWorktreeGit(io.cwd);
  const files = createWorktreeFiles(await worktree.topLevel());
  const head = await git.resolveCommit('HEAD');
  if (head === null)
    throw new UsageError(
      'the repository has no commit yet; commit once, then compare the working tree with it',
    );
  const upstream = values.base === undefined ? await worktree.upstream() : null;
  const base =
    values.base !== undefined
      ? await commitOf(git, values.base, '--base')
      : (upstream ?? (await defaultBase(git, head)));
  const start = (await git.mergeBase(base, head)) ?? base;
  const changes = await worktree.changedSince(start);
  const report = await runGate(
    {
      read: (ref, path) => (ref === WORKTREE ? files.read(path) : git.show(ref, path)),
      // Only committed versions are looked up (the policy, a base that reads as absent).
      exists: async (ref, path) => ref !== WORKTREE && (await git.entry(ref, path)) !== null,
    },
    {
      base: start,
      policyRef: base,
      head: WORKTREE,
      changes,
      policyPath: values.policy ?? '.github/context-reach.yml',
      labels: values.label ?? [],
      overrides: servingPatch(values),
    },
  );
  await outReport(report, format, io);
  if (values.html !== undefined) await writeHtmlReport(values.html, report);
  return exitStatus(report, failOn);
}
