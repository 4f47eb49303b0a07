import type { GateReport } from '../../src/core/report/types.js';
import { runGate, type ContentSource } from '../../src/core/gate.js';
import type { ScanMemo } from '../../src/core/metrics/scan-memo.js';

const encoder = new TextEncoder();

/**
 * The gate in process over a pull request that adds one config (`models/m/config.json`) under
 * the policy `policyText`, so blocking findings get their remedies searched; with the CPU time
 * of this process the judgement took (`process.cpuUsage`).
 */
export async function judgeAddedConfig(
  configText: string,
  policyText: string,
  memo?: ScanMemo,
): Promise<{ report: GateReport; cpuMs: number }> {
  const files = new Map([
    ['.github/context-reach.yml', encoder.encode(policyText)],
    ['models/m/config.json', encoder.encode(configText)],
  ]);
  const source: ContentSource = {
    read: async (ref, path) =>
      ref === 'head' || path.endsWith('.yml') ? (files.get(path) ?? null) : null,
  };
  const before = process.cpuUsage();
  const report = await runGate(source, {
    base: 'base',
    head: 'head',
    changes: [{ status: 'added', path: 'models/m/config.json', previousPath: null }],
    policyPath: '.github/context-reach.yml',
    ...(memo ? { memo } : {}),
  });
  const used = process.cpuUsage(before);
  return { report, cpuMs: (used.user + used.system) / 1000 };
}
