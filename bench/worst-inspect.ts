/**
 * The costliest single judgement (issue 16: every `inspect`, remedy search included, within
 * 0.5 s of CPU for any config with a span up to 2^31): one checkpoint config per process-free
 * gate run (`runGate` in process on a one-file pull request, so blocking findings get their
 * remedies searched and proven), over a grid of head sizes, rotary bases, declared spans, served
 * spans past the reach, position formats and a device-memory budget. CPU time of this process
 * (`process.cpuUsage`) per judgement, a fresh memo each; prints the worst configs and writes
 * bench/worst-inspect.json. Run with `npm run bench:worst` (`--quick` for a smaller grid).
 */
import { writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { judgeAddedConfig } from '../test/support/one-config-gate.js';

interface Case {
  /** The policy's limit that blocks: on the discrimination span, or on the separation floor. */
  limit: 'discriminationSpan' | 'separationFloor';
  headDim: number;
  base: number;
  declared: number;
  served: number;
  positions: 'fp32' | 'bf16' | 'fp16' | null;
}

const quick = process.argv.includes('--quick');
const HEAD_DIMS = quick ? [4, 64, 256] : [2, 4, 8, 16, 32, 64, 128, 256];
const BASES = quick ? [1.0001, 10_000, 1e8] : [1.0001, 1.01, 2, 100, 10_000, 500_000, 1e8];
const SPANS = quick ? [2 ** 26, 2 ** 31 - 1] : [2 ** 24, 2 ** 26, 2 ** 27, 2 ** 29, 2 ** 31 - 1];
const FORMATS: Case['positions'][] = quick ? [null, 'bf16'] : [null, 'bf16', 'fp16'];
const LIMITS: Case['limit'][] = ['discriminationSpan', 'separationFloor'];

const cases: Case[] = [];
for (const limit of LIMITS)
  for (const headDim of HEAD_DIMS)
    for (const base of BASES)
      for (const span of SPANS)
        for (const positions of FORMATS) {
          // Served at the span itself (declared half of it), and at twice the declared span.
          cases.push({
            limit,
            headDim,
            base,
            declared: Math.floor(span / 2),
            served: span,
            positions,
          });
          if (span < 2 ** 31 - 1)
            cases.push({
              limit,
              headDim,
              base,
              declared: span,
              served: Math.min(2 * span, 2 ** 31 - 1),
              positions,
            });
        }

const POLICY = (c: Case) =>
  [
    'serving:',
    `  span: ${c.served}`,
    '  sequences: 1',
    '  device-memory-gib: 80',
    ...(c.positions ? [`  positions: ${c.positions}`] : []),
    'limits:',
    ...(c.limit === 'discriminationSpan'
      ? ['  discriminationSpan:', '    min: 4096', '    severity: block']
      : ['  separationFloor:', '    min: 0.05', '    severity: block']),
    '',
  ].join('\n');

function config(c: Case): string {
  return JSON.stringify(
    {
      model_type: 'llama',
      hidden_size: 2048,
      intermediate_size: 5632,
      num_hidden_layers: 16,
      num_attention_heads: 16,
      num_key_value_heads: 4,
      head_dim: c.headDim,
      vocab_size: 32000,
      max_position_embeddings: c.declared,
      rope_theta: c.base,
      torch_dtype: 'bfloat16',
    },
    null,
    2,
  );
}

async function judge(c: Case): Promise<{ cpuMs: number; blocking: number; incomplete: boolean }> {
  const { report, cpuMs } = await judgeAddedConfig(config(c), POLICY(c));
  const findings = report.files[0]?.findings ?? [];
  return {
    cpuMs,
    blocking: report.blocking,
    incomplete: findings.some((f) => f.rule === 'scan-incomplete'),
  };
}

const describe = (c: Case) =>
  `${c.limit} limit, head_dim ${c.headDim}, rope_theta ${c.base}, max_position_embeddings ${c.declared}, served ${c.served}${c.positions ? `, positions ${c.positions}` : ''}`;

const line = (s: string) => process.stdout.write(`${s}\n`);
line(
  `worst single judgement: ${cases.length} configs, node ${process.version}, load ${os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(', ')}`,
);
// Warm the engine on a cheap config, so the first case does not pay for compiling.
await judge({
  limit: 'discriminationSpan',
  headDim: 128,
  base: 10_000,
  declared: 4096,
  served: 4096,
  positions: null,
});
const rows: (Case & { cpuMs: number; blocking: number; incomplete: boolean })[] = [];
for (const c of cases) {
  const r = await judge(c);
  rows.push({ ...c, ...r });
  if (r.cpuMs > 300) line(`${r.cpuMs.toFixed(0).padStart(6)} ms CPU  ${describe(c)}`);
}
rows.sort((a, b) => b.cpuMs - a.cpuMs);
line('worst ten:');
for (const r of rows.slice(0, 10))
  line(
    `${r.cpuMs.toFixed(0).padStart(6)} ms CPU  ${describe(r)}  (${r.blocking} blocking${r.incomplete ? ', scan-incomplete' : ''})`,
  );
writeFileSync(
  path.join(process.cwd(), 'bench', 'worst-inspect.json'),
  `${JSON.stringify(
    {
      date: new Date().toISOString(),
      node: process.version,
      load: os.loadavg(),
      configs: rows.length,
      worst: rows.slice(0, 20),
    },
    null,
    2,
  )}\n`,
);
line('wrote bench/worst-inspect.json');
