import { describe, expect, it } from 'vitest';
import { diffRightLines, syncSuggestions } from '../../src/action/review-suggestions.js';
import type { ReviewApi, ReviewComment } from '../../src/adapters/github-rest.js';
import { codeBlock } from '../../src/core/render/escape.js';
import { planSuggestions, suggestionIdOf } from '../../src/core/render/suggestions.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';

const { base, head } = demoTrees();
const { report } = await gateOver(base, head);
const MINI = 'models/quill-mini/model.reach.yaml';
const Q8B = 'models/quill-8b/config.json';
const texts = new Map([
  [MINI, head[MINI]!],
  [Q8B, head[Q8B]!],
]);
const all = (n: number) => new Set(Array.from({ length: n }, (_, i) => i + 1));
/** Every line of both demo files in the diff. */
const wholeDiff = () =>
  new Map([
    [MINI, all(40)],
    [Q8B, all(20)],
  ]);

describe('planSuggestions(report, texts, diffLines)', () => {
  it("turns each blocking finding's first whole-line fix into a suggestion whose file still reads (JSON stays JSON)", () => {
    const planned = planSuggestions(report, texts, wholeDiff());
    expect(planned.map((p) => [p.path, p.startLine, p.line])).toEqual([
      [Q8B, 12, 12],
      [MINI, 20, 20],
      [MINI, 29, 29],
    ]);
    const json = planned[0]!;
    const replacement = /```suggestion\n([\s\S]*?)\n```/.exec(json.body)![1]!;
    const lines = head[Q8B]!.split('\n');
    lines.splice(11, 1, ...replacement.split('\n'));
    expect(JSON.parse(lines.join('\n')).rope_scaling).toEqual({
      rope_type: 'linear',
      factor: 4,
      original_max_position_embeddings: 8192,
    });
    expect(planned[1]!.body).toContain('```suggestion\n      factor: 8\n```');
    expect(planned[2]!.body).toContain('```suggestion\n  sequences: 3\n```');
    for (const p of planned) expect(suggestionIdOf(p.body)).toBe(p.id);
  });

  it('posts only on lines of the diff: a fix off the diff falls back to the next fix on it, or to none', () => {
    // Lines 25 to 31 changed or are context in the demo's YAML diff; line 20 (the factor) is not.
    const planned = planSuggestions(
      report,
      texts,
      new Map([[MINI, new Set([25, 26, 27, 28, 29, 30, 31])]]),
    );
    expect(planned.map((p) => [p.path, p.line])).toEqual([
      [MINI, 28],
      [MINI, 29],
    ]);
    expect(planned[0]!.body).toContain('span: 111763');
  });
});

describe('diffRightLines(patch)', () => {
  it('gives the head lines of added and context rows, skipping removed ones (unified diff format)', () => {
    expect([...diffRightLines('@@ -10,3 +10,4 @@\n a\n-b\n+c\n+d\n e')]).toEqual([10, 11, 12, 13]);
  });
});

describe('codeBlock(text, lang)', () => {
  it('uses a fence longer than any backtick run, so the text cannot close it', () => {
    expect(codeBlock('a ```` b', 'yaml')).toBe('`````yaml\na ```` b\n`````');
  });
});

describe('syncSuggestions(api, target, planned)', () => {
  function fakeApi(existing: ReviewComment[]): ReviewApi & { calls: string[] } {
    const calls: string[] = [];
    return {
      calls,
      listReviewComments: async () => existing,
      createReviewComment: async (_t, s) => {
        calls.push(`create ${s.path}:${s.line}`);
      },
      updateReviewComment: async (_t, id) => {
        calls.push(`update ${id}`);
      },
      deleteReviewComment: async (_t, id) => {
        calls.push(`delete ${id}`);
      },
      listPatches: async () => new Map(),
    };
  }
  const target = { owner: 'o', repo: 'r', pull: 1, headSha: 'a'.repeat(40) };
  const planned = planSuggestions(report, texts, new Map([[Q8B, all(20)]]));

  it('keeps an equal one, deletes ours whose finding is gone and a duplicate, and never touches others', async () => {
    const mine = {
      id: 1,
      path: Q8B,
      line: 12,
      startLine: null,
      body: planned[0]!.body,
      byBot: true,
    };
    const api = fakeApi([
      mine,
      { ...mine, id: 2 },
      {
        id: 3,
        path: Q8B,
        line: 4,
        startLine: null,
        body: '<!-- context-reach:suggestion 0123456789abcdef -->\nold',
        byBot: true,
      },
      { id: 4, path: Q8B, line: 12, startLine: null, body: planned[0]!.body, byBot: false },
    ]);
    expect(await syncSuggestions(api, target, planned)).toEqual({
      created: 0,
      updated: 0,
      kept: 1,
      removed: 2,
    });
    expect(api.calls).toEqual(['delete 2', 'delete 3']);
  });
});

describe('planSuggestions(report, …) on a report read back with tampered rule ids', () => {
  it('shows each rule id and metric name as one code element: nothing of them opens markdown', async () => {
    const { marked } = await import('marked');
    const tampered = structuredClone(report);
    for (const file of tampered.files)
      for (const finding of file.findings) {
        finding.rule = `${finding.rule}\`<img src=x onerror=alert(1)> **b**`;
        if (finding.metric)
          finding.metric = `${finding.metric}\` [x](https://evil.example)` as never;
      }
    const planned = planSuggestions(tampered, texts, wholeDiff());
    expect(planned.length).toBeGreaterThan(0);
    for (const p of planned) {
      const lead = p.body.split('\n')[1]!;
      const html = marked.parse(lead, { gfm: true, async: false });
      expect(html).not.toMatch(/<(img|a|em)\b/i);
      expect(html.match(/<strong>/g)).toHaveLength(1); // the **context-reach** label only
      expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    }
  });
});
