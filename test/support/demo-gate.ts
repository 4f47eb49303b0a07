import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { createGitReader } from '../../src/adapters/git.js';
import type { GateReport } from '../../src/core/report/types.js';
import { runGate } from '../../src/core/gate.js';
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

/** Runs the gate over a base and a head tree in a temporary git repository, as `diff` does. */
export async function gateOver(
  base: Tree,
  head: Tree,
  overrides?: ServingPatch,
): Promise<{ report: GateReport; repo: ScenarioRepo }> {
  const repo = scenarioRepo(base, head);
  const git = createGitReader(repo.dir);
  try {
    const report = await runGate(
      { read: (ref, path) => git.show(ref, path) },
      {
        base: repo.base,
        head: repo.head,
        changes: await git.changedFiles(repo.base, repo.head),
        policyPath: '.github/context-reach.yml',
        overrides,
      },
    );
    return { report, repo };
  } finally {
    repo.remove();
  }
}
