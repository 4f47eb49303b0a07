/**
 * W6 of issue 16: the whole gate on a generated repository (bench/gate-repo.ts) of 50, 500 and
 * 3,000 changed configs, each run paired in the same round with the I/O floor:
 *
 *   diff     `node dist/cli.js diff --format json` in the repository (one process, wall time from
 *            spawn to exit; CPU time and peak RSS of the process and its git children from
 *            `/usr/bin/time` when the system has it);
 *   action   `node dist/index.js` as the runner starts it, against the loopback REST stand-in of
 *            the tests (labels read, the report comment written), measured the same way;
 *   floor    a node process that does only the I/O every judgement needs: `git diff
 *            --name-status`, one `git cat-file --batch` of every base and head blob, and
 *            `JSON.parse` of each (the own-dialect YAML files are decoded, not parsed).
 *
 * The 500-config report must equal, byte for byte (the `version` line aside), the report the
 * code of commit 4b26037 wrote for the same repository: its SHA-256 is in GATE_REPORT_SHA256.
 */
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { putPullRequest, startFakeGitHub } from '../test/support/fake-github.js';
import { pullRequestEvent } from '../test/support/run-bundle.js';
import type { GateRepo } from './gate-repo.js';

const CLI_BUNDLE = path.join(process.cwd(), 'dist', 'cli.js');
const ACTION_BUNDLE = path.join(process.cwd(), 'dist', 'index.js');
const TIME = '/usr/bin/time';

/**
 * SHA-256 of the JSON report of `diff --format json` over the 500-config W6 repository (seed 16)
 * with its `"version": N` line removed, as the code of commit 4b26037 wrote it (re-captured
 * there, after the merges of issues 10–16 changed the report; the first digest, from commit
 * 6cb40a5 before issue 16, was 35d8fe48…). Speed work holds the report to it byte for byte.
 */
export const GATE_REPORT_SHA256 =
  '660bdd87b063d53e05918181dbb7c8c43f9f8477d9aa06e097597937d654c0ae';

/** One timed process: wall time, and CPU time (user + system, children included) and peak RSS when measurable. */
export interface Timed {
  ms: number;
  cpuMs: number | null;
  peakRssMiB: number | null;
}

/** A process run under `/usr/bin/time` (when present), its output collected. */
async function timedProcess(
  args: string[],
  options: { cwd: string; env?: Record<string, string>; timeoutMs?: number },
): Promise<Timed & { code: number | null; stdout: string; stderr: string }> {
  const measured = existsSync(TIME);
  const command = measured ? TIME : process.execPath;
  const full = measured ? ['-f', '@@time %e %U %S %M', process.execPath, ...args] : args;
  const started = performance.now();
  const child = spawn(command, full, {
    cwd: options.cwd,
    env: options.env ?? process.env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const out: Buffer[] = [];
  let stderr = '';
  child.stdout.on('data', (chunk: Buffer) => out.push(chunk));
  child.stderr.on('data', (chunk) => {
    stderr += chunk;
  });
  const code = await new Promise<number | null>((done, fail) => {
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      fail(
        new Error(
          `node ${args.join(' ').slice(0, 200)} did not finish within ${options.timeoutMs ?? 600_000} ms`,
        ),
      );
    }, options.timeoutMs ?? 600_000);
    child.on('close', (exit) => {
      clearTimeout(timer);
      done(exit);
    });
  });
  const ms = performance.now() - started;
  const match = /@@time ([\d.]+) ([\d.]+) ([\d.]+) (\d+)/.exec(stderr);
  return {
    ms,
    code,
    stdout: Buffer.concat(out).toString('utf8'),
    stderr,
    cpuMs: match ? (Number(match[2]) + Number(match[3])) * 1000 : null,
    peakRssMiB: match ? Number(match[4]) / 1024 : null,
  };
}

