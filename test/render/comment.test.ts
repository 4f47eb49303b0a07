import { describe, expect, it } from 'vitest';
import { marked } from 'marked';
import { decide, type ChangedConfig } from '../../src/core/compare/decide.js';
import { BUILT_IN_JUDGING } from '../../src/core/policy/judging.js';
import { inspectModel, type InspectOptions } from '../../src/core/inspect.js';
import { createScanMemo } from '../../src/core/metrics/scan-memo.js';
import { PER_DEVICE_METRICS } from '../../src/core/metrics/types.js';
import {
  COMMENT_LIMIT,
  commentRenderer,
  effectiveParts,
  fileSection,
  renderComment,
  type FileSectionParts,
} from '../../src/core/render/comment.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { planAnnotations } from '../../src/core/render/annotations.js';
import { renderSarif } from '../../src/core/render/sarif.js';
import { checkpointConfig } from '../support/scenario-repo.js';

/** One memory of positional computations for the file, as the gate keeps one per run. */
const memo = createScanMemo();

function gateOver(
  files: { path: string; base: Record<string, unknown>; head: Record<string, unknown> }[],
  extra: Partial<Parameters<typeof decide>[0]> = {},
  options: InspectOptions = {},
) {
  const configs: ChangedConfig[] = files.map((f) => ({
    change: { status: 'modified', path: f.path, previousPath: null },
    base: inspectModel(checkpointConfig(f.base), f.path, { memo, ...options }),
    head: inspectModel(checkpointConfig(f.head), f.path, { memo, ...options }),
    judging: BUILT_IN_JUDGING,
  }));
  return decide({
    configs,
    deleted: [],
    policy: { source: 'file', path: '.github/context-reach.yml', changedInHead: false },
    waiver: { label: null, applied: false },
    notices: [],
    base: '1'.repeat(40),
    head: '2'.repeat(40),
    ...extra,
  });
}

/** Sixty files that each block: their comment is over GitHub's limit in full. */
const sixtyBlocked = () =>
  gateOver(
    Array.from({ length: 60 }, (_, i) => ({
      path: `models/m${i}/config.json`,
      base: {},
      head: { max_position_embeddings: 8192, rope_theta: 20000 + i },
    })),
  );

describe('renderComment(report)', () => {
  const report = gateOver([
    { path: 'models/a/config.json', base: {}, head: { max_position_embeddings: 8192 } },
  ]);
  const body = renderComment(report, { blobUrl: 'https://github.example/o/r/blob/222' });
  const lines = body.split('\n');

  it('starts with the hidden marker, then the verdict and the counts', () => {
    expect(lines[0]).toBe(COMMENT_MARKER);
    expect(lines[1]).toBe('## context-reach · ■ **Blocked** · 1 blocking, 0 warnings');
  });

  it('lists what blocks with a link to the line at the head commit, then the message', () => {
    const at = lines.findIndex((l) => l.startsWith('**1.** <code>models/a/config.json</code>'));
    expect(lines[at]).toBe(
      '**1.** <code>models/a/config.json</code> [line 10](https://github.example/o/r/blob/222/models/a/config.json#L10) <code>max\\_position\\_embeddings</code> · `span-grew-code-unchanged`  ',
    );
    expect(lines[at + 1]).toBe(
      'The declared span grew from 4,096 to 8,192 tokens while the position code \\(rotary, base 10,000, no scaling\\) stayed the same; add or raise context scaling so the code reaches 8,192, or state the trained span if the model was trained that long.',
    );
  });

  it('has a table row per changed metric with base, head and change; the inherited trained span is marked assumed', () => {
    const rows = lines.filter((l) => l.startsWith('|`')).map((l) => l.split('|').slice(1, -1));
    expect(rows).toContainEqual([
      '`declaredSpan`',
      '4,096 (4k)',
      '8,192 (8k)',
      '+4,096 (+100 %)',
      '',
      '',
    ]);
    expect(rows).toContainEqual(['`trainedSpan`', '4,096 (4k)', '4,096 (4k) *assumed*']);
  });

  it('draws no memory chart where memory is not at issue, and keeps the file sections and other metrics collapsed', () => {
    expect(body).not.toContain('```mermaid');
    expect(body).toContain('<details><summary>Other metrics</summary>');
    expect(body).toContain(
      '<details><summary>■ <code>models/a/config.json</code>: 1 blocking</summary>',
    );
  });

  it('says the metrics are estimates, not a guarantee', () => {
    expect(lines[lines.length - 2]).toContain('not a guarantee of model quality');
  });

  it('renders as GFM with no unbalanced HTML (the details blocks close)', () => {
    const html = marked.parse(body, { gfm: true, async: false });
    expect((html.match(/<details/g) ?? []).length).toBe((html.match(/<\/details>/g) ?? []).length);
  });

  it("stays under GitHub's 65,536-character limit and says what it trimmed", () => {
    const many = sixtyBlocked();
    const full = renderComment(many, { limit: Infinity });
    expect(full.length).toBeGreaterThan(COMMENT_LIMIT);
    const trimmed = renderComment(many);
    expect(trimmed.length).toBeLessThanOrEqual(COMMENT_LIMIT);
    expect(trimmed).toContain("Trimmed to fit GitHub's comment limit");
    expect(trimmed.split('\n')[0]).toBe(COMMENT_MARKER);
  });
});

