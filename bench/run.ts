/**
 * Benchmark for issue 4: speed of the exact positional scans.
 *
 *   W1  one rotary config, 64 pairs, T = 2^20, all positional metrics in fp32, bf16, fp16
 *       (computeMetrics, in process, median of several warm runs; also cold in a child process)
 *   W2  the same at T = 2^24, wall time and peak RSS measured in a child process
 *   baselines at W1: the straightforward TypeScript loops (bench/straightforward.ts), numpy
 *   (bench/numpy_baseline.py via python3; skipped with a line when missing), and a calibration
 *   loop of one multiply-add per (position, pair) element.
 *   W3  `inspect --json` over 200 generated configs, through dist/cli.js and in process
 *   W4  the bundled action (dist/index.js) on a pull request changing 200 configs, loopback API
 *   start-up  dist/cli.js and dist/index.js to their first line of output, next to a bare node
 *   (W3, W4 and start-up: bench/end-to-end.ts; they need `npm run build` first)
 *   W6  the whole gate (`diff --format json` and the action) on a generated repository of 50, 500
 *       and 3,000 changed configs with blocking findings, each paired with the I/O floor
 *       (bench/gate-workload.ts, bench/gate-repo.ts; the 500-config report is held to the
 *       digest of the report captured at commit 4b26037)
 *
 * All results must agree (counts identical, floats within 1e-9 relative; W3's two ways
 * byte-identical; W4's runs the same decision) before any ratio is printed; then
 * bench/results.json is written. Run from the repository root. Flags: `--runs=N` (default 7),
 * `--baseline-runs=N` (default 3), `--process-runs=N` (W3 through the CLI and W4, default 5),
 * `--startup-runs=N` (default 11), `--w6-runs=N` (default 3), `--w6-sizes=50,500,3000`,
 * `--only=w6` (W6 alone, merged into the existing results.json), `--only=startup` (start-up alone,
 * 21 interleaved runs unless `--startup-runs` says otherwise, merged the same way), `--strict` (exit 1 when a
 * target is missed).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { elementAt } from '../src/core/element-at.js';
import { computeMetrics, frequencyPlan } from '../src/core/metrics/compute.js';
import type { Metrics } from '../src/core/metrics/types.js';
import type { FloatFormat } from '../src/core/model.js';
import { calibrationLoop } from './calibration.js';
import { generatedConfigs } from './configs.js';
import {
  ACTION_BUNDLE,
  CLI_BUNDLE,
  CONFIG_COUNT,
  actionScenario,
  actionStartupMs,
  bareNodeStartupMs,
  cliStartupMs,
  inspectInProcess,
  inspectThroughCli,
} from './end-to-end.js';
import type { ActionRun } from './end-to-end.js';
import { straightforwardScan } from './straightforward.js';
import type { ScanResult } from './straightforward.js';
import { W1, W2 } from './workloads.js';
import { W6_SIZES, W6_TARGETS, runW6, w6Targets, type W6Row } from './gate-workload.js';
import type { Workload } from './workloads.js';

const FORMATS: FloatFormat[] = ['fp32', 'bf16', 'fp16'];
const TARGETS = {
  w1MaxMs: 500,
  w1MaxCalibrationRatio: 4,
  w2MaxRssMiB: 200,
  w2MaxW1Ratio: 20,
  w3MaxMs: 3000,
  w4MaxMs: 5000,
  startupMaxMs: 200,
};

function flag(name: string, fallback: number): number {
  const hit = process.argv.find((a) => a.startsWith(`--${name}=`));
  const n = hit ? Number(hit.split('=')[1]) : fallback;
  return Number.isInteger(n) && n > 0 ? n : fallback;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return elementAt(s, Math.floor(s.length / 2));
}

function timeRuns<T>(runs: number, f: () => T): { ms: number[]; result: T } {
  const ms: number[] = [];
  let result!: T;
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    result = f();
    ms.push(performance.now() - start);
  }
  return { ms, result };
}

/** The scanned metrics of a computeMetrics result, shaped like the baselines' output. */
function scanned(m: Metrics): ScanResult {
  const precision = {} as ScanResult['precision'];
  for (const f of FORMATS) {
    const p = m.precision[f];
    precision[f] = {
      collidingPositions: p.collidingPositions as number,
      angleErrorMax: p.angleErrorMax,
      overflowPosition: p.overflowPosition,
      blurredPairs: p.blurredPairs as number,
    };
  }
  return {
    separationFloor: m.separationFloor,
    separationFloorOffset: m.separationFloorOffset,
    discriminationSpan: m.discriminationSpan,
    precision,
  };
}

