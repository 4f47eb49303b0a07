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
    const blocking = json.files
      .flatMap((f: { findings: { severity: string }[] }) => f.findings)
      .filter((f: { severity: string }) => f.severity === 'block');
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
    // Three sequences, not five: five would fit the device but cross the policy's memoryBytes limit (+50 % over base).
    expect(mini.remedyTogether).toMatchObject({
      change: { 'position.scaling.factor': 8, 'serving.sequences': 3 },
      passes: true,
      stillBlocking: [],
    });
  });

  it('leaves warnings and notes without remedy fields', () => {
    const json = JSON.parse(renderGateJson(report));
    for (const finding of json.files.flatMap((f: { findings: unknown[] }) => f.findings) as {
      severity: string;
    }[]) {
      if (finding.severity !== 'block') expect(finding).not.toHaveProperty('remedy');
    }
  });
});

describe('renderComment(report) with remedies', () => {
  const comment = renderComment(report);

  it('puts the first fix under each blocker at the top, with its values and the YAML keys to set', () => {
    const top = comment.slice(0, comment.indexOf('<details'));
    expect(top).toContain(
      '✓ **Fix**, passes these rules (reach 262,144 \\(256k\\), scalingCover 262,144 \\(256k\\), headroom 0); still needs fine\\-tuning at the longer span with the larger yarn factor 8.\nSet on line 20:\n```yaml\nfactor: 8\n```',
    );
    expect(top).toContain(
      '✓ **Fix**, passes these rules (memoryBytes 13.4 GiB, cacheBytesAtSpan 10.5 GiB, fitSequences 5); still needs nothing else \\(a serving setting\\).\nSet on line 29:\n```yaml\nsequences: 3\n```',
    );
  });

  it('lists each other fix once, naming every finding it fixes, and the fixes together', () => {
    // A serving setting needs nothing else: said under the first fix, not again for each other fix.
    expect(comment).toContain(
      '- for `span-past-reach`, `memory-over-budget`: <code>span: 111763</code> (line 28) ⇒ evaluationSpan 111,763, headroom 19,309, memoryBytes 14.8 GiB\n',
    );
    expect(comment).toContain(
      'All first fixes of <code>models/quill\\-mini/model.reach.yaml</code> applied together pass these rules: nothing blocks.',
    );
  });

  it('links the HTML report and says where it is', () => {
    const linked = renderComment(report, {
      htmlReportUrl: 'https://github.example/o/r/actions/runs/9',
      htmlReportWhere: 'in the artifacts of this workflow run',
    });
    expect(linked).toContain(
      'Charts, findings and fixes: [the HTML report](https://github.example/o/r/actions/runs/9) in the artifacts of this workflow run.',
    );
  });
});

describe('renderDiffText(report) with remedies', () => {
  it('prints remedy, alternatives and the together line under the findings', () => {
    const text = renderDiffText(report);
    expect(text).toContain(
      '        fix: model.position.scaling.factor 4 → 8 ⇒ reach 262,144 (256k)',
    );
    expect(text).toContain(
      '; still needs fine-tuning at the longer span with the larger yarn factor 8',
    );
    expect(text).toContain(
      '        or: serving.span 262,144 (256k) → 111,763 ⇒ evaluationSpan 111,763, headroom 19,309',
    );
    expect(text).toContain(
      '  together: All first fixes together (model.position.scaling.factor 4 → 8, serving.sequences 8 → 3) pass these rules: nothing blocks',
    );
  });
});

describe('inspect output with remedies (built-in rules, one file)', () => {
  const file = remedyFileReport(inspectModel(head[MINI]!, MINI));

  it("shows each blocking finding's remedy in the text report", () => {
    const text = renderInspectText([file], []);
    // Built-in rules, no policy limits: five sequences fit the device.
    expect(text).toContain(
      '          fix: model.position.scaling.factor 4 → 8 ⇒ reach 262,144 (256k)',
    );
    expect(text).toContain('          fix: serving.sequences 8 → 5 ⇒ memoryBytes 20.4 GiB');
  });

  it('carries the remedy fields and remedyTogether in the JSON document', () => {
    const json = JSON.parse(renderInspectJson([file], []));
    const findings = json.files[0].findings as { severity: string; remedy?: unknown }[];
    for (const f of findings)
      expect(f.severity === 'block' ? f.remedy : undefined).toEqual(
        f.severity === 'block'
          ? expect.objectContaining({ change: expect.any(Object) })
          : undefined,
      );
    expect(json.files[0].remedyTogether.passes).toBe(true);
  });

  it('leaves a file without blocking findings as it was', () => {
    const clean = inspectModel(base[MINI]!, MINI);
    const same = remedyFileReport(clean);
    expect(same.findings).toEqual(clean.findings);
    expect(same.remedyTogether).toBeNull();
  });
});
