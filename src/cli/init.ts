import { lstat, mkdir, rm, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { parseArgs } from 'node:util';
import { createWorktreeGit } from '../adapters/git.js';
import { runGate } from '../core/gate.js';
import { ACTION_REPOSITORY } from '../core/home.js';
import { inspectModel } from '../core/inspect.js';
import {
  renderStarterPolicy,
  workflowPaths,
  type FoundConfig,
} from '../core/init/starter-policy.js';
import { forkWorkflows, simpleWorkflow } from '../core/init/workflows.js';
import { NotAModelError } from '../core/parse/errors.js';
import { decodeText } from '../core/parse/source.js';
import { DEFAULT_POLICY, DEFAULT_POLICY_PATH, isModelConfig } from '../core/policy/index.js';
import { renderDiffText } from '../core/render/diff-text.js';
import type { Console } from './console.js';
import { UsageError } from './options.js';
import { terminalStyle } from './terminal.js';
import { createWorktreeFiles } from './worktree.js';

export const INIT_USAGE = `usage: context-reach init [--forks] [--force]
       writes .github/context-reach.yml and the workflow (--forks: the two workflows that
       comment on pull requests from forks too); an existing file is kept unless --force`;

/** The name the first run gives the configs' version: the working tree, as it is now. */
const NOW = 'working tree';

/**
 * `init`: finds the model configs in the repository (tracked and untracked files the built-in
 * globs pick, not ignored ones), writes the starter policy and the workflow files, keeps any
 * file that exists unless `--force`, prints what it wrote and the next step, and runs the gate
 * once over the configs as they are, judged as if added. Exit status 0, or 1 when a file was
 * kept because it exists.
 */
export async function runInit(args: string[], io: Console): Promise<number> {
  const { values } = parseArgs({
    args,
    strict: true,
    allowPositionals: false,
    options: { forks: { type: 'boolean' }, force: { type: 'boolean' } },
  });
  const worktree = createWorktreeGit(io.cwd);
  const top = await worktree.topLevel().catch(() => {
    throw new UsageError(
      'init runs inside a git repository (git rev-parse --show-toplevel found none here)',
    );
  });
  const files = createWorktreeFiles(top);

  const candidates = (await worktree.listFiles())
    .filter((path) => isModelConfig(DEFAULT_POLICY, path))
    .sort();
  const found: FoundConfig[] = [];
  for (const path of candidates) {
    const bytes = await files.read(path).catch(() => null);
    if (bytes === null) continue;
    try {
      const report = inspectModel(decodeText(bytes, path), path);
      found.push({ path, dialect: report.dialect, spec: report.spec });
    } catch (error) {
      // A `config.json` of something else is no model config; a broken model config is still one.
      if (error instanceof NotAModelError) continue;
      found.push({ path, dialect: null, spec: null });
    }
  }

  const paths = workflowPaths(found);
  const planned = [
    { path: DEFAULT_POLICY_PATH, text: renderStarterPolicy(found) },
    ...(values.forks ? forkWorkflows(paths) : [simpleWorkflow(paths)]),
  ];
  let kept = 0;
  io.out(
    found.length === 0
      ? 'context-reach init: no model configs found; the policy keeps the built-in globs.\n'
      : `context-reach init: ${found.length} model config${found.length === 1 ? '' : 's'} found: ${found.map((c) => c.path).join(', ')}\n`,
  );
  for (const file of planned) {
    const target = join(top, file.path);
    const existing = await lstat(target).catch(() => null);
    const exists = existing !== null;
    if (exists && !values.force) {
      kept += 1;
      io.out(`  kept    ${file.path} (it exists; --force replaces it)\n`);
      continue;
    }
    if (existing?.isDirectory())
      throw new Error(`${file.path} is a folder; expected a file to replace`);
    // A symlink is replaced, never written through.
    if (exists) await rm(target, { force: true });
    await mkdir(dirname(target), { recursive: true });
    await writeFile(target, file.text);
    io.out(`  ${exists ? 'replaced' : 'wrote  '} ${file.path}\n`);
  }

  // The first run, so the first pull request holds no surprise: every config as if added.
  const report = await runGate(
    { read: (ref, path) => (ref === NOW ? files.read(path) : Promise.resolve(null)) },
    {
      base: 'nothing',
      policyRef: NOW,
      head: NOW,
      policyPath: DEFAULT_POLICY_PATH,
      changes: found.map((c) => ({ status: 'added' as const, path: c.path, previousPath: null })),
    },
  );
  io.out(
    `\nThe gate on these configs as they are now, with ${DEFAULT_POLICY_PATH} (each judged as if added):\n\n`,
  );
  io.out(renderDiffText(report, terminalStyle(io.stdout, io.env)));
  io.out(
    `\nverdict now: ${report.verdict} (${report.blocking} blocking, ${report.warnings} warnings). On pull requests, a finding the base already had is listed without blocking (standing: report).\n`,
  );
  io.out(
    `\nNext: review the files, then commit and push them:\n  git add ${planned.map((f) => f.path).join(' ')}\n  git commit -m "Check model configs with context-reach"\n` +
      `The next pull request that touches ${paths === null ? 'any file' : paths.join(', ')} runs the gate. The workflow names ${ACTION_REPOSITORY} at its major tag;\n` +
      `pin a full commit id instead (${ACTION_REPOSITORY}@<40-hex-sha>) if a moving tag is not acceptable. Before a push, \`context-reach diff\` runs the same check locally.\n`,
  );
  return kept > 0 ? 1 : 0;
}