/** `diff --format json` through the CLI bundle; resolves with the report text. */
export async function diffThroughCli(repo: GateRepo): Promise<Timed & { json: string }> {
  const r = await timedProcess(
    [CLI_BUNDLE, 'diff', '--base', repo.base, '--head', repo.head, '--format', 'json'],
    { cwd: repo.dir },
  );
  if (r.code !== 0 && r.code !== 1)
    throw new Error(`dist/cli.js diff exited with ${r.code}: ${r.stderr.slice(0, 2000)}`);
  return { ms: r.ms, cpuMs: r.cpuMs, peakRssMiB: r.peakRssMiB, json: r.stdout };
}

/** The I/O floor: a node process reading what the gate reads, the fewest ways git allows. */
export async function ioFloor(repo: GateRepo): Promise<Timed & { blobs: number }> {
  const script = path.join(path.dirname(new URL(import.meta.url).pathname), 'io-floor.js');
  const r = await timedProcess([script, repo.base, repo.head], { cwd: repo.dir });
  if (r.code !== 0)
    throw new Error(`the I/O floor exited with ${r.code}: ${r.stderr.slice(0, 2000)}`);
  return { ms: r.ms, cpuMs: r.cpuMs, peakRssMiB: r.peakRssMiB, blobs: Number(r.stdout.trim()) };
}

/** The hash the 500-config report is held to: SHA-256 of the report less its `version` line. */
export function reportDigest(json: string): string {
  return createHash('sha256')
    .update(json.replace(/^ {2}"version": \d+,\n/m, ''))
    .digest('hex');
}

const OWNER = 'example-org';
const REPO = 'model-zoo';

/** The bundled action on the W6 pull request: local git for the reads, the loopback API for labels and the comment. */
export async function actionScenario(repo: GateRepo, files: string[]) {
  const fake = await startFakeGitHub({ owner: OWNER, repo: REPO });
  putPullRequest(
    fake,
    repo,
    files.map((f) => ({ filename: f, status: 'modified' as const })),
  );
  // The stand-in reads GitHub's REST description on its first request: the harness's cost, paid before timing.
  await fetch(`${fake.url}/repos/${OWNER}/${REPO}/pulls/7`, {
    headers: { authorization: `token ${fake.state.token}` },
  }).then((r) => r.arrayBuffer());
  return {
    async run(): Promise<
      Timed & { verdict: string; blocking: number; json: string; commentWritten: boolean }
    > {
      const temp = mkdtempSync(path.join(tmpdir(), 'context-reach-w6-runner-'));
      try {
        const eventPath = path.join(temp, 'event.json');
        const outputPath = path.join(temp, 'output.txt');
        const summaryPath = path.join(temp, 'summary.md');
        const reportPath = path.join(temp, 'report.json');
        writeFileSync(
          eventPath,
          JSON.stringify(
            pullRequestEvent({
              owner: OWNER,
              repo: REPO,
              number: 7,
              base: repo.base,
              head: repo.head,
            }),
          ),
        );
        writeFileSync(outputPath, '');
        writeFileSync(summaryPath, '');
        const env: Record<string, string> = {
          PATH: process.env.PATH ?? '',
          HOME: process.env.HOME ?? temp,
          GITHUB_ACTIONS: 'true',
          GITHUB_EVENT_NAME: 'pull_request',
          GITHUB_EVENT_PATH: eventPath,
          GITHUB_REPOSITORY: `${OWNER}/${REPO}`,
          GITHUB_WORKSPACE: repo.dir,
          GITHUB_API_URL: fake.url,
          GITHUB_SERVER_URL: 'https://github.example',
          GITHUB_STEP_SUMMARY: summaryPath,
          GITHUB_OUTPUT: outputPath,
          RUNNER_TEMP: temp,
          'INPUT_GITHUB-TOKEN': fake.state.token,
          'INPUT_FAIL-ON': 'block',
          INPUT_COMMENT: 'update',
          'INPUT_REPORT-JSON': reportPath,
        };
        const comments = fake.state.comments.length;
        const r = await timedProcess([ACTION_BUNDLE], { cwd: repo.dir, env });
        if (r.code !== 0 && r.code !== 1)
          throw new Error(
            `dist/index.js exited with ${r.code}: ${r.stderr.slice(0, 2000)} ${r.stdout.slice(-2000)}`,
          );
        if (fake.mismatches.length > 0)
          throw new Error(
            `the action made requests GitHub's REST description does not allow: ${JSON.stringify(fake.mismatches.slice(0, 3))}`,
          );
        const outputs = readFileSync(outputPath, 'utf8');
        const verdict =
          /verdict<<(\S+)\n(.*)\n/.exec(outputs)?.[2] ?? /^verdict=(.*)$/m.exec(outputs)?.[1] ?? '';
        const blocking = Number(
          /blocking<<(\S+)\n(.*)\n/.exec(outputs)?.[2] ?? /^blocking=(.*)$/m.exec(outputs)?.[1],
        );
        return {
          ms: r.ms,
          cpuMs: r.cpuMs,
          peakRssMiB: r.peakRssMiB,
          verdict,
          blocking,
          json: existsSync(reportPath) ? readFileSync(reportPath, 'utf8') : '',
          commentWritten:
            fake.state.comments.length > comments || /comment-url<<\S+\nhttp/.test(outputs),
        };
      } finally {
        rmSync(temp, { recursive: true, force: true });
      }
    },
    async close() {
      await fake.close();
    },
  };
}