/** Differences between two results: counts must be identical, floats within 1e-9 relative. */
function disagreements(a: ScanResult, b: ScanResult, label: string): string[] {
  const out: string[] = [];
  const float = (x: number | null, y: number | null, what: string) => {
    const ok =
      x === null || y === null
        ? x === y
        : Math.abs(x - y) <= 1e-9 * Math.max(Math.abs(y), Number.MIN_VALUE);
    if (!ok) out.push(`${label} ${what}: ${x} vs ${y}`);
  };
  const count = (x: number | null, y: number | null, what: string) => {
    if (x !== y) out.push(`${label} ${what}: ${x} vs ${y}`);
  };
  float(a.separationFloor, b.separationFloor, 'separationFloor');
  count(a.separationFloorOffset, b.separationFloorOffset, 'separationFloorOffset');
  count(a.discriminationSpan, b.discriminationSpan, 'discriminationSpan');
  for (const f of FORMATS) {
    count(
      a.precision[f].collidingPositions,
      b.precision[f].collidingPositions,
      `${f}.collidingPositions`,
    );
    count(
      a.precision[f].overflowPosition,
      b.precision[f].overflowPosition,
      `${f}.overflowPosition`,
    );
    count(a.precision[f].blurredPairs, b.precision[f].blurredPairs, `${f}.blurredPairs`);
    float(a.precision[f].angleErrorMax, b.precision[f].angleErrorMax, `${f}.angleErrorMax`);
  }
  return out;
}

interface ChildReport {
  ms: number;
  maxRssKiB: number;
  result: ScanResult;
}

/** Child mode: one cold computeMetrics run; prints wall time, peak RSS and the scanned metrics. */
function child(name: string): void {
  const w: Workload = name === 'W1' ? W1 : W2;
  const start = performance.now();
  const m = computeMetrics(w.spec);
  const ms = performance.now() - start;
  const report: ChildReport = { ms, maxRssKiB: process.resourceUsage().maxRSS, result: scanned(m) };
  process.stdout.write(JSON.stringify(report));
}

function runChild(name: 'W1' | 'W2'): ChildReport {
  const script = elementAt(process.argv, 1);
  const r = spawnSync(process.execPath, [...process.execArgv, script, `--child=${name}`], {
    encoding: 'utf8',
    maxBuffer: 1 << 24,
  });
  if (r.status !== 0) throw new Error(`child ${name} failed (exit ${r.status}): ${r.stderr}`);
  return JSON.parse(r.stdout) as ChildReport;
}

interface NumpyReport {
  skipped?: string;
  numpy?: string;
  ms?: number[];
  medianMs?: number;
  result?: ScanResult & Record<FloatFormat, ScanResult['precision'][FloatFormat]>;
}

function runNumpy(theta: Float64Array, span: number, runs: number): NumpyReport {
  const script = path.join(process.cwd(), 'bench', 'numpy_baseline.py');
  const r = spawnSync('python3', [script, String(span), String(runs)], {
    input: JSON.stringify(Array.from(theta)),
    encoding: 'utf8',
    maxBuffer: 1 << 24,
  });
  if (r.error) return { skipped: `python3 could not be started: ${r.error.message}` };
  if (r.status !== 0) throw new Error(`numpy baseline failed (exit ${r.status}): ${r.stderr}`);
  return JSON.parse(r.stdout) as NumpyReport;
}

