import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_REPORT_BYTES } from '../../src/action/publish.js';
import { createFileSource } from '../../src/adapters/file-source.js';
import type { GateReport } from '../../src/core/report/types.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import type { ScenarioResult } from '../support/action-harness.js';
import type { FakeGitHub } from '../support/fake-github.js';
import type { RecordingOutput } from '../support/recording-output.js';
import {
  firstWorkflow,
  publishInProcess,
  tamperedReport,
  workflowRunFor,
  type WorkflowRunOverrides,
} from './publish-recipe.js';
import { markdownProblems, renderGfm } from './report-checks.js';

// The fork-safe two-workflow recipe, end to end against the loopback API: a first workflow on a
// fork's pull request judges with a read-only token and writes the JSON report (comment: off);
// a second, on workflow_run, publishes it (input publish-report). The report is untrusted: it is
// checked, re-rendered with every text escaped, and posted only to the pull request whose head
// is the triggering run's head commit, as the API confirms. A PR number never comes from it.
// The bundled action's publish run is in publish.bundle.test.ts (`npm run test:full`).

const LINK = /^https:\/\/github\.example\/example-org\/model-zoo\/blob\/[0-9a-f]{40}\/models\//;

let first: ScenarioResult;
let fake: FakeGitHub;
let reportText: string;
let folder: string;

/** The workflow_run payload after the first workflow (publish-recipe.ts). */
const workflowRun = (overrides: WorkflowRunOverrides = {}) => workflowRunFor(first.head, overrides);

interface Published {
  out: RecordingOutput;
  error: unknown;
}

/** Runs the action in publish mode, in-process with the real GitHub adapter, on `report` (text or bytes). */
const publish = (
  report: string | Uint8Array,
  payload: unknown = workflowRun(),
  eventName = 'workflow_run',
): Promise<Published> => publishInProcess(fake, folder, report, payload, eventName);

const ours = () => fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));

const tampered = (change: Parameters<typeof tamperedReport>[1]) =>
  tamperedReport(reportText, change);

beforeAll(async () => {
  folder = mkdtempSync(join(tmpdir(), 'context-reach-publish-'));
  ({ first, reportText } = await firstWorkflow());
  fake = first.fake;
}, 60_000);

afterAll(async () => {
  if (folder) rmSync(folder, { recursive: true, force: true });
  expect(fake.mismatches).toEqual([]);
  expect(fake.responseMismatches).toEqual([]);
  expect(fake.unhandled).toEqual([]);
  await fake?.close();
});

