import { describe, expect, it } from 'vitest';
import { createScanMemo, type ScanMemo } from '../../src/core/metrics/scan-memo.js';
import { MAX_REMEDY_SCAN_WORK, MAX_SCAN_WORK } from '../../src/core/metrics/scan-limits.js';
import { judgeAddedConfig } from '../support/one-config-gate.js';

// Issue 16: one judgement, remedy search included, within half a second of CPU for any span up
// to 2^31. The similarity scan is the cost that grows with the span (its work units are counted
// steps, `scan-limits.ts`): the file's own scan stops at MAX_SCAN_WORK, and every scan of the
// remedy search is charged to MAX_REMEDY_SCAN_WORK as it runs. These tests count the work the
// scans report (deterministic, whatever the machine's load), and log the CPU time beside it.

/** A memo that adds up the work of every scan it actually runs (a repeated question costs nothing). */
function countingMemo(): ScanMemo & { work: number } {
  const inner = createScanMemo();
  let work = 0;
  return {
    call(name, fn, ...args) {
      const before = inner.misses;
      const result = inner.call(name, fn, ...args);
      if (inner.misses > before) {
        const r = result as {
          similarity?: { work: number };
          work?: number;
          elements?: number;
        };
        work += r.similarity?.work ?? r.work ?? r.elements ?? 0;
      }
      return result;
    },
    get hits() {
      return inner.hits;
    },
    get misses() {
      return inner.misses;
    },
    get work() {
      return work;
    },
  };
}

/** The gate over a pull request adding one checkpoint config, with a policy serving `served` tokens. */
function judgeOne(config: Record<string, unknown>, served: number, memo: ScanMemo) {
  return judgeAddedConfig(
    JSON.stringify(config),
    `serving:\n  span: ${served}\n  sequences: 1\n  device-memory-gib: 80\nlimits:\n  discriminationSpan:\n    min: 4096\n    severity: block\n`,
    memo,
  );
}

const checkpoint = (headDim: number, base: number, declared: number) => ({
  model_type: 'llama',
  hidden_size: 2048,
  intermediate_size: 5632,
  num_hidden_layers: 16,
  num_attention_heads: 16,
  num_key_value_heads: 4,
  head_dim: headDim,
  vocab_size: 32000,
  max_position_embeddings: declared,
  rope_theta: base,
  torch_dtype: 'bfloat16',
});

describe('the scan work of one judgement with its remedy search', () => {
  it('two fast pairs (head_dim 4, rope_theta 1.0001) served at 2^27: within MAX_SCAN_WORK + MAX_REMEDY_SCAN_WORK, the searches past it saying so (before: 2.3–2.9 s of CPU)', async () => {
    const memo = countingMemo();
    const { report, cpuMs } = await judgeOne(checkpoint(4, 1.0001, 2 ** 26), 2 ** 27, memo);
    const file = report.files[0]!;
    const blocking = file.findings.filter((f) => f.counts === 'block');
    console.log(
      `2 pairs at 2^27: ${cpuMs.toFixed(0)} ms CPU, ${memo.work} units of scan work, ${blocking.length} blocking findings`,
    );
    expect(blocking.length).toBeGreaterThanOrEqual(3);
    // The file's own scan stops at its bound, and says so.
    expect(file.findings.map((f) => f.rule)).toContain('scan-incomplete');
    // One block of 512 offsets is the most a scan runs past the limit it checks before each block.
    const overshoot = 4 * 512 * (2 + 16);
    expect(memo.work).toBeLessThanOrEqual(MAX_SCAN_WORK + MAX_REMEDY_SCAN_WORK + overshoot);
    // The budget bound: some search ran out, and its finding says why instead of guessing.
    const whyNots = blocking.map((f) => f.remedyWhyNot ?? '').join('\n');
    expect(whyNots).toMatch(
      /not proven: the remedy search of this file spent its 268,435,456 units/,
    );
  }, 60_000);

  it('a published shape at a long span (64 pairs, rope_theta 500,000, 2^24): every search within the budget, remedies found', async () => {
    const memo = countingMemo();
    const { report, cpuMs } = await judgeOne(checkpoint(128, 500_000, 2 ** 23), 2 ** 24, memo);
    const blocking = report.files[0]!.findings.filter((f) => f.counts === 'block');
    console.log(
      `64 pairs at 2^24: ${cpuMs.toFixed(0)} ms CPU, ${memo.work} units of scan work, ${blocking.length} blocking findings`,
    );
    expect(blocking.length).toBeGreaterThan(0);
    for (const finding of blocking) {
      expect(finding.remedyWhyNot ?? '').not.toMatch(/spent its .* units of similarity-scan work/);
      expect(finding.remedy).not.toBeNull();
    }
    expect(memo.work).toBeLessThan(MAX_REMEDY_SCAN_WORK);
  }, 60_000);
});
