import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { putPullRequest, type FakeGitHub, type FakePullFile } from './fake-github.js';
import type { ScenarioRepo } from './scenario-repo.js';

export const ACTION_BUNDLE = resolve(import.meta.dirname, '../../dist/index.js');

export interface BundleRun {
  code: number | null;
  stdout: string;
  stderr: string;
  outputs: Record<string, string>;
  summary: string;
  /** Workflow commands the action printed (`::error file=…::message`). */
  annotations: { level: string; properties: Record<string, string>; message: string }[];
  /** Every file the run wrote into its temporary folder, for leak checks. */
  files: Record<string, string>;
  elapsedMs: number;
  /** Peak resident set size of the child in MiB, when it ran with the `PEAK_RSS_PRELOAD` preload. */
  peakRssMiB: number | null;
  /** CPU time (user + system) of the child in ms, when it ran with the `PEAK_RSS_PRELOAD` preload. */
  cpuMs: number | null;
}

/** Preload that prints the child's peak resident set size on exit. */
export const PEAK_RSS_PRELOAD = resolve(import.meta.dirname, 'peak-rss.cjs');

/** The line `peak-rss.cjs` prints: peak RSS in MiB, CPU time in ms, and stderr without the line. */
export function takePeakRss(stderr: string): {
  peakRssMiB: number | null;
  cpuMs: number | null;
  stderr: string;
} {
  const match = /\n?@@peak-rss-kib (\d+) cpu-ms (\d+)\n/.exec(stderr);
  return match
    ? {
        peakRssMiB: Number(match[1]) / 1024,
        cpuMs: Number(match[2]),
        stderr: stderr.replace(match[0], ''),
      }
    : { peakRssMiB: null, cpuMs: null, stderr };
}

/** Parses the `name<<delimiter` blocks the toolkit appends to GITHUB_OUTPUT. */
export function parseOutputFile(text: string): Record<string, string> {
  const outputs: Record<string, string> = {};
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i += 1) {
    const match = /^([^<=]+)<<(.+)$/.exec(lines[i]!);
    if (!match) continue;
    const [, name, delimiter] = match;
    const value: string[] = [];
    for (i += 1; i < lines.length && lines[i] !== delimiter; i += 1) value.push(lines[i]!);
    outputs[name!] = value.join('\n');
  }
  return outputs;
}

function unescapeCommand(text: string): string {
  return text
    .replace(/%0D/g, '\r')
    .replace(/%0A/g, '\n')
    .replace(/%3A/g, ':')
    .replace(/%2C/g, ',')
    .replace(/%25/g, '%');
}

export function parseAnnotations(stdout: string): BundleRun['annotations'] {
  const found: BundleRun['annotations'] = [];
  for (const line of stdout.split('\n')) {
    const match = /^::(error|warning|notice)( [^:]*)?::(.*)$/.exec(line);
    if (!match) continue;
    const properties: Record<string, string> = {};
    for (const pair of (match[2] ?? '').trim().split(',').filter(Boolean)) {
      const eq = pair.indexOf('=');
      properties[pair.slice(0, eq)] = unescapeCommand(pair.slice(eq + 1));
    }
    found.push({ level: match[1]!, properties, message: unescapeCommand(match[3]!) });
  }
  return found;
}

/**
 * Runs the bundled action as the runner does: a child process with the runner's environment
 * (event, repository, workspace, API URL, summary and output files, `INPUT_*`).
 */