/** Goals of W6 (issue 16). */
export const W6_TARGETS = { largeMaxMs: 10_000, largeMaxRssMiB: 256, smallMaxFloorRatio: 5 };

/** Sizes of the W6 repository, in changed configs. */
export const W6_SIZES = [50, 500, 3000] as const;

export interface W6Row {
  configs: number;
  blockingChanges: number;
  blockingFindings: number;
  filesBlocked: number;
  floor: Timed[];
  diff: Timed[];
  action: Timed[];
  median: {
    floorMs: number;
    diffMs: number;
    actionMs: number;
    diffCpuMs: number | null;
    actionCpuMs: number | null;
    floorCpuMs: number | null;
    diffRssMiB: number | null;
    actionRssMiB: number | null;
  };
  /** Wall time over the floor's; `diffCpu`, `actionCpu`: CPU time over the floor's (null without CPU times). */
  ratio: { diff: number; action: number; diffCpu: number | null; actionCpu: number | null };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const medianOrNull = (xs: (number | null)[]) =>
  xs.some((x) => x === null) ? null : median(xs as number[]);
const maxOrNull = (xs: (number | null)[]) =>
  xs.some((x) => x === null) ? null : Math.max(...(xs as number[]));

/**
 * W6 over every size: per round the floor, `diff` and the action one after the other, so a burst
 * of load touches all three alike. Returns the rows and every disagreement found (reports that
 * differ between runs or from the captured digest, a wrong number of files, no comment).
 */
export async function runW6(
  runs: number,
  sizes: readonly number[] = W6_SIZES,
  log: (line: string) => void = () => {},
): Promise<{ rows: W6Row[]; problems: string[] }> {
  const { writeGateRepository } = await import('./gate-repo.js');
  const rows: W6Row[] = [];
  const problems: string[] = [];
  for (const count of sizes) {
    const repo = writeGateRepository(count);
    const files = (await import('./gate-repo.js')).gateRepository(count).head.map((f) => f.path);
    const action = await actionScenario(repo, files);
    const row: W6Row = {
      configs: count,
      blockingChanges: repo.blockingChanges,
      blockingFindings: 0,
      filesBlocked: 0,
      floor: [],
      diff: [],
      action: [],
      median: null!,
      ratio: null!,
    };
    let diffJson: string | null = null;
    try {
      for (let r = 0; r < runs; r++) {
        const floor = await ioFloor(repo);
        if (floor.blobs !== 2 * count)
          problems.push(`W6 ${count}: the floor read ${floor.blobs} blobs; expected ${2 * count}`);
        const diff = await diffThroughCli(repo);
        const acted = await action.run();
        row.floor.push({ ms: floor.ms, cpuMs: floor.cpuMs, peakRssMiB: floor.peakRssMiB });
        row.diff.push({ ms: diff.ms, cpuMs: diff.cpuMs, peakRssMiB: diff.peakRssMiB });
        row.action.push({ ms: acted.ms, cpuMs: acted.cpuMs, peakRssMiB: acted.peakRssMiB });
        log(
          `W6 ${count} run ${r + 1}: floor ${floor.ms.toFixed(0)} ms, diff ${diff.ms.toFixed(0)} ms (CPU ${diff.cpuMs?.toFixed(0) ?? 'n/a'}), action ${acted.ms.toFixed(0)} ms (CPU ${acted.cpuMs?.toFixed(0) ?? 'n/a'})`,
        );
        if (diffJson !== null && diff.json !== diffJson)
          problems.push(`W6 ${count}: diff reports differ between runs`);
        diffJson ??= diff.json;
        if (acted.json !== diff.json)
          problems.push(`W6 ${count}: the action's JSON report differs from diff's`);
        if (!acted.commentWritten) problems.push(`W6 ${count}: the action wrote no comment`);
      }
    } finally {
      await action.close();
      repo.remove();
    }
    const report = JSON.parse(diffJson!) as { blocking: number; files: { verdict: string }[] };
    row.blockingFindings = report.blocking;
    row.filesBlocked = report.files.filter((f) => f.verdict === 'block').length;
    if (report.files.length !== count)
      problems.push(
        `W6 ${count}: the report judged ${report.files.length} files; expected ${count}`,
      );
    if (count === 500 && reportDigest(diffJson!) !== GATE_REPORT_SHA256) {
      problems.push(
        `W6 500: the JSON report (version line aside) has SHA-256 ${reportDigest(diffJson!)}; commit 4b26037 wrote ${GATE_REPORT_SHA256}`,
      );
    }
    row.median = {
      floorMs: median(row.floor.map((t) => t.ms)),
      diffMs: median(row.diff.map((t) => t.ms)),
      actionMs: median(row.action.map((t) => t.ms)),
      floorCpuMs: medianOrNull(row.floor.map((t) => t.cpuMs)),
      diffCpuMs: medianOrNull(row.diff.map((t) => t.cpuMs)),
      actionCpuMs: medianOrNull(row.action.map((t) => t.cpuMs)),
      diffRssMiB: maxOrNull(row.diff.map((t) => t.peakRssMiB)),
      actionRssMiB: maxOrNull(row.action.map((t) => t.peakRssMiB)),
    };
    const cpuRatio = (x: number | null) =>
      x === null || row.median.floorCpuMs === null ? null : x / row.median.floorCpuMs;
    row.ratio = {
      diff: row.median.diffMs / row.median.floorMs,
      action: row.median.actionMs / row.median.floorMs,
      diffCpu: cpuRatio(row.median.diffCpuMs),
      actionCpu: cpuRatio(row.median.actionCpuMs),
    };
    rows.push(row);
  }
  return { rows, problems };
}

/** Whether the W6 rows meet the goals (sizes not run count as met). */
export function w6Targets(rows: W6Row[]): Record<string, boolean> {
  const large = rows.find((r) => r.configs === 3000);
  const small = rows.find((r) => r.configs === 50);
  return {
    w6LargeWithinMs:
      !large ||
      (large.median.diffMs <= W6_TARGETS.largeMaxMs &&
        large.median.actionMs <= W6_TARGETS.largeMaxMs),
    w6LargeWithinRss:
      !large ||
      ((large.median.diffRssMiB ?? 0) <= W6_TARGETS.largeMaxRssMiB &&
        (large.median.actionRssMiB ?? 0) <= W6_TARGETS.largeMaxRssMiB),
    w6SmallWithinFloorRatio:
      !small ||
      (small.ratio.diff <= W6_TARGETS.smallMaxFloorRatio &&
        small.ratio.action <= W6_TARGETS.smallMaxFloorRatio),
    // The same goals in CPU time, which a machine busy with other work inflates far less.
    w6LargeWithinCpuMs:
      !large ||
      ((large.median.diffCpuMs ?? Infinity) <= W6_TARGETS.largeMaxMs &&
        (large.median.actionCpuMs ?? Infinity) <= W6_TARGETS.largeMaxMs),
    w6SmallWithinFloorCpuRatio:
      !small ||
      ((small.ratio.diffCpu ?? Infinity) <= W6_TARGETS.smallMaxFloorRatio &&
        (small.ratio.actionCpu ?? Infinity) <= W6_TARGETS.smallMaxFloorRatio),
  };
}
