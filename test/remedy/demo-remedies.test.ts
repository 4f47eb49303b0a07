import { describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { metricValue } from '../../src/core/metrics/metric-path.js';
import type { MetricPath } from '../../src/core/metrics/types.js';
import type { ServingPatch } from '../../src/core/model.js';
import type { Change, FileDecision, GateReport } from '../../src/core/report/types.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';

// "Every remedy shown in the demo passes when applied": each proposed change is written into the
// model file the way a person would edit it (YAML keys of the context-reach format, JSON keys of a
// checkpoint config; serving values of a checkpoint config go on the command line, as
// `diff --sequences` would), the gate runs again on base → edited head, and the targeted finding
// must be gone, nothing may block that did not, and the metrics the remedy promised must be the
// ones the gate now measures.

const OWN_KEYS: Record<string, string[]> = {
  'position.base': ['model', 'position', 'base'],
  'position.scaling.kind': ['model', 'position', 'scaling', 'kind'],
  'position.scaling.factor': ['model', 'position', 'scaling', 'factor'],
  'position.scaling.originalSpan': ['model', 'position', 'scaling', 'original-span'],
  kvHeads: ['model', 'kv-heads'],
  'dtypes.cache': ['model', 'dtypes', 'cache'],
  'dtypes.positions': ['model', 'dtypes', 'positions'],
  'serving.span': ['serving', 'span'],
  'serving.sequences': ['serving', 'sequences'],
  'serving.tensorParallel': ['serving', 'tensor-parallel'],
  'serving.pipelineParallel': ['serving', 'pipeline-parallel'],
  'dtypes.weights': ['model', 'dtypes', 'weights'],
  'quantization.groupSize': ['model', 'dtypes', 'weight-group-size'],
};

const CHECKPOINT_KEYS: Record<string, string[]> = {
  'position.base': ['rope_theta'],
  'position.scaling.kind': ['rope_scaling', 'rope_type'],
  'position.scaling.factor': ['rope_scaling', 'factor'],
  'position.scaling.originalSpan': ['rope_scaling', 'original_max_position_embeddings'],
  kvHeads: ['num_key_value_heads'],
};

const FLAG_KEYS: Record<string, keyof ServingPatch> = {
  'serving.span': 'span',
  'serving.sequences': 'sequences',
  'dtypes.cache': 'cache',
  'dtypes.positions': 'positions',
  'serving.tensorParallel': 'tensorParallel',
  'serving.pipelineParallel': 'pipelineParallel',
  'dtypes.weights': 'weights',
  'quantization.groupSize': 'weightGroupSize',
};

/** The file text with the change written in, and the flags for what a checkpoint config cannot state. */
function edit(path: string, text: string, change: Change): { text: string; flags: ServingPatch } {
  const flags: ServingPatch = {};
  if (path.endsWith('.json')) {
    const json = JSON.parse(text) as Record<string, unknown>;
    for (const [key, value] of Object.entries(change)) {
      const at = CHECKPOINT_KEYS[key];
      if (!at) {
        (flags as Record<string, unknown>)[FLAG_KEYS[key]!] = value;
        continue;
      }
      let node = json;
      for (const part of at.slice(0, -1)) node = (node[part] ??= {}) as Record<string, unknown>;
      node[at[at.length - 1]!] = value;
    }
    return { text: `${JSON.stringify(json, null, 2)}\n`, flags };
  }
  const doc = parseDocument(text);
  for (const [key, value] of Object.entries(change)) doc.setIn(OWN_KEYS[key]!, value);
  return { text: doc.toString(), flags };
}

function blockingCounts(file: FileDecision): Map<string, number> {
  const counts = new Map<string, number>();
  for (const f of file.findings.filter((x) => x.severity === 'block')) {
    const id = f.metric ? `${f.rule}:${f.metric}` : f.rule;
    counts.set(id, (counts.get(id) ?? 0) + 1);
  }
  return counts;
}

describe("the demo's remedies, applied to the files and judged again by the gate", async () => {
  const { base, head } = demoTrees();
  const { report } = await gateOver(base, head);
  const rejudge = async (
    path: string,
    change: Change,
  ): Promise<{ before: FileDecision; after: FileDecision; report: GateReport }> => {
    const edited = edit(path, head[path]!, change);
    const again = await gateOver(base, { ...head, [path]: edited.text }, edited.flags);
    return {
      before: report.files.find((f) => f.path === path)!,
      after: again.report.files.find((f) => f.path === path)!,
      report: again.report,
    };
  };
  const cases = report.files.flatMap((file) =>
    file.findings
      .filter((f) => f.severity === 'block')
      .flatMap((finding) =>
        [finding.remedy, ...(finding.remedyAlternatives ?? [])]
          .filter((r) => r)
          .map((remedy, i) => ({
            file: file.path,
            finding,
            remedy: remedy!,
            label: `${file.path} ${finding.rule} ${i === 0 ? 'remedy' : `alternative ${i}`}: ${JSON.stringify(remedy!.change)}`,
          })),
      ),
  );

  it('proves a remedy for every blocking finding of the demo', () => {
    const blocking = report.files.flatMap((f) => f.findings).filter((f) => f.severity === 'block');
    expect(blocking.length).toBe(3);
    expect(blocking.every((f) => f.remedy)).toBe(true);
    expect(cases.length).toBeGreaterThanOrEqual(5);
  });

  it.each(cases.map((c) => [c.label, c] as const))(
    '%s clears its finding, blocks nothing new, and measures what it promised',
    async (_label, c) => {
      const { before, after } = await rejudge(c.file, c.remedy.change);
      const still = after.findings.filter(
        (f) => f.severity === 'block' && f.rule === c.finding.rule && f.metric === c.finding.metric,
      );
      expect(still).toEqual([]);
      const was = blockingCounts(before);
      for (const [id, count] of blockingCounts(after))
        expect(count, id).toBeLessThanOrEqual(was.get(id) ?? 0);
      for (const [metric, value] of Object.entries(c.remedy.metrics)) {
        expect(metricValue(after.head!.metrics, metric as MetricPath), metric).toBe(value);
      }
    },
  );

  it.each(report.files.filter((f) => f.remedyTogether).map((f) => [f.path, f] as const))(
    '%s: all first remedies together pass the gate',
    async (path, file) => {
      expect(file.remedyTogether!.passes).toBe(true);
      const { after } = await rejudge(path, file.remedyTogether!.change);
      expect(after.verdict).not.toBe('block');
    },
  );
});