export async function runBundle(options: {
  eventName: string;
  event: unknown;
  workspace: string;
  apiUrl: string;
  inputs: Record<string, string>;
  repository: string;
  /** A guard against a hang: the child is killed past this many milliseconds (default 60,000). */
  timeoutMs?: number;
  /** The bundle to run (default: `ACTION_BUNDLE`); the benchmark, compiled elsewhere, names it. */
  bundle?: string;
  /** Options for node before the bundle, e.g. the benchmark's `--require` of a CPU-time report (default: none). */
  nodeArgs?: string[];
}): Promise<BundleRun> {
  // The tests run the committed bundle, which must be built from the sources here (the benchmark,
  // which names its bundle, checks nothing: it loads no vitest-side code).
  const bundle = options.bundle ?? (await import('./fresh-bundle.js')).freshBundle(ACTION_BUNDLE);
  const temp = mkdtempSync(join(tmpdir(), 'context-reach-runner-'));
  const eventPath = join(temp, 'event.json');
  const outputPath = join(temp, 'output.txt');
  const summaryPath = join(temp, 'summary.md');
  writeFileSync(eventPath, JSON.stringify(options.event));
  writeFileSync(outputPath, '');
  writeFileSync(summaryPath, '');
  const env: Record<string, string> = {
    PATH: process.env.PATH ?? '',
    HOME: process.env.HOME ?? temp,
    GITHUB_ACTIONS: 'true',
    GITHUB_EVENT_NAME: options.eventName,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_REPOSITORY: options.repository,
    GITHUB_WORKSPACE: options.workspace,
    GITHUB_API_URL: options.apiUrl,
    GITHUB_SERVER_URL: 'https://github.example',
    GITHUB_STEP_SUMMARY: summaryPath,
    GITHUB_OUTPUT: outputPath,
    RUNNER_TEMP: temp,
  };
  for (const [name, value] of Object.entries(options.inputs))
    env[`INPUT_${name.toUpperCase()}`] = value;
  const started = performance.now();
  const child = spawn(process.execPath, [...(options.nodeArgs ?? []), bundle], {
    cwd: options.workspace,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (chunk) => {
    stdout += chunk;
  });
  child.stderr.on('data', (chunk) => {
    stderr += chunk;
  });
  const code = await new Promise<number | null>((done, fail) => {
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      fail(new Error(`the action did not finish within ${options.timeoutMs ?? 60_000} ms`));
    }, options.timeoutMs ?? 60_000);
    child.on('close', (exit) => {
      clearTimeout(timer);
      done(exit);
    });
  });
  const elapsedMs = performance.now() - started;
  const files: Record<string, string> = {};
  const { readdirSync, statSync } = await import('node:fs');
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else files[path] = readFileSync(path, 'utf8');
    }
  };
  walk(temp);
  const measured = takePeakRss(stderr);
  const outputs = parseOutputFile(readFileSync(outputPath, 'utf8'));
  const summary = readFileSync(summaryPath, 'utf8');
  // Everything the run wrote is in `files`, `outputs` and `summary` now: the folder goes.
  rmSync(temp, { recursive: true, force: true });
  return {
    code,
    stdout,
    stderr: measured.stderr,
    elapsedMs,
    files,
    peakRssMiB: measured.peakRssMiB,
    cpuMs: measured.cpuMs,
    outputs,
    summary,
    annotations: parseAnnotations(stdout),
  };
}

/** A pull_request event payload as GitHub sends it (the fields the action reads, and a few more). */
export function pullRequestEvent(options: {
  owner: string;
  repo: string;
  number: number;
  base: string;
  head: string;
  labels?: string[];
  fork?: boolean;
}) {
  const full = `${options.owner}/${options.repo}`;
  return {
    action: 'synchronize',
    number: options.number,
    pull_request: {
      number: options.number,
      labels: (options.labels ?? []).map((name, i) => ({ id: i + 1, name })),
      base: { sha: options.base, ref: 'main', repo: { full_name: full } },
      head: {
        sha: options.head,
        ref: 'feature',
        repo: { full_name: options.fork ? `someone-else/${options.repo}` : full },
      },
    },
    repository: { name: options.repo, full_name: full, owner: { login: options.owner } },
  };
}

/**
 * Pull request #7 of example-org/model-zoo from `repo`'s base to its head, put on `fake` with
 * `files` as its file list, then the bundled action run on it with the fake's token: what the
 * bundle tests of API faults and hostile reports share.
 */
export async function runBundleOnPullRequest(
  fake: FakeGitHub,
  repo: ScenarioRepo,
  files: FakePullFile[],
  options: { fork?: boolean; workspace?: string } = {},
): Promise<BundleRun> {
  putPullRequest(fake, repo, files, { fork: options.fork });
  return runBundle({
    eventName: 'pull_request',
    event: pullRequestEvent({
      owner: 'example-org',
      repo: 'model-zoo',
      number: 7,
      base: repo.base,
      head: repo.head,
      fork: options.fork,
    }),
    workspace: options.workspace ?? repo.dir,
    apiUrl: fake.url,
    repository: 'example-org/model-zoo',
    inputs: { 'github-token': fake.state.token },
  });
}
