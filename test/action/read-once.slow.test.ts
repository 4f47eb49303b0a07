import { execFileSync } from 'node:child_process';
import { chmodSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createGitReader, gitContentSource } from '../../src/adapters/git.js';
import { runDiff } from '../../src/cli/diff.js';
import { runGate } from '../../src/core/gate.js';
import { stableKey, type ScanMemo } from '../../src/core/metrics/scan-memo.js';
import { renderGateJson } from '../../src/core/render/gate-json.js';
import { runScenario } from '../support/action-harness.js';
import {
  checkpointConfig,
  scenarioRepo,
  type ScenarioRepo,
  type Tree,
} from '../support/scenario-repo.js';

// Issue 16: a run reads every blob once, with a fixed number of git processes whatever the
// number of files and remedies; the count is taken from a git wrapper that logs each start.
// Pull requests of 300 configs make these slow (`npm run test:full`); the parser of git's raw
// diff output is tested in read-once.test.ts.

const POLICY = [
  'serving:',
  '  span: 8192',
  '  sequences: 4',
  '  device-memory-gib: 80',
  'limits:',
  '  discriminationSpan: { min: 4096, severity: block }',
  '',
].join('\n');

/** A pull request over `count` configs; one in ten gets a change that blocks (three kinds in turn). */
function pullRequest(count: number): { base: Tree; head: Tree } {
  const base: Tree = { '.github/context-reach.yml': POLICY };
  const head: Tree = { '.github/context-reach.yml': POLICY };
  for (let i = 0; i < count; i++) {
    const path = `models/m${String(i).padStart(3, '0')}/config.json`;
    const theta = [10000, 500000, 1000000][i % 3]!;
    base[path] = checkpointConfig({
      max_position_embeddings: 8192,
      rope_theta: theta,
      num_hidden_layers: 16 + (i % 7),
    });
    const kind = i % 10 === 4 ? (i / 10) % 3 : -1;
    head[path] = checkpointConfig({
      max_position_embeddings: kind === 0 ? 4096 : 8192, // the served span goes past the code's reach
      rope_theta: kind === 1 ? 500 : theta, // offsets stop being told apart well before the limit
      num_hidden_layers: (kind === 2 ? 400 : 17) + (i % 7), // far over the device budget
    });
  }
  return { base, head };
}

let root: string;
let log: string;
let counting: string;
let large: ScenarioRepo;
let small: ScenarioRepo;

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'context-reach-read-once-'));
  log = join(root, 'git-starts.log');
  counting = join(root, 'bin');
  execFileSync('mkdir', [counting]);
  const realGit = execFileSync('sh', ['-c', 'command -v git'], { encoding: 'utf8' }).trim();
  writeFileSync(
    join(counting, 'git'),
    `#!/bin/sh\necho "$*" | cut -c1-200 >> '${log}'\nexec '${realGit}' "$@"\n`,
  );
  chmodSync(join(counting, 'git'), 0o755);
  const big = pullRequest(300);
  large = scenarioRepo(big.base, big.head);
  const few = pullRequest(30);
  small = scenarioRepo(few.base, few.head);
});

afterAll(() => {
  large?.remove();
  small?.remove();
  if (root) rmSync(root, { recursive: true, force: true });
});

/** `context-reach diff --format json` in `repo` with git found through the counting wrapper; the report and the git starts. */
async function diffCounting(repo: ScenarioRepo): Promise<{
  report: { blocking: number; files: { findings: { severity: string; remedy?: unknown }[] }[] };
  starts: string[];
}> {
  writeFileSync(log, '');
  const path = process.env.PATH;
  process.env.PATH = `${counting}:${path}`;
  let out = '';
  try {
    await runDiff(['--base', repo.base, '--head', repo.head, '--format', 'json'], {
      out: (text) => {
        out += text;
      },
      error: () => {},
      stdout: {},
      env: {},
      cwd: repo.dir,
    });
  } finally {
    process.env.PATH = path;
  }
  return { report: JSON.parse(out), starts: readFileSync(log, 'utf8').trim().split('\n') };
}