describe('commentRenderer(ctx): one context, several reports and limits', () => {
  it("gives renderComment's text for every limit, in any order, and for a report with other notices", () => {
    const many = sixtyBlocked();
    const ctx = { blobUrl: 'https://github.example/o/r/blob/222', unannotated: 3 };
    const render = commentRenderer(ctx);
    const withNotice = { ...many, notices: [...many.notices, 'The comment could not be written.'] };
    // The limits that pick each of the forms, the fallback that names files, and none at all.
    const limits = [undefined, Infinity, 1_000_000, COMMENT_LIMIT, 40_000, 20_000, 5_000, 1_024];
    const texts = new Set<string>();
    for (const limit of [...limits, ...[...limits].reverse()]) {
      for (const report of [many, withNotice]) {
        const text = render(report, limit);
        expect(text).toBe(
          renderComment(report, { ...ctx, ...(limit === undefined ? {} : { limit }) }),
        );
        texts.add(text);
      }
    }
    // The limits gave different texts: the cache was asked for several forms.
    expect(texts.size).toBeGreaterThanOrEqual(8);
  });
});

describe('fileSection(file, ctx, parts): the forms renderComment tries', () => {
  // renderComment renders each distinct section once per call, keyed by effectiveParts: that
  // is exact only if a section's text depends on the form through its effective parts alone.
  const FORMS: FileSectionParts[] = [
    { chart: true, details: true, maxFindings: Infinity },
    { chart: true, details: false, maxFindings: Infinity },
    { chart: false, details: false, maxFindings: Infinity },
    { chart: false, details: false, maxFindings: 5 },
    { chart: false, details: false, maxFindings: 0 },
  ];
  const report = gateOver(
    Array.from({ length: 12 }, (_, i) => ({
      path: `models/m${i}/config.json`,
      base: {},
      head: {
        max_position_embeddings: 4096 * (1 + (i % 4)),
        rope_theta: 10000 * (1 + i),
        ...(i % 3 === 0 ? { num_hidden_layers: 400 } : {}),
      },
    })),
  );

  it('gives the same text for a form and for its effective parts', () => {
    const ctx = { blobUrl: 'https://github.example/o/r/blob/222' };
    let narrowed = 0;
    for (const file of report.files) {
      for (const parts of FORMS) {
        const effective = effectiveParts(file, parts);
        if (JSON.stringify(effective) !== JSON.stringify(parts)) narrowed += 1;
        expect(fileSection(file, ctx, effective)).toBe(fileSection(file, ctx, parts));
      }
    }
    // Some forms do narrow (a chart where memory is not at issue, a cap above the findings).
    expect(narrowed).toBeGreaterThan(0);
  });

  it('keeps what differs: details with a head version, and a cap below the number of findings', () => {
    const nonBlocking = (f: (typeof report.files)[number]) =>
      f.findings.filter((x) => x.counts !== 'block').length;
    const file = report.files.find((f) => nonBlocking(f) > 0);
    expect(file).toBeDefined();
    expect(effectiveParts(file!, FORMS[0]!).details).toBe(true);
    expect(effectiveParts(file!, FORMS[1]!).details).toBe(false);
    const others = nonBlocking(file!);
    expect(effectiveParts(file!, { ...FORMS[3]!, maxFindings: others }).maxFindings).toBe(Infinity);
    expect(effectiveParts(file!, { ...FORMS[3]!, maxFindings: others - 1 }).maxFindings).toBe(
      others - 1,
    );
  });
});

