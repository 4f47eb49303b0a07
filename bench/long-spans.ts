/**
 * Long spans and hostile frequency sets through the bundled CLI: one `inspect --json` process per
 * config, spans from 2^24 to 2^31 - 1 (the scan bound), wall clock and the process's own CPU time
 * (bench/cpu-report.cjs), plus whether the similarity scan finished inside `MAX_SCAN_WORK` or
 * stopped with `scan-incomplete`. Run with `npm run bench:spans` after `npm run build`; writes
 * bench/long-spans.json. The figure to reach (issue 5): every file judged within 2 s.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const CLI = path.join(process.cwd(), 'dist', 'cli.js');
const CPU_REPORT = path.join(process.cwd(), 'bench', 'cpu-report.cjs');
const RUNS = 3;

interface Case {
  name: string;
  headDim: number;
  base: number;
  span: number;
}

const cases: Case[] = [];
for (const e of [24, 25, 27, 29, 31]) {
  const span = e === 31 ? 2 ** 31 - 1 : 2 ** e;
  cases.push({
    name: `64 pairs, base 500000, 2^${e}${e === 31 ? ' - 1' : ''}`,
    headDim: 128,
    base: 500000,
    span,
  });
  cases.push({
    name: `64 pairs, base 10000, 2^${e}${e === 31 ? ' - 1' : ''}`,
    headDim: 128,
    base: 10000,
    span,
  });
}
for (const [headDim, base] of [
  [2, 10000],
  [4, 1.0001],
  [8, 1.0001],
  [32, 1.0001],
  [256, 1e8],
] as const) {
  cases.push({
    name: `${headDim / 2} pair${headDim === 2 ? '' : 's'}, base ${base}, 2^31 - 1`,
    headDim,
    base,
    span: 2 ** 31 - 1,
  });
}

function config(c: Case): string {
  return JSON.stringify(
    {
      model_type: 'llama',
      hidden_size: 4096,
      intermediate_size: 14336,
      num_hidden_layers: 32,
      num_attention_heads: 32,
      num_key_value_heads: 8,
      head_dim: c.headDim,
      vocab_size: 128256,
      max_position_embeddings: c.span,
      rope_theta: c.base,
      torch_dtype: 'bfloat16',
    },
    null,
    2,
  );
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const folder = mkdtempSync(path.join(os.tmpdir(), 'context-reach-bench-spans-'));
const rows: {
  name: string;
  span: number;
  wallMs: number;
  cpuMs: number;
  complete: boolean;
  angleErrorMaxFp32: number | null;
}[] = [];
const line = (s: string) => process.stdout.write(`${s}\n`);
line(
  `long spans through dist/cli.js: node ${process.version}, ${os.cpus().length} cores, load ${os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(', ')}`,
);
try {
  for (const c of cases) {
    const file = path.join(folder, 'config.json');
    writeFileSync(file, config(c));
    const wall: number[] = [];
    const cpu: number[] = [];
    let out = '';
    for (let r = 0; r < RUNS; r++) {
      const started = performance.now();
      const child = spawnSync(
        process.execPath,
        ['--require', CPU_REPORT, CLI, 'inspect', file, '--json'],
        { encoding: 'utf8', timeout: 120_000 },
      );
      wall.push(performance.now() - started);
      const match = /bench-cpu-us (\d+)/.exec(child.stderr);
      cpu.push(match ? Number(match[1]) / 1000 : NaN);
      out = child.stdout;
    }
    const report = JSON.parse(out) as {
      files: {
        metrics: { precision: { fp32: { angleErrorMax: number | null } } };
        findings: { rule: string }[];
      }[];
    };
    const complete = !report.files[0]!.findings.some((f) => f.rule === 'scan-incomplete');
    const row = {
      name: c.name,
      span: c.span,
      wallMs: median(wall),
      cpuMs: median(cpu),
      complete,
      angleErrorMaxFp32: report.files[0]!.metrics.precision.fp32.angleErrorMax,
    };
    rows.push(row);
    line(
      `${c.name.padEnd(34)} ${row.wallMs.toFixed(0).padStart(5)} ms wall ${row.cpuMs.toFixed(0).padStart(5)} ms CPU  ${complete ? 'complete' : 'scan-incomplete'}`,
    );
  }
} finally {
  rmSync(folder, { recursive: true, force: true });
}
const worst = Math.max(...rows.map((r) => r.cpuMs));
line(
  `worst CPU ${worst.toFixed(0)} ms, worst wall ${Math.max(...rows.map((r) => r.wallMs)).toFixed(0)} ms (target: 2000 ms per file)`,
);
writeFileSync(
  path.join(process.cwd(), 'bench', 'long-spans.json'),
  `${JSON.stringify({ date: new Date().toISOString(), node: process.version, cpus: os.cpus().length, runs: RUNS, rows }, null, 2)}\n`,
);
line('wrote bench/long-spans.json');
