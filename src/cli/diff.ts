import { mkdir, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import { parseArgs } from 'node:util';
import { runGate } from '../core/gate.js';
import { renderComment } from '../core/render/comment.js';
import { renderDiffText } from '../core/render/diff-text.js';
import { gateJsonParts, renderGateJson } from '../core/render/gate-json.js';
import { renderHtmlReport } from '../core/render/html-report.js';
import { createGitReader, gitContentSource, type GitReader } from '../adapters/git.js';
import type { GateReport } from '../core/report/types.js';
import type { Console } from './console.js';
import { optionLines, SERVING_FLAGS, SERVING_HELP, UsageError, servingPatch } from './options.js';
import { diffWorktree } from './diff-worktree.js';
import { terminalStyle } from './terminal.js';

export const DIFF_USAGE = `usage: context-reach diff [--base REF] [--head REF] [--policy FILE]
       [--format text|markdown|json] [--fail-on block|warn|never] [--label NAME]... [--html FILE]
       [--served-span N] [--sequences N] [--device-gib G] [--cache-dtype D]
       [--tensor-parallel N] [--pipeline-parallel N] ...
${optionLines([
  [
    '--base REF',
    'branch, tag or commit to compare against (default: where HEAD left its upstream, else origin/HEAD, origin/main, origin/master, main or master, else the parent of HEAD)',
  ],
  [
    '--head REF',
    'branch, tag or commit to judge (default: the working tree, staged and unstaged changes of tracked files)',
  ],
  [
    '--policy FILE',
    'repository-relative path of the policy, read at the base (default: .github/context-reach.yml)',
  ],
  ['--format F', 'one of text, markdown, json (default: text)'],
  ['--fail-on V', 'lowest verdict that exits 1: one of block, warn, never (default: block)'],
  [
    '--label NAME',
    "a pull-request label, e.g. the policy's waiver label; repeat for more (default: none)",
  ],
  ['--html FILE', 'also write the standalone HTML report to FILE (default: none)'],
  ...SERVING_HELP,
])}`;

const FORMATS = ['text', 'markdown', 'json'] as const;
const FAIL_ON = ['block', 'warn', 'never'] as const;

/** Writes the standalone HTML report of `--html` (folders made as needed). */
export async function writeHtmlReport(path: string, report: GateReport): Promise<void> {
  await mkdir(dirname(path), { recursive: true });
  await writeFile(path, renderHtmlReport(report));
}

/** Exit status for a verdict under `--fail-on`: 1 fails the check, 0 passes it. */
export function exitStatus(report: GateReport, failOn: (typeof FAIL_ON)[number]): number {
  if (failOn === 'never') return 0;
  if (report.verdict === 'block') return 1;
  return failOn === 'warn' && report.verdict === 'warn' ? 1 : 0;
}

export function renderReport(
  report: GateReport,
  format: (typeof FORMATS)[number],
  io: Console,
): string {
  if (format === 'json') return renderGateJson(report);
  if (format === 'markdown') return renderComment(report);
  return renderDiffText(report, terminalStyle(io.stdout, io.env));
}

/** Parts of at least this many characters are written at once (1 Mi). */
const OUT_BATCH = 1 << 20;

/**
 * Writes the report to standard output; the JSON report a file at a time, in writes of about
 * a megabyte, each taken by the output before the next is made, so a report of thousands of
 * files (40 MB at 3,000) is never held whole, not even in a pipe's queue.
 */
export async function outReport(
  report: GateReport,
  format: (typeof FORMATS)[number],
  io: Console,
): Promise<void> {
  if (format !== 'json') {
    io.out(renderReport(report, format, io));
    return;
  }
  let batch = '';
  for (const part of gateJsonParts(report)) {
    batch += part;
    if (batch.length >= OUT_BATCH) {
      io.out(batch);
      batch = '';
      await io.drained?.();
    }
  }
  if (batch !== '') io.out(batch);
}

const noCommit = (flag: string, rev: string) =>
  new UsageError(`${flag} ${rev} names no commit in this repository`);

export async function commitOf(git: GitReader, rev: string, flag: string): Promise<string> {
  const sha = await git.resolveCommit(rev);
  if (sha === null) throw noCommit(flag, rev);
  return sha;
}

/**
 * Without `--base`: where the branch left the main line (the first of origin/HEAD, origin/main,
 * origin/master, main, master that exists), or the parent commit when already on it.
 */
export async function defaultBase(git: GitReader, head: string): Promise<string> {
  for (const candidate of ['origin/HEAD', 'origin/main', 'origin/master', 'main', 'master']) {
    const tip = await git.resolveCommit(candidate);
    if (tip === null) continue;
    const fork = await git.mergeBase(head, tip);
    if (fork !== null && fork !== head) return fork;
  }
  const parent = await git.resolveCommit(`${head}~1`);
  if (parent === null) throw new UsageError('no base to compare with: give --base REF');
  return parent;
}

/**
 * `diff`: the gate's decision between two commits of the git checkout in the working folder, or
 * without `--head` between the base and the working tree (staged and unstaged changes).
 */
export async function runDiff(args: string[], io: Console): Promise<number> {
  const { values } = parseArgs({
    args,
    allowPositionals: false,
    strict: true,
    options: {
      base: { type: 'string' },
      head: { type: 'string' },
      policy: { type: 'string' },
      format: { type: 'string' },
      'fail-on': { type: 'string' },
      label: { type: 'string', multiple: true },
      html: { type: 'string' },
      ...SERVING_FLAGS,
    },
  });
  const format = (values.format ?? 'text') as (typeof FORMATS)[number];
  if (!FORMATS.includes(format))
    throw new UsageError(`--format takes one of ${FORMATS.join(', ')}, got '${values.format}'`);
  const failOn = (values['fail-on'] ?? 'block') as (typeof FAIL_ON)[number];
  if (!FAIL_ON.includes(failOn))
    throw new UsageError(
      `--fail-on takes one of ${FAIL_ON.join(', ')}, got '${values['fail-on']}'`,
    );

  const git = createGitReader(io.cwd);
  if (values.head === undefined) return diffWorktree(git, values, format, failOn, io);
  let head: string;
  let base: string;
  if (values.base !== undefined) {
    // Both in one git process; each named in its own message when it names no commit.
    const [headSha = null, baseSha = null] = await git.resolveCommits([values.head, values.base]);
    if (headSha === null) throw noCommit('--head', values.head);
    if (baseSha === null) throw noCommit('--base', values.base);
    [head, base] = [headSha, baseSha];
  } else {
    head = await commitOf(git, values.head, '--head');
    base = await defaultBase(git, head);
  }
  // Changes since head left the base (as a pull request shows them); the policy from the base
  // itself, read while git finds the merge base and lists the changes.
  const policyPath = values.policy ?? '.github/context-reach.yml';
  const source = gitContentSource(git, [{ ref: base, path: policyPath }]);
  const start = (await git.mergeBase(base, head)) ?? base;
  const changes = await git.changedFiles(start, head);
  const report = await runGate(source, {
    base: start,
    policyRef: base,
    head,
    changes,
    policyPath,
    labels: values.label ?? [],
    overrides: servingPatch(values),
  });
  await outReport(report, format, io);
  if (values.html !== undefined) await writeHtmlReport(values.html, report);
  return exitStatus(report, failOn);
}