describe('renderComment(report): the per-device metrics (PER_DEVICE_METRICS)', () => {
  const commentAt = (tensorParallel: number) =>
    renderComment(
      gateOver(
        [{ path: 'models/a/config.json', base: {}, head: { max_position_embeddings: 8192 } }],
        {},
        { overrides: { tensorParallel } },
      ),
    );

  it('are left out on one device, where each equals its single-device figure, and shown on two', () => {
    const one = commentAt(1);
    const two = commentAt(2);
    for (const metric of PER_DEVICE_METRICS) {
      expect(one, metric).not.toContain(`\`${metric}\``);
      expect(two, metric).toContain(`\`${metric}\``);
    }
    // The single-device figures stay in both.
    for (const metric of ['weightBytes', 'cachePerTokenBytes', 'memoryBytes']) {
      expect(one, metric).toContain(`\`${metric}\``);
      expect(two, metric).toContain(`\`${metric}\``);
    }
  });

  it('mark the memory per device with the same caution as the memory (weights and cache only)', () => {
    const rowOf = (metric: string) =>
      commentAt(2)
        .split('\n')
        .find((line) => line.startsWith(`|\`${metric}\`|`));
    for (const metric of ['memoryBytes', 'memoryBytesPerDevice']) {
      expect(rowOf(metric), metric).toBeDefined();
      expect(rowOf(metric), metric).toContain(' †');
    }
  });
});

describe('renderComment(report) with hundreds of blocking files', () => {
  it('lists the first 20 blockers, names the rest by count, and stays under the limit', () => {
    const many = gateOver(
      Array.from({ length: 300 }, (_, i) => ({
        path: `models/family-${i}/variant/config.json`,
        base: {},
        head: { max_position_embeddings: 8192 },
      })),
    );
    const body = renderComment(many);
    expect(body.length).toBeLessThanOrEqual(COMMENT_LIMIT);
    expect(body.split('\n')[0]).toBe(COMMENT_MARKER);
    expect(body).toContain('… and 280 more blocking findings, listed under their files below.');
    const html = marked.parse(body, { gfm: true, async: false });
    expect((html.match(/<details/g) ?? []).length).toBe((html.match(/<\/details>/g) ?? []).length);
  });
});

describe('planAnnotations(report)', () => {
  it('keeps at most 10 per level, errors first, and counts the rest', () => {
    // A longer span (block) and a narrower rotary width (warn) in each of 14 files.
    const many = gateOver(
      Array.from({ length: 14 }, (_, i) => ({
        path: `m${i}.json`,
        base: {},
        head: { max_position_embeddings: 8192, head_dim: 64 },
      })),
    );
    const { annotations, omitted } = planAnnotations(many);
    expect(annotations.filter((a) => a.level === 'error')).toHaveLength(10);
    expect(annotations.filter((a) => a.level === 'warning')).toHaveLength(10);
    expect(annotations[0]!.level).toBe('error');
    expect(omitted).toBe(
      many.files.flatMap((f) => f.findings).filter((f) => f.counts !== null).length -
        annotations.length,
    );
    expect(omitted).toBeGreaterThan(0);
  });
});

describe('renderSarif(report)', () => {
  it('writes SARIF 2.1.0 with rule metadata and a result per finding at its line', () => {
    const report = gateOver([
      { path: 'models/a/config.json', base: {}, head: { max_position_embeddings: 8192 } },
    ]);
    const sarif = JSON.parse(renderSarif(report, '0.1.0'));
    expect(sarif.version).toBe('2.1.0');
    const run = sarif.runs[0];
    const result = run.results.find(
      (r: { ruleId: string }) => r.ruleId === 'span-grew-code-unchanged',
    );
    expect(result.level).toBe('error');
    expect(result.locations[0].physicalLocation).toEqual({
      artifactLocation: { uri: 'models/a/config.json', uriBaseId: '%SRCROOT%' },
      region: { startLine: 10 },
    });
    expect(run.tool.driver.rules[result.ruleIndex].id).toBe('span-grew-code-unchanged');
  });
});
