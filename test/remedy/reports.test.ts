import { describe, expect, it } from 'vitest';
import { inspectModel } from '../../src/core/inspect.js';
import { renderComment } from '../../src/core/render/comment.js';
import { renderDiffText } from '../../src/core/render/diff-text.js';
import { renderGateJson } from '../../src/core/render/gate-json.js';
import { renderInspectJson } from '../../src/core/render/inspect-json.js';
import { renderInspectText } from '../../src/core/render/inspect-text.js';
import { remedyFileReport } from '../../src/core/remedy/attach.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';

// Where remedies show: the JSON report, the comment and summary, the CLI's diff text, and
// inspect's text and JSON, each with the metric values the change would produce.

const { base, head } = demoTrees();
const { report } = await gateOver(base, head);
const MINI = 'models/quill-mini/model.reach.yaml';

describe('renderGateJson(report) with remedies', () => {
  it('gives every blocking finding remedy {change, metrics, raises}, remedyWhyNot and remedyAlternatives', () => {
    const json = JSON.parse(renderGateJson(report));
    const blocking = json.files.flatMap((f: { findings: { severity: string }[] }) => f.findings).filter((f: { severity: string }) => f.severity === 'block');
    expect(blocking).toHaveLength(3);
    for (const finding of blocking) {
      expect(Object.keys(finding.remedy)).toEqual(['change', 'metrics', 'raises']);
      expect(finding.remedyWhyNot).toBeNull();
      expect(Array.isArray(finding.remedyAlternatives)).toBe(true);
    }
    const mini = json.files.find((f: { path: string }) => f.path === MINI);
    const reach = mini.findings.find((f: { rule: string }) => f.rule === 'span-past-reach');
    expect(reach.remedy).toEqual({
      change: { 'position.scaling.factor': 8 },
      metrics: expect.objectContaining({ reach: 262144, headroom: 0 }),
      raises: [],
    });
    expect(mini.remedyTogether).toMatchObject({ change: { 'position.scaling.factor': 8, 'serving.sequences': 5 }, passes: true, stillBlocking: [] });
  });

  it('leaves warnings and notes without remedy fields', () => {
    const json = JSON.parse(renderGateJson(report));
    for (const finding of json.files.flatMap((f: { findings: unknown[] }) => f.findings) as { severity: string }[]) {
      if (finding.severity !== 'block') expect(finding).not.toHaveProperty('remedy');
    }
  });
});

describe('renderComment(report) with remedies', () => {
  const comment = renderComment(report);

  it('puts the first remedy under each blocker at the top, with its values', () => {
    const top = comment.slice(0, comment.indexOf('### '));
    expect(top).toContain('  - ✅ **remedy**: <code>position.scaling.factor</code> 4 → **8** ⇒ reach 262,144 \\(256k\\), scalingCover 262,144 \\(256k\\), headroom 0');
    expect(top).toContain('  - ✅ **remedy**: <code>serving.sequences</code> 8 → **5** ⇒ memoryBytes 20.4 GiB, cacheBytesAtSpan 17.5 GiB, fitSequences 5');
  });

  it('lists every proven alternative and the remedies together in the file section', () => {
    expect(comment).toContain('  - or: <code>dtypes.cache</code> fp8 → **int4** ⇒ cachePerTokenBytes 7 KiB, memoryBytes 16.9 GiB, fitSequences 10');
    expect(comment).toContain('- ✅ All first remedies together (<code>position.scaling.factor</code> 4 → **8**, <code>serving.sequences</code> 8 → **5**) pass: nothing blocks.');
  });

  it('links the HTML report and says where it is', () => {
    const linked = renderComment(report, { htmlReportUrl: 'https://github.example/o/r/actions/runs/9', htmlReportWhere: 'in the artifacts of this workflow run' });
    expect(linked).toContain('📊 Charts, findings and proven remedies: [the HTML report](https://github.example/o/r/actions/runs/9) in the artifacts of this workflow run.');
  });
});

describe('renderDiffText(report) with remedies', () => {
  it('prints remedy, alternatives and the together line under the findings', () => {
    const text = renderDiffText(report);
    expect(text).toContain('        remedy: position.scaling.factor 4 → 8 ⇒ reach 262,144 (256k)');
    expect(text).toContain('        or: serving.span 262,144 (256k) → 131,072 (128k) ⇒ evaluationSpan 131,072 (128k), headroom 0');
    expect(text).toContain('  together: All first remedies together (position.scaling.factor 4 → 8, serving.sequences 8 → 5) pass: nothing blocks');
  });
});

describe('inspect output with remedies (built-in rules, one file)', () => {
  const file = remedyFileReport(inspectModel(head[MINI]!, MINI));

  it('shows each blocking finding\'s remedy in the text report', () => {
    const text = renderInspectText([file], []);
    expect(text).toContain('          remedy: position.scaling.factor 4 → 8 ⇒ reach 262,144 (256k)');
    expect(text).toContain('          remedy: serving.sequences 8 → 5 ⇒ memoryBytes 20.4 GiB');
  });

  it('carries the remedy fields and remedyTogether in the JSON document', () => {
    const json = JSON.parse(renderInspectJson([file], []));
    const findings = json.files[0].findings as { severity: string; remedy?: unknown }[];
    for (const f of findings) expect(f.severity === 'block' ? f.remedy : undefined).toEqual(f.severity === 'block' ? expect.objectContaining({ change: expect.any(Object) }) : undefined);
    expect(json.files[0].remedyTogether.passes).toBe(true);
  });

  it('leaves a file without blocking findings as it was', () => {
    const clean = inspectModel(base[MINI]!, MINI);
    const same = remedyFileReport(clean);
    expect(same.findings).toEqual(clean.findings);
    expect(same.remedyTogether).toBeNull();
  });
});
