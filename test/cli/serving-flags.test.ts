import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createFileSource } from '../../src/adapters/file-source.js';
import { run } from '../../src/cli/run.js';

// The serving flags of `inspect` and `diff` (issue 11), run in-process on the CLI's own code. The
// 70B-class shape: 80 layers, 64 heads, 8 key/value heads of 128 (Touvron et al. 2023, Llama 2:
// grouped-query attention with 8 key/value heads for the 70B model; widths from memory).

const SEVENTY_B = JSON.stringify(
  {
    model_type: 'llama',
    hidden_size: 8192,
    intermediate_size: 28672,
    num_hidden_layers: 80,
    num_attention_heads: 64,
    num_key_value_heads: 8,
    vocab_size: 32000,
    max_position_embeddings: 4096,
    rope_theta: 10000,
    hidden_act: 'silu',
    tie_word_embeddings: false,
    torch_dtype: 'float16',
  },
  null,
  2,
);

async function inspect(args: string[]): Promise<{ code: number; out: string; err: string }> {
  const dir = mkdtempSync(join(tmpdir(), 'context-reach-flags-'));
  const path = join(dir, 'config.json');
  writeFileSync(path, SEVENTY_B);
  let out = '';
  let err = '';
  const io = {
    out: (t: string) => {
      out += t;
    },
    error: (t: string) => {
      err += t;
    },
    stdout: {},
    env: { NO_COLOR: '1' },
    cwd: dir,
  };
  try {
    const code = await run(['inspect', path, ...args], { files: createFileSource(), io });
    return { code, out, err };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('inspect --tensor-parallel and --pipeline-parallel', () => {
  it('fits a 70B-class config over 8 devices of 80 GiB and says how many sequences fit per replica', async () => {
    const { code, out } = await inspect(['--tensor-parallel', '8', '--device-gib', '80']);
    expect(code).toBe(0);
    expect(out).toContain('Findings\n    none');
    expect(out).toMatch(/devices per replica\s+8\n/);
    expect(out).toMatch(/key\/value heads per device\s+1\n/);
    // 137,953,296,384 / 8 = 17,244,162,048 bytes = 16.06 GiB; (72 GiB − that) / (4,096 × 40,960) = 358.
    expect(out).toContain(
      'Per device, 8 devices (tensor-parallel 8 × pipeline-parallel 1): weights 16.1 GiB, cache 160 MiB at 4,096 tokens × 1 sequence',
    );
    expect(out).toContain(
      '358 sequences of 4,096 tokens fit per replica in 72 GiB usable of 80 GiB per device (after the 10 % reserve kept for activations, workspace and fragmentation)',
    );
  });

  it('blocks the same config on one 80 GiB device, with a tensor degree as a remedy', async () => {
    const { out } = await inspect(['--device-gib', '80']);
    expect(out).toContain('block memory-over-budget');
    expect(out).toMatch(/fix: the policy serving\.tensor-parallel not set → 2 ⇒/);
  });

  it('blocks --tensor-parallel 3 and names the degrees that shard 64 heads and 8 key/value heads', async () => {
    const { code, out } = await inspect(['--tensor-parallel', '3', '--device-gib', '80']);
    expect(code).toBe(0);
    expect(out).toContain('block layout-unshardable');
    expect(out).toContain(
      'The tensor-parallel degree 3 (command line) cannot shard the attention: 3 does not divide the 64 attention heads; use a tensor-parallel degree of 1, 2, 4, 8, 16, 32 or 64.',
    );
    expect(out).toMatch(/fix: command line serving\.tensor-parallel 3 → 4 ⇒/);
  });

  it('blocks more pipeline stages than layers', async () => {
    const { out } = await inspect(['--pipeline-parallel', '81']);
    expect(out).toContain(
      'The pipeline-parallel degree 81 (command line) is more than the 80 layers, so a stage would hold none; use at most 80 stages.',
    );
  });

  it('refuses a degree that is not a positive whole number', async () => {
    const { code, err } = await inspect(['--tensor-parallel', '0']);
    expect(code).toBe(2);
    expect(err).toContain("--tensor-parallel takes a positive whole number, got '0'");
  });

  it('counts int4 weights in groups of 128 from --weight-dtype and --weight-group-size', async () => {
    const { out } = await inspect([
      '--weight-dtype',
      'int4',
      '--weight-group-size',
      '128',
      '--json',
    ]);
    const metrics = JSON.parse(out).files[0].metrics;
    // 68,451,041,280 matrix weights at 4.125 bits, 525,606,912 others in bf16.
    expect(metrics.weightBytes).toBe((68_451_041_280 * 4.125) / 8 + 525_606_912 * 2);
  });
});