/** `--w6-sizes=50,500`: the W6 sizes to run (default: all). */
function w6Sizes(): number[] {
  const hit = process.argv.find((a) => a.startsWith('--w6-sizes='));
  if (!hit) return [...W6_SIZES];
  return hit
    .split('=')[1]!
    .split(',')
    .map(Number)
    .filter((n) => Number.isInteger(n) && n > 0);
}

/** W6 lines: per size, the medians and the ratio to the floor. */
function printW6(rows: W6Row[], line: (s: string) => void): void {
  const cpu = (x: number | null) => (x === null ? 'n/a' : x.toFixed(0));
  for (const r of rows) {
    line(
      `W6 ${r.configs} configs (${r.blockingChanges} blocking changes; ${r.filesBlocked} files blocked, ${r.blockingFindings} blocking findings): ` +
        `floor ${r.median.floorMs.toFixed(0)} ms (CPU ${cpu(r.median.floorCpuMs)}), diff ${r.median.diffMs.toFixed(0)} ms (CPU ${cpu(r.median.diffCpuMs)}, peak RSS ${r.median.diffRssMiB?.toFixed(1) ?? 'n/a'} MiB) = ${r.ratio.diff.toFixed(2)}x floor (CPU ${r.ratio.diffCpu?.toFixed(2) ?? 'n/a'}x), ` +
        `action ${r.median.actionMs.toFixed(0)} ms (CPU ${cpu(r.median.actionCpuMs)}, peak RSS ${r.median.actionRssMiB?.toFixed(1) ?? 'n/a'} MiB) = ${r.ratio.action.toFixed(2)}x floor (CPU ${r.ratio.actionCpu?.toFixed(2) ?? 'n/a'}x); medians of ${r.diff.length}`,
    );
  }
}

/** `--only=w6`: W6 alone; its results replace `w6` in bench/results.json. */
async function mainW6(): Promise<void> {
  const line = (s: string) => process.stdout.write(`${s}\n`);
  for (const bundle of [CLI_BUNDLE, ACTION_BUNDLE]) {
    if (!existsSync(bundle))
      throw new Error(
        `${path.relative(process.cwd(), bundle)} is missing; W6 runs the bundles: run 'npm run build' first`,
      );
  }
  const loadBefore = os.loadavg();
  const { rows, problems } = await runW6(flag('w6-runs', 3), w6Sizes(), line);
  const loadAfter = os.loadavg();
  printW6(rows, line);
  line(
    `load average (1, 5, 15 min) before ${loadBefore.map((x) => x.toFixed(2)).join(', ')}, after ${loadAfter.map((x) => x.toFixed(2)).join(', ')}`,
  );
  if (problems.length > 0) {
    for (const p of problems) line(`DISAGREEMENT ${p}`);
    line('results disagree: results.json not written');
    process.exitCode = 1;
    return;
  }
  line(
    'W6 reports agree between runs and with the action; the 500-config report matches the digest captured at commit 4b26037',
  );
  const targets = w6Targets(rows);
  for (const [name, ok] of Object.entries(targets)) line(`${ok ? 'met   ' : 'MISSED'} ${name}`);
  const file = path.join(process.cwd(), 'bench', 'results.json');
  const previous = existsSync(file)
    ? (JSON.parse(readFileSync(file, 'utf8')) as Record<string, unknown>)
    : {};
  const w6 = {
    date: new Date().toISOString(),
    node: process.version,
    cpus: os.cpus().length,
    loadAverage: { before: loadBefore, after: loadAfter },
    targets: W6_TARGETS,
    rows,
    targetsMet: targets,
  };
  writeFileSync(file, `${JSON.stringify({ ...previous, w6 }, null, 2)}\n`);
  line('wrote bench/results.json (w6)');
  if (process.argv.includes('--strict') && Object.values(targets).some((ok) => !ok))
    process.exitCode = 1;
}

