import { describe, expect, it } from 'vitest';
import { marked } from 'marked';
import type { GateReport } from '../../src/core/report/types.js';
import { renderComment } from '../../src/core/render/comment.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';

// The demo's comment read the way a reviewer reads it: short, nothing said twice, the answer on
// the first screen, and no number that contradicts a finding.

const { base, head } = demoTrees();
const { report } = await gateOver(base, head);
const body = renderComment(report);
const file = (path: string) => report.files.find((f) => f.path === path)!;

/** Sentences of the visible text: markdown rendered, tags stripped, split at sentence ends. */
function sentences(markdown: string): string[] {
  const html = marked.parse(markdown, { gfm: true, async: false });
  const text = html
    .replace(/<pre>[\s\S]*?<\/pre>/g, ' ')
    .replace(/<table>[\s\S]*?<\/table>/g, ' ')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&[a-z#0-9]+;/g, ' ')
    .replace(/\s+/g, ' ');
  return text
    .split(/(?<=[.!?])\s+(?=[A-Z*•■▲●✓⛔])/)
    .map((s) => s.trim())
    .filter((s) => s.length > 25);
}

describe('the demo comment', () => {
  it('draws the memory chart for the file whose memory is at issue only (quill-mini blocks on memory)', () => {
    expect(body.match(/```mermaid\nxychart-beta/g)).toHaveLength(1);
    const chart = body.indexOf('```mermaid');
    expect(body.lastIndexOf('quill-mini', chart)).toBeGreaterThan(
      body.lastIndexOf('quill-8b/config.json</code>:', chart),
    );
  });

  it('is at most 10,000 characters', () => {
    expect(body.length).toBeLessThanOrEqual(10_000);
  });

  it('says no sentence twice', () => {
    const seen = new Map<string, number>();
    for (const s of sentences(body)) seen.set(s, (seen.get(s) ?? 0) + 1);
    expect([...seen].filter(([, n]) => n > 1).map(([s]) => s)).toEqual([]);
  });

  it('puts the verdict, every blocking finding and its fix before any collapsed section', () => {
    const firstScreen = body.slice(0, body.indexOf('<details'));
    expect(firstScreen).toContain('■ **Blocked**');
    for (const rule of ['span-grew-code-unchanged', 'span-past-reach', 'memory-over-budget'])
      expect(firstScreen).toContain(`\`${rule}\``);
    expect(firstScreen.match(/✓ \*\*Fix\*\*/g)).toHaveLength(3);
  });

  it("shows every fix in the file's own keys, never the internal field names, and says what it still needs", () => {
    for (const internal of [
      'position.scaling.factor',
      'position.scaling.originalSpan',
      'kvHeads',
      'originalSpan',
      'dtypes.cache',
    ])
      expect(body).not.toContain(internal);
    expect(body).toContain(
      '```json\n"rope_scaling": {"rope_type": "linear", "factor": 4.0, "original_max_position_embeddings": 8192}\n```',
    );
    expect(body).toContain('```yaml\nfactor: 8\n```');
    for (const line of body.split('\n').filter((l) => l.startsWith('✓ **Fix**'))) {
      expect(line).toContain('passes these rules');
      expect(line).toMatch(
        /still needs (fine\\-tuning|nothing else|a serving runtime|retraining|new weights)/,
      );
    }
    expect(body).not.toMatch(/proven/i);
  });

  it('says how the policy change would change the limits, old → new', () => {
    expect(body).toContain('<code>limits.memoryBytes.max\\-increase\\-pct 50 → 400</code>');
  });

  it('flags the key/value-head change of the checkpoint config with its parameter change', () => {
    const shape = file('models/quill-8b/config.json').findings.find(
      (f) => f.rule === 'checkpoint-shape-changed',
    );
    expect(shape?.severity).toBe('warn');
    expect(shape?.line).toBe(8);
    expect(shape?.message).toContain(
      'key/value heads (num_key_value_heads) 8 → 4; parameters 8.03B → 7.9B, \u2212134M (\u22121.67 %)',
    );
  });

  it('never shows a warning with the failure mark, and uses one minus sign', () => {
    expect(body).not.toContain('❌');
    expect(body).not.toMatch(/\|\s*-\d/); // no hyphen-minus before a number in a table cell
    expect(body).toMatch(/\u2212131,072 \(\u2212128k\)/);
  });

  it('says "not judged" where the span is shorter than a minimum limit, never an empty state', () => {
    expect(body).toContain(
      '|`discriminationSpan`|none within 8,192|none within 8,192|—|≥ 131,072 (128k)|not judged: the span 8,192 is shorter than the limit|',
    );
  });
});

describe('no value of the demo contradicts a finding', () => {
  const quill8b = file('models/quill-8b/config.json');
  const mini = file('models/quill-mini/model.reach.yaml');

  it("the grown span with an unchanged code keeps the base's trained span, marked assumed, so reach does not grow", () => {
    expect(quill8b.head!.metrics.trainedSpan).toBe(8192);
    expect(quill8b.head!.metrics.reach).toBe(8192);
    expect(quill8b.assumed?.metrics).toEqual(expect.arrayContaining(['trainedSpan', 'reach']));
    expect(body).toContain('|`trainedSpan`|8,192 (8k)|8,192 (8k) *assumed*|');
    expect(quill8b.deltas.map((d) => d.metric)).not.toContain('reach');
  });

  it('the fix of the grown span changes the values it is about (reach 8,192 → 32,768)', () => {
    const fix = quill8b.findings.find((f) => f.rule === 'span-grew-code-unchanged')!.remedy!;
    expect(fix.metrics.reach).toBe(32768);
    expect(fix.metrics.reach).not.toBe(quill8b.head!.metrics.reach);
  });

  it('offers no reshaping of the checkpoint and no fix whose own figures break a limit or leave the span past reach', () => {
    const remedies = (r: GateReport) =>
      r.files.flatMap((f) =>
        f.findings.flatMap((x) => [x.remedy, ...(x.remedyAlternatives ?? [])]).filter((x) => x),
      );
    for (const remedy of remedies(report)) {
      if ('headroom' in remedy!.metrics) expect(remedy!.metrics.headroom).toBeGreaterThanOrEqual(0);
      // The base policy allows memoryBytes at most 50 % over base (quill-8b's head is within it).
      if ('memoryBytes' in remedy!.metrics)
        expect(remedy!.metrics.memoryBytes).toBeLessThanOrEqual(
          mini.base!.metrics.memoryBytes! * 1.5,
        );
    }
    for (const f of quill8b.findings)
      for (const r of [f.remedy, ...(f.remedyAlternatives ?? [])])
        expect(r?.change ?? {}).not.toHaveProperty('kvHeads');
    expect(mini.remedyTogether?.passes).toBe(true);
  });
});
