import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { createGitReader, gitContentSource } from '../../src/adapters/git.js';
import type { GateReport } from '../../src/core/report/types.js';
import { runGate } from '../../src/core/gate.js';
import { createScanMemo } from '../../src/core/metrics/scan-memo.js';
import type { ServingPatch } from '../../src/core/model.js';
import { scenarioRepo, type ScenarioRepo, type Tree } from './scenario-repo.js';

export const DEMO = resolve(import.meta.dirname, '../../fixtures/demo');

/** Every file under `dir`, keyed by its path relative to `dir`. */
export function readTree(dir: string): Record<string, string> {
  const tree: Record<string, string> = {};
  const walk = (folder: string) => {
    for (const name of readdirSync(folder)) {
      const path = join(folder, name);
      if (statSync(path).isDirectory()) walk(path);
      else tree[relative(dir, path)] = readFileSync(path, 'utf8');
    }
  };
  walk(dir);
  return tree;
}

/** The demo's base and head trees, as `node dist/cli.js demo` commits them. */
export function demoTrees(): { base: Record<string, string>; head: Record<string, string> } {
  return { base: readTree(join(DEMO, 'base')), head: readTree(join(DEMO, 'head')) };
}

/**
 * One memory of positional computations for every gate run of a test worker: a pure
 * computation's result depends on its arguments alone (`scan-memo.ts`), so the demo's codes and
 * spans, judged again with each remedy applied, are computed once, not once per run.
 */
const memo = createScanMemo();

/**
 * Runs the gate over a base and a head tree in a temporary git repository, as `diff` does (the
 * same content source), the positional computations shared across runs.
 */
export async function gateOver(
  base: Tree,
  head: Tree,
  overrides?: ServingPatch,
): Promise<{ report: GateReport; repo: ScenarioRepo }> {
  const repo = scenarioRepo(base, head);
  const git = createGitReader(repo.dir);
  try {
    const report = await runGate(gitContentSource(git), {
      base: repo.base,
      head: repo.head,
      changes: await git.changedFiles(repo.base, repo.head),
      policyPath: '.github/context-reach.yml',
      overrides,
      memo,
    });
    return { report, repo };
  } finally {
    repo.remove();
  }
}
