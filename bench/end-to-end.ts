/**
 * W3, W4 and start-up of issue 4, measured on the bundles a user runs:
 *
 *   W3  `inspect --json` over 200 generated configs (bench/configs.ts): through the bundled CLI
 *       (`node dist/cli.js inspect --json f1 … f200`, one process, wall time from spawn to exit)
 *       and in process (`runInspect` with the files in memory, warm).
 *   W4  the bundled action (`node dist/index.js`) as the runner starts it, on a pull request that
 *       changes 200 configs, against a temporary git repository and the loopback stand-in for the
 *       REST API that the gate's tests use (test/support): wall time from spawn to exit.
 *   start-up  process start to the first byte of output: `dist/cli.js --version`, the action's
 *       first line (it registers the token as a secret right after reading its inputs), and, for
 *       scale, a bare `node -e` printing one line.
 *
 * Every bundle runs with `--require bench/cpu-report.cjs`, which prints the process's own CPU time
 * at exit: on a machine loaded by other work, wall time includes waiting for a core.
 */
import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Console } from '../src/cli/console.js';
import type { FileSource } from '../src/adapters/file-source.js';
import { runInspect } from '../src/cli/inspect.js';
import { putPullRequest, startFakeGitHub } from '../test/support/fake-github.js';
import { pullRequestEvent, runBundle } from '../test/support/run-bundle.js';
import { scenarioRepo, type Tree } from '../test/support/scenario-repo.js';
import { pullRequestConfigs, type ConfigFile } from './configs.js';

export const CLI_BUNDLE = path.join(process.cwd(), 'dist', 'cli.js');
export const ACTION_BUNDLE = path.join(process.cwd(), 'dist', 'index.js');
const CPU_REPORT = ['--require', path.join(process.cwd(), 'bench', 'cpu-report.cjs')];

/** Configs of W3 and W4 (default: `200`). */
export const CONFIG_COUNT = 200;

/** One timed process: wall time from spawn to exit and the CPU time it reported, in milliseconds. */
export interface ProcessTime {
  ms: number;
  cpuMs: number | null;
}

function reportedCpuMs(stderr: string): number | null {
  const match = /bench-cpu-us (\d+)/.exec(stderr);
  return match ? Number(match[1]) / 1000 : null;
}

