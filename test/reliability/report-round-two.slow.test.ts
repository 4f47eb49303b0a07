import { beforeAll, describe, expect, it } from 'vitest';
import { fitSummary, SUMMARY_LIMIT } from '../../src/action/runner-output.js';
import type { GateReport } from '../../src/core/report/types.js';
import { renderComment } from '../../src/core/render/comment.js';
import { gateOver } from '../support/demo-gate.js';
import { BLOCKING } from './checked-scenarios.js';

// The job summary of report-round-two.test.ts (point 9) for 3,000 blocking configs: rendering and
// trimming a summary of megabytes takes seconds (`npm run test:full`).

describe("the job summary fits GitHub's 1 MiB in bytes (point 9)", () => {
  let report: GateReport;
  beforeAll(async () => {
    const one = (await gateOver(BLOCKING.base, BLOCKING.head)).report;
    // 3,000 blocking configs with non-Latin folder names (3 bytes of UTF-8 per character).
    const files = Array.from({ length: 3000 }, (_, i) => {
      const path = `模型/${'配置'.repeat(20)}${i}/config.json`;
      return {
        ...one.files[0]!,
        path,
        findings: one.files[0]!.findings.map((f) => ({ ...f, file: path })),
      };
    });
    report = { ...one, files, blocking: one.blocking * 3000 };
  }, 30_000);

  it('the rendered summary is at most 1 MiB of UTF-8 with a margin, and says it was trimmed', () => {
    const started = performance.now();
    const text = fitSummary((limit) => renderComment(report, { limit }));
    const bytes = Buffer.byteLength(text, 'utf8');
    console.log(
      `summary of 3,000 blocking configs with non-Latin paths: ${text.length} characters, ${bytes} bytes, ${(performance.now() - started).toFixed(0)} ms`,
    );
    expect(bytes).toBeLessThanOrEqual(SUMMARY_LIMIT - 16 * 1024);
    expect(bytes).toBeGreaterThan(SUMMARY_LIMIT / 2);
    expect(text).toMatch(/Trimmed to fit GitHub's comment limit/);
    // Before: a character budget of 1 MiB − 1 KiB gave about 2.4 MB for such names.
    expect(
      Buffer.byteLength(renderComment(report, { limit: SUMMARY_LIMIT - 1024 }), 'utf8'),
    ).toBeGreaterThan(SUMMARY_LIMIT);
  });
});