describe('publish mode (input publish-report) on a workflow_run', () => {
  it('the first workflow decided without commenting', () => {
    expect(first.error).toBeNull();
    expect(first.out.outputs.verdict).toBe('block');
    expect(fake.state.comments).toHaveLength(0);
  });

  it("posts the report to the one open pull request whose head is the run's head commit, found through the API", async () => {
    const { out, error } = await publish(reportText);
    expect(error).toBeNull();
    expect(ours()).toHaveLength(1);
    expect(ours()[0]!.issueNumber).toBe(7);
    expect(ours()[0]!.body).toContain('span-grew-code-unchanged');
    expect(ours()[0]!.body).toContain('■ **Blocked**');
    expect(out.outputs).toMatchObject({
      verdict: 'block',
      blocking: '1',
      'comment-url': expect.stringContaining('/pull/7#issuecomment-'),
    });
    expect(out.failed).toBeNull();
    expect(fake.calls('pulls/list').map((c) => c.query)).toContain(
      '?state=open&head=someone-else%3Afeature&per_page=100',
    );
    expect(fake.calls('pulls/get').length).toBeGreaterThan(0);
  });

  it('keeps one comment when published again (re-runs edit it in place)', async () => {
    await publish(reportText);
    await publish(reportText);
    expect(ours()).toHaveLength(1);
    expect(fake.calls('issues/update-comment').length).toBeGreaterThanOrEqual(2);
  });

  it('renders the same findings and metric rows as the first workflow judged', async () => {
    const original = JSON.parse(reportText) as GateReport;
    const body = ours()[0]!.body;
    for (const finding of original.files[0]!.findings)
      expect(body).toContain(`\`${finding.rule}\``);
    expect(body).toContain('|`declaredSpan`');
    // The memory chart is drawn where memory is at issue; this report's one file blocks on its span only.
    expect(body.includes('```mermaid')).toBe(
      original.files[0]!.findings.some(
        (f) => f.rule === 'memory-over-budget' || f.metric === 'memoryBytes',
      ),
    );
    expect(body).toContain('✓ **Fix**');
  });

  it('refuses a report for another commit than the run checked: no comment is touched', async () => {
    const before = ours()[0]!.body;
    const { error } = await publish(
      tampered((r) => {
        r.head = 'e'.repeat(40);
      }),
    );
    expect(String((error as Error).message)).toMatch(
      /^Refusing to publish: the report judges head "e{40}", but workflow run 4242 ran on [0-9a-f]{40}/,
    );
    expect(ours()[0]!.body).toBe(before);
  });

  it("publishes nowhere when no open pull request has the run's head now (pushed again), and says so", async () => {
    const moved = await publish(
      tampered((r) => {
        r.head = 'f'.repeat(40);
      }),
      workflowRun({ headSha: 'f'.repeat(40) }),
    );
    expect(moved.error).toBeNull();
    expect(
      moved.out.log.some(
        (l) => l.level === 'notice' && l.message.includes('No open pull request has head ffff'),
      ),
    ).toBe(true);
    expect(ours().map((c) => c.issueNumber)).toEqual([7]);
  });

  it("ignores pull request numbers that do not have the run's head (a number in the payload is checked, not trusted)", async () => {
    const { error } = await publish(reportText, workflowRun({ pullNumbers: [8, 7] }));
    expect(error).toBeNull();
    expect(fake.state.comments.filter((c) => c.issueNumber === 8)).toHaveLength(0);
  });

  it('re-escapes a tampered report: markup in paths, messages, keys, notices and the waiver label stays text', async () => {
    const hostile =
      '<img src=x onerror=alert(1)> @someone #123 [x](https://evil.example) <!-- context-reach:pull-request-report --> | `';
    const text = tampered((r) => {
      (r.notices as string[]).push(hostile);
      r.waiver = { label: hostile, applied: true, waivedBlocks: 0 };
      const file = r.files[0] as {
        path: string;
        findings: { message: string; key: string | null }[];
      };
      file.path = `models/${hostile}/config.json`;
      for (const f of file.findings) {
        f.message = hostile;
        f.key = hostile;
      }
      (r.deleted as unknown[]).push({ status: 'deleted', path: hostile, previousPath: null });
    });
    const { error } = await publish(text);
    expect(error).toBeNull();
    const body = ours()[0]!.body;
    const report = JSON.parse(text) as GateReport;
    expect(markdownProblems(body, report, LINK)).toEqual([]);
    expect(renderGfm(body)).not.toMatch(/<(img|script)\b/);
    await publish(reportText);
  });

  it('drops fields a report does not have, whatever they hold; nothing reaches a prototype', async () => {
    const text = reportText.replace(
      '{\n  "version": 1,',
      '{\n  "__proto__": {"polluted": "yes"},\n  "html": "<script>alert(1)</script>",\n  "version": 1,',
    );
    const { error } = await publish(text);
    expect(error).toBeNull();
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(ours()[0]!.body).not.toContain('alert(1)');
  });

  it.each([
    [
      'a verdict its findings do not give',
      (r: Record<string, unknown>) => {
        r.verdict = 'ok';
      },
      /\/verdict is "ok" but the findings make it "block"; the report was altered/,
    ],
    [
      'a file verdict its findings do not give',
      (r: Record<string, unknown> & { files: Record<string, unknown>[] }) => {
        r.files[0]!.verdict = 'ok';
      },
      /\/files\/0\/verdict is "ok" but its findings make it "block"/,
    ],
    [
      'a count that is text',
      (r: Record<string, unknown>) => {
        r.blocking = '1';
      },
      /\/blocking is "1"; expected must be integer/,
    ],
    [
      'a line below 1',
      (r: Record<string, unknown> & { files: { findings: { line: number }[] }[] }) => {
        r.files[0]!.findings[0]!.line = -5;
      },
      /\/files\/0\/findings\/0\/line is -5; expected must be >= 1/,
    ],
    [
      'an unknown severity',
      (r: Record<string, unknown> & { files: { findings: { severity: string }[] }[] }) => {
        r.files[0]!.findings[0]!.severity = 'critical';
      },
      /\/files\/0\/findings\/0\/severity is "critical"; expected one of "block", "warn", "info"/,
    ],
    [
      'an unknown metric',
      (r: Record<string, unknown> & { files: { deltas: { metric: string }[] }[] }) => {
        r.files[0]!.deltas[0]!.metric = '<b>x</b>';
      },
      /\/files\/0\/deltas\/0\/metric is "<b>x<\/b>"; expected one of "declaredSpan"/,
    ],
    [
      'a spec size that is text',
      (r: Record<string, unknown> & { files: { head: { spec: { layers: unknown } } }[] }) => {
        r.files[0]!.head.spec.layers = '<script>';
      },
      /\/files\/0\/head\/spec\/layers is "<script>"; expected must be number,null/,
    ],
    [
      'another version',
      (r: Record<string, unknown>) => {
        r.version = 2;
      },
      /\/version is 2; expected must be equal to constant/,
    ],
    [
      'a remedy changing a field named like markup',
      (
        r: Record<string, unknown> & {
          files: { findings: { remedy?: { change: Record<string, unknown> } | null }[] }[];
        },
      ) => {
        r.files[0]!.findings.find((f) => f.remedy)!.remedy!.change['<img src=x>'] = 1;
      },
      /\/files\/0\/findings\/0\/remedy\/change is a mapping; expected must match pattern/,
    ],
  ])('refuses a report with %s, naming the field', async (_, change, expected) => {
    const before = ours()[0]!.body;
    const { error, out } = await publish(tampered(change as never));
    expect(error).toBeInstanceOf(Error);
    expect((error as Error).message).toMatch(/^Refusing to publish: .*report-[a-z0-9]+\.json: /);
    expect((error as Error).message).toMatch(expected);
    expect(ours()[0]!.body).toBe(before);
    expect(out.summaries).toEqual([]);
  });

  it.each([
    ['text that is not JSON', '{"version": 1,', /is not a JSON report/],
    ['bytes that are not UTF-8', Uint8Array.from([0x7b, 0xff, 0x7d]), /is not UTF-8 text/],
    [
      'JSON nested 100,000 levels deep',
      `${'['.repeat(100_000)}${']'.repeat(100_000)}`,
      /the top level is a list; expected must be object/,
    ],
  ])('refuses %s', async (_, text, expected) => {
    const { error } = await publish(text);
    expect((error as Error).message).toMatch(expected);
  });

  it(`refuses a report over ${MAX_REPORT_BYTES / 1024 / 1024} MiB without reading it`, async () => {
    const path = join(folder, 'huge.json');
    writeFileSync(path, '');
    truncateSync(path, MAX_REPORT_BYTES + 1);
    const error = await createFileSource(MAX_REPORT_BYTES)
      .read(path)
      .catch((e: unknown) => e);
    expect((error as Error).message).toMatch(
      /over the 67108864-byte limit for a model config; it was not read|67108865 bytes is over the 67108864-byte limit/,
    );
  });

  it('runs only on workflow_run, and publishes nothing for a run that was not on a pull request', async () => {
    const wrongEvent = await publish(reportText, workflowRun(), 'pull_request');
    expect((wrongEvent.error as Error).message).toMatch(
      /runs on a workflow_run event .*this run is "pull_request"/,
    );
    const push = await publish(reportText, workflowRun({ event: 'push' }));
    expect(push.error).toBeNull();
    expect(
      push.out.log.some((l) => l.level === 'notice' && l.message.includes('nothing to publish')),
    ).toBe(true);
  });
});
