import { describe, expect, it } from 'vitest';
import type { GateReport } from '../../src/core/report/types.js';
import { runGate } from '../../src/core/gate.js';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { readGateJson } from '../../src/core/report/read.js';
import { renderGateJson } from '../../src/core/render/gate-json.js';
import { renderFileText } from '../../src/core/render/inspect-text.js';
import { fixture } from '../parse/helpers.js';
import { checkpointConfig } from '../support/scenario-repo.js';

function textOf(name: string, span?: number): string {
  const r = readModel(fixture(name), name);
  const spec = span === undefined ? r.spec : { ...r.spec, serving: { ...r.spec.serving, span } };
  return renderFileText({
    path: name,
    dialect: r.dialect,
    spec,
    metrics: computeMetrics(spec),
    findings: r.findings,
    locations: r.locations,
  });
}

describe('renderFileText shows layer kinds and shapes', () => {
  it('lists each kind of layer with its window, rotary base and scans (Gemma-3-style local and global layers)', () => {
    const lines = textOf('gemma3-4b-text-scaled.json', 32768).split('\n');
    const start = lines.findIndex((l) => l.includes('Layer kinds'));
    expect(lines[start]).toContain("top-level values are the full-attention layers'");
    expect(lines[start + 2]).toMatch(/^ +29 {2}sliding +1,024 \(1k\) {2}rotary 10,000 /);
    expect(lines[start + 3]).toMatch(/^ +5 {2}full +all {2}rotary 1,000,000, scaled /);
  });

  it('says when the full-attention layers have no position code (Llama-4-style chunked layers)', () => {
    const text = textOf('llama4-chunked-experts.json', 16384);
    expect(text).toContain("top-level values are the model's own code over the whole span");
    expect(text).toContain('1 of 16 experts × 8,192 + 1 shared');
  });

  it('names latent attention and encoder-only stacks in the header', () => {
    expect(textOf('deepseek-v2-lite-latent.json', 4096)).toContain(
      '6 of 64 experts × 1,408 + 2 shared, 1 dense layer · latent attention, cache 512 + 64 per token and layer',
    );
    expect(textOf('bert-absolute.json')).toContain('encoder-only, no decoding cache');
    expect(textOf('llama2-7b-shape.json')).not.toContain('Layer kinds');
  });
});

async function report(head: Record<string, unknown>): Promise<GateReport> {
  const path = 'models/a/config.json';
  const files: Record<string, Record<string, Uint8Array>> = {
    ['b'.repeat(40)]: { [path]: new TextEncoder().encode(checkpointConfig()) },
    ['c'.repeat(40)]: { [path]: new TextEncoder().encode(checkpointConfig(head)) },
  };
  return runGate(
    { read: async (ref, p) => files[ref]?.[p] ?? null },
    {
      base: 'b'.repeat(40),
      head: 'c'.repeat(40),
      changes: [{ status: 'modified', path, previousPath: null }],
      policyPath: 'p.yml',
    },
  );
}

describe('readGateJson keeps the new shapes', () => {
  it('reads back latent attention, experts widths, layer kinds and their metrics as written', async () => {
    const original = await report({
      kv_lora_rank: 512,
      qk_rope_head_dim: 64,
      qk_nope_head_dim: 128,
      v_head_dim: 128,
      n_routed_experts: 8,
      num_experts_per_tok: 2,
      moe_intermediate_size: 1024,
      n_shared_experts: 1,
      sliding_window: 1024,
      layer_types: Array.from({ length: 16 }, (_, i) =>
        i % 4 === 3 ? 'full_attention' : 'sliding_attention',
      ),
      rope_local_base_freq: 10000,
    });
    const head = original.files[0]!.head!;
    expect(head.spec.latent).toEqual({
      kvRank: 512,
      qRank: null,
      ropeDim: 64,
      nopeDim: 128,
      valueDim: 128,
    });
    expect(head.metrics.layerKinds!.length).toBe(2);
    const back = readGateJson(renderGateJson(original), 'report.json').files[0]!.head!;
    expect(back.spec.latent).toEqual(head.spec.latent);
    expect(back.spec.experts).toEqual(head.spec.experts);
    expect(back.spec.layerTypes).toEqual(head.spec.layerTypes);
    expect(back.spec.localBase).toBe(10000);
    expect(back.metrics.layerKinds).toEqual(head.metrics.layerKinds);
  });
});