/** `--only=startup`: start-up alone; its results replace `startup` in bench/results.json. */
async function mainStartup(): Promise<void> {
  const line = (s: string) => process.stdout.write(`${s}\n`);
  for (const bundle of [CLI_BUNDLE, ACTION_BUNDLE]) {
    if (!existsSync(bundle))
      throw new Error(
        `${path.relative(process.cwd(), bundle)} is missing; start-up runs the bundles: run 'npm run build' first`,
      );
  }
  const runs = flag('startup-runs', 21);
  const loadBefore = os.loadavg();
  // Interleaved so a burst of load touches all three alike.
  const startup = { cli: [] as number[], action: [] as number[], node: [] as number[] };
  for (let r = 0; r < runs; r++) {
    startup.node.push(await bareNodeStartupMs());
    startup.cli.push(await cliStartupMs());
    startup.action.push(await actionStartupMs());
  }
  const loadAfter = os.loadavg();
  const medianMs = {
    cli: median(startup.cli),
    action: median(startup.action),
    node: median(startup.node),
  };
  line(
    `start-up to first output, median of ${runs}: dist/cli.js ${medianMs.cli.toFixed(0)} ms, dist/index.js ${medianMs.action.toFixed(0)} ms, bare node ${medianMs.node.toFixed(0)} ms`,
  );
  line(
    `load average (1, 5, 15 min) before ${loadBefore.map((x) => x.toFixed(2)).join(', ')}, after ${loadAfter.map((x) => x.toFixed(2)).join(', ')}`,
  );
  for (const [name, ms] of [
    ['dist/cli.js', medianMs.cli],
    ['dist/index.js', medianMs.action],
  ] as const)
    line(
      `${ms <= TARGETS.startupMaxMs ? 'met   ' : 'MISSED'} ${name} start-up ≤ ${TARGETS.startupMaxMs} ms`,
    );
  const file = path.join(process.cwd(), 'bench', 'results.json');
  const previous = existsSync(file)
    ? (JSON.parse(readFileSync(file, 'utf8')) as Record<string, unknown>)
    : {};
  const entry = {
    date: new Date().toISOString(),
    node: process.version,
    cpus: os.cpus().length,
    loadAverage: { before: loadBefore, after: loadAfter },
    runs,
    cliMs: startup.cli,
    actionMs: startup.action,
    bareNodeMs: startup.node,
    medianMs,
  };
  writeFileSync(file, `${JSON.stringify({ ...previous, startup: entry }, null, 2)}\n`);
  line('wrote bench/results.json (startup)');
}

