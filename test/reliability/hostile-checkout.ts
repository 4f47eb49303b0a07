/**
 * The checkout the hostile-files tests share: a git repository whose head adds every hostile file
 * of hostile-files.ts beside a good model config, a folder outside it with a canary the symbolic
 * links point at, and the good file's decision when judged alone.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import { afterAll, beforeAll, expect } from 'vitest';
import { createGitReader, gitContentSource } from '../../src/adapters/git.js';
import type { FileDecision } from '../../src/core/report/types.js';
import { runGate, type ContentSource } from '../../src/core/gate.js';
import {
  checkpointConfig,
  scenarioRepo,
  type ScenarioRepo,
  type Tree,
} from '../support/scenario-repo.js';
import { hostileCases, type HostileCase } from './hostile-files.js';

export const POLICY_PATH = '.github/context-reach.yml';
// The limit makes the many-heads file block, so its remedy search runs.
export const POLICY = 'files: ["models/**"]\nlimits:\n  cachePerTokenBytes: { max: 1000000 }\n';
export const CONTROL = 'models/control/config.json';
export const CONTROL_BASE = checkpointConfig();
export const CONTROL_HEAD = checkpointConfig({ num_key_value_heads: 8 });
/** Each file is judged within this many milliseconds of CPU time (issue 5). */
export const TIME_LIMIT_MS = 2000;
/** And within this much memory, the whole process counted. */
export const MEMORY_LIMIT_MIB = 256;

export const CASES = hostileCases();
export const CANARY = 'CANARY-outside-the-checkout-7f3a9c';

export interface HostileCheckout {
  /** The folder outside the checkout holding the canary. */
  outside: string;
  repo: ScenarioRepo;
  /** Reads through the git adapter, as `diff` does (`gitContentSource`). */
  source: ContentSource;
  /** The good file's decision with nothing else in the pull request. */
  control: FileDecision;
  remove(): void;
}

function tree(outside: string, withCases: boolean): Tree {
  const files: Tree = { [POLICY_PATH]: POLICY, [CONTROL]: withCases ? CONTROL_HEAD : CONTROL_BASE };
  if (!withCases) return files;
  for (const c of CASES) {
    if (c.content instanceof Uint8Array) files[c.path] = c.content;
    else {
      const canary = join(outside, 'canary.json');
      // Relative links climb from the file's folder in the checkout up to the shared temp folder.
      files[c.path] = {
        symlink:
          c.content.symlinkOutside === 'absolute'
            ? canary
            : '../'.repeat(c.path.split('/').length + 1) + relative(dirname(outside), canary),
      };
    }
  }
  return files;
}

export async function hostileCheckout(): Promise<HostileCheckout> {
  const outside = mkdtempSync(join(tmpdir(), 'context-reach-outside-'));
  writeFileSync(join(outside, 'canary.json'), checkpointConfig({ hidden_size: CANARY }));
  const repo = scenarioRepo(tree(outside, false), tree(outside, true));
  const git = createGitReader(repo.dir);
  // The content source `diff` and the demo read through: every version in one batch.
  const source: ContentSource = gitContentSource(git);
  const control = (
    await runGate(source, {
      base: repo.base,
      head: repo.head,
      policyPath: POLICY_PATH,
      changes: [{ status: 'modified', path: CONTROL, previousPath: null }],
    })
  ).files[0]!;
  return {
    outside,
    repo,
    source,
    control,
    remove: () => {
      repo.remove();
      rmSync(outside, { recursive: true, force: true });
    },
  };
}

export function expectFinding(c: HostileCase, file: FileDecision | undefined): void {
  expect(file, `${c.path} is in the report`).toBeDefined();
  expect(file!.head !== null, `${c.path} judged`).toBe(c.judged);
  if (!c.finding) {
    expect(
      file!.findings.filter((f) => f.rule === 'config-unreadable' || f.rule === 'value-invalid'),
    ).toEqual([]);
    return;
  }
  const found = file!.findings.find((f) => f.rule === c.finding!.rule);
  expect(
    found,
    `${c.path}: a ${c.finding.rule} finding among ${file!.findings.map((f) => f.rule).join(', ')}`,
  ).toBeDefined();
  expect(found!.message).toMatch(c.finding.message);
  expect(found!.line).toBe(c.finding.line);
  expect(found!.file).toBe(c.path);
  if (found!.rule === 'config-unreadable') expect(found!.message.startsWith(c.path)).toBe(true);
}

/**
 * For the calling test file: the checkout, made before its tests and removed after them, when
 * `figures` (the file's measurements) are printed. Returns the checkout once made.
 */
export function useHostileCheckout(figures: string[]): () => HostileCheckout {
  let checkout: HostileCheckout | undefined;
  beforeAll(async () => {
    checkout = await hostileCheckout();
  }, 120_000);
  afterAll(() => {
    checkout?.remove();
    console.log(`hostile files:\n${figures.join('\n')}`);
  });
  return () => checkout!;
}