/** W3 through the CLI bundle: the configs written to a temporary folder, one `inspect --json` process. */
export function inspectThroughCli(files: ConfigFile[]): ProcessTime & { json: string } {
  const dir = mkdtempSync(path.join(tmpdir(), 'context-reach-bench-'));
  try {
    for (const f of files) {
      mkdirSync(path.dirname(path.join(dir, f.path)), { recursive: true });
      writeFileSync(path.join(dir, f.path), f.text);
    }
    const start = performance.now();
    const r = spawnSync(
      process.execPath,
      [...CPU_REPORT, CLI_BUNDLE, 'inspect', '--json', ...files.map((f) => f.path)],
      { cwd: dir, encoding: 'utf8', maxBuffer: 1 << 28 },
    );
    const ms = performance.now() - start;
    if (r.status !== 0)
      throw new Error(`dist/cli.js inspect exited with ${r.status}: ${r.stderr.slice(0, 2000)}`);
    return { ms, cpuMs: reportedCpuMs(r.stderr), json: r.stdout };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** W3 in process: the CLI's own `runInspect` over the configs held in memory. */
export async function inspectInProcess(files: ConfigFile[]): Promise<{ ms: number; json: string }> {
  const bytes = new Map(files.map((f) => [f.path, new TextEncoder().encode(f.text)]));
  const source: FileSource = { read: async (p) => bytes.get(p)! };
  let json = '';
  let errors = '';
  const io: Console = {
    out: (t) => {
      json += t;
    },
    error: (t) => {
      errors += t;
    },
    stdout: {},
    env: {},
    cwd: '.',
  };
  const start = performance.now();
  const code = await runInspect(['--json', ...files.map((f) => f.path)], source, io);
  const ms = performance.now() - start;
  if (code !== 0) throw new Error(`runInspect exited with ${code}: ${errors.slice(0, 2000)}`);
  return { ms, json };
}

const OWNER = 'example-org';
const REPO = 'model-zoo';
/** A policy with a limit some generated configs cross, so findings, annotations, remedies and a long comment are all exercised. */
const POLICY =
  'limits:\n  fitSequences: { min: 1 }\nserving:\n  device-memory-gib: 80\n  sequences: 4\n';

/** One W4 run: time, and what it decided (the same on every run, or the bench stops). */
export interface ActionRun extends ProcessTime {
  verdict: string;
  blocking: number;
  files: number;
  commentUrl: string;
}

/** The W4 pull request: base and head commits in a temporary repository, and the loopback API. */
export async function actionScenario(count = CONFIG_COUNT) {
  const { base, head } = pullRequestConfigs(count);
  const tree = (files: ConfigFile[]): Tree =>
    Object.fromEntries([
      ['.github/context-reach.yml', POLICY] as const,
      ...files.map((f): [string, string] => [f.path, f.text]),
    ]);
  const repo = scenarioRepo(tree(base), tree(head));
  const fake = await startFakeGitHub({ owner: OWNER, repo: REPO });
  putPullRequest(
    fake,
    repo,
    head.map((f) => ({ filename: f.path, status: 'modified' as const })),
  );
  // The stand-in reads GitHub's REST description on its first request; that is the harness's
  // cost, not the action's, so it is paid here, before any run is timed.
  await fetch(`${fake.url}/repos/${OWNER}/${REPO}/pulls/7`, {
    headers: { authorization: `token ${fake.state.token}` },
  }).then((r) => r.arrayBuffer());
  return {
    async run(): Promise<ActionRun> {
      const r = await runBundle({
        eventName: 'pull_request',
        event: pullRequestEvent({
          owner: OWNER,
          repo: REPO,
          number: 7,
          base: repo.base,
          head: repo.head,
        }),
        workspace: repo.dir,
        apiUrl: fake.url,
        repository: `${OWNER}/${REPO}`,
        bundle: ACTION_BUNDLE,
        nodeArgs: CPU_REPORT,
        inputs: { 'github-token': fake.state.token, 'fail-on': 'block', comment: 'update' },
        timeoutMs: 120_000,
      });
      if (r.code !== 0 && r.code !== 1)
        throw new Error(`dist/index.js exited with ${r.code}: ${r.stderr.slice(0, 2000)}`);
      const reportPath = r.outputs['report-json'];
      if (!reportPath || !(reportPath in r.files))
        throw new Error(
          `dist/index.js wrote no JSON report (exit ${r.code}): ${r.stderr.slice(0, 2000)}`,
        );
      const report = JSON.parse(r.files[reportPath]!) as { files: unknown[] };
      if (fake.mismatches.length > 0)
        throw new Error(
          `the action made requests GitHub's REST description does not allow: ${JSON.stringify(fake.mismatches.slice(0, 3))}`,
        );
      return {
        ms: r.elapsedMs,
        cpuMs: reportedCpuMs(r.stderr),
        verdict: r.outputs.verdict ?? '',
        blocking: Number(r.outputs.blocking),
        files: report.files.length,
        commentUrl: r.outputs['comment-url'] ?? '',
      };
    },
    async close() {
      await fake.close();
      repo.remove();
    },
  };
}

/** Milliseconds from spawning `node args…` to its first byte on standard output; the process is then left to finish. */
export function firstOutputMs(
  args: string[],
  env: Record<string, string> = {},
  cwd = process.cwd(),
): Promise<number> {
  return new Promise((resolve, reject) => {
    const start = performance.now();
    const child = spawn(process.execPath, args, {
      cwd,
      env: { PATH: process.env.PATH ?? '', HOME: process.env.HOME ?? tmpdir(), ...env },
      stdio: ['ignore', 'pipe', 'ignore'],
    });
    let seen = false;
    child.stdout.once('data', () => {
      seen = true;
      resolve(performance.now() - start);
    });
    child.on('error', reject);
    child.on('close', (code) => {
      if (!seen) reject(new Error(`node ${args.join(' ')} printed nothing (exit ${code})`));
    });
  });
}

/** The action's start-up: a run that stops right after reading its inputs, timed to its first line. */
export async function actionStartupMs(): Promise<number> {
  const temp = mkdtempSync(path.join(tmpdir(), 'context-reach-start-'));
  const summary = path.join(temp, 'summary.md');
  const output = path.join(temp, 'output.txt');
  writeFileSync(summary, '');
  writeFileSync(output, '');
  try {
    // With a token the first line is `::add-mask::`, printed once the inputs are read; the run
    // then stops (a workflow_dispatch without a base), so nothing after start-up is timed.
    return await firstOutputMs(
      [ACTION_BUNDLE],
      {
        GITHUB_ACTIONS: 'true',
        GITHUB_EVENT_NAME: 'workflow_dispatch',
        GITHUB_STEP_SUMMARY: summary,
        GITHUB_OUTPUT: output,
        RUNNER_TEMP: temp,
        'INPUT_GITHUB-TOKEN': 'bench-token-not-a-secret',
        GITHUB_REPOSITORY: `${OWNER}/${REPO}`,
      },
      temp,
    );
  } finally {
    rmSync(temp, { recursive: true, force: true });
  }
}

/** The CLI's start-up: `dist/cli.js --version` timed to its first line. */
export function cliStartupMs(): Promise<number> {
  return firstOutputMs([CLI_BUNDLE, '--version']);
}

/** Node's own start-up on this machine, for scale: `node -e` printing one line. */
export function bareNodeStartupMs(): Promise<number> {
  return firstOutputMs(['-e', 'console.log(1)']);
}