async function main(): Promise<void> {
  const runs = flag('runs', 7);
  const baselineRuns = flag('baseline-runs', 3);
  const processRuns = flag('process-runs', 5);
  const startupRuns = flag('startup-runs', 11);
  const loadBefore = os.loadavg();
  const strict = process.argv.includes('--strict');
  const theta = frequencyPlan(W1.spec, W1.span, W1.span)!.scaled;
  const line = (s: string) => process.stdout.write(`${s}\n`);
  line(
    `context-reach bench: ${theta.length} pairs, node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown cpu'})`,
  );

  computeMetrics(W1.spec); // warm-up: JIT compiles the scan kernels
  const fast = timeRuns(runs, () => computeMetrics(W1.spec));
  const fastResult = scanned(fast.result);
  line(`W1 engine (warm, in process): median ${median(fast.ms).toFixed(1)} ms over ${runs} runs`);

  calibrationLoop(theta, W1.span);
  const calibration = timeRuns(runs, () => calibrationLoop(theta, W1.span));
  line(
    `calibration loop (${theta.length} x 2^20 multiply-adds): median ${median(calibration.ms).toFixed(1)} ms`,
  );

  const straight = timeRuns(baselineRuns, () => straightforwardScan(theta, W1.span));
  line(
    `straightforward TypeScript loops: median ${median(straight.ms).toFixed(1)} ms over ${baselineRuns} runs`,
  );

  const numpy = runNumpy(theta, W1.span, baselineRuns);
  if (numpy.skipped) line(`numpy baseline skipped: ${numpy.skipped}`);
  else
    line(
      `numpy ${numpy.numpy} baseline: median ${numpy.medianMs!.toFixed(1)} ms over ${baselineRuns} runs`,
    );

  const w1Cold = Array.from({ length: 3 }, () => runChild('W1'));
  const w2 = Array.from({ length: 3 }, () => runChild('W2'));
  const w1ColdMs = median(w1Cold.map((c) => c.ms));
  const w2Ms = median(w2.map((c) => c.ms));
  computeMetrics(W2.spec); // warm-up at W2's span
  const w2Warm = timeRuns(runs, () => computeMetrics(W2.spec));
  const w2WarmMs = median(w2Warm.ms);
  const w2RssMiB = Math.max(...w2.map((c) => c.maxRssKiB)) / 1024;
  line(`W1 engine (cold, child process): median ${w1ColdMs.toFixed(1)} ms`);
  line(
    `W2 engine (cold, child process): median ${w2Ms.toFixed(1)} ms, peak RSS ${w2RssMiB.toFixed(1)} MiB; warm in process: median ${w2WarmMs.toFixed(1)} ms over ${runs} runs`,
  );

  for (const bundle of [CLI_BUNDLE, ACTION_BUNDLE]) {
    if (!existsSync(bundle))
      throw new Error(
        `${path.relative(process.cwd(), bundle)} is missing; W3, W4 and start-up run the bundles: run 'npm run build' first`,
      );
  }
  // W3: the same 200 configs through the bundled CLI (one process per run) and in process (warm).
  const configs = generatedConfigs(CONFIG_COUNT);
  const w3Cli = Array.from({ length: processRuns }, () => inspectThroughCli(configs));
  await inspectInProcess(configs); // warm-up
  const w3Warm: Awaited<ReturnType<typeof inspectInProcess>>[] = [];
  for (let r = 0; r < runs; r++) w3Warm.push(await inspectInProcess(configs));
  const w3CliMs = median(w3Cli.map((c) => c.ms));
  const w3CliCpuMs = medianOrNull(w3Cli.map((c) => c.cpuMs));
  const w3WarmMs = median(w3Warm.map((c) => c.ms));
  line(
    `W3 inspect --json of ${CONFIG_COUNT} configs: dist/cli.js median ${w3CliMs.toFixed(0)} ms (CPU ${fmtNull(w3CliCpuMs, 0)} ms) over ${processRuns} runs; in process (warm) median ${w3WarmMs.toFixed(0)} ms over ${runs} runs`,
  );

  // W4: the bundled action on a pull request changing 200 configs; the first run creates the comment, later runs update it.
  const scenario = await actionScenario(CONFIG_COUNT);
  const w4: ActionRun[] = [];
  try {
    for (let r = 0; r < processRuns; r++) w4.push(await scenario.run());
  } finally {
    await scenario.close();
  }
  const w4Ms = median(w4.map((a) => a.ms));
  const w4CpuMs = medianOrNull(w4.map((a) => a.cpuMs));
  line(
    `W4 action on a pull request changing ${CONFIG_COUNT} configs: median ${w4Ms.toFixed(0)} ms (CPU ${fmtNull(w4CpuMs, 0)} ms) over ${processRuns} runs; verdict ${w4[0]!.verdict}, ${w4[0]!.blocking} blocking, ${w4[0]!.files} files judged`,
  );

  // Start-up, interleaved so a burst of load touches all three alike.
  const startup = { cli: [] as number[], action: [] as number[], node: [] as number[] };
  for (let r = 0; r < startupRuns; r++) {
    startup.node.push(await bareNodeStartupMs());
    startup.cli.push(await cliStartupMs());
    startup.action.push(await actionStartupMs());
  }
  const startupMs = {
    cli: median(startup.cli),
    action: median(startup.action),
    node: median(startup.node),
  };
  line(
    `start-up to first output, median of ${startupRuns}: dist/cli.js ${startupMs.cli.toFixed(0)} ms, dist/index.js ${startupMs.action.toFixed(0)} ms, bare node ${startupMs.node.toFixed(0)} ms`,
  );
  // W6: the whole gate at 50, 500 and 3,000 configs, each beside the I/O floor.
  const w6 = await runW6(flag('w6-runs', 3), w6Sizes(), line);
  printW6(w6.rows, line);
  const loadAfter = os.loadavg();
  line(
    `load average (1, 5, 15 min) before ${loadBefore.map((x) => x.toFixed(2)).join(', ')}, after ${loadAfter.map((x) => x.toFixed(2)).join(', ')}`,
  );

  const problems = [
    ...disagreements(fastResult, straight.result, 'engine vs straightforward'),
    ...w1Cold.flatMap((c) => disagreements(c.result, fastResult, 'cold child vs warm engine')),
    ...w2
      .slice(1)
      .flatMap((c) => disagreements(c.result, elementAt(w2, 0).result, 'W2 run vs W2 run')),
    ...w6.problems,
  ];
  const w3Json = w3Warm[0]!.json;
  if (w3Cli.some((c) => c.json !== w3Json) || w3Warm.some((c) => c.json !== w3Json))
    problems.push('W3 dist/cli.js output differs from the in-process output (or between runs)');
  const decision = (a: ActionRun) => `${a.verdict} ${a.blocking} ${a.files}`;
  if (w4.some((a) => decision(a) !== decision(w4[0]!)) || w4[0]!.files !== CONFIG_COUNT)
    problems.push(
      `W4 runs decided differently or judged the wrong number of files: ${w4.map(decision).join('; ')}`,
    );
  if (w4.some((a) => a.commentUrl === '')) problems.push('W4 wrote no report comment on some run');
  if (numpy.result) {
    const np = numpy.result;
    const shaped: ScanResult = {
      ...np,
      precision: { fp32: np.fp32, bf16: np.bf16, fp16: np.fp16 },
    };
    problems.push(...disagreements(fastResult, shaped, 'engine vs numpy'));
  }
  if (problems.length > 0) {
    for (const p of problems) line(`DISAGREEMENT ${p}`);
    line('results disagree: no ratios printed, results.json not written');
    process.exitCode = 1;
    return;
  }
  line('all results agree (counts identical, floats within 1e-9 relative)');

  const w1Ms = median(fast.ms);
  const ratios = {
    w1OverCalibration: w1Ms / median(calibration.ms),
    straightforwardOverW1: median(straight.ms) / w1Ms,
    numpyOverW1: numpy.medianMs === undefined ? null : numpy.medianMs / w1Ms,
    w2OverW1Cold: w2Ms / w1ColdMs,
    w2OverW1Warm: w2WarmMs / w1Ms,
  };
  const targets = {
    w1WithinMs: w1Ms <= TARGETS.w1MaxMs,
    w1WithinCalibrationRatio: ratios.w1OverCalibration <= TARGETS.w1MaxCalibrationRatio,
    w2WithinRss: w2RssMiB <= TARGETS.w2MaxRssMiB,
    w2WithinW1Ratio:
      ratios.w2OverW1Cold <= TARGETS.w2MaxW1Ratio && ratios.w2OverW1Warm <= TARGETS.w2MaxW1Ratio,
    w3WithinMs: w3CliMs <= TARGETS.w3MaxMs,
    w4WithinMs: w4Ms <= TARGETS.w4MaxMs,
    cliStartupWithinMs: startupMs.cli <= TARGETS.startupMaxMs,
    actionStartupWithinMs: startupMs.action <= TARGETS.startupMaxMs,
    ...w6Targets(w6.rows),
  };
  line(
    `ratios: W1/calibration ${ratios.w1OverCalibration.toFixed(2)} (target <= ${TARGETS.w1MaxCalibrationRatio}), straightforward/W1 ${ratios.straightforwardOverW1.toFixed(1)}, numpy/W1 ${ratios.numpyOverW1 === null ? 'n/a' : ratios.numpyOverW1.toFixed(1)}, W2/W1 ${ratios.w2OverW1Cold.toFixed(2)} both cold, ${ratios.w2OverW1Warm.toFixed(2)} both warm (target <= ${TARGETS.w2MaxW1Ratio}; T is 16 times larger)`,
  );
  for (const [name, ok] of Object.entries(targets)) line(`${ok ? 'met   ' : 'MISSED'} ${name}`);

  const results = {
    date: new Date().toISOString(),
    node: process.version,
    cpus: os.cpus().length,
    cpu: os.cpus()[0]?.model ?? null,
    loadAverage: { before: loadBefore, after: loadAfter },
    pairs: theta.length,
    targets: TARGETS,
    w1: {
      span: W1.span,
      warmMs: fast.ms,
      warmMedianMs: w1Ms,
      coldMs: w1Cold.map((c) => c.ms),
      coldMedianMs: w1ColdMs,
    },
    w2: {
      span: W2.span,
      coldMs: w2.map((c) => c.ms),
      coldMedianMs: w2Ms,
      warmMs: w2Warm.ms,
      warmMedianMs: w2WarmMs,
      peakRssMiB: w2RssMiB,
    },
    w3: {
      configs: CONFIG_COUNT,
      cli: {
        ms: w3Cli.map((c) => c.ms),
        medianMs: w3CliMs,
        cpuMs: w3Cli.map((c) => c.cpuMs),
        cpuMedianMs: w3CliCpuMs,
      },
      inProcess: { ms: w3Warm.map((c) => c.ms), medianMs: w3WarmMs },
    },
    w4: {
      configs: CONFIG_COUNT,
      ms: w4.map((a) => a.ms),
      medianMs: w4Ms,
      cpuMs: w4.map((a) => a.cpuMs),
      cpuMedianMs: w4CpuMs,
      verdict: w4[0]!.verdict,
      blocking: w4[0]!.blocking,
    },
    startup: {
      runs: startupRuns,
      cliMs: startup.cli,
      actionMs: startup.action,
      bareNodeMs: startup.node,
      medianMs: startupMs,
    },
    calibration: { ms: calibration.ms, medianMs: median(calibration.ms) },
    straightforward: { ms: straight.ms, medianMs: median(straight.ms) },
    numpy: numpy.skipped
      ? { skipped: numpy.skipped }
      : { version: numpy.numpy, ms: numpy.ms, medianMs: numpy.medianMs },
    w6: { targets: W6_TARGETS, rows: w6.rows },
    ratios,
    targetsMet: targets,
    w1Result: fastResult,
    w2Result: elementAt(w2, 0).result,
  };
  writeFileSync(
    path.join(process.cwd(), 'bench', 'results.json'),
    `${JSON.stringify(results, null, 2)}\n`,
  );
  line('wrote bench/results.json');
  if (strict && Object.values(targets).some((ok) => !ok)) process.exitCode = 1;
}

function medianOrNull(xs: (number | null)[]): number | null {
  return xs.some((x) => x === null) ? null : median(xs as number[]);
}

function fmtNull(x: number | null, digits: number): string {
  return x === null ? 'n/a' : x.toFixed(digits);
}

const childName = process.argv.find((a) => a.startsWith('--child='))?.split('=')[1];
if (childName) child(childName);
else if (process.argv.includes('--only=w6')) await mainW6();
else if (process.argv.includes('--only=startup')) await mainStartup();
else await main();