describe('one run of diff on a pull request with blocking findings', () => {
  it('starts the same few git processes for 300 files as for 30, remedies included', async () => {
    const big = await diffCounting(large);
    const few = await diffCounting(small);
    // The pull request is what the test means: blocking findings, and remedies searched for them.
    expect(big.report.files).toHaveLength(300);
    expect(big.report.blocking).toBeGreaterThanOrEqual(30);
    const remedied = big.report.files
      .flatMap((f) => f.findings)
      .filter((f) => f.severity === 'block' && f.remedy !== undefined);
    expect(remedied.length).toBeGreaterThanOrEqual(30);
    expect(big.starts.length).toBe(few.starts.length);
    // Discovery once (both revisions in one cat-file, merge-base, one diff), the policy, and the
    // blobs in one batch: seven processes (eight before both revisions were resolved together).
    expect(big.starts.length).toBeLessThanOrEqual(7);
    expect(big.starts.filter((s) => s.includes('rev-parse'))).toHaveLength(0);
    expect(big.starts.filter((s) => s.includes('cat-file --batch-check'))).toHaveLength(2); // revisions, sizes
    expect(big.starts.filter((s) => s.includes(' diff '))).toHaveLength(1);
    expect(big.starts.filter((s) => s.includes('merge-base'))).toHaveLength(1);
    expect(
      big.starts.filter((s) => s.includes('cat-file --batch') && !s.includes('--batch-check')),
    ).toHaveLength(2); // the policy, then every config
    expect(big.starts.filter((s) => s.includes('ls-tree'))).toHaveLength(1); // the policy's entry only
  }, 120_000);
});

describe('the run-scoped memo of positional computations', () => {
  it('leaves the report byte for byte as computing everything each time gives it', async () => {
    const git = createGitReader(large.dir);
    const changes = await git.changedFiles(large.base, large.head);
    const request = {
      base: large.base,
      head: large.head,
      changes,
      policyPath: '.github/context-reach.yml',
    };
    let hits = 0;
    const counted: ScanMemo = (() => {
      const inner = new Map<string, unknown>();
      return {
        call(name, fn, ...args) {
          const key = `${name}(${args.map(stableKey).join(',')})`;
          if (inner.has(key)) {
            hits += 1;
            return inner.get(key) as ReturnType<typeof fn>;
          }
          const value = fn(...args);
          inner.set(key, value);
          return value;
        },
        get hits() {
          return hits;
        },
        get misses() {
          return inner.size;
        },
      };
    })();
    const never: ScanMemo = { call: (_name, fn, ...args) => fn(...args), hits: 0, misses: 0 };
    const memoised = renderGateJson(
      await runGate(gitContentSource(git), { ...request, memo: counted }),
    );
    const computed = renderGateJson(
      await runGate(gitContentSource(git), { ...request, memo: never }),
    );
    expect(memoised).toBe(computed);
    // Three bases, one span: base and head, and 300 files, share a handful of scans.
    expect(hits).toBeGreaterThan(500);
    expect(counted.misses).toBeLessThan(100);
  }, 120_000);
});

describe('one run of the action on a pull request with blocking findings', () => {
  it('reads the head texts its review suggestions need in one batch: the same git starts for 300 files as for 30', async () => {
    const starts = async (count: number) => {
      const { base, head } = pullRequest(count);
      writeFileSync(log, '');
      const path = process.env.PATH;
      process.env.PATH = `${counting}:${path}`;
      try {
        const result = await runScenario({ base, head });
        await result.fake.close();
        expect(result.error).toBeNull();
        // Suggestions were planned from the head texts: the review was written.
        expect(result.out.outputs.verdict).toBe('block');
      } finally {
        process.env.PATH = path;
      }
      return readFileSync(log, 'utf8').trim().split('\n');
    };
    const big = await starts(300);
    const few = await starts(30);
    const batches = (s: string[]) =>
      s.filter((x) => x.includes('cat-file --batch') && !x.includes('--batch-check')).length;
    expect(batches(big)).toBe(batches(few));
    expect(big.length).toBe(few.length);
    // The policy, every config version, and the head texts of the files with a fix.
    expect(batches(big)).toBeLessThanOrEqual(3);
    // Revisions in one process, blob sizes asked once (the head texts reuse them): eight in all
    // (ten before).
    expect(big.filter((x) => x.includes('cat-file --batch-check'))).toHaveLength(2);
    expect(big.filter((x) => x.includes('rev-parse'))).toHaveLength(0);
    // (The log also holds the harness's own git calls that build the repository.)
    const reader = big.filter((x) => x.startsWith('-c core.fsmonitor=false'));
    expect(reader.length).toBeGreaterThan(0);
    expect(reader.length).toBeLessThanOrEqual(8);
  }, 240_000);
});
